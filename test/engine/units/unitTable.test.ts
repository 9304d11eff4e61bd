import { describe, expect, it } from 'vitest';
import {
  FOOT_M,
  HORSEPOWER_W,
  INCH_HG_PA,
  KNOT_M_S,
  lookupUnit,
  NAUTICAL_MILE_M,
  normalizeUnit,
  POUND_FORCE_N,
  POUND_KG,
  UNIT_TABLE,
  unitsOf,
} from '../../../engine/units/unitTable';
import { expectClose } from '../../support/assertInDelta';

describe('unit table factors', () => {
  it('are the exact NIST SP 811 definitions', () => {
    // NIST Special Publication 811 (2008), Appendix B.8.
    expect(FOOT_M).toBe(0.3048);
    expect(NAUTICAL_MILE_M).toBe(1852);
    expect(POUND_KG).toBe(0.45359237);
    expectClose(POUND_FORCE_N, 4.4482216152605, { abs: 1e-13 }, 'NIST SP 811: lbf = 4.448 221 615 260 5 N');
    expectClose(KNOT_M_S, 0.5144444444444445, { rel: 1e-15 }, 'NIST SP 811: kt = 1852/3600 m/s');
    expect(INCH_HG_PA).toBe(3386.389);
    expectClose(HORSEPOWER_W, 745.6999, { abs: 5e-5 }, 'NIST SP 811: hp (550 ft lbf/s) = 745.6999 W');
    // NIST SP 811: psi = 6.894 757 kPa; psf = 47.880 26 Pa.
    expectClose(UNIT_TABLE['psi']!.scale, 6894.757, { abs: 5e-4 }, 'NIST SP 811');
    expectClose(UNIT_TABLE['psf']!.scale, 47.88026, { abs: 5e-6 }, 'NIST SP 811');
  });
  it('make 1 lb/(lbf h) equal 1/h and 28.33 mg/(N s)', () => {
    // Fuel weight flow per unit thrust: lb/(lbf h) is numerically per hour (common practice);
    // 1 lb/(lbf h) = 28.3255 mg/(N s) (common practice, from memory).
    expectClose(UNIT_TABLE['lb/(lbf h)']!.scale, UNIT_TABLE['1/h']!.scale, { rel: 1e-15 });
    expectClose(UNIT_TABLE['lb/(lbf h)']!.scale / 1e-6, 28.3255, { abs: 5e-4 }, 'common practice');
  });
  it('gives every unit a finite positive scale', () => {
    for (const [name, def] of Object.entries(UNIT_TABLE)) {
      expect(Number.isFinite(def.scale) && def.scale > 0, name).toBe(true);
      expect(Number.isFinite(def.offset), name).toBe(true);
    }
  });
});

describe('normalizeUnit and lookupUnit', () => {
  it('reads "lb / (lbf·h)" as "lb/(lbf h)"', () => {
    expect(normalizeUnit('  lb / (lbf·h) ')).toBe('lb/(lbf h)');
    expect(normalizeUnit('kg/(N*s)')).toBe('kg/(N s)');
    expect(lookupUnit('ft ^ 2')).toBe(UNIT_TABLE['ft^2']);
  });
  it('is case-sensitive and does not find inherited keys', () => {
    expect(lookupUnit('FT')).toBeUndefined();
    expect(lookupUnit('toString')).toBeUndefined();
    expect(lookupUnit('constructor')).toBeUndefined();
  });
  it('lists the units of a dimension', () => {
    expect(unitsOf('speed')).toEqual(expect.arrayContaining(['kt', 'm/s', 'km/h', 'mph', 'ft/min']));
    expect(unitsOf('tsfc')).toContain('mg/(N s)');
  });
});

describe('docs/units.md', () => {
  it('lists every accepted unit spelling', async () => {
    const { readFileSync } = await import('node:fs');
    const doc = readFileSync(new URL('../../../docs/units.md', import.meta.url), 'utf8');
    for (const unit of Object.keys(UNIT_TABLE)) expect(doc, unit).toContain(`\`${unit}\``);
  });
});
