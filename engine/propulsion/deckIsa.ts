/**
 * ISA temperature and pressure ratio at a pressure altitude, as the deck's
 * temperature correction and the parametric deck need them: a thin adapter
 * over the one standard atmosphere (engine/aero/standardAtmosphere.ts, U.S.
 * Standard Atmosphere 1976) that throws for an altitude it does not serve,
 * since deck callers validate conditions first.
 */
import { T0 } from '../aero/constants';
import { atmosphere, type AtmosphereState } from '../aero/standardAtmosphere';

/** Sea-level standard temperature (K), U.S. Standard Atmosphere 1976. */
export const ISA_SEA_LEVEL_TEMPERATURE_K = T0;

function isaState(altitude_m: number): AtmosphereState {
  const state = atmosphere(altitude_m, 0);
  if (!state.ok) throw new RangeError(`ISA: ${state.error.message}`);
  return state.value;
}

/** ISA static temperature (K) at a pressure altitude within the standard atmosphere's range. */
export function isaTemperature_K(altitude_m: number): number {
  return isaState(altitude_m).isaTemperature_K;
}

/** ISA static pressure ratio delta = p / 101325 Pa (-) at a pressure altitude within the standard atmosphere's range. */
export function isaPressureRatio(altitude_m: number): number {
  return isaState(altitude_m).delta;
}
