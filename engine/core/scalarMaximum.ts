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
