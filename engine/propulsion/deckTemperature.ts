/**
 * Non-standard temperature on a deck.
 *
 * A deck WITH an ISA-deviation axis is interpolated along it like any other
 * axis (deckGrid.ts). A deck WITHOUT one is read at the same pressure
 * altitude, Mach and power setting, with the power setting taken to be a
 * corrected (referred) parameter, and the corrected parameter groups held
 * fixed (Walsh & Fletcher, "Gas Turbine Performance", 2nd ed., ch. 4,
 * referred parameter groups; Mattingly, "Elements of Propulsion", corrected
 * mass flow and thrust):
 *
 *   F / delta                  = const  ->  thrust unchanged (delta depends only on pressure altitude);
 *   Wf / (delta sqrt(theta))   = const  ->  fuel flow  x sqrt(T / T_ISA);
 *   W sqrt(theta) / delta      = const  ->  airflow    x sqrt(T_ISA / T);
 *
 * with T = T_ISA(h) + isaDev the static temperature. This ignores the engine's
 * temperature limits and flat rating, so on a hot day the thrust at a rating
 * may be optimistic; every such lookup carries the caution
 * `deck_temperature_approximation` that says so.
 */
import type { Caution } from '../cautions/caution';
import { isaTemperature_K } from './deckIsa';

/**
 * Fuel-flow factor sqrt(T / T_ISA) (-) for ISA deviation `isaDev_K` at
 * pressure altitude `altitude_m`; the airflow factor is its reciprocal.
 * Valid where T_ISA + isaDev > 0 (throws otherwise: the condition is a bug).
 */
export function temperatureFlowFactor(altitude_m: number, isaDev_K: number): number {
  const tIsa = isaTemperature_K(altitude_m);
  const t = tIsa + isaDev_K;
  if (!(t > 0)) throw new RangeError(`temperatureFlowFactor: static temperature ${t} K is not positive`);
  return Math.sqrt(t / tIsa);
}

/** The caution carried by a lookup that used the corrected-parameter approximation. */
export function temperatureApproximationCaution(deckTitle: string, isaDev_K: number): Caution {
  return {
    id: 'deck_temperature_approximation',
    severity: 'info',
    message:
      `Deck "${deckTitle}" has no ISA-deviation axis: at ISA${isaDev_K >= 0 ? '+' : ''}${isaDev_K} K, thrust is held ` +
      'at the same corrected thrust F/delta (unchanged at the same pressure altitude, Mach and power), fuel flow ' +
      'scaled by sqrt(T/T_ISA) and airflow by sqrt(T_ISA/T) (corrected parameters, Walsh & Fletcher); ' +
      'temperature limits and flat rating are not modelled, so hot-day thrust at a rating may be optimistic.',
    value: isaDev_K,
    threshold: 0,
  };
}
