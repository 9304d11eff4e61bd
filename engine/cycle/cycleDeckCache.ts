/**
 * The deck of a cycle file's text, generated once per text and grid within a
 * process or session (a project that names a cycle file as its engine is
 * re-flown on every edit; its deck takes a few seconds to generate). The
 * cache is keyed purely by the inputs, so it cannot change an answer.
 */
import { err, ok, type Result } from '../core/result';
import type { EngineDeck } from '../propulsion/engineDeck';
import type { CycleEngine } from './cycleEngine';
import { cycleDeck, DEFAULT_CYCLE_DECK_GRID, type CycleDeckGap, type CycleDeckGrid } from './cycleDeck';
import { parseCycleFile, type CycleFileIssue } from './cycleFile';
import { designEngine } from './designPoint';

export interface CycleDeckFromText {
  readonly engine: CycleEngine;
  readonly deck: EngineDeck;
  readonly gaps: readonly CycleDeckGap[];
}

/** Why a cycle text gave no deck: the file's located issues, the design error, or the deck's. */
export interface CycleDeckTextError {
  readonly code: 'cycle_file' | 'cycle_design' | 'cycle_deck';
  readonly message: string;
  readonly issues: readonly CycleFileIssue[];
}

const CACHE_SIZE = 4;
const cache = new Map<string, Result<CycleDeckFromText, CycleDeckTextError>>();

/**
 * The engine and deck of a cycle file text (docs/cycle-format.md) over
 * `grid` (default DEFAULT_CYCLE_DECK_GRID); the last few answers are kept,
 * keyed by text and grid. Never throws.
 */
export function cycleDeckFromText(
  text: string,
  sourceName: string,
  grid: CycleDeckGrid = DEFAULT_CYCLE_DECK_GRID,
): Result<CycleDeckFromText, CycleDeckTextError> {
  const key = `${JSON.stringify(grid)}\u0000${text}`;
  const hit = cache.get(key);
  if (hit !== undefined) {
    // Refresh its place: the cache drops the least recently used entry.
    cache.delete(key);
    cache.set(key, hit);
    return hit;
  }
  const made = make(text, sourceName, grid);
  cache.set(key, made);
  if (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value!);
  return made;
}

function make(text: string, sourceName: string, grid: CycleDeckGrid): Result<CycleDeckFromText, CycleDeckTextError> {
  const spec = parseCycleFile(text, sourceName);
  if (!spec.ok) {
    return err({ code: 'cycle_file', message: `${sourceName}: ${spec.error.length} problem(s) in the cycle file: ${spec.error[0]!.message}`, issues: spec.error });
  }
  const engine = designEngine(spec.value);
  if (!engine.ok) return err({ code: 'cycle_design', message: `${sourceName}: the cycle cannot be designed: ${engine.error.message}`, issues: [] });
  const deck = cycleDeck(engine.value, grid);
  if (!deck.ok) return err({ code: 'cycle_deck', message: `${sourceName}: ${deck.error.message}`, issues: [] });
  return ok({ engine: engine.value, deck: deck.value.deck, gaps: deck.value.gaps });
}
