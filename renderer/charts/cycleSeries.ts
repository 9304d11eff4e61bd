/** A cycle's Mach curves (per engine) -> the rows and series of the lapse charts; no installed series without an installation. */
import type { RatingName } from '../../engine/propulsion';
import type { UnitSystem } from '../../engine/units';
import type { CycleCurveSet, LapseCurves } from '../worker/engineProtocol';
import { lapseSeries } from './lapseSeries';

export function cycleSeries(curves: CycleCurveSet, rating: RatingName, units: UnitSystem): ReturnType<typeof lapseSeries> {
  const none = curves.uninstalledThrust_N.map((row) => row.map(() => null));
  const lapse: LapseCurves = {
    rating,
    mach: curves.mach,
    altitudes_m: curves.altitudes_m,
    uninstalledThrust_N: curves.uninstalledThrust_N,
    uninstalledTsfc_kg_N_s: curves.uninstalledTsfc_kg_N_s,
    installedThrust_N: curves.installedThrust_N ?? none,
    installedTsfc_kg_N_s: curves.installedTsfc_kg_N_s ?? none,
  };
  const out = lapseSeries(lapse, units);
  return curves.installedThrust_N === null ? { ...out, series: out.series.filter((s) => s.key.startsWith('u')) } : out;
}
