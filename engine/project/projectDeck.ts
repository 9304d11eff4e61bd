/**
 * The engine deck a project names: a file (read and parsed by the caller,
 * passed in `resources.deck`), an engine cycle file (its text read by the
 * caller and passed in `resources.cycleText`, or its deck already made and
 * passed in `resources.deck`; generated with installation sensitivities by
 * engine/cycle/cycleDeck.ts, once per text), a deck embedded in the JSON
 * deck format, or a parametric deck built from Mattingly's published
 * thrust-lapse and TSFC models (engine/propulsion/parametricDeck.ts).
 */
import { err, ok, type Result } from '../core/result';
import { parseDeckJson } from '../propulsion/deckJson';
import type { EngineDeck } from '../propulsion/engineDeck';
import { buildParametricDeck, type ParametricDeckGrid, type ParametricDeckSpec } from '../propulsion/parametricDeck';
import { cycleDeckFromText } from '../cycle/cycleDeckCache';
import { DEFAULT_CYCLE_DECK_GRID, type CycleDeckGrid } from '../cycle/cycleDeck';
import { makeIssue, type ProjectIssue } from './projectIssue';
import type { Project } from './projectSchema';
import { FOOT_M } from '../units/unitTable';

export type DeckReference =
  | { readonly kind: 'file'; readonly path: string }
  | { readonly kind: 'cycle'; readonly path: string }
  | { readonly kind: 'embedded' }
  | { readonly kind: 'parametric' };

/**
 * What the caller must supply for the project's deck: for `file`, the path as
 * written (relative paths resolve from the project file's folder; resolving
 * is the caller's job, the engine reads no files).
 */
export function deckReference(project: Project): DeckReference {
  const d = project.engine.deck;
  return d.kind === 'file' || d.kind === 'cycle' ? { kind: d.kind, path: d.path } : { kind: d.kind };
}

/** The deck file saved inside the project (`engine.deck.text`), as the file it stands for; null when there is none. */
export function embeddedDeckFile(project: Project): { readonly name: string; readonly text: string } | null {
  const d = project.engine.deck;
  return d.kind === 'file' && d.text !== undefined ? { name: d.path, text: d.text } : null;
}

/** The project with the deck file's text saved inside it, when the project names that file (`file.name` is its path); else unchanged. */
export function withEmbeddedDeckText(project: Project, file: { readonly name: string; readonly text: string } | null): Project {
  const d = project.engine.deck;
  if (d.kind !== 'file' || file === null || file.name !== d.path || file.text.length === 0) return project;
  return { ...project, engine: { ...project.engine, deck: { kind: 'file', path: d.path, text: file.text } } };
}

/** The project without a saved deck text (the file reference only); the same object when there is none. */
export function withoutEmbeddedDeckText(project: Project): Project {
  const d = project.engine.deck;
  if (d.kind !== 'file' || d.text === undefined) return project;
  return { ...project, engine: { ...project.engine, deck: { kind: 'file', path: d.path } } };
}

const FT_M = FOOT_M;

/** Grid of a parametric deck when the project gives none: 0 to 51,000 ft every 3,000 ft, Mach 0 to 0.9, idle to full power. */
export const DEFAULT_PARAMETRIC_GRID: ParametricDeckGrid = {
  altitudes_m: Array.from({ length: 18 }, (_, i) => i * 3000 * FT_M),
  machs: [0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9],
  powers: [0.06, 0.1, 0.15, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.88, 0.92, 0.95, 1],
};

type ParametricSource = Extract<Project['engine']['deck'], { kind: 'parametric' }>;

/** The ParametricDeckSpec of a project's parametric deck (SI). */
export function parametricSpecOf(d: ParametricSource): ParametricDeckSpec {
  return {
    kind: d.model,
    title: d.title,
    seaLevelStaticThrust_N: d.seaLevelStaticThrust,
    throttleRatio: d.throttleRatio,
    tsfcSeaLevelStatic_kg_N_s: d.seaLevelStaticTsfc,
    seaLevelStaticAirflow_kg_s: d.seaLevelStaticAirflow,
    ...(d.ratings === undefined ? {} : { ratings: Object.fromEntries(Object.entries(d.ratings).filter(([, v]) => v !== undefined)) }),
    ...(d.partPowerFuelIntercept === undefined ? {} : { partPowerFuelIntercept: d.partPowerFuelIntercept }),
    grid: d.grid === undefined ? DEFAULT_PARAMETRIC_GRID : { altitudes_m: d.grid.altitudes, machs: d.grid.machs, powers: d.grid.powers },
  };
}

