/** One timed call. `run` is called many times; return a value so the work is not optimized away. */
export interface BenchCase {
  readonly name: string;
  readonly run: () => unknown;
  /** Called once before the warm-up (runCase), untimed: work the case is to be timed after, in the same process. */
  readonly prepare?: () => void;
}

/** A group of cases printed under one title; each file in test/bench/sections exports one as `section`. */
export interface BenchSection {
  readonly title: string;
  readonly cases: readonly BenchCase[];
  /**
   * Longer warm-up and measuring than the default (benchRunner.ts DEFAULT_TIMING: 0.1 s and 0.5 s a case), for
   * whole missions: their code takes about 2,500 solves (3 s) to reach its steady speed under the JIT, so a
   * mission case warmed 0.1 s measured the compiler as well (the demo row read 1.7 to 4.5 ms with its section
   * run alone, 1.0 ms after the analyses had run, 0.93 ms steady; scratch loop of 8,000 solves in blocks of 500,
   * 3 December 2026), and a median over 0.5 s of a 1 ms case moved by 20 to 50 % from run to run on this
   * machine.
   */
  readonly timing?: { readonly warmUp_s: number; readonly measure_s: number };
}

export interface BenchResult {
  readonly section: string;
  readonly name: string;
  readonly opsPerSecond: number;
  /** Median time of one call over the timed batches (s). */
  readonly medianCall_s: number;
  readonly calls: number;
}

/** Returns 1, 2, ..., period - 1, 0, 1, ... on successive calls: a case varies its inputs by it, so no call repeats the one before. */
export function callCounter(period = 64): () => number {
  let k = 0;
  return () => {
    k = (k + 1) % period;
    return k;
  };
}
