/**
 * Inlet additive (pre-entry) drag and the spillage drag charged to the
 * propulsion system. Bookkeeping in docs/installation.md.
 */
import {
  CHOKED_MASS_FLOW_FUNCTION,
  GAMMA_AIR,
  massFlowFunction,
  normalShockTotalPressureRatio,
  subsonicMachFromMassFlowFunction,
  totalToStaticPressure,
} from './inletCompressible';

export interface AdditiveDrag {
  /** Additive drag (N), >= 0; 0 when the inlet does not spill (A0/Ac >= 1). */
  readonly drag_N: number;
  /** Additive-drag coefficient D_add / (q0 Ac) (-). */
  readonly coefficient: number;
  /** Mach at the capture plane (-); equals the flight Mach (subsonic) when nothing spills. */
  readonly captureMach: number;
  /** Static pressure ratio at the capture plane p1/p0 (-). */
  readonly capturePressureRatio: number;
}

const NO_SPILL: AdditiveDrag = { drag_N: 0, coefficient: 0, captureMach: Number.NaN, capturePressureRatio: 1 };

/**
 * Additive (pre-entry) drag of an inlet from the 1-D momentum balance on
 * the captured stream tube between the free stream (station 0) and the
 * capture plane (station 1):
 *   D_add = integral of (p - p0) dA = mdot (V1 - V0) + (p1 - p0) A1
 *         = p0 A1 [ (p1/p0)(1 + gamma M1^2) - (A0/A1)(1 + gamma M0^2) - (1 - A0/A1) ],
 * station-1 conditions from continuity with isentropic flow from station 0
 * (subsonic) or a normal shock ahead of the lip then isentropic flow
 * (supersonic, the open-nose case). Source: M. Sibulkin, "Theoretical and
 * experimental investigation of additive drag", NACA Report 1187 (1954);
 * the same balance in Seddon & Goldsmith, Intake Aerodynamics, ch. 3.
 *
 * `mach` >= 0 flight Mach, `staticPressure_Pa` > 0 free-stream static
 * pressure, `massFlowRatio` = A0/Ac > 0, `captureArea_m2` > 0. A mass-flow
 * ratio >= 1 (or Mach 0) spills nothing and returns 0: lip suction on an
 * inlet drawing more than its capture stream tube is not credited.
 */
export function additiveDrag(
  mach: number,
  staticPressure_Pa: number,
  massFlowRatio: number,
  captureArea_m2: number,
): AdditiveDrag {
  if (!(mach > 0) || !(massFlowRatio < 1)) return NO_SPILL;
  const drag_N = additiveDrag_N(mach, staticPressure_Pa, massFlowRatio, captureArea_m2);
  const m0sq = mach * mach;
  const q0OverP0 = 0.5 * GAMMA_AIR * m0sq;
  return { drag_N, coefficient: lastPerP0A1 / q0OverP0, captureMach: lastCaptureMach, capturePressureRatio: lastCapturePressureRatio };
}

// The capture-plane state of the last additiveDrag_N call that spilled (additiveDrag reads it back; no allocation).
let lastPerP0A1 = 0;
let lastCaptureMach = Number.NaN;
let lastCapturePressureRatio = 1;

/** The additive drag (N) of additiveDrag alone, without building its record (the installed model's hot path). */
export function additiveDrag_N(mach: number, staticPressure_Pa: number, massFlowRatio: number, captureArea_m2: number): number {
  if (!(mach > 0) || !(massFlowRatio < 1)) return 0;
  const m0sq = mach * mach;
  // Total-pressure ratio from station 0 to 1: 1 subsonic, normal shock supersonic.
  const pt1OverPt0 = mach > 1 ? normalShockTotalPressureRatio(mach) : 1;
  // Continuity: mdot = pt A sqrt(gamma/(R Tt)) f(M), Tt constant.
  const f1 = Math.min((massFlowRatio * massFlowFunction(mach)) / pt1OverPt0, CHOKED_MASS_FLOW_FUNCTION);
  const m1 = subsonicMachFromMassFlowFunction(f1);
  const p1OverP0 = (pt1OverPt0 * totalToStaticPressure(mach)) / totalToStaticPressure(m1);
  const perP0A1 =
    p1OverP0 * (1 + GAMMA_AIR * m1 * m1) - massFlowRatio * (1 + GAMMA_AIR * m0sq) - (1 - massFlowRatio);
  // perP0A1 > 0 for A0/Ac < 1; max() only guards round-off.
  lastPerP0A1 = Math.max(0, perP0A1);
  lastCaptureMach = m1;
  lastCapturePressureRatio = p1OverP0;
  return lastPerP0A1 * staticPressure_Pa * captureArea_m2;
}

/**
 * Spillage drag charged to the propulsion system (N): the additive drag
 * less the part recovered as lip suction, (1 - lipSuctionFactor) * D_add,
 * lipSuctionFactor in 0..1 (common practice; Seddon & Goldsmith, Intake
 * Aerodynamics, discuss the cowl-lip suction that offsets additive drag
 * on a well-rounded subsonic lip).
 */
export function spillageDrag(additiveDrag_N: number, lipSuctionFactor: number): number {
  return (1 - lipSuctionFactor) * additiveDrag_N;
}
