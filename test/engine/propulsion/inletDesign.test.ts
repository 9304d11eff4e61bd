import { describe, expect, it } from 'vitest';
import {
  inletCaptureArea,
  inletDragIncrementCd0,
  inletWeight,
  validateInletDesign,
  type InletDesign,
} from '../../../engine/propulsion/inletDesign';
import { expectClose } from '../../support/assertInDelta';
import { LONG_PITOT, SHORT_INLET, TABLE_INLET } from './inletDesigns';

function paths(design: InletDesign): string[] {
  return validateInletDesign(design).map((i) => i.path);
}

describe('validateInletDesign', () => {
  it('validateInletDesign accepts the invented designs', () => {
    expect(validateInletDesign(LONG_PITOT)).toEqual([]);
    expect(validateInletDesign(SHORT_INLET)).toEqual([]);
    expect(validateInletDesign(TABLE_INLET)).toEqual([]);
  });

  it('validateInletDesign names the field path of a bad recovery table entry', () => {
    const bad: InletDesign = {
      ...TABLE_INLET,
      source: { kind: 'recoveryTable', mach: [0, 0.5, 0.5], recovery: [0.99, 1.2, Number.NaN], captureArea_m2: 2 },
    };
    const issues = validateInletDesign(bad);
    expect(issues.map((i) => i.path)).toEqual(['source.mach[2]', 'source.recovery[1]', 'source.recovery[2]']);
    expect(issues[1]!.message).toContain('1.2');
    expect(issues[2]!.message).toContain('NaN');
  });

  it('validateInletDesign refuses mismatched table lengths and empty names', () => {
    const bad: InletDesign = {
      ...TABLE_INLET,
      name: ' ',
      source: { kind: 'recoveryTable', mach: [0, 0.5], recovery: [0.99], captureArea_m2: 2 },
    };
    expect(paths(bad)).toEqual(['name', 'source.recovery']);
  });

  it('validateInletDesign refuses impossible geometry with paths', () => {
    const bad: InletDesign = {
      ...LONG_PITOT,
      lipSuctionFactor: 1.5,
      weight_kg: -1,
      source: { kind: 'geometry', captureArea_m2: 1, throatArea_m2: 1.2, fanFaceArea_m2: 1.1, diffuserLossCoefficient: 1.5 },
    };
    expect(paths(bad)).toEqual([
      'lipSuctionFactor',
      'weight_kg',
      'source.diffuserLossCoefficient',
      'source.throatArea_m2',
      'source.throatArea_m2',
    ]);
  });

  it('validateInletDesign refuses a non-finite area', () => {
    const bad: InletDesign = {
      ...SHORT_INLET,
      source: { ...SHORT_INLET.source, kind: 'geometry', captureArea_m2: Number.POSITIVE_INFINITY, throatArea_m2: 1.9, fanFaceArea_m2: 2.6, diffuserLossCoefficient: 0.2 },
    };
    expect(paths(bad)).toContain('source.captureArea_m2');
  });
});

describe('inlet airframe increments', () => {
  it('inletDragIncrementCd0 is D/q x engines / wing area', () => {
    // Definition of a drag area: D = q (D/q), so dCD0 = n (D/q) / S (common practice).
    // 2 engines x 0.14 m^2 / 35 m^2 = 0.008 (80 drag counts), by hand.
    expectClose(inletDragIncrementCd0(LONG_PITOT, 2, 35), 0.008, { abs: 1e-15 }, 'by hand');
    expect(() => inletDragIncrementCd0(LONG_PITOT, 2, 0)).toThrow(/wing area/);
  });

  it('inletWeight is per-engine weight times engine count', () => {
    expect(inletWeight(SHORT_INLET, 2)).toBe(160);
    expect(inletCaptureArea(TABLE_INLET)).toBe(0.55);
  });
});
