/**
 * Golden-section search for the maximum of a unimodal function of one
 * variable: the one maximiser shared by the mission (best-range and
 * minimum-drag Mach, optimum cruise-climb altitude) and the analyses
 * (engine/analysis/scalarSearch.ts). Kiefer (1953); Press et al., Numerical
 * Recipes, section 10.2 (`golden`).
 */

const INV_PHI = (Math.sqrt(5) - 1) / 2;

/** Final bracket of a golden-section search. */
export interface GoldenBracket {
  readonly a: number;
  readonly b: number;
}

/**
 * Shrinks [lo, hi] by golden sections around the maximum of f until
 * b - a <= xTol (at most `maxIterations` sections). A non-finite value on
 * the right probe counts as lower (the bracket moves left), so f may be NaN
 * on part of the interval. Any units; f must be unimodal on [lo, hi].
 */
export function goldenSectionBracket(
  f: (x: number) => number,
  lo: number,
  hi: number,
  xTol: number,
  maxIterations = 200,
): GoldenBracket {
  let a = lo;
  let b = hi;
  let c = b - INV_PHI * (b - a);
  let d = a + INV_PHI * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let i = 0; i < maxIterations && b - a > xTol; i++) {
    if (fc >= fd || !Number.isFinite(fd)) {
      b = d;
      d = c;
      fd = fc;
      c = b - INV_PHI * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + INV_PHI * (b - a);
      fd = f(d);
    }
  }
  return { a, b };
}

/** Argument of the maximum of a unimodal f on [lo, hi], the middle of the final golden-section bracket (|error| <= tolerance / 2). */
export function goldenMaximum(f: (x: number) => number, lo: number, hi: number, tolerance = 1e-5): number {
  const { a, b } = goldenSectionBracket(f, lo, hi, tolerance);
  return 0.5 * (a + b);
}

/**
 * Maximum of f on [lo, hi] by Brent's method (successive parabolic
 * interpolation safeguarded by golden sections: R. P. Brent, Algorithms for
 * Minimization without Derivatives, 1973, ch. 5; Press et al., Numerical
 * Recipes, section 10.3, `brent`), started from a sample (x0, f0) inside
 * with f0 >= f(lo), f(hi) expected. Stops when the bracket around the best
 * point is at most xTol wide, so the point returned is within xTol of the
 * maximum of a unimodal f; on a smooth peak it needs a handful of
 * evaluations where golden sections need about log(width / xTol) / 0.48.
 * A non-finite value counts as lower than any finite one. Returns the best
 * point evaluated and its value (x0, f0 when nothing better is found).
 */
export function brentMaximum(
  f: (x: number) => number,
  lo: number,
  hi: number,
  x0: number,
  f0: number,
  xTol: number,
  maxIterations = 200,
): { x: number; fx: number } {
  // Minimises g = -f, non-finite values as +Infinity.
  const g = (x: number): number => {
    const v = f(x);
    return Number.isFinite(v) ? -v : Infinity;
  };
  const golden = 1 - INV_PHI;
  const tol1 = xTol / 4;
  const tol2 = 2 * tol1;
  let a = Math.min(lo, hi);
  let b = Math.max(lo, hi);
  let x = x0;
  let w = x0;
  let v = x0;
  let gx = Number.isFinite(f0) ? -f0 : Infinity;
  let gw = gx;
  let gv = gx;
  let d = 0;
  let e = 0;
  for (let i = 0; i < maxIterations; i++) {
    const xm = 0.5 * (a + b);
    if (Math.abs(x - xm) <= tol2 - 0.5 * (b - a)) break;
    let parabolic = false;
    if (Math.abs(e) > tol1) {
      const r = (x - w) * (gx - gv);
      let q = (x - v) * (gx - gw);
      let p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      q = Math.abs(q);
      const eLast = e;
      e = d;
      if (Number.isFinite(p) && Number.isFinite(q) && Math.abs(p) < Math.abs(0.5 * q * eLast) && p > q * (a - x) && p < q * (b - x)) {
        d = p / q;
        const u = x + d;
        if (u - a < tol2 || b - u < tol2) d = xm >= x ? tol1 : -tol1;
        parabolic = true;
      }
    }
    if (!parabolic) {
      e = x >= xm ? a - x : b - x;
      d = golden * e;
    }
    const u = Math.abs(d) >= tol1 ? x + d : x + (d >= 0 ? tol1 : -tol1);
    const gu = g(u);
    if (gu <= gx) {
      if (u >= x) a = x;
      else b = x;
      v = w;
      gv = gw;
      w = x;
      gw = gx;
      x = u;
      gx = gu;
    } else {
      if (u < x) a = u;
      else b = u;
      if (gu <= gw || w === x) {
        v = w;
        gv = gw;
        w = u;
        gw = gu;
      } else if (gu <= gv || v === x || v === w) {
        v = u;
        gv = gu;
      }
    }
  }
  return { x, fx: gx === Infinity ? f0 : -gx };
}
