import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { expectedText, quantity, quantityDimensionOf, ratio } from '../../../engine/project/quantityField';
import { expectClose } from '../../support/assertInDelta';

function parse(schema: z.ZodType, input: unknown) {
  return schema.safeParse(input);
}

describe('quantity', () => {
  it('quantity("length") reads "41000 ft" as 12496.8 m (exact by definition, to one double rounding)', () => {
    // International foot = 0.3048 m exactly (1959 international yard and pound agreement; NIST SP 811):
    // 41000 ft = 12496.8 m exactly. In binary floating point 41000 * 0.3048 rounds once more,
    // so the check allows 2 ulp (about 3.6e-12 m at this magnitude).
    const r = parse(quantity('length'), '41000 ft');
    expect(r.success).toBe(true);
    expectClose(r.data as number, 12496.8, { abs: 2 * 2 ** -39 }, 'definition of the international foot');
  });

  it('quantity converts knots, pounds, nautical miles and minutes by their definitions', () => {
    // kt = 1852 m / 3600 s, nmi = 1852 m, lb = 0.45359237 kg (NIST SP 811); min = 60 s.
    expectClose(parse(quantity('speed'), '250 kt').data as number, (250 * 1852) / 3600, { rel: 1e-15 }, 'NIST SP 811: kt');
    expectClose(parse(quantity('mass'), '4500 lb').data as number, 4500 * 0.45359237, { rel: 1e-15 }, 'NIST SP 811: lb');
    expectClose(parse(quantity('length'), '3000 nmi').data as number, 3000 * 1852, { rel: 1e-15 }, 'NIST SP 811: nmi');
    expectClose(parse(quantity('time'), '30 min').data as number, 1800, { rel: 1e-15 }, 'definition of the minute');
    expectClose(parse(quantity('area'), '538 ft2').data as number, 538 * 0.3048 ** 2, { rel: 1e-15 }, 'NIST SP 811: ft2');
    expectClose(parse(quantity('angle'), '27 deg').data as number, (27 * Math.PI) / 180, { rel: 1e-15 }, 'definition of the degree');
  });

  it('quantity reads "+10 K" as a temperature difference of 10 K', () => {
    expect(parse(quantity('temperatureDelta'), '+10 K').data).toBe(10);
  });

  it('quantity reads a bare number as SI and "5 %" as 0.05', () => {
    expect(parse(quantity('length'), 1234.5).data).toBe(1234.5);
    expect(parse(ratio(), '5 %').data).toBeCloseTo(0.05, 15);
  });

  it('quantity refuses a unit of the wrong dimension and says what it is and what was expected', () => {
    const r = parse(quantity('speed'), '250 kg');
    expect(r.success).toBe(false);
    const issue = r.error!.issues[0]!;
    expect(issue.message).toContain('"250 kg" is a mass');
    expect(issue.message).toContain('expected a speed');
    expect((issue as { params?: { expected?: string } }).params?.expected).toBe(expectedText('speed'));
  });

  it('quantity refuses NaN and infinities as numbers and as text', () => {
    for (const input of [Number.NaN, Infinity, -Infinity, 'NaN', 'Infinity', '1e999 ft']) {
      const r = parse(quantity('length'), input);
      expect(r.success, `input ${String(input)}`).toBe(false);
    }
  });

  it('quantity refuses a missing value, a boolean and an object with a message', () => {
    const schema = z.object({ x: quantity('mass') });
    for (const input of [{}, { x: true }, { x: { v: 1 } }]) {
      const r = schema.safeParse(input);
      expect(r.success).toBe(false);
      expect(r.error!.issues[0]!.path).toEqual(['x']);
      expect(r.error!.issues[0]!.message).toContain('expected a mass');
    }
  });

  it('quantity with bounds refuses values outside them and keeps the ends', () => {
    const schema = quantity('length', { min: 0, max: 1000, what: 'a length from 0 to 1000 m' });
    expect(parse(schema, 0).data).toBe(0);
    expect(parse(schema, '1 km').data).toBe(1000);
    const r = parse(schema, '1001 m');
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.message).toContain('"1001 m" is out of range: expected a length from 0 to 1000 m');
  });

  it('quantityDimensionOf names the dimension of a quantity schema and nothing else', () => {
    expect(quantityDimensionOf(quantity('force'))).toBe('force');
    expect(quantityDimensionOf(z.number())).toBeUndefined();
  });

  it('quantity never throws and gives a finite number or an issue with a message for any input', () => {
    const schema = quantity('speed', { min: 0, max: 1000, what: 'a speed from 0 to 1000 m/s' });
    fc.assert(
      fc.property(fc.oneof(fc.string(), fc.double(), fc.jsonValue()), (input) => {
        const r = schema.safeParse(input);
        if (r.success) {
          expect(Number.isFinite(r.data)).toBe(true);
          expect(r.data).toBeGreaterThanOrEqual(0);
          expect(r.data).toBeLessThanOrEqual(1000);
        } else {
          expect(r.error.issues.length).toBeGreaterThan(0);
          for (const issue of r.error.issues) expect(issue.message).toMatch(/\S/);
        }
      }),
      { numRuns: 500 },
    );
  });
});
