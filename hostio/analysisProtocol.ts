/**
 * Messages between the analysis pool (analysisPool.ts) and its worker
 * threads (analysisWorker.ts). Plain data only: the worker builds each
 * mission input again from the study and the job (engine/study
 * analysisJobBase, engine/analysis analysisJobInput).
 */
import type { AnalysisJob, PointJob, PointOutput } from '../engine/analysis';
import type { MissionResult } from '../engine/mission';
import type { Project } from '../engine/project';
import type { AnalysisSpec, DeckFileText } from '../engine/study';

/** The project and its deck file text as the calling thread read them. */
export interface StudySource {
  readonly project: Project;
  readonly deckFile: DeckFileText | null;
}

/** A warm start as data (engine/analysis NeighbourStart with each mission reduced to what a prediction reads). */
export interface StartData {
  readonly from: Pick<MissionResult, 'warmStart' | 'residual_kg'>;
  readonly blend?: readonly { readonly weight: number; readonly result: Pick<MissionResult, 'warmStart' | 'residual_kg'> }[];
}

export type PoolRequest =
  /** A study the flights of `studyId` use (sent once to each worker). */
  | { readonly type: 'study'; readonly studyId: number; readonly source: StudySource; readonly spec: AnalysisSpec }
  /** One planned mission of run `runId`; lane memos are kept per run and lane until `endRun`. */
  | {
      readonly type: 'fly';
      readonly runId: number;
      readonly studyId: number;
      readonly index: number;
      readonly job: AnalysisJob;
      readonly start: StartData | undefined;
      readonly lane: number;
      readonly laneMemos: boolean;
    }
  /** One point task (the comparison's crossover and ceilings of a design). */
  | { readonly type: 'points'; readonly runId: number; readonly studyId: number; readonly index: number; readonly job: PointJob }
  | { readonly type: 'endRun'; readonly runId: number };

export type PoolReply =
  | { readonly type: 'flown'; readonly runId: number; readonly index: number; readonly result: MissionResult }
  | { readonly type: 'computed'; readonly runId: number; readonly index: number; readonly output: PointOutput }
  /** The worker could not build the mission (its study or job did not give an input): the pool flies the analysis serially instead. */
  | { readonly type: 'refused'; readonly runId: number; readonly index: number; readonly message: string };
