/**
 * What a climb or descent stage needs that depends on its pressure altitude alone, kept per altitude for as long as
 * the propulsion model lives: the air data at the leg's ISA deviation, the Mach of the held CAS or Mach, the energy
 * share factor and the engine's point at the segment's rating (flight idle in an idle descent, none in a set-rate
 * descent). The monotone stepper puts its stages at altitudes fixed by the segment's ends and breaks, not by the
 * mass, so every fuel pass, the alternate's legs, the trial descents and the other missions flown on the same model
 * ask for the same altitudes again; only the drag and the dynamics depend on the mass. Each value is a pure function
 * of (model, held, value, ISA deviation, rating, altitude), so keeping it cannot change any answer.
 *
 * A track is one (held, value, ISA deviation, rating) on one model: an open-addressing table on the altitude's bits
 * (Object.is keys), at most TRACK_ENTRIES altitudes, emptied whole when an altitude would pass that bound. A model
 * keeps at most MODEL_TRACKS tracks; the track that would pass it first forgets all of them (a segment that holds
 * one keeps using it, bounded as above).
 */
import { sameNumber } from '../core/sameNumber';
import type { InstalledPoint, PropulsionModel, RatingName } from '../propulsion/propulsionModel';
import { energyShareFactor } from './energyShareFactor';
import { heldCasMach, missionAir, type MissionAir } from './missionAtmosphere';

/** One altitude's mass-independent stage values (shared, read-only). */
export interface StageAir {
  readonly air: MissionAir;
  readonly mach: number;
  /** Energy share factor (energyShareFactor.ts) of the held speed at this altitude. */
  readonly factor: number;
  /** The engine at the track's rating; null for a track without one. */
  readonly engine: InstalledPoint | null;
}

export interface StageTrack {
  /** The values at pressure altitude `altitude_m` (m), worked out on the first ask. */
  at(altitude_m: number): StageAir;
  /** Altitudes held now (never above TRACK_ENTRIES). */
  readonly size: number;
}

/** Altitudes a track holds at most: a converged demo solve's trip climb asks about 60. */
export const TRACK_ENTRIES = 512;
/** Tracks a model keeps at most (a demo solve flies about 10: climbs, descents at each CAS and Mach, the alternate's). */
export const MODEL_TRACKS = 64;

/** A model's track and the five it is the track of (compared exactly: the key's numbers by sameNumber). */
interface KeptTrack {
  readonly held: 'cas' | 'mach';
  readonly value: number;
  readonly isaDev_K: number;
  readonly rating: RatingName | null;
  readonly limit: number;
  readonly track: StageTrack;
}

const tracksOf = new WeakMap<PropulsionModel, KeptTrack[]>();

// Scratch view of one double's bits, for the hash (module-local; the engine is single-threaded per realm).
const bits = new Float64Array(1);
const words = new Int32Array(bits.buffer);

function hashAltitude(x: number): number {
  bits[0] = x;
  let h = Math.imul(words[0]! ^ 0x2545f491, 0x9e3779b1);
  h = Math.imul(h ^ words[1]!, 0x85ebca77);
  return h ^ (h >>> 15);
}

function makeTrack(
  propulsion: PropulsionModel,
  held: 'cas' | 'mach',
  value: number,
  isaDev_K: number,
  rating: RatingName | null,
  limit: number,
): StageTrack {
  const machOf = held === 'mach' ? () => value : heldCasMach(value);
  let slots = 2;
  while (slots < 2 * limit) slots *= 2;
  const mask = slots - 1;
  const altitudes = new Float64Array(slots);
  const values: (StageAir | undefined)[] = new Array<StageAir | undefined>(slots).fill(undefined);
  let size = 0;
  function slotOf(h: number): number {
    let i = hashAltitude(h) & mask;
    while (values[i] !== undefined && !sameNumber(altitudes[i]!, h)) i = (i + 1) & mask;
    return i;
  }
  return {
    at(h) {
      let i = slotOf(h);
      const kept = values[i];
      if (kept !== undefined) return kept;
      const air = missionAir(h, isaDev_K);
      const mach = machOf(air.pressure_Pa);
      const entry: StageAir = {
        air,
        mach,
        factor: energyShareFactor(held, mach, air.lapse_K_m, air.temperature_K, air.isaTemperature_K),
        engine: rating === null ? null : propulsion.atRating({ altitude_m: h, mach, isaDev_K }, rating),
      };
      if (size >= limit) {
        values.fill(undefined);
        size = 0;
        i = slotOf(h);
      }
      altitudes[i] = h;
      values[i] = entry;
      size++;
      return entry;
    },
    get size() {
      return size;
    },
  };
}

/**
 * The stage track of a segment holding `held` ('cas' in m/s or 'mach') at `value`, at ISA deviation `isaDev_K` (K),
 * with the engine at `rating` (null: none), on `propulsion`; the same track for the same five on the same model.
 * `limit` is for tests (default TRACK_ENTRIES).
 */
export function stageTrack(
  propulsion: PropulsionModel,
  held: 'cas' | 'mach',
  value: number,
  isaDev_K: number,
  rating: RatingName | null,
  limit: number = TRACK_ENTRIES,
): StageTrack {
  let tracks = tracksOf.get(propulsion);
  if (tracks === undefined) {
    tracks = [];
    tracksOf.set(propulsion, tracks);
  }
  // A scan of at most MODEL_TRACKS exact compares (a key text per segment cost a number-to-text conversion each).
  for (let i = 0; i < tracks.length; i++) {
    const k = tracks[i]!;
    if (k.held === held && sameNumber(k.value, value) && sameNumber(k.isaDev_K, isaDev_K) && k.rating === rating && k.limit === limit) return k.track;
  }
  if (tracks.length >= MODEL_TRACKS) tracks.length = 0;
  const track = makeTrack(propulsion, held, value, isaDev_K, rating, limit);
  tracks.push({ held, value, isaDev_K, rating, limit, track });
  return track;
}
