/**
 * One-dimensional root finding shared by the whole engine: Brent's method
 * (R. P. Brent, "Algorithms for Minimization without Derivatives", 1973,
 * ch. 4, the `zero` procedure), a bracketed secant for a bracket whose end
 * values are already known, and a bracket expander.
 */
import { err, ok, type Result } from './result';

export type RootErrorCode = 'no_bracket' | 'did_not_converge' | 'not_finite';

export interface RootError {
  readonly code: RootErrorCode;
  readonly message: string;
  /** Interval searched (no_bracket, did_not_converge). */
  readonly lo?: number;
  readonly hi?: number;
  /** Function values at the interval ends (no_bracket). */
  readonly fLo?: number;
  readonly fHi?: number;
  /** Best estimate so far and iterations used (did_not_converge). */
  readonly x?: number;
  readonly iterations?: number;
}

export interface RootOptions {
  /** Absolute tolerance on x, added to 4 eps |x|; default 1e-12. */
  readonly xTol?: number;
  /** Stop when |f(x)| <= fTol; default 0 (off). */
  readonly fTol?: number;
  /** Default 200. */
  readonly maxIterations?: number;
}

export interface Root {
  readonly x: number;
  readonly fx: number;
  readonly iterations: number;
}

const EPS = 2.220446049250313e-16;

/**
 * Finds x in [lo, hi] with f(x) = 0 by Brent's method (bisection, secant
 * and inverse quadratic interpolation; Brent 1973, ch. 4). f(lo) and f(hi)
 * must have opposite signs (or one be zero). Converges to within
 * 2 eps |x| + xTol (default xTol = 1e-12). A NaN or infinite f value returns
 * `not_finite`; no sign change returns `no_bracket`; running out of
 * iterations returns `did_not_converge` with the best estimate.
 */
