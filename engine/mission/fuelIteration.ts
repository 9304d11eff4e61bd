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
import { freshFlightLog, type FlightLog } from './timeHistoryBuilder';
import type { Leg, MissionInput, MissionStart } from './missionTypes';
import { FOOT_M } from '../units/unitTable';
import { msg, q, type MessageParts } from '../units/messageParts';

/**
 * Fuel residual tolerance (kg) of payloadRange: the mission lands with the reserve plus 0 to this much (never
 * less). Block fuel moves by about 0.15 kg per kg of residual there (the ramp mass carries most of it back), so at
 * 0.02 kg the demo's block fuel is within 7e-7 relative of the exactly converged one (docs/mission.md, Solve modes).
 */
export const FUEL_TOLERANCE_KG = 0.02;
/**
 * Fuel residual tolerance (kg) with a fixed ramp mass (maxRange, takeoffWeight with a solvable leg): the residual
 * is fuel not burned, so block fuel moves kilogram for kilogram with it and the range by the leg's specific range;
 * at 0.004 kg the demo's block fuel and range are within 1e-6 relative of the exactly converged ones.
 */
export const FIXED_MASS_FUEL_TOLERANCE_KG = 0.004;

/** The fuel band a solve iterates into: [0, tolerance_kg], aimed at its middle so the reserve is never undercut. */
export interface FuelBand {
  readonly tolerance_kg: number;
  readonly aim_kg: number;
}

/** The band of a tolerance (kg): the mode's default (`fallback_kg`) unless a positive finite one is given (convergence studies). */
export function fuelBand(tolerance_kg: number | undefined, fallback_kg = FUEL_TOLERANCE_KG): FuelBand {
  const t = tolerance_kg !== undefined && Number.isFinite(tolerance_kg) && tolerance_kg > 0 ? tolerance_kg : fallback_kg;
  return { tolerance_kg: t, aim_kg: t / 2 };
}

/** True when a residual (kg) lies in [0, band's tolerance]. */
function fuelConverged(residual_kg: number, band: FuelBand): boolean {
  return residual_kg >= 0 && residual_kg <= band.tolerance_kg;
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
  | (IterationPoint & { readonly kind: 'converged'; readonly pass: MissionEvaluation; readonly warmStart: MissionStart })
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
    log: freshFlightLog(ctx.log),
  };
}

function failedFlight(e: MissionEvaluation): boolean {
  return e.trip.status !== 'ok' || e.reserves.status !== 'ok';
}

/** A usable number: finite, and positive when `positive`. */
function usable(v: number | undefined, positive = false): v is number {
  return v !== undefined && Number.isFinite(v) && (!positive || v > 0);
}

/**
 * The distance after the solvable cruise leg (m) as a linear function of the mass at its end (kg): the top of
 * descent the trip predicts. Each pass adds a point; the slope is the one through the last two points at least
 * 1 kg apart (a warm start's slope until then; none, a constant, on a cold start).
 */
class AfterSolvableModel {
  private mass_kg = 0;
  private distance_m = 0;
  private perKg_m = 0;
  private known = false;

  constructor(prior: MissionStart['afterSolvable']) {
    if (prior && usable(prior.mass_kg, true) && usable(prior.distance_m) && usable(prior.perKg_m)) {
      this.mass_kg = prior.mass_kg;
      this.distance_m = prior.distance_m;
      this.perKg_m = prior.perKg_m;
      this.known = true;
    }
  }

  at(mass_kg: number): number {
    return this.known ? this.distance_m + this.perKg_m * (mass_kg - this.mass_kg) : 0;
  }

  /** Adds a pass's end-of-leg mass (kg) and distance after the leg (m). */
  add(mass_kg: number, distance_m: number): void {
    if (!usable(mass_kg, true) || !usable(distance_m)) return;
    if (this.known && Math.abs(mass_kg - this.mass_kg) >= 1) this.perKg_m = (distance_m - this.distance_m) / (mass_kg - this.mass_kg);
    this.mass_kg = mass_kg;
    this.distance_m = distance_m;
    this.known = true;
  }

  model(): MissionStart['afterSolvable'] {
    return this.known ? { mass_kg: this.mass_kg, distance_m: this.distance_m, perKg_m: this.perKg_m } : undefined;
  }
}

/** A warm start's d(residual)/d(ramp mass) (-) worth stepping with: a heavier start lands with more fuel, by less than it carries twice over. */
function plausibleRampSlope(slope: number | undefined): slope is number {
  return usable(slope) && slope > 0.05 && slope <= 2;
}

