/**
 * Inverse cubic interpolation against closed forms: where x is itself a cubic polynomial of f, the Lagrange
 * polynomial of x in f through four points is that polynomial (uniqueness of the interpolating polynomial, Burden
 * & Faires, Numerical Analysis, sec. 3.1), so its value at f = 0 is the polynomial's constant term.
 */
import { describe, expect, it } from 'vitest';
import { inverseCubicZero } from '../../../engine/core/inverseInterpolation';
import { expectClose } from '../../support/assertInDelta';

describe('inverseCubicZero', () => {
  it('inverseCubicZero returns the constant term when x is a cubic of f (closed form)', () => {
    // x(f) = 0.7 + 2e-5 f - 3e-9 f^2 + 4e-13 f^3, sampled at f = -900, -250, 400, 1300 (unequal, both signs).
    const x = (f: number): number => 0.7 + 2e-5 * f - 3e-9 * f * f + 4e-13 * f * f * f;
    const f = [-900, -250, 400, 1300] as const;
    expectClose(inverseCubicZero(x(f[0]), x(f[1]), x(f[2]), x(f[3]), f[0], f[1], f[2], f[3]), 0.7, { abs: 2e-16 }, 'x(0) = 0.7');
  });

  it('inverseCubicZero is exact on a straight line and on points given in any order', () => {
    // x = 0.6 + (f + 500) / 40000: the zero at x = 0.6125 (closed form).
    const x = (f: number): number => 0.6 + (f + 500) / 40000;
    expectClose(inverseCubicZero(x(-500), x(-100), x(300), x(700), -500, -100, 300, 700), 0.6125, { abs: 2e-16 }, 'line');
    expectClose(inverseCubicZero(x(700), x(-500), x(300), x(-100), 700, -500, 300, -100), 0.6125, { abs: 2e-16 }, 'line, shuffled');
  });

  it('inverseCubicZero is not finite when two f values are equal (the caller falls back)', () => {
    expect(Number.isFinite(inverseCubicZero(0.1, 0.2, 0.3, 0.4, -1, 1, 1, 2))).toBe(false);
  });
});
