/**
 * The standard normal distribution: its cumulative distribution function and
 * its inverse (the quantile function), for sampling normal and truncated
 * normal inputs from uniform numbers by inversion.
 */

const LN_SQRT_2PI = 0.91893853320467274178;

/**
 * Standard normal CDF Phi(x) (-) by the Taylor series of G. Marsaglia,
 * "Evaluating the Normal Distribution", Journal of Statistical Software
 * 11(4), 2004: Phi(x) = 1/2 + phi(x) (x + x^3/3 + x^5/(3 5) + ...), summed
 * until the terms no longer change the sum; absolute error near 1e-15.
 * Returns 0 below -38 and 1 above 38 (where Phi is within 1e-300 of them).
 */
export function normalCdf(x: number): number {
  if (Number.isNaN(x)) throw new RangeError('normalCdf: x is NaN');
  if (x < -38) return 0;
  if (x > 38) return 1;
  let sum = x;
  let previous = 0;
  let term = x;
  const q = x * x;
  let i = 1;
  while (sum !== previous) {
    previous = sum;
    i += 2;
    term *= q / i;
    sum = previous + term;
  }
  return 0.5 + sum * Math.exp(-0.5 * q - LN_SQRT_2PI);
}

function poly(c: readonly number[], r: number): number {
  let v = 0;
  for (let k = c.length - 1; k >= 0; k--) v = v * r + c[k]!;
  return v;
}

// Algorithm AS 241 (PPND16), coefficients in ascending powers of r.
const A = [3.387132872796366608, 133.14166789178437745, 1971.5909503065514427, 13731.693765509461125, 45921.953931549871457, 67265.770927008700853, 33430.575583588128105, 2509.0809287301226727];
const B = [1, 42.313330701600911252, 687.1870074920579083, 5394.1960214247511077, 21213.794301586595867, 39307.89580009271061, 28729.085735721942674, 5226.495278852545925];
const C = [1.42343711074968357734, 4.6303378461565452959, 5.7694972214606914055, 3.64784832476320460504, 1.27045825245236838258, 0.24178072517745061177, 0.0227238449892691845833, 7.7454501427834140764e-4];
const D = [1, 2.05319162663775882187, 1.6763848301838038494, 0.68976733498510000455, 0.14810397642748007459, 0.0151986665636164571966, 5.475938084995344946e-4, 1.05075007164441684324e-9];
const E = [6.6579046435011037772, 5.4637849111641143699, 1.7848265399172913358, 0.29656057182850489123, 0.026532189526576123093, 0.0012426609473880784386, 2.71155556874348757815e-5, 2.01033439929228813265e-7];
const F = [1, 0.59983220655588793769, 0.13692988092273580531, 0.0148753612908506148525, 7.868691311456132591e-4, 1.8463183175100546818e-5, 1.4215117583164458887e-7, 2.04426310338993978564e-15];

/**
 * Standard normal quantile Phi^-1(p) for 0 < p < 1 by M. J. Wichura,
 * "Algorithm AS 241: The percentage points of the normal distribution",
 * Applied Statistics 37(3), 1988 (PPND16, relative accuracy about 1e-16).
 * p = 0 and p = 1 give -Infinity and +Infinity; p outside [0, 1] or NaN is a
 * caller bug and throws.
 */
export function normalQuantile(p: number): number {
  if (!(p >= 0 && p <= 1)) throw new RangeError(`normalQuantile: p is ${p}, expected 0..1`);
  if (p === 0) return -Infinity;
  if (p === 1) return Infinity;
  const q = p - 0.5;
  if (Math.abs(q) <= 0.425) {
    const r = 0.180625 - q * q;
    return (q * poly(A, r)) / poly(B, r);
  }
  let r = Math.sqrt(-Math.log(q < 0 ? p : 1 - p));
  let value: number;
  if (r <= 5) {
    r -= 1.6;
    value = poly(C, r) / poly(D, r);
  } else {
    r -= 5;
    value = poly(E, r) / poly(F, r);
  }
  return q < 0 ? -value : value;
}
