/**
 * Reading quantities written with units ("35000 ft", "250 kt", "+15 K") into
 * SI, and converting SI values to a named unit. Bare numbers are SI. Unit
 * spellings are case-sensitive (see docs/units.md and unitTable.ts).
 */
import { err, ok, type Result } from '../core/result';
import { DIMENSION_EXAMPLES, DIMENSION_PHRASE, SI_UNIT, type Dimension, type UnitSystem } from './dimension';
import { lookupUnit, normalizeUnit, UNIT_TABLE, type UnitDef } from './unitTable';

export type { Dimension, UnitSystem };
export { displayUnit, formatQuantity, toDisplay, type DisplayKind } from './displayUnits';

export type QuantityErrorCode = 'empty' | 'not_a_number' | 'unknown_unit' | 'wrong_dimension' | 'not_finite' | 'not_physical';

export interface QuantityError {
  readonly code: QuantityErrorCode;
  /** The text (or number) as given. */
  readonly text: string;
  readonly expected: Dimension;
  /** One sentence naming the text and the dimension expected. */
  readonly message: string;
}

// sign, digits with optional 3-digit comma groups, decimals, exponent; then the unit
const NUMBER_AND_UNIT =
  /^([+-]?(?:\d{1,3}(?:,\d{3})+(?:\.\d*)?|\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*)$/;

/** A quantity text split into its number and its unit text ("" when bare), or null when it does not start with a number. */
export function splitQuantity(text: string): { readonly value: number; readonly unit: string } | null {
  const m = NUMBER_AND_UNIT.exec(text.trim().replace(/^\u2212/, '-'));
  if (m === null) return null;
  const value = Number(m[1]!.replace(/,/g, ''));
  return Number.isFinite(value) ? { value, unit: m[2]!.trim() } : null;
}

function examples(expected: Dimension): string {
  const [a, b] = DIMENSION_EXAMPLES[expected];
  return `(e.g. "${a}", "${b}")`;
}

function fail(code: QuantityErrorCode, text: string, expected: Dimension, what: string): Result<never, QuantityError> {
  return err({ code, text, expected, message: `${what}, expected ${DIMENSION_PHRASE[expected]} ${examples(expected)}` });
}

function caseHint(unit: string): string {
  const key = normalizeUnit(unit).toLowerCase();
  const match = Object.keys(UNIT_TABLE).find((k) => k.toLowerCase() === key);
  return match === undefined ? '' : ` (units are case-sensitive: did you mean "${match}"?)`;
}

/** True when a unit of dimension `given` may be read as `expected`. */
function compatible(given: Dimension, expected: Dimension): boolean {
  return given === expected || (expected === 'temperatureDelta' && given === 'temperature');
}

function applyUnit(value: number, def: UnitDef, expected: Dimension): number {
  // A temperature unit read as a difference uses only its scale.
  return expected === 'temperatureDelta' ? value * def.scale : value * def.scale + def.offset;
}

/** Smallest positive normal double (2^-1022): a smaller non-zero magnitude is subnormal (IEEE 754-2008, 3.4). */
export const MIN_NORMAL = 2.2250738585072014e-308;
/**
 * Largest SI magnitude any quantity Blockwise reads may have (1e12: a trillion metres, newtons, watts...;
 * every field and option has its own, narrower range on top).
 */
export const MAX_PHYSICAL_MAGNITUDE = 1e12;

/** Why an SI value cannot be a physical quantity (subnormal, or beyond MAX_PHYSICAL_MAGNITUDE), or null. */
function physicalProblem(si: number, shown: string): string | null {
  const size = Math.abs(si);
  if (size !== 0 && size < MIN_NORMAL) return `${shown} is a subnormal number (non-zero but below 2.2e-308 in magnitude), not a physical value`;
  if (size > MAX_PHYSICAL_MAGNITUDE) return `${shown} is ${si.toExponential(2)} in SI units, beyond any physical value (at most 1e12 in magnitude)`;
  return null;
}

/**
 * Reads a quantity with an optional unit and returns its SI value (units of
 * SI_UNIT[expected]). Bare numbers and numeric strings without a unit are SI;
 * for 'dimensionless', "%" divides by 100. Temperatures read as
 * 'temperatureDelta' ("+15 K", "10 degC") are differences (no offset).
 * Subnormal numbers and SI magnitudes above MAX_PHYSICAL_MAGNITUDE are refused
 * ('not_physical'). Never throws.
 */
export function parseQuantity(input: string | number, expected: Dimension): Result<number, QuantityError> {
  if (typeof input === 'number') {
    if (!Number.isFinite(input)) return fail('not_finite', String(input), expected, `${input} is not a finite number`);
    const problem = physicalProblem(input, String(input));
    if (problem !== null) return fail('not_physical', String(input), expected, problem);
    return ok(input);
  }
  if (typeof input !== 'string') {
    return fail('not_a_number', String(input), expected, `${JSON.stringify(input) ?? String(input)} is not a number or text`);
  }
  const text = input;
  // A typographic minus (U+2212) reads as a hyphen-minus.
  const trimmed = text.trim().replace(/^\u2212/, '-');
  if (trimmed === '') return fail('empty', text, expected, 'empty value');
  // Messages quote the text, shortened so a pasted document does not become the message.
  const quoted = JSON.stringify(trimmed.length > 60 ? `${trimmed.slice(0, 57)}...` : trimmed);
  const m = NUMBER_AND_UNIT.exec(trimmed);
  if (m === null) {
    return fail('not_a_number', text, expected, `${quoted} does not start with a number`);
  }
  const value = Number(m[1]!.replace(/,/g, ''));
  if (!Number.isFinite(value)) {
    return fail('not_finite', text, expected, `${quoted} is not a finite number`);
  }
  const unitText = m[2]!.trim();
  if (unitText === '') {
    const problem = physicalProblem(value, quoted);
    return problem === null ? ok(value) : fail('not_physical', text, expected, problem);
  }
  const def = lookupUnit(unitText);
  if (def === undefined) {
    return fail('unknown_unit', text, expected, `${quoted} has an unknown unit "${unitText}"${caseHint(unitText)}`);
  }
  if (!compatible(def.dimension, expected)) {
    return fail('wrong_dimension', text, expected, `${quoted} is ${DIMENSION_PHRASE[def.dimension]}`);
  }
  const si = applyUnit(value, def, expected);
  if (!Number.isFinite(si)) return fail('not_finite', text, expected, `${quoted} is not a finite number in SI`);
  const problem = physicalProblem(si, quoted);
  if (problem !== null) return fail('not_physical', text, expected, problem);
  return ok(si);
}

/**
 * Converts a value in a named unit to SI and says which dimension the unit
 * measures. Temperature units are absolute here (degC adds 273.15).
 */
export function toSi(value: number, unit: string): Result<{ value_si: number; dimension: Dimension }, QuantityError> {
  const def = lookupUnit(unit);
  const text = `${value} ${unit}`;
  if (def === undefined) {
    return err({
      code: 'unknown_unit',
      text,
      expected: 'dimensionless',
      message: `unknown unit "${unit}"${caseHint(unit)}`,
    });
  }
  const value_si = value * def.scale + def.offset;
  if (!Number.isFinite(value_si)) {
    return err({ code: 'not_finite', text, expected: def.dimension, message: `"${text}" is not a finite number` });
  }
  return ok({ value_si, dimension: def.dimension });
}

/**
 * Converts an SI value to a named unit (temperatures absolute). Throws for an
 * unknown unit: callers pass units from this module's table, so that is a bug.
 */
export function fromSi(value_si: number, unit: string): number {
  const def = lookupUnit(unit);
  if (def === undefined) throw new Error(`fromSi: unknown unit "${unit}"`);
  return (value_si - def.offset) / def.scale;
}

/** Converts an SI temperature difference (K) to a temperature unit's degrees, without offset. */
export function fromSiDelta(value_si: number, unit: string): number {
  const def = lookupUnit(unit);
  if (def === undefined) throw new Error(`fromSiDelta: unknown unit "${unit}"`);
  return value_si / def.scale;
}

/** The SI unit a bare number of this dimension is read in. */
export function siUnit(dimension: Dimension): string {
  return SI_UNIT[dimension];
}
