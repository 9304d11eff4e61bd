/**
 * Thrust-drag crossover at one altitude, mass and rating: the curves of
 * thrust available and drag over Mach, the low and high Machs where they
 * cross, the level-flight band inside every limit (low: the highest of stall,
 * buffet onset and the low crossover; high: the lowest of the high crossover
 * and MMO / VMO; each says which binds), the Mach of least thrust available
 * (where ram recovery starts to win back the lapse), and the Machs of
 * greatest excess thrust and greatest specific excess power.
 */
import type { Caution } from '../cautions/caution';
import { err, ok, type Result } from '../core/result';
import { RATING_LABEL, type RatingName } from '../propulsion/propulsionModel';
import type { AnalysisError, PerformanceModels } from './analysisTypes';
import { machFromCas } from '../aero/airspeeds';
import { liftLimitMachs } from './liftLimitMach';
import { airAt, levelPoint, type LevelPoint } from './pointState';
import { brentMaximum } from '../core/scalarMaximum';
import { maximizeOnGrid, minimizeOnGrid, rootsOnPoints, uniformGrid } from './scalarSearch';
import { messageText, msg, q, withParts, type MessageParts } from '../units/messageParts';

export interface CrossoverQuery {
  /** Pressure altitude (m). */
  readonly altitude_m: number;
  readonly mass_kg: number;
  readonly rating: RatingName;
  /** ISA temperature deviation (K). */
  readonly isaDev_K: number;
  /** Mach scan range; default [0.1, 0.95]. The low end is raised to the stall Mach. */
  readonly machRange?: readonly [number, number];
  /** Curve points; default 81, at least 5. */
  readonly samples?: number;
  /** VMO (CAS, m/s) and MMO (-) for the high-speed limit; omitted = the limit is the crossover (or the scan end). */
  readonly speedLimits?: { readonly vmo_m_s: number; readonly mmo: number };
}

/** What sets a level-flight speed limit. */
export type LowSpeedLimitSource = 'stall' | 'buffetOnset' | 'crossover' | 'scanStart';
export type HighSpeedLimitSource = 'crossover' | 'mmo' | 'vmo' | 'scanEnd';

/**
 * A level-flight speed limit at the altitude and mass: the low-speed limit is the highest of the stall Mach
 * (CLmax at 1 g), the buffet-onset Mach (buffet CL at 1 g) and the low crossover; the high-speed limit the lowest
 * of the high crossover and MMO / the Mach of VMO. `source` says which binds.
 */
export interface SpeedLimit<S> {
  readonly mach: number;
  readonly source: S;
}

/** Words for each limit source (messages and the CLI). */
export const SPEED_LIMIT_SOURCE_TEXT: Readonly<Record<LowSpeedLimitSource | HighSpeedLimitSource, string>> = {
  stall: 'stall, CLmax at 1 g',
  buffetOnset: 'buffet onset at 1 g',
  crossover: 'thrust-drag crossover',
  scanStart: 'scan start',
  scanEnd: 'scan end',
  mmo: 'MMO',
  vmo: 'VMO',
};

export interface CrossoverCurves {
  readonly mach: readonly number[];
  readonly thrustAvailable_N: readonly number[];
  readonly drag_N: readonly number[];
  readonly excessThrust_N: readonly number[];
  readonly specificExcessPower_m_s: readonly number[];
}

export type CrossoverStatus = 'ok' | 'above_ceiling';

