/**
 * Summary statistics of a Monte-Carlo sample: mean, standard deviation,
 * percentiles, and the share of a sample below zero.
 */

export interface SampleSummary {
  readonly count: number;
  readonly mean: number;
  /** Sample standard deviation (n - 1 in the denominator); 0 for one value. */
  readonly sd: number;
  /** Standard error of the mean, sd / sqrt(n) (-); for a Latin hypercube an upper estimate. */
  readonly meanStandardError: number;
  readonly min: number;
  readonly p05: number;
  readonly p50: number;
  readonly p95: number;
  readonly max: number;
}

/**
 * Percentile q in [0, 100] of ascending `sorted` values by linear
 * interpolation between closest ranks: position (n - 1) q / 100 (Hyndman &
 * Fan's definition 7, numpy.percentile's default 'linear' method).
 */
export function percentileOfSorted(sorted: ArrayLike<number>, q: number): number {
  const n = sorted.length;
  if (n === 0) throw new RangeError('percentileOfSorted: no values');
  const h = ((n - 1) * q) / 100;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, n - 1);
  const a = sorted[lo]!;
  const b = sorted[hi]!;
  return a === b ? a : a + (h - lo) * (b - a);
}

/**
 * Summary of finite values (at least one). The mean is summed in the given
 * order (so a fixed sample gives the same bits) as offsets from the first
 * value; the standard deviation by the two-pass formula.
 */
export function summarize(values: ArrayLike<number>): SampleSummary {
  const n = values.length;
  if (n === 0) throw new RangeError('summarize: no values');
  // Summed as offsets from the first value: n equal values give that value exactly (no n x / n round-off).
  const first = values[0]!;
  let offsets = 0;
  for (let i = 0; i < n; i++) offsets += values[i]! - first;
  const mean = first + offsets / n;
  let ss = 0;
  for (let i = 0; i < n; i++) {
    const e = values[i]! - mean;
    ss += e * e;
  }
  const sd = n > 1 ? Math.sqrt(ss / (n - 1)) : 0;
  const sorted = Float64Array.from(values).sort();
  return {
    count: n,
    mean,
    sd,
    meanStandardError: sd / Math.sqrt(n),
    min: sorted[0]!,
    p05: percentileOfSorted(sorted, 5),
    p50: percentileOfSorted(sorted, 50),
    p95: percentileOfSorted(sorted, 95),
    max: sorted[n - 1]!,
  };
}

/** Share of values strictly below zero (-). */
export function shareBelowZero(values: ArrayLike<number>): number {
  if (values.length === 0) return 0;
  let below = 0;
  for (let i = 0; i < values.length; i++) if (values[i]! < 0) below++;
  return below / values.length;
}
