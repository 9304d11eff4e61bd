/**
 * Object.is for two numbers (SameValue, ECMAScript 7.2.10): equal bits in
 * effect, so -0 and 0 differ and NaN equals NaN. Written with === so that the
 * optimising compiler keeps it inline on doubles wherever the operands' types
 * are known only from feedback (closure variables, object fields); Object.is
 * there is a call into the runtime. For memo keys that must match exactly.
 */
export function sameNumber(a: number, b: number): boolean {
  if (a === b) return a !== 0 || 1 / a === 1 / b;
  return a !== a && b !== b;
}
