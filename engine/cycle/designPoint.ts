/**
 * Parametric (design-point) cycle analysis of the two-spool separate-exhaust
 * turbofan: Mattingly, Elements of Propulsion, parametric cycle analysis of real
 * engines (the turbofan
 * with polytropic efficiencies, burner efficiency and pressure loss, duct and
 * nozzle losses, mechanical efficiencies and a cp/gamma per section), the
 * HP turbine sized by the HP spool balance (compressor plus extraction) and
 * the LP turbine by the LP spool balance (fan).
 */
import { err, ok, type Result } from '../core/result';
import type { CycleEngine } from './cycleEngine';
import type { CycleSpec } from './cycleSpec';
import { evaluateCycle, type CycleConstants, type CycleState, type CycleVariables } from './cycleState';
import { freeStream, type FreeStream } from './freeStream';
import { compressorTemperatureRatio, gasOf, throatFlowParameter } from './gasProperties';
import { checkCycleSpec } from './specChecks';

export type CycleErrorCode = 'invalid_spec' | 'invalid_condition' | 'turbine_cannot_drive' | 'nozzle_not_flowing' | 'size_not_reached';

export interface CycleError {
  readonly code: CycleErrorCode;
  readonly message: string;
}

/** Standard sea-level temperature and pressure for corrected flow (ISA). */
const T_STD_K = 288.15;
const P_STD_PA = 101325;

export function cycleConstants(spec: CycleSpec): CycleConstants {
  return {
    cold: gasOf(spec.gas.cold),
    hot: gasOf(spec.gas.hot),
    components: spec.components,
    nozzles: spec.nozzles,
    heatingValue_J_kg: spec.fuel.heatingValue_J_kg,
    fuelMassInCore: spec.fuel.massInCore,
  };
}

/** The design state for a given core flow; the turbines take the temperature drops their spools need. */
function designState(c: CycleConstants, spec: CycleSpec, free: FreeStream, coreFlow_kg_s: number): Result<CycleState, CycleError> {
  const d = spec.design;
  const k = c.components;
  const tauFan = compressorTemperatureRatio(c.cold, d.fanPressureRatio, k.fanPolytropicEfficiency);
  const hpcRatio = d.overallPressureRatio / d.fanPressureRatio;
  const tauCompressor = compressorTemperatureRatio(c.cold, hpcRatio, k.compressorPolytropicEfficiency);
  const trial: CycleVariables = {
    recovery: d.inletRecovery,
    tauFan,
    tauCompressor,
    tt4_K: d.turbineInletTemperature_K,
    tauHpt: 1,
    tauLpt: 1,
    coreFlow_kg_s,
    bypassRatio: d.bypassRatio,
    bleedFraction: d.bleedFraction,
    powerExtraction_W: d.powerExtraction_W,
  };
  const first = evaluateCycle(c, free, trial);
  if (!first.valid) return err({ code: 'invalid_spec', message: `design point: ${first.reason}` });
  const m4 = first.turbineFlow_kg_s;
  const hpDrop = (first.compressorPower_W + d.powerExtraction_W) / (k.hpMechanicalEfficiency * m4 * c.hot.cp);
  const tauHpt = 1 - hpDrop / d.turbineInletTemperature_K;
  const tt45 = d.turbineInletTemperature_K * tauHpt;
  const lpDrop = first.fanPower_W / (k.lpMechanicalEfficiency * m4 * c.hot.cp);
  const tauLpt = 1 - lpDrop / tt45;
  if (!(tauHpt > 0) || !(tauLpt > 0)) {
    return err({
      code: 'turbine_cannot_drive',
      message: `design point: the turbines cannot drive the compressors and fan at ${d.turbineInletTemperature_K} K (the gas would have to cool below 0 K); raise the turbine inlet temperature or lower the pressure ratios or bypass ratio`,
    });
  }
  const state = evaluateCycle(c, free, { ...trial, tauHpt, tauLpt });
  if (!state.valid) return err({ code: 'invalid_spec', message: `design point: ${state.reason}` });
  if (!(state.pt8_Pa > free.p0_Pa)) {
    return err({ code: 'nozzle_not_flowing', message: `design point: the core nozzle's total pressure (${state.pt8_Pa.toFixed(0)} Pa) is not above ambient (${free.p0_Pa.toFixed(0)} Pa); the LP turbine takes all the pressure (lower the bypass ratio or fan pressure ratio)` });
  }
  if (d.bypassRatio > 0 && !(state.pt18_Pa > free.p0_Pa)) {
    return err({ code: 'nozzle_not_flowing', message: `design point: the bypass nozzle's total pressure (${state.pt18_Pa.toFixed(0)} Pa) is not above ambient (${free.p0_Pa.toFixed(0)} Pa)` });
  }
  return ok(state);
}

