import { describe, expect, it } from 'vitest';
import { niceTicks, numericExtent } from '../../../renderer/charts/niceTicks';
import { expectClose } from '../../support/assertInDelta';

// Expected ticks: Heckbert's loose labelling ("Nice numbers for graph labels",
// Graphics Gems, 1990) as implemented independently with numpy in
// test/reference/niceTicksReference.py (its printed output pasted here).
const HECKBERT = 'Heckbert 1990 via test/reference/niceTicksReference.py';
const REFERENCE: readonly [number, number, number, readonly number[], number][] = [
  [0.3752, 0.5248502732003647, 5, [0.35, 0.4, 0.45, 0.5, 0.55], 2],
  [0.05, 0.95, 5, [0, 0.2, 0.4, 0.6, 0.8, 1], 1],
  [0.9752, 0.9951, 5, [0.975, 0.98, 0.985, 0.99, 0.995, 1], 3],
  [1050.3, 5250.7, 5, [1000, 2000, 3000, 4000, 5000, 6000], 0],
  [-123.4, 56.7, 5, [-150, -100, -50, 0, 50, 100], 0],
  [0, 3200, 6, [0, 1000, 2000, 3000, 4000], 0],
];

describe('niceTicks', () => {
  it('niceTicks(min, max, count) gives the loose labels of Heckbert 1990', () => {
    for (const [lo, hi, n, ticks, decimals] of REFERENCE) {
      const axis = niceTicks(lo, hi, n);
      expect(axis, `${lo}..${hi}`).not.toBeNull();
      expect(axis!.ticks.length, `${lo}..${hi} (${HECKBERT})`).toBe(ticks.length);
      axis!.ticks.forEach((t, i) => expectClose(t, ticks[i]!, { abs: 1e-12 }, HECKBERT));
      expect(axis!.decimals).toBe(decimals);
      expect(axis!.domain).toEqual([axis!.ticks[0], axis!.ticks[axis!.ticks.length - 1]]);
    }
  });

  it('niceTicks leaves no float noise in a tick (its text has at most the step decimals)', () => {
    for (const [lo, hi] of [
      [0.3752, 0.8183],
      [0.1, 0.7],
      [0.9752, 0.9951],
    ] as const) {
      const axis = niceTicks(lo, hi)!;
      for (const t of axis.ticks) expect(String(t)).toMatch(new RegExp(`^-?\\d+(\\.\\d{1,${axis.decimals}})?$`));
      expect(axis.ticks[0]!).toBeLessThanOrEqual(lo);
      expect(axis.ticks[axis.ticks.length - 1]!).toBeGreaterThanOrEqual(hi);
    }
  });

  it('niceTicks adds no tick for float noise past the last or before the first tick', () => {
    // 3,000 nmi flown, summed to 3,000.0000001: the axis still ends at 3,000 (Heckbert: 0..3000 by 1000)
    expect(niceTicks(0, 3000.0000001)!.ticks).toEqual([0, 1000, 2000, 3000]);
    expect(niceTicks(-0.0000001, 3000)!.ticks).toEqual([0, 1000, 2000, 3000]);
    // a real overshoot still gets its tick
    expect(niceTicks(0, 3001)!.ticks).toEqual([0, 1000, 2000, 3000, 4000]);
  });

  it('niceTicks widens a single value and refuses non-finite or reversed ranges', () => {
    const one = niceTicks(0.78, 0.78)!;
    expect(one.ticks[0]!).toBeLessThan(0.78);
    expect(one.ticks[one.ticks.length - 1]!).toBeGreaterThan(0.78);
    const zero = niceTicks(0, 0)!;
    expect(zero.domain).toEqual([-1, 1]);
    expect(niceTicks(Number.NaN, 1)).toBeNull();
    expect(niceTicks(0, Infinity)).toBeNull();
    expect(niceTicks(2, 1)).toBeNull();
  });
});

describe('numericExtent', () => {
  it('numericExtent skips nulls, NaN and missing keys and adds extra values', () => {
    const rows = [{ m: 0.4, a: 1 }, { m: null, a: Number.NaN }, { m: 0.8 }];
    expect(numericExtent(rows, ['m'])).toEqual([0.4, 0.8]);
    expect(numericExtent(rows, ['a', 'm'], [0.2])).toEqual([0.2, 1]);
    expect(numericExtent([], ['m'])).toEqual([Infinity, -Infinity]);
  });
});
