/** One timed call. `run` is called many times; return a value so the work is not optimized away. */
export interface BenchCase {
  readonly name: string;
  readonly run: () => unknown;
}

/** A group of cases printed under one title; each file in test/bench/sections exports one as `section`. */
export interface BenchSection {
  readonly title: string;
  readonly cases: readonly BenchCase[];
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
