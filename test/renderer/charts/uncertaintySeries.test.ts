/** Chart adapters of the uncertainty views: histogram counts and sides, band rows in display units (lb = 0.45359237 kg, NIST SP 811). */
import { describe, expect, it } from 'vitest';
import { bandRows, histogram } from '../../../renderer/charts/uncertaintySeries';
import type { UncertaintyResult } from '../../../engine/uncertainty/uncertaintyRun';
import { expectClose } from '../../support/assertInDelta';

describe('histogram', () => {
  it('counts every value once and says which side of zero each bin is', () => {
    const bins = histogram([-30, -10, -5, 0, 5, 12, 30], 4);
    expect(bins.map((b) => b.count)).toEqual([1, 2, 3, 1]); // edges -30, -15, 0, 15, 30; 0 opens the third bin
    expect(bins.reduce((s, b) => s + b.count, 0)).toBe(7);
    expect(bins.map((b) => b.side)).toEqual(['below', 'across', 'across', 'above']);
    expect(bins[0]!.lo).toBe(-30);
    expect(bins[3]!.hi).toBe(30);
  });
  it('puts equal values in one bin', () => {
    expect(histogram([4, 4, 4], 10)).toEqual([{ lo: 4, hi: 4, label: '4.0', count: 3, side: 'above' }]);
  });
});

describe('bandRows', () => {
  const s = (m: number) => ({ count: 3, mean: m, sd: 1, meanStandardError: 0.5, min: m - 2, p05: m - 1.5, p50: m, p95: m + 1.5, max: m + 2 });
  const r = {
    designs: [{ name: 'a', blockFuel_kg: s(100) }, { name: 'b', blockFuel_kg: s(90) }],
    difference_kg: s(-10),
    deterministic: { blockFuel_kg: [100, 91], difference_kg: -9 },
  } as unknown as UncertaintyResult;
  it('gives A, B and B - A with the deterministic answer, in pounds when asked', () => {
    const rows = bandRows(r, 'customary');
    expect(rows.map((x) => x.name)).toEqual(['A: a', 'B: b', 'B - A']);
    expectClose(rows[2]!.p05, -11.5 / 0.45359237, { rel: 1e-12 }, 'kg to lb');
    expectClose(rows[2]!.range, 3 / 0.45359237, { rel: 1e-12 }, 'P5..P95 width');
    expectClose(rows[1]!.deterministic, 91 / 0.45359237, { rel: 1e-12 }, 'deterministic');
  });
});
