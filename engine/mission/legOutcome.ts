/** What flying one leg (or one reserve item) returns. */
import type { MissionStatus } from './missionTypes';
import type { DomainExit, StateDomain } from './integrator';
import { S_ALT, type FlightSample, type SegmentStop, type StateVector } from './missionState';
import { messageText, msg, q, type MessageParts } from '../units/messageParts';

export interface LegOutcome {
  readonly state: StateVector;
  /** 'ok' or the failure that ends the mission. */
  readonly status: MissionStatus;
  readonly message: string;
  /** The message with its numbers as quantities (display in the reader's units). */
  readonly parts?: MessageParts;
  /** Last recorded sample of the leg (null for allowance legs). */
  readonly lastSample: FlightSample | null;
}

/** A leg that ended normally. */
export function legOk(state: StateVector, lastSample: FlightSample | null): LegOutcome {
  return { state, status: 'ok', message: '', lastSample };
}

/** A leg that ended the mission, with the status and a readable reason. */
export function legFailed(state: StateVector, status: MissionStatus, message: string | MessageParts, lastSample: FlightSample | null): LegOutcome {
  if (typeof message === 'string') return { state, status, message, lastSample };
  return { state, status, message: messageText(message, 'both'), parts: message, lastSample };
}

/** A pressure altitude as a message quantity (m). */
function metres(value_m: number) {
  return q(value_m, 'altitude');
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
  const at = msg`at ${metres(state[S_ALT])} pressure altitude`;
  switch (run.stop) {
    case 'fuel_exhausted':
      return legFailed(state, 'fuel_exhausted', msg`Fuel exhausted in ${what} ${at}.`, lastSample);
    case 'no_ground_progress': {
      const wind = domain.wind_m_s ?? 0;
      const tas = lastSample?.tas_m_s ?? 0;
      const why =
        wind < 0 && -wind >= 0.5 * tas
          ? msg`the headwind ${q(-wind, 'speed')} is at least the horizontal airspeed (true airspeed ${q(tas, 'speed')})`
          : msg`the climb or descent rate ${q(Math.abs(lastSample?.climbRate_m_s ?? 0), 'climbRate')} leaves no horizontal speed at a true airspeed of ${q(tas, 'speed')} (wind ${q(wind, 'speed')})`;
      return legFailed(state, 'no_ground_progress', msg`${What} makes no progress over the ground ${at}: ${why}; ground speed <= 0, so the destination cannot be reached.`, lastSample);
    }
    case 'left_domain':
      switch (run.domainExit) {
        case 'mass_low':
          return legFailed(state, 'fuel_exhausted', msg`Fuel exhausted in ${what} ${at}: the fuel needed is far above the fuel on board.`, lastSample);
        case 'altitude_high':
          return legFailed(state, 'outside_model_range', msg`${What} would rise above ${metres(domain.maxAltitude_m)}, the highest pressure altitude the mission models cover (from ${metres(state[S_ALT])}).`, lastSample);
        case 'altitude_low':
          return legFailed(state, 'outside_model_range', msg`${What} would sink below ${metres(domain.minAltitude_m)}, the lowest pressure altitude the mission models cover (from ${metres(state[S_ALT])}).`, lastSample);
        case 'tas_out_of_range':
          return legFailed(state, 'outside_model_range', msg`${What} would leave the speeds the models cover (true airspeed 0 to ${q(domain.maxTas_m_s, 'speed')}) ${at}.`, lastSample);
        default:
          return legFailed(state, 'outside_model_range', msg`${What} reached a state the models cannot evaluate (a number is not finite) ${at}.`, lastSample);
      }
    default:
      return legFailed(state, 'infeasible', msg`${What} stopped ${at} (${run.stop.replace(/_/g, ' ')}).`, lastSample);
  }
}
