/** Crossover curves -> rows of Mach with thrust available and drag per inlet design, and the marked Machs. */
import { displayUnit, toDisplay, type UnitSystem } from '../../engine/units';
import type { CrossoverResult } from '../../engine/analysis';
import type { CrossoverSet } from '../worker/engineProtocol';
import type { SeriesDef } from './polarSeries';
import { seriesKey } from './seriesKeys';

type Row = Record<string, number | null>;

export interface CrossoverMarker {
  readonly inletName: string;
  readonly what: 'low crossover' | 'high crossover' | 'thrust minimum';
  readonly mach: number;
  /** Thrust available at that Mach (force display units), linear between curve points; null off the curve. */
  readonly thrust: number | null;
  /** For a crossover outside the level-flight band: the limit it lies past, in words (e.g. "past buffet onset"); else null. */
  readonly beyond?: string | null;
}

/** A limit line of the crossover chart: stall, low-speed buffet onset (1 g) or VMO/MMO, per design. */
export interface CrossoverLimit {
  readonly inletName: string;
  readonly what: 'stall' | 'buffet onset' | 'VMO/MMO';
  readonly mach: number;
}

/**
 * Where a Mach lies against the result's limits: null inside them, else the
 * limit it is past ("below stall", "below buffet onset", "past MMO", ...).
 * With no band at all (the limits cross), every Mach is outside.
 */
export function beyondLimits(result: CrossoverResult, mach: number): string | null {
  const low = result.lowSpeedLimit;
  const high = result.highSpeedLimit;
  if (result.stallMach != null && mach < result.stallMach) return 'below stall';
  if (result.buffetOnsetMach != null && mach < result.buffetOnsetMach) return 'below buffet onset';
  if (result.speedLimitMach != null && mach > result.speedLimitMach) return high?.source === 'vmo' ? 'past VMO' : 'past VMO/MMO';
  if ((low === null || high === null) && (result.stallMach != null || result.buffetOnsetMach != null || result.speedLimitMach != null)) return 'outside the limits (no level-flight band)';
  return null;
}

/** y at x on a polyline with ascending xs (linear interpolation); null outside. */
export function interpolateAt(xs: readonly number[], ys: readonly number[], x: number): number | null {
  for (let i = 0; i + 1 < xs.length; i++) {
    const x0 = xs[i]!;
    const x1 = xs[i + 1]!;
    if (x >= x0 && x <= x1) return x1 === x0 ? ys[i]! : ys[i]! + ((ys[i + 1]! - ys[i]!) * (x - x0)) / (x1 - x0);
  }
  return null;
}

/**
 * Rows `{ mach, t0, d0, t1, d1 }` (force display units) on the union of the
 * designs' Mach grids (each design's columns null off its own grid), the
 * series, and the low/high crossover and thrust-minimum Machs per design.
 */
export function crossoverSeries(set: CrossoverSet, units: UnitSystem): { rows: Row[]; series: SeriesDef[]; markers: CrossoverMarker[]; limits: CrossoverLimit[]; unit: string } {
  const byMach = new Map<number, Row>();
  set.curves.forEach(({ result }, i) => {
    const c = result.curves;
    c.mach.forEach((m, j) => {
      const row = byMach.get(m) ?? { mach: m };
      row[seriesKey('t', i)] = toDisplay(c.thrustAvailable_N[j]!, 'force', units);
      row[seriesKey('d', i)] = toDisplay(c.drag_N[j]!, 'force', units);
      byMach.set(m, row);
    });
  });
  const rows = [...byMach.values()].sort((a, b) => (a.mach as number) - (b.mach as number));
  for (const row of rows) {
    set.curves.forEach((_, i) => {
      if (!(seriesKey('t', i) in row)) row[seriesKey('t', i)] = null;
      if (!(seriesKey('d', i) in row)) row[seriesKey('d', i)] = null;
    });
  }
  const series = set.curves.flatMap(({ inletName }, i) => [
    { key: seriesKey('t', i), name: `thrust available, ${inletName}`, colorIndex: 2 * i },
    { key: seriesKey('d', i), name: `drag, ${inletName}`, colorIndex: 2 * i + 1 },
  ]);
  const markers: CrossoverMarker[] = [];
  for (const { inletName, result } of set.curves) {
    const at = (mach: number) => {
      const t = interpolateAt(result.curves.mach, result.curves.thrustAvailable_N, mach);
      return t === null ? null : toDisplay(t, 'force', units);
    };
    if (result.lowMach !== null) markers.push({ inletName, what: 'low crossover', mach: result.lowMach, thrust: at(result.lowMach), beyond: beyondLimits(result, result.lowMach) });
    if (result.highMach !== null) markers.push({ inletName, what: 'high crossover', mach: result.highMach, thrust: at(result.highMach), beyond: beyondLimits(result, result.highMach) });
    if (result.minThrustMach !== null) markers.push({ inletName, what: 'thrust minimum', mach: result.minThrustMach, thrust: at(result.minThrustMach) });
  }
  const limits: CrossoverLimit[] = [];
  for (const { inletName, result } of set.curves) {
    if (result.stallMach != null) limits.push({ inletName, what: 'stall', mach: result.stallMach });
    if (result.buffetOnsetMach != null) limits.push({ inletName, what: 'buffet onset', mach: result.buffetOnsetMach });
    if (result.speedLimitMach != null) limits.push({ inletName, what: 'VMO/MMO', mach: result.speedLimitMach });
  }
  return { rows, series, markers, limits, unit: displayUnit('force', units) };
}
