/**
 * An analysis's missions as rounds of planned missions, so that a host can
 * fly them on one thread or over several and get the same answers. Each
 * planned mission names its job (plain data: a worker thread builds the same
 * mission input from it and the study, analysisJobs.ts), the missions of the
 * round whose results its warm start reads (`after`) and its lane. The
 * warm start is a function of those results alone, and the solver is
 * deterministic, so any order that flies a mission after its `after` gives
 * every mission the same start and the same result. A round that shares
 * pass memos (`laneMemos`) shares one per lane: a lane's missions are flown
 * in their order on one thread, each reading what the lane's missions before
 * it flew (SolveOptions.passMemo), whatever the other lanes do.
 *
 * An analysis is a generator of rounds (AnalysisSteps): it yields a round,
 * receives the round's results, and returns its answer. flySerially runs one
 * on the calling thread; a host's pool runs the same generator over worker
 * threads.
 */
import { createPassMemo, type PassMemo } from '../mission/passMemo';
import type { MissionInput, MissionResult } from '../mission/missionTypes';
import type { MissionSolver } from './analysisTypes';
import type { AnalysisJob, PointJob, PointOutput } from './analysisJobs';
import { analysisSolver, type NeighbourStart } from './warmStart';

export interface PlannedMission {
  /** What a worker needs, with the study, to build the same input (analysisJobs.ts analysisJobInput). */
  readonly job: AnalysisJob;
  readonly input: MissionInput;
  /** Indices (in the round) of the missions whose results `start` reads; each below this mission's own index. */
  readonly after: readonly number[];
  /** Missions of one lane fly in order on one thread (and share a pass memo when the round's laneMemos is true). */
  readonly lane: number;
  /** The warm start from the results of `after` (indexed by round position; an unflown or failed one is undefined). */
  readonly start: (results: readonly (MissionResult | undefined)[]) => NeighbourStart | undefined;
}

export interface MissionRound {
  readonly missions: readonly PlannedMission[];
  /** One pass memo per lane (missions that differ in `solve` alone, the payload-range diagram's). */
  readonly laneMemos: boolean;
  /** True when any failed mission fails the analysis: a serial run stops there (the rest stay undefined). */
  readonly stopAtFailure: boolean;
}

/**
 * Work of an analysis that is not a mission (the comparison's crossovers and
 * ceilings): each task's output from its job alone, so a worker computes it
 * as the calling thread would (analysisJobs.ts pointJobOutput); `run` is the
 * calling thread's.
 */
export interface PointsRound {
  readonly tasks: readonly { readonly job: PointJob; readonly run: () => PointOutput }[];
}

/** A points round's outputs, in task order. */
export interface PointsResults {
  readonly outputs: readonly PointOutput[];
}

export type AnalysisRound = MissionRound | PointsRound;

/** What a round returns to its analysis: a result per mission; undefined for those not flown (cancelled, or after a failure that stops the round). */
export interface RoundResults {
  readonly results: readonly (MissionResult | undefined)[];
  readonly cancelled: boolean;
}

/** An analysis as rounds of missions (and of point tasks): yields each round, gets its results, returns the answer. */
export type AnalysisSteps<R> = Generator<AnalysisRound, R, RoundResults | PointsResults>;

/** The results of a missions round (a points round's outputs when a runner mixed them up: none). */
export function missionResults(got: RoundResults | PointsResults): RoundResults {
  return 'results' in got ? got : { results: [], cancelled: true };
}

/** The outputs of a points round (none when a runner mixed them up). */
export function pointOutputs(got: RoundResults | PointsResults): readonly PointOutput[] {
  return 'outputs' in got ? got.outputs : [];
}

/** How flySerially flies each mission and reports. */
export interface SerialHooks {
  /** A caller's solver (tests counting passes); default analysisSolver, with the lanes' memos when a round shares them. */
  readonly solve?: MissionSolver;
  /** Called after each mission with the missions flown so far (over every round). */
  readonly onMission?: () => void;
  /** Polled before each mission; true ends the round as cancelled. */
  readonly shouldCancel?: () => boolean;
}

/** The start of planned mission i: its `after` results only are visible to it, as on a worker. */
export function plannedStart(m: PlannedMission, results: readonly (MissionResult | undefined)[]): NeighbourStart | undefined {
  const seen: (MissionResult | undefined)[] = [];
  for (const k of m.after) seen[k] = results[k];
  return m.start(seen);
}

/** The solvers of one analysis run: analysisSolver, with one pass memo per lane for rounds that share them (kept across rounds). */
export function laneSolvers(): { solverFor(laneMemos: boolean, lane: number): MissionSolver } {
  const memos = new Map<number, PassMemo>();
  const plain = analysisSolver();
  return {
    solverFor(laneMemos, lane) {
      if (!laneMemos) return plain;
      let memo = memos.get(lane);
      if (memo === undefined) {
        memo = createPassMemo();
        memos.set(lane, memo);
      }
      return analysisSolver(memo);
    },
  };
}

/**
 * Runs an analysis's rounds on the calling thread, each round's missions in
 * index order (every `after` comes first), with one pass memo per lane in a
 * round that shares them (kept across the analysis's rounds).
 */
export function flySerially<R>(steps: AnalysisSteps<R>, hooks: SerialHooks = {}): R {
  const lanes = laneSolvers();
  const solverFor = (round: MissionRound, lane: number): MissionSolver => hooks.solve ?? lanes.solverFor(round.laneMemos, lane);
  let next = steps.next();
  while (!next.done) {
    if ('tasks' in next.value) {
      next = steps.next({ outputs: next.value.tasks.map((t) => t.run()) });
      continue;
    }
    const round = next.value;
    const results: (MissionResult | undefined)[] = new Array<MissionResult | undefined>(round.missions.length).fill(undefined);
    let cancelled = false;
    for (let i = 0; i < round.missions.length; i++) {
      if (hooks.shouldCancel?.()) {
        cancelled = true;
        break;
      }
      const m = round.missions[i]!;
      const r = solverFor(round, m.lane)(m.input, plannedStart(m, results));
      results[i] = r;
      hooks.onMission?.();
      if (round.stopAtFailure && r.status !== 'ok') break;
    }
    next = steps.next({ results, cancelled });
  }
  return next.value;
}
