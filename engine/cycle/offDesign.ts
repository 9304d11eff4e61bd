/**
 * Performance (off-design) cycle analysis: the matched engine at a flight
 * condition and one throttle equation. Map assumptions (Mattingly, Elements
 * of Propulsion, engine performance analysis):
 *  - component polytropic efficiencies, pressure-loss ratios, burner
 *    efficiency and mechanical efficiencies constant at their design values;
 *  - HP and LP turbine nozzle guide vanes choked: the HP turbine flow
 *    parameter m4 sqrt(Tt4)/Pt4 is held, and with it (both choked, no
 *    cooling flow) the HP turbine's temperature ratio stays at design;
 *  - nozzle throat areas fixed; each nozzle choked or not by its pressure
 *    ratio (throat flow parameter from Pt/p0);
 *  - fan and compressor operating points from continuity and the spool
 *    power balances (no map: the operating lines follow from the turbines
 *    and nozzles);
 *  - spool speeds from the work at constant work coefficient (spoolSpeeds.ts).
 * Unknowns (scaled to 1 at design): fan and compressor work (tau - 1), LP
 * turbine temperature drop, core flow, bypass ratio (turbofans) and, unless
 * the throttle fixes it, the turbine inlet temperature. Residuals: HP and LP
 * spool power balances, HP turbine flow parameter, core and bypass nozzle
 * continuity, and the throttle equation.
 */
import type { CycleEngine } from './cycleEngine';
import type { LimitName } from './cycleSpec';
import { evaluateCycle, type CycleState, type CycleVariables } from './cycleState';
import type { FreeStream } from './freeStream';
import { throatFlowParameter } from './gasProperties';
import { limitQuantity } from './limitSchedule';
import { newtonSolve, type NewtonOptions } from './newtonSolve';

/** What sets the throttle: a turbine inlet temperature, or another limited quantity held at a value (Tt4 then an unknown). */
export interface ThrottleEquation {
  readonly quantity: LimitName;
  readonly value: number;
}

/** The installation inputs of a point. */
export interface Installation {
  readonly recovery: number;
  readonly bleedFraction: number;
  readonly powerExtraction_W: number;
}

export interface MatchOutcome {
  readonly converged: boolean;
  /** The state at the last iterate (meaningful only when converged). */
  readonly state: CycleState | null;
  /** The scaled unknowns (to warm-start a neighbouring point). */
  readonly unknowns: Float64Array;
  readonly residual: number;
  readonly iterations: number;
  /** Residual evaluations spent. */
  readonly evaluations: number;
  readonly reason: string;
}

export const MATCH_NEWTON: NewtonOptions = { tolerance: 1e-11, maxIterations: 60, maxStep: 0.3 };

function hasBypass(engine: CycleEngine): boolean {
  return engine.spec.design.bypassRatio > 0;
}

/** Number of unknowns for this engine and throttle. */
export function unknownCount(engine: CycleEngine, throttle: ThrottleEquation): number {
  return 4 + (hasBypass(engine) ? 1 : 0) + (throttle.quantity === 'turbineInletTemperature' ? 0 : 1);
}

/** The cycle variables for scaled unknowns x. */
function variablesOf(engine: CycleEngine, throttle: ThrottleEquation, inst: Installation, x: ArrayLike<number>): CycleVariables {
  const d = engine.design.variables;
  const bypass = hasBypass(engine);
  const tt4 = throttle.quantity === 'turbineInletTemperature' ? throttle.value : x[bypass ? 5 : 4]! * d.tt4_K;
  return {
    recovery: inst.recovery,
    tauFan: 1 + x[0]! * (d.tauFan - 1),
    tauCompressor: 1 + x[1]! * (d.tauCompressor - 1),
    tt4_K: tt4,
    tauHpt: d.tauHpt,
    tauLpt: 1 - x[2]! * (1 - d.tauLpt),
    coreFlow_kg_s: x[3]! * d.coreFlow_kg_s,
    bypassRatio: bypass ? x[4]! * d.bypassRatio : 0,
    bleedFraction: inst.bleedFraction,
    powerExtraction_W: inst.powerExtraction_W,
  };
}

