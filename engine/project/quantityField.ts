/**
 * Zod fields for physical quantities in project files: a bare number (SI) or
 * a string with a unit ("35000 ft", "250 kt", "+10 K"), parsed to SI by
 * engine/units/quantity.ts. NaN and infinities are refused. A unit error
 * becomes a zod issue whose `params.expected` says what was wanted.
 */
import * as z from 'zod';
import { DIMENSION_EXAMPLES, DIMENSION_PHRASE, SI_UNIT } from '../units/dimension';
import type { DisplayKind } from '../units/displayUnits';
import { msg, q, type MessageKind, type MessageParts } from '../units/messageParts';
import { parseQuantity, type Dimension } from '../units/quantity';
import { showValue } from './projectIssue';

/** What a field of a dimension expects, with examples and the SI unit of a bare number (for messages and docs). */
export function expectedText(dimension: Dimension): string {
  const [a, b] = DIMENSION_EXAMPLES[dimension];
  const bare = dimension === 'dimensionless' ? '' : ` or a bare number in ${SI_UNIT[dimension]}`;
  return `${DIMENSION_PHRASE[dimension]} (e.g. "${a}", "${b}"${bare})`;
}

/** Parameters carried by our custom issues so that parseProject can report `expected`. */
export interface ExpectedParams {
  readonly expected: string;
}

/**
 * Largest magnitude (SI) a field of each dimension accepts when it states no narrower range: far beyond any jet
 * and its missions (a field's own bounds, e.g. altitudes, are narrower), so a slip of a thousand is still caught.
 */
export const PHYSICAL_MAGNITUDE: Readonly<Record<Dimension, { readonly max: number; readonly what: string }>> = {
  length: { max: 4.0075e7, what: '40,075 km (once round the Earth)' },
  speed: { max: 1500, what: '1,500 m/s' },
  mass: { max: 1e6, what: '1,000,000 kg' },
  force: { max: 1e7, what: '10 MN' },
  massFlow: { max: 1e4, what: '10,000 kg/s' },
  temperature: { max: 1e4, what: '10,000 K' },
  temperatureDelta: { max: 200, what: '200 K' },
  pressure: { max: 1e7, what: '10 MPa' },
  time: { max: 48 * 3600, what: '48 h' },
  area: { max: 1e4, what: '10,000 m2' },
  power: { max: 1e9, what: '1 GW' },
  angle: { max: 2 * Math.PI, what: '360 deg' },
  tsfc: { max: 1e-3, what: '1e-3 kg/(N s) (35 lb/(lbf h))' },
  specificHeat: { max: 1e5, what: '100,000 J/(kg K)' },
  specificEnergy: { max: 1e9, what: '1e9 J/kg' },
  specificRange: { max: 1e5, what: '100 km/kg' },
  dimensionless: { max: 1e6, what: '1e6' },
};

/** Inclusive SI bounds for a quantity field; `what` says the range in words for messages. */
export interface QuantityBounds {
  readonly min?: number;
  readonly max?: number;
  readonly what: string;
}

/** How a bounded value of a dimension is shown in a message (lengths as altitudes, the usual bounded length). */
const MESSAGE_KIND: Partial<Readonly<Record<Dimension, DisplayKind>>> = {
  length: 'altitude',
  speed: 'speed',
  mass: 'mass',
  force: 'force',
  massFlow: 'fuelFlow',
  temperature: 'temperature',
  temperatureDelta: 'temperatureDelta',
  pressure: 'pressure',
  time: 'time',
  area: 'area',
  power: 'power',
  tsfc: 'tsfc',
};

/** The range of `bounds` with its numbers as quantities: "from a to b", "at least a" or "at most b". */
function rangeParts(dimension: Dimension, bounds: QuantityBounds): MessageParts {
  const kind: MessageKind = MESSAGE_KIND[dimension] ?? 'ratio';
  // `what` reads "a Mach number from 0.05 to 0.99": its noun stays, its numbers are shown as quantities.
  const noun = bounds.what.split(/ (?:from|in|above|below|at least|at most|>|>=|<|<=) /)[0]!;
  const range =
    bounds.min !== undefined && bounds.max !== undefined
      ? msg`from ${q(bounds.min, kind)} to ${q(bounds.max, kind)}`
      : bounds.min !== undefined
        ? msg`at least ${q(bounds.min, kind)}`
        : msg`at most ${q(bounds.max ?? Number.NaN, kind)}`;
  return msg`${noun} ${range}`;
}

/** "x is out of range: expected from a to b" with the numbers as quantities. */
function outOfRangeParts(value: number, dimension: Dimension, bounds: QuantityBounds): MessageParts {
  return msg`${q(value, MESSAGE_KIND[dimension] ?? 'ratio')} is out of range: expected ${rangeParts(dimension, bounds)}`;
}

/**
 * A project-file field of the given dimension. Accepts a finite number (SI)
 * or a string with a unit; outputs the SI value. Units per engine/units
 * (NIST SP 811 conversion factors). With bounds, values outside [min, max]
 * are issues (never clamped); without them, or beyond them, a magnitude above the dimension's
 * PHYSICAL_MAGNITUDE is an issue too.
 */
export function quantity(dimension: Dimension, bounds?: QuantityBounds) {
  const expected = bounds ? `${expectedText(dimension)}, ${bounds.what}` : expectedText(dimension);
  // The same expectation with the bounds as quantities, so each reader shows them in its own units.
  const expectedParts = (lead: string): MessageParts | undefined =>
    bounds ? msg`${lead}; expected ${expectedText(dimension)}, ${rangeParts(dimension, bounds)}` : undefined;
  const shown = (input: unknown): string => (typeof input === 'string' ? `"${input}"` : String(input));
  const schema = z
    .custom<number | string>(() => true)
    .transform((input, ctx): number => {
      if (input === undefined || input === null) {
        ctx.issues.push({ code: 'custom', input, message: `missing; expected ${expected}`, params: { expected, parts: expectedParts('missing') } });
        return z.NEVER;
      }
      if (typeof input !== 'number' && typeof input !== 'string') {
        ctx.issues.push({ code: 'custom', input, message: `${showValue(input)} is not a number or a quantity string; expected ${expected}`, params: { expected, parts: expectedParts(`${showValue(input)} is not a number or a quantity string`) } });
        return z.NEVER;
      }
      if (typeof input === 'number' && !Number.isFinite(input)) {
        ctx.issues.push({ code: 'custom', input, message: `${input} is not a finite number; expected ${expected}`, params: { expected, parts: expectedParts(`${input} is not a finite number`) } });
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
        ctx.issues.push({ code: 'custom', input, message: `${shown(input)} is out of range: expected ${bounds.what}`, params: { expected, parts: outOfRangeParts(value, dimension, bounds) } });
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
