/**
 * A persistent pool of worker threads that flies one analysis's planned
 * missions (engine/analysis missionPlan.ts) side by side, so a call costs
 * the missions over the threads plus message passing, not thread start-up.
 * Each round's missions are sent as they become ready (the missions their
 * warm start reads are flown; with lane memos, the lane's missions before
 * them too, and each lane stays on one worker), the lowest index first; each
 * warm start is computed here from the results it reads, so the answer is
 * the serial one bit for bit (engine/analysis plannedStart). A worker that
 * cannot build a mission, or fails, makes the pool fly the analysis again
 * serially on the calling thread (flySerially), and the pool is not used
 * again. Node only (worker_threads); the engine stays pure.
 */
import { Worker } from 'node:worker_threads';
import { flySerially, plannedStart, type AnalysisSteps, type MissionRound, type PointOutput, type PointsResults, type PointsRound, type RoundResults } from '../engine/analysis';
import type { MissionResult } from '../engine/mission';
import type { AnalysisSpec } from '../engine/study';
import type { PoolReply, PoolRequest, StartData, StudySource } from './analysisProtocol';

export type { StudySource } from './analysisProtocol';

export interface PoolHooks {
  /** Called after each mission flown. */
  readonly onMission?: () => void;
  /** Polled before each mission is sent; true ends the round as cancelled (missions in flight are waited for). */
  readonly shouldCancel?: () => boolean;
}

export interface AnalysisPool {
  /** Worker threads (0 once the pool has failed or closed: every run is then serial). */
  readonly threads: () => number;
  /**
   * Runs the analysis `steps()` makes over the workers; the study is `source`
   * with the analysis `spec`, as the calling thread built `steps` from.
   * Falls back to flySerially(steps()) when the pool cannot fly it.
   */
  run<R>(source: StudySource, spec: AnalysisSpec, steps: () => AnalysisSteps<R>, hooks?: PoolHooks): Promise<R>;
  close(): Promise<void>;
}

interface Slot {
  readonly worker: Worker;
  busy: boolean;
  readonly studies: Set<number>;
}

/** A start reduced to what a prediction reads (MissionResult's warmStart and residual): less to copy to a worker. */
function startData(start: ReturnType<typeof plannedStart>): StartData | undefined {
  if (start === undefined) return undefined;
  const slim = (r: { readonly warmStart?: MissionResult['warmStart']; readonly residual_kg: number }) => ({ ...(r.warmStart === undefined ? {} : { warmStart: r.warmStart }), residual_kg: r.residual_kg });
  return { from: slim(start.from), ...(start.blend === undefined ? {} : { blend: start.blend.map((b) => ({ weight: b.weight, result: slim(b.result) })) }) };
}

/**
 * Starts `threads` workers from `workerUrl` (the bundled analysisWorker.mjs,
 * or sourceAnalysisWorker.mjs under tsx). With 0 threads every run is serial.
 */
