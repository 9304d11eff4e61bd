/**
 * The standard normal distribution: its cumulative distribution function and
 * its inverse (the quantile function), for sampling normal and truncated
 * normal inputs from uniform numbers by inversion.
 */

const LN_SQRT_2PI = 0.9189385332046727;

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
const A = [3.3871328727963665, 133.14166789178438, 1971.5909503065513, 13731.69376550946, 45921.95393154987, 67265.7709270087, 33430.57558358813, 2509.0809287301227];
const B = [1, 42.31333070160091, 687.1870074920579, 5394.196021424751, 21213.794301586597, 39307.89580009271, 28729.085735721943, 5226.495278852546];
const C = [1.4234371107496835, 4.630337846156546, 5.769497221460691, 3.6478483247632045, 1.2704582524523684, 0.2417807251774506, 0.022723844989269184, 0.0007745450142783414];
const D = [1, 2.053191626637759, 1.6763848301838038, 0.6897673349851, 0.14810397642748008, 0.015198666563616457, 0.0005475938084995345, 1.0507500716444169e-09];
const E = [6.657904643501103, 5.463784911164114, 1.7848265399172913, 0.29656057182850487, 0.026532189526576124, 0.0012426609473880784, 2.7115555687434876e-05, 2.0103343992922881e-07];
const F = [1, 0.599832206555888, 0.1369298809227358, 0.014875361290850615, 0.0007868691311456133, 1.8463183175100548e-05, 1.421511758316446e-07, 2.0442631033899397e-15];

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
