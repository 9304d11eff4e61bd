/**
 * A deck file's text to an engine deck, the one way every front door reads
 * a deck: the JSON deck form when the text's first non-blank character
 * (after a byte-order mark) is "{", else the deck CSV (docs/deck-format.md).
 * The name's extension is only a hint, used for a blank file, so a deck
 * loads the same whatever it is called.
 */
import type { Result } from '../core/result';
import { parseDeckCsv } from '../propulsion/deckCsv';
import type { DeckFileError } from '../propulsion/deckFileError';
import { parseDeckJson } from '../propulsion/deckJson';
import type { EngineDeck } from '../propulsion/engineDeck';

export type DeckTextFormat = 'csv' | 'json';

/** A deck file as read by a front door: its name (for messages and the format hint) and its text. */
export interface DeckFileText {
  readonly name: string;
  readonly text: string;
}

/** The form of a deck file by its content; the extension of `sourceName` decides only when the text is blank. */
export function deckTextFormat(text: string, sourceName: string): DeckTextFormat {
  const first = /[^\s\uFEFF]/.exec(text);
  if (first !== null) return first[0] === '{' ? 'json' : 'csv';
  return /\.json$/i.test(sourceName) ? 'json' : 'csv';
}

/** Parses a deck file (a leading byte-order mark dropped) in the form its content shows; errors say where (line or JSON path) and what. */
export function parseDeckText(text: string, sourceName: string): Result<EngineDeck, readonly DeckFileError[]> {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  return deckTextFormat(body, sourceName) === 'json' ? parseDeckJson(body, sourceName) : parseDeckCsv(body, sourceName);
}

/** The last deck text parsed and its result, so that a front door re-reading the same text does not parse it again. */
export interface DeckTextMemo {
  text: string | null;
  name: string | null;
  result: Result<EngineDeck, readonly DeckFileError[]> | null;
}

export function createDeckTextMemo(): DeckTextMemo {
  return { text: null, name: null, result: null };
}

/** parseDeckText through `memo` (updated in place when the text or name changed). */
export function parseDeckTextMemoized(memo: DeckTextMemo, file: DeckFileText): Result<EngineDeck, readonly DeckFileError[]> {
  if (memo.result === null || memo.text !== file.text || memo.name !== file.name) {
    memo.text = file.text;
    memo.name = file.name;
    memo.result = parseDeckText(file.text, file.name);
  }
  return memo.result;
}
