import { describe, expect, it } from 'vitest';
import { sameNumber } from '../../../engine/core/sameNumber';

describe('sameNumber', () => {
  it('sameNumber agrees with Object.is (ECMAScript SameValue) on signed zeros, NaN, infinities, subnormals and neighbours', () => {
    // Reference: the language's own Object.is (ECMAScript 7.2.10 SameValue).
    const values = [0, -0, NaN, Infinity, -Infinity, 1, -1, 5e-324, -5e-324, Number.MAX_VALUE, 1 + Number.EPSILON, 0.1 + 0.2, 0.3, 12496.8, -12496.8];
    for (const a of values) for (const b of values) expect(sameNumber(a, b)).toBe(Object.is(a, b));
  });
});
