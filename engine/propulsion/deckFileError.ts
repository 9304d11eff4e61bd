/** Errors found in a deck file (CSV or JSON), each saying where and what. */

export type DeckFileErrorCode =
  | 'empty_file'
  | 'no_header'
  | 'no_data'
  | 'bad_column_header'
  | 'duplicate_column'
  | 'unknown_column'
  | 'missing_column'
  | 'unknown_unit'
  | 'wrong_unit_dimension'
  | 'ragged_row'
  | 'empty_cell'
  | 'not_a_number'
  | 'not_finite'
  | 'out_of_range'
  | 'negative_flow'
  | 'duplicate_point'
  | 'thrust_not_rising'
  | 'single_value_axis'
  | 'bad_metadata'
  | 'unknown_metadata'
  | 'duplicate_metadata'
  | 'bad_rating'
  | 'bad_json'
  | 'schema'
  | 'too_many_errors';

export interface DeckFileError {
  readonly code: DeckFileErrorCode;
  /** 1-based line in a CSV file; null for JSON and whole-file errors. */
  readonly line: number | null;
  /** Column header as written (CSV) or JSON path; null when not about one column. */
  readonly column: string | null;
  /** The offending text as written; null when there is none. */
  readonly value: string | null;
  /** What was expected there, in words. */
  readonly expected: string;
  /** One line: `<source> line <n>, column "<column>": <what>`. */
  readonly message: string;
}

/** Where in a file, as the message prefix: `demo.csv line 14, column "thrust[lbf]"` or `deck.json, points[3][1]`. */
export function deckFileWhere(source: string, line: number | null, column: string | null): string {
  const shown = column === null ? null : printable(column);
  if (line !== null) return `${source} line ${line}${shown !== null ? `, column "${shown}"` : ''}`;
  return shown !== null ? `${source}, ${shown}` : source;
}

/** Control characters escaped as \uXXXX, so a message about a binary file does not print raw bytes. */
export function escapeControls(text: string): string {
  let out = '';
  for (let i = 0; i < text.length; i++) {
    const code = text.charCodeAt(i);
    out += code < 0x20 || code === 0x7f ? `\\u${code.toString(16).padStart(4, '0')}` : text[i];
  }
  return out;
}

/** A column or path from the file as the message shows it: controls escaped, over 60 characters shortened. */
export function printable(text: string): string {
  const escaped = escapeControls(text);
  return escaped.length > 60 ? `${escaped.slice(0, 57)}...` : escaped;
}

/** Every quoted text of `message` longer than 60 characters shortened to 57 and "..." (a cell can hold a whole pasted file). */
export function shortenQuoted(message: string): string {
  return message.replace(/"([^"]{61,})"/g, (_m, inner: string) => `"${inner.slice(0, 57)}..."`);
}

/** One deck file error whose message is `<where>: <what>` (see deckFileWhere); quoted cells and the value cut to 60 characters. */
export function deckFileError(
  source: string,
  code: DeckFileErrorCode,
  line: number | null,
  column: string | null,
  value: string | null,
  expected: string,
  what: string,
): DeckFileError {
  const shownValue = value === null ? null : value.length > 60 ? `${value.slice(0, 57)}...` : value;
  return { code, line, column, value: shownValue, expected, message: `${deckFileWhere(source, line, column)}: ${shortenQuoted(escapeControls(what))}` };
}
