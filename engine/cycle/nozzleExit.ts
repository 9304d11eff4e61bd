/**
 * One nozzle's exit state and gross thrust from its inlet totals, mass flow
 * and back pressure. Convergent: exit at the throat, static pressure p0
 * unchoked or Pt / critical ratio when choked (pressure thrust (p9 - p0) A9).
 * Fully expanded: isentropic expansion to p0 (a variable divergent part
 * behind the throat). Source: Mattingly, Elements of Propulsion, parametric cycle
 * analysis of real engines (exit velocity from Tt and Pt/p9; gross thrust m V9 + A9 (p9 - p0)).
 */
import type { NozzleType } from './cycleSpec';
import { type Gas } from './gasProperties';

export interface NozzleState {
  readonly choked: boolean;
  readonly exitMach: number;
  readonly exitStaticPressure_Pa: number;
  readonly exitStaticTemperature_K: number;
  readonly exitVelocity_m_s: number;
  /** Exit area (m2); 0 when no flow. */
  readonly exitArea_m2: number;
  /** Momentum plus pressure thrust (N). */
  readonly grossThrust_N: number;
}

const NO_FLOW: NozzleState = {
  choked: false,
  exitMach: 0,
  exitStaticPressure_Pa: 0,
  exitStaticTemperature_K: 0,
  exitVelocity_m_s: 0,
  exitArea_m2: 0,
  grossThrust_N: 0,
};

/** Exit state of a nozzle of the given type; no flow (zeros) when the mass flow is 0 or Pt <= p0. */
export function nozzleExit(gas: Gas, type: NozzleType, massFlow_kg_s: number, tt_K: number, pt_Pa: number, p0_Pa: number): NozzleState {
  if (!(massFlow_kg_s > 0) || !(pt_Pa > p0_Pa)) return { ...NO_FLOW, exitStaticPressure_Pa: p0_Pa, exitStaticTemperature_K: tt_K };
  const choked = pt_Pa / p0_Pa >= gas.criticalPressureRatio;
  const p9 = type === 'convergent' && choked ? pt_Pa / gas.criticalPressureRatio : p0_Pa;
  const ratio = pt_Pa / p9;
  const t9 = tt_K / Math.pow(ratio, gas.k);
  const v9 = Math.sqrt(2 * gas.cp * (tt_K - t9));
  const exitMach = v9 / Math.sqrt(gas.gamma * gas.R * t9);
  const area = (massFlow_kg_s * gas.R * t9) / (p9 * v9);
  return {
    choked,
    exitMach,
    exitStaticPressure_Pa: p9,
    exitStaticTemperature_K: t9,
    exitVelocity_m_s: v9,
    exitArea_m2: area,
    grossThrust_N: massFlow_kg_s * v9 + area * (p9 - p0_Pa),
  };
}
