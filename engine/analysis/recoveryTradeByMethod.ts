/**
 * The +1 % recovery trade factor computed by each recovery method side by
 * side: the check of Raymer's rule against the deck's own sensitivities and
 * against the cycle. Each method's mission input is built by the caller
 * (engine/project/recoveryMethodVariants.ts); recovery is raised through the
 * installation itself (the propulsion model's withRecoveryOffset: engine
 * airflow, spillage and bleed fraction follow), by central differences at
 * steps of 1 and 1/2 point of recovery, on the design mission (payload and
 * range; another solve mode is flown once to fix them).
 */
import { err, ok, type Result } from '../core/result';
import type { MissionInput } from '../mission/missionTypes';
import type { AnalysisError, MissionSolver } from './analysisTypes';
import { analysisSolver, STEP_ORDER, stepStart, type StepMission } from './warmStart';

export interface RecoveryMethodCase {
  readonly id: string;
  readonly label: string;
  /** The mission input flown with this method, or why the method does not apply (e.g. the deck has no sensitivities). */
  readonly input: MissionInput | { readonly unavailable: string };
}

export interface RecoveryTradeRow {
  readonly id: string;
  readonly label: string;
  /** d(block fuel) per +1 % recovery (+0.01) with a step of 0.01 (kg); null when unavailable or a mission failed. */
  readonly blockFuelPerPercent_kg: number | null;
  /** The same with a step of 0.005 (kg). */
  readonly halfStep_kg: number | null;
  readonly converged: boolean;
  /** Baseline block fuel with this method (kg); methods differ by how they treat the inlet's own shortfall too. */
  readonly baselineBlockFuel_kg: number | null;
  /** Why a value is missing or the steps disagree; null otherwise. */
  readonly note: string | null;
}

export interface RecoveryTradeByMethod {
  readonly rows: readonly RecoveryTradeRow[];
  /** Each row relative to the first available (Raymer's) row (-), null where either is missing. */
  readonly relativeToFirst: readonly (number | null)[];
  /** Missions flown here (the design mission and four steps per case flown). */
  readonly missions: number;
  /** Ids of the cases taken from options.reuse, not flown here. */
  readonly reused: readonly string[];
  readonly description: string;
}

export const RECOVERY_TRADE_DESCRIPTION =
  "+1 % recovery (+0.01 on the inlet's recovery at every Mach) carried through the installation by each method, central differences at steps of 0.01 and 0.005 on the design mission; agreement within 5 % + 0.01 kg counts as converged.";

/**
 * A case's trade already computed on the same mission input (the trade
 * factors' recovery factor when the case is the project's own method):
 * design-mission block fuel and the differences at both steps (kg).
 */
export interface KnownRecoveryTrade {
  readonly baselineBlockFuel_kg: number;
  readonly blockFuelPerPercent_kg: number;
  readonly halfStep_kg: number;
}

export interface RecoveryTradeOptions {
  /** Mission solver; default warmStart.ts analysisSolver (solveMission started from neighbours, no time history). */
  readonly solve?: MissionSolver;
  /** A case already computed elsewhere on the same input (its row is taken, not flown again); undefined to fly it. */
  readonly reuse?: (c: RecoveryMethodCase) => KnownRecoveryTrade | undefined;
  readonly onProgress?: (done: number, total: number) => void;
  readonly shouldCancel?: () => boolean;
}

const DISAGREE = 'the steps of 0.01 and 0.005 disagree by more than 5 %: block fuel is not smooth here';

/** The steps agree: |d(1) - d(1/2)| <= 5 % |d(1/2)| + 0.01 kg (as tradeFactors' default tolerance). */
function agree(full: number, half: number): boolean {
  return Math.abs(full - half) <= 0.05 * Math.abs(half) + 0.01;
}

