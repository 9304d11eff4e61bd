/**
 * Flies the mission's legs in order from block-out at a ramp mass, with the
 * solvable cruise leg's distance given. Stops at the first leg that fails and
 * says why. Leg rows and the trip's marks (take-off, landing) come back with
 * the final state.
 */
import type { LegRow, MissionInput, MissionStatus } from './missionTypes';
import { flyAllowance } from './allowanceLegs';
import { flyClimb } from './climbLeg';
import { flyCruise } from './cruiseLeg';
import { flyDescent } from './descentLeg';
import { flyHold } from './holdLeg';
import { legFailed, type LegOutcome } from './legOutcome';
import { distanceIndex, legEnvironment, type LegTarget, type MissionContext } from './missionContext';
import { S_AIR, S_ALT, S_GROUND, S_MASS, S_TIME, STATE_SIZE, type StateVector } from './missionState';
import { appendCaution } from './timeHistoryBuilder';
import { checkResidualClimb } from '../cautions/checks';
import { CAUTION_CATALOGUE } from '../cautions/cautionCatalogue';
import { msg, partsOf, q, withParts, type MessageParts } from '../units/messageParts';

export interface TripOutcome {
  readonly status: MissionStatus;
  readonly message: string;
  readonly parts?: MessageParts;
  readonly rows: readonly LegRow[];
  readonly end: StateVector;
  /** State at the start of the first airborne-side leg (after taxi out) and at landing (before taxi in). */
  readonly takeoff: StateVector;
  readonly landing: StateVector;
  /** Distance flown on the solvable cruise leg (m, in the mission's distance basis), 0 when there is none. */
  readonly solvableDistance_m: number;
  /** Distance flown after the solvable cruise leg (m, same basis), 0 when there is none. */
  readonly afterSolvable_m: number;
  /** Fuel burned on the solvable cruise leg (kg), 0 when there is none. */
  readonly solvableFuel_kg: number;
  /** Mass at the end of the solvable cruise leg (kg), 0 when there is none. */
  readonly solvableEndMass_kg: number;
  /** Fuel per metre (kg/m, mission's basis) at the end of the solvable cruise leg (its last sample), 0 when unknown. */
  readonly solvableEndFuelPerMetre: number;
  /** Fuel flow (kg/s) at the end of the solvable cruise leg (its last sample), 0 when unknown. */
  readonly solvableEndFuelFlow_kg_s: number;
  /** The state at the end of the solvable cruise leg (its top of descent), null when there is none or the trip failed before it. */
  readonly solvableEnd: StateVector | null;
}

/** Index of the cruise leg whose distance is solved (distance_m null), or -1. */
export function solvableLegIndex(input: MissionInput): number {
  return input.legs.findIndex((l) => l.kind === 'cruise' && l.distance_m === null);
}

/** Index of the first leg that is not taxi out, and of the last that is not taxi in. */
export function tripBounds(input: MissionInput): { readonly first: number; readonly last: number } {
  let first = 0;
  while (first < input.legs.length && input.legs[first].kind === 'taxiOut') first++;
  let last = input.legs.length - 1;
  while (last >= 0 && input.legs[last].kind === 'taxiIn') last--;
  return { first, last };
}

/** The state at block-out: time, distances and altitude 0, mass = ramp mass (kg). */
export function initialState(rampMass_kg: number): StateVector {
  const s = new Float64Array(STATE_SIZE);
  s[S_MASS] = rampMass_kg;
  return s;
}

/**
 * The solvable leg's distance (m, in the mission's distance basis): a number, or where it ends as an absolute
 * distance (m) that depends on the mass (kg) (top of descent predicted from the previous passes).
 */
export type SolvedDistance = number | { readonly endDistanceOf: (mass_kg: number) => number };

/** Cruise and hold legs fly at their own altitude; a jump from the altitude reached is flagged (info), not flown. */
function noteAltitudeJump(ctx: MissionContext, target: LegTarget, state: StateVector, altitude_m: number): void {
  if (Math.abs(state[S_ALT] - altitude_m) <= 1) return;
  appendCaution(
    ctx.log,
    target,
    {
      id: 'altitude_jump',
      severity: CAUTION_CATALOGUE.altitude_jump.severity,
      ...withParts(msg`${target.legName} starts at ${q(altitude_m, 'altitude')} but the previous leg ended at ${q(state[S_ALT], 'altitude')}; the change is not flown.`),
      value: altitude_m,
      threshold: state[S_ALT],
    },
    state[S_TIME],
  );
}

