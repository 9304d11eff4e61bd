import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fromSi, fromSiDelta, parseQuantity, siUnit, toSi, type Dimension } from '../../../engine/units/quantity';
import { expectClose } from '../../support/assertInDelta';

function si(text: string | number, expected: Dimension): number {
  const r = parseQuantity(text, expected);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

// Conversion factors: NIST SP 811 (2008) Appendix B.8, exact definitions unless noted.
describe('parseQuantity reads the examples of the brief', () => {
  const cases: readonly [string, Dimension, number, string][] = [
    ['35000 ft', 'length', 10668, 'ft = 0.3048 m'],
    ['10.67 km', 'length', 10670, 'km = 1000 m'],
    ['250 kt', 'speed', (250 * 1852) / 3600, 'kt = 1852/3600 m/s'],
    ['480 km/h', 'speed', 480 / 3.6, 'km/h = 1/3.6 m/s'],
    ['2000 nmi', 'length', 3704000, 'nmi = 1852 m'],
    ['45000 lb', 'mass', 45000 * 0.45359237, 'lb = 0.45359237 kg'],
    ['120 kN', 'force', 120000, 'kN = 1000 N'],
    ['26000 lbf', 'force', 26000 * 4.4482216152605, 'lbf = 4.4482216152605 N'],
    ['2400 lb/h', 'massFlow', (2400 * 0.45359237) / 3600, 'lb/h'],
    ['0.6 kg/s', 'massFlow', 0.6, 'SI'],
    ['+15 K', 'temperatureDelta', 15, 'K'],
    ['-40 degC', 'temperature', 233.15, 'degC = K - 273.15'],
    ['101.3 kPa', 'pressure', 101300, 'kPa'],
    ['29.92 inHg', 'pressure', 29.92 * 3386.389, 'inHg = 3386.389 Pa (0 degC)'],
    ['1000 m', 'length', 1000, 'SI'],
    ['3000 ft/min', 'speed', 15.24, 'ft/min = 0.00508 m/s'],
    ['120 m/s', 'speed', 120, 'SI'],
    ['100 mph', 'speed', 44.704, 'mph = 0.44704 m/s'],
    ['20000 kg', 'mass', 20000, 'SI'],
    ['12 t', 'mass', 12000, 't = 1000 kg'],
    ['5000 N', 'force', 5000, 'SI'],
    ['1013.25 hPa', 'pressure', 101325, 'hPa = 100 Pa'],
    ['500 Pa', 'pressure', 500, 'SI'],
    ['14.7 psi', 'pressure', 14.7 * 6894.757293168361, 'psi = 6894.757 Pa'],
    ['90 s', 'time', 90, 'SI'],
    ['45 min', 'time', 2700, 'min = 60 s'],
    ['1.5 h', 'time', 5400, 'h = 3600 s'],
    ['120 m2', 'area', 120, 'SI'],
    ['1000 ft2', 'area', 92.90304, 'ft2 = 0.09290304 m2'],
    ['100 in2', 'area', 0.064516, 'in2 = 6.4516e-4 m2'],
    ['150 kW', 'power', 150000, 'kW'],
    ['200 hp', 'power', 200 * 745.6998715822702, 'hp = 550 ft lbf/s'],
    ['750 W', 'power', 750, 'SI'],
    ['180 deg', 'angle', Math.PI, 'deg = pi/180 rad'],
    ['0.1 rad', 'angle', 0.1, 'SI'],
    ['0.6 1/h', 'tsfc', 0.6 / (9.80665 * 3600), '1/h = weight flow per thrust per hour'],
    ['0.6 lb/(lbf h)', 'tsfc', (0.6 * 0.45359237) / (4.4482216152605 * 3600), 'lb/(lbf h)'],
    ['1.7e-5 kg/(N s)', 'tsfc', 1.7e-5, 'SI'],
    ['17 mg/(N s)', 'tsfc', 1.7e-5, 'mg = 1e-6 kg'],
    ['17 g/(kN s)', 'tsfc', 1.7e-5, 'g/kN = 1e-6 kg/N'],
    ['1004.5 J/(kg K)', 'specificHeat', 1004.5, 'SI'],
    ['1.1 kJ/(kg K)', 'specificHeat', 1100, 'kJ = 1000 J'],
    ['0.24 Btu/(lb degR)', 'specificHeat', 0.24 * 4186.8, 'Btu(IT)/(lb degR) = 4186.8 J/(kg K) exactly (NIST SP 811)'],
    ['42.8 MJ/kg', 'specificEnergy', 42.8e6, 'MJ = 1e6 J'],
    ['18400 Btu/lb', 'specificEnergy', 18400 * 2326, 'Btu(IT)/lb = 2326 J/kg exactly (NIST SP 811)'],
    ['0.78', 'dimensionless', 0.78, 'bare number'],
    ['0.5 -', 'dimensionless', 0.5, '"-" is unity'],
    ['2 %', 'dimensionless', 0.02, 'percent'],
  ];
  for (const [text, dim, expected, source] of cases) {
    it(`parseQuantity(${JSON.stringify(text)}, '${dim}') = ${expected}`, () => {
      expectClose(si(text, dim), expected, { rel: 1e-14, abs: 1e-18 }, `NIST SP 811: ${source}`);
    });
  }
});

describe('parseQuantity conventions', () => {
  it('reads bare numbers and unitless numeric strings as SI', () => {
    expect(si(123.5, 'length')).toBe(123.5);
    expect(si('123.5', 'speed')).toBe(123.5);
    expect(si('-40', 'temperatureDelta')).toBe(-40);
    expect(si('1e3', 'mass')).toBe(1000);
  });
  it('reads temperature units as differences when a temperatureDelta is expected', () => {
    // A difference of 1 degC is 1 K and of 1 degF is 5/9 K (NIST SP 811, B.9).
    expect(si('-40 degC', 'temperatureDelta')).toBe(-40);
    expectClose(si('18 degF', 'temperatureDelta'), 10, { rel: 1e-14 }, 'NIST SP 811 B.9');
    expectClose(si('59 degF', 'temperature'), 288.15, { rel: 1e-14 }, 'NIST SP 811 B.9: 59 degF = 15 degC');
    expectClose(si('-40 degF', 'temperature'), 233.15, { rel: 1e-14 }, '-40 degF = -40 degC');
  });
  it('tolerates whitespace, no space before the unit and thousands separators', () => {
    expect(si('  35000ft ', 'length')).toBe(10668);
    expect(si('35,000 ft', 'length')).toBe(10668);
    expect(si('-15K', 'temperatureDelta')).toBe(-15);
    expectClose(si('0.6 lb / (lbf·h)', 'tsfc'), si('0.6 lb/(lbf h)', 'tsfc'), { rel: 1e-15 });
    expect(si('.5 km', 'length')).toBe(500);
  });
  it('reads a typographic minus sign', () => {
    expect(si('\u221240 degC', 'temperature')).toBeCloseTo(233.15, 12);
  });
  it('returns not_a_number for input that is neither text nor a number (e.g. JSON null)', () => {
    const r = parseQuantity(null as unknown as string, 'mass');
    expect(r.ok ? 'ok' : r.error.code).toBe('not_a_number');
    if (!r.ok) expect(r.error.message).toContain('a mass');
  });
  it('is case-sensitive and suggests the right case', () => {
    const r = parseQuantity('35000 FT', 'length');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('unknown_unit');
      expect(r.error.message).toContain('did you mean "ft"');
    }
  });
});

