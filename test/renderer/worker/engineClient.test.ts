import { describe, expect, it } from 'vitest';
import { createInThreadClient, createWorkerClient } from '../../../renderer/worker/engineClient';
import type { EngineOutcome, EngineRequestKind, WorkerReplyMessage, WorkerRequestMessage } from '../../../renderer/worker/engineProtocol';
import { demoState } from '../support/studyHarness';

/** A stand-in for a Web Worker: records posted requests; the test answers them. */
class FakeWorker {
  static created: FakeWorker[] = [];
  onmessage: ((event: MessageEvent<WorkerReplyMessage>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  readonly posted: WorkerRequestMessage[] = [];
  terminated = false;
  constructor() {
    FakeWorker.created.push(this);
  }
  postMessage(message: WorkerRequestMessage) {
    this.posted.push(message);
  }
  terminate() {
    this.terminated = true;
  }
  reply(message: WorkerReplyMessage) {
    if (!this.terminated) this.onmessage?.({ data: message } as MessageEvent<WorkerReplyMessage>);
  }
}

function client() {
  FakeWorker.created = [];
  return createWorkerClient(() => new FakeWorker() as unknown as Worker);
}

const inputs = () => {
  const s = demoState();
  return { project: s.doc!.present, deckFile: s.deckFile };
};
const failure: EngineOutcome<EngineRequestKind> = { ok: false, error: { kind: 'analysis', code: 'x', message: 'm' } };

describe('createWorkerClient', () => {
  it('posts each request with an id and resolves with the matching reply, passing progress on', async () => {
    const c = client();
    const progress: [number, number][] = [];
    const run = c.run({ kind: 'payloadRange', ...inputs() }, (d, t) => progress.push([d, t]));
    const w = FakeWorker.created[0]!;
    const id = w.posted[0]!.id;
    expect(w.posted[0]!.request.kind).toBe('payloadRange');
    w.reply({ id, type: 'progress', done: 1, total: 9 });
    w.reply({ id: id + 100, type: 'done', outcome: failure });
    w.reply({ id, type: 'done', outcome: failure });
    expect(await run.outcome).toEqual(failure);
    expect(progress).toEqual([[1, 9]]);
  });

  it('gives each request kind its own worker, so a long run does not hold up the mission', () => {
    const c = client();
    c.run({ kind: 'compare', ...inputs(), nameA: 'a', nameB: 'b' });
    c.run({ kind: 'study', ...inputs() });
    expect(FakeWorker.created).toHaveLength(2);
    expect(FakeWorker.created[0]!.posted[0]!.request.kind).toBe('compare');
    expect(FakeWorker.created[1]!.posted[0]!.request.kind).toBe('study');
  });

  it('cancel terminates that worker, resolves "cancelled", and the next request starts a fresh one', async () => {
    const c = client();
    const run = c.run({ kind: 'tradeFactors', ...inputs() });
    const first = FakeWorker.created[0]!;
    run.cancel();
    expect(first.terminated).toBe(true);
    expect(await run.outcome).toBe('cancelled');
    c.run({ kind: 'tradeFactors', ...inputs() });
    expect(FakeWorker.created).toHaveLength(2);
    // cancelling a finished run does nothing
    const second = FakeWorker.created[1]!;
    const done = c.run({ kind: 'tradeFactors', ...inputs() });
    second.reply({ id: second.posted[1]!.id, type: 'done', outcome: failure });
    await done.outcome;
    done.cancel();
    expect(second.terminated).toBe(false);
  });

  it('a worker error fails its pending runs with the message', async () => {
    const c = client();
    const run = c.run({ kind: 'study', ...inputs() });
    FakeWorker.created[0]!.onerror?.({ message: 'boom' } as ErrorEvent);
    expect(await run.outcome).toEqual({ ok: false, error: { kind: 'analysis', code: 'worker_error', message: 'engine worker failed: boom' } });
  });

  it('dispose terminates every worker', () => {
    const c = client();
    c.run({ kind: 'study', ...inputs() });
    c.run({ kind: 'payloadRange', ...inputs() });
    c.dispose();
    expect(FakeWorker.created.every((w) => w.terminated)).toBe(true);
  });
});

describe('createInThreadClient', () => {
  it('runs the request on the calling thread and can be cancelled before it starts', async () => {
    const c = createInThreadClient();
    const cancelled = c.run({ kind: 'study', ...inputs() });
    cancelled.cancel();
    expect(await cancelled.outcome).toBe('cancelled');
    const flown = await c.run({ kind: 'study', ...inputs() }).outcome;
    expect(flown !== 'cancelled' && flown.ok).toBe(true);
  });
});

describe('createWorkerClient latest wins for live kinds', () => {
  it('runs one study at a time; only the newest waiting request runs next, the ones it replaced resolve cancelled', async () => {
    const c = client();
    const first = c.run({ kind: 'study', ...inputs() });
    const second = c.run({ kind: 'study', ...inputs() });
    const third = c.run({ kind: 'study', ...inputs() });
    const w = FakeWorker.created[0]!;
    expect(w.posted).toHaveLength(1);
    expect(await second.outcome).toBe('cancelled');
    w.reply({ id: w.posted[0]!.id, type: 'done', outcome: failure });
    expect(await first.outcome).toEqual(failure);
    expect(w.posted).toHaveLength(2);
    w.reply({ id: w.posted[1]!.id, type: 'done', outcome: failure });
    expect(await third.outcome).toEqual(failure);
    expect(w.terminated).toBe(false);
  });

  it('cancelling the waiting request drops it without stopping the one running', async () => {
    const c = client();
    c.run({ kind: 'crossover', ...inputs(), query: { altitude_m: 1, mass_kg: 1, rating: 'maxCruise', isaDev_K: 0, allInlets: false } });
    const waiting = c.run({ kind: 'crossover', ...inputs(), query: { altitude_m: 2, mass_kg: 1, rating: 'maxCruise', isaDev_K: 0, allInlets: false } });
    waiting.cancel();
    expect(await waiting.outcome).toBe('cancelled');
    const w = FakeWorker.created[0]!;
    expect(w.terminated).toBe(false);
    w.reply({ id: w.posted[0]!.id, type: 'done', outcome: failure });
    expect(w.posted).toHaveLength(1);
  });

  it('long jobs are not coalesced: every request is posted', () => {
    const c = client();
    c.run({ kind: 'payloadRange', ...inputs() });
    c.run({ kind: 'payloadRange', ...inputs() });
    expect(FakeWorker.created[0]!.posted).toHaveLength(2);
  });
});
