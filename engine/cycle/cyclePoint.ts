/**
 * One off-design point of a designed engine: flight condition, throttle
 * (a rating, a mechanical fan speed or a turbine inlet temperature) and
 * installation (inlet recovery at the fan face, customer bleed off the
 * compressor exit, shaft power off the HP spool). A rating's throttle is the
 * highest that respects its limits (with the hard limits), found by matching
 * at one limit after another until none is exceeded. Never throws, never
 * returns NaN: a point that cannot be matched comes back with its status
 * and a message.
 */
import type { RatingName } from '../propulsion/propulsionModel';
import type { CycleEngine } from './cycleEngine';
import type { LimitName } from './cycleSpec';
import type { CycleState } from './cycleState';
import { freeStream, type FreeStream } from './freeStream';
import { LIMIT_UNITS, limitQuantity, limitsInForce, type ActiveLimit } from './limitSchedule';
import type { Installation, ThrottleEquation } from './offDesign';
import { spoolSpeeds } from './spoolSpeeds';
import { stationTable, type StationRow } from './stationTable';
import { solveThrottle, type ThrottleOutcome } from './throttleSolve';

export type CycleThrottle =
  | { readonly kind: 'rating'; readonly rating: RatingName }
  /** Mechanical fan (LP) speed N1 as a fraction of design. */
  | { readonly kind: 'fanSpeed'; readonly fraction: number }
  | { readonly kind: 'turbineInletTemperature'; readonly value_K: number };

/** A converged point's unknowns, to start a neighbouring point of the same throttle quantity. */
export interface CycleWarmStart {
  readonly quantity: LimitName;
  readonly unknowns: readonly number[];
}

export interface CyclePointRequest {
  /** Pressure altitude (m). */
  readonly altitude_m: number;
  readonly mach: number;
  readonly isaDeviation_K: number;
  readonly throttle: CycleThrottle;
  /** Fan-face over free-stream total pressure; default the spec's design recovery. */
  readonly recovery?: number;
  /** Customer bleed off the compressor exit, fraction of core flow; default the spec's design bleed. */
  readonly bleedFraction?: number;
  /** Shaft power off the HP spool (W); default the spec's design extraction. */
  readonly powerExtraction_W?: number;
  readonly start?: CycleWarmStart;
}

export type CyclePointStatus = 'converged' | 'not_converged' | 'limit_unreachable' | 'invalid_condition' | 'unknown_rating';

export interface CyclePointResult {
  readonly status: CyclePointStatus;
  readonly message: string;
  /** Largest scaled residual of the match (null when no match was tried). */
  readonly residual: number | null;
  readonly iterations: number;
  /** Residual evaluations the point cost, all attempts and limits included (the cost measure for callers). */
  readonly evaluations: number;
  readonly thrust_N: number | null;
  readonly fuelFlow_kg_s: number | null;
  /** Total engine airflow, core plus bypass (kg/s). */
  readonly airflow_kg_s: number | null;
  readonly tsfc_kg_N_s: number | null;
  /** Mechanical N1, fraction of design. */
  readonly fanSpeed: number | null;
  /** N1 / sqrt(theta2), fraction of design. */
  readonly fanCorrectedSpeed: number | null;
  /** Mechanical N2, fraction of design. */
  readonly coreSpeed: number | null;
  readonly turbineInletTemperature_K: number | null;
  readonly bypassRatio: number | null;
  readonly fanPressureRatio: number | null;
  /** Pt3 / Pt2. */
  readonly overallPressureRatio: number | null;
  /** The limit holding a rating's throttle (null for a fixed setting). */
  readonly activeLimit: LimitName | null;
  /** Hard limits a fixed setting exceeds (a rating never exceeds its limits). */
  readonly exceededLimits: readonly LimitName[];
  /** Where a converged point stretches the model's assumptions (empty otherwise). */
  readonly cautions: readonly CycleCaution[];
  readonly recovery: number;
  readonly bleedFraction: number;
  readonly powerExtraction_W: number;
  readonly stations: readonly StationRow[];
  readonly state: CycleState | null;
  readonly start: CycleWarmStart | null;
}

const LIMIT_TOLERANCE = 1e-9;

/** LP turbine expansion ratio below which its choked-nozzle-guide-vane assumption is weak (a caution, not a refusal). */
export const MIN_CHOKED_LPT_EXPANSION = 1.5;

export type CycleCautionCode = 'lp_turbine_unchoking' | 'thrust_not_positive';

/** A converged point where the model's assumptions are stretched. */
export interface CycleCaution {
  readonly code: CycleCautionCode;
  readonly message: string;
}

