/**
 * A field of a project file named by its JSON path, as a person writes it:
 * `mission.solve.range`, `polar.cdIncrement`, `mission.legs[3].speed.mach`,
 * or a list element by its `name` field: `mission.legs[Cruise].speed.mach`,
 * `inlets[short].weight`. Reading and replacing such a field on the parsed
 * JSON document (before the schema), so a study can vary any field the file
 * has. Pure: the document is never modified; a copy is made along the path.
 */
import { err, ok, type Result } from '../core/result';
import { formatJsonPath, type JsonPath } from './projectIssue';

/** Why a field path does not name a field of the document, with the part that fails. */
export interface FieldPathError {
  readonly code: 'bad_syntax' | 'no_such_field' | 'not_a_value';
  readonly message: string;
}

type Step = { readonly key: string } | { readonly index: number } | { readonly name: string };

/** Splits `a.b[3].c` / `a[name].c` into steps; null when the text is not a path. */
function parseSteps(text: string): Step[] | null {
  const steps: Step[] = [];
  const re = /\.?([A-Za-z_$][\w$]*)|\[([^\]]+)\]/gy;
  let at = 0;
  while (at < text.length) {
    re.lastIndex = at;
    const m = re.exec(text);
    if (m === null || (steps.length === 0 && m[0].startsWith('.'))) return null;
    if (m[1] !== undefined) steps.push({ key: m[1] });
    else {
      const inner = m[2]!.trim();
      steps.push(/^\d+$/.test(inner) ? { index: Number(inner) } : { name: inner.replace(/^["']|["']$/g, '') });
    }
    at = re.lastIndex;
  }
  return steps.length > 0 ? steps : null;
}

/**
 * Resolves `text` against `doc` to a JSON path of keys and list indices and
 * the value found there (a number, string or boolean: the fields a study
 * varies). The error names the first part of the path that does not exist.
 */
export function resolveFieldPath(doc: unknown, text: string): Result<{ readonly path: JsonPath; readonly value: number | string | boolean }, FieldPathError> {
  const steps = parseSteps(text.trim());
  if (steps === null) {
    return err({ code: 'bad_syntax', message: `"${text}" is not a field path (write it like mission.solve.range or mission.legs[2].speed.mach)` });
  }
  const path: PropertyKey[] = [];
  let node: unknown = doc;
  for (const step of steps) {
    const where = path.length === 0 ? 'the project' : formatJsonPath(path);
    if ('key' in step) {
      if (node === null || typeof node !== 'object' || Array.isArray(node) || !Object.hasOwn(node, step.key)) {
        const keys = node !== null && typeof node === 'object' && !Array.isArray(node) ? Object.keys(node) : [];
        const has = keys.length > 0 ? `; it has ${keys.join(', ')}` : '';
        return err({ code: 'no_such_field', message: `${where} has no field "${step.key}"${has}` });
      }
      path.push(step.key);
      node = (node as Record<string, unknown>)[step.key];
    } else if ('index' in step) {
      if (!Array.isArray(node) || step.index >= node.length) {
        const size = Array.isArray(node) ? `it has ${node.length} entries, [0] to [${node.length - 1}]` : 'it is not a list';
        return err({ code: 'no_such_field', message: `${where} has no entry [${step.index}]: ${size}` });
      }
      path.push(step.index);
      node = node[step.index];
    } else {
      const list = Array.isArray(node) ? (node as unknown[]) : null;
      const index = list === null ? -1 : list.findIndex((e) => e !== null && typeof e === 'object' && (e as { name?: unknown }).name === step.name);
      if (list === null || index < 0) {
        const names = list === null ? [] : list.map((e) => (e !== null && typeof e === 'object' ? (e as { name?: unknown }).name : undefined)).filter((n) => typeof n === 'string');
        const has = names.length > 0 ? `; names: ${names.map((n) => JSON.stringify(n)).join(', ')}` : '';
        return err({ code: 'no_such_field', message: `${where} has no entry named "${step.name}"${has}` });
      }
      path.push(index);
      node = list[index];
    }
  }
  if (typeof node !== 'number' && typeof node !== 'string' && typeof node !== 'boolean') {
    return err({ code: 'not_a_value', message: `${formatJsonPath(path)} is ${Array.isArray(node) ? 'a list' : 'a group of fields'}, not a value; name one of its fields` });
  }
  return ok({ path, value: node });
}

/** A copy of `doc` with the value at `path` (as resolveFieldPath returns it) replaced by `value`; the rest is shared, not copied. */
export function withFieldAt(doc: unknown, path: JsonPath, value: unknown): unknown {
  if (path.length === 0) return value;
  const [head, ...rest] = path;
  if (Array.isArray(doc)) {
    const copy = doc.slice();
    copy[head as number] = withFieldAt(doc[head as number], rest, value);
    return copy;
  }
  const record = (doc ?? {}) as Record<PropertyKey, unknown>;
  return { ...record, [head as PropertyKey]: withFieldAt(record[head as PropertyKey], rest, value) };
}
