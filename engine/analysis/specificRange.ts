/**
 * Specific range SR = TAS / fuel flow (m/kg) over Mach at one altitude and
 * mass, with fuel flow from the part-power thrust that equals drag; the
 * maximum-range Mach and the long-range Mach (the faster Mach at 99 % of the
 * best SR, common practice).
 */
import type { Caution } from '../cautions/caution';
import type { CautionSettings } from '../cautions/cautionSettings';
import { brent } from '../core/rootFind';
import { err, ok, type Result } from '../core/result';
import type { RatingName } from '../propulsion/propulsionModel';
import type { AnalysisError, PerformanceModels } from './analysisTypes';
import { thrustDragCrossover } from './crossover';
import { cruisePointCautions } from './cruiseCautions';
import { airAt } from './pointState';
import { maximizeOnGrid, uniformGrid } from './scalarSearch';

export interface SpecificRangeQuery {
  readonly altitude_m: number;
  readonly mass_kg: number;
  readonly isaDev_K: number;
  /** Mach scan range; default [0.3, 0.95]. */
  readonly machRange?: readonly [number, number];
  /** Curve points; default 61. */
  readonly samples?: number;
  /** Highest rating part power may use; default maxCruise. */
  readonly ceilingRating?: RatingName;
  /** Fraction of the best SR that defines the long-range Mach; default 0.99 (common practice). */
  readonly longRangeFraction?: number;
  /** When given, buffet-margin and MMO cautions are raised at the maximum-range and long-range Machs. */
  readonly cautionSettings?: CautionSettings;
  readonly mmo?: number;
}

export interface SpecificRangeCurves {
  readonly mach: readonly number[];
  readonly tas_m_s: readonly number[];
  readonly drag_N: readonly number[];
  /** Fuel flow for thrust = drag (kg/s); null where drag exceeds thrust at the ceiling rating or needs less than idle. */
  readonly fuelFlow_kg_s: readonly (number | null)[];
  /** SR = TAS / fuel flow (m/kg); null where fuel flow is. */
  readonly specificRange_m_kg: readonly (number | null)[];
}

export interface SpecificRangeResult {
  readonly altitude_m: number;
  readonly mass_kg: number;
  readonly isaDev_K: number;
  /** Mach band of level flight at the ceiling rating (stall or scan start to the high crossover or scan end). */
  readonly feasibleMachRange: readonly [number, number];
  readonly maxRangeMach: number;
  readonly maxSpecificRange_m_kg: number;
  /** Faster Mach where SR = longRangeFraction * best SR; null when that lies beyond the feasible band. */
  readonly longRangeMach: number | null;
  readonly longRangeSpecificRange_m_kg: number | null;
  readonly longRangeFraction: number;
  readonly curves: SpecificRangeCurves;
  readonly cautions: readonly Caution[];
}

/**
 * Search tolerance of the best-range and long-range Machs (-). The long-range
 * Mach (a root) meets it; the best-range Mach (a flat maximum) is located to
 * about sqrt(machine epsilon), ~1e-8.
 */
export const SPECIFIC_RANGE_MACH_TOL = 1e-9;

/**
 * SR(M) = V / mdot_f(T = D) at an altitude (m), mass (kg) and ISA deviation
 * (K); null where level flight is not possible at the ceiling rating. The
 * maximum-range Mach maximises SR (golden section after a scan); the
 * long-range Mach solves SR = 0.99 SR_max above it (Brent). Definitions:
 * Anderson, Aircraft Performance and Design, ch. 5 (range and specific range).
 */
