import { applyPatches, enablePatches, produceWithPatches, type Draft, type Patch } from 'immer';
import type { DeckFile } from './studyState';

enablePatches();

/**
 * What a step changed beside the document: the deck file in use (a deck
 * import swaps the file text and the project's reference together, so undo
 * and redo swap both).
 */
export interface StepCompanion {
  readonly deckBefore: DeckFile | null;
  readonly deckAfter: DeckFile | null;
}

/** One undoable step: the patches that made it and the ones that revert it. */
export interface HistoryStep {
  readonly label: string;
  readonly patches: readonly Patch[];
  readonly inversePatches: readonly Patch[];
  readonly companion?: StepCompanion;
}

/** A document with its undo and redo stacks (newest last). */
export interface Undoable<T> {
  readonly present: T;
  readonly past: readonly HistoryStep[];
  readonly future: readonly HistoryStep[];
}

/** Longest undo history kept; older steps are dropped. */
export const HISTORY_LIMIT = 200;

export function startHistory<T>(present: T): Undoable<T> {
  return { present, past: [], future: [] };
}

/**
 * Applies an edit through immer and records its patches. An edit that changes
 * nothing leaves the history untouched, unless it has a companion (a new deck
 * file under the same name is still a step).
 */
export function applyEdit<T>(
  state: Undoable<T>,
  label: string,
  recipe: (draft: Draft<T>) => void,
  companion?: StepCompanion,
): Undoable<T> {
  const [next, patches, inversePatches] = produceWithPatches(state.present, recipe);
  if (patches.length === 0 && companion === undefined) return state;
  const step: HistoryStep = companion === undefined ? { label, patches, inversePatches } : { label, patches, inversePatches, companion };
  const past = [...state.past, step];
  return {
    present: next,
    past: past.length > HISTORY_LIMIT ? past.slice(past.length - HISTORY_LIMIT) : past,
    future: [],
  };
}

export function undo<T>(state: Undoable<T>): Undoable<T> {
  const step = state.past[state.past.length - 1];
  if (!step) return state;
  return {
    present: applyPatches(state.present as object, step.inversePatches as Patch[]) as T,
    past: state.past.slice(0, -1),
    future: [...state.future, step],
  };
}

export function redo<T>(state: Undoable<T>): Undoable<T> {
  const step = state.future[state.future.length - 1];
  if (!step) return state;
  return {
    present: applyPatches(state.present as object, step.patches as Patch[]) as T,
    past: [...state.past, step],
    future: state.future.slice(0, -1),
  };
}
