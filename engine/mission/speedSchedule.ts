/**
 * Splits a climb or descent between two pressure altitudes into phases of
 * held CAS or held Mach, and the level speed change at the low-altitude
 * speed limit. Below `lowAltitudeLimit_m` the schedule holds `lowCas_m_s`,
 * above it `cas_m_s`; either is capped by `mach` above its CAS/Mach
 * transition altitude. Phases are also split at the tropopause (11 km) so the
 * energy share factor is smooth inside each phase.
 */
import { machOfCas, missionAir, TROPOPAUSE_M, transitionAltitude } from './missionAtmosphere';
import type { SpeedSchedule } from './missionTypes';

export type SchedulePhase =
  | {
      readonly kind: 'hold';
      readonly held: 'cas' | 'mach';
      /** CAS (m/s) or Mach (-). */
      readonly value: number;
      readonly from_m: number;
      readonly to_m: number;
    }
  | { readonly kind: 'speedChange'; readonly altitude_m: number; readonly fromMach: number; readonly toMach: number };

interface Zone {
  readonly cas_m_s: number;
  readonly transition_m: number;
}

function zoneAt(schedule: SpeedSchedule, altitude_m: number): Zone {
  const cas = altitude_m < schedule.lowAltitudeLimit_m ? schedule.lowCas_m_s : schedule.cas_m_s;
  return { cas_m_s: cas, transition_m: transitionAltitude(cas, schedule.mach) };
}

/** Mach (-) the schedule flies at a pressure altitude (m) in the zone of `zoneAltitude_m` (the zone's CAS, capped by the Mach: no transition altitude needed). */
export function scheduleMach(schedule: SpeedSchedule, altitude_m: number, zoneAltitude_m = altitude_m): number {
  const cas = zoneAltitude_m < schedule.lowAltitudeLimit_m ? schedule.lowCas_m_s : schedule.cas_m_s;
  return Math.min(machOfCas(cas, missionAir(altitude_m, 0).pressure_Pa), schedule.mach);
}

/** Phase lists kept (schedulePhases' memo) before the memo is emptied. */
const PHASE_MEMO_ENTRIES = 32;

/** A memo entry: the schedule's four numbers, the two altitudes (m) and the phases between them. */
interface PhaseMemoEntry {
  readonly key: readonly [number, number, number, number, number, number];
  readonly phases: readonly SchedulePhase[];
}

// Exact-key memo of schedulePhases (Object.is on the schedule's numbers and the altitudes, not the schedule object, so
// a new object with the same numbers finds its entry): the phases are a pure function of them, asked again by every
// fuel pass's climbs and descents (the same levels, the alternate's, the trials'). The entry that would pass
// PHASE_MEMO_ENTRIES empties it first, so what it holds depends only on the queries since; the lists are shared (readonly).
const phaseMemo: PhaseMemoEntry[] = [];

/** Phases from `from_m` to `to_m` (climb when to > from, descent otherwise), in flight order. */
export function schedulePhases(schedule: SpeedSchedule, from_m: number, to_m: number): readonly SchedulePhase[] {
  const key = [schedule.lowCas_m_s, schedule.lowAltitudeLimit_m, schedule.cas_m_s, schedule.mach, from_m, to_m] as const;
  for (const entry of phaseMemo) if (sameNumbers(entry.key, key)) return entry.phases;
  const phases = Object.freeze(phasesBetween(schedule, from_m, to_m));
  if (phaseMemo.length >= PHASE_MEMO_ENTRIES) phaseMemo.length = 0;
  phaseMemo.push({ key, phases });
  return phases;
}

function sameNumbers(a: readonly number[], b: readonly number[]): boolean {
  for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) return false;
  return true;
}

function phasesBetween(schedule: SpeedSchedule, from_m: number, to_m: number): SchedulePhase[] {
  if (from_m === to_m) return [];
  const up = to_m > from_m;
  const lo = Math.min(from_m, to_m);
  const hi = Math.max(from_m, to_m);
  const cuts = new Set<number>([from_m, to_m]);
  const limit = schedule.lowAltitudeLimit_m;
  const lowTransition = transitionAltitude(schedule.lowCas_m_s, schedule.mach);
  const highTransition = transitionAltitude(schedule.cas_m_s, schedule.mach);
  const candidates = [
    limit,
    TROPOPAUSE_M,
    lowTransition < limit ? lowTransition : NaN,
    highTransition >= limit ? highTransition : NaN,
  ];
  for (const c of candidates) if (c > lo && c < hi) cuts.add(c);
  const points = [...cuts].sort((a, b) => (up ? a - b : b - a));
  const phases: SchedulePhase[] = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const a = points[i];
    const b = points[i + 1];
    const mid = 0.5 * (a + b);
    const zone = zoneAt(schedule, mid);
    const held = mid >= zone.transition_m ? 'mach' : 'cas';
    if (i > 0 && a === limit) {
      const before = scheduleMach(schedule, a, 0.5 * (points[i - 1] + a));
      const after = scheduleMach(schedule, a, mid);
      if (before !== after) phases.push({ kind: 'speedChange', altitude_m: a, fromMach: before, toMach: after });
    }
    phases.push({ kind: 'hold', held, value: held === 'mach' ? schedule.mach : zone.cas_m_s, from_m: a, to_m: b });
  }
  return phases;
}
