/** Specific-range curves at several altitudes -> rows of Mach with one SR column per altitude (display units), and the marked Machs. */
import { displayUnit, formatQuantity, toDisplay, type UnitSystem } from '../../engine/units';
import type { SpecificRangeSet } from '../worker/engineProtocol';
import { interpolateAt } from './crossoverSeries';
import type { SeriesDef } from './polarSeries';
import { seriesKey } from './seriesKeys';

type Row = Record<string, number | null>;

export interface SpecificRangeMarker {
  readonly altitude_m: number;
  readonly what: 'maximum range' | 'long range (99 %)';
  readonly mach: number;
  /** Specific range there (display units). */
  readonly specificRange: number;
}

export function specificRangeSeries(set: SpecificRangeSet, units: UnitSystem): { rows: Row[]; series: SeriesDef[]; markers: SpecificRangeMarker[]; unit: string } {
  const byMach = new Map<number, Row>();
  const ok = set.curves.flatMap((c) => (c.ok ? [c] : []));
  ok.forEach(({ result }, i) => {
    result.curves.mach.forEach((m, j) => {
      const sr = result.curves.specificRange_m_kg[j];
      const row = byMach.get(m) ?? { mach: m };
      row[seriesKey('a', i)] = sr === null || sr === undefined || !Number.isFinite(sr) ? null : toDisplay(sr, 'specificRange', units);
      byMach.set(m, row);
    });
  });
  const rows = [...byMach.values()].sort((a, b) => (a.mach as number) - (b.mach as number));
  for (const row of rows) ok.forEach((_, i) => { if (!(seriesKey('a', i) in row)) row[seriesKey('a', i)] = null; });
  const series = ok.map((c, i) => ({ key: seriesKey('a', i), name: formatQuantity(c.altitude_m, 'altitude', units), colorIndex: i }));
  const markers: SpecificRangeMarker[] = [];
  for (const { altitude_m, result } of ok) {
    markers.push({ altitude_m, what: 'maximum range', mach: result.maxRangeMach, specificRange: toDisplay(result.maxSpecificRange_m_kg, 'specificRange', units) });
    if (result.longRangeMach !== null && result.longRangeSpecificRange_m_kg !== null) {
      markers.push({ altitude_m, what: 'long range (99 %)', mach: result.longRangeMach, specificRange: toDisplay(result.longRangeSpecificRange_m_kg, 'specificRange', units) });
    }
  }
  return { rows, series, markers, unit: displayUnit('specificRange', units) };
}

/** SR (display units) on one altitude's curve at a Mach, linear between points; null off the curve. */
export function specificRangeAt(set: SpecificRangeSet, index: number, mach: number, units: UnitSystem): number | null {
  const c = set.curves[index];
  if (c === undefined || !c.ok) return null;
  const xs: number[] = [];
  const ys: number[] = [];
  c.result.curves.mach.forEach((m, j) => {
    const sr = c.result.curves.specificRange_m_kg[j];
    if (sr !== null && sr !== undefined) { xs.push(m); ys.push(toDisplay(sr, 'specificRange', units)); }
  });
  return interpolateAt(xs, ys, mach);
}
