/** What flying one leg (or one reserve item) returns. */
import type { MissionStatus } from './missionTypes';
import type { FlightSample, StateVector } from './missionState';

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
