/**
 * Trade factors at the design mission: the change in block fuel for +1 %
 * inlet recovery, +1 drag count, +1 % TSFC and +100 kg OEW, each by central
 * differences at two step sizes with a convergence check.
 */
import { err, ok, type Result } from '../core/result';
import type { Airframe, MissionInput, MissionResult } from '../mission/missionTypes';
import type { PropulsionModel } from '../propulsion/propulsionModel';
import { adjustPropulsion } from './adjustedPropulsion';
import { describeInstallationMethod } from '../propulsion/installationMethod';
import type { AnalysisError, MissionSolver } from './analysisTypes';
import { flySerially, type AnalysisSteps, type PlannedMission } from './missionPlan';
import { STEP_ORDER, stepStart, type StepMission } from './warmStart';

export type TradeFactorName = 'recovery' | 'dragCount' | 'tsfc' | 'oew';

export interface TradeFactor {
  readonly name: TradeFactorName;
  /** What one unit is, in words, e.g. "+1 % inlet recovery (+0.01)". */
  readonly unit: string;
  /** d(block fuel) per unit (kg) by central differences with a step of one unit; null when a mission failed. */
  readonly blockFuelPerUnit_kg: number | null;
  /** The same with a step of half a unit (kg); null when a mission failed. */
  readonly blockFuelPerUnitHalfStep_kg: number | null;
  /** |full - half| / |half| (-); null when half is 0 or missing. */
  readonly relativeDifference: number | null;
  /** True when the two steps agree within the stated tolerance. */
  readonly converged: boolean;
  /** Why a value is missing or not converged (a failed perturbed mission); null when converged. */
  readonly note: string | null;
}

export interface TradeFactorsResult {
  /** The design mission: payload (kg) and range (m, in the mission's distance basis) flown in payload-and-range mode. */
  readonly designMission: { readonly payload_kg: number; readonly range_m: number };
  readonly baselineBlockFuel_kg: number;
  readonly factors: readonly TradeFactor[];
  /** Step-convergence tolerance: |d_h - d_h/2| <= rel * |d_h/2| + abs_kg. */
  readonly tolerance: { readonly rel: number; readonly abs_kg: number };
  readonly missions: number;
  readonly recoveryMethod: string;
}

export interface TradeFactorOptions {
  /** Mission solver; default warmStart.ts analysisSolver (solveMission started from neighbours, no time history). */
  readonly solve?: MissionSolver;
  /** C_ram of the installation for the recovery wrapper (-); default 1.35 (Raymer, subsonic). */
  readonly cRam?: number;
  /**
   * Propulsion with recovery raised by `delta` (-), when the caller can build
   * it exactly; default the propulsion's own `withRecoveryOffset` (the
   * installation method carries the change), else the C_ram wrapper.
   */
  readonly recoveryModel?: (delta: number) => PropulsionModel;
  readonly tolerance?: { readonly rel: number; readonly abs_kg: number };
  readonly onProgress?: (done: number, total: number) => void;
  readonly shouldCancel?: () => boolean;
}

const WRAPPER_METHOD =
  "Recovery raised through Raymer's ram-recovery correction: installed thrust + engine count x C_ram x dEta x deck thrust at the same power setting and fuel flow (engine airflow's change with recovery not followed).";

/**
 * Trade factors by central differences d = (v(+h) - v(-h)) / (2h) at
 * h = 1 unit and h = 1/2 unit (block fuel v in kg, from the mission solver
 * in payload-and-range mode). When the input's solve mode is not
 * payload-and-range, it is flown once and its payload and range (in the
 * mission's distance basis)
 * become the design mission. 1 (+1) + 16 missions, on the calling thread
 * (missionPlan.ts flySerially).
 */
export function tradeFactors(input: MissionInput, options: TradeFactorOptions): Result<TradeFactorsResult, AnalysisError> {
  const total = 17 + (input.solve.kind === 'payloadRange' ? 0 : 1);
  let done = 0;
  return flySerially(tradeFactorsSteps(input, options), {
    ...(options.solve ? { solve: options.solve } : {}),
    ...(options.shouldCancel ? { shouldCancel: options.shouldCancel } : {}),
    onMission: () => options.onProgress?.(++done, total),
  });
}

