/**
 * Fuel iteration for the solve modes. One evaluation flies the trip and the
 * reserves (fuel may pass below zero-fuel mass while iterating) and returns
 * the residual = fuel on board at landing - reserve fuel required.
 *
 * - payloadRange: the ramp mass is found by the secant method so the residual
 *   is within FUEL_TOLERANCE_KG, while the solvable cruise leg's distance is
 *   reset each pass so the trip's total distance equals the range (within
 *   DISTANCE_TOLERANCE_M). Distances are in the mission's distance basis:
 *   over the ground (default) or in still air (missionContext.ts).
 * - fixed ramp mass (maxRange, or takeoffWeight with a solvable leg): the
 *   solvable leg's distance is found by the secant method so the
 *   residual vanishes.
 * Secant method: any numerical-analysis text (e.g. Burden & Faires,
 * Numerical Analysis, section 2.3).
 */
import { basisSpecificRange, specificRangeAt } from './bestSpeeds';
import { cruiseMach } from './cruiseLeg';
import { flyReserves, type ReserveFlight } from './reserves';
import { flyTrip, solvableLegIndex, type SolvedDistance, type TripOutcome } from './flyTrip';
import { distanceIndex, legEnvironment, type MissionContext } from './missionContext';
import { S_AIR, S_MASS, S_TIME } from './missionState';
import { createFlightLog, type FlightLog } from './timeHistoryBuilder';
import { msg, q, type MessageParts } from '../units/messageParts';

/** Fuel residual tolerance (kg): the mission lands with the reserve plus 0 to this much (never less). */
export const FUEL_TOLERANCE_KG = 0.1;
/** The iteration aims at the middle of the band [0, FUEL_TOLERANCE_KG] so the reserve is never undercut. */
const AIM_KG = FUEL_TOLERANCE_KG / 2;

/** True when a residual (kg) lies in [0, FUEL_TOLERANCE_KG]. */
function fuelConverged(residual_kg: number): boolean {
  return residual_kg >= 0 && residual_kg <= FUEL_TOLERANCE_KG;
}
/** Range tolerance (m) of the payloadRange mode. */
export const DISTANCE_TOLERANCE_M = 1;
export const MAX_ITERATIONS = 40;
/** A ramp mass beyond this multiple of the heaviest plausible mass (MTOW, or zero-fuel mass + fuel capacity) ends the iteration as not converged. */
export const RAMP_MASS_GUARD = 3;

export interface MissionEvaluation {
  readonly trip: TripOutcome;
  readonly reserves: ReserveFlight;
  readonly residual_kg: number;
  /** The log the flight wrote (history and cautions). */
  readonly log: FlightLog;
}

/** Flies trip and reserves from `rampMass_kg` with the solvable leg's distance given (or given by the distance flown so far). */
export function evaluateMission(ctx: MissionContext, rampMass_kg: number, distance: SolvedDistance): MissionEvaluation {
  const trip = flyTrip(ctx, rampMass_kg, distance);
  const tripFuel_kg = trip.takeoff[S_MASS] - trip.landing[S_MASS];
  const tripTime_s = trip.landing[S_TIME] - trip.takeoff[S_TIME];
  const reserves = flyReserves(ctx, { tripFuel_kg, tripTime_s, landing: trip.landing });
  const residual_kg = trip.landing[S_MASS] - ctx.zeroFuelMass_kg - reserves.breakdown.total_kg;
  return { trip, reserves, residual_kg, log: ctx.log };
}

/** Where the iteration stopped: ramp mass (kg), solvable-leg still-air distance (m), passes, last residual (kg). */
interface IterationPoint {
  readonly rampMass_kg: number;
  readonly distance_m: number;
  readonly iterations: number;
  readonly residual_kg: number;
}

/**
 * How a fuel iteration ended, one case each: converged (the pass, recorded
 * like a final flight but flown with fuel exhaustion not enforced, may be
 * the result); a flight inside the iteration failed for a reason other than
 * fuel; the problem has no solution for a reason the iteration names; or it
 * did not converge within its passes or guard.
 */
export type IterationOutcome =
  | (IterationPoint & { readonly kind: 'converged'; readonly pass: MissionEvaluation })
  | (IterationPoint & { readonly kind: 'flightFailed'; readonly failure: MissionEvaluation })
  | (IterationPoint & { readonly kind: 'infeasible'; readonly message: MessageParts })
  | (IterationPoint & { readonly kind: 'notConverged'; readonly message: MessageParts });

