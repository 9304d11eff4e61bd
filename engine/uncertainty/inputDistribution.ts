/**
 * The distribution of one uncertain input, and drawing a value from it by
 * inversion of a uniform number u in [0, 1) (so a Latin hypercube's strata
 * carry over to every marginal).
 */
import { normalCdf, normalQuantile } from './normalDistribution';

/** Default truncation of a normal distribution without bounds: mean +/- this many standard deviations. */
export const DEFAULT_NORMAL_TRUNCATION_SD = 3;

export type InputDistribution =
  /** Normal, truncated to [min, max] (default mean +/- 3 sd). sd = 0 gives the mean exactly. */
  | { readonly kind: 'normal'; readonly mean: number; readonly sd: number; readonly min?: number; readonly max?: number }
  /** Uniform on [min, max]; min = max gives that value exactly. */
  | { readonly kind: 'uniform'; readonly min: number; readonly max: number }
  /** One of n alternatives with these weights (need not add to 1); the value is the alternative's index. */
  | { readonly kind: 'discrete'; readonly weights: readonly number[] };

/** A problem with a distribution: a readable message (the caller adds the path). */
export function distributionIssue(d: InputDistribution): string | null {
  switch (d.kind) {
    case 'normal': {
      if (!Number.isFinite(d.mean) || !(d.sd >= 0) || !Number.isFinite(d.sd)) return `normal: mean ${d.mean} and sd ${d.sd} must be finite with sd >= 0`;
      const [lo, hi] = normalBounds(d);
      if (!(lo <= d.mean && d.mean <= hi)) return `normal: the bounds ${lo} to ${hi} must contain the mean ${d.mean}`;
      return null;
    }
    case 'uniform':
      return Number.isFinite(d.min) && Number.isFinite(d.max) && d.min <= d.max ? null : `uniform: min ${d.min} must be <= max ${d.max}, both finite`;
    case 'discrete': {
      if (d.weights.length < 1) return 'discrete: give at least one alternative';
      if (d.weights.some((w) => !(w >= 0) || !Number.isFinite(w))) return 'discrete: weights must be finite and >= 0';
      return d.weights.some((w) => w > 0) ? null : 'discrete: at least one weight must be > 0';
    }
  }
}

function normalBounds(d: { mean: number; sd: number; min?: number; max?: number }): readonly [number, number] {
  return [d.min ?? d.mean - DEFAULT_NORMAL_TRUNCATION_SD * d.sd, d.max ?? d.mean + DEFAULT_NORMAL_TRUNCATION_SD * d.sd];
}

/**
 * The value at uniform number u in [0, 1): the inverse CDF of the
 * (truncated) distribution. Truncated normal: x = mean + sd Phi^-1(Phi(a) +
 * u (Phi(b) - Phi(a))) with a, b the standardised bounds, held inside
 * [min, max] against round-off. Discrete: the alternative whose cumulative
 * weight share first exceeds u. A valid distribution (distributionIssue
 * null) and u in [0, 1) never give NaN.
 */
export function drawFromUnit(d: InputDistribution, u: number): number {
  switch (d.kind) {
    case 'normal': {
      if (d.sd === 0) return d.mean;
      const [lo, hi] = normalBounds(d);
      const pa = normalCdf((lo - d.mean) / d.sd);
      const pb = normalCdf((hi - d.mean) / d.sd);
      const p = pa + u * (pb - pa);
      const x = d.mean + d.sd * normalQuantile(Math.min(Math.max(p, Number.MIN_VALUE), 1 - Number.EPSILON / 2));
      return Math.min(Math.max(x, lo), hi);
    }
    case 'uniform':
      return d.min === d.max ? d.min : d.min + u * (d.max - d.min);
    case 'discrete': {
      let total = 0;
      for (const w of d.weights) total += w;
      let cumulative = 0;
      for (let i = 0; i < d.weights.length; i++) {
        cumulative += d.weights[i]!;
        if (u * total < cumulative) return i;
      }
      // u -> 1 with round-off: the last alternative with weight.
      for (let i = d.weights.length - 1; i >= 0; i--) if (d.weights[i]! > 0) return i;
      return 0;
    }
  }
}

/** True when the distribution has no spread (every draw is the same value). */
export function hasNoSpread(d: InputDistribution): boolean {
  switch (d.kind) {
    case 'normal':
      return d.sd === 0;
    case 'uniform':
      return d.min === d.max;
    case 'discrete':
      return d.weights.filter((w) => w > 0).length === 1;
  }
}

/** The distribution in words, in the input's own unit, e.g. "normal, mean 0, sd 3, truncated to -9..9". */
export function describeDistribution(d: InputDistribution, unit: string, labels?: readonly string[]): string {
  const u = unit === '' ? '' : ` ${unit}`;
  const n = (x: number) => String(Number(x.toPrecision(6)));
  switch (d.kind) {
    case 'normal': {
      const [lo, hi] = normalBounds(d);
      return `normal, mean ${n(d.mean)}${u}, sd ${n(d.sd)}${u}, truncated to ${n(lo)}..${n(hi)}${u}`;
    }
    case 'uniform':
      return `uniform ${n(d.min)}..${n(d.max)}${u}`;
    case 'discrete': {
      const total = d.weights.reduce((s, w) => s + w, 0);
      return `one of ${d.weights.map((w, i) => `${labels?.[i] ?? `#${i + 1}`} (${n((100 * w) / total)} %)`).join(', ')}`;
    }
  }
}
