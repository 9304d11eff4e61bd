/** Axis ticks at round values for the charts (the axes recharts would otherwise label with float noise). */

export interface NiceAxis {
  /** Tick values, ascending, rounded to the step's decimals. */
  readonly ticks: readonly number[];
  /** The axis range the ticks span: [first tick, last tick]. */
  readonly domain: readonly [number, number];
  /** Decimals a tick label needs (0 for steps of 1 and above). */
  readonly decimals: number;
}

/** Fraction of a step by which a value may pass a tick and still count as on it. */
const SNAP = 1e-6;

function niceNumber(x: number, round: boolean): number {
  const exponent = Math.floor(Math.log10(x));
  const fraction = x / 10 ** exponent;
  let nice: number;
  if (round) nice = fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10;
  else nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
  return nice * 10 ** exponent;
}

/**
 * "Loose" axis labels covering [min, max] with about `count` ticks at steps of
 * 1, 2 or 5 x 10^k (Heckbert, "Nice numbers for graph labels", Graphics Gems,
 * 1990). A single value (min = max) gets a range of +-10 % (+-1 at zero).
 * Values within 1e-6 of a step past a tick count as on it (no extra tick for
 * float noise).
 * Null when min or max is not finite or min > max: the caller keeps its
 * default axis.
 */
export function niceTicks(min: number, max: number, count = 5): NiceAxis | null {
  if (!Number.isFinite(min) || !Number.isFinite(max) || min > max) return null;
  if (min === max) {
    const pad = min === 0 ? 1 : Math.abs(min) * 0.1;
    return niceTicks(min - pad, max + pad, count);
  }
  const range = niceNumber(max - min, false);
  const step = niceNumber(range / Math.max(count - 1, 1), true);
  const decimals = Math.max(-Math.floor(Math.log10(step)), 0);
  // A value past a tick by float noise (3,000.0000001 nmi) does not add a tick:
  // within SNAP of a step it counts as on the tick.
  const first = Math.floor(min / step + SNAP);
  const last = Math.ceil(max / step - SNAP);
  const ticks: number[] = [];
  for (let k = first; k <= last; k++) ticks.push(Number((k * step).toFixed(decimals)));
  return { ticks, domain: [ticks[0]!, ticks[ticks.length - 1]!], decimals };
}

/** The least and greatest finite number of `keys` over `rows` ([Infinity, -Infinity] when there is none). */
export function numericExtent(rows: readonly object[], keys: readonly string[], extra: readonly number[] = []): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  const take = (v: unknown) => {
    if (typeof v === 'number' && Number.isFinite(v)) {
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
  };
  for (const row of rows) for (const k of keys) take((row as Record<string, unknown>)[k]);
  extra.forEach(take);
  return [lo, hi];
}