/** Residuals of the match at a state, written into out; false when the state is outside the relations. */
function matchResiduals(engine: CycleEngine, throttle: ThrottleEquation, s: CycleState, out: Float64Array): boolean {
  if (!s.valid) return false;
  const c = engine.constants;
  const k = c.components;
  const sizes = engine.sizes;
  const p0 = s.free.p0_Pa;
  const v = s.variables;
  const hpt = k.hpMechanicalEfficiency * s.hptPower_W;
  const lpt = k.lpMechanicalEfficiency * s.lptPower_W;
  if (!(hpt > 0) || !(lpt > 0)) return false;
  out[0] = 1 - (s.compressorPower_W + v.powerExtraction_W) / hpt;
  out[1] = 1 - s.fanPower_W / lpt;
  out[2] = (s.turbineFlow_kg_s * Math.sqrt(v.tt4_K)) / (s.pt4_Pa * sizes.hptFlowParameter) - 1;
  const coreFp = (s.turbineFlow_kg_s * Math.sqrt(s.tt5_K)) / (s.pt8_Pa * sizes.coreNozzleThroatArea_m2);
  out[3] = (coreFp - throatFlowParameter(c.hot, s.pt8_Pa, p0)) / c.hot.chokedFlowParameter;
  let i = 4;
  if (hasBypass(engine)) {
    const bypassFp = (s.bypassFlow_kg_s * Math.sqrt(s.tt13_K)) / (s.pt18_Pa * sizes.bypassNozzleThroatArea_m2);
    out[i++] = (bypassFp - throatFlowParameter(c.cold, s.pt18_Pa, p0)) / c.cold.chokedFlowParameter;
  }
  if (throttle.quantity !== 'turbineInletTemperature') out[i] = limitQuantity(engine, s, throttle.quantity) / throttle.value - 1;
  for (let j = 0; j < out.length; j++) if (!Number.isFinite(out[j]!)) return false;
  return true;
}

/** The scaled unknowns of the corrected-similar point: design work ratios, core flow scaled by delta2/sqrt(theta2), Tt4 by theta2. */
export function similarStart(engine: CycleEngine, throttle: ThrottleEquation, free: FreeStream, inst: Installation): Float64Array {
  const d = engine.design;
  const n = unknownCount(engine, throttle);
  const x = new Float64Array(n).fill(1);
  const theta = free.tt0_K / d.tt2_K;
  const delta = (free.pt0_Pa * inst.recovery) / d.pt2_Pa;
  x[3] = delta / Math.sqrt(theta);
  if (throttle.quantity !== 'turbineInletTemperature') x[n - 1] = theta;
  return x;
}

/** Solves the matched engine from the start x0; never throws. */
export function matchEngine(
  engine: CycleEngine,
  free: FreeStream,
  inst: Installation,
  throttle: ThrottleEquation,
  x0: ArrayLike<number>,
  options: NewtonOptions = MATCH_NEWTON,
): MatchOutcome {
  const residual = (x: Float64Array, out: Float64Array): boolean =>
    matchResiduals(engine, throttle, evaluateCycle(engine.constants, free, variablesOf(engine, throttle, inst, x)), out);
  const outcome = newtonSolve(residual, x0, options);
  const state = evaluateCycle(engine.constants, free, variablesOf(engine, throttle, inst, outcome.x));
  return {
    converged: outcome.converged && state.valid,
    state: state.valid ? state : null,
    unknowns: outcome.x,
    residual: outcome.residual,
    iterations: outcome.iterations,
    evaluations: outcome.evaluations + 1,
    reason: outcome.reason,
  };
}

/** The throttle quantity's value in a state (the continuation's start). */
export function throttleValue(engine: CycleEngine, state: CycleState, quantity: LimitName): number {
  return limitQuantity(engine, state, quantity);
}
