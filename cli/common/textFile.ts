/**
 * Reading the files a verb names on its command line (decks, inlet design
 * files), relative to the working folder; a file that cannot be read is
 * reported on stderr with the verb and the system's error code.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Result } from '../../engine/core/result';
import type { DeckFileError } from '../../engine/propulsion/deckFileError';
import type { EngineDeck } from '../../engine/propulsion/engineDeck';
import { cannotReadMessage, parseDeckText, readFailureReason } from '../../engine/study';
import type { CliIo } from '../verb';

/** The file's text, or null after printing "blockwise <verb>: cannot read ..." on stderr. */
export function readTextFile(file: string, verb: string, io: CliIo): string | null {
  try {
    return readFileSync(resolve(io.cwd, file), 'utf8');
  } catch (e) {
    io.err(`blockwise ${verb}: ${cannotReadMessage(file, readFailureReason((e as NodeJS.ErrnoException).code, e instanceof Error ? e.message : String(e)))}\n`);
    return null;
  }
}

/** A deck file read and parsed (the form by its content, engine/study); null after printing why it could not be read. */
export function readDeckFile(file: string, verb: string, io: CliIo): Result<EngineDeck, readonly DeckFileError[]> | null {
  const text = readTextFile(file, verb, io);
  return text === null ? null : parseDeckText(text, file);
}

/** The deck file's errors, one per line, and a closing line "<file>: deck not loaded". */
export function deckErrorsText(file: string, errors: readonly DeckFileError[], closing = 'deck not loaded'): string {
  return `${errors.map((e) => e.message).join('\n')}\n${file}: ${closing}\n`;
}
