import { describe, expect, it } from 'vitest';
import { fieldDimension, fieldUnitLabel, formatField, parseField } from '../../../renderer/state/fieldUnits';
import { expectClose } from '../../support/assertInDelta';

// Unit factors, NIST SP 811 appendix B (exact): 1 ft = 0.3048 m; 1 lb = 0.45359237 kg;
// 1 kt = 1852/3600 m/s; 1 nmi = 1852 m; 1 ft2 = 0.09290304 m2; 1 deg = pi/180 rad.
const NIST = 'NIST SP 811 appendix B';

describe('formatField', () => {
  it('shows SI values in the display unit of the unit system', () => {
    expect(formatField(10668, 'altitude', 'customary')).toBe('35,000 ft');
    expect(formatField(10668, 'altitude', 'si')).toBe('10,668 m');
    expect(formatField(19000 * 0.45359237, 'mass', 'customary')).toBe('19,000 lb');
    expect(formatField(250 * 1852 / 3600, 'speed', 'customary')).toBe('250 kt');
    expect(formatField(450 * 0.09290304, 'area', 'customary')).toBe('450 ft2');
    expect(formatField((27 * Math.PI) / 180, 'angle', 'si')).toBe('27 deg');
    expect(formatField(0.015, 'percent', 'si')).toBe('1.5 %');
    // durations in minutes in both systems: 600 s = 10 min
    expect(formatField(600, 'duration', 'customary')).toBe('10 min');
    const d = parseField('45', 'duration', 'si');
    expect(d).toEqual({ ok: true, value: 2700 });
  });

  it('shows four significant digits but never rounds whole digits away', () => {
    // 1 hp (550 ft lbf/s) = 745.699 87 W, NIST SP 811 appendix B: 30 kW = 40.2307 hp
    expect(formatField(30000, 'power', 'customary')).toBe('40.23 hp');
    expect(formatField(30000, 'power', 'si')).toBe('30 kW');
    // 17,000 kg = 37,478.58 lb (NIST): whole digits kept beyond four significant ones
    expect(formatField(17000, 'mass', 'customary')).toBe('37,479 lb');
    // 0.3 ft2 = 0.02787091 m2 (NIST): four significant digits of a small value
    expect(formatField(0.3 * 0.09290304, 'area', 'si')).toBe('0.02787 m2');
    expect(formatField(-2.5, 'temperatureDelta', 'si')).toMatch(/^-2\.5 /);
    expect(formatField(0, 'mass', 'si')).toBe('0 kg');
  });

  it('shows dimensionless values exactly and non-finite values as empty', () => {
    expect(formatField(0.0172, 'dimensionless', 'si')).toBe('0.0172');
    expect(formatField(Number.NaN, 'mass', 'si')).toBe('');
  });
});

describe('parseField', () => {
  it('reads a bare number in the field unit and text with a unit as written', () => {
    const a = parseField('35000', 'altitude', 'customary');
    expect(a.ok && a.value).not.toBe(false);
    if (a.ok) expectClose(a.value, 35000 * 0.3048, { rel: 1e-12 }, NIST);
    const b = parseField('10668 m', 'altitude', 'customary');
    if (!b.ok) throw new Error(b.error);
    expect(b.value).toBe(10668);
    const c = parseField('12,500', 'mass', 'customary');
    if (!c.ok) throw new Error(c.error);
    expectClose(c.value, 12500 * 0.45359237, { rel: 1e-12 }, NIST);
    const d = parseField('250', 'speed', 'customary');
    if (!d.ok) throw new Error(d.error);
    expectClose(d.value, (250 * 1852) / 3600, { rel: 1e-12 }, NIST);
    const e = parseField('0.0165', 'dimensionless', 'customary');
    expect(e).toEqual({ ok: true, value: 0.0165 });
  });

  it('round-trips what formatField shows', () => {
    for (const [v, unit] of [
      [10058.4, 'altitude'],
      [16556.1, 'mass'],
      [174.9, 'speed'],
      [41.8, 'area'],
    ] as const) {
      for (const system of ['si', 'customary'] as const) {
        const back = parseField(formatField(v, unit, system), unit, system);
        if (!back.ok) throw new Error(back.error);
        // four significant digits shown: relative error at most half a unit in the fourth digit
        expectClose(back.value, v, { rel: 5e-4 }, 'display rounding');
      }
    }
  });

  it('says what is wrong: empty, not a number, unknown unit, wrong dimension', () => {
    const cases: [string, RegExp][] = [
      ['', /empty value/],
      ['abc', /does not start with a number/],
      ['12 furlongs', /unknown unit "furlongs"/],
      ['12 kg', /is a mass, expected a length/],
    ];
    for (const [text, message] of cases) {
      const r = parseField(text, 'altitude', 'si');
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error).toMatch(message);
    }
  });

  it('labels units per system and maps fields to dimensions', () => {
    expect(fieldUnitLabel('mass', 'si')).toBe('kg');
    expect(fieldUnitLabel('mass', 'customary')).toBe('lb');
    expect(fieldUnitLabel('dimensionless', 'si')).toBe('');
    expect(fieldUnitLabel('massFlow', 'customary')).toBe('lb/s');
    expect(fieldDimension('climbRate')).toBe('speed');
    expect(fieldDimension('fuelFlow')).toBe('massFlow');
  });
});
