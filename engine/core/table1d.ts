/**
 * One-dimensional lookup tables y(x) with a stated out-of-range policy
 * (docs/style.md §9). Linear interpolation by default; monotone piecewise-cubic
 * Hermite (Fritsch & Carlson, 1980, SIAM J. Numer. Anal. 17(2)) on request.
 *
 * Decisions pinned by test/engine/core/table1d.test.ts:
 * - a single-point table is a constant: every finite query returns its one
 *   value with `outside: null`, under every policy;
 * - a strictly decreasing axis is accepted and stored reversed (with its
 *   values); an axis with a repeated value or mixed order is refused, naming
 *   the first offending index;
 * - NaN or infinite axis values, table values or queries are refused, and so
 *   is a table whose slope between two nodes overflows;
 * - extrapolation is linear: the end segment's secant for 'linear', the end
 *   node's Hermite slope for 'monotoneCubic' (so the curve stays C1);
 * - an answer beyond the floating-point range (a far extrapolation of a steep
 *   table) is a `value_overflow` error, never Infinity or NaN.
 */
import { err, ok, type Result } from './result';

/** What a lookup does outside the axis range. */
export type OutOfRangePolicy = 'refuse' | 'clamp' | 'extrapolate';

export type InterpolationMethod = 'linear' | 'monotoneCubic';

export interface Table1d {
  readonly name: string;
  /** Strictly increasing axis. */
  readonly x: readonly number[];
  readonly y: readonly number[];
  readonly method: InterpolationMethod;
  /** Node derivatives dy/dx for 'monotoneCubic' (empty for 'linear'). */
  readonly slopes: readonly number[];
}

export type TableErrorCode =
  | 'empty'
  | 'length_mismatch'
  | 'not_finite'
  | 'not_increasing';

/** A table that cannot be built: names the table, the index and the value. */
export interface TableError {
  readonly code: TableErrorCode;
  readonly table: string;
  /** Which array or axis is at fault, e.g. 'x', 'y', 'z[2]'. */
  readonly field: string;
  readonly index?: number;
  readonly value?: number;
  readonly message: string;
}

/** A lookup that cannot be answered (refused out of range, or a non-finite query). */
export interface TableRangeError {
  /** `value_overflow`: the answer (usually an extrapolation far outside) is beyond the floating-point range. */
  readonly code: 'outside_table' | 'not_finite_query' | 'value_overflow';
  readonly table: string;
  /** Axis name, 'x' for 1-D tables, 'x' or 'y' for 2-D. */
  readonly axis: string;
  readonly query: number;
  readonly min: number;
  readonly max: number;
  readonly message: string;
}

export type OutsideSide = 'below' | 'above' | null;

export interface Interp1dValue {
  readonly value: number;
  /** Which side of the axis the query left, null when inside. */
  readonly outside: OutsideSide;
}

export type Interp1dResult = Result<Interp1dValue, TableRangeError>;

/**
 * Checks an axis: finite, non-empty, strictly monotone. Returns the axis in
 * increasing order and whether it was reversed.
 */
export function checkAxis(
  axis: readonly number[],
  table: string,
  field: string,
): Result<{ readonly values: readonly number[]; readonly reversed: boolean }, TableError> {
  if (axis.length === 0) {
    return err({ code: 'empty', table, field, message: `table "${table}": ${field} has no points` });
  }
  for (let i = 0; i < axis.length; i++) {
    const v = axis[i]!;
    if (!Number.isFinite(v)) {
      return err({
        code: 'not_finite',
        table,
        field,
        index: i,
        value: v,
        message: `table "${table}": ${field}[${i}] is ${String(v)}, expected a finite number`,
      });
    }
  }
  if (axis.length === 1) return ok({ values: doubleCopy(axis), reversed: false });
  const decreasing = axis[1]! < axis[0]!;
  for (let i = 1; i < axis.length; i++) {
    const step = axis[i]! - axis[i - 1]!;
    if (decreasing ? step >= 0 : step <= 0) {
      return err({
        code: 'not_increasing',
        table,
        field,
        index: i,
        value: axis[i]!,
        message:
          `table "${table}": ${field}[${i}] = ${axis[i]} after ${axis[i - 1]}; ` +
          `the axis must be strictly increasing (or strictly decreasing throughout)`,
      });
    }
  }
  return ok({ values: decreasing ? doubleCopy(axis).reverse() : doubleCopy(axis), reversed: decreasing });
}

/**
 * A copy of `values` in an array that holds doubles whatever the values (an array of whole numbers holds small
 * integers, one with a fraction doubles): every table's arrays then have one kind, and the lookups' reads of them
 * stay monomorphic in a process that built tables of both kinds (common practice: V8's elements kinds).
 */
export function doubleCopy(values: readonly number[]): number[] {
  const out = [0.5];
  out.length = 0;
  for (let i = 0; i < values.length; i++) out.push(values[i]!);
  return out;
}

