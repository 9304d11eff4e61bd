import { afterEach, describe, expect, it, vi } from 'vitest';
import type { TradeFactorsResult } from '../../../engine/analysis/tradeFactors';
import type { WorkerReplyMessage, WorkerRequestMessage } from '../../../renderer/worker/engineProtocol';
import { demoState } from '../support/studyHarness';

// The worker module talks to `self`; here `self` is the happy-dom window, whose
// postMessage is replaced to collect the replies. The real worker runs in the
// end-to-end tests (Chromium).

afterEach(() => {
  vi.restoreAllMocks();
});

describe('engineWorker', () => {
  it('answers a request with progress messages and then the outcome, tagged with its id', async () => {
    const replies: WorkerReplyMessage[] = [];
    vi.spyOn(self, 'postMessage').mockImplementation(((message: WorkerReplyMessage) => {
      replies.push(message);
    }) as typeof self.postMessage);
    await import('../../../renderer/worker/engineWorker');
    const s = demoState();
    const request: WorkerRequestMessage = { id: 7, request: { kind: 'tradeFactors', project: s.doc!.present, deckFile: s.deckFile } };
    (self.onmessage as (e: MessageEvent<WorkerRequestMessage>) => void)({ data: request } as MessageEvent<WorkerRequestMessage>);
    const progress = replies.filter((r) => r.type === 'progress');
    const done = replies.filter((r) => r.type === 'done');
    expect(done).toHaveLength(1);
    expect(replies[replies.length - 1]!.type).toBe('done');
    expect(replies.every((r) => r.id === 7)).toBe(true);
    expect(progress.length).toBeGreaterThan(0);
    const last = done[0]!;
    if (last.type !== 'done') throw new Error('unreachable');
    // either the trade factors or the engine's reason, never a thrown error
    if (!last.outcome.ok) expect(last.outcome.error.kind).toBe('analysis');
    else expect((last.outcome.value as TradeFactorsResult).factors.map((f) => f.name)).toEqual(['recovery', 'dragCount', 'tsfc', 'oew']);
  }, 60000);
});