export function createAnalysisPool(options: { readonly workerUrl: URL; readonly threads: number }): AnalysisPool {
  const slots: Slot[] = Array.from({ length: Math.max(0, Math.floor(options.threads)) }, () => ({ worker: new Worker(options.workerUrl), busy: false, studies: new Set<number>() }));
  let broken = slots.length === 0;
  const listeners = new Map<Worker, (reply: PoolReply) => void>();
  for (const s of slots) {
    s.worker.on('message', (reply: PoolReply) => listeners.get(s.worker)?.(reply));
    s.worker.on('error', () => {
      broken = true;
      listeners.get(s.worker)?.({ type: 'refused', runId: -1, index: -1, message: 'worker failed' });
    });
    s.worker.unref();
  }
  // Studies by source object and spec: each sent once to each worker.
  const studyIds = new WeakMap<StudySource, Map<string, number>>();
  let nextStudy = 1;
  let nextRun = 1;
  const studyId = (source: StudySource, spec: AnalysisSpec): number => {
    let bySpec = studyIds.get(source);
    if (bySpec === undefined) studyIds.set(source, (bySpec = new Map()));
    const key = JSON.stringify(spec);
    let id = bySpec.get(key);
    if (id === undefined) bySpec.set(key, (id = nextStudy++));
    return id;
  };

  /** Flies one round over the workers; null when a worker refused or failed. */
  const flyRound = (round: MissionRound, runId: number, study: number, source: StudySource, spec: AnalysisSpec, hooks: PoolHooks): Promise<RoundResults | null> =>
    new Promise((resolve) => {
      const n = round.missions.length;
      const results: (MissionResult | undefined)[] = new Array<MissionResult | undefined>(n).fill(undefined);
      const sent = new Array<boolean>(n).fill(false);
      let inFlight = 0;
      let cancelled = false;
      let failedAt = Infinity;
      let refused = false;
      const finish = () => {
        for (const s of slots) listeners.delete(s.worker);
        resolve(refused ? null : { results, cancelled });
      };
      const laneDone = (i: number) => {
        const lane = round.missions[i]!.lane;
        for (let k = 0; k < i; k++) if (round.missions[k]!.lane === lane && results[k] === undefined) return false;
        return true;
      };
      const ready = (i: number) => !sent[i] && round.missions[i]!.after.every((k) => results[k] !== undefined) && (!round.laneMemos || laneDone(i));
      // With lane memos a lane stays on one worker, so its memo does.
      const slotFits = (slot: number, i: number) => !round.laneMemos || round.missions[i]!.lane % slots.length === slot;
      const dispatch = () => {
        if (refused) return;
        for (let slot = 0; slot < slots.length; slot++) {
          const s = slots[slot]!;
          if (s.busy) continue;
          if (!cancelled && hooks.shouldCancel?.()) cancelled = true;
          if (cancelled) break;
          // After a failure in a round that stops at one, only the missions before it are still needed (to find the first).
          let i = 0;
          while (i < n && !(i < failedAt && ready(i) && slotFits(slot, i))) i++;
          if (i === n) continue;
          const m = round.missions[i]!;
          if (!s.studies.has(study)) {
            s.worker.postMessage({ type: 'study', studyId: study, source, spec } satisfies PoolRequest);
            s.studies.add(study);
          }
          sent[i] = true;
          s.busy = true;
          inFlight++;
          s.worker.postMessage({ type: 'fly', runId, studyId: study, index: i, job: m.job, start: startData(plannedStart(m, results)), lane: m.lane, laneMemos: round.laneMemos } satisfies PoolRequest);
        }
        if (inFlight === 0) finish();
      };
      for (const s of slots) {
        listeners.set(s.worker, (reply) => {
          s.busy = false;
          inFlight--;
          if (reply.type !== 'flown') {
            refused = true;
            if (inFlight <= 0) finish();
            return;
          }
          results[reply.index] = reply.result;
          hooks.onMission?.();
          if (round.stopAtFailure && reply.result.status !== 'ok') failedAt = Math.min(failedAt, reply.index);
          dispatch();
        });
      }
      if (n === 0) finish();
      else dispatch();
    });

  /** Computes a points round's tasks over the workers, in task order; null when a worker refused or failed. */
  const computePoints = (round: PointsRound, runId: number, study: number, source: StudySource, spec: AnalysisSpec): Promise<PointsResults | null> =>
    new Promise((resolve) => {
      const outputs: PointOutput[] = [];
      let next = 0;
      let left = round.tasks.length;
      let refused = false;
      const send = (s: Slot) => {
        if (next >= round.tasks.length) return;
        if (!s.studies.has(study)) {
          s.worker.postMessage({ type: 'study', studyId: study, source, spec } satisfies PoolRequest);
          s.studies.add(study);
        }
        s.busy = true;
        s.worker.postMessage({ type: 'points', runId, studyId: study, index: next, job: round.tasks[next]!.job } satisfies PoolRequest);
        next++;
      };
      const finish = () => {
        for (const s of slots) listeners.delete(s.worker);
        resolve(refused ? null : { outputs });
      };
      for (const s of slots) {
        listeners.set(s.worker, (reply) => {
          s.busy = false;
          left--;
          if (reply.type === 'computed') outputs[reply.index] = reply.output;
          else refused = true;
          if (left <= 0 || refused) finish();
          else send(s);
        });
      }
      if (left === 0) finish();
      else for (const s of slots) send(s);
    });

  return {
    threads: () => (broken ? 0 : slots.length),
    async run<R>(source: StudySource, spec: AnalysisSpec, steps: () => AnalysisSteps<R>, hooks: PoolHooks = {}): Promise<R> {
      const serial = () => flySerially(steps(), { ...(hooks.onMission ? { onMission: hooks.onMission } : {}), ...(hooks.shouldCancel ? { shouldCancel: hooks.shouldCancel } : {}) });
      if (broken) return serial();
      const runId = nextRun++;
      const study = studyId(source, spec);
      const gen = steps();
      // The workers keep the process alive only while a run waits for them.
      for (const s of slots) s.worker.ref();
      try {
        let next = gen.next();
        while (!next.done) {
          const round = 'tasks' in next.value ? await computePoints(next.value, runId, study, source, spec) : await flyRound(next.value, runId, study, source, spec, hooks);
          if (round === null) {
            broken = true;
            return serial();
          }
          next = gen.next(round);
        }
        return next.value;
      } finally {
        for (const s of slots) {
          s.worker.postMessage({ type: 'endRun', runId } satisfies PoolRequest);
          s.worker.unref();
        }
      }
    },
    async close() {
      broken = true;
      await Promise.all(slots.map((s) => s.worker.terminate()));
    },
  };
}
