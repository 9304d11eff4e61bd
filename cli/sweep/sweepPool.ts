/**
 * Runs the cases [start, end) of a sweep over worker threads: each worker
 * flies a contiguous lane of the grid (so neighbouring cases follow each
 * other in it and each starts from its neighbour's solve,
 * engine/study/prepareSweep.ts), sent in chunks, two at a time so it never
 * waits for the next; a worker whose lane is done takes the back half of the
 * longest lane left. Rows come back as they are flown and go to `onRows` at
 * once. `stop()` ends the run early (Ctrl-C): the workers are terminated and
 * what was received stays written. The workers may be started ahead
 * (startSweepCrew), while the main thread still reads the project: a
 * worker's own start-up (the thread, the bundle compiled, the schemas
 * built) is then done by the time its study comes.
 */
import { setFlagsFromString } from 'node:v8';
import { Worker } from 'node:worker_threads';
import type { SweepRow } from '../../engine/project';
import type { SweepChunk, SweepReply, SweepRequest, SweepWorkerData } from './sweepProtocol';

export interface SweepPoolRun {
  /** Resolves when every case is flown, the run was stopped, or a worker failed. */
  readonly finished: Promise<{ readonly completed: number; readonly stopped: boolean; readonly error: string | null }>;
  stop(): void;
}

/**
 * Semi-space size of the workers' young generation (MB). One demo-class solve makes about 5 MB of short-lived
 * objects; V8's young generation, started at 1 MB and grown only as objects survive, stayed near 8 MB and was
 * scavenged every two or three cases, each scavenge a pause of the solve (0.8 to 1.4 ms a case in GC, 2 December
 * 2026). At 32 MB a scavenge comes every 6 to 7 cases and the GC share falls by half or more; the cost is about
 * 100 MB of memory per worker.
 */
const WORKER_SEMI_SPACE_MB = 32;

/**
 * Sets the young-generation size of the isolates made from here on (the workers; V8 sizes a heap when its isolate
 * is made, so the running thread's own heap is left as it is).
 */
function sizeWorkerHeaps(): void {
  setFlagsFromString(`--min-semi-space-size=${WORKER_SEMI_SPACE_MB}`);
  setFlagsFromString(`--max-semi-space-size=${WORKER_SEMI_SPACE_MB}`);
}

/**
 * Puts the two flags back to V8's defaults once the workers are made and done. V8 refuses a code cache made under
 * other flags, and bin/cliCodeCache.mjs takes the command line's cache at exit: with the flags left changed, the
 * next start would refuse the sweep's cache every time.
 */
function restoreHeapFlags(): void {
  setFlagsFromString('--min-semi-space-size=0');
  setFlagsFromString('--max-semi-space-size=0');
}

/** The worker's entry: the bundled one beside the bundled CLI, or the TypeScript one through tsx. */
export function sweepWorkerUrl(): URL {
  return import.meta.url.endsWith('.ts') ? new URL('./sourceWorker.mjs', import.meta.url) : new URL('./sweepWorker.mjs', import.meta.url);
}

/** Worker threads started before their study is known; the pool takes them, and `dispose` ends those not taken. */
export interface SweepCrew {
  /** Up to `n` of the started workers (fewer when fewer were started); the rest stay with the crew. */
  take(n: number): Worker[];
  /** Terminates the workers not taken (a sweep that ends before its pool starts: bad input, unreadable project). */
  dispose(): void;
}

function startWorker(): Worker {
  return new Worker(sweepWorkerUrl());
}

/** Starts `count` sweep workers now, each waiting for its study. */
export function startSweepCrew(count: number): SweepCrew {
  sizeWorkerHeaps();
  const idle = Array.from({ length: Math.max(0, count) }, startWorker);
  return {
    take: (n) => idle.splice(0, Math.max(0, n)),
    dispose: () => {
      for (const w of idle.splice(0)) void w.terminate();
      // A sweep that ended before its pool (bad input) leaves V8's flags as they were too (restoreHeapFlags).
      restoreHeapFlags();
    },
  };
}

export function runSweepPool(
  data: SweepWorkerData,
  range: { readonly start: number; readonly end: number },
  workerCount: number,
  onRows: (rows: readonly SweepRow[]) => void,
  crew?: SweepCrew,
): SweepPoolRun {
  const total = range.end - range.start;
  const threads = Math.max(1, Math.min(workerCount, total));
  // Chunks small enough to balance the load and stop quickly, large enough to keep messages few.
  const chunk = Math.max(1, Math.min(64, Math.ceil(total / (threads * 16))));
  const lanes = Array.from({ length: threads }, (_, i) => ({
    next: range.start + Math.floor((i * total) / threads),
    end: range.start + Math.floor(((i + 1) * total) / threads),
  }));
  const inFlight = new Array<number>(threads).fill(0);
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
    restoreHeapFlags();
    finish({ completed, stopped, error });
  };
  /** The next chunk of lane `i`, after taking the back half of the longest lane when `i` is done; null when none is left. */
  const nextChunk = (i: number): SweepChunk | null => {
    const lane = lanes[i]!;
    if (lane.next >= lane.end) {
      let longest = -1;
      let most = 0;
      for (let j = 0; j < threads; j++) {
        const left = lanes[j]!.end - lanes[j]!.next;
        if (left > most) [longest, most] = [j, left];
      }
      if (longest < 0) return null;
      const other = lanes[longest]!;
      const mid = other.end - Math.max(1, Math.floor((other.end - other.next) / 2));
      lane.next = mid;
      lane.end = other.end;
      other.end = mid;
    }
    const c: SweepChunk = { kind: 'chunk', start: lane.next, end: Math.min(lane.next + chunk, lane.end) };
    lane.next = c.end;
    return c;
  };
  const feed = (i: number): void => {
    while (!stopped && error === null && inFlight[i]! < 2) {
      const c = nextChunk(i);
      if (c === null) return;
      inFlight[i]!++;
      workers[i]!.postMessage(c satisfies SweepRequest);
    }
  };
  if (total <= 0) {
    end();
    return { finished, stop: () => {} };
  }
  const ready = crew?.take(threads) ?? [];
  if (ready.length < threads) sizeWorkerHeaps();
  for (let i = 0; i < threads; i++) {
    const w = ready[i] ?? startWorker();
    workers.push(w);
    w.postMessage({ kind: 'study', data } satisfies SweepRequest);
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
        inFlight[i]!--;
        feed(i);
        if (inFlight.every((n) => n === 0)) end();
      }
    });
    w.on('error', (e) => {
      error = e instanceof Error ? e.message : String(e);
      end();
    });
  }
  for (let i = 0; i < threads; i++) feed(i);
  return {
    finished,
    stop: () => {
      stopped = true;
      end();
    },
  };
}