function notConverged(what: string, point: IterationPoint): IterationOutcome {
  return {
    kind: 'notConverged',
    ...point,
    message: msg`${what} iteration did not converge after ${point.iterations} passes; residual ${q(point.residual_kg, 'mass')}.`,
  };
}

/** A pass of the iteration: fuel may pass below zero-fuel mass; history and cautions recorded so a converged pass can be the result. */
function scratch(ctx: MissionContext): MissionContext {
  return {
    ...ctx,
    options: { ...ctx.options, allowNegativeFuel: true },
    log: createFlightLog(ctx.input.airframe, ctx.input.cautionSettings),
  };
}

function failedFlight(e: MissionEvaluation): boolean {
  return e.trip.status !== 'ok' || e.reserves.status !== 'ok';
}

/**
 * payloadRange: ramp mass (kg) so the residual vanishes while the trip's
 * distance (mission's basis) is `range_m`. The solvable leg ends at its top of
 * descent: where the distance flown plus the distance the legs after it will
 * take equals the range, the latter predicted as a linear function of the
 * mass there from the last two passes (within DISTANCE_TOLERANCE_M at
 * convergence).
 */
export function iterateRampMass(ctx: MissionContext, range_m: number, firstGuess_kg: number): IterationOutcome {
  const seen: { readonly mass_kg: number; readonly after_m: number }[] = [];
  const afterOf = (mass_kg: number) => {
    const n = seen.length;
    if (n === 0) return 0;
    const b = seen[n - 1];
    if (n === 1 || Math.abs(b.mass_kg - seen[n - 2].mass_kg) < 1) return b.after_m;
    const a = seen[n - 2];
    return b.after_m + ((b.after_m - a.after_m) / (b.mass_kg - a.mass_kg)) * (mass_kg - b.mass_kg);
  };
  const distance = { endDistanceOf: (mass_kg: number) => range_m - afterOf(mass_kg) };
  const basis = distanceIndex(ctx.input);
  const remember = (e: MissionEvaluation) => {
    if (e.trip.solvableDistance_m > 0) seen.push({ mass_kg: e.trip.solvableEndMass_kg, after_m: e.trip.afterSolvable_m });
  };
  let x0 = firstGuess_kg;
  let e0 = evaluateMission(scratch(ctx), x0, distance);
  let d = e0.trip.solvableDistance_m;
  if (failedFlight(e0)) return { kind: 'flightFailed', rampMass_kg: x0, distance_m: d, iterations: 1, residual_kg: e0.residual_kg, failure: e0 };
  remember(e0);
  // The residual each pass would have had at exactly the range: the distance error costs the solvable leg's fuel per metre.
  const atRange = (e: MissionEvaluation) => e.residual_kg - AIM_KG + (e.trip.end[basis] - range_m) * solvableFuelPerMetre(e);
  // First slope: for a Breguet-like flight, d(landing fuel)/d(ramp mass) = landing mass / ramp mass.
  const ratio = e0.trip.landing[S_MASS] / x0;
  let x1 = x0 - atRange(e0) / (Number.isFinite(ratio) && ratio > 0.2 && ratio <= 1 ? ratio : 0.85);
  const guard = RAMP_MASS_GUARD * Math.max(ctx.input.airframe.mtow_kg, ctx.zeroFuelMass_kg + ctx.input.airframe.maxFuel_kg);
  for (let k = 2; k <= MAX_ITERATIONS; k++) {
    if (!Number.isFinite(x1) || x1 <= ctx.zeroFuelMass_kg * 0.5 || x1 > guard) {
      return notConverged('Fuel', { rampMass_kg: x0, distance_m: d, iterations: k - 1, residual_kg: e0.residual_kg });
    }
    const e1 = evaluateMission(scratch(ctx), x1, distance);
    d = e1.trip.solvableDistance_m;
    if (failedFlight(e1)) return { kind: 'flightFailed', rampMass_kg: x1, distance_m: d, iterations: k, residual_kg: e1.residual_kg, failure: e1 };
    const distanceError = e1.trip.end[basis] - range_m;
    if (fuelConverged(e1.residual_kg) && Math.abs(distanceError) <= DISTANCE_TOLERANCE_M) {
      return { kind: 'converged', rampMass_kg: x1, distance_m: d, iterations: k, residual_kg: e1.residual_kg, pass: e1 };
    }
    if (d === 0 && distanceError > DISTANCE_TOLERANCE_M) {
      return {
        kind: 'infeasible',
        rampMass_kg: x1,
        distance_m: 0,
        iterations: k,
        residual_kg: e1.residual_kg,
        message: msg`The range ${q(range_m, 'distance')} is shorter than the other legs' ${q(e1.trip.end[basis], 'distance')} ${basis === S_AIR ? 'of still air' : 'over the ground'}.`,
      };
    }
    remember(e1);
    // Secant method on the residual at exactly the range.
    const f0 = atRange(e0);
    const f1 = atRange(e1);
    const slope = (f1 - f0) / (x1 - x0);
    const ratio1 = e1.trip.landing[S_MASS] / x1;
    const fallback = Number.isFinite(ratio1) && ratio1 > 0.2 && ratio1 <= 1 ? ratio1 : 0.85;
    const next = Number.isFinite(slope) && Math.abs(slope) > 0.05 ? x1 - f1 / slope : x1 - f1 / fallback;
    x0 = x1;
    e0 = e1;
    x1 = next;
  }
  return notConverged('Fuel', { rampMass_kg: x1, distance_m: d, iterations: MAX_ITERATIONS, residual_kg: e0.residual_kg });
}

