/**
 * The JSON form of a flown mission for `blockwise fly --json` and other
 * verbs: SI values, the unit in each key, the cautions and the notice.
 */
import { SAFETY_NOTICE } from '../../engine/core';
import type { MissionResult } from '../../engine/mission';
import { distanceBasisText } from './missionSummaryText';
import type { InstallationMethodId } from '../../engine/propulsion';

export interface MissionJsonContext {
  readonly projectName: string;
  readonly inletName: string;
  readonly deckTitle: string;
  readonly parametricDeck: boolean;
  /** How recovery, bleed and extraction were applied to the deck. */
  readonly installationMethod: InstallationMethodId;
  readonly assumptions?: readonly string[];
}

/** A plain object ready for JSON.stringify (no typed arrays, no NaN: non-finite numbers become null). */
export function missionJson(result: MissionResult, context: MissionJsonContext) {
  const finite = (v: number): number | null => (Number.isFinite(v) ? v : null);
  const r = result;
  return {
    project: context.projectName,
    inlet: context.inletName,
    ...(context.assumptions === undefined ? {} : { assumptions: context.assumptions }),
    deck: { title: context.deckTitle, parametric: context.parametricDeck },
    installationMethod: context.installationMethod,
    status: r.status,
    statusMessage: r.statusMessage,
    blockFuel_kg: finite(r.blockFuel_kg),
    blockTime_s: finite(r.blockTime_s),
    tripFuel_kg: finite(r.tripFuel_kg),
    tripTime_s: finite(r.tripTime_s),
    reserveFuel_kg: finite(r.reserveFuel_kg),
    reserves: {
      contingency_kg: finite(r.reserves.contingency_kg),
      alternate_kg: finite(r.reserves.alternate_kg),
      missedApproach_kg: finite(r.reserves.missedApproach_kg),
      alternateApproach_kg: finite(r.reserves.alternateApproach_kg),
      finalReserve_kg: finite(r.reserves.finalReserve_kg),
      extra_kg: finite(r.reserves.extra_kg),
      total_kg: finite(r.reserves.total_kg),
    },
    rampWeight_kg: finite(r.rampMass_kg),
    takeoffWeight_kg: finite(r.takeoffMass_kg),
    landingWeight_kg: finite(r.landingMass_kg),
    zeroFuelWeight_kg: finite(r.zeroFuelMass_kg),
    payload_kg: finite(r.payload_kg),
    distanceBasis: r.distanceBasis,
    distanceBasisNote: distanceBasisText(r.distanceBasis),
    distance_m: finite(r.airDistance_m),
    airDistance_m: finite(r.airDistance_m),
    groundDistance_m: finite(r.groundDistance_m),
    iterations: r.iterations,
    residual_kg: finite(r.residual_kg),
    legs: r.legs.map((l) => ({
      index: l.index,
      name: l.name,
      kind: l.kind,
      startTime_s: finite(l.startTime_s),
      endTime_s: finite(l.endTime_s),
      startDistance_m: finite(l.startDistance_m),
      endDistance_m: finite(l.endDistance_m),
      startGroundDistance_m: finite(l.startGroundDistance_m),
      endGroundDistance_m: finite(l.endGroundDistance_m),
      startAltitude_m: finite(l.startAltitude_m),
      endAltitude_m: finite(l.endAltitude_m),
      startMass_kg: finite(l.startMass_kg),
      endMass_kg: finite(l.endMass_kg),
      fuel_kg: finite(l.fuel_kg),
    })),
    cautions: r.cautions.map((c) => ({
      ...c,
      ...(c.value === undefined ? {} : { value: finite(c.value) }),
      ...(c.threshold === undefined ? {} : { threshold: finite(c.threshold) }),
    })),
    notice: SAFETY_NOTICE,
  };
}
