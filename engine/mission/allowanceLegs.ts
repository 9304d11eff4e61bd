/**
 * Allowance legs: taxi out, take-off, approach, taxi in. Each burns fuel for a
 * time at a fuel flow (or a set fuel) at the current altitude without
 * distance:
 * - taxi: set fuel flow, or the flightIdle fuel flow at Mach 0 (static);
 * - take-off: set fuel, or the time at the takeoff rating at Mach 0 (static);
 * - approach: set fuel, or the time at the flightIdle fuel flow at Mach 0.2;
 *   it ends the trip at the destination elevation (MissionInput
 *   destinationElevation_m, default 0 m): the altitude falls linearly from
 *   where the descent left it to the elevation over the allowance's time,
 *   and the flightIdle fuel flow is taken at the middle altitude;
 * - taxi in: at the destination elevation.
 * Common-practice allowances; the leg rows show them as such.
 */
import type { Leg, MissionInput } from './missionTypes';
import type { InstalledPoint } from '../propulsion/propulsionModel';
import { legOk, legFailed, type LegOutcome } from './legOutcome';
import { MASS_FLOOR_FRACTION } from './flySegment';
import type { LegTarget, MissionContext } from './missionContext';
import { S_ALT, S_MASS, S_TIME, type FlightSample, type StateVector } from './missionState';
import { appendSample } from './timeHistoryBuilder';
import { msg, q } from '../units/messageParts';

/** Mach (-) at which the approach allowance takes the flightIdle fuel flow. */
export const APPROACH_MACH = 0.2;

export type AllowanceLeg = Extract<Leg, { kind: 'taxiOut' | 'takeoff' | 'approach' | 'taxiIn' }>;

/** Fuel (kg) and time (s) of an allowance leg at pressure altitude (m) with ISA deviation (K). */
export function allowanceFuel(
  input: MissionInput,
  leg: AllowanceLeg,
  altitude_m: number,
  isaDev_K: number,
): { readonly fuel_kg: number; readonly time_s: number; readonly point: InstalledPoint | null } {
  const time_s = Math.max(leg.time_s, 0);
  if (leg.kind === 'taxiOut' || leg.kind === 'taxiIn') {
    if (leg.fuelFlow_kg_s !== 'idle') return { fuel_kg: leg.fuelFlow_kg_s * time_s, time_s, point: null };
    const p = input.propulsion.atRating({ altitude_m, mach: 0, isaDev_K }, 'flightIdle');
    return { fuel_kg: p.fuelFlow_kg_s * time_s, time_s, point: p };
  }
  if (leg.fuel_kg !== null) return { fuel_kg: leg.fuel_kg, time_s, point: null };
  const rating = leg.kind === 'takeoff' ? 'takeoff' : 'flightIdle';
  const mach = leg.kind === 'takeoff' ? 0 : APPROACH_MACH;
  const p = input.propulsion.atRating({ altitude_m, mach, isaDev_K }, rating);
  return { fuel_kg: p.fuelFlow_kg_s * time_s, time_s, point: p };
}

function allowanceSample(altitude_m: number, fuelFlow_kg_s: number, point: InstalledPoint | null): FlightSample {
  return {
    altitude_m,
    mach: 0,
    cas_m_s: 0,
    tas_m_s: 0,
    thrustAvailable_N: point?.thrust_N ?? 0,
    thrustUsed_N: point?.thrust_N ?? 0,
    drag_N: 0,
    fuelFlow_kg_s,
    cl: 0,
    clMax: 0,
    buffetLoadFactor: 0,
    liftToDrag: 0,
    climbRate_m_s: 0,
    throatMach: point?.perEngine.throatMach ?? null,
    polarOutside: [],
    idleAboveDrag: false,
    propulsionCautions: point?.cautions ?? [],
  };
}

/** Elevation of the destination aerodrome (m): MissionInput.destinationElevation_m, or 0 m (sea level) when absent. */
export function destinationElevation(input: MissionInput): number {
  return input.destinationElevation_m ?? 0;
}

/**
 * Flies an allowance leg: mass and time advance, distance does not; approach and taxi in end at the arrival
 * elevation `arrivalElevation_m` (m; by default the destination's, the reserves pass the alternate's). The allowance stops where the fuel runs out (at zero-fuel mass, the time cut in proportion): always
 * when fuel exhaustion is enforced, and during the fuel iteration at the mission domain's mass floor
 * (flySegment.ts MASS_FLOOR_FRACTION), so no leg ever starts from a mass the models cannot fly.
 */
export function flyAllowance(
  ctx: MissionContext,
  target: LegTarget,
  start: StateVector,
  leg: AllowanceLeg,
  arrivalElevation_m: number = destinationElevation(ctx.input),
): LegOutcome {
  const arriving = leg.kind === 'approach' || leg.kind === 'taxiIn';
  const startAltitude_m = leg.kind === 'taxiIn' ? arrivalElevation_m : start[S_ALT];
  const endAltitude_m = arriving ? arrivalElevation_m : start[S_ALT];
  const { fuel_kg, time_s, point } = allowanceFuel(ctx.input, leg, 0.5 * (startAltitude_m + endAltitude_m), target.env.isaDev_K);
  const flow = time_s > 0 ? fuel_kg / time_s : 0;
  const state = start.slice();
  state[S_ALT] = startAltitude_m;
  appendSample(ctx.log, target, state, allowanceSample(startAltitude_m, flow, point));
  const floor_kg = ctx.options.allowNegativeFuel ? MASS_FLOOR_FRACTION * ctx.zeroFuelMass_kg : ctx.zeroFuelMass_kg;
  const available_kg = Math.max(state[S_MASS] - floor_kg, 0);
  const exhausted = fuel_kg > available_kg;
  const share = exhausted && fuel_kg > 0 ? available_kg / fuel_kg : 1;
  state[S_TIME] += time_s * share;
  state[S_MASS] -= exhausted ? available_kg : fuel_kg;
  state[S_ALT] = startAltitude_m + (endAltitude_m - startAltitude_m) * share;
  const sample = allowanceSample(state[S_ALT], flow, point);
  appendSample(ctx.log, target, state, sample);
  if (exhausted) {
    const minutes = (time_s * share) / 60;
    return legFailed(
      state,
      'fuel_exhausted',
      msg`Fuel exhausted during ${target.legName} after ${minutes.toFixed(1)} of its ${(time_s / 60).toFixed(1)} min: it needs ${q(fuel_kg, 'mass')}, ${q(available_kg, 'mass')} was left.`,
      sample,
    );
  }
  return legOk(state, sample);
}
