import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { interp1d, makeTable1d, tableRange, type Table1d } from '../../../engine/core/table1d';
import { expectClose } from '../../support/assertInDelta';
import { dragPolarReference as ref } from '../../reference/dragPolarReference';

function table(x: readonly number[], y: readonly number[], method: 'linear' | 'monotoneCubic' = 'linear'): Table1d {
  return expectOk(makeTable1d(x, y, 'test', method), 'test table');
}

function value(t: Table1d, x: number, policy: 'refuse' | 'clamp' | 'extrapolate' = 'refuse'): number {
  return expectOk(interp1d(t, x, policy), `interp1d at ${x}`).value;
}

describe('makeTable1d', () => {
  it('makeTable1d refuses unequal lengths, naming the table', () => {
    const r = makeTable1d([0, 1, 2], [1, 2], 'cd0');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('length_mismatch');
      expect(r.error.table).toBe('cd0');
      expect(r.error.message).toContain('cd0');
    }
  });

  it('makeTable1d refuses an empty table', () => {
    const r = makeTable1d([], [], 'empty one');
    expect(r.ok ? null : r.error.code).toBe('empty');
  });

  it('makeTable1d refuses NaN in y, naming the index and value', () => {
    const r = makeTable1d([0, 1, 2], [1, Number.NaN, 3], 'k');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error).toMatchObject({ code: 'not_finite', table: 'k', field: 'y', index: 1 });
      expect(r.error.message).toContain('y[1]');
    }
  });

  it('makeTable1d refuses an infinite axis value, naming the index', () => {
    const r = makeTable1d([0, Number.POSITIVE_INFINITY], [1, 2], 'k');
    expect(r.ok ? null : r.error).toMatchObject({ code: 'not_finite', field: 'x', index: 1 });
  });

  it('makeTable1d refuses a repeated axis value at the offending index', () => {
    const r = makeTable1d([0, 0.5, 0.5, 0.9], [1, 2, 3, 4], 'buffet');
    expect(r.ok ? null : r.error).toMatchObject({ code: 'not_increasing', index: 2, value: 0.5 });
  });

  it('makeTable1d refuses a mixed-order axis at the first index that breaks the order', () => {
    const r = makeTable1d([0.9, 0.5, 0.7], [1, 2, 3], 'buffet');
    expect(r.ok ? null : r.error).toMatchObject({ code: 'not_increasing', index: 2, value: 0.7 });
  });

  it('makeTable1d accepts a strictly decreasing axis and stores it reversed with its values', () => {
    const t = table([0.9, 0.5, 0.0], [3, 2, 1]);
    expect(t.x).toEqual([0, 0.5, 0.9]);
    expect(t.y).toEqual([1, 2, 3]);
    // Same answers as the increasing table (linear, hand computation).
    expectClose(value(t, 0.25), 1.5, { abs: 1e-15 }, 'linear midpoint, hand computation');
    expectClose(value(t, 0.7), 2.5, { abs: 1e-15 }, 'linear midpoint, hand computation');
  });

  it('makeTable1d refuses a slope beyond the floating-point range, naming the index', () => {
    const r = makeTable1d([0, 1e-300, 1], [0, 1e10, 2e10], 'steep');
    expect(r.ok ? null : r.error).toMatchObject({ code: 'not_finite', field: 'y', index: 1 });
  });

  it('makeTable1d does not alias the caller arrays', () => {
    const x = [0, 1];
    const y = [5, 6];
    const t = table(x, y);
    x[0] = 10;
    y[0] = 10;
    expect(value(t, 0)).toBe(5);
  });
});

