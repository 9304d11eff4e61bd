/**
 * An analysis's missions as rounds of planned missions, flown on the calling
 * thread by flySerially. Each planned mission names the missions of the
 * round whose results its warm start reads (`after`) and its lane. The warm
 * start is a function of those results alone, and the solver is
 * deterministic, so any order that flies a mission after its `after` gives
 * every mission the same start and the same result. A round that shares
 * pass memos (`laneMemos`) shares one per lane: a lane's missions are flown
 * in their order, each reading what the lane's missions before it flew
 * (SolveOptions.passMemo).
 *
 * An analysis is a generator of rounds (AnalysisSteps): it yields a round,
 * receives the round's results, and returns its answer. (A pool of worker
 * threads that flew the rounds side by side measured no faster on two cores
 * and was removed: docs/analyses.md, Cost.)
 */
import { createPassMemo, type PassMemo } from '../mission/passMemo';
import type { MissionInput, MissionResult } from '../mission/missionTypes';
import type { MissionSolver } from './analysisTypes';
import { analysisSolver, type NeighbourStart } from './warmStart';

export interface PlannedMission {
  readonly input: MissionInput;
  /** Indices (in the round) of the missions whose results `start` reads; each below this mission's own index. */
  readonly after: readonly number[];
  /** Missions of one lane fly in order (and share a pass memo when the round's laneMemos is true). */
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

/** What a round returns to its analysis: a result per mission; undefined for those not flown (cancelled, or after a failure that stops the round). */
export interface RoundResults {
  readonly results: readonly (MissionResult | undefined)[];
  readonly cancelled: boolean;
}

/** An analysis as rounds of missions: yields each round, gets its results, returns the answer. */
export type AnalysisSteps<R> = Generator<MissionRound, R, RoundResults>;

/** How flySerially flies each mission and reports. */
export interface SerialHooks {
  /** A caller's solver (tests counting passes); default analysisSolver, with the lanes' memos when a round shares them. */
  readonly solve?: MissionSolver;
  /** Called after each mission with the missions flown so far (over every round). */
  readonly onMission?: () => void;
  /** Polled before each mission; true ends the round as cancelled. */
  readonly shouldCancel?: () => boolean;
}

/** The start of planned mission i: its `after` results only are visible to it. */
export function plannedStart(m: PlannedMission, results: readonly (MissionResult | undefined)[]): NeighbourStart | undefined {
  const seen: (MissionResult | undefined)[] = [];
  for (const k of m.after) seen[k] = results[k];
  return m.start(seen);
}

/** The solvers of one analysis run: analysisSolver, with one pass memo per lane for rounds that share them (kept across rounds). */
function laneSolvers(): { solverFor(laneMemos: boolean, lane: number): MissionSolver } {
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
