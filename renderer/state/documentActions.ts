/**
 * Turning files into actions: a project's text into `projectOpened` (or
 * `projectOpenFailed` with every issue), the bundled demo, a deck file
 * into `deckImported` (or a refusal saying where and what).
 */
import { parseCycleFile } from '../../engine/cycle';
import { embeddedDeckFile, parseProject, withoutEmbeddedDeckText } from '../../engine/project';
import { parseDeckText } from '../../engine/study';
import type { StudyAction } from './studyActions';
import type { DeckFile } from './studyState';

/**
 * Parses project text. A deck saved inside the project (`engine.deck.text`)
 * becomes the deck in use and leaves the document (which keeps the file
 * reference only; saving puts the text back, renderer/state/saveText.ts).
 * Otherwise `deckFile` is a deck already at hand (the demo's, or the one in
 * use); it is kept only when the project names a deck file of that name.
 */
export function openProjectAction(name: string, text: string, deckFile: DeckFile | null): StudyAction {
  const parsed = parseProject(text, name);
  if (!parsed.ok) return { type: 'projectOpenFailed', name, issues: parsed.error };
  const embedded = embeddedDeckFile(parsed.value);
  if (embedded !== null) return { type: 'projectOpened', project: withoutEmbeddedDeckText(parsed.value), name, deckFile: embedded, embedDeck: true };
  const project = parsed.value;
  const deck = project.engine.deck;
  const keep = (deck.kind === 'file' || deck.kind === 'cycle') && deckFile !== null && deck.path === deckFile.name;
  return { type: 'projectOpened', project, name, deckFile: keep ? deckFile : null };
}

/** Most deck errors listed in the message line; the rest are counted. */
const DECK_ERRORS_SHOWN = 5;

/**
 * A picked deck file to `deckImported`, or the reason it is refused. The
 * deck is parsed here by engine/study's parseDeckText (the parser the CLI
 * and the worker use, CSV or JSON by content), before anything changes: a
 * refused deck never reaches the store, so the working deck, the project,
 * its results and its undo history stay as they were.
 */
export function deckImportAction(deckFile: DeckFile): { readonly ok: true; readonly action: StudyAction } | { readonly ok: false; readonly message: string } {
  if (isCycleFileName(deckFile.name)) {
    // An engine cycle file (docs/cycle-format.md): the project's engine becomes that cycle, its deck generated from it.
    const cycle = parseCycleFile(deckFile.text, deckFile.name);
    if (cycle.ok) return { ok: true, action: { type: 'deckImported', deckFile } };
    const shown = cycle.error.slice(0, DECK_ERRORS_SHOWN).map((e) => e.message);
    const rest = cycle.error.length - shown.length;
    return { ok: false, message: `Cycle file ${deckFile.name} not imported, nothing changed: ${shown.join('; ')}${rest > 0 ? ` (and ${rest} more)` : ''}.` };
  }
  const parsed = parseDeckText(deckFile.text, deckFile.name);
  if (parsed.ok) return { ok: true, action: { type: 'deckImported', deckFile } };
  const lines = parsed.error.slice(0, DECK_ERRORS_SHOWN).map((e) => e.message);
  const more = parsed.error.length - lines.length;
  const tail = more > 0 ? ` (and ${more} more)` : '';
  return { ok: false, message: `Deck ${deckFile.name} not imported, nothing changed: ${lines.join('; ')}${tail}.` };
}

/** A file named *.cycle.json is an engine cycle file, not a deck. */
export function isCycleFileName(name: string): boolean {
  return name.toLowerCase().endsWith('.cycle.json');
}
