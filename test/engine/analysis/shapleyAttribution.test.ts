import { describe, expect, it } from 'vitest';
import { shapleyValues } from '../../../engine/analysis/shapleyAttribution';
import { expectClose } from '../../support/assertInDelta';

// v(a, b, c, d) = 100 + 3a + 5b - 2c + 7d + 4ab - 6bcd + 2.5acd, a..d in {0, 1}
function v(mask: number): number {
  const [a, b, c, d] = [0, 1, 2, 3].map((i) => (mask >> i) & 1) as [number, number, number, number];
  return 100 + 3 * a + 5 * b - 2 * c + 7 * d + 4 * a * b - 6 * b * c * d + 2.5 * a * c * d;
}

describe('shapleyValues', () => {
  it('shapleyValues matches brute force over all 24 orderings for a non-additive function', () => {
    const r = shapleyValues(4, v);
    // test/reference/analysisReference.py (itertools.permutations, average of sequential substitution)
    const reference = [5.833333333333, 5.0, -3.166666666667, 5.833333333333];
    r.shares.forEach((s, i) => expectClose(s, reference[i]!, { abs: 1e-11 }, 'python brute-force Shapley'));
    expectClose(r.shares.reduce((s, x) => s + x, 0), v(15) - v(0), { abs: 1e-12 }, 'efficiency: shares add up (Shapley 1953)');
  });

  it('shapleyValues gives each factor its own effect when the factors do not interact', () => {
    const additive = (mask: number) => 10 + ((mask & 1) ? 2 : 0) + ((mask & 2) ? -7 : 0) + ((mask & 4) ? 0.5 : 0);
    const r = shapleyValues(3, additive);
    [2, -7, 0.5].forEach((x, i) => expectClose(r.shares[i]!, x, { abs: 1e-12 }, "additive: share = own effect"));
    expect(r.values).toHaveLength(8);
  });

  it('shapleyValues throws for a factor count that is a programming error', () => {
    expect(() => shapleyValues(0, v)).toThrow(/factor count 0/);
  });
});