/** Fritsch–Carlson node slopes for monotone cubic Hermite interpolation. */
function fritschCarlsonSlopes(x: readonly number[], y: readonly number[]): number[] {
  const n = x.length;
  if (n < 2) return [0];
  const h: number[] = [];
  const delta: number[] = [];
  for (let i = 0; i < n - 1; i++) {
    h.push(x[i + 1]! - x[i]!);
    delta.push((y[i + 1]! - y[i]!) / h[i]!);
  }
  if (n === 2) return [delta[0]!, delta[0]!];
  const d: number[] = new Array<number>(n).fill(0);
  // Interior: weighted harmonic mean (Fritsch & Butland form, as in SciPy's PCHIP).
  for (let i = 1; i < n - 1; i++) {
    const a = delta[i - 1]!;
    const b = delta[i]!;
    if (a === 0 || b === 0 || Math.sign(a) !== Math.sign(b)) {
      d[i] = 0;
    } else {
      const w1 = 2 * h[i]! + h[i - 1]!;
      const w2 = h[i]! + 2 * h[i - 1]!;
      d[i] = (w1 + w2) / (w1 / a + w2 / b);
    }
  }
  d[0] = endSlope(h[0]!, h[1]!, delta[0]!, delta[1]!);
  d[n - 1] = endSlope(h[n - 2]!, h[n - 3]!, delta[n - 2]!, delta[n - 3]!);
  return d;
}

/** Shape-preserving three-point end slope (as in SciPy's PchipInterpolator). */
function endSlope(h0: number, h1: number, m0: number, m1: number): number {
  const d = ((2 * h0 + h1) * m0 - h0 * m1) / (h0 + h1);
  if (Math.sign(d) !== Math.sign(m0)) return 0;
  if (Math.sign(m0) !== Math.sign(m1) && Math.abs(d) > Math.abs(3 * m0)) return 3 * m0;
  return d;
}

/**
 * Builds a 1-D table from an axis `x` and values `y` of equal length (>= 1),
 * all finite. `name` appears in every error and out-of-range report.
 */
export function makeTable1d(
  x: readonly number[],
  y: readonly number[],
  name: string,
  method: InterpolationMethod = 'linear',
): Result<Table1d, TableError> {
  if (x.length !== y.length) {
    return err({
      code: 'length_mismatch',
      table: name,
      field: 'y',
      message: `table "${name}": x has ${x.length} points but y has ${y.length}`,
    });
  }
  for (let i = 0; i < y.length; i++) {
    if (!Number.isFinite(y[i])) {
      return err({
        code: 'not_finite',
        table: name,
        field: 'y',
        index: i,
        value: y[i]!,
        message: `table "${name}": y[${i}] is ${String(y[i])}, expected a finite number`,
      });
    }
  }
  const axis = checkAxis(x, name, 'x');
  if (!axis.ok) return axis;
  const xs = axis.value.values;
  const ys = axis.value.reversed ? doubleCopy(y).reverse() : doubleCopy(y);
  for (let i = 1; i < xs.length; i++) {
    if (!Number.isFinite((ys[i]! - ys[i - 1]!) / (xs[i]! - xs[i - 1]!))) {
      const at = axis.value.reversed ? xs.length - 1 - i : i;
      return err({
        code: 'not_finite',
        table: name,
        field: 'y',
        index: at,
        value: ys[i]!,
        message: `table "${name}": the slope from y[${axis.value.reversed ? at + 1 : at - 1}] to y[${at}] overflows the floating-point range`,
      });
    }
  }
  const slopes = method === 'monotoneCubic' ? fritschCarlsonSlopes(xs, ys) : [];
  return ok({ name, x: xs, y: ys, method, slopes });
}

/**
 * The lower node index (0..n-2) of the segment of an increasing axis of two
 * or more nodes holding `q`, for q within the axis (bisection; a query on a
 * node gets the segment that starts there, the last node the last segment).
 * No result object: hot paths call it.
 */
