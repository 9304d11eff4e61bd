import { describe, expect, it } from 'vitest';
import { bracketedSecant, brent, expandBracket } from '../../../engine/core/rootFind';
import { expectOk } from '../../../engine/core/result';
import { expectClose } from '../../support/assertInDelta';

describe('brent', () => {
  it('finds sqrt(2) as the root of x^2 - 2 on [0, 2]', () => {
    const r = expectOk(brent((x) => x * x - 2, 0, 2), 'sqrt2');
    expectClose(r.x, Math.SQRT2, { abs: 1e-12 }, 'sqrt(2)');
    expect(Math.abs(r.fx)).toBeLessThan(1e-11);
  });
  it('finds the fixed point of cos, 0.7390851332151607', () => {
    // The Dottie number, the root of cos(x) - x (common practice; scipy.optimize.brentq gives 0.7390851332151607).
    const r = expectOk(brent((x) => Math.cos(x) - x, 0, 1), 'dottie');
    expectClose(r.x, 0.7390851332151607, { abs: 1e-12 }, 'Dottie number');
  });
  it('converges faster than bisection on a smooth function', () => {
    // Bisection from width 2 to 1e-12 needs about 41 halvings (common practice).
    const r = expectOk(brent((x) => Math.exp(x) - 3, 0, 2), 'ln3');
    expectClose(r.x, Math.log(3), { abs: 1e-12 }, 'ln 3');
    expect(r.iterations).toBeLessThan(15);
  });
  it('handles a bracket given high to low and a root at either end', () => {
    expectClose(expectOk(brent((x) => x - 0.25, 1, 0), 'reversed').x, 0.25, { abs: 1e-12 });
    expect(expectOk(brent((x) => x, 0, 1), 'at lo')).toEqual({ x: 0, fx: 0, iterations: 0 });
    expect(expectOk(brent((x) => x - 1, 0, 1), 'at hi').x).toBe(1);
  });
  it('locates a jump in a discontinuous function within xTol', () => {
    const r = expectOk(brent((x) => (x < 0.3 ? -1 : 1), 0, 1, { xTol: 1e-10 }), 'step');
    expectClose(r.x, 0.3, { abs: 1e-9 });
  });
  it('survives a flat, high-multiplicity root such as (x - 1)^9', () => {
    // Brent (1973) ch. 4 guarantees convergence within about (log2 width / tol)^2 steps even here.
    const r = expectOk(brent((x) => (x - 1) ** 9, 0, 3, { maxIterations: 2000 }), 'flat');
    expectClose(r.x, 1, { abs: 0.02 });
  });
  it('stops early when |f| <= fTol', () => {
    const loose = expectOk(brent((x) => x * x * x - 8, 0, 5, { fTol: 1e-2 }), 'loose');
    const tight = expectOk(brent((x) => x * x * x - 8, 0, 5), 'tight');
    expect(Math.abs(loose.fx)).toBeLessThanOrEqual(1e-2);
    expect(loose.iterations).toBeLessThanOrEqual(tight.iterations);
    expectClose(tight.x, 2, { abs: 1e-12 });
  });
  it('returns no_bracket with the end values when f has one sign', () => {
    const r = brent((x) => x * x + 1, -1, 1);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('no_bracket');
      expect(r.error.fLo).toBe(2);
      expect(r.error.fHi).toBe(2);
      expect(r.error.message).toContain('no sign change');
    }
  });
  it('returns did_not_converge with the best estimate when out of iterations', () => {
    const r = brent((x) => Math.cos(x) - x, 0, 1, { maxIterations: 2 });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('did_not_converge');
      expect(r.error.iterations).toBe(2);
      expect(r.error.x).toBeGreaterThan(0);
      expect(r.error.x).toBeLessThan(1);
    }
  });
  it('returns not_finite for NaN values or bounds', () => {
    const atEnd = brent(() => Number.NaN, 0, 1);
    expect(atEnd.ok ? 'ok' : atEnd.error.code).toBe('not_finite');
    const inside = brent((x) => (x > 0.2 && x < 0.8 ? Number.NaN : x - 0.5), 0, 1);
    expect(inside.ok ? 'ok' : inside.error.code).toBe('not_finite');
    const bound = brent((x) => x, Number.NaN, 1);
    expect(bound.ok ? 'ok' : bound.error.code).toBe('not_finite');
  });
});