export function brent(
  f: (x: number) => number,
  lo: number,
  hi: number,
  options?: RootOptions,
): Result<Root, RootError> {
  const xTol = options?.xTol ?? 1e-12;
  const fTol = options?.fTol ?? 0;
  const maxIterations = options?.maxIterations ?? 200;
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) {
    return err({ code: 'not_finite', message: `root search interval [${lo}, ${hi}] is not finite`, lo, hi });
  }
  let a = lo;
  let b = hi;
  let fa = f(a);
  let fb = f(b);
  if (!Number.isFinite(fa) || !Number.isFinite(fb)) {
    return err({
      code: 'not_finite',
      message: `function is not finite at the interval ends: f(${a}) = ${fa}, f(${b}) = ${fb}`,
      lo,
      hi,
      fLo: fa,
      fHi: fb,
    });
  }
  if (fa === 0) return ok({ x: a, fx: 0, iterations: 0 });
  if (fb === 0) return ok({ x: b, fx: 0, iterations: 0 });
  if ((fa > 0) === (fb > 0)) {
    return err({
      code: 'no_bracket',
      message: `no sign change on [${lo}, ${hi}]: f(lo) = ${fa}, f(hi) = ${fb}`,
      lo,
      hi,
      fLo: fa,
      fHi: fb,
    });
  }
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iter = 1; iter <= maxIterations; iter++) {
    if ((fb > 0) === (fc > 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * EPS * Math.abs(b) + 0.5 * xTol;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0 || Math.abs(fb) <= fTol) {
      return ok({ x: b, fx: fb, iterations: iter });
    }
    if (Math.abs(e) < tol || Math.abs(fa) <= Math.abs(fb)) {
      d = m;
      e = m;
    } else {
      let p: number;
      let q: number;
      const s = fb / fa;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
    if (!Number.isFinite(fb)) {
      return err({ code: 'not_finite', message: `function is not finite at x = ${b}: ${fb}`, lo, hi, x: b, iterations: iter });
    }
  }
  return err({
    code: 'did_not_converge',
    message: `root search on [${lo}, ${hi}] did not converge in ${maxIterations} iterations (best x = ${b}, f = ${fb})`,
    lo,
    hi,
    x: b,
    iterations: maxIterations,
  });
}

/**
 * Finds x in the bracket [a, b] with |f(x)| <= fTol, given the values
 * fa = f(a) and fb = f(b), of opposite signs and neither zero (the caller
 * has them: no evaluation is repeated). The first step is the chord of the
 * bracket (exact when f is linear on it), the next ones inverse quadratic
 * interpolation through the three latest points (the secant through two
 * where three do not give one), each kept strictly inside the bracket, which
 * shrinks around the sign change after every evaluation; a step that would
 * leave it, or a bracket that has not halved in three steps, is replaced by
 * bisection. Near a simple root of a smooth f inverse quadratic
 * interpolation converges with order about 1.84 and the secant with
 * (1 + sqrt 5)/2 (Brent 1973, ch. 3-4); bisection bounds the worst case. Stops when |f| <= fTol, or when the bracket is narrower than
 * 2 eps |x| + xTol (then x is the end with the smaller |f|). Errors as brent:
 * `no_bracket`, `not_finite`, `did_not_converge`.
 */
export function bracketedSecant(
  f: (x: number) => number,
  a: number,
  fa: number,
  b: number,
  fb: number,
  options?: RootOptions,
): Result<Root, RootError> {
  const xTol = options?.xTol ?? 1e-12;
  const fTol = options?.fTol ?? 0;
  const maxIterations = options?.maxIterations ?? 200;
  const lo0 = a;
  const hi0 = b;
  if (!Number.isFinite(a) || !Number.isFinite(b) || !Number.isFinite(fa) || !Number.isFinite(fb)) {
    return err({ code: 'not_finite', message: `bracket [${a}, ${b}] or its values f = ${fa}, ${fb} not finite`, lo: a, hi: b, fLo: fa, fHi: fb });
  }
  if (!((fa < 0 && fb > 0) || (fa > 0 && fb < 0))) {
    return err({ code: 'no_bracket', message: `no strict sign change on [${a}, ${b}]: f = ${fa}, ${fb}`, lo: a, hi: b, fLo: fa, fHi: fb });
  }
  const negativeAtA = fa < 0;
  // The three latest points, newest last (xp: none yet).
  let xp = Number.NaN;
  let fp = Number.NaN;
  let x0 = a;
  let f0 = fa;
  let x1 = b;
  let f1 = fb;
  let width = Math.abs(b - a);
  let stale = 0;
  for (let iter = 1; iter <= maxIterations; iter++) {
    const lo = a < b ? a : b;
    const hi = a < b ? b : a;
    let x: number;
    if (!Number.isNaN(xp) && fp !== f0 && fp !== f1 && f0 !== f1) {
      // Inverse quadratic interpolation through the three latest points (Brent 1973, ch. 4).
      x = (xp * f0 * f1) / ((fp - f0) * (fp - f1)) + (x0 * fp * f1) / ((f0 - fp) * (f0 - f1)) + (x1 * fp * f0) / ((f1 - fp) * (f1 - f0));
    } else {
      x = x1 - (f1 * (x1 - x0)) / (f1 - f0);
    }
    if (!(x > lo && x < hi) || stale >= 3) {
      x = 0.5 * (a + b);
      stale = 0;
    }
    const fx = f(x);
    if (!Number.isFinite(fx)) {
      return err({ code: 'not_finite', message: `function is not finite at x = ${x}: ${fx}`, lo: lo0, hi: hi0, x, iterations: iter });
    }
    if (Math.abs(fx) <= fTol || fx === 0) return ok({ x, fx, iterations: iter });
    if (fx < 0 === negativeAtA) {
      a = x;
      fa = fx;
    } else {
      b = x;
      fb = fx;
    }
    xp = x0;
    fp = f0;
    x0 = x1;
    f0 = f1;
    x1 = x;
    f1 = fx;
    const w = Math.abs(b - a);
    if (w <= 2 * EPS * Math.abs(x) + xTol) {
      return Math.abs(fa) <= Math.abs(fb) ? ok({ x: a, fx: fa, iterations: iter }) : ok({ x: b, fx: fb, iterations: iter });
    }
    if (w <= 0.5 * width) {
      width = w;
      stale = 0;
    } else {
      stale++;
    }
  }
  return err({
    code: 'did_not_converge',
    message: `secant on [${lo0}, ${hi0}] did not converge in ${maxIterations} iterations (bracket [${a}, ${b}])`,
    lo: lo0,
    hi: hi0,
    x: x1,
    iterations: maxIterations,
  });
}

export interface BracketOptions {
  /** Growth factor of the interval width per step; default 1.6. */
  readonly factor?: number;
  /** Default 50. */
  readonly maxSteps?: number;
  /** Hard limits the bracket may not leave; default unbounded. */
  readonly min?: number;
  readonly max?: number;
}

/**
 * Widens [lo, hi] geometrically (Press et al., Numerical Recipes, `zbrac`)
 * until f changes sign, staying within [min, max]. Returns the bracket and
 * the function values at its ends, or `no_bracket` / `not_finite`.
 */
export function expandBracket(
  f: (x: number) => number,
  lo: number,
  hi: number,
  options?: BracketOptions,
): Result<{ lo: number; hi: number; fLo: number; fHi: number }, RootError> {
  const factor = options?.factor ?? 1.6;
  const maxSteps = options?.maxSteps ?? 50;
  const min = options?.min ?? -Infinity;
  const max = options?.max ?? Infinity;
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || lo === hi) {
    return err({ code: 'not_finite', message: `cannot expand the bracket [${lo}, ${hi}]`, lo, hi });
  }
  let a = Math.max(min, Math.min(lo, hi));
  let b = Math.min(max, Math.max(lo, hi));
  let fa = f(a);
  let fb = f(b);
  for (let step = 0; step <= maxSteps; step++) {
    if (!Number.isFinite(fa) || !Number.isFinite(fb)) {
      return err({ code: 'not_finite', message: `function is not finite while bracketing: f(${a}) = ${fa}, f(${b}) = ${fb}`, lo: a, hi: b, fLo: fa, fHi: fb });
    }
    if (fa === 0 || fb === 0 || (fa > 0) !== (fb > 0)) return ok({ lo: a, hi: b, fLo: fa, fHi: fb });
    const atMin = a <= min;
    const atMax = b >= max;
    if (atMin && atMax) break;
    const width = b - a;
    if ((Math.abs(fa) < Math.abs(fb) && !atMin) || atMax) {
      a = Math.max(min, a - factor * width);
      fa = f(a);
    } else {
      b = Math.min(max, b + factor * width);
      fb = f(b);
    }
  }
  return err({
    code: 'no_bracket',
    message: `no sign change found expanding from [${lo}, ${hi}] to [${a}, ${b}]`,
    lo: a,
    hi: b,
    fLo: fa,
    fHi: fb,
  });
}