function cautionsOf(s: CycleState): CycleCaution[] {
  const out: CycleCaution[] = [];
  if (s.lptExpansionRatio < MIN_CHOKED_LPT_EXPANSION) {
    out.push({
      code: 'lp_turbine_unchoking',
      message: `LP turbine expansion ratio ${s.lptExpansionRatio.toFixed(3)} is below ${MIN_CHOKED_LPT_EXPANSION}: its guide vanes are unlikely to be choked, so the choked-turbine match is only indicative here (sub-idle)`,
    });
  }
  if (!(s.thrust_N > 0)) out.push({ code: 'thrust_not_positive', message: `net thrust ${s.thrust_N.toFixed(0)} N is not positive (windmilling or sub-idle setting)` });
  return out;
}

function failed(status: CyclePointStatus, message: string, inst: Installation, residual: number | null = null, iterations = 0, evaluations = 0): CyclePointResult {
  return {
    status,
    message,
    residual,
    iterations,
    evaluations,
    thrust_N: null,
    fuelFlow_kg_s: null,
    airflow_kg_s: null,
    tsfc_kg_N_s: null,
    fanSpeed: null,
    fanCorrectedSpeed: null,
    coreSpeed: null,
    turbineInletTemperature_K: null,
    bypassRatio: null,
    fanPressureRatio: null,
    overallPressureRatio: null,
    activeLimit: null,
    exceededLimits: [],
    cautions: [],
    recovery: inst.recovery,
    bleedFraction: inst.bleedFraction,
    powerExtraction_W: inst.powerExtraction_W,
    stations: [],
    state: null,
    start: null,
  };
}

function exceededHardLimits(engine: CycleEngine, state: CycleState): LimitName[] {
  const out: LimitName[] = [];
  for (const l of limitsInForce(engine.spec.limits, {}, state.free.t0_K)) {
    if (limitQuantity(engine, state, l.name) > l.max * (1 + LIMIT_TOLERANCE)) out.push(l.name);
  }
  return out;
}

function converged(engine: CycleEngine, o: ThrottleOutcome, quantity: LimitName, inst: Installation, activeLimit: LimitName | null, message: string): CyclePointResult {
  const s = o.state!;
  const speeds = spoolSpeeds(engine, s);
  return {
    status: 'converged',
    message,
    residual: o.residual,
    iterations: o.iterations,
    evaluations: o.evaluations,
    thrust_N: s.thrust_N,
    fuelFlow_kg_s: s.fuelFlow_kg_s,
    airflow_kg_s: s.totalFlow_kg_s,
    tsfc_kg_N_s: s.thrust_N > 0 ? s.fuelFlow_kg_s / s.thrust_N : null,
    fanSpeed: speeds.fanSpeed,
    fanCorrectedSpeed: speeds.fanCorrectedSpeed,
    coreSpeed: speeds.coreSpeed,
    turbineInletTemperature_K: s.variables.tt4_K,
    bypassRatio: s.variables.bypassRatio,
    fanPressureRatio: s.fanPressureRatio,
    overallPressureRatio: s.pt3_Pa / s.pt2_Pa,
    activeLimit,
    exceededLimits: activeLimit === null ? exceededHardLimits(engine, s) : [],
    cautions: cautionsOf(s),
    recovery: inst.recovery,
    bleedFraction: inst.bleedFraction,
    powerExtraction_W: inst.powerExtraction_W,
    stations: stationTable(s),
    state: s,
    start: { quantity, unknowns: Array.from(o.unknowns) },
  };
}

function unmatched(o: ThrottleOutcome, throttle: ThrottleEquation, inst: Installation): CyclePointResult {
  if (o.reached !== null) {
    return failed(
      'limit_unreachable',
      `${throttle.quantity} ${throttle.value} ${LIMIT_UNITS[throttle.quantity]} could not be matched; the nearest matched setting was ${o.reached.toPrecision(6)} (${o.reason})`,
      inst,
      o.residual,
      o.iterations,
      o.evaluations,
    );
  }
  return failed('not_converged', `the engine did not match at ${throttle.quantity} ${throttle.value} ${LIMIT_UNITS[throttle.quantity]}: ${o.reason} (residual ${o.residual.toExponential(2)})`, inst, Number.isFinite(o.residual) ? o.residual : null, o.iterations, o.evaluations);
}

function fixedSetting(engine: CycleEngine, free: FreeStream, inst: Installation, throttle: ThrottleEquation, start: CycleWarmStart | undefined, label: string): CyclePointResult {
  const o = solveThrottle(engine, free, inst, throttle, start?.quantity === throttle.quantity ? start.unknowns : undefined);
  if (!o.converged || o.state === null) return unmatched(o, throttle, inst);
  return converged(engine, o, throttle.quantity, inst, null, `matched at ${label}`);
}