/** The cold second-pass slope d(residual)/d(ramp mass) (-): the landing/ramp mass ratio of a pass (Breguet-like flight), 0.85 when implausible. */
function ratioSlope(e: MissionEvaluation, rampMass_kg: number): number {
  const ratio = e.trip.landing[S_MASS] / rampMass_kg;
  return Number.isFinite(ratio) && ratio > 0.2 && ratio <= 1 ? ratio : 0.85;
}

/**
 * payloadRange: ramp mass (kg) so the residual lies in the fuel band while the trip's distance (mission's basis)
 * is `range_m`. The solvable leg ends at its top of descent: where the distance flown plus the distance the legs
 * after it will take equals the range, the latter predicted as a linear function of the mass there
 * (AfterSolvableModel; within DISTANCE_TOLERANCE_M at convergence). The first pass flies from the warm start's ramp
 * mass, else `firstGuess_kg`; the second steps with the warm start's slope, else the landing/ramp mass ratio; then
 * the secant method, all on each pass's residual corrected to exactly the range.
 */
export function iterateRampMass(ctx: MissionContext, range_m: number, firstGuess_kg: number, start: MissionStart = {}, band: FuelBand = fuelBand(undefined)): IterationOutcome {
  const after = new AfterSolvableModel(start.afterSolvable);
  const distance = { endDistanceOf: (mass_kg: number) => range_m - after.at(mass_kg) };
  const basis = distanceIndex(ctx.input);
  const remember = (e: MissionEvaluation) => {
    if (e.trip.solvableDistance_m > 0) after.add(e.trip.solvableEndMass_kg, e.trip.afterSolvable_m);
  };
  let x0 = usable(start.rampMass_kg, true) && start.rampMass_kg > ctx.zeroFuelMass_kg ? start.rampMass_kg : firstGuess_kg;
  let e0 = evaluateMission(scratch(ctx), x0, distance);
  let d = e0.trip.solvableDistance_m;
  if (failedFlight(e0)) return { kind: 'flightFailed', rampMass_kg: x0, distance_m: d, iterations: 1, residual_kg: e0.residual_kg, failure: e0 };
  const converged = (x: number, e: MissionEvaluation, k: number, slope: number): IterationOutcome => ({
    kind: 'converged',
    rampMass_kg: x,
    distance_m: e.trip.solvableDistance_m,
    iterations: k,
    residual_kg: e.residual_kg,
    pass: e,
    warmStart: { rampMass_kg: x, slope, afterSolvable: after.model() },
  });
  // A warm start may land in the band at once.
  if (fuelConverged(e0.residual_kg, band) && Math.abs(e0.trip.end[basis] - range_m) <= DISTANCE_TOLERANCE_M) {
    remember(e0);
    return converged(x0, e0, 1, plausibleRampSlope(start.slope) ? start.slope : ratioSlope(e0, x0));
  }
  remember(e0);
  // The residual each pass would have had at exactly the range: the distance error costs the solvable leg's fuel per metre at its end.
  const atRange = (e: MissionEvaluation) => e.residual_kg - band.aim_kg + (e.trip.end[basis] - range_m) * solvableFuelPerMetre(e);
  let slope = plausibleRampSlope(start.slope) ? start.slope : ratioSlope(e0, x0);
  let f0 = atRange(e0);
  let x1 = x0 - f0 / slope;
  const guard = RAMP_MASS_GUARD * Math.max(ctx.input.airframe.mtow_kg, ctx.zeroFuelMass_kg + ctx.input.airframe.maxFuel_kg);
  for (let k = 2; k <= MAX_ITERATIONS; k++) {
    if (!Number.isFinite(x1) || x1 <= ctx.zeroFuelMass_kg * 0.5 || x1 > guard) {
      return notConverged('Fuel', { rampMass_kg: x0, distance_m: d, iterations: k - 1, residual_kg: e0.residual_kg });
    }
    const e1 = evaluateMission(scratch(ctx), x1, distance);
    d = e1.trip.solvableDistance_m;
    if (failedFlight(e1)) return { kind: 'flightFailed', rampMass_kg: x1, distance_m: d, iterations: k, residual_kg: e1.residual_kg, failure: e1 };
    const distanceError = e1.trip.end[basis] - range_m;
    const f1 = atRange(e1);
    const secant = (f1 - f0) / (x1 - x0);
    if (Number.isFinite(secant) && Math.abs(secant) > 0.05) slope = secant;
    if (fuelConverged(e1.residual_kg, band) && Math.abs(distanceError) <= DISTANCE_TOLERANCE_M) {
      remember(e1);
      return converged(x1, e1, k, slope);
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
    // Secant method on the residual at exactly the range (the last usable slope when the secant is degenerate).
    const next = Number.isFinite(secant) && Math.abs(secant) > 0.05 ? x1 - f1 / secant : x1 - f1 / ratioSlope(e1, x1);
    x0 = x1;
    e0 = e1;
    f0 = f1;
    x1 = next;
  }
  return notConverged('Fuel', { rampMass_kg: x1, distance_m: d, iterations: MAX_ITERATIONS, residual_kg: e0.residual_kg });
}

/** Fuel burned per metre (of the mission's distance basis) at the end of the solvable cruise leg of a pass (kg/m; the leg's mean when its last sample says nothing), 0 when unknown. */
function solvableFuelPerMetre(e: MissionEvaluation): number {
  if (e.trip.solvableEndFuelPerMetre > 0) return e.trip.solvableEndFuelPerMetre;
  const d = e.trip.solvableDistance_m;
  return d > 0 ? e.trip.solvableFuel_kg / d : 0;
}

/** The share of trip fuel the reserve policy adds as contingency (ICAO Annex 6 and custom presets), 0 otherwise. */
function contingencyShare(input: MissionInput): number {
  const p = input.reserves;
  return (p.preset === 'icaoAnnex6' || p.preset === 'custom') && p.contingencyFraction > 0 ? p.contingencyFraction : 0;
}

/**
 * Distance (m, mission's basis) a cruise leg flies on `fuel_kg` from `startMass_kg`: the integral of the specific
 * range over the mass, by Simpson's rule on four intervals (Burden & Faires, Numerical Analysis, 4.3), at each mass
 * the best specific range among the leg's levels (its altitude, its steps up to the maximum, or for a cruise-climb
 * every 1,000 ft up to the maximum); NaN when a specific range is not positive.
 */
function spareFuelDistance(input: MissionInput, leg: Extract<Leg, { kind: 'cruise' }>, env: { readonly isaDev_K: number; readonly wind_m_s: number }, startMass_kg: number, fuel_kg: number): number {
  if (!(fuel_kg > 0) || !(startMass_kg - fuel_kg > 0)) return Number.NaN;
  const levels = [leg.altitude_m];
  const p = leg.profile;
  const spacing = p.kind === 'stepClimb' ? p.step_m : p.kind === 'cruiseClimb' ? 1000 * FOOT_M : 0;
  if (p.kind !== 'constantAltitude' && spacing > 0) for (let h = leg.altitude_m + spacing; h <= p.maxAltitude_m + 1e-6 && levels.length < 40; h += spacing) levels.push(h);
  const srAt = (m: number) => {
    let best = 0;
    for (const h of levels) {
      const mach = cruiseMach(input, leg.speed, h, m, env.isaDev_K);
      best = Math.max(best, basisSpecificRange(input, specificRangeAt(input, h, mach, m, env.isaDev_K), h, mach, env));
    }
    return best;
  };
  const n = 4;
  const dm = fuel_kg / n;
  let sum = 0;
  for (let i = 0; i <= n; i++) {
    const v = srAt(startMass_kg - i * dm);
    if (!(v > 0)) return Number.NaN;
    sum += (i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2) * v;
  }
  return (sum * dm) / 3;
}

/**
 * Fixed ramp mass: the solvable leg's distance (m, mission's basis) so the residual lies in the fuel band. A cold
 * start flies the leg at zero length first (so a reserve that cannot be carried is named), then steps by the
 * Breguet distance of the spare fuel at the leg's specific range; a warm start flies the given distance first
 * and steps with the given slope. Then the secant method.
 */
export function iterateDistance(ctx: MissionContext, rampMass_kg: number, start: MissionStart = {}, band: FuelBand = fuelBand(undefined, FIXED_MASS_FUEL_TOLERANCE_KG)): IterationOutcome {
  const input = ctx.input;
  const infeasible = (e: MissionEvaluation, k: number): IterationOutcome => ({
    kind: 'infeasible',
    rampMass_kg,
    distance_m: 0,
    iterations: k,
    residual_kg: e.residual_kg,
    message: msg`The reserve cannot be carried even with the solvable cruise leg at zero length: short by ${q(-e.residual_kg, 'mass')}.`,
  });
  const converged = (dist_m: number, e: MissionEvaluation, k: number, slope: number): IterationOutcome => ({
    kind: 'converged',
    rampMass_kg,
    distance_m: dist_m,
    iterations: k,
    residual_kg: e.residual_kg,
    pass: e,
    warmStart: { distance_m: dist_m, slope },
  });
  let zeroFlown = !usable(start.distance_m, true);
  let d0 = zeroFlown ? 0 : (start.distance_m as number);
  let e0 = evaluateMission(scratch(ctx), rampMass_kg, d0);
  if (failedFlight(e0)) return { kind: 'flightFailed', rampMass_kg, distance_m: d0, iterations: 1, residual_kg: e0.residual_kg, failure: e0 };
  if (d0 === 0 && e0.residual_kg < 0) return infeasible(e0, 1);
  // The cold slope (kg/m): minus the fuel per metre at the leg's specific range, at the mass the leg is expected to end with.
  const index = solvableLegIndex(input);
  const leg = input.legs[index];
  let sr = 0;
  let estimate = Number.NaN;
  if (leg && leg.kind === 'cruise') {
    const env = legEnvironment(input, leg);
    const m = e0.trip.takeoff[S_MASS] - Math.max(e0.residual_kg, 0) / 2;
    const mach = cruiseMach(input, leg.speed, leg.altitude_m, m, env.isaDev_K);
    sr = basisSpecificRange(input, specificRangeAt(input, leg.altitude_m, mach, m, env.isaDev_K), leg.altitude_m, mach, env);
    // A cold start's second pass: the distance the spare fuel flies on the leg (Simpson's rule on the specific range
    // at the best of the leg's levels), the spare fuel less the contingency that grows with it.
    const row = e0.trip.rows.find((r) => r.index === index);
    if (zeroFlown && row !== undefined) estimate = spareFuelDistance(input, leg, env, row.startMass_kg, (e0.residual_kg - band.aim_kg) / (1 + contingencyShare(input)));
  }
  const coldSlope = -1 / (sr > 0 ? sr : 100);
  let slope = usable(start.slope) && start.slope < 0 ? start.slope : coldSlope;
  if (fuelConverged(e0.residual_kg, band)) return converged(d0, e0, 1, slope);
  let d1 = usable(estimate, true) ? estimate : d0 - (e0.residual_kg - band.aim_kg) / slope;
  for (let k = 2; k <= MAX_ITERATIONS; k++) {
    if (!Number.isFinite(d1)) break;
    if (d1 <= 0) {
      // Below zero length: fly the leg at zero length once (the infeasibility check), else halve towards it.
      d1 = zeroFlown ? 0.5 * d0 : 0;
      zeroFlown = true;
    }
    const e1 = evaluateMission(scratch(ctx), rampMass_kg, d1);
    if (failedFlight(e1)) return { kind: 'flightFailed', rampMass_kg, distance_m: d1, iterations: k, residual_kg: e1.residual_kg, failure: e1 };
    if (d1 === 0 && e1.residual_kg < 0) return infeasible(e1, k);
    const secant = (e1.residual_kg - e0.residual_kg) / (d1 - d0);
    if (Number.isFinite(secant) && secant < 0) slope = secant;
    if (fuelConverged(e1.residual_kg, band)) return converged(d1, e1, k, slope);
    const aimed = e1.residual_kg - band.aim_kg;
    // Newton's method with the marginal slope at the leg's end while the secant still spans the zero-length pass
    // (the secant method after): the fuel per metre there, times 1 - dR/dm_L, the reserve's change with the landing
    // mass (its flown items and the contingency that grows with the trip fuel) taken between the two passes, which
    // share the ramp mass; the contingency share alone when that is not usable.
    const dLanding = e1.trip.landing[S_MASS] - e0.trip.landing[S_MASS];
    const reserveSlope = (e1.reserves.breakdown.total_kg - e0.reserves.breakdown.total_kg) / dLanding;
    const factor = Number.isFinite(reserveSlope) && Math.abs(dLanding) >= 1 && Math.abs(reserveSlope) < 0.5 ? 1 - reserveSlope : 1 + contingencyShare(input);
    const marginal = e1.trip.solvableEndFuelPerMetre > 0 ? -e1.trip.solvableEndFuelPerMetre * factor : Number.NaN;
    const next =
      d0 === 0 && Number.isFinite(marginal)
        ? d1 - aimed / marginal
        : Number.isFinite(secant) && secant < 0
          ? d1 - aimed / secant
          : d1 - aimed / coldSlope;
    d0 = d1;
    e0 = e1;
    d1 = next;
  }
  return notConverged('Range', { rampMass_kg, distance_m: d1, iterations: MAX_ITERATIONS, residual_kg: e0.residual_kg });
}
