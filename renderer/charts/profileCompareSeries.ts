/**
 * Two (or more) designs' mission profiles on one row set for recharts:
 * altitude, mass and fuel burned against distance, in display units.
 */
import { toDisplay, type UnitSystem } from '../../engine/units';
import type { DesignProfile } from '../worker/engineProtocol';
import type { SeriesDef } from './polarSeries';
import { sampleIndices, seriesKey } from './seriesKeys';

export type ProfileQuantity = 'altitude' | 'mass' | 'fuel';

/** The data key of design `k`'s series of one quantity ('altitude0', 'fuel1', ...). */
export function profileKey(quantity: ProfileQuantity, k: number): string {
  return seriesKey(quantity, k);
}

/** A row carries `distance` and one design's three values; the other designs' keys are absent. */
export type ProfileCompareRow = { readonly distance: number } & Readonly<Record<string, number>>;

/** History sample indices of the trip legs (take-off to landing; taxi out and in fly no distance). */
export function tripSamples(profile: DesignProfile): number[] {
  const [first, last] = profile.tripLegs;
  const legs = profile.mission.history.legIndex;
  const out: number[] = [];
  for (let i = 0; i < legs.length; i++) if (legs[i]! >= first && legs[i]! <= last) out.push(i);
  return out;
}

/**
 * Each design's trip, thinned to at most `maxPoints` rows (first and last
 * kept), design after design: drawn with LineChartPanel's pathsInDataOrder,
 * each design's line runs through its own rows and ends at its own final
 * distance. Fuel burned is the trip's first mass (take-off) less the mass.
 */
export function profileCompareRows(designs: readonly DesignProfile[], units: UnitSystem, maxPoints = 300): ProfileCompareRow[] {
  const rows: ProfileCompareRow[] = [];
  designs.forEach((d, k) => {
    const trip = tripSamples(d);
    if (trip.length === 0) return;
    const h = d.mission.history;
    const start_kg = h.mass_kg[trip[0]!]!;
    for (const j of sampleIndices(trip.length, maxPoints)) {
      const i = trip[j]!;
      rows.push({
        distance: toDisplay(h.distance_m[i]!, 'distance', units),
        [profileKey('altitude', k)]: toDisplay(h.altitude_m[i]!, 'altitude', units),
        [profileKey('mass', k)]: toDisplay(h.mass_kg[i]!, 'mass', units),
        [profileKey('fuel', k)]: toDisplay(start_kg - h.mass_kg[i]!, 'mass', units),
      } as ProfileCompareRow);
    }
  });
  return rows;
}

/** One series per design, named after it. */
export function profileCompareSeries(designs: readonly DesignProfile[], quantity: ProfileQuantity): SeriesDef[] {
  return designs.map((d, k) => ({ key: profileKey(quantity, k), name: d.name, colorIndex: k }));
}
