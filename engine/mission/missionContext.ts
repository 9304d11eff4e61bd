/**
 * What every leg needs while a mission is flown: the input, the leg's
 * environment, integration options and the log the legs write to.
 */
import type { DistanceBasis, Leg, MissionInput } from './missionTypes';
import { S_AIR, S_GROUND } from './missionState';
import type { FlightLog } from './timeHistoryBuilder';
import type { PassMemo } from './passMemo';
import type { SegmentBuffers } from './segmentBuffers';

export interface LegEnvironmentResolved {
  readonly isaDev_K: number;
  readonly wind_m_s: number;
}

export interface FlightOptions {
  /** Multiplies every leg's base step (1 = production steps; 0.5 halves them). */
  readonly stepScale: number;
  /** During fuel iteration the mass may pass below zero-fuel mass without stopping. */
  readonly allowNegativeFuel: boolean;
}

export interface MissionContext {
  readonly input: MissionInput;
  readonly options: FlightOptions;
  readonly zeroFuelMass_kg: number;
  readonly log: FlightLog;
  /** What earlier passes of the same solve flew (passMemo.ts); read only while fuel may pass below zero-fuel mass (the iteration's passes). */
  readonly memo?: PassMemo;
  /** The records the solve's segments write their evaluations into (segmentBuffers.ts); absent: each segment has its own. */
  readonly buffers?: SegmentBuffers;
}

/** Where a leg's samples and cautions go. */
export interface LegTarget {
  readonly legIndex: number;
  readonly legName: string;
  readonly env: LegEnvironmentResolved;
  /** Trip legs go into the time history; reserve legs only raise cautions. */
  readonly recordHistory: boolean;
}

/** A leg's ISA deviation and wind, falling back to the mission's. */
export function legEnvironment(input: MissionInput, leg: Leg | null): LegEnvironmentResolved {
  return {
    isaDev_K: leg?.isaDev_K ?? input.isaDev_K,
    wind_m_s: leg?.wind_m_s ?? input.wind_m_s,
  };
}

/** Base integration steps (s) per kind of segment, before `stepScale`; shown converged in test/engine/mission/solveMission.test.ts. */
export const BASE_STEP_S = {
  climb: 60,
  speedChange: 10,
  cruise: 3600,
  descent: 60,
  hold: 1800,
} as const;

/**
 * Longest steps of the step climbs inside a cruise in pressure altitude (m)
 * and of the level speed changes in TAS (m/s), before `stepScale`, where those
 * are stepped along altitude or speed with step ends on the models' slope
 * breaks (monotoneStepper.ts); the climbs and descents have theirs in
 * stepBreaks.ts (`BASE_ALTITUDE_STEP`). Shown converged in
 * test/engine/mission/solveMission.test.ts.
 */
export const BASE_MONOTONE_STEP = {
  altitude_m: 1200,
  speed_m_s: 40,
} as const;

/** The mission's distance basis (MissionInput.distanceBasis, default 'ground'). */
export function distanceBasis(input: MissionInput): DistanceBasis {
  return input.distanceBasis ?? 'ground';
}

/** State index of the distance the mission's distances are measured in: S_GROUND over the ground, S_AIR in still air. */
export function distanceIndex(input: MissionInput): typeof S_GROUND | typeof S_AIR {
  return distanceBasis(input) === 'ground' ? S_GROUND : S_AIR;
}
