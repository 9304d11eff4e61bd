/**
 * engine/mission's public surface (hand-written; docs/style.md §5): the one
 * solver entry point, its input and result types, the statuses and the
 * altitude range a mission may fly.
 */
export { solveMission, type SolveOptions } from './solveMission';
export type { LegRow, MissionInput, MissionResult, MissionStatus, TimeHistory } from './missionTypes';
export { MISSION_STATUSES, missionStatusClass, missionStatusTitle, type MissionStatusClass } from './missionStatus';
export { MAX_ALTITUDE_M, MIN_ALTITUDE_M } from './missionInputCheck';
export { DEFAULT_ALTERNATE_APPROACH, DEFAULT_MISSED_APPROACH, DEFAULT_RESERVE_HOLD_SPEED, RESERVE_RULES, type ReserveDefaults, type ReserveRule } from './reserveRules';
