/**
 * What each mission status means to a caller: which class it belongs to
 * (the CLI maps each class to its exit code, the app shows it) and a short
 * title. Only 'ok' reaches the destination within the hard limits; soft
 * limits (buffet margin, residual climb, reserve below the minimum...) stay
 * cautions on an 'ok' result.
 */
import type { MissionStatus } from './missionTypes';

/**
 * - solved: flown to the destination within the hard limits;
 * - not_solved: the solver could not produce a consistent flight (no convergence, no solution);
 * - cannot_reach: the flight cannot reach its destination (fuel exhausted, climb or thrust short,
 *   no ground progress, outside the models' range);
 * - hard_limit: flown, but a hard limit is broken (MTOW, fuel capacity, MLW);
 * - internal_error: a fault in the solver itself.
 */
export type MissionStatusClass = 'solved' | 'not_solved' | 'cannot_reach' | 'hard_limit' | 'internal_error';

const CLASS: Readonly<Record<MissionStatus, MissionStatusClass>> = {
  ok: 'solved',
  did_not_converge: 'not_solved',
  infeasible: 'not_solved',
  fuel_exhausted: 'cannot_reach',
  thrust_below_drag: 'cannot_reach',
  climb_not_reached: 'cannot_reach',
  no_ground_progress: 'cannot_reach',
  outside_model_range: 'cannot_reach',
  above_mtow: 'hard_limit',
  fuel_above_capacity: 'hard_limit',
  landing_above_mlw: 'hard_limit',
  internal_error: 'internal_error',
};

/** Every mission status, in the order of the classes above. */
export const MISSION_STATUSES: readonly MissionStatus[] = Object.keys(CLASS) as MissionStatus[];

/** The class of a status. */
export function missionStatusClass(status: MissionStatus): MissionStatusClass {
  return CLASS[status];
}

const TITLE: Readonly<Record<MissionStatus, string>> = {
  ok: 'flown',
  did_not_converge: 'did not converge',
  infeasible: 'no solution',
  fuel_exhausted: 'fuel exhausted',
  thrust_below_drag: 'thrust below drag',
  climb_not_reached: 'climb not reached',
  no_ground_progress: 'no progress over the ground',
  outside_model_range: 'outside the models\' range',
  above_mtow: 'take-off above MTOW',
  fuel_above_capacity: 'fuel above tank capacity',
  landing_above_mlw: 'landing above MLW',
  internal_error: 'internal error',
};

/** A few words for a status ("fuel exhausted"), for summaries and the app. */
export function missionStatusTitle(status: MissionStatus): string {
  return TITLE[status];
}
