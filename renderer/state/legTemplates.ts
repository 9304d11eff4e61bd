/** Default legs the mission editor adds (SI; a starting point the user edits). */
import { LEG_KIND_ORDER, legKindLabel, type ProjectLeg, type ProjectLegKind } from '../../engine/project';
import { FOOT_M, NAUTICAL_MILE_M } from '../../engine/units';

const FT = FOOT_M;
const KT = NAUTICAL_MILE_M / 3600;

/** Leg kinds in flight order and their labels, from the engine's one table (engine/project/legKinds.ts). */
export const LEG_KINDS = LEG_KIND_ORDER;
export type LegKindName = ProjectLegKind;
export const LEG_KIND_LABEL: Readonly<Record<LegKindName, string>> = Object.fromEntries(
  LEG_KIND_ORDER.map((k) => [k, legKindLabel(k)]),
) as Record<LegKindName, string>;

const SCHEDULE = { lowCas: 250 * KT, lowAltitudeLimit: 10000 * FT, cas: 280 * KT, mach: 0.76 };

/** A new leg of `kind` with class-typical values (common practice). */
export function newLeg(kind: LegKindName): ProjectLeg {
  switch (kind) {
    case 'taxiOut':
    case 'taxiIn':
      return { kind, time: 600, fuelFlow: 'idle' };
    case 'takeoff':
      return { kind, time: 60, fuel: null };
    case 'climb':
      return { kind, toAltitude: 35000 * FT, schedule: { ...SCHEDULE }, rating: 'maxClimb' };
    case 'cruise':
      return { kind, altitude: 35000 * FT, speed: { kind: 'mach', mach: 0.76 }, profile: { kind: 'constantAltitude' }, distance: 500 * NAUTICAL_MILE_M };
    case 'descent':
      return { kind, toAltitude: 1500 * FT, schedule: { ...SCHEDULE }, mode: { kind: 'idle' } };
    case 'hold':
      return { kind, altitude: 1500 * FT, time: 1800, speed: { kind: 'bestEndurance' } };
    case 'approach':
      return { kind, time: 300, fuel: null };
  }
}