export function bisectAxis(axis: readonly number[], q: number): number {
  let lo = 0;
  let hi = axis.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (axis[mid]! <= q) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * Locates `q` on an increasing axis: the lower node index of the bracketing
 * segment (0..n-2) and which side the query left. Axes of one point give 0.
 */
export function locate(axis: readonly number[], q: number): { readonly i: number; readonly outside: OutsideSide } {
  const n = axis.length;
  if (n === 1) return { i: 0, outside: null };
  if (q < axis[0]!) return { i: 0, outside: 'below' };
  if (q > axis[n - 1]!) return { i: n - 2, outside: 'above' };
  return { i: bisectAxis(axis, q), outside: null };
}

/** The range error for a query, or null when the policy lets it through. */
export function rangeCheck(
  axis: readonly number[],
  q: number,
  table: string,
  axisName: string,
  policy: OutOfRangePolicy,
): TableRangeError | null {
  const min = axis[0]!;
  const max = axis[axis.length - 1]!;
  if (!Number.isFinite(q)) {
    return {
      code: 'not_finite_query',
      table,
      axis: axisName,
      query: q,
      min,
      max,
      message: `table "${table}": ${axisName} query is ${String(q)}, expected a finite number`,
    };
  }
  if (policy === 'refuse' && axis.length > 1 && (q < min || q > max)) {
    return {
      code: 'outside_table',
      table,
      axis: axisName,
      query: q,
      min,
      max,
      message: `table "${table}": ${axisName} = ${q} is outside ${min} to ${max}`,
    };
  }
  return null;
}

/**
 * `interp1d(table, x, 'clamp')`'s value without the result object, for hot
 * paths (the drag polar's lookups): the same arithmetic, so the same number.
 * `x` must be finite (the caller checks); NaN comes out for NaN in.
 */
export function clampedValue(table: Table1d, x: number): number {
  const xs = table.x;
  const ys = table.y;
  const n = xs.length;
  if (n === 1 || x <= xs[0]!) return ys[0]!;
  if (x >= xs[n - 1]!) return ys[n - 1]!;
  const i = bisectAxis(xs, x);
  const h = xs[i + 1]! - xs[i]!;
  const t = (x - xs[i]!) / h;
  if (t === 0) return ys[i]!;
  if (table.method === 'linear') return lerp(ys[i]!, ys[i + 1]!, t);
  const t2 = t * t;
  const t3 = t2 * t;
  return (2 * t3 - 3 * t2 + 1) * ys[i]! + (t3 - 2 * t2 + t) * h * table.slopes[i]! + (-2 * t3 + 3 * t2) * ys[i + 1]! + (t3 - t2) * h * table.slopes[i + 1]!;
}

/** True when `q` lies outside an increasing axis of two or more nodes (where a clamped lookup holds the end value, as locate says). */
export function outsideAxis(axis: readonly number[], q: number): boolean {
  return axis.length > 1 && (q < axis[0]! || q > axis[axis.length - 1]!);
}

/**
 * Interpolates `table` at `x`. 'refuse' returns an `outside_table` error
 * outside the axis; 'clamp' returns the end value; 'extrapolate' continues
 * linearly. Outside answers carry `outside: 'below' | 'above'`. A non-finite
 * query is a `not_finite_query` error under every policy; NaN never comes out.
 */
export function interp1d(table: Table1d, x: number, policy: OutOfRangePolicy): Interp1dResult {
  const bad = rangeCheck(table.x, x, table.name, 'x', policy);
  if (bad) return err(bad);
  const xs = table.x;
  const ys = table.y;
  const n = xs.length;
  if (n === 1) return ok({ value: ys[0]!, outside: null });
  const { i, outside } = locate(xs, x);
  if (outside !== null) {
    const end = outside === 'below' ? 0 : n - 1;
    if (policy === 'clamp') return ok({ value: ys[end]!, outside });
    if (table.method === 'monotoneCubic') {
      const slope = table.slopes[end]!;
      return answer(table, x, slope === 0 ? ys[end]! : ys[end]! + slope * (x - xs[end]!), outside);
    }
    return answer(table, x, lerp(ys[i]!, ys[i + 1]!, (x - xs[i]!) / (xs[i + 1]! - xs[i]!)), outside);
  }
  const h = xs[i + 1]! - xs[i]!;
  const t = (x - xs[i]!) / h;
  if (t === 0) return ok({ value: ys[i]!, outside: null });
  if (table.method === 'linear') {
    return answer(table, x, lerp(ys[i]!, ys[i + 1]!, t), null);
  }
  const t2 = t * t;
  const t3 = t2 * t;
  const h00 = 2 * t3 - 3 * t2 + 1;
  const h10 = t3 - 2 * t2 + t;
  const h01 = -2 * t3 + 3 * t2;
  const h11 = t3 - t2;
  const value = h00 * ys[i]! + h10 * h * table.slopes[i]! + h01 * ys[i + 1]! + h11 * h * table.slopes[i + 1]!;
  return answer(table, x, value, null);
}

/**
 * Straight line through a (t = 0) and b (t = 1): the two-weight form inside
 * [0, 1] (cannot overflow for finite a, b), a + t (b - a) outside, and a
 * flat line when a = b (so no infinity times zero).
 */
export function lerp(a: number, b: number, t: number): number {
  if (t >= 0 && t <= 1) return (1 - t) * a + t * b;
  return a === b ? a : a + t * (b - a);
}

/** The error for an answer that overflowed, or null when it is finite. */
export function overflowCheck(value: number, table: string, axis: string, query: number, axisValues: readonly number[]): TableRangeError | null {
  if (Number.isFinite(value)) return null;
  return {
    code: 'value_overflow',
    table,
    axis,
    query,
    min: axisValues[0]!,
    max: axisValues[axisValues.length - 1]!,
    message: `table "${table}": ${axis} = ${query} gives a value beyond the floating-point range`,
  };
}

function answer(table: Table1d, x: number, value: number, outside: OutsideSide): Interp1dResult {
  const bad = overflowCheck(value, table.name, 'x', x, table.x);
  return bad ? err(bad) : ok({ value, outside });
}

/** Smallest and largest axis value. */
export function tableRange(table: Table1d): { readonly min: number; readonly max: number } {
  return { min: table.x[0]!, max: table.x[table.x.length - 1]! };
}
