/** Paths into the project document (JSON paths as arrays) and their text form. */
import { formatJsonPath } from '../../engine/project';

export type DocPath = readonly (string | number)[];

/** `['mission', 'legs', 2, 'time']` -> `mission.legs[2].time` (the form ProjectIssue paths use). */
export function pathText(path: DocPath): string {
  return formatJsonPath(path);
}

/** The value at `path`, or undefined. */
export function readAt(doc: unknown, path: DocPath): unknown {
  let node: unknown = doc;
  for (const key of path) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string | number, unknown>)[key];
  }
  return node;
}

/**
 * Sets (or with `undefined`, deletes) the value at `path` inside an immer
 * draft. Throws for a path whose parent does not exist (a caller bug).
 */
export function writeAtMutating(draft: unknown, path: DocPath, value: unknown): void {
  if (path.length === 0) throw new Error('writeAtMutating: empty path');
  const parent = readAt(draft, path.slice(0, -1));
  if (parent === null || typeof parent !== 'object') throw new Error(`writeAtMutating: no parent object at ${pathText(path)}`);
  const key = path[path.length - 1]!;
  const target = parent as Record<string | number, unknown>;
  if (value === undefined) delete target[key];
  else target[key] = value;
}
