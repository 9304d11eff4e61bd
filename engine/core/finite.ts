/** True when every argument is a finite number (no NaN, no infinities). */
export function allFinite(...values: readonly number[]): boolean {
  for (const v of values) {
    if (!Number.isFinite(v)) return false;
  }
  return true;
}
