/**
 * Optimum altitude: the pressure altitude whose best (maximum-range) specific
 * range is greatest at a given mass among the altitudes meeting the
 * cruise-ceiling climb rate and the buffet margin (both reported, with the one
 * that binds), found by scanning altitude and refining by golden-section
 * search (the optimum) and Brent's method (the limits); with the buffet-margin
 * and MMO cautions raised at the optimum.
 */
import type { Caution } from '../cautions/caution';
import type { CautionSettings } from '../cautions/cautionSettings';
import { err, ok, type Result } from '../core/result';
import type { RatingName } from '../propulsion/propulsionModel';
import type { AnalysisError, PerformanceModels } from './analysisTypes';
import { cruisePointCautions } from './cruiseCautions';
import { refineMaximum } from './scalarSearch';
import { specificRange } from './specificRange';
import { airAt, levelPoint } from './pointState';
import { brent } from '../core/rootFind';

export interface OptimumAltitudeQuery {
  readonly mass_kg: number;
  readonly isaDev_K: number;
  /** Altitude scan (m); default [3000, 15000]. */
  readonly altitudeRange?: readonly [number, number];
  /** Scan points; default 25. */
  readonly samples?: number;
  readonly ceilingRating?: RatingName;
  readonly machRange?: readonly [number, number];
  /** MMO (-) to check the optimum against; omitted = not checked. */
  readonly mmo?: number;
  /** Rating of the cruise-ceiling climb-rate limit; default maxClimb. */
  readonly climbRating?: RatingName;
  readonly cautionSettings: CautionSettings;
}

export interface OptimumAltitudeResult {
  readonly altitude_m: number;
  readonly maxRangeMach: number;
  readonly specificRange_m_kg: number;
  /** Load factor to buffet onset at the optimum and its best-range Mach (-). */
  readonly buffetLoadFactor: number;
  /** Steady climb rate Ps = (T - D) V / W at the climb rating and the best-range Mach at the optimum (m/s). */
  readonly climbRate_m_s: number;
  /** Altitude of best SR with no limits (m). */
  readonly unconstrainedAltitude_m: number;
  /**
   * Highest altitude of the scan meeting each limit at this mass (m), null when the whole scan meets it: the
   * cruise-ceiling climb rate (the caution settings' residual climb rate, default 300 ft/min, at the climb rating
   * and the best-range Mach) and the buffet margin (load factor to buffet onset at least the settings' minimum).
   */
  readonly cruiseCeilingAltitude_m: number | null;
  readonly buffetLimitAltitude_m: number | null;
  /** What sets the optimum: the specific range itself, or the limit that holds it below the unconstrained optimum. */
  readonly binding: 'specificRange' | 'cruiseCeiling' | 'buffetMargin';
  /** The two limits' values (residual climb rate m/s, buffet load factor -). */
  readonly limits: { readonly minClimbRate_m_s: number; readonly minBuffetLoadFactor: number };
  /** Best SR over the altitude scan; null where level flight is impossible. */
  readonly curve: {
    readonly altitude_m: readonly number[];
    readonly maxRangeMach: readonly (number | null)[];
    readonly specificRange_m_kg: readonly (number | null)[];
  };
  readonly cautions: readonly Caution[];
}

/** Altitude tolerance of the optimum (m). */
export const OPTIMUM_ALTITUDE_TOL_M = 0.5;

/**
 * Altitude (m) of greatest maximum-range SR at a mass (kg). Each altitude's
 * best SR comes from specificRange (TAS / fuel flow at thrust = drag);
 * altitudes where level flight is impossible at the ceiling rating are
 * skipped. Raises `buffet_margin_low` (catalogue id) when the load factor to buffet onset at the
 * optimum is below the settings' minimum, and `mmo_exceeded` when the
 * best-range Mach exceeds MMO less its margin.
 */
