/**
 * 1-D flow through an inlet: free-stream tube area and mass-flow ratio,
 * throat and fan-face Mach, and the total-pressure recovery of a geometry
 * inlet. Model (stated in docs/installation.md):
 * - upstream of the lip: isentropic (M0 <= 1) or the MIL-E-5008B shock
 *   recovery (M0 > 1);
 * - lip to throat: lossless, so the throat sees pt_th = eta_shock pt0;
 * - throat to fan face: a diffuser loss K_d q_throat, so
 *   pt2/pt0 = eta_shock (1 - K_d q_th / pt_th);
 * - the engine holds its corrected airflow at a power setting, so the
 *   physical airflow is the deck's scaled by eta / eta_ref; the throat Mach
 *   depends on that airflow, so recovery and airflow are iterated together.
 */
import type { GeometrySource } from './inletDesign';
import {
  CHOKED_MASS_FLOW_FUNCTION,
  GAMMA_AIR,
  GAS_CONSTANT_AIR_J_kg_K,
  requiredMassFlowFunction,
  speedOfSound,
  subsonicMachFromMassFlowFunction,
  totalToStaticPressure,
  totalToStaticTemperature,
} from './inletCompressible';
import { milE5008bRecovery } from './milE5008b';

/** Free-stream static state. */
export interface FreeStream {
  readonly mach: number;
  /** Static pressure (Pa). */
  readonly pressure_Pa: number;
  /** Static temperature (K). */
  readonly temperature_K: number;
}

export interface InletFlow {
  /** Inlet total-pressure recovery pt2/pt0 (-). */
  readonly recovery: number;
  /** Recovery of the flow ahead of the lip (MIL-E-5008B above Mach 1, else 1) (-). */
  readonly shockRecovery: number;
  /** Physical engine airflow after scaling with recovery (kg/s). */
  readonly airflow_kg_s: number;
  /** Free-stream tube area of the engine airflow A0 (m^2); Infinity at Mach 0. */
  readonly streamTubeArea_m2: number;
  readonly throatMach: number;
  readonly fanFaceMach: number;
  /** The airflow asked for exceeds what the throat (fan face) passes at Mach 1; Mach reported as 1. */
  readonly throatChoked: boolean;
  readonly fanFaceChoked: boolean;
}

/**
 * Free-stream tube area A0 = mdot / (rho0 V0) (m^2) of `airflow_kg_s`
 * (continuity); Infinity at Mach 0.
 */
export function streamTubeArea(airflow_kg_s: number, free: FreeStream): number {
  if (!(free.mach > 0)) return Number.POSITIVE_INFINITY;
  const rho = free.pressure_Pa / (GAS_CONSTANT_AIR_J_kg_K * free.temperature_K);
  const v = free.mach * speedOfSound(free.temperature_K);
  return airflow_kg_s / (rho * v);
}

/** Subsonic Mach for a mass-flow-function value, or 1 when the value is at or above choking. */
function machOrChoked(value: number): number {
  return value >= CHOKED_MASS_FLOW_FUNCTION ? 1 : subsonicMachFromMassFlowFunction(value);
}

/** Throat dynamic pressure over throat total pressure (-): (gamma/2) M^2 / (pt/p). */
function dynamicOverTotal(mach: number): number {
  return (0.5 * GAMMA_AIR * mach * mach) / totalToStaticPressure(mach);
}

/**
 * Flow through a geometry inlet at `free` with the deck's airflow
 * `deckAirflow_kg_s` (at the deck's reference recovery `referenceRecovery`).
 * Recovery pt2/pt0 = eta_shock (1 - K_d (gamma/2) M_th^2 / (pt/p)(M_th)),
 * the throat Mach from continuity at pt_th = eta_shock pt0 (NACA Report
 * 1135 relations; diffuser loss as a multiple of throat dynamic pressure,
 * common practice, e.g. Seddon & Goldsmith, Intake Aerodynamics), iterated
 * with airflow = deck airflow * recovery / referenceRecovery to 1e-13.
 * Valid for Mach 0..5 and positive areas; a choked throat or fan face is
 * reported (Mach 1) rather than refused.
 */
export function geometryInletFlow(
  geometry: GeometrySource,
  free: FreeStream,
  deckAirflow_kg_s: number,
  referenceRecovery: number,
): InletFlow {
  const shockRecovery = milE5008bRecovery(free.mach);
  const pt0 = free.pressure_Pa * totalToStaticPressure(free.mach);
  const tt0 = free.temperature_K * totalToStaticTemperature(free.mach);
  const ptThroat = shockRecovery * pt0;
  const kd = geometry.diffuserLossCoefficient;
  // Fixed point eta = G(eta): airflow from eta, throat Mach from airflow, eta from the
  // throat loss. G is a strong contraction (|G'| << 1); secant steps on eta - G(eta)
  // converge in 3-4 evaluations, plain iteration is the fallback.
  let throatValue = 0;
  let throatMach = 0;
  const G = (eta: number): number => {
    throatValue = requiredMassFlowFunction((deckAirflow_kg_s * eta) / referenceRecovery, geometry.throatArea_m2, ptThroat, tt0);
    throatMach = machOrChoked(throatValue);
    return shockRecovery * (1 - kd * dynamicOverTotal(throatMach));
  };
  let x0 = shockRecovery;
  let r0 = G(x0) - x0;
  let recovery = x0 + r0;
  let converged = false;
  for (let i = 0; i < 30 && !converged; i++) {
    const r1 = G(recovery) - recovery;
    // On convergence the throat state is already that of `recovery`.
    converged = Math.abs(r1) <= 1e-13;
    if (converged) break;
    const slope = (r1 - r0) / (recovery - x0);
    const next = slope !== 0 && Number.isFinite(slope) ? recovery - r1 / slope : recovery + r1;
    x0 = recovery;
    r0 = r1;
    recovery = next;
  }
  if (!converged) G(recovery);
  const airflow = (deckAirflow_kg_s * recovery) / referenceRecovery;
  const fanValue = requiredMassFlowFunction(airflow, geometry.fanFaceArea_m2, recovery * pt0, tt0);
  return {
    recovery,
    shockRecovery,
    airflow_kg_s: airflow,
    streamTubeArea_m2: streamTubeArea(airflow, free),
    throatMach,
    fanFaceMach: machOrChoked(fanValue),
    throatChoked: throatValue >= CHOKED_MASS_FLOW_FUNCTION,
    fanFaceChoked: fanValue >= CHOKED_MASS_FLOW_FUNCTION,
  };
}
