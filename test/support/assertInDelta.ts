import { expect } from 'vitest';

/**
 * The one shared tolerance assertion (docs/style.md §11). Passes when
 * |actual - expected| <= abs + rel * |expected|. `source` names where the
 * expected value comes from and is shown on failure.
 */
export function expectClose(
  actual: number,
  expected: number,
  tolerance: { readonly rel?: number; readonly abs?: number },
  source = '',
): void {
  const rel = tolerance.rel ?? 0;
  const abs = tolerance.abs ?? 0;
  const allowed = abs + rel * Math.abs(expected);
  const diff = Math.abs(actual - expected);
  const label = source ? ` (${source})` : '';
  expect(Number.isFinite(actual), `expected a finite number${label}, got ${actual}`).toBe(true);
  expect(
    diff <= allowed,
    `expected ${actual} to be within ${allowed} of ${expected}${label}; off by ${diff}`,
  ).toBe(true);
}