export function optimumAltitude(
  models: PerformanceModels,
  query: OptimumAltitudeQuery,
): Result<OptimumAltitudeResult, AnalysisError> {
  const [hLo, hHi] = query.altitudeRange ?? [3000, 15000];
  const samples = query.samples ?? 25;
  if (!(hHi > hLo) || !Number.isFinite(hLo) || !Number.isFinite(hHi)) {
    return err({ code: 'invalid_input', message: `optimum altitude: altitude range [${hLo}, ${hHi}] m must be finite and ascending` });
  }
  const at = (h: number) =>
    specificRange(models, {
      altitude_m: h,
      mass_kg: query.mass_kg,
      isaDev_K: query.isaDev_K,
      ...(query.ceilingRating ? { ceilingRating: query.ceilingRating } : {}),
      ...(query.machRange ? { machRange: query.machRange } : {}),
    });
  const bestSr = (h: number) => {
    const r = at(h);
    return r.ok ? r.value.maxSpecificRange_m_kg : Number.NaN;
  };
  const step = (hHi - hLo) / (samples - 1);
  const curveAltitudes = Array.from({ length: samples }, (_, i) => (i === samples - 1 ? hHi : hLo + i * step));
  const curvePoints = curveAltitudes.map((h) => at(h));
  const curveSr = curvePoints.map((r) => (r.ok ? r.value.maxSpecificRange_m_kg : null));
  let iBest = -1;
  curveSr.forEach((v, i) => {
    if (v !== null && (iBest < 0 || v > curveSr[iBest]!)) iBest = i;
  });
  const best =
    iBest < 0
      ? null
      : (() => {
          const refined = refineMaximum(
            bestSr,
            curveAltitudes[Math.max(0, iBest - 1)]!,
            curveAltitudes[Math.min(samples - 1, iBest + 1)]!,
            curveAltitudes[iBest]!,
            curveSr[iBest]!,
            OPTIMUM_ALTITUDE_TOL_M,
          );
          const atBound = Math.abs(refined.x - hLo) <= 2 * OPTIMUM_ALTITUDE_TOL_M || Math.abs(refined.x - hHi) <= 2 * OPTIMUM_ALTITUDE_TOL_M;
          return { ...refined, atBound };
        })();
  if (best === null) {
    return err({ code: 'no_solution', message: `optimum altitude: no altitude in [${hLo}, ${hHi}] m allows level flight at ${query.mass_kg} kg` });
  }
  // The limits: best SR among the altitudes meeting the cruise-ceiling climb rate and the buffet margin. SR is
  // unimodal in altitude and both limits are met below a highest altitude, so the optimum is the lowest of the
  // unconstrained optimum and the two limit altitudes.
  const minRate = query.cautionSettings.minResidualClimbRate_m_s;
  const minBuffet = query.cautionSettings.minBuffetLoadFactor;
  const climbRating = query.climbRating ?? 'maxClimb';
  const margins = (h: number, known?: ReturnType<typeof at>): { climb: number; buffet: number } => {
    const r = known ?? at(h);
    const air = airAt(h, query.isaDev_K);
    if (!r.ok || !air.ok) return { climb: -1, buffet: -1 };
    const p = levelPoint(models, { altitude_m: h, mass_kg: query.mass_kg, rating: climbRating, isaDev_K: query.isaDev_K }, air.value.speedOfSound_m_s, r.value.maxRangeMach);
    return { climb: p.specificExcessPower_m_s - minRate, buffet: p.buffetLoadFactor - minBuffet };
  };
  const curveMargins = curveAltitudes.map((h, i) => margins(h, curvePoints[i]));
  const limitAltitude = (which: 'climb' | 'buffet'): number | null | 'none' => {
    const m = curveMargins.map((v) => v[which]);
    if (m[0]! < 0) return 'none';
    const i = m.findIndex((v) => v < 0);
    if (i < 0) return null;
    const root = brent((h) => margins(h)[which], curveAltitudes[i - 1]!, curveAltitudes[i]!, { xTol: OPTIMUM_ALTITUDE_TOL_M });
    return root.ok ? root.value.x : curveAltitudes[i - 1]!;
  };
  const climbLimit = limitAltitude('climb');
  const buffetLimit = limitAltitude('buffet');
  if (climbLimit === 'none' || buffetLimit === 'none') {
    const what = climbLimit === 'none' ? `the cruise-ceiling climb rate ${minRate.toFixed(3)} m/s at ${climbRating}` : `the buffet margin ${minBuffet.toFixed(2)} g`;
    return err({ code: 'no_solution', message: `optimum altitude: no altitude in [${hLo}, ${hHi}] m meets ${what} at ${query.mass_kg} kg` });
  }
  let optimum_m = best.x;
  let binding: OptimumAltitudeResult['binding'] = 'specificRange';
  if (climbLimit !== null && climbLimit < optimum_m) {
    optimum_m = climbLimit;
    binding = 'cruiseCeiling';
  }
  if (buffetLimit !== null && buffetLimit < optimum_m) {
    optimum_m = buffetLimit;
    binding = 'buffetMargin';
  }
  const atBest = at(optimum_m);
  if (!atBest.ok) return atBest;
  const mach = atBest.value.maxRangeMach;
  const drag = models.aero.drag({ altitude_m: optimum_m, mach, mass_kg: query.mass_kg, loadFactor: 1 });
  const climbAtBest = margins(optimum_m).climb + minRate;
  const cautions: Caution[] = [
    ...atBest.value.cautions,
    ...cruisePointCautions(models.aero, { altitude_m: optimum_m, mach, mass_kg: query.mass_kg }, query.cautionSettings, query.mmo, 'the optimum altitude and its best-range Mach'),
  ];
  if (best.atBound && binding === 'specificRange') {
    cautions.push({
      id: 'optimum_at_scan_limit',
      severity: 'info',
      message: `The optimum altitude lies at the end of the scan (${best.x.toFixed(0)} m in [${hLo}, ${hHi}] m): the true optimum may lie beyond it.`,
      value: best.x,
    });
  }
  return ok({
    altitude_m: optimum_m,
    maxRangeMach: mach,
    specificRange_m_kg: atBest.value.maxSpecificRange_m_kg,
    buffetLoadFactor: drag.buffetLoadFactor,
    climbRate_m_s: climbAtBest,
    unconstrainedAltitude_m: best.x,
    cruiseCeilingAltitude_m: climbLimit,
    buffetLimitAltitude_m: buffetLimit,
    binding,
    limits: { minClimbRate_m_s: minRate, minBuffetLoadFactor: minBuffet },
    curve: {
      altitude_m: curveAltitudes,
      maxRangeMach: curvePoints.map((r) => (r.ok ? r.value.maxRangeMach : null)),
      specificRange_m_kg: curveSr,
    },
    cautions,
  });
}