export interface CrossoverResult {
  readonly status: CrossoverStatus;
  /** One readable sentence on the result (above the ceiling: says so for this mass). */
  readonly message: string;
  /** The message with its numbers as quantities (messageText(parts, units)). */
  readonly parts: MessageParts;
  readonly altitude_m: number;
  readonly mass_kg: number;
  readonly rating: RatingName;
  readonly isaDev_K: number;
  /** Mach at which CL at 1 g reaches CLmax; null when below the scan start. */
  readonly stallMach: number | null;
  /** Low-speed buffet onset at 1 g (buffet CL of the polar); null when below the scan start or never reached. */
  readonly buffetOnsetMach: number | null;
  /** The lower of MMO and the Mach of VMO at this altitude (null without speed limits). */
  readonly speedLimitMach: number | null;
  /** The level-flight band inside every limit; null when above the ceiling or when the limits leave no band. */
  readonly lowSpeedLimit: SpeedLimit<LowSpeedLimitSource> | null;
  readonly highSpeedLimit: SpeedLimit<HighSpeedLimitSource> | null;
  /** Mach range actually considered: [max(scan start, stall Mach), scan end]. */
  readonly machRange: readonly [number, number];
  /** Low-speed crossover (T = D, excess thrust rising); null when thrust exceeds drag at the low end of the range. */
  readonly lowMach: number | null;
  /** High-speed crossover (T = D, excess thrust falling); null when thrust exceeds drag at the high end. */
  readonly highMach: number | null;
  /** Every crossing found, ascending. */
  readonly crossings: readonly number[];
  /** Mach of least thrust available; null when thrust is monotone over the range. */
  readonly minThrustMach: number | null;
  /** Mach of greatest excess thrust and that excess (N); null when CL at 1 g exceeds CLmax over the whole range. */
  readonly maxExcessThrustMach: number | null;
  readonly maxExcessThrust_N: number | null;
  /** Mach of greatest Ps (best steady climb at constant TAS) and that Ps (m/s); null as above. */
  readonly bestClimbMach: number | null;
  readonly maxSpecificExcessPower_m_s: number | null;
  readonly curves: CrossoverCurves;
  /** Root tolerances: Mach (-) and |T - D| / D (-) at each crossing. */
  readonly tolerance: { readonly mach: number; readonly relativeThrust: number };
  /** Cautions raised by the thrust lookups at the crossings and the range ends. */
  readonly cautions: readonly Caution[];
}

/**
 * Mach tolerance of the crossover roots (-). The extrema (least thrust, most
 * excess thrust, best climb) use it as the golden-section stopping width, but
 * a flat extremum is located only to about sqrt(machine epsilon), ~1e-8.
 */
export const CROSSOVER_MACH_TOL = 1e-10;
/** Stated bound on |T - D| / D at a reported crossover (-). */
export const CROSSOVER_RELATIVE_THRUST_TOL = 1e-6;

function validate(query: CrossoverQuery): string | null {
  const [lo, hi] = query.machRange ?? [0.1, 0.95];
  if (!Number.isFinite(query.altitude_m)) return `altitude ${query.altitude_m} m is not a finite number`;
  if (!(query.mass_kg > 0) || !Number.isFinite(query.mass_kg)) return `mass ${query.mass_kg} kg must be a positive number`;
  if (!Number.isFinite(query.isaDev_K)) return `ISA deviation ${query.isaDev_K} K is not a finite number`;
  if (!(lo > 0) || !(hi > lo) || !Number.isFinite(hi)) return `Mach range [${lo}, ${hi}] must satisfy 0 < low < high`;
  const n = query.samples ?? 81;
  if (!Number.isInteger(n) || n < 5) return `samples ${n} must be an integer of at least 5`;
  return null;
}

function uniqueCautions(lists: readonly (readonly Caution[])[]): Caution[] {
  const seen = new Set<string>();
  const out: Caution[] = [];
  for (const list of lists) {
    for (const c of list) {
      if (!seen.has(c.id)) {
        seen.add(c.id);
        out.push(c);
      }
    }
  }
  return out;
}

/**
 * What the crossover and the climb-peak search share at one altitude: the
 * checked query, the air, the stall Mach, the Mach range considered and the
 * level-flight point at a Mach, kept by Mach so the grid each search samples
 * is computed once (the models are pure, so a kept point is the point).
 */
interface MachScan {
  readonly air: { readonly speedOfSound_m_s: number; readonly pressure_Pa: number };
  readonly scanLo: number;
  readonly scanHi: number;
  readonly samples: number;
  readonly stallMach: number | null;
  /** True when CL at 1 g exceeds CLmax over the whole scan (no level flight). */
  readonly stalledEverywhere: boolean;
  readonly lo: number;
  readonly hi: number;
  readonly point: (mach: number) => LevelPoint;
}

