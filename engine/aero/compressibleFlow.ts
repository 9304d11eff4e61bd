/**
 * One-dimensional compressible flow of a perfect gas: isentropic ratios,
 * mass-flow function, area-Mach relation and the normal shock. Source:
 * NACA Report 1135 (1953), "Equations, Tables, and Charts for Compressible
 * Flow", equations 43-45 (isentropic), 80 (area ratio), 93-99 (normal shock).
 * gamma defaults to 1.4.
 */
import { brent, type RootError } from '../core/rootFind';
import { err, ok, type Result } from '../core/result';
import { gamma as GAMMA_AIR, p0, R_air, T0 } from './constants';

export type FlowBranch = 'subsonic' | 'supersonic';

function requireMach(mach: number, what: string): void {
  if (!(mach >= 0) || !Number.isFinite(mach)) throw new RangeError(`${what}: Mach must be finite and >= 0, got ${mach}`);
}

/** Static-to-total temperature T/T0 = (1 + (g-1)/2 M^2)^-1 (NACA 1135 eq. 43). Mach >= 0. */
export function isentropicTemperatureRatio(mach: number, gamma = GAMMA_AIR): number {
  requireMach(mach, 'isentropicTemperatureRatio');
  return 1 / (1 + 0.5 * (gamma - 1) * mach * mach);
}

/** Static-to-total pressure p/p0 = (T/T0)^(g/(g-1)) (NACA 1135 eq. 44). Mach >= 0. */
export function isentropicPressureRatio(mach: number, gamma = GAMMA_AIR): number {
  return Math.pow(isentropicTemperatureRatio(mach, gamma), gamma / (gamma - 1));
}

/** Static-to-total density rho/rho0 = (T/T0)^(1/(g-1)) (NACA 1135 eq. 45). Mach >= 0. */
export function isentropicDensityRatio(mach: number, gamma = GAMMA_AIR): number {
  return Math.pow(isentropicTemperatureRatio(mach, gamma), 1 / (gamma - 1));
}

/**
 * Mass-flow parameter mdot sqrt(R Tt) / (A pt) = sqrt(g) M (1 + (g-1)/2 M^2)^(-(g+1)/(2(g-1)))
 * (-), from NACA 1135 eqs. 43-45 with mdot = rho V A; peaks at M = 1
 * (0.684731 for g = 1.4). Mach >= 0.
 */
export function massFlowParameter(mach: number, gamma = GAMMA_AIR): number {
  requireMach(mach, 'massFlowParameter');
  return Math.sqrt(gamma) * mach * Math.pow(1 + 0.5 * (gamma - 1) * mach * mach, -(gamma + 1) / (2 * (gamma - 1)));
}

/**
 * Corrected flow per unit area mdot sqrt(theta_t) / (delta_t A) (kg/(s m^2)),
 * referenced to sea-level standard total conditions (p0 = 101325 Pa,
 * T0 = 288.15 K): massFlowParameter * p0 / sqrt(R T0); 241.3 at M = 1.
 */
export function correctedFlowPerArea_kg_s_m2(mach: number, gamma = GAMMA_AIR): number {
  return (massFlowParameter(mach, gamma) * p0) / Math.sqrt(R_air * T0);
}

/** Area ratio A/A* = (1/M) [(2/(g+1))(1 + (g-1)/2 M^2)]^((g+1)/(2(g-1))) (NACA 1135 eq. 80). Mach > 0. */
export function areaRatio(mach: number, gamma = GAMMA_AIR): number {
  requireMach(mach, 'areaRatio');
  if (mach === 0) throw new RangeError('areaRatio: Mach must be > 0 (A/A* is infinite at rest)');
  const e = (gamma + 1) / (2 * (gamma - 1));
  return Math.pow((2 / (gamma + 1)) * (1 + 0.5 * (gamma - 1) * mach * mach), e) / mach;
}

/** Highest Mach searched on the supersonic branch. */
const MAX_SUPERSONIC_MACH = 100;

function solveBranch(
  f: (m: number) => number,
  branch: FlowBranch,
  what: string,
): Result<number, RootError> {
  const [lo, hi] = branch === 'subsonic' ? [0, 1] : [1, MAX_SUPERSONIC_MACH];
  const root = brent(f, lo, hi, { xTol: 1e-14 });
  if (!root.ok) return err({ ...root.error, message: `${what}: ${root.error.message}` });
  return ok(root.value.x);
}

/**
 * Mach number (-) on the chosen branch whose area ratio A/A* is `ratio`
 * (>= 1); inverse of areaRatio by Brent's method. A ratio below 1, or beyond
 * Mach 100 on the supersonic branch, returns `no_bracket`.
 */
