import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { prepareInlet, tableRecovery } from '../../../engine/propulsion/inletRecovery';
import { expectClose } from '../../support/assertInDelta';
import { LONG_PITOT, TABLE_INLET } from './inletDesigns';

describe('tableRecovery', () => {
  const table = expectOk(prepareInlet(TABLE_INLET), 'table inlet').table!;

  it('tableRecovery interpolates linearly between the tabulated Machs', () => {
    // Linear interpolation by hand: halfway from M 0.5 (0.985) to 0.9 (0.97) is 0.9775 at M 0.7.
    const r = tableRecovery(table, 0.7);
    expectClose(r.recovery, 0.9775, { abs: 1e-12 }, 'by hand');
    expect(r.outside).toBeNull();
    expect(tableRecovery(table, 0.9).recovery).toBe(0.97);
  });

  it('tableRecovery holds the end value above the table and says so', () => {
    const r = tableRecovery(table, 1.2);
    expect(r.recovery).toBe(0.97);
    expect(r.outside).toBe('above');
  });

  it('prepareInlet builds no table for a geometry inlet and refuses a bad design with paths', () => {
    expect(expectOk(prepareInlet(LONG_PITOT), 'geometry').table).toBeNull();
    const bad = prepareInlet({ ...TABLE_INLET, lipSuctionFactor: -0.1 });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.error[0]!.path).toBe('lipSuctionFactor');
  });

  it('tableRecovery throws on a NaN Mach (a caller bug)', () => {
    expect(() => tableRecovery(table, Number.NaN)).toThrow(/NaN/);
  });
});
