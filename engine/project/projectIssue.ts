/**
 * One problem with a project file: where (JSON path), the value found, what
 * was expected, and a readable sentence that says all three.
 */
import type { z } from 'zod';
import { escapeControls } from '../propulsion/deckFileError';
import { messageText, type MessageParts } from '../units/messageParts';

export interface ProjectIssue {
  /** JSON path such as `mission.legs[3].toAltitude`; `(file)` for the whole document. */
  readonly path: string;
  /** The offending value as written (JSON text, shortened), or `(missing)`. */
  readonly value: string;
  readonly expected: string;
  /** One sentence naming the path, the value and what was expected. */
  readonly message: string;
  /** The reason alone (no path) with its numbers as quantities, for display in the reader's units. */
  readonly reasonParts?: MessageParts;
}

export type JsonPath = readonly PropertyKey[];

/** `["mission", "legs", 3, "toAltitude"]` -> `mission.legs[3].toAltitude`. */
export function formatJsonPath(path: JsonPath): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out === '' ? '(file)' : out;
}

/** The value at a path of a parsed JSON document, or undefined. */
export function valueAtPath(doc: unknown, path: JsonPath): unknown {
  let node: unknown = doc;
  for (const key of path) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<PropertyKey, unknown>)[key];
  }
  return node;
}

/** A value as it reads in the file, shortened to about 60 characters. */
export function showValue(value: unknown): string {
  if (value === undefined) return '(missing)';
  let text: string;
  if (typeof value === 'number' && !Number.isFinite(value)) text = String(value);
  else {
    try {
      text = JSON.stringify(value) ?? String(value);
    } catch {
      // Nesting deeper than JSON.stringify's stack (a corrupt or hostile file): show only the container kind.
      text = Array.isArray(value) ? '[...]' : '{...}';
    }
  }
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}

/**
 * Builds an issue whose message reads `path: reason` (control characters from the file escaped as \uXXXX; values
 * from the file come shortened to 60 characters by showValue). A reason given as message parts keeps its quantities
 * for display in other units.
 */
export function makeIssue(path: string, value: string, expected: string, reason: string | MessageParts): ProjectIssue {
  if (typeof reason === 'string') return { path, value, expected, message: escapeControls(`${path}: ${reason}`) };
  const reasonParts = reason.map((p) => (typeof p === 'string' ? escapeControls(p) : p));
  return { path, value, expected, message: `${escapeControls(path)}: ${messageText(reasonParts, 'both')}`, reasonParts };
}

const TYPE_NAMES: Readonly<Record<string, string>> = {
  int: 'a whole number',
  number: 'a number',
  string: 'a text string',
  boolean: 'true or false',
  object: 'an object',
  array: 'a list (JSON array)',
  null: 'null',
};

function typeName(expected: string): string {
  return TYPE_NAMES[expected] ?? `a ${expected}`;
}

function expectedFromParams(issue: z.core.$ZodIssue): string | undefined {
  const params = (issue as { params?: { expected?: unknown } }).params;
  return typeof params?.expected === 'string' ? params.expected : undefined;
}

function describeBranch(issue: z.core.$ZodIssue): string {
  const fromParams = expectedFromParams(issue);
  if (fromParams) return fromParams;
  if (issue.code === 'invalid_value') return issue.values.map((v) => JSON.stringify(v)).join(' or ');
  if (issue.code === 'invalid_type') return typeName(issue.expected);
  return issue.message;
}

/** Converts zod issues on `doc` to project issues with paths, values and expectations. */
export function fromZodIssues(issues: readonly z.core.$ZodIssue[], doc: unknown): ProjectIssue[] {
  const out: ProjectIssue[] = [];
  for (const issue of issues) {
    const path = formatJsonPath(issue.path);
    const raw = valueAtPath(doc, issue.path);
    const value = showValue(raw);
    switch (issue.code) {
      case 'custom': {
        const expected = expectedFromParams(issue) ?? issue.message;
        const parts = (issue as { params?: { parts?: MessageParts } }).params?.parts;
        // The file's own text stays in the message; the parts let a screen show the value in its units.
        const made = makeIssue(path, value, expected, issue.message);
        out.push(parts === undefined ? made : { ...made, reasonParts: parts });
        break;
      }
      case 'invalid_type': {
        const expected = typeName(issue.expected);
        const reason = raw === undefined ? `missing; expected ${expected}` : `${value} is not ${expected}`;
        out.push(makeIssue(path, value, expected, reason));
        break;
      }
      case 'invalid_value': {
        const expected = issue.values.map((v) => JSON.stringify(v)).join(', ');
        const reason =
          raw === undefined
            ? `missing; expected ${issue.values.length > 1 ? 'one of ' : ''}${expected}`
            : `${value} is not ${issue.values.length > 1 ? 'one of ' : ''}${expected}`;
        out.push(makeIssue(path, value, expected, reason));
        break;
      }
      case 'unrecognized_keys': {
        for (const key of issue.keys) {
          const keyPath = formatJsonPath([...issue.path, key]);
          out.push(makeIssue(keyPath, showValue(valueAtPath(doc, [...issue.path, key])), 'no such field', `unknown field "${key}" (check the spelling; see docs/project-format.md)`));
        }
        break;
      }
      case 'invalid_union': {
        const note = (issue as { note?: string; options?: readonly unknown[]; discriminator?: string }).note;
        const options = (issue as { options?: readonly unknown[] }).options;
        if (options && note) {
          const expected = options.map((o) => JSON.stringify(o)).join(', ');
          const reason =
            raw === undefined ? `missing; expected one of ${expected}` : `${value} is not one of ${expected}`;
          out.push(makeIssue(path, value, expected, reason));
          break;
        }
        const branches = issue.errors.map((branch) => branch[0]).filter((b): b is z.core.$ZodIssue => b !== undefined);
        const expected = branches.map(describeBranch).join(' or ');
        const specific = branches.find((b) => b.code === 'custom' && b.path.length === 0 && raw !== undefined);
        const reason = specific
          ? `${specific.message} (or ${branches.filter((b) => b !== specific).map(describeBranch).join(' or ')})`
          : raw === undefined
            ? `missing; expected ${expected}`
            : `${value} is not ${expected}`;
        out.push(makeIssue(path, value, expected, reason));
        break;
      }
      case 'too_small':
      case 'too_big': {
        const bound = issue.code === 'too_small' ? `at least ${String(issue.minimum)}` : `at most ${String(issue.maximum)}`;
        const expected = issue.origin === 'array' ? `${bound} items` : bound;
        const reason = issue.message.startsWith('expected') ? `${value}: ${issue.message}` : `${value} is out of range; expected ${expected}`;
        out.push(makeIssue(path, value, expected, reason));
        break;
      }
      default: {
        out.push(makeIssue(path, value, issue.message, `${value}: ${issue.message}`));
      }
    }
  }
  return out;
}
