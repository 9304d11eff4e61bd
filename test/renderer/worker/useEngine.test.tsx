import { act, renderHook, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { describe, expect, it } from 'vitest';
import type { EngineClient, EngineRun } from '../../../renderer/worker/engineClient';
import type { EngineOutcome, EngineRequest, EngineRequestKind, StudyInputs, StudySnapshot } from '../../../renderer/worker/engineProtocol';
import { JobStoreProvider } from '../../../renderer/worker/jobStore';
import { EngineContext, useEngineJob, useLiveStudy } from '../../../renderer/worker/useEngine';
import { useEffect } from 'react';

/** Long enough for an effect and a microtask to run (the study is flown at once, with no delay). */
const SETTLE_MS = 50;
import { demoState } from '../support/studyHarness';

interface Pending {
  readonly request: EngineRequest;
  readonly onProgress: ((done: number, total: number) => void) | undefined;
  resolve(outcome: EngineOutcome<EngineRequestKind> | 'cancelled'): void;
  cancelled: boolean;
}

/** A client whose runs the test finishes by hand. */
function manualClient(): EngineClient & { readonly runs: Pending[] } {
  const runs: Pending[] = [];
  return {
    runs,
    run<K extends EngineRequestKind>(request: Extract<EngineRequest, { kind: K }>, onProgress?: (done: number, total: number) => void): EngineRun<K> {
      let resolve!: Pending['resolve'];
      const outcome = new Promise<EngineOutcome<K> | 'cancelled'>((r) => {
        resolve = r as Pending['resolve'];
      });
      const pending: Pending = { request, onProgress, resolve, cancelled: false };
      runs.push(pending);
      return {
        outcome,
        cancel() {
          pending.cancelled = true;
          resolve('cancelled');
        },
      };
    },
    dispose() {},
  };
}

function wrapper(client: EngineClient) {
  return ({ children }: { children: ReactNode }) => <EngineContext.Provider value={client}>{children}</EngineContext.Provider>;
}

const snapshot = (tag: number) => ({ mission: { blockFuel_kg: tag } }) as unknown as StudySnapshot;

function inputs(): StudyInputs {
  const s = demoState();
  return { project: s.doc!.present, deckFile: s.deckFile };
}

describe('useLiveStudy', () => {
  it('flies at once on every committed edit (no delay; the client keeps only the newest) and tags the result with its revision', async () => {
    const client = manualClient();
    const first = inputs();
    const { result, rerender } = renderHook(({ i }) => useLiveStudy(i), { wrapper: wrapper(client), initialProps: { i: first } });
    expect(client.runs).toHaveLength(1);
    rerender({ i: { ...first } });
    expect(client.runs).toHaveLength(2);
    expect(result.current.running).toBe(true);
    await act(async () => client.runs[1]!.resolve({ ok: true, value: snapshot(1) }));
    expect(result.current.snapshot).toEqual(snapshot(1));
    expect(result.current.snapshotRevision).toBe(result.current.revision);
    expect(result.current.stale).toBe(false);
    expect(result.current.running).toBe(false);
  });

  it('keeps the last good result, marked stale, when newer inputs fail; a late older reply is dropped', async () => {
    const client = manualClient();
    const first = inputs();
    const { result, rerender } = renderHook(({ i }) => useLiveStudy(i), { wrapper: wrapper(client), initialProps: { i: first } });
    await waitFor(() => expect(client.runs).toHaveLength(1), { timeout: 15000 });
    await act(async () => client.runs[0]!.resolve({ ok: true, value: snapshot(1) }));

    rerender({ i: { ...first } });
    await waitFor(() => expect(client.runs).toHaveLength(2), { timeout: 15000 });
    rerender({ i: { ...first } });
    await waitFor(() => expect(client.runs).toHaveLength(3), { timeout: 15000 });
    expect(result.current.stale).toBe(true);
    const failure = { kind: 'analysis' as const, code: 'x', message: 'no' };
    await act(async () => client.runs[2]!.resolve({ ok: false, error: failure }));
    expect(result.current.failure).toEqual(failure);
    expect(result.current.snapshot).toEqual(snapshot(1));
    expect(result.current.stale).toBe(true);
    // the reply to the older request arrives last and must not replace anything
    await act(async () => client.runs[1]!.resolve({ ok: true, value: snapshot(2) }));
    expect(result.current.snapshot).toEqual(snapshot(1));
  });

  it('flies nothing while the project breaks a rule: the issues are the failure and the last result is stale', async () => {
    const client = manualClient();
    const first = inputs();
    const issues = [{ path: 'airframe.weights.maxZeroFuel', value: '1', expected: 'x', message: 'too heavy' }];
    const { result, rerender } = renderHook(({ i, b }) => useLiveStudy(i, b), { wrapper: wrapper(client), initialProps: { i: first, b: [] as typeof issues } });
    await waitFor(() => expect(client.runs).toHaveLength(1), { timeout: 15000 });
    await act(async () => client.runs[0]!.resolve({ ok: true, value: snapshot(1) }));
    rerender({ i: { ...first }, b: issues });
    await new Promise((r) => setTimeout(r, SETTLE_MS));
    expect(client.runs).toHaveLength(1);
    expect(result.current.failure).toEqual({ kind: 'project', issues });
    expect(result.current.stale).toBe(true);
    expect(result.current.snapshot).toEqual(snapshot(1));
  });

  it('does nothing without a project', async () => {
    const client = manualClient();
    const { result } = renderHook(() => useLiveStudy(null), { wrapper: wrapper(client) });
    await new Promise((r) => setTimeout(r, SETTLE_MS));
    expect(client.runs).toHaveLength(0);
    expect(result.current.snapshot).toBeNull();
  });

  it('drops the figures of the previous document as soon as another one is opened', async () => {
    const client = manualClient();
    const first = inputs();
    const { result, rerender } = renderHook(({ i, k }) => useLiveStudy(i, [], k), { wrapper: wrapper(client), initialProps: { i: first, k: 1 } });
    await act(async () => client.runs[0]!.resolve({ ok: true, value: snapshot(1) }));
    expect(result.current.snapshot).toEqual(snapshot(1));
    rerender({ i: { ...first }, k: 2 });
    expect(result.current.snapshot).toBeNull();
    // a fresh `[]` on every render is the same "no issues": one run per input change, not one per render
    expect(client.runs).toHaveLength(2);
    // a late reply for the old document is dropped
    await act(async () => client.runs[0]!.resolve({ ok: true, value: snapshot(9) }));
    expect(result.current.snapshot).toBeNull();
    await act(async () => client.runs[client.runs.length - 1]!.resolve({ ok: true, value: snapshot(2) }));
    expect(result.current.snapshot).toEqual(snapshot(2));
  });
});

describe('useEngineJob', () => {
  it('shows progress, then the value', async () => {
    const client = manualClient();
    const { result } = renderHook(() => useEngineJob<'payloadRange'>(), { wrapper: wrapper(client) });
    act(() => result.current.start({ kind: 'payloadRange', ...inputs() }));
    expect(result.current.state).toEqual({ status: 'running', done: 0, total: 0 });
    act(() => client.runs[0]!.onProgress?.(2, 9));
    expect(result.current.state).toEqual({ status: 'running', done: 2, total: 9 });
    const value = { points: [] } as never;
    await act(async () => client.runs[0]!.resolve({ ok: true, value }));
    expect(result.current.state).toEqual({ status: 'done', value });
  });

  it('cancel stops the run and says cancelled; a new start cancels the run before it', async () => {
    const client = manualClient();
    const { result } = renderHook(() => useEngineJob<'tradeFactors'>(), { wrapper: wrapper(client) });
    act(() => result.current.start({ kind: 'tradeFactors', ...inputs() }));
    act(() => result.current.start({ kind: 'tradeFactors', ...inputs() }));
    expect(client.runs[0]!.cancelled).toBe(true);
    await act(async () => undefined);
    expect(result.current.state.status).toBe('running');
    act(() => result.current.cancel());
    expect(client.runs[1]!.cancelled).toBe(true);
    await waitFor(() => expect(result.current.state).toEqual({ status: 'cancelled' }), { timeout: 15000 });
  });

  it('cancels its run when the view goes away', () => {
    const client = manualClient();
    const { result, unmount } = renderHook(() => useEngineJob<'compare'>(), { wrapper: wrapper(client) });
    act(() => result.current.start({ kind: 'compare', ...inputs(), nameA: 'a', nameB: 'b' }));
    unmount();
    expect(client.runs[0]!.cancelled).toBe(true);
  });

  it('with cancelOnRestart false leaves the old run to the client and keeps the last value while a newer one runs', async () => {
    const client = manualClient();
    const { result } = renderHook(() => useEngineJob<'crossover'>({ cancelOnRestart: false }), { wrapper: wrapper(client) });
    const query = { altitude_m: 10000, mass_kg: 15000, rating: 'maxCruise' as const, isaDev_K: 0, allInlets: false };
    act(() => result.current.start({ kind: 'crossover', ...inputs(), query }));
    const value = { curves: [] };
    await act(async () => client.runs[0]!.resolve({ ok: true, value }));
    act(() => result.current.start({ kind: 'crossover', ...inputs(), query }));
    act(() => result.current.start({ kind: 'crossover', ...inputs(), query }));
    expect(client.runs[1]!.cancelled).toBe(false);
    expect(result.current.state.status).toBe('running');
    expect(result.current.lastValue).toBe(value);
    // the older of the two late runs answering must not win
    await act(async () => client.runs[1]!.resolve({ ok: true, value: { curves: [1] } as never }));
    expect(result.current.lastValue).toBe(value);
    const newest = { curves: [2] } as never;
    await act(async () => client.runs[2]!.resolve({ ok: true, value: newest }));
    expect(result.current.lastValue).toBe(newest);
  });

  it('a stored job keeps one start function while the store changes, so a view effect on it starts once per input', async () => {
    const client = manualClient();
    const request = { kind: 'crossover' as const, ...inputs(), query: { altitude_m: 10000, mass_kg: 15000, rating: 'maxCruise' as const, isaDev_K: 0, allInlets: false } };
    const storeWrapper = ({ children }: { children: ReactNode }) => (
      <EngineContext.Provider value={client}>
        <JobStoreProvider documentKey={1}>{children}</JobStoreProvider>
      </EngineContext.Provider>
    );
    const { result } = renderHook(
      () => {
        const job = useEngineJob<'crossover'>({ cancelOnRestart: false, persistKey: 'crossover' });
        const { start } = job;
        useEffect(() => start(request), [start]);
        return job;
      },
      { wrapper: storeWrapper },
    );
    // starting changes the store (running, then done); before the fix each change re-ran the effect without end
    await act(async () => client.runs[0]!.resolve({ ok: true, value: { curves: [] } }));
    expect(client.runs).toHaveLength(1);
    expect(result.current.state.status).toBe('done');
  });
});
