/** Number formatting shared by the verbs' text reports. */

/** `x` to `digits` significant digits, as a number (so trailing zeros drop when printed). */
export function significant(x: number, digits: number): number {
  return Number(x.toPrecision(digits));
}