/** Fuel burned per metre (of the mission's distance basis) on the solvable cruise leg of a pass (kg/m), 0 when unknown. */
function solvableFuelPerMetre(e: MissionEvaluation): number {
  const d = e.trip.solvableDistance_m;
  return d > 0 ? e.trip.solvableFuel_kg / d : 0;
}

/** Fixed ramp mass: the solvable leg's distance (m, mission's basis) so the residual vanishes. */
export function iterateDistance(ctx: MissionContext, rampMass_kg: number): IterationOutcome {
  const input = ctx.input;
  let d0 = 0;
  let e0 = evaluateMission(scratch(ctx), rampMass_kg, d0);
  if (failedFlight(e0)) return { kind: 'flightFailed', rampMass_kg, distance_m: 0, iterations: 1, residual_kg: e0.residual_kg, failure: e0 };
  if (e0.residual_kg < 0) {
    return {
      kind: 'infeasible',
      rampMass_kg,
      distance_m: 0,
      iterations: 1,
      residual_kg: e0.residual_kg,
      message: msg`The reserve cannot be carried even with the solvable cruise leg at zero length: short by ${q(-e0.residual_kg, 'mass')}.`,
    };
  }
  if (fuelConverged(e0.residual_kg)) {
    return { kind: 'converged', rampMass_kg, distance_m: 0, iterations: 1, residual_kg: e0.residual_kg, pass: e0 };
  }
  const leg = input.legs[solvableLegIndex(input)];
  let sr = 0;
  if (leg && leg.kind === 'cruise') {
    const env = legEnvironment(input, leg);
    const m = e0.trip.takeoff[S_MASS];
    const mach = cruiseMach(input, leg.speed, leg.altitude_m, m, env.isaDev_K);
    sr = basisSpecificRange(input, specificRangeAt(input, leg.altitude_m, mach, m, env.isaDev_K), leg.altitude_m, mach, env);
  }
  let d1 = (e0.residual_kg - AIM_KG) * (sr > 0 ? sr : 100);
  for (let k = 2; k <= MAX_ITERATIONS; k++) {
    const e1 = evaluateMission(scratch(ctx), rampMass_kg, d1);
    if (failedFlight(e1)) return { kind: 'flightFailed', rampMass_kg, distance_m: d1, iterations: k, residual_kg: e1.residual_kg, failure: e1 };
    if (fuelConverged(e1.residual_kg)) {
      return { kind: 'converged', rampMass_kg, distance_m: d1, iterations: k, residual_kg: e1.residual_kg, pass: e1 };
    }
    const slope = (e1.residual_kg - e0.residual_kg) / (d1 - d0);
    const aimed = e1.residual_kg - AIM_KG;
    let next = Number.isFinite(slope) && slope < 0 ? d1 - aimed / slope : d1 + aimed * (sr > 0 ? sr : 100);
    if (next < 0) next = 0.5 * d1;
    d0 = d1;
    e0 = e1;
    d1 = next;
    if (!Number.isFinite(d1)) break;
  }
  return notConverged('Range', { rampMass_kg, distance_m: d1, iterations: MAX_ITERATIONS, residual_kg: e0.residual_kg });
}
