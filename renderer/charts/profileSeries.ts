/** Mission time history -> altitude and mass against distance, in display units. */
import type { TimeHistory } from '../../engine/mission';
import { toDisplay, type UnitSystem } from '../../engine/units';
import { sampleIndices } from './seriesKeys';

export interface ProfileRow {
  readonly distance: number;
  readonly altitude: number;
  readonly mass: number;
  readonly time_s: number;
  readonly legIndex: number;
}

/** At most `maxPoints` rows (first and last kept), distance/altitude/mass in the unit system's display units. */
export function profileSeries(history: TimeHistory, units: UnitSystem, maxPoints = 400): ProfileRow[] {
  return sampleIndices(history.time_s.length, maxPoints).map((i) => ({
    distance: toDisplay(history.distance_m[i]!, 'distance', units),
    altitude: toDisplay(history.altitude_m[i]!, 'altitude', units),
    mass: toDisplay(history.mass_kg[i]!, 'mass', units),
    time_s: history.time_s[i]!,
    legIndex: history.legIndex[i]!,
  }));
}
