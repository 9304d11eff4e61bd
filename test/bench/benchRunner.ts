import { performance } from 'node:perf_hooks';
import type { BenchCase, BenchResult } from './benchTypes';

export interface BenchTiming {
  /** Time spent calling before measuring (s). */
  readonly warmUp_s: number;
  /** Time spent measuring (s). */
  readonly measure_s: number;
  /** Calls before measuring, at least (a slow case warms the JIT over several calls, not over 0.1 s). */
  readonly minWarmUpCalls: number;
  /** Batches measured, at least (so a slow case's median is a median). */
  readonly minBatches: number;
}

export const DEFAULT_TIMING: BenchTiming = { warmUp_s: 0.1, measure_s: 0.5, minWarmUpCalls: 10, minBatches: 15 };

/** Keeps results reachable so the JIT cannot drop the calls. */
let sink: unknown = null;

export function lastSink(): unknown {
  return sink;
}

/** The result of `calls` calls measured from `start` (performance.now(), ms) in batches of per-call times `perCall` (s): calls per second and the median per-call time. */
function resultOf(section: string, name: string, perCall: number[], calls: number, start: number): BenchResult {
  const elapsed_s = (performance.now() - start) / 1000;
  perCall.sort((a, b) => a - b);
  const mid = perCall.length >> 1;
  const medianCall_s = perCall.length % 2 === 1 ? perCall[mid]! : 0.5 * (perCall[mid - 1]! + perCall[mid]!);
  return { section, name, opsPerSecond: calls / elapsed_s, medianCall_s, calls };
}

/**
 * Times one case: its `prepare` first (untimed), then calls it for `warmUp_s` (and at least `minWarmUpCalls`
 * times), then in batches sized to about a millisecond each for `measure_s`
 * (and at least `minBatches` batches). Reports total calls per second and the
 * median per-call time over batches.
 */
export function runCase(section: string, bench: BenchCase, timing: BenchTiming = DEFAULT_TIMING): BenchResult {
  bench.prepare?.();
  let batch = 1;
  const warmEnd = performance.now() + timing.warmUp_s * 1000;
  let warmCalls = 0;
  // Warm up and grow the batch until one batch takes about 1 ms.
  while (performance.now() < warmEnd || warmCalls < timing.minWarmUpCalls) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) sink = bench.run();
    warmCalls += batch;
    if (performance.now() - t0 < 1 && batch < 1 << 24) batch *= 2;
  }
  const perCall: number[] = [];
  let calls = 0;
  const start = performance.now();
  const end = start + timing.measure_s * 1000;
  do {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) sink = bench.run();
    const t1 = performance.now();
    perCall.push((t1 - t0) / 1000 / batch);
    calls += batch;
  } while (performance.now() < end || perCall.length < timing.minBatches);
  return resultOf(section, bench.name, perCall, calls, start);
}

function formatTime(t_s: number): string {
  if (t_s >= 1) return `${t_s.toFixed(2)} s`;
  if (t_s >= 1e-3) return `${(t_s * 1e3).toFixed(2)} ms`;
  if (t_s >= 1e-6) return `${(t_s * 1e6).toFixed(2)} us`;
  return `${(t_s * 1e9).toFixed(1)} ns`;
}

function formatOps(ops: number): string {
  return Math.round(ops).toString().replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/** One table: section, case, calls per second, median time per call. */
export function formatTable(results: readonly BenchResult[]): string {
  const header = ['section', 'case', 'calls/s', 'median/call'];
  const rows = results.map((r) => [r.section, r.name, formatOps(r.opsPerSecond), formatTime(r.medianCall_s)]);
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((row) => row[i]!.length)));
  const line = (cells: readonly string[]) =>
    cells.map((c, i) => (i >= 2 ? c.padStart(widths[i]!) : c.padEnd(widths[i]!))).join('  ');
  return [line(header), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join('\n');
}
