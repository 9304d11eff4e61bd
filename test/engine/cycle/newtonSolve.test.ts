import { describe, expect, it } from 'vitest';
import { newtonSolve, solveLinearInPlace } from '../../../engine/cycle/newtonSolve';
import { expectClose } from '../../support/assertInDelta';

describe('solveLinearInPlace', () => {
  it('solves a 3x3 system needing a pivot (exact solution x = (1, 2, 3) by construction)', () => {
    const a = Float64Array.from([0, 2, 1, 1, 1, 1, 2, 1, 3]);
    const b = Float64Array.from([0 * 1 + 2 * 2 + 1 * 3, 1 + 2 + 3, 2 + 2 + 9]);
    expect(solveLinearInPlace(a, b, 3)).toBe(true);
    expectClose(b[0]!, 1, { abs: 1e-14 }, 'constructed solution');
    expectClose(b[1]!, 2, { abs: 1e-14 }, 'constructed solution');
    expectClose(b[2]!, 3, { abs: 1e-14 }, 'constructed solution');
  });

  it('reports a singular matrix', () => {
    expect(solveLinearInPlace(Float64Array.from([1, 2, 2, 4]), Float64Array.from([1, 2]), 2)).toBe(false);
  });
});

describe('newtonSolve', () => {
  it('finds the intersection of the unit circle and the line x = y: (1/sqrt 2, 1/sqrt 2) (closed form)', () => {
    const out = newtonSolve((x, r) => {
      r[0] = x[0]! * x[0]! + x[1]! * x[1]! - 1;
      r[1] = x[0]! - x[1]!;
      return true;
    }, [2, 0.5]);
    expect(out.converged).toBe(true);
    expectClose(out.x[0]!, Math.SQRT1_2, { abs: 1e-10 }, 'closed form');
    expectClose(out.x[1]!, Math.SQRT1_2, { abs: 1e-10 }, 'closed form');
  });

  it('backs off from points the residual refuses (sqrt(x) = 0.5 from x = 4, refused below 0)', () => {
    const out = newtonSolve((x, r) => {
      if (!(x[0]! > 0)) return false;
      r[0] = Math.sqrt(x[0]!) - 0.5;
      return true;
    }, [4], { tolerance: 1e-13, maxIterations: 60, maxStep: 10 });
    expect(out.converged).toBe(true);
    expectClose(out.x[0]!, 0.25, { abs: 1e-12 }, 'closed form');
  });

  it('says why it stops on a system without a root, with a finite residual', () => {
    const out = newtonSolve((x, r) => {
      r[0] = x[0]! * x[0]! + 1;
      return true;
    }, [0.3]);
    expect(out.converged).toBe(false);
    expect(out.reason.length).toBeGreaterThan(0);
    expect(Number.isFinite(out.residual)).toBe(true);
  });

  it('refuses a start outside the relations', () => {
    const out = newtonSolve(() => false, [1]);
    expect(out.converged).toBe(false);
    expect(out.residual).toBe(Infinity);
  });
});
