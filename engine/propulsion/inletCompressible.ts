/**
 * The few 1-D compressible-flow relations the inlet model needs, for air as
 * a calorically perfect gas with gamma = 1.4 and the ISA gas constant. Isentropic and normal-shock relations as in
 * NACA Report 1135 (Ames Research Staff, 1953), with continuity in its
 * corrected-flow form. Kept local and minimal for the hot
 * path (fixed gamma, closed forms, no allocation).
 */

import { gamma, R_air } from '../aero/constants';

/** Ratio of specific heats (-); the closed forms below assume 1.4. */
export const GAMMA_AIR = gamma;
/** Gas constant of air (J/(kg K)), R* / M0 of the 1976 standard atmosphere. */
export const GAS_CONSTANT_AIR_J_kg_K = R_air;

/** sqrt(gamma / R) (s sqrt(K) / m). */
const SQRT_GAMMA_OVER_R = Math.sqrt(GAMMA_AIR / GAS_CONSTANT_AIR_J_kg_K);

/**
 * Total-to-static pressure ratio pt/p (-) at Mach `mach` (>= 0):
 * (1 + 0.2 M^2)^3.5 (NACA Report 1135, isentropic flow, gamma = 1.4).
 */
export function totalToStaticPressure(mach: number): number {
  const t = 1 + 0.2 * mach * mach;
  return t * t * t * Math.sqrt(t);
}

/** Total-to-static temperature ratio Tt/T (-): 1 + 0.2 M^2 (NACA Report 1135, isentropic flow, gamma = 1.4). */
export function totalToStaticTemperature(mach: number): number {
  return 1 + 0.2 * mach * mach;
}

/**
 * Mass-flow function (-): M (1 + 0.2 M^2)^-3, so that
 * mdot = pt A sqrt(gamma / (R Tt)) * massFlowFunction(M)
 * (continuity with the isentropic relations of NACA Report 1135,
 * gamma = 1.4). Largest at M = 1: 1.2^-3 = 0.5787...
 */
export function massFlowFunction(mach: number): number {
  const t = 1 + 0.2 * mach * mach;
  return mach / (t * t * t);
}

/** The mass-flow function at M = 1 (choked): 1.2^-3 (-). */
export const CHOKED_MASS_FLOW_FUNCTION = 1 / (1.2 * 1.2 * 1.2);

/**
 * Mass-flow function value (-) needed to pass `airflow_kg_s` through
 * `area_m2` at total pressure `pt_Pa` and total temperature `tt_K`.
 */
export function requiredMassFlowFunction(airflow_kg_s: number, area_m2: number, pt_Pa: number, tt_K: number): number {
  return (airflow_kg_s * Math.sqrt(tt_K)) / (pt_Pa * area_m2 * SQRT_GAMMA_OVER_R);
}

/**
 * Subsonic Mach (0..1) whose mass-flow function equals `value`
 * (0 <= value <= CHOKED_MASS_FLOW_FUNCTION). Safeguarded Newton on the
 * closed-form derivative d/dM = (1 - M^2)(1 + 0.2 M^2)^-4, falling back to
 * bisection; converges to 1e-13 in M. Returns NaN above the choked value
 * (the caller reports choking instead).
 *
 * Newton starts from a closed-form guess within 4.1e-5 of the root in M:
 * 1 - M as a quintic in u = sqrt(1 - value / choked value), which is smooth
 * in u at both ends (f = f* - k (1 - M)^2 + ... near Mach 1, so 1 - M is
 * about u / sqrt(k)); coefficients a weighted least-squares fit to the
 * exact inverse over Mach 0..1 (numpy, minimax by iterative reweighting).
 * About 3 Newton evaluations instead of 8 to 10 from the low-Mach start.
 */
export function subsonicMachFromMassFlowFunction(value: number): number {
  if (!(value >= 0)) return Number.NaN;
  if (value === 0) return 0;
  if (value > CHOKED_MASS_FLOW_FUNCTION * (1 + 1e-14)) return Number.NaN;
  if (value >= CHOKED_MASS_FLOW_FUNCTION) return 1;
  let lo = 0;
  let hi = 1;
  const u = Math.sqrt(1 - value / CHOKED_MASS_FLOW_FUNCTION);
  let m = 1 - u * (1.09687 + u * (-0.349015 + u * (0.375937 + u * (-0.24638 + u * 0.12255))));
  for (let i = 0; i < 100; i++) {
    const t = 1 + 0.2 * m * m;
    const t3 = t * t * t;
    const f = m / t3 - value;
    if (f > 0) hi = m;
    else lo = m;
    const df = (1 - m * m) / (t3 * t);
    let next = m - f / df;
    // A converged Newton step is taken as it is: at the root it may round onto the bracket end it just set,
    // which the bracket test below would send to a bisection step away from the root.
    if (df > 0 && Math.abs(next - m) < 1e-13) return next;
    if (!(df > 0 && next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - m) < 1e-13) return next;
    m = next;
  }
  return m;
}

/**
 * Total-pressure ratio across a normal shock pt2/pt1 (-) at upstream Mach
 * `mach` >= 1 (NACA Report 1135, normal-shock relations, gamma = 1.4); 1 below Mach 1.
 */
export function normalShockTotalPressureRatio(mach: number): number {
  if (mach <= 1) return 1;
  const m2 = mach * mach;
  const a = (2.4 * m2) / (0.4 * m2 + 2);
  const b = 2.4 / (2.8 * m2 - 0.4);
  return Math.pow(a, 3.5) * Math.pow(b, 2.5);
}

/** Static speed of sound (m/s) at static temperature `t_K`: sqrt(gamma R T). */
export function speedOfSound(t_K: number): number {
  return Math.sqrt(GAMMA_AIR * GAS_CONSTANT_AIR_J_kg_K * t_K);
}
