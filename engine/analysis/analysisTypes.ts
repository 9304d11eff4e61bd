/**
 * Types shared by the analyses (crossover, envelope, specific range,
 * payload-range, inlet comparison, trade factors).
 */
import type { AeroModel } from '../aero/aeroModel';
import type { MissionInput, MissionResult } from '../mission/missionTypes';
import type { PropulsionModel } from '../propulsion/propulsionModel';
import type { NeighbourStart } from './warmStart';

/** The two models every point-performance analysis needs. */
export interface PerformanceModels {
  readonly aero: AeroModel;
  readonly propulsion: PropulsionModel;
}

/**
 * Flies one mission; the analyses call engine/mission/solveMission through
 * this (warmStart.ts solveFrom). `start`, when given, is a converged
 * neighbour to start the fuel iteration from; a solver may ignore it.
 */
export type MissionSolver = (input: MissionInput, start?: NeighbourStart) => MissionResult;

export type AnalysisErrorCode =
  | 'invalid_input'
  | 'atmosphere_out_of_range'
  | 'mission_failed'
  | 'cancelled'
  | 'no_solution';

export interface AnalysisError {
  readonly code: AnalysisErrorCode;
  /** One readable sentence: what failed, where, and with which value. */
  readonly message: string;
}