function machScan(models: PerformanceModels, query: CrossoverQuery): Result<MachScan, AnalysisError> {
  const bad = validate(query);
  if (bad !== null) return err({ code: 'invalid_input', message: `crossover: ${bad}` });
  const air = airAt(query.altitude_m, query.isaDev_K);
  if (!air.ok) return air;
  const [scanLo, scanHi] = query.machRange ?? [0.1, 0.95];
  const samples = query.samples ?? 81;
  const conditions = { altitude_m: query.altitude_m, mass_kg: query.mass_kg, rating: query.rating, isaDev_K: query.isaDev_K };
  const stall = liftLimitMachs(models.aero, { altitude_m: query.altitude_m, mass_kg: query.mass_kg, loadFactor: 1 }, 'clMax', Math.min(0.02, scanLo), scanHi);
  const stallMach = stall.exceededEverywhere ? null : stall.lowMach;
  const a = air.value.speedOfSound_m_s;
  const kept = new Map<number, LevelPoint>();
  const point = (mach: number): LevelPoint => {
    let p = kept.get(mach);
    if (p === undefined) {
      p = levelPoint(models, conditions, a, mach);
      kept.set(mach, p);
    }
    return p;
  };
  return ok({
    air: air.value,
    scanLo,
    scanHi,
    samples,
    stallMach,
    stalledEverywhere: stall.exceededEverywhere,
    lo: Math.max(scanLo, stallMach ?? scanLo),
    hi: scanHi,
    point,
  });
}

/** The greatest steady climb rate over Mach at one altitude, mass and rating, as thrustDragCrossover reports it. */
export interface ClimbPeak {
  /** Mach of greatest Ps and that Ps (m/s); null when CL at 1 g exceeds CLmax over the whole range. */
  readonly bestClimbMach: number | null;
  readonly maxSpecificExcessPower_m_s: number | null;
  /**
   * True when the peak was not searched because a sample of the local window already reached climbPeak's
   * `clearAbove`: the Mach is that sample's and the Ps a lower bound of the greatest (at least clearAbove).
   */
  readonly lowerBound?: true;
}

/** Greatest Ps on the scan's grid refined by golden sections; null when Ps is nowhere finite. */
function peakOf(scan: MachScan): { readonly x: number; readonly fx: number } | null {
  return maximizeOnGrid((mach) => scan.point(mach).specificExcessPower_m_s, scan.lo, scan.hi, scan.samples, CROSSOVER_MACH_TOL);
}

/** Mach margin (-) around the expected best-climb Machs of a local peak search, its grid and the check grid over the scan. */
const LOCAL_MARGIN = 0.03;
const LOCAL_SAMPLES = 9;
const CHECK_SAMPLES = 11;
/**
 * Final bracket width (-) of a local peak search (Brent's method): the
 * peak's Ps is then within about Ps'' x 1e-12 of the true one (flat
 * maximum), far inside any ceiling tolerance; its Mach is good to 1e-6.
 */
export const LOCAL_PEAK_MACH_TOL = 1e-6;

/**
 * The climb peak searched only near the Machs [m1, m2] where it is expected
 * (the best-climb Machs of neighbouring altitudes): a grid of LOCAL_SAMPLES
 * over [m1 - LOCAL_MARGIN, m2 + LOCAL_MARGIN] within the scan, then Brent's
 * method (parabolic steps safeguarded by golden sections,
 * engine/core/scalarMaximum.ts) to LOCAL_PEAK_MACH_TOL. Null (search the
 * whole scan) when the best sample lies on the window's edge (the hump may
 * continue outside it), when a coarse check grid of CHECK_SAMPLES over the
 * whole scan finds a higher Ps elsewhere (another hump), or when Ps is not
 * finite there. With `clearAbove`, a best sample at least that high is
 * returned as it is (`bound`: a lower bound of the greatest Ps).
 */