export function specificRange(
  models: PerformanceModels,
  query: SpecificRangeQuery,
): Result<SpecificRangeResult, AnalysisError> {
  const fraction = query.longRangeFraction ?? 0.99;
  if (!(fraction > 0 && fraction < 1)) {
    return err({ code: 'invalid_input', message: `specific range: long-range fraction ${fraction} must lie strictly between 0 and 1` });
  }
  const rating = query.ceilingRating ?? 'maxCruise';
  const [scanLo, scanHi] = query.machRange ?? [0.3, 0.95];
  const samples = query.samples ?? 61;
  const cross = thrustDragCrossover(models, {
    altitude_m: query.altitude_m,
    mass_kg: query.mass_kg,
    rating,
    isaDev_K: query.isaDev_K,
    machRange: [scanLo, scanHi],
    samples: Math.max(samples, 5),
  });
  if (!cross.ok) return err({ ...cross.error, message: `specific range: ${cross.error.message}` });
  if (cross.value.status !== 'ok') {
    return err({ code: 'no_solution', message: `specific range: ${cross.value.message}` });
  }
  const air = airAt(query.altitude_m, query.isaDev_K);
  if (!air.ok) return air;
  const a = air.value.speedOfSound_m_s;
  // Step inside a crossover by 1e-7 in Mach so that part power is strictly within the rating.
  const lo = cross.value.lowMach === null ? cross.value.machRange[0] : cross.value.lowMach + 1e-7;
  const hi = cross.value.highMach === null ? cross.value.machRange[1] : cross.value.highMach - 1e-7;
  const condition = (mach: number) => ({ altitude_m: query.altitude_m, mach, isaDev_K: query.isaDev_K });
  const evaluate = (mach: number) => {
    const drag_N = models.aero.drag({ altitude_m: query.altitude_m, mach, mass_kg: query.mass_kg, loadFactor: 1 }).drag_N;
    const p = models.propulsion.forThrust(condition(mach), drag_N, rating);
    const fuel = p.limit === 'within' && p.fuelFlow_kg_s > 0 ? p.fuelFlow_kg_s : null;
    const tas = mach * a;
    return { tas, drag_N, fuel, sr: fuel === null ? null : tas / fuel, cautions: p.cautions };
  };
  const srOrNaN = (mach: number) => evaluate(mach).sr ?? Number.NaN;
  const best = maximizeOnGrid(srOrNaN, lo, hi, samples, SPECIFIC_RANGE_MACH_TOL);
  if (best === null) {
    return err({ code: 'no_solution', message: `specific range at ${query.altitude_m} m, ${query.mass_kg} kg: no Mach in [${lo}, ${hi}] where thrust can equal drag within idle..${rating}` });
  }
  const target = fraction * best.fx;
  const srHi = evaluate(hi).sr;
  let longRangeMach: number | null = null;
  if (srHi !== null && srHi < target && hi > best.x) {
    const root = brent((m) => srOrNaN(m) - target, best.x, hi, { xTol: SPECIFIC_RANGE_MACH_TOL });
    if (root.ok) longRangeMach = root.value.x;
  }
  const xs = uniformGrid(lo, hi, samples);
  const pts = xs.map(evaluate);
  const seen = new Set<string>();
  const cautions: Caution[] = [];
  for (const c of [...evaluate(best.x).cautions, ...cross.value.cautions]) {
    if (!seen.has(c.id)) {
      seen.add(c.id);
      cautions.push(c);
    }
  }
  if (query.cautionSettings) {
    const at = { altitude_m: query.altitude_m, mass_kg: query.mass_kg };
    cautions.push(...cruisePointCautions(models.aero, { ...at, mach: best.x }, query.cautionSettings, query.mmo, 'the maximum-range Mach'));
    if (longRangeMach !== null) {
      cautions.push(...cruisePointCautions(models.aero, { ...at, mach: longRangeMach }, query.cautionSettings, query.mmo, 'the long-range Mach'));
    }
  }
  return ok({
    altitude_m: query.altitude_m,
    mass_kg: query.mass_kg,
    isaDev_K: query.isaDev_K,
    feasibleMachRange: [lo, hi],
    maxRangeMach: best.x,
    maxSpecificRange_m_kg: best.fx,
    longRangeMach,
    longRangeSpecificRange_m_kg: longRangeMach === null ? null : fraction * best.fx,
    longRangeFraction: fraction,
    curves: {
      mach: xs,
      tas_m_s: pts.map((p) => p.tas),
      drag_N: pts.map((p) => p.drag_N),
      fuelFlow_kg_s: pts.map((p) => p.fuel),
      specificRange_m_kg: pts.map((p) => p.sr),
    },
    cautions,
  });
}
