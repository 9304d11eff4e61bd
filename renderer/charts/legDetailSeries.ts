/**
 * Mission time history -> the detail plots of one leg (or the whole trip)
 * against time: installed thrust used and available and drag (all engines),
 * fuel flow, Mach and CAS, in display units. Time runs from the start of the
 * selection.
 */
import type { LegRow, TimeHistory } from '../../engine/mission';
import { toDisplay, type UnitSystem } from '../../engine/units';
import { sampleIndices } from './seriesKeys';

export interface LegDetailRow {
  /** Time since the start of the selection, display unit of time. */
  readonly time: number;
  readonly thrustUsed: number;
  readonly thrustAvailable: number;
  readonly drag: number;
  readonly fuelFlow: number;
  readonly mach: number;
  readonly cas: number;
  readonly altitude: number;
}

export interface LegDetail {
  readonly rows: readonly LegDetailRow[];
  /** Start and end of the selection (s, mission time). */
  readonly startTime_s: number;
  readonly endTime_s: number;
  /** Where each later leg begins (display time since the selection's start), for marks on the whole-trip plots. */
  readonly legStarts: readonly { readonly time: number; readonly label: string }[];
}

/** The sample indices of one leg (legIndex), or of every sample (null). */
export function legSampleIndices(history: TimeHistory, legIndex: number | null): number[] {
  const out: number[] = [];
  for (let i = 0; i < history.time_s.length; i++) if (legIndex === null || history.legIndex[i] === legIndex) out.push(i);
  return out;
}

/** At most `maxPoints` rows (first and last kept) of the leg `legIndex` (null: every sample). */
export function legDetailSeries(history: TimeHistory, legs: readonly LegRow[], legIndex: number | null, units: UnitSystem, maxPoints = 400): LegDetail | null {
  const all = legSampleIndices(history, legIndex);
  if (all.length === 0) return null;
  const t0 = history.time_s[all[0]!]!;
  const rows = sampleIndices(all.length, maxPoints).map((k) => {
    const i = all[k]!;
    return {
      time: toDisplay(history.time_s[i]! - t0, 'time', units),
      thrustUsed: toDisplay(history.thrustUsed_N[i]!, 'force', units),
      thrustAvailable: toDisplay(history.thrustAvailable_N[i]!, 'force', units),
      drag: toDisplay(history.drag_N[i]!, 'force', units),
      fuelFlow: toDisplay(history.fuelFlow_kg_s[i]!, 'fuelFlow', units),
      mach: history.mach[i]!,
      cas: toDisplay(history.cas_m_s[i]!, 'speed', units),
      altitude: toDisplay(history.altitude_m[i]!, 'altitude', units),
    };
  });
  const startTime_s = t0;
  const endTime_s = history.time_s[all[all.length - 1]!]!;
  const legStarts =
    legIndex !== null
      ? []
      : legs
          .filter((l) => l.kind !== 'reserve' && l.index > 0 && l.startTime_s > startTime_s && l.startTime_s < endTime_s)
          .map((l) => ({ time: toDisplay(l.startTime_s - t0, 'time', units), label: `${l.index + 1}` }));
  return { rows, startTime_s, endTime_s, legStarts };
}
