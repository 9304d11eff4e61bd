/**
 * The grid of a parameter study: each varied field of the project file
 * (named by its JSON path, projectFieldPath.ts) takes the values
 * from, from + step, ... up to `to`, in the unit written (or the field's own
 * when none is), and the grid is every combination, the last field varying
 * fastest. A shard i of n is a contiguous block of the grid's cases, so n
 * batch jobs cover the grid exactly once between them.
 */
import { err, ok, type Result } from '../core/result';
import { splitQuantity } from '../units/quantity';
import { resolveFieldPath, withFieldAt } from './projectFieldPath';
import type { JsonPath } from './projectIssue';

/** Most cases one study may hold. */
export const MAX_SWEEP_CASES = 10_000_000;

/** One varied field and its values, as they are written into the file (numbers, or quantity texts). */
export interface SweepAxis {
  /** The field as the person wrote it. */
  readonly field: string;
  readonly path: JsonPath;
  readonly values: readonly (number | string)[];
}

/** A bad study definition: which part and why. */
export interface SweepError {
  readonly where: string;
  readonly message: string;
}

/** Rounds float noise of from + i x step away (12 significant digits). */
function tidy(x: number): number {
  return Number(x.toPrecision(12));
}

/**
 * Reads one `field=from:to:step` definition against the project document
 * `doc` (the parsed JSON, before the schema): the field must exist and hold
 * a number or a quantity text; from, to and step are numbers in one unit
 * (a quantity field's values keep that unit, or the field's own unit).
 */
export function parseVary(doc: unknown, spec: string): Result<SweepAxis, SweepError> {
  const where = `--vary ${spec}`;
  const eq = spec.indexOf('=');
  if (eq <= 0) return err({ where, message: 'write it as <field>=<from>:<to>:<step>, e.g. mission.solve.range=1000nmi:3000nmi:250nmi' });
  const field = spec.slice(0, eq).trim();
  const parts = spec.slice(eq + 1).split(':');
  if (parts.length !== 3) return err({ where, message: `"${spec.slice(eq + 1)}" is not <from>:<to>:<step> (three values separated by ":")` });
  const resolved = resolveFieldPath(doc, field);
  if (!resolved.ok) return err({ where, message: resolved.error.message });
  const current = resolved.value.value;
  if (typeof current === 'boolean') return err({ where, message: `${field} is a yes/no field; only numbers and quantities can be varied` });
  const split = parts.map((p) => splitQuantity(p));
  const names = ['from', 'to', 'step'];
  for (let i = 0; i < 3; i++) {
    if (split[i] === null) return err({ where, message: `${names[i]} "${parts[i]!.trim()}" is not a number` });
  }
  const [from, to, step] = split as { value: number; unit: string }[];
  const units = [...new Set([from!.unit, to!.unit, step!.unit].filter((u) => u !== ''))];
  if (units.length > 1) return err({ where, message: `give from, to and step in one unit (got ${units.join(', ')})` });
  let unit = units[0] ?? '';
  if (typeof current === 'number' && unit !== '') {
    return err({ where, message: `${field} is a plain number in the file (now ${current}); give from, to and step without a unit` });
  }
  if (typeof current === 'string' && unit === '') unit = splitQuantity(current)?.unit ?? '';
  if (!(step!.value > 0)) return err({ where, message: `step "${parts[2]!.trim()}" must be greater than 0` });
  const span = to!.value - from!.value;
  if (span < 0) return err({ where, message: `to (${parts[1]!.trim()}) is below from (${parts[0]!.trim()}); the values go up from "from" by "step"` });
  const count = Math.floor(span / step!.value + 1e-9) + 1;
  if (count > MAX_SWEEP_CASES) return err({ where, message: `${count} values is more than ${MAX_SWEEP_CASES}; use a larger step` });
  const values: (number | string)[] = [];
  for (let i = 0; i < count; i++) {
    const v = tidy(from!.value + i * step!.value);
    values.push(typeof current === 'number' ? v : unit === '' ? String(v) : `${v} ${unit}`);
  }
  return ok({ field, path: resolved.value.path, values });
}

/** Number of cases of the grid (1 with no axes). */
export function gridSize(axes: readonly SweepAxis[]): number {
  return axes.reduce((n, a) => n * a.values.length, 1);
}

/** The values of case `k` (0-based) of the grid, one per axis; the last axis varies fastest. */
export function gridCase(axes: readonly SweepAxis[], k: number): (number | string)[] {
  const out = new Array<number | string>(axes.length);
  let rest = k;
  for (let i = axes.length - 1; i >= 0; i--) {
    const n = axes[i]!.values.length;
    out[i] = axes[i]!.values[rest % n]!;
    rest = Math.floor(rest / n);
  }
  return out;
}

/** The project document of one case: the base document with each axis's field set to the case's value. */
export function caseDocument(doc: unknown, axes: readonly SweepAxis[], values: readonly (number | string)[]): unknown {
  let out = doc;
  for (let i = 0; i < axes.length; i++) out = withFieldAt(out, axes[i]!.path, values[i]);
  return out;
}

/** Shard `index` of `count` (1-based), a contiguous block of cases. */
export interface Shard {
  readonly index: number;
  readonly count: number;
}

/** Reads `i/n` (1 <= i <= n). */
export function parseShard(text: string): Result<Shard, SweepError> {
  const m = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  const where = `--shard ${text}`;
  if (m === null) return err({ where, message: 'write it as i/n, e.g. 3/8 for the third of eight jobs' });
  const index = Number(m[1]);
  const count = Number(m[2]);
  if (!(count >= 1)) return err({ where, message: 'n must be at least 1' });
  if (!(index >= 1 && index <= count)) return err({ where, message: `i must be from 1 to ${count} (the shards are numbered from 1)` });
  return ok({ index, count });
}

/** The cases [start, end) of shard `shard` of a grid of `total` cases; the shards 1..n partition 0..total exactly. */
export function shardRange(total: number, shard: Shard): { readonly start: number; readonly end: number } {
  return {
    start: Math.floor(((shard.index - 1) * total) / shard.count),
    end: Math.floor((shard.index * total) / shard.count),
  };
}
