/**
 * Command-line plumbing shared by the analysis verbs (crossover, envelope,
 * range-speeds, payload-range, compare, trade): their common options, the
 * rating option, the ISA deviation that defaults to the project's, and
 * formatting numbers that may be missing.
 */
import type { ParseArgsConfig } from 'node:util';
import { type DisplayKind, formatQuantity } from '../../engine/units';
import { RATING_NAMES, type RatingName } from '../../engine/propulsion';
import type { LoadedProject } from '../projectFiles';
import { loadVerbProject, projectArgument } from '../common/projectArgs';
import { OPTION_RANGES, quantityOption } from '../common/quantityOptions';
import { optionalString, UsageError, type CliIo } from '../verb';

type Options = NonNullable<ParseArgsConfig['options']>;

/** `--inlet <name>`: fly another inlet design than the project's active one. */
export const INLET_OPTION: Options = { inlet: { type: 'string' } };
/** `--isa-dev <dT>`: ISA temperature deviation, default the project's. */
export const ISA_DEV_OPTION: Options = { 'isa-dev': { type: 'string' } };
/** `--json`: print the result as JSON. */
export const JSON_OPTION: Options = { json: { type: 'boolean' } };
/** `--altitude <alt> --weight <mass>`: the flight condition of the point analyses (crossover, range-speeds). */
export const POINT_OPTIONS: Options = { altitude: { type: 'string' }, weight: { type: 'string' } };

/** The required `--altitude` (m) and `--weight` (kg, positive) of a point analysis. */
export function pointCondition(values: Readonly<Record<string, unknown>>): { readonly altitude_m: number; readonly mass_kg: number } {
  return {
    altitude_m: quantityOption(values, 'altitude', 'length', OPTION_RANGES.flightAltitude),
    mass_kg: quantityOption(values, 'weight', 'mass', OPTION_RANGES.aircraftMass),
  };
}

/** The project positional of an analysis verb, read with the `--inlet` option's design; the exit code 1 after printing why it cannot be used. */
export function openAnalysisProject(
  values: Readonly<Record<string, unknown>>,
  positionals: readonly string[],
  verb: string,
  io: CliIo,
): Promise<LoadedProject | number> {
  const file = projectArgument(positionals, verb);
  return loadVerbProject(file, optionalString(values, 'inlet'), io);
}

/** `--isa-dev` in K, or the project's ISA deviation when absent. */
export function isaDevOption(values: Readonly<Record<string, unknown>>, projectIsaDev_K: number): number {
  return quantityOption(values, 'isa-dev', 'temperatureDelta', OPTION_RANGES.isaDeviation, projectIsaDev_K);
}

/** A rating option, checked against the rating names. */
export function ratingOption(values: Readonly<Record<string, unknown>>, name: string, fallback: RatingName): RatingName {
  const text = optionalString(values, name);
  if (text === undefined) return fallback;
  if (!(RATING_NAMES as readonly string[]).includes(text)) {
    throw new UsageError(`--${name}: ${JSON.stringify(text)} is not a rating; expected one of ${RATING_NAMES.join(', ')}`);
  }
  return text as RatingName;
}

/** Mach to 3 decimals, or a dash when missing. */
export function machText(mach: number | null | undefined): string {
  return mach === null || mach === undefined ? '-' : mach.toFixed(3);
}

/** A quantity in customary and SI display units ("35,000 ft (10,668 m)"), or a dash when missing. */
export function bothUnits(value_si: number | null | undefined, kind: DisplayKind): string {
  if (value_si === null || value_si === undefined) return '-';
  return `${formatQuantity(value_si, kind, 'customary')} (${formatQuantity(value_si, kind, 'si')})`;
}
