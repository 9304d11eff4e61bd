import { describe, expect, it } from 'vitest';
import { displayUnit, formatQuantity, groupDigits, toDisplay, type DisplayKind } from '../../../engine/units/displayUnits';
import { parseQuantity } from '../../../engine/units/quantity';
import { expectClose } from '../../support/assertInDelta';

const KINDS: readonly DisplayKind[] = [
  'altitude', 'distance', 'speed', 'climbRate', 'mass', 'force', 'fuelFlow',
  'temperature', 'temperatureDelta', 'pressure', 'time', 'area', 'power', 'tsfc', 'specificRange',
];

const DIMENSION_OF: Readonly<Record<DisplayKind, Parameters<typeof parseQuantity>[1]>> = {
  altitude: 'length', distance: 'length', speed: 'speed', climbRate: 'speed', mass: 'mass', force: 'force',
  fuelFlow: 'massFlow', temperature: 'temperature', temperatureDelta: 'temperatureDelta', pressure: 'pressure',
  time: 'time', area: 'area', power: 'power', tsfc: 'tsfc', specificRange: 'specificRange',
};

describe('displayUnit', () => {
  it('gives the customary and SI display units documented in docs/units.md', () => {
    expect(displayUnit('altitude', 'customary')).toBe('ft');
    expect(displayUnit('distance', 'customary')).toBe('nmi');
    expect(displayUnit('speed', 'customary')).toBe('kt');
    expect(displayUnit('climbRate', 'customary')).toBe('ft/min');
    expect(displayUnit('fuelFlow', 'customary')).toBe('lb/h');
    expect(displayUnit('tsfc', 'customary')).toBe('lb/(lbf h)');
    expect(displayUnit('altitude', 'si')).toBe('m');
    expect(displayUnit('distance', 'si')).toBe('km');
    expect(displayUnit('force', 'si')).toBe('kN');
    expect(displayUnit('tsfc', 'si')).toBe('mg/(N s)');
    expect(displayUnit('specificRange', 'customary')).toBe('nmi/(1000 lb)');
    expect(displayUnit('specificRange', 'si')).toBe('km/kg');
  });

  it('converts specific range with the NIST SP 811 nautical mile and pound', () => {
    // 1 nmi per 1000 lb = 1852 m / 453.59237 kg (NIST SP 811, B.8, exact factors).
    expectClose(toDisplay(1852 / 453.59237, 'specificRange', 'customary'), 1, { rel: 1e-12 }, 'NIST SP 811 nmi, lb');
    expectClose(toDisplay(1000, 'specificRange', 'si'), 1, { rel: 1e-12 }, '1 km/kg = 1000 m/kg');
  });
});

describe('toDisplay', () => {
  it('round-trips through parseQuantity with the display unit for every kind and system', () => {
    for (const kind of KINDS) {
      for (const system of ['si', 'customary'] as const) {
        const value_si = kind === 'temperature' ? 250 : 1234.5;
        const shown = toDisplay(value_si, kind, system);
        const back = parseQuantity(`${shown} ${displayUnit(kind, system)}`, DIMENSION_OF[kind]);
        if (!back.ok) throw new Error(back.error.message);
        expectClose(back.value, value_si, { rel: 1e-12 }, `${kind} ${system}`);
      }
    }
  });
  it('shows 10,668 m as 35,000 ft and 128.61 m/s as 250 kt', () => {
    // NIST SP 811: ft = 0.3048 m, kt = 1852/3600 m/s.
    expectClose(toDisplay(10668, 'altitude', 'customary'), 35000, { rel: 1e-15 });
    expectClose(toDisplay((250 * 1852) / 3600, 'speed', 'customary'), 250, { rel: 1e-15 });
    expectClose(toDisplay(233.15, 'temperature', 'customary'), -40, { abs: 1e-12 });
    expectClose(toDisplay(15, 'temperatureDelta', 'customary'), 15, { abs: 1e-12 });
  });
});

describe('formatQuantity', () => {
  it('formats 10,668 m as "35,000 ft" and "10,668 m"', () => {
    expect(formatQuantity(10668, 'altitude', 'customary')).toBe('35,000 ft');
    expect(formatQuantity(10668, 'altitude', 'si')).toBe('10,668 m');
  });
  it('honours digits and keeps a minus sign only for non-zero results', () => {
    expect(formatQuantity(1234567.891, 'mass', 'si', 2)).toBe('1,234,567.89 kg');
    expect(formatQuantity(-0.0001, 'altitude', 'si')).toBe('0 m');
    expect(formatQuantity(-1500, 'altitude', 'si')).toBe('-1,500 m');
  });
  it('formats customary times as hours and minutes', () => {
    expect(formatQuantity(9000, 'time', 'customary')).toBe('2 h 30 min');
    expect(formatQuantity(3870, 'time', 'customary')).toBe('1 h 05 min');
    expect(formatQuantity(5400, 'time', 'si')).toBe('90.0 min');
  });
  it('prints a dash for a non-finite value instead of NaN', () => {
    expect(formatQuantity(Number.NaN, 'speed', 'si')).toBe('—');
    expect(groupDigits(Infinity, 0)).toBe('Infinity');
  });
  it('groups thousands as en-US number formatting does, for every digit count and sign', () => {
    // Reference for the separators: ECMA-402 Intl.NumberFormat('en-US') on the whole part as a BigInt (exact, so
    // only the grouping is compared; the rounding is toFixed's in both). Values from 0 to 1e20, negative ones,
    // and ones that round to zero ("-0.00" must read "0.00").
    const values = [0, 0.004, -0.004, 0.5, 999.5, 1000, 123456, -1234567.891, 9.99e5, 1e15 + 0.25, 123456789012345680000];
    for (let k = 0; k < 400; k++) values.push((k % 2 === 0 ? 1 : -1) * Math.pow(10, (k * 0.05) % 20) * (1 + (k % 7) / 10));
    const intl = new Intl.NumberFormat('en-US', { useGrouping: true });
    for (const digits of [0, 1, 2, 3]) {
      for (const v of values) {
        const fixed = Math.abs(v).toFixed(digits);
        const [whole, fraction] = fixed.split('.');
        const zero = Number(fixed) === 0;
        expect(groupDigits(v, digits)).toBe(`${v < 0 && !zero ? '-' : ''}${intl.format(BigInt(whole!))}${fraction === undefined ? '' : `.${fraction}`}`);
      }
    }
    // Above 1e21 toFixed gives an exponent form, left without separators.
    expect(groupDigits(1.5e22, 0)).toBe('1.5e+22');
  });
});
