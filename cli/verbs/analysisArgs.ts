/**
 * Command-line plumbing shared by the analysis verbs (crossover, envelope,
 * range-speeds, payload-range, compare, trade): reading the project,
 * quantity options, and formatting numbers that may be missing.
 */
import { resolve } from 'node:path';
import { formatQuantity } from '../../engine/units/displayUnits';
import { parseQuantity, type Dimension } from '../../engine/units/quantity';
import type { DisplayKind } from '../../engine/units/displayUnits';
import type { MissionInput } from '../../engine/mission/missionTypes';
import { buildMissionInput } from '../../engine/project/buildMissionInput';
import type { Project } from '../../engine/project/projectSchema';
import { RATING_NAMES, type RatingName } from '../../engine/propulsion/propulsionModel';
import type { EngineDeck } from '../../engine/propulsion/engineDeck';
import { formatLoadFailure, readProjectDeck, readProjectFile } from '../projectFiles';
import { optionalString, UsageError, type CliIo } from '../verb';

/** Exit code when the analysis ran but could not produce its result (message on stderr). */
export const EXIT_ANALYSIS_FAILED = 3;

export interface AnalysisProject {
  readonly project: Project;
  readonly projectPath: string;
  readonly deck: EngineDeck | undefined;
  /** Mission input for the chosen inlet (default the active one). */
  readonly input: MissionInput;
}

/** The one project positional, checked. */
export function projectArgument(positionals: readonly string[], verb: string): string {
  if (positionals.length === 0) throw new UsageError(`missing the project file: blockwise ${verb} <project.blockwise.json>`);
  if (positionals.length > 1) throw new UsageError(`one project file at a time (got ${positionals.length}: ${positionals.join(', ')})`);
  return positionals[0]!;
}

/** Checks that `name` is an inlet design of the project; a UsageError lists the designs. */
export function checkInletName(project: Project, name: string, option: string, file: string): void {
  if (name.trim() === '') throw new UsageError(`${option}: give the name of an inlet design`);
  if (!project.inlets.some((i) => i.name === name)) {
    const names = project.inlets.map((i) => JSON.stringify(i.name)).join(', ');
    throw new UsageError(`${option}: ${JSON.stringify(name)} is not an inlet design of ${file}; it has ${names}`);
  }
}

/**
 * Reads the project and its deck and builds the mission input for `inletName`.
 * Returns the exit code 1 after printing the problems when the project
 * cannot be used.
 */
export async function loadAnalysisProject(
  file: string,
  inletName: string | undefined,
  io: CliIo,
): Promise<AnalysisProject | number> {
  const read = await readProjectFile(resolve(io.cwd, file));
  if (!read.ok) {
    io.err(formatLoadFailure(read.error));
    return 1;
  }
  const { project, projectPath } = read.value;
  if (inletName !== undefined) checkInletName(project, inletName, '--inlet', file);
  const deck = await readProjectDeck(projectPath, project);
  if (!deck.ok) {
    io.err(formatLoadFailure(deck.error));
    return 1;
  }
  const resources = deck.value.deck === undefined ? {} : { deck: deck.value.deck };
  const built = buildMissionInput(project, resources, inletName === undefined ? {} : { inletName });
  if (!built.ok) {
    io.err(formatLoadFailure({ file: projectPath, issues: built.error }));
    return 1;
  }
  return { project, projectPath, deck: deck.value.deck, input: built.value };
}

/** A quantity option in SI, or `fallback` when absent; a UsageError names the option and the problem. */
export function quantityOption(
  values: Readonly<Record<string, unknown>>,
  name: string,
  dimension: Dimension,
  fallback?: number,
): number {
  const text = optionalString(values, name);
  if (text === undefined) {
    if (fallback === undefined) throw new UsageError(`missing --${name}`);
    return fallback;
  }
  const parsed = parseQuantity(text, dimension);
  if (!parsed.ok) throw new UsageError(`--${name}: ${parsed.error.message}`);
  return parsed.value;
}

/** A positive quantity option (mass, altitude above -5 km is checked by the analyses). */
export function positiveQuantityOption(
  values: Readonly<Record<string, unknown>>,
  name: string,
  dimension: Dimension,
  fallback?: number,
): number {
  const v = quantityOption(values, name, dimension, fallback);
  if (!(v > 0)) throw new UsageError(`--${name}: must be positive (got ${String(values[name] ?? v)})`);
  return v;
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
