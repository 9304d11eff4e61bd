/**
 * How the renderer calls the engine: `run` a request, get progress and the
 * outcome, `cancel` it. Two runners behind one interface: Web Workers (the
 * app) and in-thread (component tests in happy-dom).
 */
import { createDeckCache, runEngineRequest } from './engineRunner';
import type { EngineOutcome, EngineRequest, EngineRequestKind, WorkerReplyMessage, WorkerRequestMessage } from './engineProtocol';

export interface EngineRun<K extends EngineRequestKind> {
  readonly outcome: Promise<EngineOutcome<K> | 'cancelled'>;
  cancel(): void;
}

export interface EngineClient {
  run<K extends EngineRequestKind>(
    request: Extract<EngineRequest, { kind: K }>,
    onProgress?: (done: number, total: number) => void,
  ): EngineRun<K>;
  dispose(): void;
}

/** Runs requests synchronously on the calling thread (tests); cancel before the microtask runs skips the run. */
export function createInThreadClient(): EngineClient {
  const cache = createDeckCache();
  return {
    run<K extends EngineRequestKind>(request: Extract<EngineRequest, { kind: K }>, onProgress?: (done: number, total: number) => void): EngineRun<K> {
      let cancelled = false;
      const outcome = Promise.resolve().then(() => {
        if (cancelled) return 'cancelled' as const;
        const r = runEngineRequest(request, cache, { onProgress: onProgress ?? (() => {}), shouldCancel: () => cancelled });
        return cancelled ? ('cancelled' as const) : (r as EngineOutcome<K>);
      });
      return { outcome, cancel: () => void (cancelled = true) };
    },
    dispose() {},
  };
}

type WorkerFactory = () => Worker;

function defaultWorker(): Worker {
  return new Worker(new URL('./engineWorker.ts', import.meta.url), { type: 'module' });
}

interface Pending {
  readonly resolve: (value: EngineOutcome<EngineRequestKind> | 'cancelled') => void;
  readonly onProgress: ((done: number, total: number) => void) | undefined;
}

interface Slot {
  readonly worker: Worker;
  readonly pending: Map<number, Pending>;
  /** Coalescing kinds: the request being run, and the newest one waiting behind it. */
  inFlight: number | null;
  waiting: WorkerRequestMessage | null;
}

/** Kinds where only the newest request matters: one runs, the newest waits, older waiting ones are dropped. */
export const COALESCED_KINDS: ReadonlySet<EngineRequestKind> = new Set<EngineRequestKind>(['study', 'crossover', 'envelope', 'specificRange']);

/**
 * A client over Web Workers. Each request kind gets its own worker, so a
 * long analysis never delays the live mission. For the live kinds
 * (COALESCED_KINDS) latest wins: while one request runs, only the newest
 * waits and any request it replaces resolves 'cancelled' without running.
 * Cancelling a running request terminates that kind's worker (a fresh one
 * starts on the next request); a reply from a terminated worker never arrives.
 */
export function createWorkerClient(makeWorker: WorkerFactory = defaultWorker): EngineClient {
  const workers = new Map<EngineRequestKind, Slot>();
  let nextId = 1;

  const post = (s: Slot, message: WorkerRequestMessage) => {
    s.inFlight = message.id;
    s.worker.postMessage(message);
  };

  const slot = (kind: EngineRequestKind): Slot => {
    let s = workers.get(kind);
    if (!s) {
      const created: Slot = { worker: makeWorker(), pending: new Map<number, Pending>(), inFlight: null, waiting: null };
      created.worker.onmessage = (event: MessageEvent<WorkerReplyMessage>) => {
        const msg = event.data;
        const p = created.pending.get(msg.id);
        if (!p) return;
        if (msg.type === 'progress') {
          p.onProgress?.(msg.done, msg.total);
          return;
        }
        created.pending.delete(msg.id);
        if (created.inFlight === msg.id) created.inFlight = null;
        p.resolve(msg.outcome);
        if (created.waiting !== null && created.inFlight === null) {
          const next = created.waiting;
          created.waiting = null;
          post(created, next);
        }
      };
      created.worker.onerror = (event: ErrorEvent) => {
        for (const [id, p] of created.pending) {
          created.pending.delete(id);
          p.resolve({ ok: false, error: { kind: 'analysis', code: 'worker_error', message: `engine worker failed: ${event.message}` } });
        }
        created.inFlight = null;
        created.waiting = null;
      };
      s = created;
      workers.set(kind, s);
    }
    return s;
  };

  return {
    run<K extends EngineRequestKind>(request: Extract<EngineRequest, { kind: K }>, onProgress?: (done: number, total: number) => void): EngineRun<K> {
      const s = slot(request.kind);
      const id = nextId++;
      const outcome = new Promise<EngineOutcome<K> | 'cancelled'>((resolve) => {
        s.pending.set(id, { resolve: resolve as Pending['resolve'], onProgress });
      });
      const message: WorkerRequestMessage = { id, request };
      if (!COALESCED_KINDS.has(request.kind) || s.inFlight === null) {
        if (COALESCED_KINDS.has(request.kind)) post(s, message);
        else s.worker.postMessage(message);
      } else {
        if (s.waiting !== null) {
          s.pending.get(s.waiting.id)?.resolve('cancelled');
          s.pending.delete(s.waiting.id);
        }
        s.waiting = message;
      }
      return {
        outcome,
        cancel() {
          const current = workers.get(request.kind);
          if (current !== s || !s.pending.has(id)) return;
          if (s.waiting?.id === id) {
            s.waiting = null;
            s.pending.get(id)?.resolve('cancelled');
            s.pending.delete(id);
            return;
          }
          s.worker.terminate();
          workers.delete(request.kind);
          for (const p of s.pending.values()) p.resolve('cancelled');
          s.pending.clear();
        },
      };
    },
    dispose() {
      for (const s of workers.values()) s.worker.terminate();
      workers.clear();
    },
  };
}
