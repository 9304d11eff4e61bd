import { describe, expect, it } from 'vitest';
import { milE5008bRecovery } from '../../../engine/propulsion/milE5008b';
import { expectClose } from '../../support/assertInDelta';
import { ref } from './installationReference';

describe('milE5008bRecovery', () => {
  it('milE5008bRecovery is 1 at and below Mach 1', () => {
    // MIL-E-5008B (1959), as quoted by Mattingly and Raymer: eta = 1 for M <= 1.
    for (const m of [0, 0.3, 0.85, 1]) expect(milE5008bRecovery(m)).toBe(1);
  });

  it('milE5008bRecovery at Mach 1.5, 2 and 3 matches the published formula', () => {
    // 1 - 0.075 (M - 1)^1.35 (MIL-E-5008B); values evaluated independently in
    // test/reference/installationReference.py. Hand check at M 2: 1 - 0.075 * 1 = 0.925.
    expectClose(milE5008bRecovery(2), 0.925, { abs: 1e-15 }, 'MIL-E-5008B at M 2, by hand');
    for (const row of ref.milE5008b) {
      expectClose(milE5008bRecovery(row.mach), row.recovery, { abs: 1e-14 }, `MIL-E-5008B at M ${row.mach}`);
    }
    // Rounded values as commonly tabulated (from memory): 0.971 at M 1.5, 0.809 at M 3.
    expectClose(milE5008bRecovery(1.5), 0.971, { abs: 5e-4 }, 'tabulated MIL-E-5008B (from memory)');
    expectClose(milE5008bRecovery(3), 0.809, { abs: 5e-4 }, 'tabulated MIL-E-5008B (from memory)');
  });

  it('milE5008bRecovery uses 800/(M^4 + 935) above Mach 5 and is continuous at Mach 5', () => {
    // MIL-E-5008B hypersonic branch.
    expectClose(milE5008bRecovery(6), 800 / (1296 + 935), { rel: 1e-15 }, 'MIL-E-5008B M > 5 branch');
    const below = milE5008bRecovery(5);
    const above = milE5008bRecovery(5 + 1e-9);
    // The two published branches meet within 3e-4 at M 5 (0.5126 vs 0.5128).
    expectClose(above, below, { abs: 3e-4 }, 'branch continuity at M 5');
  });

  it('milE5008bRecovery falls monotonically above Mach 1', () => {
    let last = 1;
    for (let m = 1.05; m < 8; m += 0.05) {
      const r = milE5008bRecovery(m);
      expect(r).toBeLessThan(last + 3e-4);
      last = r;
    }
  });

  it('milE5008bRecovery throws on a negative or non-finite Mach (a caller bug)', () => {
    expect(() => milE5008bRecovery(-0.1)).toThrow(/Mach/);
    expect(() => milE5008bRecovery(Number.NaN)).toThrow(/Mach/);
    expect(() => milE5008bRecovery(Number.POSITIVE_INFINITY)).toThrow(/Mach/);
  });
});
