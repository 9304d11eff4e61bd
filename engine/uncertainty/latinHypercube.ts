/**
 * Latin hypercube sampling on the unit cube (M. D. McKay, R. J. Beckman and
 * W. J. Conover, "A comparison of three methods for selecting values of
 * input variables in the analysis of output from a computer code",
 * Technometrics 21(2), 1979): each of the d coordinates of the n points takes
 * every one of the n strata [k/n, (k+1)/n) exactly once, in an independent
 * random order (Fisher-Yates shuffle), at a uniform random place inside its
 * stratum. The same construction as scipy.stats.qmc.LatinHypercube with
 * scramble=True and no optimisation.
 */
import type { SeededRandom } from './seededRandom';

/**
 * n points (n >= 1) in d dimensions (d >= 0) as rows: points[i][j] in [0, 1).
 * Draws column by column: for column j a shuffle of 0..n-1, then one jitter
 * per point, all from `random`, so a seed fixes the design.
 */
export function latinHypercube(n: number, d: number, random: SeededRandom): Float64Array[] {
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`latinHypercube: n is ${n}, expected a whole number >= 1`);
  if (!Number.isInteger(d) || d < 0) throw new RangeError(`latinHypercube: d is ${d}, expected a whole number >= 0`);
  const points = Array.from({ length: n }, () => new Float64Array(d));
  const order = new Int32Array(n);
  for (let j = 0; j < d; j++) {
    for (let i = 0; i < n; i++) order[i] = i;
    for (let i = n - 1; i > 0; i--) {
      const k = random.nextInt(i + 1);
      const t = order[i]!;
      order[i] = order[k]!;
      order[k] = t;
    }
    for (let i = 0; i < n; i++) {
      const u = (order[i]! + random.next()) / n;
      // (k + r)/n < 1 for r < 1, but (n - 1 + r)/n can round to 1: keep the point inside its stratum.
      points[i]![j] = u < 1 ? u : (n - Number.EPSILON * n) / n;
    }
  }
  return points;
}

/**
 * Centred L2 discrepancy of points in [0, 1]^d (F. J. Hickernell, "A
 * generalized discrepancy and quadrature error bound", Mathematics of
 * Computation 67, 1998), the default measure of scipy.stats.qmc.discrepancy
 * (method 'CD'); smaller is more uniform. Returns the squared discrepancy,
 * as scipy does.
 */
export function centredDiscrepancy(points: readonly Float64Array[]): number {
  const n = points.length;
  if (n === 0) return 0;
  const d = points[0]!.length;
  let first = 1;
  for (let j = 0; j < d; j++) first *= 13 / 12;
  let second = 0;
  for (const x of points) {
    let prod = 1;
    for (let j = 0; j < d; j++) {
      const a = Math.abs(x[j]! - 0.5);
      prod *= 1 + 0.5 * a - 0.5 * a * a;
    }
    second += prod;
  }
  let third = 0;
  for (const x of points) {
    for (const y of points) {
      let prod = 1;
      for (let j = 0; j < d; j++) {
        const a = Math.abs(x[j]! - 0.5);
        const b = Math.abs(y[j]! - 0.5);
        prod *= 1 + 0.5 * a + 0.5 * b - 0.5 * Math.abs(x[j]! - y[j]!);
      }
      third += prod;
    }
  }
  return first - (2 / n) * second + third / (n * n);
}
