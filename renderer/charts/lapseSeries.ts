/** Thrust-lapse and TSFC curves -> rows of Mach with uninstalled and installed columns per altitude. */
import { displayUnit, formatQuantity, toDisplay, type UnitSystem } from '../../engine/units';
import type { LapseCurves } from '../worker/engineProtocol';
import type { SeriesDef } from './polarSeries';
import { seriesKey } from './seriesKeys';

type Row = Record<string, number | null>;

function show(value: number | null, convert: (v: number) => number): number | null {
  return value === null ? null : convert(value);
}

/**
 * Thrust rows `{ mach, u0, i0, u1, i1, ... }` (u uninstalled, i installed, all
 * engines, force display unit) and TSFC rows with the same keys (display unit of tsfc).
 */
export function lapseSeries(curves: LapseCurves, units: UnitSystem): { thrust: Row[]; tsfc: Row[]; series: SeriesDef[]; thrustUnit: string; tsfcUnit: string } {
  const force = (v: number) => toDisplay(v, 'force', units);
  const tsfc = (v: number) => toDisplay(v, 'tsfc', units);
  const thrust: Row[] = [];
  const tsfcRows: Row[] = [];
  curves.mach.forEach((mach, j) => {
    const t: Row = { mach };
    const s: Row = { mach };
    curves.altitudes_m.forEach((_, i) => {
      t[seriesKey('u', i)] = show(curves.uninstalledThrust_N[i]![j]!, force);
      t[seriesKey('i', i)] = show(curves.installedThrust_N[i]![j]!, force);
      s[seriesKey('u', i)] = show(curves.uninstalledTsfc_kg_N_s[i]![j]!, tsfc);
      s[seriesKey('i', i)] = show(curves.installedTsfc_kg_N_s[i]![j]!, tsfc);
    });
    thrust.push(t);
    tsfcRows.push(s);
  });
  const series = curves.altitudes_m.flatMap((alt, i) => {
    const at = formatQuantity(alt, 'altitude', units);
    return [
      { key: seriesKey('u', i), name: `uninstalled, ${at}`, colorIndex: i },
      { key: seriesKey('i', i), name: `installed, ${at}`, colorIndex: i },
    ];
  });
  return { thrust, tsfc: tsfcRows, series, thrustUnit: displayUnit('force', units), tsfcUnit: displayUnit('tsfc', units) };
}
