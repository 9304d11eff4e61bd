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

/**
 * A client over Web Workers. Each request kind gets its own worker, so a
 * long analysis never delays the live mission. Cancelling terminates that
 * kind's worker (a fresh one starts on the next request); a reply from a
 * terminated worker can never arrive.
 */
export function createWorkerClient(makeWorker: WorkerFactory = defaultWorker): EngineClient {
  const workers = new Map<EngineRequestKind, { worker: Worker; pending: Map<number, Pending> }>();
  let nextId = 1;

  const slot = (kind: EngineRequestKind) => {
    let s = workers.get(kind);
    if (!s) {
      const worker = makeWorker();
      const pending = new Map<number, Pending>();
      worker.onmessage = (event: MessageEvent<WorkerReplyMessage>) => {
        const msg = event.data;
        const p = pending.get(msg.id);
        if (!p) return;
        if (msg.type === 'progress') p.onProgress?.(msg.done, msg.total);
        else {
          pending.delete(msg.id);
          p.resolve(msg.outcome);
        }
      };
      worker.onerror = (event: ErrorEvent) => {
        for (const [id, p] of pending) {
          pending.delete(id);
          p.resolve({ ok: false, failure: { kind: 'analysis', code: 'worker_error', message: `engine worker failed: ${event.message}` } });
        }
      };
      s = { worker, pending };
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
      s.worker.postMessage({ id, request } satisfies WorkerRequestMessage);
      return {
        outcome,
        cancel() {
          const current = workers.get(request.kind);
          if (current !== s || !s.pending.has(id)) return;
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
