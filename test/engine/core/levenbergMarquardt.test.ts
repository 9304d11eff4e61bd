import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { leastSquares } from '../../../engine/core/levenbergMarquardt';
import { expectClose } from '../../support/assertInDelta';

interface Reference {
  readonly t: number[];
  readonly y: number[];
  readonly cases: { x0: number[]; lower: number[]; upper: number[]; x: number[]; cost: number }[];
}
// scipy.optimize.least_squares on the same problem: test/reference/leastSquaresReference.py.
const ref = JSON.parse(readFileSync(new URL('../../reference/leastSquaresReference.json', import.meta.url), 'utf8')) as Reference;
const residual = (p: readonly number[]) => ref.t.map((t, i) => p[0]! * Math.exp(-p[1]! * t) + p[2]! - ref.y[i]!);

describe('leastSquares', () => {
  it.each([0, 1])('leastSquares finds scipy.optimize.least_squares minimum on the bounded exponential fit (case %i)', (k) => {
    const c = ref.cases[k]!;
    const r = leastSquares(residual, c.x0, { lower: c.lower, upper: c.upper, maxIterations: 200 });
    expect(r.converged).toBe(true);
    expectClose(r.cost, c.cost, { rel: 1e-7, abs: 1e-14 }, 'scipy least_squares cost');
    c.x.forEach((v, i) => expectClose(r.x[i]!, v, { rel: 1e-5, abs: 1e-7 }, `scipy least_squares x[${i}]`));
    r.x.forEach((v, i) => expect(v >= c.lower[i]! && v <= c.upper[i]!).toBe(true));
  });

  it('leastSquares reports a start it cannot evaluate instead of throwing', () => {
    const r = leastSquares(() => null, [1, 1], { lower: [0, 0], upper: [2, 2] });
    expect(r.converged).toBe(false);
    expect(r.message).toMatch(/cannot be evaluated/);
  });
});
