/**
 * Two-dimensional lookup tables z(x, y) on a regular (rectangular) grid,
 * bilinear, with the same out-of-range policies as table1d.ts. `z[i][j]` is
 * the value at `x[i]`, `y[j]`. Each axis follows the 1-D rules: one point is
 * constant along that axis, a strictly decreasing axis is stored reversed,
 * any other order is refused. Out-of-range answers say which axis and side.
 */
import { err, ok, type Result } from './result';
import {
  checkAxis,
  doubleCopy,
  lerp,
  locate,
  overflowCheck,
  rangeCheck,
  type OutOfRangePolicy,
  type OutsideSide,
  type TableError,
  type TableRangeError,
} from './table1d';

export interface Table2d {
  readonly name: string;
  /** Row axis (strictly increasing). */
  readonly x: readonly number[];
  /** Column axis (strictly increasing). */
  readonly y: readonly number[];
  /** z[i][j] at (x[i], y[j]). */
  readonly z: readonly (readonly number[])[];
}

export interface Interp2dValue {
  readonly value: number;
  readonly outsideX: OutsideSide;
  readonly outsideY: OutsideSide;
}

export type Interp2dResult = Result<Interp2dValue, TableRangeError>;

/**
 * Builds a 2-D table. `z` must have `x.length` rows of `y.length` finite
 * values. Errors name the table, the row/column and the value.
 */
export function makeTable2d(
  x: readonly number[],
  y: readonly number[],
  z: readonly (readonly number[])[],
  name: string,
): Result<Table2d, TableError> {
  const ax = checkAxis(x, name, 'x');
  if (!ax.ok) return ax;
  const ay = checkAxis(y, name, 'y');
  if (!ay.ok) return ay;
  if (z.length !== x.length) {
    return err({
      code: 'length_mismatch',
      table: name,
      field: 'z',
      message: `table "${name}": x has ${x.length} points but z has ${z.length} rows`,
    });
  }
  for (let i = 0; i < z.length; i++) {
    const row = z[i]!;
    if (row.length !== y.length) {
      return err({
        code: 'length_mismatch',
        table: name,
        field: `z[${i}]`,
        message: `table "${name}": y has ${y.length} points but z[${i}] has ${row.length} values`,
      });
    }
    for (let j = 0; j < row.length; j++) {
      if (!Number.isFinite(row[j])) {
        return err({
          code: 'not_finite',
          table: name,
          field: `z[${i}]`,
          index: j,
          value: row[j]!,
          message: `table "${name}": z[${i}][${j}] is ${String(row[j])}, expected a finite number`,
        });
      }
    }
  }
  let rows = z.map((r) => (ay.value.reversed ? doubleCopy(r).reverse() : doubleCopy(r)));
  if (ax.value.reversed) rows = rows.reverse();
  return ok({ name, x: ax.value.values, y: ay.value.values, z: rows });
}

/** Position along one axis: lower index, weight of the upper node, side left. */
function axisWeight(
  axis: readonly number[],
  q: number,
  policy: OutOfRangePolicy,
): { readonly i: number; readonly t: number; readonly outside: OutsideSide } {
  if (axis.length === 1) return { i: 0, t: 0, outside: null };
  const { i, outside } = locate(axis, q);
  if (outside !== null && policy === 'clamp') {
    return { i, t: outside === 'below' ? 0 : 1, outside };
  }
  return { i, t: (q - axis[i]!) / (axis[i + 1]! - axis[i]!), outside };
}

/**
 * Bilinear interpolation of `table` at (x, y). 'refuse' errors when either
 * coordinate is outside its axis; 'clamp' holds the edge; 'extrapolate'
 * continues the edge cell's bilinear surface. A non-finite coordinate is a
 * `not_finite_query` error under every policy.
 */
export function interp2d(table: Table2d, x: number, y: number, policy: OutOfRangePolicy): Interp2dResult {
  const badX = rangeCheck(table.x, x, table.name, 'x', policy);
  if (badX) return err(badX);
  const badY = rangeCheck(table.y, y, table.name, 'y', policy);
  if (badY) return err(badY);
  const wx = axisWeight(table.x, x, policy);
  const wy = axisWeight(table.y, y, policy);
  const i1 = table.x.length === 1 ? 0 : wx.i + 1;
  const j1 = table.y.length === 1 ? 0 : wy.i + 1;
  const z = table.z;
  const z00 = z[wx.i]![wy.i]!;
  const z01 = z[wx.i]![j1]!;
  const z10 = z[i1]![wy.i]!;
  const z11 = z[i1]![j1]!;
  const value = lerp(lerp(z00, z01, wy.t), lerp(z10, z11, wy.t), wx.t);
  const bad = overflowCheck(value, table.name, wx.outside === null ? 'y' : 'x', wx.outside === null ? y : x, wx.outside === null ? table.y : table.x);
  if (bad) return err(bad);
  return ok({ value, outsideX: wx.outside, outsideY: wy.outside });
}
