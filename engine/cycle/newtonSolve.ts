/**
 * Damped Newton iteration for a small square system r(x) = 0: a
 * forward-difference Jacobian kept current by Broyden updates, a step bound
 * and a backtracking line search on the sum of squared residuals, converged
 * on the largest one (Dennis & Schnabel, Numerical Methods for Unconstrained
 * Optimization and Nonlinear Equations, chapters 6 and 8). The
 * residual function may refuse a trial point (return false) where its
 * relations do not hold; the line search then shortens the step.
 */

export interface NewtonOptions {
  /** Converged when every |r_i| is at most this. */
  readonly tolerance: number;
  readonly maxIterations: number;
  /** Largest change of any unknown in one step (unknowns are scaled to order 1). */
  readonly maxStep: number;
}

export interface NewtonOutcome {
  readonly converged: boolean;
  readonly x: Float64Array;
  /** Largest |r_i| at x (Infinity when x was refused). */
  readonly residual: number;
  readonly iterations: number;
  /** Residual evaluations spent (the cost measure). */
  readonly evaluations: number;
  /** Why it stopped when not converged. */
  readonly reason: string;
}

/** Writes r(x) into `out`; returns false when x is outside where r is defined. */
export type ResidualFunction = (x: Float64Array, out: Float64Array) => boolean;

export const DEFAULT_NEWTON: NewtonOptions = { tolerance: 1e-12, maxIterations: 60, maxStep: 0.25 };

function sumSquares(r: Float64Array): number {
  let s = 0;
  for (let i = 0; i < r.length; i++) s += r[i]! * r[i]!;
  return Number.isFinite(s) ? s : Infinity;
}

function maxAbs(r: Float64Array): number {
  let m = 0;
  for (let i = 0; i < r.length; i++) {
    const a = Math.abs(r[i]!);
    if (!(a <= m)) m = Number.isNaN(a) ? Infinity : a;
  }
  return m;
}

/** Solves a x = b in place by Gaussian elimination with partial pivoting (a is n x n row-major); false when singular. */
export function solveLinearInPlace(a: Float64Array, b: Float64Array, n: number): boolean {
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let row = col + 1; row < n; row++) if (Math.abs(a[row * n + col]!) > Math.abs(a[pivot * n + col]!)) pivot = row;
    const p = a[pivot * n + col]!;
    if (!(Math.abs(p) > 1e-300) || !Number.isFinite(p)) return false;
    if (pivot !== col) {
      for (let j = 0; j < n; j++) {
        const t = a[col * n + j]!;
        a[col * n + j] = a[pivot * n + j]!;
        a[pivot * n + j] = t;
      }
      const t = b[col]!;
      b[col] = b[pivot]!;
      b[pivot] = t;
    }
    for (let row = col + 1; row < n; row++) {
      const factor = a[row * n + col]! / p;
      if (factor === 0) continue;
      for (let j = col; j < n; j++) a[row * n + j] = a[row * n + j]! - factor * a[col * n + j]!;
      b[row] = b[row]! - factor * b[col]!;
    }
  }
  for (let row = n - 1; row >= 0; row--) {
    let s = b[row]!;
    for (let j = row + 1; j < n; j++) s -= a[row * n + j]! * b[j]!;
    b[row] = s / a[row * n + row]!;
  }
  for (let i = 0; i < n; i++) if (!Number.isFinite(b[i]!)) return false;
  return true;
}

/** Forward-difference Jacobian of r at x into jac (row-major); false when r refuses both sides of a step. */
function differenceJacobian(residual: ResidualFunction, x: Float64Array, r: Float64Array, jac: Float64Array, xTrial: Float64Array, rTrial: Float64Array): boolean {
  const n = x.length;
  for (let j = 0; j < n; j++) {
    const h = 1e-7 * Math.max(1, Math.abs(x[j]!));
    xTrial.set(x);
    let hj = h;
    xTrial[j] = x[j]! + hj;
    if (!residual(xTrial, rTrial)) {
      hj = -h;
      xTrial[j] = x[j]! + hj;
      if (!residual(xTrial, rTrial)) return false;
    }
    for (let i = 0; i < n; i++) jac[i * n + j] = (rTrial[i]! - r[i]!) / hj;
  }
  return true;
}

