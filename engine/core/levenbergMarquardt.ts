/**
 * Bounded nonlinear least squares by the Levenberg-Marquardt method
 * (Levenberg 1944, Marquardt 1963; the damped Gauss-Newton step
 * (J^T J + lambda diag(J^T J)) dx = -J^T r, as in Nocedal & Wright,
 * Numerical Optimization, ch. 10), with the Jacobian by forward differences
 * and bounds kept by holding a variable at a bound its descent direction
 * leaves (an active set) and projecting each trial point onto the box. Minimizes
 * 0.5 sum r_i(x)^2. Deterministic; never throws for a residual function
 * that returns non-finite values (such a trial is rejected as a bad step).
 */

export interface LeastSquaresOptions {
  readonly lower: readonly number[];
  readonly upper: readonly number[];
  readonly maxIterations?: number;
  /** Stop when the relative reduction of the cost falls below this (default 1e-10). */
  readonly costTolerance?: number;
  /** Stop when every step component is below this fraction of its box width (default 1e-10). */
  readonly stepTolerance?: number;
  /** Relative forward-difference step of the Jacobian, of the box width (default 1e-6). */
  readonly jacobianStep?: number;
}

export interface LeastSquaresResult {
  readonly x: readonly number[];
  readonly residuals: readonly number[];
  /** 0.5 sum r^2 at x. */
  readonly cost: number;
  readonly iterations: number;
  readonly evaluations: number;
  readonly converged: boolean;
  readonly message: string;
}

function solveLinear(a: number[][], b: number[]): number[] | null {
  const n = b.length;
  const m = a.map((row, i) => [...row, b[i]!]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(m[r]![c]!) > Math.abs(m[p]![c]!)) p = r;
    if (!(Math.abs(m[p]![c]!) > 1e-300)) return null;
    [m[c], m[p]] = [m[p]!, m[c]!];
    for (let r = c + 1; r < n; r++) {
      const f = m[r]![c]! / m[c]![c]!;
      for (let k = c; k <= n; k++) m[r]![k] = m[r]![k]! - f * m[c]![k]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = m[r]![n]!;
    for (let k = r + 1; k < n; k++) s -= m[r]![k]! * x[k]!;
    x[r] = s / m[r]![r]!;
  }
  return x.every(Number.isFinite) ? x : null;
}

const cost = (r: readonly number[]): number => 0.5 * r.reduce((s, v) => s + v * v, 0);
const finite = (r: readonly number[] | null): r is readonly number[] => r !== null && r.every(Number.isFinite);

/**
 * Minimizes 0.5 |f(x)|^2 over lower <= x <= upper from `x0` (projected into
 * the box). `f` returns the residual vector (same length every call) or null
 * where it cannot be evaluated. Returns the best point found, with
 * `converged` false and a message when the iterations ran out or the start
 * cannot be evaluated.
 */
export function leastSquares(
  f: (x: readonly number[]) => readonly number[] | null,
  x0: readonly number[],
  options: LeastSquaresOptions,
): LeastSquaresResult {
  const n = x0.length;
  const lo = options.lower;
  const hi = options.upper;
  const clampBox = (x: readonly number[]): number[] => x.map((v, i) => Math.min(hi[i]!, Math.max(lo[i]!, v)));
  const width = lo.map((l, i) => hi[i]! - l);
  const maxIterations = options.maxIterations ?? 100;
  const costTol = options.costTolerance ?? 1e-10;
  const stepTol = options.stepTolerance ?? 1e-10;
  const hJ = options.jacobianStep ?? 1e-6;
  let evaluations = 0;
  const evaluate = (x: readonly number[]): readonly number[] | null => {
    evaluations++;
    return f(x);
  };
  let x = clampBox(x0);
  let r = evaluate(x);
  if (!finite(r)) {
    return { x, residuals: [], cost: Number.POSITIVE_INFINITY, iterations: 0, evaluations, converged: false, message: 'the residuals cannot be evaluated at the start' };
  }
  let c = cost(r);
  let lambda = 1e-3;
  for (let it = 1; it <= maxIterations; it++) {
    // Forward-difference Jacobian, stepping inward at an upper bound.
    const J: number[][] = r.map(() => new Array<number>(n).fill(0));
    for (let j = 0; j < n; j++) {
      const h = hJ * width[j]!;
      const xp = [...x];
      const step = x[j]! + h <= hi[j]! ? h : -h;
      xp[j] = x[j]! + step;
      const rp = evaluate(xp);
      if (!finite(rp)) continue;
      for (let i = 0; i < r.length; i++) J[i]![j] = (rp[i]! - r[i]!) / step;
    }
    const JtJ = Array.from({ length: n }, (_, a) => Array.from({ length: n }, (_, b) => r!.reduce((s, _v, i) => s + J[i]![a]! * J[i]![b]!, 0)));
    const Jtr = Array.from({ length: n }, (_, a) => r!.reduce((s, v, i) => s + J[i]![a]! * v, 0));
    // Active bounds: a variable at a bound whose descent direction points out of the box is held there.
    const held = x.map((v, j) => (v <= lo[j]! && Jtr[j]! > 0) || (v >= hi[j]! && Jtr[j]! < 0));
    for (let j = 0; j < n; j++) {
      if (!held[j]) continue;
      for (let k = 0; k < n; k++) {
        JtJ[j]![k] = k === j ? 1 : 0;
        JtJ[k]![j] = k === j ? 1 : 0;
      }
      Jtr[j] = 0;
    }
    let accepted = false;
    for (let tries = 0; tries < 12 && !accepted; tries++) {
      const A = JtJ.map((row, a) => row.map((v, b) => (a === b ? v + lambda * Math.max(v, 1e-12) : v)));
      const dx = solveLinear(A, Jtr.map((v) => -v));
      if (dx === null) {
        lambda *= 10;
        continue;
      }
      const xt = clampBox(x.map((v, i) => v + dx[i]!));
      const rt = evaluate(xt);
      const ct = finite(rt) ? cost(rt) : Number.POSITIVE_INFINITY;
      if (ct < c) {
        const smallStep = xt.every((v, i) => Math.abs(v - x[i]!) <= stepTol * width[i]!);
        const smallGain = (c - ct) <= costTol * c;
        x = xt;
        r = rt!;
        c = ct;
        lambda = Math.max(lambda / 10, 1e-12);
        accepted = true;
        if (smallStep || smallGain) {
          return { x, residuals: r, cost: c, iterations: it, evaluations, converged: true, message: `converged in ${it} iterations` };
        }
      } else {
        lambda *= 10;
      }
    }
    if (!accepted) {
      return { x, residuals: r, cost: c, iterations: it, evaluations, converged: true, message: `converged in ${it} iterations (no step reduces the cost further)` };
    }
  }
  return { x, residuals: r, cost: c, iterations: maxIterations, evaluations, converged: false, message: `not converged after ${maxIterations} iterations` };
}
