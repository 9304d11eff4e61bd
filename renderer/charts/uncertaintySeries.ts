/**
 * Chart data for an uncertainty result (pure): the block-fuel bands in the
 * chosen units, and a histogram of per-sample values with each bin's side of
 * zero (for B - A: bins below zero are samples where B burns less).
 */
import type { UncertaintyResult } from '../../engine/uncertainty';
import { toDisplay, type UnitSystem } from '../../engine/units';

export interface BandRow {
  readonly name: string;
  readonly p05: number;
  readonly p50: number;
  readonly p95: number;
  readonly mean: number;
  readonly sd: number;
  readonly deterministic: number;
  /** Recharts stacking: an invisible base up to P5 and the visible P5..P95 bar. */
  readonly base: number;
  readonly range: number;
}

export interface HistogramBin {
  /** Bin edges and centre in display units. */
  readonly lo: number;
  readonly hi: number;
  readonly label: string;
  readonly count: number;
  /** 'below' when the whole bin is below zero, 'above' when above, 'across' when it contains zero. */
  readonly side: 'below' | 'above' | 'across';
}

/** One band row per design (A, B) and, with two designs, B - A; masses in the display unit. */
export function bandRows(r: UncertaintyResult, units: UnitSystem): BandRow[] {
  const kg = (x: number) => toDisplay(x, 'mass', units);
  const row = (name: string, s: UncertaintyResult['designs'][number]['blockFuel_kg'], det: number): BandRow => ({
    name,
    p05: kg(s.p05),
    p50: kg(s.p50),
    p95: kg(s.p95),
    mean: kg(s.mean),
    sd: kg(s.sd),
    deterministic: kg(det),
    base: kg(s.p05),
    range: kg(s.p95) - kg(s.p05),
  });
  const rows = r.designs.map((d, k) => row(`${k === 0 ? 'A' : 'B'}: ${d.name}`, d.blockFuel_kg, r.deterministic.blockFuel_kg[k]!));
  if (r.difference_kg !== null && r.deterministic.difference_kg !== null) rows.push(row('B - A', r.difference_kg, r.deterministic.difference_kg));
  return rows;
}

/**
 * `bins` equal-width bins (>= 1) over the values' range, converted by `convert`;
 * one bin when every value is the same. Counts add up to the number of values.
 */
export function histogram(values: readonly number[], bins: number, convert: (x: number) => number = (x) => x): HistogramBin[] {
  if (values.length === 0) return [];
  const xs = values.map(convert);
  let lo = Infinity;
  let hi = -Infinity;
  for (const x of xs) {
    if (x < lo) lo = x;
    if (x > hi) hi = x;
  }
  const n = hi > lo ? Math.max(1, Math.floor(bins)) : 1;
  const width = n === 1 ? 0 : (hi - lo) / n;
  const counts = new Array<number>(n).fill(0);
  for (const x of xs) counts[n === 1 ? 0 : Math.min(n - 1, Math.floor((x - lo) / width))]! += 1;
  return counts.map((count, i) => {
    const a = lo + i * width;
    const b = n === 1 ? hi : i === n - 1 ? hi : lo + (i + 1) * width;
    return { lo: a, hi: b, label: ((a + b) / 2).toFixed(Math.abs(b - a) < 10 ? 1 : 0), count, side: b < 0 ? 'below' : a > 0 ? 'above' : 'across' };
  });
}