type CycleSource = Extract<Project['engine']['deck'], { kind: 'cycle' }>;

/** The grid of a project's cycle deck (SI). */
export function cycleGridOf(d: CycleSource): CycleDeckGrid {
  if (d.grid === undefined) return DEFAULT_CYCLE_DECK_GRID;
  return {
    altitudes_m: d.grid.altitudes,
    machs: d.grid.machs,
    ...(d.grid.isaDeviations === undefined ? {} : { isaDevs_K: d.grid.isaDeviations }),
  };
}

/** The deck of a project's cycle file from the file's text (cached per text and grid); issues at engine.deck.path. */
export function projectCycleDeck(project: Project, cycleText: string): Result<EngineDeck, ProjectIssue[]> {
  const d = project.engine.deck;
  if (d.kind !== 'cycle') return err([makeIssue('engine.deck.kind', JSON.stringify(d.kind), '"cycle"', 'the project does not name a cycle file')]);
  const made = cycleDeckFromText(cycleText, d.path, cycleGridOf(d));
  if (!made.ok) {
    const issues = made.error.issues.length > 0 ? made.error.issues.map((i) => i.message) : [made.error.message];
    return err(issues.map((m) => makeIssue('engine.deck.path', JSON.stringify(d.path), 'a cycle file that designs and tabulates', m)));
  }
  return ok(made.value.deck);
}

/** What the caller reads for the project's deck: a parsed deck file, or a cycle file's text. */
export interface DeckResources {
  readonly deck?: EngineDeck;
  readonly cycleText?: string;
}

/** The project's deck: from `resources` for a file or cycle reference, else embedded (JSON deck format) or parametric. */
export function projectDeck(project: Project, resources: DeckResources): Result<EngineDeck, ProjectIssue[]> {
  const d = project.engine.deck;
  if (d.kind === 'cycle') {
    if (resources.deck !== undefined) return ok(resources.deck);
    if (resources.cycleText !== undefined) return projectCycleDeck(project, resources.cycleText);
    return err([makeIssue('engine.deck.path', JSON.stringify(d.path), 'a cycle file read by the caller', `the cycle file ${JSON.stringify(d.path)} was not loaded`)]);
  }
  if (d.kind === 'file') {
    if (resources.deck === undefined) {
      return err([makeIssue('engine.deck.path', JSON.stringify(d.path), 'a deck file read by the caller', `the deck file ${JSON.stringify(d.path)} was not loaded`)]);
    }
    return ok(resources.deck);
  }
  if (d.kind === 'embedded') {
    let text: string;
    try {
      text = JSON.stringify(d.deck);
    } catch {
      // Nesting deeper than JSON.stringify's stack: a corrupt or hostile file, not a deck.
      return err([makeIssue('engine.deck.deck', '{...}', 'a deck in the JSON deck form', 'the embedded deck is nested too deeply to be a deck (docs/deck-format.md)')]);
    }
    const deck = parseDeckJson(text, 'engine.deck.deck');
    if (!deck.ok) {
      return err(deck.error.map((e) => makeIssue(`engine.deck.deck${e.column ? `.${e.column}` : ''}`, e.value ?? '', e.expected, e.message)));
    }
    return ok(deck.value);
  }
  try {
    return ok(buildParametricDeck(parametricSpecOf(d)));
  } catch (e) {
    // buildParametricDeck refuses a spec it cannot tabulate (e.g. a thrust lapse <= 0 on the grid).
    const why = e instanceof Error ? e.message : String(e);
    return err([makeIssue('engine.deck', '{ "kind": "parametric", ... }', 'a parametric deck that can be tabulated', why)]);
  }
}
