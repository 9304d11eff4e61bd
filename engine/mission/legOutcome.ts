/** What flying one leg (or one reserve item) returns. */
import type { MissionStatus } from './missionTypes';
import type { DomainExit, StateDomain } from './integrator';
import { S_ALT, type FlightSample, type SegmentStop, type StateVector } from './missionState';

export interface LegOutcome {
  readonly state: StateVector;
  /** 'ok' or the failure that ends the mission. */
  readonly status: MissionStatus;
  readonly message: string;
  /** Last recorded sample of the leg (null for allowance legs). */
  readonly lastSample: FlightSample | null;
}

/** A leg that ended normally. */
export function legOk(state: StateVector, lastSample: FlightSample | null): LegOutcome {
  return { state, status: 'ok', message: '', lastSample };
}

/** A leg that ended the mission, with the status and a readable reason. */
export function legFailed(state: StateVector, status: MissionStatus, message: string, lastSample: FlightSample | null): LegOutcome {
  return { state, status, message, lastSample };
}

/** Pressure-altitude words for the domain's bounds (m). */
function metres(value_m: number): string {
  return `${Math.round(value_m).toLocaleString('en-US')} m`;
}

/**
 * The outcome of a segment that stopped for a reason its leg does not handle
 * itself: fuel exhausted, the models' domain left (integrator.ts StateDomain),
 * no ground progress, or a numerical stop. `what` names the leg ("the climb on
 * Climb"); the sentence says what happened and where.
 */
export function segmentStopFailure(
  state: StateVector,
  run: { readonly stop: SegmentStop; readonly domainExit?: DomainExit },
  what: string,
  domain: StateDomain,
  lastSample: FlightSample | null,
): LegOutcome {
  const What = what.charAt(0).toUpperCase() + what.slice(1);
  const at = `at ${metres(state[S_ALT])} pressure altitude`;
  switch (run.stop) {
    case 'fuel_exhausted':
      return legFailed(state, 'fuel_exhausted', `Fuel exhausted in ${what} ${at}.`, lastSample);
    case 'no_ground_progress': {
      const wind = domain.wind_m_s ?? 0;
      const tas = lastSample?.tas_m_s ?? 0;
      const why =
        wind < 0 && -wind >= 0.5 * tas
          ? `the headwind ${(-wind).toFixed(1)} m/s is at least the horizontal airspeed (true airspeed ${tas.toFixed(1)} m/s)`
          : `the climb or descent rate ${Math.abs(lastSample?.climbRate_m_s ?? 0).toFixed(1)} m/s leaves no horizontal speed at a true airspeed of ${tas.toFixed(1)} m/s (wind ${wind.toFixed(1)} m/s)`;
      return legFailed(state, 'no_ground_progress', `${What} makes no progress over the ground ${at}: ${why}; ground speed <= 0, so the destination cannot be reached.`, lastSample);
    }
    case 'left_domain':
      switch (run.domainExit) {
        case 'mass_low':
          return legFailed(state, 'fuel_exhausted', `Fuel exhausted in ${what} ${at}: the fuel needed is far above the fuel on board.`, lastSample);
        case 'altitude_high':
          return legFailed(state, 'outside_model_range', `${What} would rise above ${metres(domain.maxAltitude_m)}, the highest pressure altitude the mission models cover (from ${metres(state[S_ALT])}).`, lastSample);
        case 'altitude_low':
          return legFailed(state, 'outside_model_range', `${What} would sink below ${metres(domain.minAltitude_m)}, the lowest pressure altitude the mission models cover (from ${metres(state[S_ALT])}).`, lastSample);
        case 'tas_out_of_range':
          return legFailed(state, 'outside_model_range', `${What} would leave the speeds the models cover (true airspeed 0 to ${metres(domain.maxTas_m_s).replace(' m', ' m/s')}) ${at}.`, lastSample);
        default:
          return legFailed(state, 'outside_model_range', `${What} reached a state the models cannot evaluate (a number is not finite) ${at}.`, lastSample);
      }
    default:
      return legFailed(state, 'infeasible', `${What} stopped ${at} (${run.stop.replace(/_/g, ' ')}).`, lastSample);
  }
}