/** Broyden's rank-one update of jac after a step dx that changed r by dr: J += (dr - J dx) dx^T / (dx^T dx). */
function broydenUpdate(jac: Float64Array, dx: Float64Array, dr: Float64Array, n: number): void {
  let dd = 0;
  for (let j = 0; j < n; j++) dd += dx[j]! * dx[j]!;
  if (!(dd > 0)) return;
  for (let i = 0; i < n; i++) {
    let jdx = 0;
    for (let j = 0; j < n; j++) jdx += jac[i * n + j]! * dx[j]!;
    const c = (dr[i]! - jdx) / dd;
    for (let j = 0; j < n; j++) jac[i * n + j] = jac[i * n + j]! + c * dx[j]!;
  }
}

/**
 * Solves r(x) = 0 from x0; never throws, reports the residual it reached.
 * The Jacobian is formed by differences at the start and again whenever a
 * full step is not accepted; in between it follows Broyden's update
 * (Dennis & Schnabel, chapter 8), which saves most residual evaluations.
 */
export function newtonSolve(counted: ResidualFunction, x0: ArrayLike<number>, options: NewtonOptions = DEFAULT_NEWTON): NewtonOutcome {
  let evaluations = 0;
  const residual: ResidualFunction = (xs, out) => {
    evaluations++;
    return counted(xs, out);
  };
  const n = x0.length;
  const x = Float64Array.from(x0);
  const r = new Float64Array(n);
  const rTrial = new Float64Array(n);
  const xTrial = new Float64Array(n);
  const jac = new Float64Array(n * n);
  const work = new Float64Array(n * n);
  const step = new Float64Array(n);
  const dx = new Float64Array(n);
  const dr = new Float64Array(n);
  if (!residual(x, r)) return { converged: false, x, residual: Infinity, iterations: 0, evaluations, reason: 'the starting point is outside the cycle relations' };
  let norm = maxAbs(r);
  let sq = sumSquares(r);
  let fresh = false;
  let haveJacobian = false;
  for (let it = 0; it < options.maxIterations; it++) {
    if (norm <= options.tolerance) return { converged: true, x, residual: norm, iterations: it, evaluations, reason: '' };
    if (!haveJacobian) {
      if (!differenceJacobian(residual, x, r, jac, xTrial, rTrial)) return { converged: false, x, residual: norm, iterations: it, evaluations, reason: 'the Jacobian could not be formed at the edge of the cycle relations' };
      haveJacobian = true;
      fresh = true;
    }
    work.set(jac);
    for (let i = 0; i < n; i++) step[i] = -r[i]!;
    if (!solveLinearInPlace(work, step, n)) {
      if (!fresh) {
        haveJacobian = false;
        continue;
      }
      return { converged: false, x, residual: norm, iterations: it, evaluations, reason: 'the Jacobian is singular' };
    }
    const biggest = maxAbs(step);
    const lambda0 = biggest > options.maxStep ? options.maxStep / biggest : 1;
    let lambda = lambda0;
    let accepted = false;
    for (let tries = 0; tries < (fresh ? 40 : 4); tries++) {
      for (let i = 0; i < n; i++) xTrial[i] = x[i]! + lambda * step[i]!;
      if (residual(xTrial, rTrial)) {
        const trialNorm = maxAbs(rTrial);
        const trialSq = sumSquares(rTrial);
        if (trialSq < (1 - 1e-4 * lambda) * sq || trialNorm <= options.tolerance) {
          for (let i = 0; i < n; i++) {
            dx[i] = xTrial[i]! - x[i]!;
            dr[i] = rTrial[i]! - r[i]!;
          }
          x.set(xTrial);
          r.set(rTrial);
          norm = trialNorm;
          sq = trialSq;
          accepted = true;
          break;
        }
      }
      lambda *= 0.5;
    }
    if (!accepted) {
      if (!fresh) {
        haveJacobian = false;
        continue;
      }
      return { converged: norm <= options.tolerance, x, residual: norm, iterations: it + 1, evaluations, reason: 'no step along the Newton direction lowers the residual' };
    }
    if (lambda < lambda0) haveJacobian = false;
    else {
      broydenUpdate(jac, dx, dr, n);
      fresh = false;
    }
  }
  const converged = norm <= options.tolerance;
  return { converged, x, residual: norm, iterations: options.maxIterations, evaluations, reason: converged ? '' : `not converged in ${options.maxIterations} iterations` };
}
