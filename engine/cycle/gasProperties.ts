/**
 * Calorically perfect gas relations for one cycle section (constant cp and
 * gamma): isentropic ratios, the compressible flow parameter and nozzle
 * exit conditions. Sources: Mattingly, Elements of Propulsion: the mass flow
 * parameter (compressible flow review) and the polytropic efficiency relations
 * (component performance).
 */
import type { GasSection } from './cycleSpec';

export interface Gas {
  readonly cp: number;
  readonly gamma: number;
  /** Gas constant cp (gamma - 1) / gamma (J/(kg K)). */
  readonly R: number;
  /** (gamma - 1) / gamma. */
  readonly k: number;
  /** Flow parameter at Mach 1 (see flowParameter). */
  readonly chokedFlowParameter: number;
  /** Pt / p at Mach 1: ((gamma + 1) / 2)^(gamma / (gamma - 1)). */
  readonly criticalPressureRatio: number;
}

export function gasOf(section: GasSection): Gas {
  const { cp_J_kgK: cp, gamma } = section;
  const R = (cp * (gamma - 1)) / gamma;
  const partial = { cp, gamma, R, k: (gamma - 1) / gamma };
  return {
    ...partial,
    chokedFlowParameter: flowParameterAtMach(partial, 1),
    criticalPressureRatio: Math.pow((gamma + 1) / 2, gamma / (gamma - 1)),
  };
}

/**
 * Mass flow parameter m sqrt(Tt) / (Pt A) (kg sqrt(K) / (N s)) at a Mach
 * number: M sqrt(gamma / R) (1 + (gamma - 1)/2 M^2)^(-(gamma + 1) / (2 (gamma - 1)))
 * (Mattingly, Elements of Propulsion, mass flow parameter MFP).
 */
export function flowParameterAtMach(gas: Pick<Gas, 'gamma' | 'R'>, mach: number): number {
  const g = gas.gamma;
  return mach * Math.sqrt(g / gas.R) * Math.pow(1 + ((g - 1) / 2) * mach * mach, -(g + 1) / (2 * (g - 1)));
}

/** Mach number from the total-to-static pressure ratio (>= 1), isentropic. */
export function machFromPressureRatio(gas: Gas, totalOverStatic: number): number {
  if (!(totalOverStatic > 1)) return 0;
  return Math.sqrt((2 / (gas.gamma - 1)) * (Math.pow(totalOverStatic, gas.k) - 1));
}

/**
 * Flow parameter at a nozzle throat discharging to back pressure p0: Mach 1
 * when Pt/p0 reaches the critical ratio, else the subsonic Mach of Pt/p0;
 * 0 when Pt <= p0 (no outflow).
 */
export function throatFlowParameter(gas: Gas, pt: number, p0: number): number {
  const ratio = pt / p0;
  if (ratio >= gas.criticalPressureRatio) return gas.chokedFlowParameter;
  return flowParameterAtMach(gas, machFromPressureRatio(gas, ratio));
}

/** Temperature ratio of a compressor of polytropic efficiency e for pressure ratio pi: pi^((gamma - 1)/(gamma e)). */
export function compressorTemperatureRatio(gas: Gas, pressureRatio: number, polytropicEfficiency: number): number {
  return Math.pow(pressureRatio, gas.k / polytropicEfficiency);
}

/** Pressure ratio of a compressor from its temperature ratio (inverse of compressorTemperatureRatio). */
export function compressorPressureRatio(gas: Gas, temperatureRatio: number, polytropicEfficiency: number): number {
  return Math.pow(temperatureRatio, polytropicEfficiency / gas.k);
}

/** Expansion ratio Pt_in/Pt_out of a turbine from its temperature ratio Tt_out/Tt_in: tau^(-gamma/((gamma - 1) e)). */
export function turbineExpansionRatio(gas: Gas, temperatureRatio: number, polytropicEfficiency: number): number {
  return Math.pow(temperatureRatio, -1 / (gas.k * polytropicEfficiency));
}