const UNITS: Record<TradeFactorName, string> = {
  recovery: '+1 % inlet recovery (+0.01)',
  dragCount: '+1 drag count (CD0 + 0.0001)',
  tsfc: '+1 % TSFC (fuel flow x 1.01)',
  oew: '+100 kg OEW',
};

/**
 * The design mission with one factor moved by `u` units (null: the design
 * mission itself): recovery + 0.01 u through `recoveryModel`, else the
 * propulsion's own withRecoveryOffset, else the C_ram wrapper; CD0 + 1e-4 u;
 * fuel flow x (1 + 0.01 u); OEW + 100 u kg.
 */
export function tradeMissionInput(design: MissionInput, factor: TradeFactorName | null, u: number, cRam: number, recoveryModel?: (delta: number) => PropulsionModel): MissionInput {
  switch (factor) {
    case null:
      return design;
    case 'recovery': {
      const own = design.propulsion.withRecoveryOffset?.bind(design.propulsion);
      const model = recoveryModel ?? own ?? ((delta: number) => adjustPropulsion(design.propulsion, { recoveryDelta: delta, cRam, fuelFlowScale: 1 }));
      return { ...design, propulsion: model(0.01 * u) };
    }
    case 'dragCount':
      return { ...design, aero: design.aero.withIncrement(1e-4 * u) };
    case 'tsfc':
      return { ...design, propulsion: adjustPropulsion(design.propulsion, { recoveryDelta: 0, cRam, fuelFlowScale: 1 + 0.01 * u }) };
    case 'oew':
      return { ...design, airframe: withOew(design.airframe, design.airframe.oew_kg + 100 * u) };
  }
}

/**
 * `airframe` with another OEW, written key by key in the Airframe interface's order (as the project's builder,
 * buildMissionInput.ts, writes it): a spread copy has a shape of its own, and the mission's reads of the airframe
 * went polymorphic in a process that had flown the OEW factor.
 */
function withOew(airframe: Airframe, oew_kg: number): Airframe {
  return {
    oew_kg,
    mzfw_kg: airframe.mzfw_kg,
    mtow_kg: airframe.mtow_kg,
    mlw_kg: airframe.mlw_kg,
    maxFuel_kg: airframe.maxFuel_kg,
    wingArea_m2: airframe.wingArea_m2,
    vmo_m_s: airframe.vmo_m_s,
    mmo: airframe.mmo,
  };
}

const FACTOR_NAMES: readonly TradeFactorName[] = ['recovery', 'dragCount', 'tsfc', 'oew'];

/**
 * tradeFactors as rounds of planned missions (missionPlan.ts): the project's
 * own mission first when its mode is not payload-and-range; then the
 * baseline and each factor's steps +1/2, -1/2, +1, -1 unit, each step
 * started from the baseline and the factor's steps before it (stepStart;
 * the first cold). Options' solve, onProgress and shouldCancel are the
 * runner's.
 */
