/**
 * One-dimensional searches shared by the analyses: sample a function on a
 * uniform grid, then refine sign changes with Brent's root finder
 * (engine/core/rootFind.ts) and maxima with golden-section search
 * (engine/core/scalarMaximum.ts: Kiefer 1953; Press et al., Numerical
 * Recipes, `golden`).
 */
import { brent } from '../core/rootFind';
import { goldenSectionBracket } from '../core/scalarMaximum';

/** Uniform grid of `count` points from lo to hi inclusive (count >= 2). */
export function uniformGrid(lo: number, hi: number, count: number): number[] {
  const n = Math.max(2, Math.floor(count));
  const out: number[] = [];
  for (let i = 0; i < n; i++) out.push(i === n - 1 ? hi : lo + ((hi - lo) * i) / (n - 1));
  return out;
}

export interface Extremum {
  readonly x: number;
  readonly fx: number;
  /** True when the extremum lies at an end of [lo, hi] (the function is monotone there). */
  readonly atBound: boolean;
}

/**
 * Maximum of f on [lo, hi]: the best of `samples` grid points, then a
 * golden-section search between its neighbours to |dx| <= xTol. Assumes f is
 * unimodal near the best sample. Returns null when f is not finite anywhere.
 */
export function maximizeOnGrid(
  f: (x: number) => number,
  lo: number,
  hi: number,
  samples: number,
  xTol: number,
): Extremum | null {
  const xs = uniformGrid(lo, hi, samples);
  let best = -1;
  let bestF = -Infinity;
  const fs = xs.map((x) => f(x));
  fs.forEach((v, i) => {
    if (Number.isFinite(v) && v > bestF) {
      bestF = v;
      best = i;
    }
  });
  if (best < 0) return null;
  const a = xs[Math.max(0, best - 1)]!;
  const b = xs[Math.min(xs.length - 1, best + 1)]!;
  const refined = refineMaximum(f, a, b, xs[best]!, bestF, xTol);
  const span = hi - lo;
  const edge = Math.max(xTol, 1e-9 * span) * 2;
  return { ...refined, atBound: Math.abs(refined.x - lo) <= edge || Math.abs(refined.x - hi) <= edge };
}

/**
 * Golden-section search for the maximum of f on [a, b] to |dx| <= xTol,
 * starting from a known sample (xBest, fBest) inside, which is returned if
 * nothing better is found.
 */
export function refineMaximum(
  f: (x: number) => number,
  a0: number,
  b0: number,
  xBest: number,
  fBest: number,
  xTol: number,
): { x: number; fx: number } {
  const { a, b } = goldenSectionBracket(f, a0, b0, xTol);
  const xm = 0.5 * (a + b);
  const fm = f(xm);
  if (Number.isFinite(fm) && (!Number.isFinite(fBest) || fm >= fBest)) return { x: xm, fx: fm };
  return { x: xBest, fx: fBest };
}

/** Minimum of f on [lo, hi]; see maximizeOnGrid. */
export function minimizeOnGrid(
  f: (x: number) => number,
  lo: number,
  hi: number,
  samples: number,
  xTol: number,
): Extremum | null {
  const m = maximizeOnGrid((x) => -f(x), lo, hi, samples, xTol);
  return m === null ? null : { x: m.x, fx: -m.fx, atBound: m.atBound };
}

/**
 * Every sign change of f over the ordered points xs, each refined by Brent's
 * method to xTol. Exact zeros at grid points count once.
 */
export function rootsOnPoints(
  f: (x: number) => number,
  xs: readonly number[],
  xTol: number,
): number[] {
  const roots: number[] = [];
  let xPrev = xs[0]!;
  let fPrev = f(xPrev);
  if (fPrev === 0) roots.push(xPrev);
  for (let i = 1; i < xs.length; i++) {
    const x = xs[i]!;
    const fx = f(x);
    if (fx === 0) {
      roots.push(x);
    } else if (Number.isFinite(fPrev) && Number.isFinite(fx) && fPrev !== 0 && (fPrev > 0) !== (fx > 0)) {
      const r = brent(f, xPrev, x, { xTol });
      if (r.ok) roots.push(r.value.x);
    }
    xPrev = x;
    fPrev = fx;
  }
  return roots;
}
