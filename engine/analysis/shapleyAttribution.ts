/**
 * Shapley-value attribution of a change in one output to several factors
 * switched from a baseline to an alternative (L. S. Shapley, "A value for
 * n-person games", Contributions to the Theory of Games II, 1953): each
 * factor's share is its marginal effect averaged over every order in which
 * the factors can be switched. The shares add up to the total change by
 * construction, and interactions are shared, not left as a residual.
 */

/**
 * Shapley values of `count` factors (1..12) for a value function over
 * subsets, a subset given as a bit mask (bit i set = factor i switched).
 * Calls value() once per subset (2^count calls) and returns the shares, in
 * factor order, plus v(none) and v(all). Uses the subset form
 * phi_i = sum over S without i of |S|! (n - |S| - 1)! / n! (v(S + i) - v(S)),
 * equal to the average over all n! orderings.
 */
export function shapleyValues(
  count: number,
  value: (mask: number) => number,
): { readonly shares: readonly number[]; readonly baseline: number; readonly alternative: number; readonly values: readonly number[] } {
  if (!Number.isInteger(count) || count < 1 || count > 12) {
    throw new Error(`shapleyValues: factor count ${count} must be an integer 1..12`);
  }
  const n = count;
  const full = (1 << n) - 1;
  const values: number[] = [];
  for (let mask = 0; mask <= full; mask++) values.push(value(mask));
  const factorial = [1];
  for (let i = 1; i <= n; i++) factorial.push(factorial[i - 1]! * i);
  const shares: number[] = [];
  for (let i = 0; i < n; i++) {
    const bit = 1 << i;
    let phi = 0;
    for (let mask = 0; mask <= full; mask++) {
      if (mask & bit) continue;
      let size = 0;
      for (let m = mask; m; m &= m - 1) size++;
      const weight = (factorial[size]! * factorial[n - size - 1]!) / factorial[n]!;
      phi += weight * (values[mask | bit]! - values[mask]!);
    }
    shares.push(phi);
  }
  return { shares, baseline: values[0]!, alternative: values[full]!, values };
}
