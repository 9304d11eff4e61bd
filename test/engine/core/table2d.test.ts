import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { interp2d, makeTable2d, type Table2d } from '../../../engine/core/table2d';
import { expectClose } from '../../support/assertInDelta';
import { dragPolarReference as ref } from '../../reference/dragPolarReference';

function grid(): Table2d {
  return expectOk(makeTable2d(ref.bilinear.x, ref.bilinear.y, ref.bilinear.z, 'wave'), 'reference grid');
}

describe('makeTable2d', () => {
  it('makeTable2d refuses a row count that does not match x', () => {
    const r = makeTable2d([0, 1], [0, 1], [[1, 2]], 'wave');
    expect(r.ok ? null : r.error).toMatchObject({ code: 'length_mismatch', table: 'wave', field: 'z' });
  });

  it('makeTable2d refuses a short row, naming the row', () => {
    const r = makeTable2d([0, 1], [0, 1], [[1, 2], [3]], 'wave');
    expect(r.ok ? null : r.error).toMatchObject({ code: 'length_mismatch', field: 'z[1]' });
  });

  it('makeTable2d refuses NaN in z, naming row and column', () => {
    const r = makeTable2d([0, 1], [0, 1], [[1, 2], [3, Number.NaN]], 'wave');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error).toMatchObject({ code: 'not_finite', field: 'z[1]', index: 1 });
      expect(r.error.message).toContain('z[1][1]');
    }
  });

  it('makeTable2d refuses an out-of-order y axis', () => {
    const r = makeTable2d([0, 1], [0, 0.5, 0.2], [[1, 2, 3], [4, 5, 6]], 'wave');
    expect(r.ok ? null : r.error).toMatchObject({ code: 'not_increasing', field: 'y', index: 2 });
  });

  it('makeTable2d accepts decreasing axes and reverses rows and columns', () => {
    const t = expectOk(makeTable2d([1, 0], [1, 0], [[4, 3], [2, 1]], 'flip'), 'flipped');
    expect(t.x).toEqual([0, 1]);
    expect(t.y).toEqual([0, 1]);
    expect(t.z).toEqual([[1, 2], [3, 4]]);
  });
});

describe('interp2d', () => {
  it('interp2d is exact at every node', () => {
    const t = grid();
    ref.bilinear.x.forEach((x, i) =>
      ref.bilinear.y.forEach((y, j) => expect(expectOk(interp2d(t, x, y, 'refuse'), 'node').value).toBe(ref.bilinear.z[i]![j])),
    );
  });

  it('interp2d agrees with scipy RegularGridInterpolator inside and when extrapolating', () => {
    // Reference: scipy.interpolate.RegularGridInterpolator(method="linear", fill_value=None),
    // test/reference/dragPolarReference.py.
    const t = grid();
    ref.bilinear.q.forEach(([x, y], k) => {
      const r = expectOk(interp2d(t, x!, y!, 'extrapolate'), `at ${x}, ${y}`);
      expectClose(r.value, ref.bilinear.v[k]!, { abs: 1e-15, rel: 1e-12 }, 'scipy RegularGridInterpolator');
    });
  });

  it('interp2d with extrapolate flags the axis and side it left', () => {
    const r = expectOk(interp2d(grid(), 0.9, 0.45, 'extrapolate'), 'above in x');
    expect([r.outsideX, r.outsideY]).toEqual(['above', null]);
    const s = expectOk(interp2d(grid(), 0.4, 0.7, 'extrapolate'), 'below x, above y');
    expect([s.outsideX, s.outsideY]).toEqual(['below', 'above']);
  });

  it('interp2d with clamp holds the edge: equals the 1-D edge interpolation', () => {
    // At x beyond 0.85 the value is the x = 0.85 row interpolated in y (hand computation).
    const r = expectOk(interp2d(grid(), 0.95, 0.45, 'clamp'), 'clamped');
    expectClose(r.value, 0.004 + 0.5 * (0.008 - 0.004), { abs: 1e-15 }, 'edge row, hand computation');
    expect(r.outsideX).toBe('above');
    const corner = expectOk(interp2d(grid(), 0.1, -3, 'clamp'), 'corner');
    expect(corner).toEqual({ value: 0, outsideX: 'below', outsideY: 'below' });
  });

  it('interp2d with refuse names the axis it left', () => {
    const r = interp2d(grid(), 0.6, 0.9, 'refuse');
    expect(r.ok ? null : r.error).toMatchObject({ code: 'outside_table', axis: 'y', query: 0.9, min: 0, max: 0.6 });
  });

  it('interp2d refuses NaN coordinates under every policy', () => {
    for (const policy of ['refuse', 'clamp', 'extrapolate'] as const) {
      const a = interp2d(grid(), Number.NaN, 0.3, policy);
      const b = interp2d(grid(), 0.7, Number.NaN, policy);
      expect(a.ok ? null : a.error.code).toBe('not_finite_query');
      expect(b.ok ? null : b.error.code).toBe('not_finite_query');
    }
  });

  it('interp2d with a single-point axis is constant along it', () => {
    const t = expectOk(makeTable2d([0.8], [0, 1], [[2, 4]], 'one row'), 'one row');
    const r = expectOk(interp2d(t, 0.3, 0.25, 'refuse'), 'any x');
    expect(r).toEqual({ value: 2.5, outsideX: null, outsideY: null });
    const single = expectOk(makeTable2d([1], [2], [[7]], 'one point'), 'one point');
    expect(expectOk(interp2d(single, -9, 9, 'refuse'), 'constant').value).toBe(7);
  });

  it('interp2d never answers NaN or infinity, for any finite grid and query (property)', () => {
    // "No NaN ever" (project rule): an answer is finite or an error value.
    const finite = fc.double({ noNaN: true, noDefaultInfinity: true });
    const axis = fc.uniqueArray(finite, { minLength: 1, maxLength: 4 }).map((a) => a.sort((p, q) => p - q));
    const grid = fc
      .tuple(axis, axis)
      .chain(([xs, ys]) =>
        fc.tuple(
          fc.constant(xs),
          fc.constant(ys),
          fc.array(fc.array(finite, { minLength: ys.length, maxLength: ys.length }), { minLength: xs.length, maxLength: xs.length }),
        ),
      );
    fc.assert(
      fc.property(grid, finite, finite, fc.constantFrom('refuse', 'clamp', 'extrapolate'), ([xs, ys, zs], qx, qy, policy) => {
        const built = makeTable2d(xs, ys, zs, 'wild');
        if (!built.ok) return built.error.code === 'not_increasing';
        const r = interp2d(built.value, qx, qy, policy);
        return r.ok ? Number.isFinite(r.value.value) : r.error.message.length > 0;
      }),
    );
  });

  it('interp2d stays within the four corner values inside a cell (property)', () => {
    // Bilinear interpolation is a convex combination of the cell corners (definition).
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 0.85, noNaN: true }), fc.double({ min: 0, max: 0.6, noNaN: true }), (x, y) => {
        const r = expectOk(interp2d(grid(), x, y, 'refuse'), 'inside');
        const { x: gx, y: gy, z } = ref.bilinear;
        const cell = (axis: readonly number[], q: number) => Math.min(axis.filter((v) => v <= q).length - 1, axis.length - 2);
        const i = cell(gx, x);
        const j = cell(gy, y);
        const corners = [z[i]![j]!, z[i]![j + 1]!, z[i + 1]![j]!, z[i + 1]![j + 1]!];
        return r.value >= Math.min(...corners) - 1e-18 && r.value <= Math.max(...corners) + 1e-18;
      }),
    );
  });
});