function localPeak(scan: MachScan, near: readonly [number, number], clearAbove?: number): { readonly x: number; readonly fx: number; readonly bound: boolean } | null {
  const a = Math.max(scan.lo, Math.min(near[0], near[1]) - LOCAL_MARGIN);
  const b = Math.min(scan.hi, Math.max(near[0], near[1]) + LOCAL_MARGIN);
  if (!(b > a) || !Number.isFinite(a) || !Number.isFinite(b)) return null;
  const ps = (mach: number) => scan.point(mach).specificExcessPower_m_s;
  const xs = uniformGrid(a, b, LOCAL_SAMPLES);
  let best = -1;
  let bestF = -Infinity;
  xs.forEach((x, i) => {
    const v = ps(x);
    if (Number.isFinite(v) && v > bestF) {
      bestF = v;
      best = i;
    }
  });
  // Any sample is a lower bound of the greatest Ps, whatever the shape of the curve.
  if (best >= 0 && clearAbove !== undefined && bestF >= clearAbove) return { x: xs[best]!, fx: bestF, bound: true };
  if (best < 0 || (best === 0 && a > scan.lo) || (best === xs.length - 1 && b < scan.hi)) return null;
  if (uniformGrid(scan.lo, scan.hi, CHECK_SAMPLES).some((x) => ps(x) > bestF)) return null;
  const peak = brentMaximum(ps, xs[Math.max(0, best - 1)]!, xs[Math.min(xs.length - 1, best + 1)]!, xs[best]!, bestF, LOCAL_PEAK_MACH_TOL);
  return { ...peak, bound: false };
}

/** The no_solution error of a scan where thrust or drag is nowhere finite. */
function notFinite(query: CrossoverQuery, scan: MachScan): Result<never, AnalysisError> {
  return err({ code: 'no_solution', message: `crossover at ${query.altitude_m} m: thrust or drag is not finite anywhere in Mach [${scan.lo}, ${scan.hi}]` });
}

/**
 * Only the climb peak of thrustDragCrossover (its bestClimbMach and
 * maxSpecificExcessPower_m_s, the same search on the same grid, so the same
 * numbers) and its errors, without the crossings, extremes of thrust and
 * curves: what a ceiling search needs at each altitude it tries. With
 * `near`, the peak is searched near those Machs first (localPeak); with
 * `clearAbove` as well, a window sample whose Ps reaches it ends the search
 * there (`lowerBound`: the greatest Ps is at least that much), for an
 * altitude that only has to be known to climb at least that fast.
 */
export function climbPeak(models: PerformanceModels, query: CrossoverQuery, near?: readonly [number, number], clearAbove?: number): Result<ClimbPeak, AnalysisError> {
  const s = machScan(models, query);
  if (!s.ok) return s;
  const scan = s.value;
  if (scan.stalledEverywhere) return ok({ bestClimbMach: null, maxSpecificExcessPower_m_s: null });
  if (near !== undefined) {
    const local = localPeak(scan, near, clearAbove);
    if (local !== null) return ok(local.bound ? { bestClimbMach: local.x, maxSpecificExcessPower_m_s: local.fx, lowerBound: true } : { bestClimbMach: local.x, maxSpecificExcessPower_m_s: local.fx });
  }
  const peak = peakOf(scan);
  // thrustDragCrossover fails when Ps or thrust is nowhere finite on the grid (Ps is finite wherever thrust and drag are).
  if (peak === null || !uniformGrid(scan.lo, scan.hi, scan.samples).some((m) => Number.isFinite(scan.point(m).thrustAvailable_N))) return notFinite(query, scan);
  return ok({ bestClimbMach: peak.x, maxSpecificExcessPower_m_s: peak.fx });
}

