import { describe, expect, it } from 'vitest';
import { brentMaximum, goldenMaximum, goldenSectionBracket } from '../../../engine/core/scalarMaximum';
import { expectClose } from '../../support/assertInDelta';

describe('scalarMaximum', () => {
  it('goldenMaximum finds x e^-x at x = 1 and ln(x)/x at x = e', () => {
    // d/dx (x e^-x) = (1 - x) e^-x = 0 at x = 1; d/dx (ln x / x) = (1 - ln x) / x^2 = 0 at x = e (calculus);
    // scipy.optimize.minimize_scalar(bounded, xatol 1e-12) gives 1.0000000 and 2.7182818 too.
    // A smooth maximum limits any search on f values to about sqrt(machine epsilon) in x (Press et al., Numerical Recipes, 10.2).
    expectClose(goldenMaximum((x) => x * Math.exp(-x), 0, 4, 1e-10), 1, { abs: 3e-8 });
    expectClose(goldenMaximum((x) => Math.log(x) / x, 1, 10, 1e-10), Math.E, { abs: 3e-8 });
  });

  it('goldenMaximum meets its tolerance: the answer is within tolerance / 2 of the vertex of a parabola', () => {
    // f = -(x - 0.61803)^2: vertex at 0.61803 (by inspection); a loose tolerance bounds the error by half the final bracket.
    const x = goldenMaximum((v) => -((v - 0.61803) ** 2), 0, 1, 1e-3);
    expect(Math.abs(x - 0.61803)).toBeLessThanOrEqual(0.5e-3);
    expect(Math.abs(x - 0.61803)).toBeGreaterThan(0); // a real search, not the exact vertex returned by construction
  });

  it('goldenSectionBracket keeps the maximum inside a bracket no wider than xTol and returns an end maximum at the end', () => {
    const br = goldenSectionBracket((x) => Math.sin(x), 0, Math.PI, 1e-9);
    // sin is largest at pi/2 (common practice)
    expect(br.b - br.a).toBeLessThanOrEqual(1e-9);
    expect(br.a).toBeLessThanOrEqual(Math.PI / 2 + 1e-8);
    expect(br.b).toBeGreaterThanOrEqual(Math.PI / 2 - 1e-8);
    // Monotone f: the maximum sits at the upper end.
    expectClose(goldenMaximum((x) => x, 0, 2, 1e-9), 2, { abs: 1e-9 });
  });

  it('goldenSectionBracket treats NaN on the right probe as lower and stops after maxIterations', () => {
    const f = (x: number) => (x > 0.8 ? Number.NaN : -((x - 0.3) ** 2));
    const br = goldenSectionBracket(f, 0, 1, 1e-10);
    expectClose(0.5 * (br.a + br.b), 0.3, { abs: 3e-8 });
    let calls = 0;
    const few = goldenSectionBracket(
      (x) => {
        calls++;
        return -x * x;
      },
      -1,
      1,
      0,
      5,
    );
    expect(calls).toBe(2 + 5);
    expectClose(few.b - few.a, 2 * ((Math.sqrt(5) - 1) / 2) ** 5, { rel: 1e-12 });
  });

  it('brentMaximum finds x e^-x at x = 1 and ln(x)/x at x = e in fewer evaluations than golden sections', () => {
    // The same closed-form maxima as above (calculus); Brent's method (Brent 1973, ch. 5) steps by parabolas on a smooth peak.
    const counted = (f: (x: number) => number) => {
      let n = 0;
      return { f: (x: number) => (n++, f(x)), count: () => n };
    };
    const a = counted((x) => x * Math.exp(-x));
    const r = brentMaximum(a.f, 0.5, 1.6, 0.8, 0.8 * Math.exp(-0.8), 1e-6);
    expectClose(r.x, 1, { abs: 1e-6 }, 'x e^-x');
    expectClose(r.fx, Math.exp(-1), { rel: 1e-12 }, 'its value');
    const g = counted((x) => x * Math.exp(-x));
    goldenSectionBracket(g.f, 0.5, 1.6, 1e-6);
    expect(a.count()).toBeLessThan(g.count() / 2);
    const b = brentMaximum((x) => Math.log(x) / x, 1, 10, 2, Math.log(2) / 2, 1e-7);
    expectClose(b.x, Math.E, { abs: 1e-7 }, 'ln(x)/x');
  });

  it('brentMaximum meets its tolerance on a kink and on a parabola, and keeps the start when nothing is higher', () => {
    // A tent peak at 0.3 (a kink, as a linearly interpolated table has): the parabolic steps fail and golden sections take over.
    const tent = brentMaximum((x) => 1 - Math.abs(x - 0.3) - (x > 0.3 ? 2 * (x - 0.3) : 0), 0, 1, 0.5, 0.4, 1e-6);
    expect(Math.abs(tent.x - 0.3)).toBeLessThanOrEqual(1e-6);
    // f = -(x - 0.61803)^2, vertex at 0.61803 (by inspection).
    const par = brentMaximum((v) => -((v - 0.61803) ** 2), 0, 1, 0.5, -(0.11803 ** 2), 1e-3);
    expect(Math.abs(par.x - 0.61803)).toBeLessThanOrEqual(1e-3);
    // NaN counts as lower than any value: the start is returned.
    expect(brentMaximum(() => Number.NaN, 0, 1, 0.5, 2, 1e-6)).toEqual({ x: 0.5, fx: 2 });
  });
});