/** Core flow meeting a design thrust: the thrust is proportional to the flow except through the fixed extraction, so a few secant steps do. */
function coreFlowForThrust(c: CycleConstants, spec: CycleSpec, free: FreeStream, thrust_N: number): Result<number, CycleError> {
  let core = 10;
  for (let i = 0; i < 60; i++) {
    const s = designState(c, spec, free, core);
    if (!s.ok) return s;
    if (!(s.value.thrust_N > 0)) return err({ code: 'size_not_reached', message: `design point: net thrust is not positive (${s.value.thrust_N.toFixed(1)} N), so no size gives ${thrust_N} N` });
    const next = (core * thrust_N) / s.value.thrust_N;
    if (Math.abs(next - core) <= 1e-14 * core) return ok(next);
    core = next;
  }
  return err({ code: 'size_not_reached', message: `design point: the size for ${thrust_N} N did not settle (power extraction too large for the engine?)` });
}

/**
 * Designs the engine at its design point: every station, the thrust and
 * fuel flow, and the sizes kept for off-design. Returns an error (never
 * throws) for a spec out of range or a cycle that cannot run.
 */
export function designEngine(spec: CycleSpec): Result<CycleEngine, CycleError> {
  const problem = checkCycleSpec(spec);
  if (problem !== null) return err({ code: 'invalid_spec', message: problem });
  const c = cycleConstants(spec);
  const d = spec.design;
  const free = freeStream(c.cold, d.altitude_m, d.mach, d.isaDeviation_K);
  if (!free.ok) return err({ code: 'invalid_condition', message: `design point: ${free.error}` });
  let core: number;
  if (d.size.kind === 'airflow') core = d.size.airflow_kg_s / (1 + d.bypassRatio);
  else {
    const sized = coreFlowForThrust(c, spec, free.value, d.size.thrust_N);
    if (!sized.ok) return sized;
    core = sized.value;
  }
  const s = designState(c, spec, free.value, core);
  if (!s.ok) return s;
  const state = s.value;
  if (!(state.thrust_N > 0)) return err({ code: 'size_not_reached', message: `design point: net thrust is not positive (${state.thrust_N.toFixed(1)} N)` });
  const p0 = free.value.p0_Pa;
  const a8 = (state.turbineFlow_kg_s * Math.sqrt(state.tt5_K)) / (state.pt8_Pa * throatFlowParameter(c.hot, state.pt8_Pa, p0));
  const a18 = state.bypassFlow_kg_s > 0 ? (state.bypassFlow_kg_s * Math.sqrt(state.tt13_K)) / (state.pt18_Pa * throatFlowParameter(c.cold, state.pt18_Pa, p0)) : 0;
  return ok({
    spec,
    constants: c,
    design: state,
    summary: {
      thrust_N: state.thrust_N,
      fuelFlow_kg_s: state.fuelFlow_kg_s,
      airflow_kg_s: state.totalFlow_kg_s,
      tsfc_kg_N_s: state.fuelFlow_kg_s / state.thrust_N,
      specificThrust_N_s_kg: state.thrust_N / state.totalFlow_kg_s,
    },
    sizes: {
      coreNozzleThroatArea_m2: a8,
      bypassNozzleThroatArea_m2: a18,
      hptFlowParameter: (state.turbineFlow_kg_s * Math.sqrt(state.variables.tt4_K)) / state.pt4_Pa,
      lptFlowParameter: (state.turbineFlow_kg_s * Math.sqrt(state.tt45_K)) / state.pt45_Pa,
      fanCorrectedFlow_kg_s: (state.totalFlow_kg_s * Math.sqrt(state.tt2_K / T_STD_K)) / (state.pt2_Pa / P_STD_PA),
    },
  });
}
