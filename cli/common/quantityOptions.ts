/**
 * Quantity options of the command line ("--altitude 35000ft", "--weight
 * 15000 kg"): parsed to SI with engine/units, checked against the option's
 * physical range, and a UsageError naming the option and the problem when
 * they cannot be used.
 */
import { MAX_ALTITUDE_M, MIN_ALTITUDE_M } from '../../engine/mission';
import { MAX_PRESSURE_ALTITUDE_M, MIN_PRESSURE_ALTITUDE_M } from '../../engine/aero';
import { type Dimension, parseQuantity, FOOT_M, groupDigits } from '../../engine/units';
import { optionalString, requireString, UsageError } from '../verb';

/** Inclusive SI range of an option; `what` says it in words for the message. */
export interface OptionRange {
  readonly min: number;
  readonly max: number;
  /** True when the minimum itself is refused (a mass, a step). */
  readonly minExclusive?: boolean;
  readonly what: string;
}

const FT = FOOT_M;

/** The ranges the options are checked against (SI). */
export const OPTION_RANGES = {
  /** Where the mission and the analyses fly (engine/mission/missionInputCheck.ts). */
  flightAltitude: { min: MIN_ALTITUDE_M, max: MAX_ALTITUDE_M, what: `a pressure altitude from ${Math.round(MIN_ALTITUDE_M / FT)} ft to ${groupDigits(Math.round(MAX_ALTITUDE_M / FT), 0)} ft (${MIN_ALTITUDE_M / 1000} km to ${MAX_ALTITUDE_M / 1000} km)` },
  /** The standard atmosphere's own range (U.S. Standard Atmosphere 1976 as built here). */
  atmosphereAltitude: { min: MIN_PRESSURE_ALTITUDE_M, max: MAX_PRESSURE_ALTITUDE_M, what: `a pressure altitude from ${Math.round(MIN_PRESSURE_ALTITUDE_M)} m to ${MAX_PRESSURE_ALTITUDE_M} m` },
  mach: { min: 0, max: 5, what: 'a Mach number from 0 to 5' },
  /** True, calibrated or equivalent airspeed. */
  airspeed: { min: 0, max: 1500, what: 'a speed from 0 to 1,500 m/s (about 2,900 kt)' },
  /** An aircraft mass: above zero, at most 1,000 t (several times the heaviest aircraft flown; common practice bound). */
  aircraftMass: { min: 0, max: 1e6, minExclusive: true, what: 'a mass above 0 and at most 1,000,000 kg' },
  isaDeviation: { min: -80, max: 80, what: 'an ISA deviation from -80 K to +80 K' },
  /** A residual climb rate for a ceiling: above zero, at most 100 m/s (about 20,000 ft/min). */
  climbRate: { min: 0, max: 100, minExclusive: true, what: 'a climb rate above 0 and at most 100 m/s (19,685 ft/min)' },
  /** Altitude step of a table: 10 m to 10 km. */
  altitudeStep: { min: 10, max: 10000, what: 'an altitude step from 10 m to 10 km' },
  fraction: { min: 0, max: 1, what: 'a fraction from 0 to 1' },
  /** Shaft power extracted per engine: 0 to 10 MW. */
  shaftPower: { min: 0, max: 1e7, what: 'a power from 0 to 10 MW' },
} as const satisfies Record<string, OptionRange>;

function parseOption(text: string, name: string, dimension: Dimension, range: OptionRange): number {
  const parsed = parseQuantity(text, dimension);
  if (!parsed.ok) throw new UsageError(`--${name}: ${parsed.error.message}`);
  const v = parsed.value;
  const low = range.minExclusive === true ? !(v > range.min) : v < range.min;
  if (low || v > range.max) throw new UsageError(`--${name}: ${JSON.stringify(text.length > 60 ? `${text.slice(0, 57)}...` : text)} is out of range: expected ${range.what}`);
  return v;
}

/** An optional quantity option in SI, checked against `range`; undefined when absent. */
export function optionalQuantityOption(values: Readonly<Record<string, unknown>>, name: string, dimension: Dimension, range: OptionRange): number | undefined {
  const text = optionalString(values, name);
  return text === undefined ? undefined : parseOption(text, name, dimension, range);
}

/**
 * A quantity option in SI checked against `range`, or `fallback` when absent; without a fallback the option is
 * required ("missing --name").
 */
export function quantityOption(
  values: Readonly<Record<string, unknown>>,
  name: string,
  dimension: Dimension,
  range: OptionRange,
  fallback?: number,
): number {
  if (fallback === undefined) return parseOption(requireString(values, name), name, dimension, range);
  return optionalQuantityOption(values, name, dimension, range) ?? fallback;
}
