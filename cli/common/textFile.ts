/**
 * Reading the files a verb names on its command line (decks, inlet design
 * files), relative to the working folder; a file that cannot be read is
 * reported on stderr with the verb and the reason.
 */
import { resolve } from 'node:path';
import type { Result } from '../../engine/core';
import type { DeckFileError, EngineDeck } from '../../engine/propulsion';
import { cannotReadMessage, parseDeckText } from '../../engine/study';
import { readTextFileSync } from '../../hostio/textFile';
import type { CliIo } from '../verb';

/**
 * The file's text through the one safe reader (hostio/textFile.ts: regular files only, 32 MiB, UTF-8, BOM
 * stripped), or null after printing "blockwise <verb>: cannot read "<file>": <reason>" on stderr.
 */
export function readTextFile(file: string, verb: string, io: CliIo): string | null {
  const read = readTextFileSync(resolve(io.cwd, file));
  if (read.ok) return read.value.text;
  io.err(`blockwise ${verb}: ${cannotReadMessage(file, read.error.reason)}\n`);
  return null;
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

/** A deck file read and parsed, or null after printing why not: the reader's line, or each deck error and "<file>: deck not loaded". */
export function loadDeckFile(file: string, verb: string, io: CliIo): EngineDeck | null {
  const read = readDeckFile(file, verb, io);
  if (read === null) return null;
  if (read.ok) return read.value;
  io.err(deckErrorsText(file, read.error));
  return null;
}
