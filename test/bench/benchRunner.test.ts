import { describe, expect, it } from 'vitest';
import { formatTable, lastSink, runCase } from './benchRunner';

describe('runCase', () => {
  it('calls the case, counts every timed call and keeps the last result', () => {
    let n = 0;
    const r = runCase('demo', { name: 'count', run: () => ++n }, { warmUp_s: 0.005, measure_s: 0.01, minWarmUpCalls: 1, minBatches: 1 });
    expect(r.section).toBe('demo');
    expect(r.name).toBe('count');
    expect(r.calls).toBeGreaterThan(0);
    // Warm-up calls come on top of the timed ones.
    expect(n).toBeGreaterThanOrEqual(r.calls);
    expect(lastSink()).toBe(n);
    expect(Number.isFinite(r.opsPerSecond) && r.opsPerSecond > 0).toBe(true);
    expect(Number.isFinite(r.medianCall_s) && r.medianCall_s >= 0).toBe(true);
  });

  it('calls prepare once, before the first call of the case', () => {
    const order: string[] = [];
    runCase(
      'demo',
      { name: 'prepared', prepare: () => order.push('prepare'), run: () => order.push('run') },
      { warmUp_s: 0.001, measure_s: 0.001, minWarmUpCalls: 2, minBatches: 2 },
    );
    expect(order[0]).toBe('prepare');
    expect(order.filter((x) => x === 'prepare')).toHaveLength(1);
    expect(order.length).toBeGreaterThan(4);
  });

  it('warms a slow case for at least minWarmUpCalls calls and measures at least minBatches batches', () => {
    let n = 0;
    const slow = () => {
      const end = performance.now() + 2;
      while (performance.now() < end);
      return ++n;
    };
    // 2 ms per call: time alone would allow ~1 warm-up call and ~1 batch.
    const r = runCase('demo', { name: 'slow', run: slow }, { warmUp_s: 0.001, measure_s: 0.001, minWarmUpCalls: 4, minBatches: 5 });
    expect(r.calls).toBeGreaterThanOrEqual(5);
    expect(n - r.calls).toBeGreaterThanOrEqual(4);
  });
});

describe('formatTable', () => {
  it('prints one aligned row per result with grouped calls/s and scaled times', () => {
    const text = formatTable([
      { section: 'atmosphere', name: 'a', opsPerSecond: 6004894.2, medianCall_s: 82.7e-9, calls: 1 },
      { section: 'mission', name: 'whole mission', opsPerSecond: 312.4, medianCall_s: 3.2e-3, calls: 1 },
    ]);
    const lines = text.split('\n');
    expect(lines).toHaveLength(4);
    expect(lines[0]).toMatch(/^section\s+case\s+calls\/s\s+median\/call$/);
    expect(lines[2]).toContain('6,004,894');
    expect(lines[2]).toContain('82.7 ns');
    expect(lines[3]).toContain('3.20 ms');
    expect(new Set(lines.map((l) => l.length)).size).toBe(1);
  });
});
