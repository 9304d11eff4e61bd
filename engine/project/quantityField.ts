/**
 * Zod fields for physical quantities in project files: a bare number (SI) or
 * a string with a unit ("35000 ft", "250 kt", "+10 K"), parsed to SI by
 * engine/units/quantity.ts. NaN and infinities are refused. A unit error
 * becomes a zod issue whose `params.expected` says what was wanted.
 */
import { z } from 'zod';
import { parseQuantity, type Dimension } from '../units/quantity';

/** What a field of each dimension expects, with examples (used in messages and docs). */
export const DIMENSION_EXPECTED: Readonly<Record<Dimension, string>> = {
  length: 'a length (e.g. "41000 ft", "12.5 km", "3000 nmi" or metres as a number)',
  speed: 'a speed (e.g. "250 kt", "128 m/s" or m/s as a number)',
  mass: 'a mass (e.g. "4500 lb", "2000 kg" or kg as a number)',
  force: 'a force (e.g. "6500 lbf", "29 kN" or newtons as a number)',
  massFlow: 'a mass flow (e.g. "300 lb/h", "0.04 kg/s" or kg/s as a number)',
  temperature: 'a temperature (e.g. "-40 degC", "288.15 K" or kelvin as a number)',
  temperatureDelta: 'a temperature difference (e.g. "+10 K", "-5 degC" or kelvin as a number)',
  pressure: 'a pressure (e.g. "101.3 kPa", "29.92 inHg" or pascals as a number)',
  time: 'a time (e.g. "30 min", "1.5 h", "90 s" or seconds as a number)',
  area: 'an area (e.g. "540 ft2", "50 m2" or m² as a number)',
  power: 'a power (e.g. "40 kW", "50 hp" or watts as a number)',
  angle: 'an angle (e.g. "27 deg", "0.47 rad" or radians as a number)',
  tsfc: 'a specific fuel consumption (e.g. "0.65 lb/(lbf h)", "18 mg/(N s)" or kg/(N s) as a number)',
  dimensionless: 'a plain number (e.g. 0.8, "5 %")',
};

/** Parameters carried by our custom issues so that parseProject can report `expected`. */
export interface ExpectedParams {
  readonly expected: string;
}

/** Inclusive SI bounds for a quantity field; `what` says the range in words for messages. */
export interface QuantityBounds {
  readonly min?: number;
  readonly max?: number;
  readonly what: string;
}

/**
 * A project-file field of the given dimension. Accepts a finite number (SI)
 * or a string with a unit; outputs the SI value. Units per engine/units
 * (NIST SP 811 conversion factors). With bounds, values outside [min, max]
 * are issues (never clamped).
 */
export function quantity(dimension: Dimension, bounds?: QuantityBounds) {
  const expected = bounds ? `${DIMENSION_EXPECTED[dimension]}, ${bounds.what}` : DIMENSION_EXPECTED[dimension];
  const shown = (input: unknown): string => (typeof input === 'string' ? `"${input}"` : String(input));
  const schema = z
    .custom<number | string>(() => true)
    .transform((input, ctx): number => {
      if (input === undefined || input === null) {
        ctx.issues.push({ code: 'custom', input, message: `missing; expected ${expected}`, params: { expected } });
        return z.NEVER;
      }
      if (typeof input !== 'number' && typeof input !== 'string') {
        ctx.issues.push({ code: 'custom', input, message: `${JSON.stringify(input)} is not a number or a quantity string; expected ${expected}`, params: { expected } });
        return z.NEVER;
      }
      if (typeof input === 'number' && !Number.isFinite(input)) {
        ctx.issues.push({ code: 'custom', input, message: `${input} is not a finite number; expected ${expected}`, params: { expected } });
        return z.NEVER;
      }
      const parsed = parseQuantity(input, dimension);
      if (!parsed.ok) {
        ctx.issues.push({ code: 'custom', input, message: parsed.error.message, params: { expected } });
        return z.NEVER;
      }
      const value = parsed.value;
      if (!Number.isFinite(value)) {
        ctx.issues.push({ code: 'custom', input, message: `${shown(input)} is not finite; expected ${expected}`, params: { expected } });
        return z.NEVER;
      }
      if (bounds && ((bounds.min !== undefined && value < bounds.min) || (bounds.max !== undefined && value > bounds.max))) {
        ctx.issues.push({ code: 'custom', input, message: `${shown(input)} is out of range: expected ${bounds.what}`, params: { expected } });
        return z.NEVER;
      }
      return value;
    });
  QUANTITY_DIMENSIONS.set(schema, dimension);
  return schema;
}

const QUANTITY_DIMENSIONS = new WeakMap<object, Dimension>();

/** The dimension of a schema made by `quantity`, else undefined (used by the project writer). */
export function quantityDimensionOf(schema: object): Dimension | undefined {
  return QUANTITY_DIMENSIONS.get(schema);
}

/** A plain dimensionless number field (finite; a bare number or e.g. "5 %"). */
export function ratio() {
  return quantity('dimensionless');
}
