/**
 * A designed engine: the spec, its gases, the design-point state and the
 * sizes the off-design match keeps fixed (Mattingly, Elements of
 * Propulsion, engine performance analysis: nozzle throat areas and turbine flow parameters
 * from the design point; corrected speeds referred to the design).
 */
import type { CycleSpec } from './cycleSpec';
import type { CycleConstants, CycleState } from './cycleState';

export interface CycleSizes {
  /** Core nozzle throat area A8 (m2). */
  readonly coreNozzleThroatArea_m2: number;
  /** Bypass nozzle throat area A18 (m2); 0 for a turbojet. */
  readonly bypassNozzleThroatArea_m2: number;
  /** HP turbine flow parameter m4 sqrt(Tt4) / Pt4 (kg sqrt(K) / (s Pa)), held by its choked nozzle guide vanes. */
  readonly hptFlowParameter: number;
  /** LP turbine flow parameter m45 sqrt(Tt45) / Pt45 (same units), held by its choked nozzle guide vanes. */
  readonly lptFlowParameter: number;
  /** Fan-face corrected flow m0 sqrt(Tt2/288.15 K) / (Pt2/101,325 Pa) at design (kg/s). */
  readonly fanCorrectedFlow_kg_s: number;
}

export interface CycleDesignSummary {
  readonly thrust_N: number;
  readonly fuelFlow_kg_s: number;
  readonly airflow_kg_s: number;
  /** Fuel flow over net thrust (kg/(N s)). */
  readonly tsfc_kg_N_s: number;
  /** Net thrust over total airflow (N s/kg). */
  readonly specificThrust_N_s_kg: number;
}

export interface CycleEngine {
  readonly spec: CycleSpec;
  readonly constants: CycleConstants;
  /** The design-point state (every station). */
  readonly design: CycleState;
  readonly summary: CycleDesignSummary;
  readonly sizes: CycleSizes;
}
