/**
 * Spearman's rank correlation coefficient (C. Spearman, 1904): the Pearson
 * correlation of the ranks, ties given their average rank (as
 * scipy.stats.spearmanr does).
 */

/** Ranks 1..n of `values`, ties sharing their average rank. */
export function averageRanks(values: ArrayLike<number>): Float64Array {
  const n = values.length;
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => values[a]! - values[b]! || a - b);
  const ranks = new Float64Array(n);
  let i = 0;
  while (i < n) {
    let j = i;
    while (j + 1 < n && values[order[j + 1]!]! === values[order[i]!]!) j++;
    const rank = (i + j) / 2 + 1;
    for (let k = i; k <= j; k++) ranks[order[k]!] = rank;
    i = j + 1;
  }
  return ranks;
}

function pearson(x: ArrayLike<number>, y: ArrayLike<number>): number | null {
  const n = x.length;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i]!;
    my += y[i]!;
  }
  mx /= n;
  my /= n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const a = x[i]! - mx;
    const b = y[i]! - my;
    sxy += a * b;
    sxx += a * a;
    syy += b * b;
  }
  if (!(sxx > 0) || !(syy > 0)) return null;
  return sxy / Math.sqrt(sxx * syy);
}

/**
 * Spearman's rho of two equally long samples (n >= 2), in [-1, 1]; null when
 * either sample is constant (rho is undefined there, and no NaN is returned).
 */
export function spearmanRho(x: ArrayLike<number>, y: ArrayLike<number>): number | null {
  if (x.length !== y.length) throw new RangeError(`spearmanRho: ${x.length} and ${y.length} values`);
  if (x.length < 2) return null;
  const r = pearson(averageRanks(x), averageRanks(y));
  return r === null ? null : Math.max(-1, Math.min(1, r));
}