describe('expandBracket', () => {
  it('widens [0, 1] until x - 100 changes sign', () => {
    const b = expectOk(expandBracket((x) => x - 100, 0, 1), 'bracket');
    expect(b.lo).toBeLessThanOrEqual(100);
    expect(b.hi).toBeGreaterThanOrEqual(100);
    expect(b.fLo * b.fHi).toBeLessThanOrEqual(0);
    expectClose(expectOk(brent((x) => x - 100, b.lo, b.hi), 'root').x, 100, { abs: 1e-10 });
  });
  it('widens downwards when the root is below', () => {
    const b = expectOk(expandBracket((x) => x + 50, 0, 1), 'below');
    expect(b.lo).toBeLessThanOrEqual(-50);
  });
  it('stays within min and max and reports no_bracket when the root is outside', () => {
    const r = expandBracket((x) => x - 100, 0, 1, { min: 0, max: 10 });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('no_bracket');
      expect(r.error.lo).toBeGreaterThanOrEqual(0);
      expect(r.error.hi).toBeLessThanOrEqual(10);
    }
  });
  it('reports no_bracket for a function with no root', () => {
    const r = expandBracket((x) => x * x + 1, -1, 1, { maxSteps: 20 });
    expect(r.ok ? 'ok' : r.error.code).toBe('no_bracket');
  });
  it('reports not_finite for an empty interval', () => {
    const r = expandBracket((x) => x, 1, 1);
    expect(r.ok ? 'ok' : r.error.code).toBe('not_finite');
  });
});

describe('bracketedSecant', () => {
  it('solves a linear function exactly in one step (the chord of the bracket)', () => {
    const f = (x: number) => 3 * x - 1.2;
    const r = expectOk(bracketedSecant(f, 0, f(0), 1, f(1), { fTol: 1e-12 }), 'line');
    expect(r.iterations).toBe(1);
    expectClose(r.x, 0.4, { abs: 1e-15 }, 'closed form 1.2 / 3');
  });
  it('finds sqrt(2) and the Dottie number to the f tolerance, on either orientation', () => {
    const g = (x: number) => x * x - 2;
    const r = expectOk(bracketedSecant(g, 2, g(2), 0, g(0), { fTol: 1e-14 }), 'sqrt2');
    expectClose(r.x, Math.SQRT2, { abs: 1e-14 }, 'sqrt(2)');
    // The root of cos(x) - x (common practice; scipy.optimize.brentq gives 0.7390851332151607).
    const h = (x: number) => Math.cos(x) - x;
    expectClose(expectOk(bracketedSecant(h, 0, h(0), 1, h(1), { fTol: 1e-15 }), 'dottie').x, 0.7390851332151607, { abs: 1e-15 }, 'Dottie number');
  });
  it('converges superlinearly on a smooth function (bisection would need about 50 halvings)', () => {
    const f = (x: number) => Math.exp(x) - 3;
    const r = expectOk(bracketedSecant(f, 0, f(0), 2, f(2), { fTol: 1e-14 }), 'ln3');
    expectClose(r.x, Math.log(3), { abs: 1e-14 }, 'ln 3');
    expect(r.iterations).toBeLessThan(12);
  });
  it('locates a jump within xTol by its bisection safeguard', () => {
    const f = (x: number) => (x < 0.3 ? -1 : 1);
    const r = expectOk(bracketedSecant(f, 0, -1, 1, 1, { xTol: 1e-10 }), 'step');
    expectClose(r.x, 0.3, { abs: 2e-10 }, 'jump');
  });
  it('refuses a bracket without a strict sign change or with non-finite values', () => {
    const f = (x: number) => x;
    const same = bracketedSecant(f, 1, 1, 2, 2);
    expect(same.ok).toBe(false);
    if (!same.ok) expect(same.error.code).toBe('no_bracket');
    const bad = bracketedSecant(f, 0, Number.NaN, 1, 1);
    expect(!bad.ok && bad.error.code).toBe('not_finite');
  });
});
