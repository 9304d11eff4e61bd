/**
 * JSON text with syntax errors located by line and column. JSON.parse in
 * Node 20 does not say where it failed, so on failure a small scanner that
 * follows RFC 8259's grammar finds the first offending character.
 */
import { err, ok, type Result } from '../core/result';

export interface JsonSyntaxError {
  readonly code: 'empty' | 'json_syntax';
  /** 1-based line and column of the first offending character (column counts UTF-16 units). */
  readonly line: number;
  readonly column: number;
  readonly message: string;
}

/** Parses JSON text; a failure names the line, column and what was found there (RFC 8259 grammar). */
export function parseJsonText(text: string): Result<unknown, JsonSyntaxError> {
  if (text.trim() === '') {
    return err({ code: 'empty', line: 1, column: 1, message: 'the file is empty (expected a JSON object)' });
  }
  try {
    return ok(JSON.parse(text) as unknown);
  } catch {
    const failure = locateJsonError(text);
    const { line, column } = lineAndColumn(text, failure.offset);
    return err({ code: 'json_syntax', line, column, message: `line ${line}, column ${column}: ${failure.reason}` });
  }
}

/** 1-based line and column of a character offset. */
export function lineAndColumn(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  const end = Math.min(offset, text.length);
  for (let i = 0; i < end; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      lineStart = i + 1;
    }
  }
  return { line, column: end - lineStart + 1 };
}

interface Failure {
  readonly offset: number;
  readonly reason: string;
}

class JsonScanFailure extends Error {
  constructor(readonly failure: Failure) {
    super(failure.reason);
  }
}

function describeAt(text: string, i: number): string {
  if (i >= text.length) return 'the end of the file';
  const c = text[i]!;
  // JSON.stringify escapes control characters, so a binary file does not print raw bytes.
  return c === '\n' ? 'a line break' : JSON.stringify(c);
}

/** Finds the offset of the first syntax error; the text is known not to parse. */
function locateJsonError(text: string): Failure {
  let i = 0;
  const fail = (expected: string): never => {
    throw new JsonScanFailure({ offset: i, reason: `expected ${expected}, found ${describeAt(text, i)}` });
  };
  const skipSpace = (): void => {
    while (i < text.length && ' \t\n\r'.includes(text[i] as string)) i++;
  };
  const literal = (word: string): void => {
    if (text.startsWith(word, i)) i += word.length;
    else fail('a value (object, array, string, number, true, false or null)');
  };
  const string = (): void => {
    if (text[i] !== '"') fail('a string in double quotes');
    i++;
    for (;;) {
      if (i >= text.length) fail('a closing double quote');
      const c = text.charCodeAt(i);
      if (c === 34) {
        i++;
        return;
      }
      if (c < 32) fail('a closing double quote (a control character or line break cannot be inside a string)');
      if (c === 92) {
        i++;
        const e = text[i];
        if (e === 'u') {
          i++;
          for (let k = 0; k < 4; k++) {
            if (!/[0-9a-fA-F]/.test(text[i] ?? '')) fail('four hex digits after \\u');
            i++;
          }
        } else if (e !== undefined && '"\\/bfnrt'.includes(e)) {
          i++;
        } else {
          fail('a valid escape after a backslash');
        }
      } else {
        i++;
      }
    }
  };
  const digits = (): void => {
    if (!/[0-9]/.test(text[i] ?? '')) fail('a digit');
    while (/[0-9]/.test(text[i] ?? '')) i++;
  };
  const number = (): void => {
    if (text[i] === '-') i++;
    if (text[i] === '0') i++;
    else digits();
    if (text[i] === '.') {
      i++;
      digits();
    }
    if (text[i] === 'e' || text[i] === 'E') {
      i++;
      if (text[i] === '+' || text[i] === '-') i++;
      digits();
    }
  };
  const value = (depth: number): void => {
    if (depth > 512) fail('less deeply nested data');
    skipSpace();
    const c = text[i];
    if (c === '{') {
      i++;
      skipSpace();
      if (text[i] === '}') {
        i++;
        return;
      }
      for (;;) {
        skipSpace();
        if (text[i] !== '"') fail('a property name in double quotes');
        string();
        skipSpace();
        if (text[i] !== ':') fail('":" after the property name');
        i++;
        value(depth + 1);
        skipSpace();
        if (text[i] === ',') {
          i++;
          continue;
        }
        if (text[i] === '}') {
          i++;
          return;
        }
        fail('"," or "}"');
      }
    } else if (c === '[') {
      i++;
      skipSpace();
      if (text[i] === ']') {
        i++;
        return;
      }
      for (;;) {
        value(depth + 1);
        skipSpace();
        if (text[i] === ',') {
          i++;
          continue;
        }
        if (text[i] === ']') {
          i++;
          return;
        }
        fail('"," or "]"');
      }
    } else if (c === '"') {
      string();
    } else if (c === 't') {
      literal('true');
    } else if (c === 'f') {
      literal('false');
    } else if (c === 'n') {
      literal('null');
    } else if (c === '-' || /[0-9]/.test(c ?? '')) {
      number();
    } else {
      fail('a value (object, array, string, number, true, false or null)');
    }
  };
  try {
    value(0);
    skipSpace();
    if (i < text.length) fail('the end of the file after the top-level value');
  } catch (e) {
    if (e instanceof JsonScanFailure) return e.failure;
    throw e;
  }
  // The scanner accepted what JSON.parse refused: a bug in the scanner.
  return { offset: 0, reason: 'the JSON could not be parsed' };
}