export function* tradeFactorsSteps(input: MissionInput, options: TradeFactorOptions): AnalysisSteps<Result<TradeFactorsResult, AnalysisError>> {
  const tolerance = options.tolerance ?? { rel: 0.05, abs_kg: 0.01 };
  const cRam = options.cRam ?? 1.35;
  if (!(cRam >= 0) || !Number.isFinite(cRam)) return err({ code: 'invalid_input', message: `trade factors: C_ram ${cRam} must be a number >= 0` });
  const total = 17 + (input.solve.kind === 'payloadRange' ? 0 : 1);
  let done = 0;
  const failed = (r: MissionResult, what: string): AnalysisError => ({ code: 'mission_failed', message: `trade factors: the ${what} mission failed: ${r.status}: ${r.statusMessage}` });
  const cancelled = (): Result<never, AnalysisError> => err({ code: 'cancelled', message: `trade factors cancelled after ${done} of ${total} missions` });
  let design = input;
  if (input.solve.kind !== 'payloadRange') {
    const flown = yield { missions: [{ input, after: [], lane: 0, start: () => undefined }], laneMemos: false, stopAtFailure: true };
    const first = flown.results[0];
    if (first === undefined) return cancelled();
    done++;
    if (first.status !== 'ok') return err(failed(first, 'project'));
    design = { ...input, solve: { kind: 'payloadRange', payload_kg: first.payload_kg, range_m: first.distanceBasis === 'ground' ? first.groundDistance_m : first.airDistance_m } };
  }
  // Index 0 the baseline; factor k's step j (STEP_ORDER[j]) at 1 + 4k + j, in its lane k + 1.
  const at = (k: number, j: number) => 1 + STEP_ORDER.length * k + j;
  const missions: PlannedMission[] = [{ input: design, after: [], lane: 0, start: () => undefined }];
  FACTOR_NAMES.forEach((name, k) => {
    STEP_ORDER.forEach((u, j) => {
      const before = STEP_ORDER.slice(0, j).map((_, i) => at(k, i));
      missions.push({
        input: tradeMissionInput(design, name, u, cRam, options.recoveryModel),
        // The first step starts cold (stepStart with the baseline alone): it reads nothing.
        after: j === 0 ? [] : [0, ...before],
        lane: k + 1,
        start: (results) => {
          const flown: StepMission[] = [];
          const base = results[0];
          if (base !== undefined && base.status === 'ok') flown.push({ u: 0, result: base });
          before.forEach((i, s) => {
            const r = results[i];
            if (r !== undefined && r.status === 'ok') flown.push({ u: STEP_ORDER[s]!, result: r });
          });
          return stepStart(flown, u);
        },
      });
    });
  });
  const round = yield { missions, laneMemos: false, stopAtFailure: false };
  const base = round.results[0];
  if (base === undefined) return cancelled();
  done++;
  if (base.status !== 'ok') return err(failed(base, 'baseline'));
  const factors: TradeFactor[] = [];
  for (const [k, name] of FACTOR_NAMES.entries()) {
    const byStep = new Map<number, Result<MissionResult, AnalysisError>>();
    for (const [j, u] of STEP_ORDER.entries()) {
      const r = round.results[at(k, j)];
      if (r === undefined) return cancelled();
      done++;
      byStep.set(u, r.status === 'ok' ? ok(r) : err(failed(r, `${name} ${u > 0 ? '+' : ''}${u} unit`)));
    }
    const steps = [1, -1, 0.5, -0.5].map((u) => byStep.get(u)!);
    const failures = steps.flatMap((r) => (r.ok ? [] : [r.error.message]));
    const [p1, m1, p2, m2] = steps.map((r) => (r.ok ? r.value.blockFuel_kg : null));
    const full = p1 != null && m1 != null ? (p1 - m1) / 2 : null;
    const half = p2 != null && m2 != null ? p2 - m2 : null;
    const gap = full !== null && half !== null ? Math.abs(full - half) : null;
    const converged = gap !== null && half !== null && gap <= tolerance.rel * Math.abs(half) + tolerance.abs_kg;
    factors.push({
      name,
      unit: UNITS[name],
      blockFuelPerUnit_kg: full,
      blockFuelPerUnitHalfStep_kg: half,
      relativeDifference: gap === null || half === null || half === 0 ? null : gap / Math.abs(half),
      converged,
      note:
        failures.length > 0
          ? failures.join(' ')
          : converged
            ? null
            : `The steps of 1 and 1/2 unit disagree by more than ${tolerance.rel * 100} % + ${tolerance.abs_kg} kg: block fuel is not smooth here (e.g. a step-climb or limit decision changes between the perturbed missions).`,
    });
  }
  const payloadRange = design.solve.kind === 'payloadRange' ? design.solve : null;
  return ok({
    designMission: { payload_kg: payloadRange!.payload_kg, range_m: payloadRange!.range_m },
    baselineBlockFuel_kg: base.blockFuel_kg,
    factors,
    tolerance,
    missions: done,
    recoveryMethod: options.recoveryModel
      ? "Recovery raised by the caller's propulsion model."
      : design.propulsion.withRecoveryOffset !== undefined
        ? `Recovery raised at the inlet and carried through the installation: ${describeInstallationMethod(design.propulsion.installationMethod)}; engine airflow, spillage and bleed fraction follow.`
        : WRAPPER_METHOD,
  });
}