export function machFromAreaRatio(ratio: number, branch: FlowBranch, gamma = GAMMA_AIR): Result<number, RootError> {
  if (!Number.isFinite(ratio)) return err({ code: 'not_finite', message: `area ratio A/A* must be finite, got ${ratio}` });
  if (ratio < 1) {
    return err({ code: 'no_bracket', message: `area ratio A/A* = ${ratio} is below 1: no isentropic flow reaches it` });
  }
  if (ratio === 1) return ok(1);
  if (branch === 'subsonic') {
    // f(M) = M A/A*(M) - M ratio is finite at M = 0 (equals the limit of M A/A*), so the bracket is [0, 1].
    const c = Math.pow(2 / (gamma + 1), (gamma + 1) / (2 * (gamma - 1)));
    return solveBranch(
      (m) => (m === 0 ? c : m * areaRatio(m, gamma)) - m * ratio,
      branch,
      `Mach for A/A* = ${ratio} (subsonic)`,
    );
  }
  return solveBranch((m) => (m === 1 ? 1 : areaRatio(m, gamma)) - ratio, branch, `Mach for A/A* = ${ratio} (supersonic)`);
}

/**
 * Mach number (-) on the chosen branch whose mass-flow parameter
 * mdot sqrt(R Tt)/(A pt) is `value` (0 to the sonic maximum, 0.6847 for
 * g = 1.4); above the maximum the passage is choked and `no_bracket` returns.
 */
export function machFromMassFlowParameter(value: number, branch: FlowBranch, gamma = GAMMA_AIR): Result<number, RootError> {
  if (!Number.isFinite(value)) return err({ code: 'not_finite', message: `mass-flow parameter must be finite, got ${value}` });
  const max = massFlowParameter(1, gamma);
  if (value < 0 || value > max) {
    return err({
      code: 'no_bracket',
      message: `mass-flow parameter ${value} is outside 0 to ${max.toFixed(6)} (the sonic, choked value)`,
    });
  }
  if (value === max) return ok(1);
  if (value === 0 && branch === 'subsonic') return ok(0);
  if (value === 0) return err({ code: 'no_bracket', message: 'a zero mass-flow parameter has no supersonic Mach' });
  return solveBranch((m) => massFlowParameter(m, gamma) - value, branch, `Mach for mass-flow parameter ${value} (${branch})`);
}

/**
 * Mach number (-) on the chosen branch at a corrected flow per unit area
 * (kg/(s m^2), sea-level standard reference); inverse of correctedFlowPerArea_kg_s_m2.
 */
export function machFromCorrectedFlowPerArea(flowPerArea_kg_s_m2: number, branch: FlowBranch, gamma = GAMMA_AIR): Result<number, RootError> {
  return machFromMassFlowParameter((flowPerArea_kg_s_m2 * Math.sqrt(R_air * T0)) / p0, branch, gamma);
}

export interface NormalShock {
  /** Downstream Mach number (-). */
  readonly mach2: number;
  /** Static pressure ratio p2/p1 (-). */
  readonly pressureRatio: number;
  /** Static temperature ratio T2/T1 (-). */
  readonly temperatureRatio: number;
  /** Density ratio rho2/rho1 (-). */
  readonly densityRatio: number;
  /** Total-pressure ratio pt2/pt1 (-), the shock's recovery. */
  readonly totalPressureRatio: number;
}

/**
 * Normal-shock relations for an upstream Mach number >= 1 (NACA 1135 eqs.
 * 93-99). At M1 = 1 all ratios are 1. Throws for M1 < 1 (no shock: a caller bug).
 */
export function normalShock(mach1: number, gamma = GAMMA_AIR): NormalShock {
  if (!(mach1 >= 1) || !Number.isFinite(mach1)) throw new RangeError(`normalShock: upstream Mach must be finite and >= 1, got ${mach1}`);
  const m2 = mach1 * mach1;
  const gm1 = gamma - 1;
  const gp1 = gamma + 1;
  const mach2 = Math.sqrt((gm1 * m2 + 2) / (2 * gamma * m2 - gm1));
  const pressureRatio = (2 * gamma * m2 - gm1) / gp1;
  const densityRatio = (gp1 * m2) / (gm1 * m2 + 2);
  const temperatureRatio = pressureRatio / densityRatio;
  const totalPressureRatio =
    Math.pow(densityRatio, gamma / gm1) * Math.pow(1 / pressureRatio, 1 / gm1);
  return { mach2, pressureRatio, temperatureRatio, densityRatio, totalPressureRatio };
}