/** The trade factor of each case; unavailable cases get a row saying why. */
export function recoveryTradeByMethod(
  cases: readonly RecoveryMethodCase[],
  options: RecoveryTradeOptions = {},
): Result<RecoveryTradeByMethod, AnalysisError> {
  const solve: MissionSolver = options.solve ?? analysisSolver();
  const known = new Map<string, KnownRecoveryTrade>();
  for (const c of cases) {
    const k = 'unavailable' in c.input ? undefined : options.reuse?.(c);
    if (k !== undefined) known.set(c.id, k);
  }
  // Five missions a case flown: the design mission and four steps.
  const total = 5 * cases.filter((c) => !('unavailable' in c.input) && !known.has(c.id)).length;
  let done = 0;
  const rows: RecoveryTradeRow[] = [];
  for (const c of cases) {
    if ('unavailable' in c.input) {
      rows.push({ id: c.id, label: c.label, blockFuelPerPercent_kg: null, halfStep_kg: null, converged: false, baselineBlockFuel_kg: null, note: c.input.unavailable });
      continue;
    }
    const reused = known.get(c.id);
    if (reused !== undefined) {
      const converged = agree(reused.blockFuelPerPercent_kg, reused.halfStep_kg);
      rows.push({ id: c.id, label: c.label, ...reused, converged, note: converged ? null : DISAGREE });
      continue;
    }
    const base: MissionInput = c.input;
    const flown: StepMission[] = [];
    const fly = (m: MissionInput, u: number): number | string => {
      const r = solve(m, stepStart(flown, u));
      done++;
      options.onProgress?.(done, total);
      if (r.status === 'ok') flown.push({ u, result: r });
      return r.status === 'ok' ? r.blockFuel_kg : `${r.status}: ${r.statusMessage}`;
    };
    if (options.shouldCancel?.()) return err({ code: 'cancelled', message: `recovery trade cancelled after ${done} of ${total} missions` });
    let design = base;
    const first = solve(base);
    done++;
    options.onProgress?.(done, total);
    if (first.status !== 'ok') {
      rows.push({ id: c.id, label: c.label, blockFuelPerPercent_kg: null, halfStep_kg: null, converged: false, baselineBlockFuel_kg: null, note: `the design mission failed: ${first.status}: ${first.statusMessage}` });
      continue;
    }
    if (base.solve.kind !== 'payloadRange') design = { ...base, solve: { kind: 'payloadRange', payload_kg: first.payload_kg, range_m: first.airDistance_m } };
    const offset = design.propulsion.withRecoveryOffset;
    if (offset === undefined) {
      rows.push({ id: c.id, label: c.label, blockFuelPerPercent_kg: null, halfStep_kg: null, converged: false, baselineBlockFuel_kg: first.blockFuel_kg, note: 'this propulsion model cannot raise its recovery' });
      continue;
    }
    // Steps of 1/2 and 1 point of recovery, flown in STEP_ORDER from the design mission (warmStart.ts stepStart).
    // The design mission is the baseline of the steps when it was flown in payload-and-range mode.
    if (design === base) flown.push({ u: 0, result: first });
    const byStep = new Map<number, number | string>();
    for (const u of STEP_ORDER) {
      if (options.shouldCancel?.()) {
        byStep.set(u, 'cancelled');
        break;
      }
      byStep.set(u, fly({ ...design, propulsion: offset.call(design.propulsion, 0.01 * u) }, u));
    }
    const values = [1, -1, 0.5, -0.5].map((u) => byStep.get(u) ?? 'cancelled');
    if (values.includes('cancelled')) return err({ code: 'cancelled', message: `recovery trade cancelled after ${done} of ${total} missions` });
    const failed = values.find((v) => typeof v === 'string');
    const [p1, m1, p2, m2] = values as number[];
    const full = typeof failed === 'string' ? null : (p1! - m1!) / 2;
    const half = typeof failed === 'string' ? null : p2! - m2!;
    const converged = full !== null && half !== null && agree(full, half);
    rows.push({
      id: c.id,
      label: c.label,
      blockFuelPerPercent_kg: full,
      halfStep_kg: half,
      converged,
      baselineBlockFuel_kg: first.blockFuel_kg,
      note: typeof failed === 'string' ? `a perturbed mission failed: ${failed}` : converged ? null : DISAGREE,
    });
  }
  const reference = rows.find((r) => r.blockFuelPerPercent_kg !== null)?.blockFuelPerPercent_kg ?? null;
  return ok({
    rows,
    relativeToFirst: rows.map((r) => (r.blockFuelPerPercent_kg === null || reference === null || reference === 0 ? null : r.blockFuelPerPercent_kg / reference - 1)),
    missions: done,
    reused: [...known.keys()],
    description: RECOVERY_TRADE_DESCRIPTION,
  });
}