describe('parseQuantity errors name the text and the expected dimension', () => {
  const bad: readonly [string, Dimension, string, readonly string[]][] = [
    ['250 kg', 'speed', 'wrong_dimension', ['"250 kg" is a mass, expected a speed (e.g. "250 kt", "128 m/s")']],
    ['', 'length', 'empty', ['empty value', 'a length']],
    ['   ', 'mass', 'empty', ['a mass']],
    ['abc', 'length', 'not_a_number', ['"abc"', 'a length']],
    ['35000 furlongs', 'length', 'unknown_unit', ['"35000 furlongs"', 'unknown unit "furlongs"', 'a length']],
    ['1e999 ft', 'length', 'not_finite', ['"1e999 ft"', 'a length']],
    ['1,00 ft', 'length', 'unknown_unit', ['"1,00 ft"']],
    ['+15 K', 'pressure', 'wrong_dimension', ['is a temperature', 'expected a pressure']],
    ['10 degC', 'length', 'wrong_dimension', ['a temperature']],
  ];
  for (const [text, dim, code, parts] of bad) {
    it(`parseQuantity(${JSON.stringify(text)}, '${dim}') fails with ${code}`, () => {
      const r = parseQuantity(text, dim);
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.error.code).toBe(code);
        expect(r.error.expected).toBe(dim);
        expect(r.error.text).toBe(text);
        for (const p of parts) expect(r.error.message).toContain(p);
      }
    });
  }
  it('refuses non-finite numbers', () => {
    for (const v of [Number.NaN, Infinity, -Infinity]) {
      const r = parseQuantity(v, 'length');
      expect(r.ok ? 'ok' : r.error.code).toBe('not_finite');
    }
  });
  it('never throws and always returns a value or an error with a message (property)', () => {
    const dims: Dimension[] = ['length', 'speed', 'mass', 'force', 'massFlow', 'temperature', 'temperatureDelta', 'pressure', 'time', 'area', 'power', 'angle', 'tsfc', 'dimensionless'];
    const unitish = fc.constantFrom('ft', 'kt', 'degC', 'lb/(lbf h)', '%', 'FT', '', ' ', '/', '(', 'e', ',', '1/h');
    const text = fc.oneof(
      fc.string(),
      fc.tuple(fc.double(), unitish).map(([v, u]) => `${v} ${u}`),
      fc.tuple(fc.string({ unit: fc.constantFrom('1', '0', '.', ',', '-', '+', 'e', 'E', ' ') }), unitish).map(([v, u]) => v + u),
    );
    fc.assert(
      fc.property(fc.oneof(text, fc.double()), fc.constantFrom(...dims), (input, dim) => {
        const r = parseQuantity(input, dim);
        if (r.ok) return Number.isFinite(r.value);
        return typeof r.error.message === 'string' && r.error.message.length > 0 && r.error.expected === dim;
      }),
      { numRuns: 2000 },
    );
  });
});

