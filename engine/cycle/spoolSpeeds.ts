/**
 * Spool speeds from the work the fan and compressor do, at constant work
 * coefficient (Euler's turbomachinery equation with the velocity triangles
 * held: the stagnation enthalpy rise goes as the blade speed squared), as in
 * Mattingly's performance cycle analysis (Elements of Propulsion, engine performance analysis):
 * N / N_design = sqrt(Tt_in (tau - 1) / (Tt_in (tau - 1))_design).
 * Corrected speeds (N / sqrt(Tt_in)) as fractions of design follow as
 * sqrt((tau - 1) / (tau - 1)_design).
 */
import type { CycleEngine } from './cycleEngine';
import type { CycleState } from './cycleState';

export interface SpoolSpeeds {
  /** Mechanical LP (fan) speed, fraction of design (N1). */
  readonly fanSpeed: number;
  /** Fan corrected speed N1 / sqrt(theta2), fraction of design. */
  readonly fanCorrectedSpeed: number;
  /** Mechanical HP speed, fraction of design (N2). */
  readonly coreSpeed: number;
  /** HP corrected speed N2 / sqrt(theta25), fraction of design. */
  readonly coreCorrectedSpeed: number;
}

export function spoolSpeeds(engine: CycleEngine, state: CycleState): SpoolSpeeds {
  const d = engine.design;
  const fanWork = (state.variables.tauFan - 1) / (d.variables.tauFan - 1);
  const coreWork = (state.variables.tauCompressor - 1) / (d.variables.tauCompressor - 1);
  const fanCorrected = Math.sqrt(Math.max(fanWork, 0));
  const coreCorrected = Math.sqrt(Math.max(coreWork, 0));
  return {
    fanSpeed: fanCorrected * Math.sqrt(state.tt2_K / d.tt2_K),
    fanCorrectedSpeed: fanCorrected,
    coreSpeed: coreCorrected * Math.sqrt(state.tt13_K / d.tt13_K),
    coreCorrectedSpeed: coreCorrected,
  };
}