describe('interp1d', () => {
  it('interp1d is exact at the nodes', () => {
    const t = table(ref.linear.x, ref.linear.y);
    ref.linear.x.forEach((x, i) => expect(value(t, x)).toBe(ref.linear.y[i]));
  });

  it('interp1d agrees with numpy.interp between the nodes', () => {
    // Reference: numpy.interp, test/reference/dragPolarReference.py.
    const t = table(ref.linear.x, ref.linear.y);
    ref.linear.q.forEach((q, i) => expectClose(value(t, q), ref.linear.v[i]!, { rel: 1e-14, abs: 1e-17 }, 'numpy.interp'));
  });

  it('interp1d with refuse returns outside_table below and above, naming the table and range', () => {
    const t = table([0.2, 0.8], [1, 2]);
    for (const q of [0.1, 0.9]) {
      const r = interp1d(t, q, 'refuse');
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.error).toMatchObject({ code: 'outside_table', table: 'test', query: q, min: 0.2, max: 0.8 });
        expect(r.error.message).toContain('outside 0.2 to 0.8');
      }
    }
  });

  it('interp1d with refuse accepts the end nodes themselves', () => {
    const t = table([0.2, 0.8], [1, 2]);
    expect(interp1d(t, 0.2, 'refuse')).toEqual({ ok: true, value: { value: 1, outside: null } });
    expect(interp1d(t, 0.8, 'refuse')).toEqual({ ok: true, value: { value: 2, outside: null } });
  });

  it('interp1d with clamp holds the end values and flags the side', () => {
    const t = table([0.2, 0.8], [1, 2]);
    expect(interp1d(t, -5, 'clamp')).toEqual({ ok: true, value: { value: 1, outside: 'below' } });
    expect(interp1d(t, 3, 'clamp')).toEqual({ ok: true, value: { value: 2, outside: 'above' } });
  });

  it('interp1d with extrapolate continues the end segment and flags the side', () => {
    // Line through (0.2, 1) and (0.5, 2) and (0.5, 2)-(0.8, 5): hand computation.
    const t = table([0.2, 0.5, 0.8], [1, 2, 5]);
    const below = expectOk(interp1d(t, 0.0, 'extrapolate'), 'below');
    expectClose(below.value, 1 - 0.2 / 0.3, { abs: 1e-14 }, 'straight line, hand computation');
    expect(below.outside).toBe('below');
    const above = expectOk(interp1d(t, 1.0, 'extrapolate'), 'above');
    expectClose(above.value, 5 + 0.2 * 10, { abs: 1e-14 }, 'straight line, hand computation');
    expect(above.outside).toBe('above');
  });

  it('interp1d on a single-point table is constant everywhere and never outside, under every policy', () => {
    const t = table([0.5], [0.021]);
    for (const policy of ['refuse', 'clamp', 'extrapolate'] as const) {
      for (const q of [-1, 0.5, 2]) {
        expect(interp1d(t, q, policy)).toEqual({ ok: true, value: { value: 0.021, outside: null } });
      }
    }
    expect(tableRange(t)).toEqual({ min: 0.5, max: 0.5 });
  });

  it('interp1d refuses a NaN or infinite query under every policy', () => {
    const t = table([0, 1], [0, 1]);
    for (const policy of ['refuse', 'clamp', 'extrapolate'] as const) {
      for (const q of [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) {
        const r = interp1d(t, q, policy);
        expect(r.ok ? null : r.error.code).toBe('not_finite_query');
      }
    }
  });

  it('interp1d monotone cubic agrees with scipy PchipInterpolator', () => {
    // Reference: scipy.interpolate.PchipInterpolator (Fritsch-Carlson), test/reference/dragPolarReference.py.
    const t = table(ref.pchip.x, ref.pchip.y, 'monotoneCubic');
    ref.pchip.q.forEach((q, i) => expectClose(value(t, q), ref.pchip.v[i]!, { rel: 1e-12, abs: 1e-15 }, 'scipy PCHIP'));
    expectClose(t.slopes[0]!, ref.pchip.endSlopes[0]!, { abs: 1e-13 }, 'scipy PCHIP end slope');
    expectClose(t.slopes[t.slopes.length - 1]!, ref.pchip.endSlopes[1]!, { abs: 1e-13 }, 'scipy PCHIP end slope');
  });

  it('interp1d monotone cubic keeps a flat segment flat (no overshoot)', () => {
    // Fritsch & Carlson (1980): the interpolant is monotone where the data are.
    const t = table(ref.pchip.x, ref.pchip.y, 'monotoneCubic');
    for (let q = 1; q <= 2; q += 0.05) expectClose(value(t, q), 0.1, { abs: 1e-15 }, 'flat data stays flat');
  });

  it('interp1d monotone cubic extrapolates along the end slope', () => {
    const t = table(ref.pchip.x, ref.pchip.y, 'monotoneCubic');
    const r = expectOk(interp1d(t, -1, 'extrapolate'), 'below');
    expectClose(r.value, 0 - 1 * ref.pchip.endSlopes[0]!, { abs: 1e-13 }, 'end-slope line from scipy PCHIP');
    expect(r.outside).toBe('below');
  });

  it('interp1d monotone cubic on a descending axis equals the ascending table', () => {
    const asc = table(ref.pchip.x, ref.pchip.y, 'monotoneCubic');
    const desc = table([...ref.pchip.x].reverse(), [...ref.pchip.y].reverse(), 'monotoneCubic');
    ref.pchip.q.forEach((q) => expect(value(desc, q)).toBe(value(asc, q)));
  });

  it('interp1d monotone cubic on two points is the straight line', () => {
    const t = table([0, 2], [1, 3], 'monotoneCubic');
    expectClose(value(t, 0.5), 1.5, { abs: 1e-15 }, 'straight line, hand computation');
  });

  it('interp1d stays within the hull of the bracketing nodes (property)', () => {
    // Linear interpolation is a convex combination of its neighbours (definition);
    // Fritsch-Carlson PCHIP is monotone on each interval (Fritsch & Carlson 1980).
    const data = fc
      .array(fc.tuple(fc.double({ min: 0.01, max: 10, noNaN: true }), fc.double({ min: -1e3, max: 1e3, noNaN: true })), {
        minLength: 2,
        maxLength: 12,
      })
      .map((pairs) => {
        let x = 0;
        return pairs.map(([dx, y]) => {
          x += dx;
          return [x, y] as const;
        });
      });
    fc.assert(
      fc.property(data, fc.double({ min: 0, max: 1, noNaN: true }), fc.boolean(), (pts, u, cubic) => {
        const xs = pts.map((p) => p[0]);
        const ys = pts.map((p) => p[1]);
        const t = table(xs, ys, cubic ? 'monotoneCubic' : 'linear');
        const q = xs[0]! + u * (xs[xs.length - 1]! - xs[0]!);
        const r = expectOk(interp1d(t, q, 'refuse'), 'inside query');
        let i = 0;
        while (i < xs.length - 2 && q > xs[i + 1]!) i++;
        const lo = Math.min(ys[i]!, ys[i + 1]!);
        const hi = Math.max(ys[i]!, ys[i + 1]!);
        const slack = 1e-9 * (Math.abs(lo) + Math.abs(hi) + 1);
        return r.outside === null && Number.isFinite(r.value) && r.value >= lo - slack && r.value <= hi + slack;
      }),
    );
  });

  it('interp1d never answers NaN or infinity, for any finite data and query (property)', () => {
    // "No NaN ever" (project rule): an answer is finite or an error value.
    const finite = fc.double({ noNaN: true, noDefaultInfinity: true });
    const data = fc
      .uniqueArray(finite, { minLength: 1, maxLength: 8 })
      .chain((xs) => fc.tuple(fc.constant(xs.sort((a, b) => a - b)), fc.array(finite, { minLength: xs.length, maxLength: xs.length })));
    fc.assert(
      fc.property(data, finite, fc.constantFrom('refuse', 'clamp', 'extrapolate'), fc.boolean(), ([xs, ys], q, policy, cubic) => {
        const built = makeTable1d(xs, ys, 'wild', cubic ? 'monotoneCubic' : 'linear');
        if (!built.ok) return built.error.code === 'not_increasing' || built.error.code === 'not_finite';
        const r = interp1d(built.value, q, policy);
        return r.ok ? Number.isFinite(r.value.value) : r.error.message.length > 0;
      }),
    );
  });

  it('interp1d reports value_overflow for a far extrapolation of a steep table', () => {
    const t = table([0, 1], [0, 1e300]);
    const r = interp1d(t, 1e10, 'extrapolate');
    expect(r.ok ? null : r.error.code).toBe('value_overflow');
    // A flat end extrapolates to its constant however far away.
    expect(value(table([0, 1], [2, 2]), Number.MAX_VALUE, 'extrapolate')).toBe(2);
  });

  it('interp1d stays finite between nodes of opposite huge values', () => {
    const t = table([0, 1], [-8e307, 8e307]);
    expect(value(t, 0)).toBe(-8e307);
    expectClose(value(t, 0.5), 0, { abs: 1e292 }, 'midpoint of a symmetric line');
    expectClose(value(t, 0.75), 4e307, { rel: 1e-15 }, 'straight line, hand computation');
  });
});
