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

/** Mach (-) the schedule flies at a pressure altitude (m) in the zone of `zoneAltitude_m`. */
export function scheduleMach(schedule: SpeedSchedule, altitude_m: number, zoneAltitude_m = altitude_m): number {
  const zone = zoneAt(schedule, zoneAltitude_m);
  return Math.min(machOfCas(zone.cas_m_s, missionAir(altitude_m, 0).pressure_Pa), schedule.mach);
}

/** Phases from `from_m` to `to_m` (climb when to > from, descent otherwise), in flight order. */
export function schedulePhases(schedule: SpeedSchedule, from_m: number, to_m: number): readonly SchedulePhase[] {
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