/** The highest throttle within the limits: match at a limit; if another is exceeded, match at the worst one; repeat. */
function limitedRating(engine: CycleEngine, free: FreeStream, inst: Installation, limits: readonly ActiveLimit[], rating: string, start: CycleWarmStart | undefined): CyclePointResult {
  // A warm start names the limit that held the neighbouring point: try it first.
  const first = limits.find((l) => l.name === start?.quantity) ?? limits.find((l) => l.name === 'turbineInletTemperature') ?? limits[0]!;
  let candidate: ActiveLimit = first;
  const tried = new Set<LimitName>();
  let lastFailure: CyclePointResult | null = null;
  let spent = 0;
  for (let round = 0; round <= limits.length; round++) {
    tried.add(candidate.name);
    const throttle = { quantity: candidate.name, value: candidate.max };
    const solved = solveThrottle(engine, free, inst, throttle, start?.quantity === candidate.name ? start.unknowns : undefined);
    spent += solved.evaluations;
    const o = { ...solved, evaluations: spent };
    let worst: ActiveLimit | null = null;
    let worstRatio = 1 + LIMIT_TOLERANCE;
    if (o.converged && o.state !== null) {
      for (const l of limits) {
        const ratio = limitQuantity(engine, o.state, l.name) / l.max;
        if (ratio > worstRatio) {
          worst = l;
          worstRatio = ratio;
        }
      }
      if (worst === null) return converged(engine, o, candidate.name, inst, candidate.name, `${rating}: held by ${candidate.name} at ${Number(candidate.max.toPrecision(6))} ${LIMIT_UNITS[candidate.name]}`);
    } else {
      lastFailure = unmatched(o, throttle, inst);
      worst = limits.find((l) => !tried.has(l.name)) ?? null;
    }
    if (worst === null || tried.has(worst.name)) break;
    candidate = worst;
  }
  return lastFailure ?? failed('not_converged', `${rating}: no throttle satisfies every limit at once`, inst, null, 0, spent);
}

function checkRequest(engine: CycleEngine, r: CyclePointRequest, inst: Installation): string | null {
  if (!(Number.isFinite(inst.recovery) && inst.recovery > 0.3 && inst.recovery <= 1)) return `inlet recovery ${inst.recovery} is outside (0.3, 1]`;
  if (!(Number.isFinite(inst.bleedFraction) && inst.bleedFraction >= 0 && inst.bleedFraction < 0.3)) return `bleed fraction ${inst.bleedFraction} is outside [0, 0.3)`;
  if (!(Number.isFinite(inst.powerExtraction_W) && inst.powerExtraction_W >= 0)) return `power extraction ${inst.powerExtraction_W} W is not a finite non-negative power`;
  const t = r.throttle;
  if (t.kind === 'fanSpeed' && !(Number.isFinite(t.fraction) && t.fraction > 0 && t.fraction <= 1.5)) return `fan speed ${t.fraction} is outside (0, 1.5] of design`;
  if (t.kind === 'turbineInletTemperature' && !(Number.isFinite(t.value_K) && t.value_K > 0 && t.value_K < 2500)) return `turbine inlet temperature ${t.value_K} K is outside (0, 2500) K`;
  void engine;
  return null;
}

/** Runs the engine at one point; see CyclePointResult for what comes back. */
export function runCyclePoint(engine: CycleEngine, request: CyclePointRequest): CyclePointResult {
  const d = engine.spec.design;
  const inst: Installation = {
    recovery: request.recovery ?? d.inletRecovery,
    bleedFraction: request.bleedFraction ?? d.bleedFraction,
    powerExtraction_W: request.powerExtraction_W ?? d.powerExtraction_W,
  };
  const problem = checkRequest(engine, request, inst);
  if (problem) return failed('invalid_condition', problem, inst);
  const free = freeStream(engine.constants.cold, request.altitude_m, request.mach, request.isaDeviation_K);
  if (!free.ok) return failed('invalid_condition', free.error, inst);
  const t = request.throttle;
  switch (t.kind) {
    case 'turbineInletTemperature':
      return fixedSetting(engine, free.value, inst, { quantity: 'turbineInletTemperature', value: t.value_K }, request.start, `turbine inlet temperature ${t.value_K} K`);
    case 'fanSpeed':
      return fixedSetting(engine, free.value, inst, { quantity: 'fanSpeed', value: t.fraction }, request.start, `fan speed ${t.fraction} of design`);
    case 'rating': {
      const rating = engine.spec.ratings[t.rating];
      if (rating === undefined) {
        const known = Object.keys(engine.spec.ratings);
        return failed('unknown_rating', `the cycle has no rating "${t.rating}" (it has ${known.length ? known.join(', ') : 'none'})`, inst);
      }
      if (rating.kind === 'fanSpeed' || rating.kind === 'fanCorrectedSpeed') {
        return fixedSetting(engine, free.value, inst, { quantity: rating.kind, value: rating.fraction }, request.start, `${t.rating} (${rating.kind} ${rating.fraction} of design)`);
      }
      const limits = limitsInForce(engine.spec.limits, rating.limits, free.value.t0_K);
      if (limits.length === 0) return failed('invalid_condition', `rating ${t.rating} has no limit to set its throttle`, inst);
      return limitedRating(engine, free.value, inst, limits, t.rating, request.start);
    }
  }
}
