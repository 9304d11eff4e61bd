import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { startAutosave, type AutosaveSnapshot } from '../../../renderer/bridge/autosaveTimer';

// Task brief: the renderer sends the project every few seconds while dirty.
// Fake timers drive the interval; nothing here measures real time.

beforeEach(() => {
  vi.useFakeTimers();
});
afterEach(() => {
  vi.useRealTimers();
});

describe('startAutosave', () => {
  it('startAutosave sends dirty changed work once per interval and stops when asked', async () => {
    const autosave = vi.fn(async () => undefined);
    let snap: AutosaveSnapshot = { name: 'Demo', text: 'v1', dirty: false };
    const stop = startAutosave({ autosave }, () => snap, () => undefined, 5000);

    await vi.advanceTimersByTimeAsync(5000);
    expect(autosave).not.toHaveBeenCalled(); // clean

    snap = { name: 'Demo', text: 'v2', dirty: true };
    await vi.advanceTimersByTimeAsync(4999);
    expect(autosave).not.toHaveBeenCalled();
    await vi.advanceTimersByTimeAsync(1);
    expect(autosave).toHaveBeenCalledWith('Demo', 'v2');

    await vi.advanceTimersByTimeAsync(10_000);
    expect(autosave).toHaveBeenCalledTimes(1); // unchanged since the last copy

    snap = { name: 'Demo', text: 'v3', dirty: true };
    stop();
    await vi.advanceTimersByTimeAsync(10_000);
    expect(autosave).toHaveBeenCalledTimes(1);
  });

  it('startAutosave reports failures and tries again on the next tick', async () => {
    const errors: unknown[] = [];
    const autosave = vi.fn().mockRejectedValueOnce(new Error('disk full')).mockResolvedValue(undefined);
    const stop = startAutosave({ autosave }, () => ({ name: 'p', text: 't', dirty: true }), (e) => errors.push(e), 1000);
    await vi.advanceTimersByTimeAsync(1000);
    expect((errors[0] as Error).message).toBe('disk full');
    await vi.advanceTimersByTimeAsync(1000);
    expect(autosave).toHaveBeenCalledTimes(2);
    await vi.advanceTimersByTimeAsync(1000);
    expect(autosave).toHaveBeenCalledTimes(2);
    stop();
  });
});
