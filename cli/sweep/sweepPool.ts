/**
 * Runs the cases [start, end) of a sweep over worker threads: each worker
 * pulls chunks of cases, rows come back as they are flown and go to
 * `onRows` at once. `stop()` ends the run early (Ctrl-C): the workers are
 * terminated and what was received stays written.
 */
import { Worker } from 'node:worker_threads';
import type { SweepRow } from '../../engine/project';
import type { SweepChunk, SweepReply, SweepWorkerData } from './sweepProtocol';

export interface SweepPoolRun {
  /** Resolves when every case is flown, the run was stopped, or a worker failed. */
  readonly finished: Promise<{ readonly completed: number; readonly stopped: boolean; readonly error: string | null }>;
  stop(): void;
}

/** The worker's entry: the bundled one beside the bundled CLI, or the TypeScript one through tsx. */
export function sweepWorkerUrl(): URL {
  return import.meta.url.endsWith('.ts') ? new URL('./sourceWorker.mjs', import.meta.url) : new URL('./sweepWorker.mjs', import.meta.url);
}

export function runSweepPool(
  data: SweepWorkerData,
  range: { readonly start: number; readonly end: number },
  workerCount: number,
  onRows: (rows: readonly SweepRow[]) => void,
): SweepPoolRun {
  const total = range.end - range.start;
  const threads = Math.max(1, Math.min(workerCount, total));
  // Chunks small enough to balance the load and stop quickly, large enough to keep messages few.
  const chunk = Math.max(1, Math.min(64, Math.ceil(total / (threads * 16))));
  let next = range.start;
  let completed = 0;
  let stopped = false;
  let error: string | null = null;
  const workers: Worker[] = [];
  let finish: (v: { completed: number; stopped: boolean; error: string | null }) => void = () => {};
  const finished = new Promise<{ completed: number; stopped: boolean; error: string | null }>((resolve) => (finish = resolve));
  let ended = false;
  const end = () => {
    if (ended) return;
    ended = true;
    for (const w of workers) void w.terminate();
    finish({ completed, stopped, error });
  };
  const feed = (w: Worker): boolean => {
    if (stopped || error !== null || next >= range.end) return false;
    const c: SweepChunk = { start: next, end: Math.min(next + chunk, range.end) };
    next = c.end;
    w.postMessage(c);
    return true;
  };
  let busy = 0;
  if (total <= 0) {
    end();
    return { finished, stop: () => {} };
  }
  for (let i = 0; i < threads; i++) {
    const w = new Worker(sweepWorkerUrl(), { workerData: data });
    workers.push(w);
    w.on('message', (reply: SweepReply) => {
      if (ended) return;
      if (reply.kind === 'error') {
        error = reply.message;
        end();
        return;
      }
      completed += reply.rows.length;
      onRows(reply.rows);
      if (reply.chunkDone) {
        busy--;
        if (feed(w)) busy++;
        if (busy === 0) end();
      }
    });
    w.on('error', (e) => {
      error = e instanceof Error ? e.message : String(e);
      end();
    });
    if (feed(w)) busy++;
  }
  return {
    finished,
    stop: () => {
      stopped = true;
      end();
    },
  };
}
