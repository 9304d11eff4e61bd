/** Drag polar curves -> rows of CL with one CD column per Mach number. */
import type { PolarCurves } from '../worker/engineProtocol';
import { seriesKey } from './seriesKeys';

export interface SeriesDef {
  readonly key: string;
  readonly name: string;
  /** Series with the same colour index share a colour (e.g. one altitude, uninstalled and installed). */
  readonly colorIndex?: number;
}

/** Rows `{ cl, m0: cd at machs[0], m1: ... }` and the series names ("M 0.78"). */
export function polarSeries(curves: PolarCurves): { rows: Record<string, number>[]; series: SeriesDef[] } {
  const rows = curves.cl.map((cl, j) => {
    const row: Record<string, number> = { cl };
    curves.machs.forEach((_, i) => {
      row[seriesKey('m', i)] = curves.cd[i]![j]!;
    });
    return row;
  });
  return { rows, series: curves.machs.map((m, i) => ({ key: seriesKey('m', i), name: `M ${m.toFixed(2)}` })) };
}
