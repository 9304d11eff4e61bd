/**
 * The MIL-E-5008B standard inlet total-pressure recovery (the "military
 * specification" ram recovery used as the reference recovery of many
 * uninstalled engine decks).
 */

/**
 * MIL-E-5008B (1959) standard inlet recovery pt2/pt0 (-) at flight Mach
 * `mach` (>= 0):
 *   1                          for M <= 1,
 *   1 - 0.075 (M - 1)^1.35     for 1 < M <= 5,
 *   800 / (M^4 + 935)          for M > 5.
 * As quoted in Mattingly, Aircraft Engine Design (inlet chapter) and Raymer,
 * Aircraft Design: A Conceptual Approach (installed thrust). Flight
 * conditions are validated upstream, so a negative or non-finite Mach is a
 * bug and throws.
 */
export function milE5008bRecovery(mach: number): number {
  if (!(mach >= 0) || !Number.isFinite(mach)) {
    throw new RangeError(`milE5008bRecovery: Mach must be finite and >= 0, got ${mach}`);
  }
  if (mach <= 1) return 1;
  if (mach <= 5) return 1 - 0.075 * Math.pow(mach - 1, 1.35);
  return 800 / (mach * mach * mach * mach + 935);
}
