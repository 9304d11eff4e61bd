/**
 * How an editable field shows and reads its value: the display kind of its
 * quantity in the chosen unit system. A bare number typed into a field is read
 * in the unit the field shows (not SI), so "35000" in a feet field is 35,000 ft.
 */
import { err, ok, type Result } from '../../engine/core';
import { type Dimension, type DisplayKind, displayUnit, fromSi, groupDigits, parseQuantity, toDisplay, type UnitSystem } from '../../engine/units';

/** A display kind, or a unit that is the same in both systems. */
/** `duration` is a time shown in minutes in both systems (leg and reserve times). */
export type FieldUnit = DisplayKind | 'angle' | 'dimensionless' | 'percent' | 'massFlow' | 'duration';

const DIMENSION_OF: Readonly<Record<FieldUnit, Dimension>> = {
  altitude: 'length',
  distance: 'length',
  speed: 'speed',
  climbRate: 'speed',
  mass: 'mass',
  force: 'force',
  fuelFlow: 'massFlow',
  massFlow: 'massFlow',
  temperature: 'temperature',
  temperatureDelta: 'temperatureDelta',
  pressure: 'pressure',
  time: 'time',
  area: 'area',
  power: 'power',
  tsfc: 'tsfc',
  specificRange: 'specificRange',
  angle: 'angle',
  dimensionless: 'dimensionless',
  percent: 'dimensionless',
  duration: 'time',
};

const FIXED_UNIT: Partial<Record<FieldUnit, Record<UnitSystem, string>>> = {
  angle: { si: 'deg', customary: 'deg' },
  massFlow: { si: 'kg/s', customary: 'lb/s' },
  percent: { si: '%', customary: '%' },
  duration: { si: 'min', customary: 'min' },
};

/** The dimension a field's text is parsed as. */
export function fieldDimension(unit: FieldUnit): Dimension {
  return DIMENSION_OF[unit];
}

/** The unit a field shows ('' for dimensionless). */
export function fieldUnitLabel(unit: FieldUnit, system: UnitSystem): string {
  if (unit === 'dimensionless') return '';
  const fixed = FIXED_UNIT[unit];
  return fixed ? fixed[system] : displayUnit(unit as DisplayKind, system);
}

/** Most decimals a field shows (a value below 1e-6 of its unit shows as 0). */
const MAX_DECIMALS = 6;

/**
 * `significant` significant digits, but never fewer than the whole digits
 * (36,500 lb stays 36,500, 40.2307 hp shows 40.23); trailing zeros dropped.
 */
function significantText(value: number, significant: number): string {
  const magnitude = value === 0 ? 0 : Math.floor(Math.log10(Math.abs(value)));
  const decimals = Math.min(Math.max(significant - 1 - magnitude, 0), MAX_DECIMALS);
  const text = groupDigits(value, decimals);
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}

/**
 * The SI value as field text in the display unit with 4 significant digits,
 * e.g. 10668 m -> "35,000 ft", 30 kW -> "40.23 hp". Only the text is rounded:
 * a field whose text is not edited sends nothing back, so the stored SI value
 * stays as it was.
 */
export function formatField(value_si: number, unit: FieldUnit, system: UnitSystem): string {
  if (!Number.isFinite(value_si)) return '';
  if (unit === 'dimensionless') return String(value_si);
  const label = fieldUnitLabel(unit, system);
  const fixed = FIXED_UNIT[unit];
  const shown = fixed ? fromSi(value_si, fixed[system]) : toDisplay(value_si, unit as DisplayKind, system);
  return `${significantText(shown, 4)} ${label}`;
}

const BARE_NUMBER = /^[+-]?(?:\d{1,3}(?:,\d{3})+(?:\.\d*)?|\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/**
 * Reads field text to SI. Text with a unit is read as written; a bare number
 * is read in the field's display unit. The error is parseQuantity's message.
 */
export function parseField(text: string, unit: FieldUnit, system: UnitSystem): Result<number, string> {
  const trimmed = text.trim();
  const label = fieldUnitLabel(unit, system);
  const withUnit = BARE_NUMBER.test(trimmed) && label !== '' ? `${trimmed} ${label}` : trimmed;
  const parsed = parseQuantity(withUnit, fieldDimension(unit));
  return parsed.ok ? ok(parsed.value) : err(parsed.error.message);
}
