/**
 * Inverse interpolation: the x where a function through tabulated points crosses zero, read off the Lagrange
 * polynomial of x in f (Burden & Faires, Numerical Analysis, sec. 3.1, inverse interpolation; the inverse
 * quadratic step of Brent's method is the three-point case).
 */

/**
 * The zero of the cubic inverse interpolant through (x0, f0) .. (x3, f3): sum of x_j L_j(0) with
 * L_j(0) = prod over i != j of f_i / (f_i - f_j), summed as offsets from x0 (fewer roundings). The f's must be
 * distinct; otherwise the answer is not finite (a caller checks it lies where it expects).
 */
export function inverseCubicZero(x0: number, x1: number, x2: number, x3: number, f0: number, f1: number, f2: number, f3: number): number {
  const l1 = ((f0 / (f0 - f1)) * (f2 / (f2 - f1))) * (f3 / (f3 - f1));
  const l2 = ((f0 / (f0 - f2)) * (f1 / (f1 - f2))) * (f3 / (f3 - f2));
  const l3 = ((f0 / (f0 - f3)) * (f1 / (f1 - f3))) * (f2 / (f2 - f3));
  return x0 + ((x1 - x0) * l1 + (x2 - x0) * l2 + (x3 - x0) * l3);
}