function flyLeg(ctx: MissionContext, index: number, state: StateVector, solved: SolvedDistance, isSolvable: boolean): LegOutcome {
  const leg = ctx.input.legs[index];
  const target: LegTarget = { legIndex: index, legName: leg.name, env: legEnvironment(ctx.input, leg), recordHistory: true };
  switch (leg.kind) {
    case 'taxiOut':
    case 'takeoff':
    case 'approach':
    case 'taxiIn':
      return flyAllowance(ctx, target, state, leg);
    case 'climb': {
      const out = flyClimb(ctx, target, state, leg.toAltitude_m, leg.schedule, leg.rating);
      if (out.status === 'ok' && out.lastSample !== null) {
        appendCaution(
          ctx.log,
          target,
          checkResidualClimb(out.lastSample.climbRate_m_s, ctx.input.cautionSettings.minResidualClimbRate_m_s),
          out.state[S_TIME],
        );
      }
      if (out.status === 'climb_not_reached') {
        appendCaution(
          ctx.log,
          target,
          {
            id: 'climb_not_reached',
            severity: CAUTION_CATALOGUE.climb_not_reached.severity,
            message: out.message,
            ...(out.parts ? { parts: out.parts } : {}),
            value: out.state[S_ALT],
            threshold: leg.toAltitude_m,
          },
          out.state[S_TIME],
        );
      }
      return out;
    }
    case 'cruise':
      noteAltitudeJump(ctx, target, state, leg.altitude_m);
      return flyCruise(ctx, target, state, {
        altitude_m: leg.altitude_m,
        speed: leg.speed,
        profile: leg.profile,
        distance_m: leg.distance_m ?? (typeof solved === 'number' ? Math.max(solved, 0) : 0),
        endDistanceOf: isSolvable && typeof solved !== 'number' ? solved.endDistanceOf : undefined,
      });
    case 'descent':
      return flyDescent(ctx, target, state, leg.toAltitude_m, leg.schedule, leg.mode);
    case 'hold':
      noteAltitudeJump(ctx, target, state, leg.altitude_m);
      return flyHold(ctx, target, state, leg.altitude_m, leg.time_s, leg.speed);
  }
}

/** Fuel per metre (kg/m) of the mission's distance basis at a leg's last sample (level flight: TAS, plus the wind over the ground); 0 when unknown. */
function endFuelPerMetre(ctx: MissionContext, index: number, out: LegOutcome): number {
  const sample = out.lastSample;
  if (sample === null) return 0;
  const speed = sample.tas_m_s + (distanceIndex(ctx.input) === S_GROUND ? legEnvironment(ctx.input, ctx.input.legs[index]).wind_m_s : 0);
  const perMetre = sample.fuelFlow_kg_s / speed;
  return speed > 0 && Number.isFinite(perMetre) && perMetre > 0 ? perMetre : 0;
}

/** flyLeg with a last-resort guard: a fault inside a leg (a bug) ends the trip with 'internal_error' naming the leg. */
function flyLegGuarded(ctx: MissionContext, index: number, state: StateVector, solved: SolvedDistance, isSolvable: boolean): LegOutcome {
  try {
    return flyLeg(ctx, index, state, solved, isSolvable);
  } catch (e) {
    const leg = ctx.input.legs[index];
    const what = e instanceof Error ? e.message : String(e);
    return legFailed(state.slice(), 'internal_error', `Internal error while flying leg ${index + 1} (${leg.kind} "${leg.name}"): ${what}. Please report it with the project file.`, null);
  }
}