/**
 * Level-flight thrust-drag crossover (thrust-required vs thrust-available
 * curves: Anderson, Aircraft Performance and Design, ch. 5). Crossings are
 * bracketed on the Mach grid (plus the Mach of greatest excess thrust, so a
 * narrow band near the ceiling is not missed) and refined by Brent's method
 * to CROSSOVER_MACH_TOL. Mass in kg, altitude in m, Mach 0.05..~1. Returns
 * `above_ceiling` status (not an error) when thrust never reaches drag.
 */
export function thrustDragCrossover(
  models: PerformanceModels,
  query: CrossoverQuery,
): Result<CrossoverResult, AnalysisError> {
  const s = machScan(models, query);
  if (!s.ok) return s;
  const scan = s.value;
  const { air, scanLo, scanHi, samples, stallMach } = scan;
  const base = {
    altitude_m: query.altitude_m,
    mass_kg: query.mass_kg,
    rating: query.rating,
    isaDev_K: query.isaDev_K,
    tolerance: { mach: CROSSOVER_MACH_TOL, relativeThrust: CROSSOVER_RELATIVE_THRUST_TOL },
  };
  const emptyCurves: CrossoverCurves = { mach: [], thrustAvailable_N: [], drag_N: [], excessThrust_N: [], specificExcessPower_m_s: [] };
  if (scan.stalledEverywhere) {
    return ok({
      ...base,
      status: 'above_ceiling',
      ...withParts(msg`At ${q(query.altitude_m, 'altitude')} and ${q(query.mass_kg, 'mass')} the wing cannot lift the aircraft below Mach ${q(scanHi, 'mach')} (CLmax): above the ceiling for this mass.`),
      stallMach: null,
      buffetOnsetMach: null,
      speedLimitMach: null,
      lowSpeedLimit: null,
      highSpeedLimit: null,
      machRange: [scanLo, scanHi],
      lowMach: null,
      highMach: null,
      crossings: [],
      minThrustMach: null,
      maxExcessThrustMach: null,
      maxExcessThrust_N: null,
      bestClimbMach: null,
      maxSpecificExcessPower_m_s: null,
      curves: emptyCurves,
      cautions: [],
    });
  }
  const { lo, hi, point } = scan;
  const excess = (mach: number) => point(mach).excessThrust_N;
  const thrust = (mach: number) => point(mach).thrustAvailable_N;

  const xs = uniformGrid(lo, hi, samples);
  const pts = xs.map(point);
  const curves: CrossoverCurves = {
    mach: xs,
    thrustAvailable_N: pts.map((p) => p.thrustAvailable_N),
    drag_N: pts.map((p) => p.drag_N),
    excessThrust_N: pts.map((p) => p.excessThrust_N),
    specificExcessPower_m_s: pts.map((p) => p.specificExcessPower_m_s),
  };
  const maxExcess = maximizeOnGrid(excess, lo, hi, samples, CROSSOVER_MACH_TOL);
  const maxPs = peakOf(scan);
  const minThrust = minimizeOnGrid(thrust, lo, hi, samples, CROSSOVER_MACH_TOL);
  if (maxExcess === null || maxPs === null || minThrust === null) return notFinite(query, scan);
  const searchPoints = [...xs, maxExcess.x].sort((p, q) => p - q);
  const crossings = rootsOnPoints(excess, searchPoints, CROSSOVER_MACH_TOL);
  const dm = 1e-7;
  const rising = crossings.filter((r) => excess(Math.min(hi, r + dm)) > excess(Math.max(lo, r - dm)));
  const falling = crossings.filter((r) => !rising.includes(r));
  const lowMach = excess(lo) >= 0 || rising.length === 0 ? null : rising[0]!;
  const highMach = excess(hi) >= 0 || falling.length === 0 ? null : falling[falling.length - 1]!;
  const aboveCeiling = maxExcess.fx < 0;

  const lookups = [lo, hi, ...crossings].map(
    (m) => models.propulsion.atRating({ altitude_m: query.altitude_m, mach: m, isaDev_K: query.isaDev_K }, query.rating).cautions,
  );
  const rating = RATING_LABEL[query.rating];
  // The band inside every limit (the envelope's definitions too): low = max(stall, buffet onset, low crossover),
  // high = min(high crossover, MMO, Mach of VMO).
  const buffet = liftLimitMachs(models.aero, { altitude_m: query.altitude_m, mass_kg: query.mass_kg, loadFactor: 1 }, 'buffetCl', Math.min(0.02, scanLo), scanHi);
  const buffetOnsetMach = buffet.exceededEverywhere ? null : buffet.lowMach;
  const vmoMach = query.speedLimits ? machFromCas(query.speedLimits.vmo_m_s, air.pressure_Pa) : null;
  const speedLimitMach = query.speedLimits && vmoMach !== null ? Math.min(vmoMach, query.speedLimits.mmo) : null;
  const lowCandidates: SpeedLimit<LowSpeedLimitSource>[] = [{ mach: lo, source: stallMach !== null && lo === stallMach ? 'stall' : 'scanStart' }];
  if (buffet.exceededEverywhere) lowCandidates.push({ mach: hi, source: 'buffetOnset' });
  else if (buffetOnsetMach !== null) lowCandidates.push({ mach: buffetOnsetMach, source: 'buffetOnset' });
  if (lowMach !== null) lowCandidates.push({ mach: lowMach, source: 'crossover' });
  const highCandidates: SpeedLimit<HighSpeedLimitSource>[] = [{ mach: highMach ?? hi, source: highMach === null ? 'scanEnd' : 'crossover' }];
  if (query.speedLimits && vmoMach !== null) highCandidates.push({ mach: query.speedLimits.mmo, source: 'mmo' }, { mach: vmoMach, source: 'vmo' });
  const lowLimit = lowCandidates.reduce((a, b) => (b.mach > a.mach ? b : a));
  const highLimit = highCandidates.reduce((a, b) => (b.mach < a.mach ? b : a));
  const band = !aboveCeiling && highLimit.mach > lowLimit.mach;
  const src = SPEED_LIMIT_SOURCE_TEXT;
  const fmtMach = (m: number | null) => (m === null ? msg`none` : msg`M ${q(m, 'mach')}`);
  const crossText = msg`thrust-drag crossovers: low ${fmtMach(lowMach)}, high ${fmtMach(highMach)}`;
  const parts = aboveCeiling
    ? msg`Thrust available at ${rating} stays below drag at every Mach from ${q(lo, 'mach')} to ${q(hi, 'mach')}: ${q(query.altitude_m, 'altitude')} is above the ceiling for ${q(query.mass_kg, 'mass')} (largest shortfall ${q(-maxExcess.fx, 'force')} at M ${q(maxExcess.x, 'mach')}).`
    : band
      ? msg`Level flight at ${rating} from M ${q(lowLimit.mach, 'mach')} (${src[lowLimit.source]}) to M ${q(highLimit.mach, 'mach')} (${src[highLimit.source]}); ${crossText}.`
      : msg`No level flight inside the limits at ${rating}: the low-speed limit M ${q(lowLimit.mach, 'mach')} (${src[lowLimit.source]}) is not below the high-speed limit M ${q(highLimit.mach, 'mach')} (${src[highLimit.source]}); ${crossText}.`;
  const message = messageText(parts, 'both');
  return ok({
    ...base,
    status: aboveCeiling ? 'above_ceiling' : 'ok',
    message,
    parts,
    stallMach,
    buffetOnsetMach,
    speedLimitMach,
    lowSpeedLimit: band ? lowLimit : null,
    highSpeedLimit: band ? highLimit : null,
    machRange: [lo, hi],
    lowMach: aboveCeiling ? null : lowMach,
    highMach: aboveCeiling ? null : highMach,
    crossings,
    minThrustMach: minThrust.atBound ? null : minThrust.x,
    maxExcessThrustMach: maxExcess.x,
    maxExcessThrust_N: maxExcess.fx,
    bestClimbMach: maxPs.x,
    maxSpecificExcessPower_m_s: maxPs.fx,
    curves,
    cautions: uniqueCautions(lookups),
  });
}
