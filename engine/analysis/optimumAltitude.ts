/**
 * Optimum altitude: the pressure altitude whose best (maximum-range) specific
 * range is greatest at a given mass, found by scanning altitude and refining
 * by golden-section search; with the buffet-margin and MMO cautions raised
 * at the optimum.
 */
import type { Caution } from '../cautions/caution';
import type { CautionSettings } from '../cautions/cautionSettings';
import { err, ok, type Result } from '../core/result';
import type { RatingName } from '../propulsion/propulsionModel';
import type { AnalysisError, PerformanceModels } from './analysisTypes';
import { cruisePointCautions } from './cruiseCautions';
import { refineMaximum } from './scalarSearch';
import { specificRange } from './specificRange';

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
  readonly cautionSettings: CautionSettings;
}

export interface OptimumAltitudeResult {
  readonly altitude_m: number;
  readonly maxRangeMach: number;
  readonly specificRange_m_kg: number;
  /** Load factor to buffet onset at the optimum and its best-range Mach (-). */
  readonly buffetLoadFactor: number;
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
  const atBest = at(best.x);
  if (!atBest.ok) return atBest;
  const mach = atBest.value.maxRangeMach;
  const drag = models.aero.drag({ altitude_m: best.x, mach, mass_kg: query.mass_kg, loadFactor: 1 });
  const cautions: Caution[] = [
    ...atBest.value.cautions,
    ...cruisePointCautions(models.aero, { altitude_m: best.x, mach, mass_kg: query.mass_kg }, query.cautionSettings, query.mmo, 'the optimum altitude and its best-range Mach'),
  ];
  if (best.atBound) {
    cautions.push({
      id: 'optimum_at_scan_limit',
      severity: 'info',
      message: `The optimum altitude lies at the end of the scan (${best.x.toFixed(0)} m in [${hLo}, ${hHi}] m): the true optimum may lie beyond it.`,
      value: best.x,
    });
  }
  return ok({
    altitude_m: best.x,
    maxRangeMach: mach,
    specificRange_m_kg: atBest.value.maxSpecificRange_m_kg,
    buffetLoadFactor: drag.buffetLoadFactor,
    curve: {
      altitude_m: curveAltitudes,
      maxRangeMach: curvePoints.map((r) => (r.ok ? r.value.maxRangeMach : null)),
      specificRange_m_kg: curveSr,
    },
    cautions,
  });
}