/** Flies every leg from `rampMass_kg`; `solvedDistance` gives the distance of the solvable cruise leg (mission's basis). */
export function flyTrip(ctx: MissionContext, rampMass_kg: number, solvedDistance: SolvedDistance): TripOutcome {
  const { first, last } = tripBounds(ctx.input);
  const solvable = solvableLegIndex(ctx.input);
  const k = distanceIndex(ctx.input);
  let state = initialState(rampMass_kg);
  let takeoff = state;
  let landing = state;
  let solvableDistance_m = 0;
  let solvableEnd_m = 0;
  let solvableEndMass_kg = 0;
  let solvableFuel_kg = 0;
  let solvableEndFuelPerMetre = 0;
  let solvableEnd: StateVector | null = null;
  let solvableEndFuelFlow_kg_s = 0;
  const rows: LegRow[] = [];
  for (let i = 0; i < ctx.input.legs.length; i++) {
    if (i === first) takeoff = state.slice();
    const start = state;
    const out = flyLegGuarded(ctx, i, state, solvedDistance, i === solvable);
    state = out.state;
    rows.push({
      index: i,
      name: ctx.input.legs[i].name,
      kind: ctx.input.legs[i].kind,
      startTime_s: start[S_TIME],
      endTime_s: state[S_TIME],
      startDistance_m: start[S_AIR],
      endDistance_m: state[S_AIR],
      startGroundDistance_m: start[S_GROUND],
      endGroundDistance_m: state[S_GROUND],
      startAltitude_m: start[S_ALT],
      endAltitude_m: state[S_ALT],
      startMass_kg: start[S_MASS],
      endMass_kg: state[S_MASS],
      fuel_kg: start[S_MASS] - state[S_MASS],
    });
    if (i === solvable) {
      solvableDistance_m = state[k] - start[k];
      solvableEnd_m = state[k];
      solvableEndMass_kg = state[S_MASS];
      solvableFuel_kg = start[S_MASS] - state[S_MASS];
      solvableEndFuelPerMetre = endFuelPerMetre(ctx, i, out);
      solvableEnd = state.slice();
      solvableEndFuelFlow_kg_s = out.lastSample !== null && out.lastSample.fuelFlow_kg_s > 0 ? out.lastSample.fuelFlow_kg_s : 0;
    }
    if (i === last) landing = state.slice();
    if (out.status !== 'ok') {
      // A failed mission always names the leg, the time and the cause.
      const where = msg` (leg ${i + 1} "${ctx.input.legs[i].name}", ${q(state[S_TIME], 'time')} after block-out)`;
      const told = withParts([...partsOf(out), ...where]);
      return { status: out.status, ...told, rows, end: state, takeoff, landing: state, solvableDistance_m, afterSolvable_m: 0, solvableEndMass_kg, solvableFuel_kg, solvableEndFuelPerMetre, solvableEndFuelFlow_kg_s, solvableEnd: null };
    }
  }
  if (last < first) landing = state.slice();
  const afterSolvable_m = solvable >= 0 ? state[k] - solvableEnd_m : 0;
  return { status: 'ok', message: '', rows, end: state, takeoff, landing, solvableDistance_m, afterSolvable_m, solvableEndMass_kg, solvableFuel_kg, solvableEndFuelPerMetre, solvableEndFuelFlow_kg_s, solvableEnd };
}

/** What the legs after the solvable cruise leg take from one top of descent: distance (m, mission's basis) and fuel to landing (kg). */
export interface AfterSolvableFlight {
  readonly distance_m: number;
  readonly fuelToLanding_kg: number;
}

/**
 * Flies the legs after the solvable cruise leg (descent, approach, taxi in, and any other) from a top of descent:
 * `top` with its mass replaced by `mass_kg`. A trial for the fuel iteration (its log records nothing the result
 * shows); null when a leg fails or there is no solvable leg.
 */
export function flyAfterSolvable(ctx: MissionContext, top: StateVector, mass_kg: number): AfterSolvableFlight | null {
  const solvable = solvableLegIndex(ctx.input);
  if (solvable < 0) return null;
  const { last } = tripBounds(ctx.input);
  const k = distanceIndex(ctx.input);
  let state = top.slice();
  state[S_MASS] = mass_kg;
  let landing_kg = mass_kg;
  for (let i = solvable + 1; i < ctx.input.legs.length; i++) {
    const out = flyLegGuarded(ctx, i, state, 0, false);
    if (out.status !== 'ok') return null;
    state = out.state;
    if (i === last) landing_kg = state[S_MASS];
  }
  if (last <= solvable) landing_kg = state[S_MASS];
  const distance_m = state[k] - top[k];
  const fuelToLanding_kg = mass_kg - landing_kg;
  return Number.isFinite(distance_m) && Number.isFinite(fuelToLanding_kg) ? { distance_m, fuelToLanding_kg } : null;
}
