/**
 * A bounded exact-key memo of installed points at a named rating, keyed by the flight condition's three numbers and
 * the rating (Object.is on each number: -0 and 0 stay apart), for the installed model's atRating: its answer is a
 * pure function of them, and a mission asks the same few hundred conditions again and again (every fuel pass
 * climbs and descends through the same stage altitudes at the same schedule speeds; so do the alternate's legs,
 * the trial descents and the other missions of an analysis on the same model).
 *
 * Open addressing with linear probing over a power-of-two table at most half full; the hash mixes the numbers'
 * IEEE 754 bits (a string key cost more than the lookup it saves). Bound: at most `limit` entries; the entry that
 * would pass it first empties the whole memo (every entry evicted at once, so the memo's contents depend only on
 * the queries since the last emptying, and an evicted entry is simply computed again: the same point to the bit).
 * Points are shared, read-only (every field of InstalledPoint is readonly), as the one-entry memo shared them.
 */
import { RATING_NAMES, type FlightCondition, type InstalledPoint, type RatingName } from './propulsionModel';
import { sameNumber } from '../core/sameNumber';

/** Entries a model's rating memo holds by default: a converged demo solve asks about 140 distinct, 15 varied ones about 250. */
export const RATING_MEMO_ENTRIES = 1024;

export interface RatingMemo {
  /** The point stored for `condition` at `rating`, or undefined. */
  get(condition: FlightCondition, rating: RatingName): InstalledPoint | undefined;
  /** Stores `point` for `condition` at `rating` (the numbers are copied), emptying the memo first when it is full. */
  setEntry(condition: FlightCondition, rating: RatingName, point: InstalledPoint): void;
  /** Entries held now (never above `limit`). */
  readonly size: number;
  readonly limit: number;
}

const RATING_INDEX: ReadonlyMap<RatingName, number> = new Map(RATING_NAMES.map((r, i) => [r, i]));

// Scratch view of one double's bits, for the hash (module-local; the engine is single-threaded per realm).
const bits = new Float64Array(1);
const words = new Int32Array(bits.buffer);

function mixNumber(h: number, x: number): number {
  bits[0] = x;
  h = Math.imul(h ^ words[0]!, 0x9e3779b1);
  h = Math.imul(h ^ words[1]!, 0x85ebca77);
  return h ^ (h >>> 15);
}

/** A 32-bit hash of a condition's three numbers' bits and a small whole number `tag` (the rating's index here). */
export function hashFlightCondition(condition: FlightCondition, tag: number): number {
  let h = Math.imul(tag + 1, 0xc2b2ae35);
  h = mixNumber(h, condition.altitude_m);
  h = mixNumber(h, condition.mach);
  h = mixNumber(h, condition.isaDev_K);
  return h ^ (h >>> 13);
}

/** A rating memo of at most `limit` entries (a whole number >= 1; a caller bug otherwise, which throws). */
export function createRatingMemo(limit: number = RATING_MEMO_ENTRIES): RatingMemo {
  if (!Number.isInteger(limit) || limit < 1) throw new RangeError(`rating memo: limit is ${limit}, expected a whole number >= 1`);
  let slots = 2;
  while (slots < 2 * limit) slots *= 2;
  const mask = slots - 1;
  const altitude = new Float64Array(slots);
  const mach = new Float64Array(slots);
  const isaDev = new Float64Array(slots);
  // Rating index + 1 in each used slot, 0 in an empty one.
  const used = new Uint8Array(slots);
  const points: (InstalledPoint | undefined)[] = new Array<InstalledPoint | undefined>(slots).fill(undefined);
  let size = 0;

  function slotOf(condition: FlightCondition, r: number): number {
    let i = hashFlightCondition(condition, r) & mask;
    for (;;) {
      const u = used[i]!;
      if (u === 0) return i;
      if (
        u === r + 1 &&
        sameNumber(altitude[i], condition.altitude_m) &&
        sameNumber(mach[i], condition.mach) &&
        sameNumber(isaDev[i], condition.isaDev_K)
      ) {
        return i;
      }
      i = (i + 1) & mask;
    }
  }

  return {
    get(condition, rating) {
      const r = RATING_INDEX.get(rating)!;
      const i = slotOf(condition, r);
      return used[i] === 0 ? undefined : points[i];
    },
    setEntry(condition, rating, point) {
      const r = RATING_INDEX.get(rating)!;
      let i = slotOf(condition, r);
      if (used[i] === 0) {
        if (size >= limit) {
          used.fill(0);
          points.fill(undefined);
          size = 0;
          i = slotOf(condition, r);
        }
        used[i] = r + 1;
        altitude[i] = condition.altitude_m;
        mach[i] = condition.mach;
        isaDev[i] = condition.isaDev_K;
        size++;
      }
      points[i] = point;
    },
    get size() {
      return size;
    },
    limit,
  };
}