describe('toSi and fromSi', () => {
  it('convert a value and name its dimension', () => {
    const r = toSi(35000, 'ft');
    expect(r.ok && r.value).toEqual({ value_si: 10668, dimension: 'length' });
    const c = toSi(15, 'degC');
    expect(c.ok && c.value.dimension).toBe('temperature');
    expectClose(c.ok ? c.value.value_si : Number.NaN, 288.15, { rel: 1e-15 });
  });
  it('returns unknown_unit from toSi for an unknown unit and throws from fromSi (a caller bug)', () => {
    const r = toSi(1, 'parsec');
    expect(r.ok ? 'ok' : r.error.code).toBe('unknown_unit');
    expect(() => fromSi(1, 'parsec')).toThrow(/parsec/);
  });
  it('round-trips every unit in the table', () => {
    for (const unit of ['ft', 'nmi', 'kt', 'ft/min', 'lb', 'lbf', 'lb/h', 'degC', 'degF', 'inHg', 'hPa', 'psi', 'h', 'ft2', 'hp', 'deg', 'lb/(lbf h)', 'mg/(N s)', '%']) {
      for (const v of [-12.5, 0, 1, 35000]) {
        const r = toSi(v, unit);
        if (!r.ok) throw new Error(r.error.message);
        expectClose(fromSi(r.value.value_si, unit), v, { abs: 1e-9, rel: 1e-12 }, `round trip ${v} ${unit}`);
      }
    }
  });
  it('converts temperature differences without the offset', () => {
    expectClose(fromSiDelta(10, 'degF'), 18, { rel: 1e-14 }, 'NIST SP 811 B.9');
    expect(fromSiDelta(10, 'degC')).toBe(10);
  });
  it('names the SI unit a bare number is read in', () => {
    expect(siUnit('speed')).toBe('m/s');
    expect(siUnit('tsfc')).toBe('kg/(N s)');
  });
});
