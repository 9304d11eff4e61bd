import { describe, expect, it } from 'vitest';
import { maximizeOnGrid, minimizeOnGrid, refineMaximum, rootsOnPoints, uniformGrid } from '../../../engine/analysis/scalarSearch';
import { expectClose } from '../../support/assertInDelta';

describe('scalarSearch', () => {
  it('uniformGrid includes both ends exactly', () => {
    const g = uniformGrid(0.1, 0.95, 18);
    expect(g).toHaveLength(18);
    expect(g[0]).toBe(0.1);
    expect(g[17]).toBe(0.95);
    expect(uniformGrid(0, 1, 1)).toEqual([0, 1]);
  });

  it('maximizeOnGrid finds the vertex of a parabola to the tolerance', () => {
    // f = -(x - 0.3712)^2 + 2: maximum 2 at x = 0.3712 (by inspection)
    // A flat maximum limits any search on f values to about sqrt(machine epsilon) in x (Press et al., Numerical Recipes, golden section).
    const m = maximizeOnGrid((x) => -((x - 0.3712) ** 2) + 2, 0, 1, 11, 1e-10)!;
    expectClose(m.x, 0.3712, { abs: 3e-8 });
    expectClose(m.fx, 2, { abs: 1e-15 });
    expect(m.atBound).toBe(false);
  });

  it('maximizeOnGrid flags a maximum at the end of a monotone range and skips NaN samples', () => {
    const m = maximizeOnGrid((x) => x, 0, 1, 5, 1e-10)!;
    expect(m.atBound).toBe(true);
    expectClose(m.x, 1, { abs: 1e-9 });
    const n = maximizeOnGrid((x) => (x < 0.5 ? Number.NaN : 1 - (x - 0.7) ** 2), 0, 1, 11, 1e-10)!;
    expectClose(n.x, 0.7, { abs: 3e-8 });
    expect(maximizeOnGrid(() => Number.NaN, 0, 1, 5, 1e-6)).toBeNull();
    const lo = minimizeOnGrid((x) => (x - 0.25) ** 2, 0, 1, 9, 1e-10)!;
    expectClose(lo.x, 0.25, { abs: 3e-8 });
  });

  it('refineMaximum keeps the known sample when nothing better is found', () => {
    const r = refineMaximum(() => 0, 0, 1, 0.5, 1, 1e-6);
    expect(r).toEqual({ x: 0.5, fx: 1 });
  });

  it('rootsOnPoints finds every sign change of sin on [0.5, 10]: pi, 2 pi, 3 pi', () => {
    const roots = rootsOnPoints(Math.sin, uniformGrid(0.5, 10, 40), 1e-13);
    expect(roots).toHaveLength(3);
    roots.forEach((r, i) => expectClose(r, (i + 1) * Math.PI, { abs: 1e-12 }, 'zeros of sin'));
    expect(rootsOnPoints((x) => x, [-1, 0, 1], 1e-12)).toEqual([0]);
  });
});
