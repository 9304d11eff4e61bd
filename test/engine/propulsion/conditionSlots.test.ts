/**
 * The bounded condition table under the part-power memo (engine/propulsion/conditionSlots.ts), against JavaScript's
 * own Map keyed by the same three numbers (ECMAScript's SameValue for -0 and 0 emulated by the key text).
 */
import { describe, expect, it } from 'vitest';
import { createConditionSlots } from '../../../engine/propulsion/conditionSlots';
import type { FlightCondition } from '../../../engine/propulsion/propulsionModel';

function keyText(c: FlightCondition): string {
  const t = (x: number): string => (Object.is(x, -0) ? '-0' : String(x));
  return `${t(c.altitude_m)}|${t(c.mach)}|${t(c.isaDev_K)}`;
}

/** A deterministic sequence in [0, 1) (a linear congruential generator; Numerical Recipes' constants, from memory). */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

describe('createConditionSlots', () => {
  it.each([1, 2, 5, 64])('finds the slot it gave each condition until it empties, as a Map keyed by the numbers does (limit %i)', (limit) => {
    const slots = createConditionSlots(limit);
    // The reference: which condition holds which slot since the last emptying.
    let reference = new Map<string, number>();
    const next = lcg(5 + limit);
    let emptyings = 0;
    for (let k = 0; k < 3000; k++) {
      const c: FlightCondition = {
        altitude_m: [0, -0, 3048, 12496.8][Math.floor(next() * 4)]!,
        mach: [0.25, 0.78, 0.7800000000000001][Math.floor(next() * 3)]!,
        isaDev_K: [0, 15][Math.floor(next() * 2)]!,
      };
      const key = keyText(c);
      const found = slots.find(c);
      expect(found).toBe(reference.get(key) ?? -1);
      if (found < 0) {
        if (reference.size >= limit) {
          reference = new Map();
          emptyings++;
        }
        const slot = slots.add(c);
        // Slots are handed out 0, 1, 2 ... after each emptying, so each is below the limit.
        expect(slot).toBe(reference.size);
        reference.set(key, slot);
        expect(slots.find(c)).toBe(slot);
      }
      expect(slots.size).toBe(reference.size);
      expect(slots.size).toBeLessThanOrEqual(limit);
    }
    // 24 distinct conditions: a limit below that must have emptied, one above it never.
    if (limit < 24) expect(emptyings).toBeGreaterThan(0);
    else expect(emptyings).toBe(0);
  });

  it('keeps -0 and 0 apart, refuses a second slot for one condition and a limit that is not a whole number >= 1', () => {
    const slots = createConditionSlots(4);
    const a = slots.add({ altitude_m: 0, mach: 0.5, isaDev_K: 0 });
    expect(slots.find({ altitude_m: -0, mach: 0.5, isaDev_K: 0 })).toBe(-1);
    expect(slots.find({ altitude_m: 0, mach: 0.5, isaDev_K: -0 })).toBe(-1);
    const b = slots.add({ altitude_m: -0, mach: 0.5, isaDev_K: 0 });
    expect([a, b]).toStrictEqual([0, 1]);
    expect(() => slots.add({ altitude_m: 0, mach: 0.5, isaDev_K: 0 })).toThrow(/already has a slot/);
    expect(() => createConditionSlots(0)).toThrow(/whole number >= 1/);
    expect(() => createConditionSlots(1.5)).toThrow(/whole number >= 1/);
  });
});
