/**
 * A bounded exact-key table from flight conditions to slot numbers 0 .. limit - 1, for memos whose values are pure
 * functions of the condition's three numbers (Object.is on each: -0 and 0 stay apart). The caller keeps its values
 * in its own arrays, indexed by slot; a slot handed out by `add` is the caller's to fill afresh.
 *
 * Open addressing with linear probing over a power-of-two table at most half full, hashed on the numbers' IEEE 754
 * bits (ratingMemo.ts's hash). Bound: at most `limit` conditions; the one that would pass it first empties the whole
 * table (every slot freed at once, so the contents depend only on the conditions added since the last emptying, and
 * a freed condition is simply computed again: the same values to the bit).
 */
import { hashFlightCondition } from './ratingMemo';
import type { FlightCondition } from './propulsionModel';
import { sameNumber } from '../core/sameNumber';

export interface ConditionSlots {
  /** The slot of `condition`, or -1 when it has none. */
  find(condition: FlightCondition): number;
  /** A new slot for `condition` (which has none: a caller bug otherwise), emptying the table first when it is full. */
  add(condition: FlightCondition): number;
  /** Conditions held now (never above `limit`). */
  readonly size: number;
  readonly limit: number;
}

/** A condition table of at most `limit` entries (a whole number >= 1; a caller bug otherwise, which throws). */
export function createConditionSlots(limit: number): ConditionSlots {
  if (!Number.isInteger(limit) || limit < 1) throw new RangeError(`condition slots: limit is ${limit}, expected a whole number >= 1`);
  let cells = 2;
  while (cells < 2 * limit) cells *= 2;
  const mask = cells - 1;
  const altitude = new Float64Array(cells);
  const mach = new Float64Array(cells);
  const isaDev = new Float64Array(cells);
  // Slot + 1 in each used cell, 0 in an empty one.
  const slotPlusOne = new Int32Array(cells);
  let size = 0;

  function cellOf(condition: FlightCondition): number {
    let i = hashFlightCondition(condition, 0) & mask;
    for (;;) {
      if (slotPlusOne[i] === 0) return i;
      if (sameNumber(altitude[i], condition.altitude_m) && sameNumber(mach[i], condition.mach) && sameNumber(isaDev[i], condition.isaDev_K)) return i;
      i = (i + 1) & mask;
    }
  }

  return {
    find(condition) {
      return slotPlusOne[cellOf(condition)]! - 1;
    },
    add(condition) {
      let i = cellOf(condition);
      if (slotPlusOne[i] !== 0) throw new Error('condition slots: the condition already has a slot');
      if (size >= limit) {
        slotPlusOne.fill(0);
        size = 0;
        i = cellOf(condition);
      }
      altitude[i] = condition.altitude_m;
      mach[i] = condition.mach;
      isaDev[i] = condition.isaDev_K;
      slotPlusOne[i] = size + 1;
      return size++;
    },
    get size() {
      return size;
    },
    limit,
  };
}
