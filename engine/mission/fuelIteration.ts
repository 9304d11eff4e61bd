/**
 * Fuel iteration for the solve modes. One evaluation flies the trip and the
 * reserves (fuel may pass below zero-fuel mass while iterating) and returns
 * the residual = fuel on board at landing - reserve fuel required.
 *
 * - payloadRange: the ramp mass is found so the residual is within
 *   FUEL_TOLERANCE_KG (a first pass from the closed forms of
 *   rampMassGuess.ts, a second by Newton's method on its power-law slope,
 *   the secant method after), while the solvable cruise leg's distance is
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
import { bestLevelSpecificRange, cruiseLevels } from './rampMassGuess';
import { flyReserves, type ReserveFlight } from './reserves';
import { flyAfterSolvable, flyTrip, solvableLegIndex, type SolvedDistance, type TripOutcome } from './flyTrip';
import { distanceIndex, legEnvironment, type MissionContext } from './missionContext';
import { S_AIR, S_ALT, S_MASS, S_TIME } from './missionState';
import { createFlightLog, freshFlightLog, type FlightLog } from './timeHistoryBuilder';
import type { Leg, MissionInput, MissionStart } from './missionTypes';
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

/** A top of descent the after-solvable model knows: its mass (kg), the distance after the leg (m), the fuel from there to landing (kg). */
interface AfterPoint {
  readonly mass_kg: number;
  readonly distance_m: number;
  readonly fuel_kg: number;
  /** The top of descent's pressure altitude (m). */
  readonly altitude_m: number;
}

/**
 * The distance after the solvable cruise leg (m) and the fuel from its end to landing (kg) as functions of the
 * mass at its end (kg): the top of descent the trip predicts. Each pass, and each trial of the legs after it
 * (flyAfterSolvable), adds a point; a mass is read on the line through the two known points nearest to it at least
 * 1 kg apart (a warm start's slope through the one point known until then, or the warm start's line before any;
 * a constant on a cold start's first point).
 */
class AfterSolvableModel {
  private readonly points: AfterPoint[] = [];
  private readonly prior: MissionStart['afterSolvable'];
  /** The last pair read (its mass, kg), until a point is added or dropped; null when none. */
  private pairFor: { readonly mass_kg: number; readonly pair: readonly [AfterPoint, AfterPoint] | null } | null = null;

  constructor(prior: MissionStart['afterSolvable']) {
    this.prior = prior && usable(prior.mass_kg, true) && usable(prior.distance_m) && usable(prior.perKg_m) ? prior : undefined;
  }

  /**
   * The two known points nearest to `mass_kg` at least 1 kg apart, the nearer first, the second at the first's
   * altitude when one is (descents from two levels are two functions of the mass); null when there are none such.
   */
  private pair(mass_kg: number): readonly [AfterPoint, AfterPoint] | null {
    // One-entry memo: the corrections read the pair at the same pass's top of descent again and again.
    if (this.pairFor !== null && Object.is(this.pairFor.mass_kg, mass_kg)) return this.pairFor.pair;
    const pair = this.pairOf(mass_kg);
    this.pairFor = { mass_kg, pair };
    return pair;
  }

  private pairOf(mass_kg: number): readonly [AfterPoint, AfterPoint] | null {
    const byDistance = [...this.points].sort((a, b) => Math.abs(a.mass_kg - mass_kg) - Math.abs(b.mass_kg - mass_kg));
    const first = byDistance[0];
    if (first === undefined) return null;
    const apart = byDistance.filter((p) => Math.abs(p.mass_kg - first.mass_kg) >= 1);
    const second = apart.find((p) => Math.abs(p.altitude_m - first.altitude_m) <= 1) ?? apart[0];
    return second !== undefined ? [first, second] : null;
  }

  /** Forgets every point but the last pass's (a pass whose prediction left the solvable leg no length short of the range). */
  keepOnly(mass_kg: number): void {
    const kept = this.points.filter((p) => Math.abs(p.mass_kg - mass_kg) < 1e-9 * mass_kg);
    this.pairFor = null;
    this.points.length = 0;
    this.points.push(...kept);
  }

  /** d(distance after the leg)/d(mass at its end) (m/kg) near `mass_kg`. */
  perKg(mass_kg: number): number {
    const pair = this.pair(mass_kg);
    if (pair !== null) return (pair[1].distance_m - pair[0].distance_m) / (pair[1].mass_kg - pair[0].mass_kg);
    return this.prior?.perKg_m ?? 0;
  }

  /** d(fuel from the leg's end to landing)/d(mass at its end) (-) near `mass_kg`; 0 until two points are known. */
  fuelPerKg(mass_kg: number): number {
    const pair = this.pair(mass_kg);
    const slope = pair === null ? 0 : (pair[1].fuel_kg - pair[0].fuel_kg) / (pair[1].mass_kg - pair[0].mass_kg);
    return Number.isFinite(slope) && Math.abs(slope) < 0.5 ? slope : 0;
  }

  /** The line read near `mass_kg`: through the nearest known point with the slope there (the warm start's line before any point). */
  private lineNear(mass_kg: number): { readonly mass_kg: number; readonly distance_m: number; readonly perKg_m: number } | null {
    const pair = this.pair(mass_kg);
    const near = pair?.[0] ?? this.points[this.points.length - 1];
    if (near !== undefined) return { mass_kg: near.mass_kg, distance_m: near.distance_m, perKg_m: this.perKg(mass_kg) };
    return this.prior ?? null;
  }

  /** The line a pass flies with, chosen at its predicted top of descent (kg): its cruise reads it at every evaluation. */
  private flown: { readonly mass_kg: number; readonly distance_m: number; readonly perKg_m: number } | null = null;

  /** Chooses the line the next pass flies with, at its predicted top of descent (kg). */
  aim(mass_kg: number): void {
    this.flown = this.lineNear(mass_kg);
  }

  /** The distance after the leg (m) on the line chosen for the pass (aim), 0 when none. */
  at(mass_kg: number): number {
    const line = this.flown;
    return line === null ? 0 : line.distance_m + line.perKg_m * (mass_kg - line.mass_kg);
  }

  /** The distance after the leg (m) read near `mass_kg`. */
  near(mass_kg: number): number {
    const line = this.lineNear(mass_kg);
    return line === null ? 0 : line.distance_m + line.perKg_m * (mass_kg - line.mass_kg);
  }

  /** Kilograms from `mass_kg` to the nearest known point (Infinity when none is known). */
  gap(mass_kg: number): number {
    let gap = Number.POSITIVE_INFINITY;
    for (const p of this.points) gap = Math.min(gap, Math.abs(p.mass_kg - mass_kg));
    return gap;
  }

  /** Adds a top of descent's mass (kg), distance after the leg (m), fuel to landing (kg) and altitude (m). */
  add(mass_kg: number, distance_m: number, fuel_kg: number, altitude_m: number): void {
    if (!usable(mass_kg, true) || !usable(distance_m)) return;
    const same = this.points.findIndex((p) => Math.abs(p.mass_kg - mass_kg) < 1e-9 * mass_kg);
    const point = { mass_kg, distance_m, fuel_kg: Number.isFinite(fuel_kg) ? fuel_kg : Number.NaN, altitude_m: Number.isFinite(altitude_m) ? altitude_m : 0 };
    this.pairFor = null;
    if (same >= 0) this.points[same] = point;
    else this.points.push(point);
  }

  /** The model as a warm start carries it: the line at `mass_kg` (the converged top of descent). */
  model(mass_kg: number): MissionStart['afterSolvable'] {
    if (this.points.length === 0) return this.prior;
    const distance_m = this.near(mass_kg);
    return usable(distance_m) ? { mass_kg, distance_m, perKg_m: this.perKg(mass_kg) } : this.prior;
  }
}

/** A warm start's d(residual)/d(ramp mass) (-) worth stepping with: a heavier start lands with more fuel, by less than it carries twice over. */
function plausibleRampSlope(slope: number | undefined): slope is number {
  return usable(slope) && slope > 0.05 && slope <= 2;
}

/** A slope factor worth using: a measured slope within a quarter of the power-law slope. */
function plausibleSlopeFactor(factor: number | undefined): factor is number {
  return usable(factor) && factor > 0.75 && factor < 1.25;
}

/** The landing/ramp mass ratio of a pass (Breguet-like flight), 0.85 when implausible. */
function ratioSlope(e: MissionEvaluation, rampMass_kg: number): number {
  const ratio = e.trip.landing[S_MASS] / rampMass_kg;
  return Number.isFinite(ratio) && ratio > 0.2 && ratio <= 1 ? ratio : 0.85;
}

/** A kilogram more at the ramp: the residual's change (-) and the landing mass's (-). */
interface RampSensitivity {
  readonly slope: number;
  readonly landingPerKg: number;
}

/**
 * The cold second pass's d(residual)/d(ramp mass) (-) from the first pass's own flight. With the specific range a
 * power of the mass, SR ~ m^-alpha, a flight of fixed distance lands heavier by dm_L/dm_TO = (m_L/m_TO)^alpha (the
 * integral of SR over the mass equals the distance either way: integral_mL^mTO SR dm = const gives
 * SR(m_TO) dm_TO = SR(m_L) dm_L; alpha = 1 is the Breguet range equation, where the slope is the landing/take-off
 * mass ratio). alpha is read off the solvable leg's best-level specific range 2 % either side of the pass's mean
 * mass on it (the models' own figures); the residual's slope is dm_L/dm_TO times 1 - `itemsPerKg` (the reserve's
 * flown items' growth with the landing mass) less the contingency share of the trip fuel that follows
 * (1 - dm_L/dm_TO of it). With `shift_kg`, the same for the pass's masses moved by that much at
 * the ramp. The landing/ramp mass ratio when alpha is not usable.
 */
function powerLawSensitivity(ctx: MissionContext, e: MissionEvaluation, rampMass_kg: number, shift_kg = 0, itemsPerKg = 0): RampSensitivity {
  const input = ctx.input;
  const index = solvableLegIndex(input);
  const leg = input.legs[index];
  const row = e.trip.rows.find((r) => r.index === index);
  const ratio = ratioSlope(e, rampMass_kg);
  const fallback = { slope: ratio, landingPerKg: ratio };
  if (!leg || leg.kind !== 'cruise' || row === undefined) return fallback;
  const env = legEnvironment(input, leg);
  // The pass's masses moved by `shift_kg` at the ramp: the cruise's by about as much (alpha is flat in the mass),
  // the landing mass by the sensitivity times it.
  const m = 0.5 * (row.startMass_kg + row.endMass_kg) + shift_kg;
  const levels = cruiseLevels(leg);
  const up = bestLevelSpecificRange(input, leg.speed, levels, env, m * 1.02);
  const down = bestLevelSpecificRange(input, leg.speed, levels, env, m / 1.02);
  const alpha = -Math.log(up / down) / Math.log(1.02 * 1.02);
  const massRatio = (e.trip.landing[S_MASS] + Math.pow(e.trip.landing[S_MASS] / e.trip.takeoff[S_MASS], alpha) * shift_kg) / (e.trip.takeoff[S_MASS] + shift_kg);
  if (!(alpha >= 0 && alpha <= 2) || !(massRatio > 0.2 && massRatio <= 1)) return fallback;
  const landingPerKg = Math.pow(massRatio, alpha);
  const slope = landingPerKg * (1 - itemsPerKg) - boundContingencyShare(input, e) * (1 - landingPerKg);
  return plausibleRampSlope(slope) ? { slope, landingPerKg } : fallback;
}

/**
 * `start` with its slopeFactor (the slope over the power-law slope of the converged pass, when plausible) read
 * lazily: the power-law slope costs six specific-range points (about 1 % of a converged solve), and only a
 * neighbour's solve reads the factor. An enumerable getter, worked out once at its first read (a spread, a
 * structured clone and JSON read it too), undefined when not plausible; the value is a pure function of the pass.
 */
function withLazySlopeFactor(start: MissionStart, factorOf: () => number): MissionStart {
  let known = false;
  let value: number | undefined;
  return Object.defineProperty(start, 'slopeFactor', {
    enumerable: true,
    get: (): number | undefined => {
      if (!known) {
        const factor = factorOf();
        value = plausibleSlopeFactor(factor) ? factor : undefined;
        known = true;
      }
      return value;
    },
  });
}

/** A pass this far (m) off the range after the first restarts the top-of-descent model from it. */
const MODEL_MISS_M = 1000;

/** Trials of the legs after the solvable leg are flown when the next top of descent lies this far (kg) from every one known. */
const AFTER_TRIAL_GAP_KG = 10;

/**
 * payloadRange: ramp mass (kg) so the residual lies in the fuel band while the trip's distance (mission's basis)
 * is `range_m`. The solvable leg ends at its top of descent: where the distance flown plus the distance the legs
 * after it will take equals the range, the latter predicted from the mass there (AfterSolvableModel; within
 * DISTANCE_TOLERANCE_M at convergence). The first pass flies from the warm start's ramp mass, else
 * `firstGuess_kg`; the second steps with the warm start's slope, else the first pass's power-law sensitivity
 * (powerLawSensitivity); then the secant method, all on each pass's residual corrected to exactly the range
 * (rangeCorrection). Before the next pass, when its predicted top of descent is more than AFTER_TRIAL_GAP_KG from
 * every one known, the legs after the solvable leg are flown on trial from the last top of descent at that mass
 * (flyAfterSolvable), so the next pass meets the range closely and the correction knows how the descent moves.
 */
export function iterateRampMass(
  ctx: MissionContext,
  range_m: number,
  firstGuess_kg: number,
  start: MissionStart = {},
  band: FuelBand = fuelBand(undefined),
  itemsPerKgGuess?: number,
): IterationOutcome {
  const input = ctx.input;
  const after = new AfterSolvableModel(start.afterSolvable);
  const distance = { endDistanceOf: (mass_kg: number) => range_m - after.at(mass_kg) };
  const basis = distanceIndex(input);
  const remember = (e: MissionEvaluation) => {
    if (e.trip.solvableDistance_m > 0) after.add(e.trip.solvableEndMass_kg, e.trip.afterSolvable_m, e.trip.solvableEndMass_kg - e.trip.landing[S_MASS], e.trip.solvableEnd?.[S_ALT] ?? 0);
  };
  // Trials fly from a pass's top of descent at its level: not for a cruise-climb, whose level moves with the mass.
  const solvableLeg = input.legs[solvableLegIndex(input)];
  const trials = solvableLeg !== undefined && solvableLeg.kind === 'cruise' && solvableLeg.profile.kind !== 'cruiseClimb';
  const trialCtx: MissionContext = { ...scratch(ctx), log: createFlightLog(input.airframe, input.cautionSettings, true, false) };
  // How the reserve's flown items (all but a contingency share of the trip fuel) move with the landing mass (-),
  // between the last two passes; the closed forms' own until two passes are known (0 without them).
  let itemsPerKg = usable(itemsPerKgGuess) && Math.abs(itemsPerKgGuess) < 0.5 ? itemsPerKgGuess : 0;
  const learnItems = (a: MissionEvaluation, b: MissionEvaluation) => {
    const dLanding = b.trip.landing[S_MASS] - a.trip.landing[S_MASS];
    const items = (e: MissionEvaluation) => e.reserves.breakdown.total_kg - boundContingencyShare(input, e) * (e.trip.takeoff[S_MASS] - e.trip.landing[S_MASS]);
    const slope = (items(b) - items(a)) / dLanding;
    if (Math.abs(dLanding) >= 1 && Number.isFinite(slope) && Math.abs(slope) < 0.5) itemsPerKg = slope;
  };
  const atRange = (e: MissionEvaluation) => e.residual_kg - band.aim_kg + rangeCorrection(e, e.trip.end[basis] - range_m);
  // The residual's change (kg) were a pass `over` metres past the range to end exactly at it: its solvable leg
  // ends earlier by delta = over / (1 - after' f) (f its fuel per metre there, after' how the distance after it grows
  // with the mass), so its top of descent is heavier by delta f, its landing by (1 - the fuel to landing's growth)
  // times that, and the residual by the landing's change times 1 + the contingency share - the items' growth.
  const topShift = (e: MissionEvaluation, over: number) => {
    const f = solvableFuelPerMetre(e);
    const denominator = 1 - after.perKg(e.trip.solvableEndMass_kg) * f;
    return (over * f) / (denominator > 0.5 ? denominator : 1);
  };
  const rangeCorrection = (e: MissionEvaluation, over: number) =>
    topShift(e, over) * (1 - after.fuelPerKg(e.trip.solvableEndMass_kg)) * (1 + boundContingencyShare(input, e) + enRouteShare(input, e) - itemsPerKg);
  // A trial of the legs after the solvable one at the top of descent predicted for a pass from `next_kg`, when it
  // lies far from every one known; true when one was flown.
  let landingPerKg = 0.85;
  // The top of descent (kg) a pass from `next_kg` will reach, from pass `e` flown from `x`.
  const predictTop = (e: MissionEvaluation, x: number, next_kg: number) => e.trip.solvableEndMass_kg + topShift(e, e.trip.end[basis] - range_m) + landingPerKg * (next_kg - x);
  const trialFor = (e: MissionEvaluation, x: number, next_kg: number): boolean => {
    const top = e.trip.solvableEnd;
    if (!trials || top === null || !(e.trip.solvableDistance_m > 0) || !Number.isFinite(next_kg)) return false;
    const predicted = predictTop(e, x, next_kg);
    if (!(predicted > 0) || after.gap(predicted) <= AFTER_TRIAL_GAP_KG) return false;
    const trial = flyAfterSolvable(trialCtx, top, predicted);
    if (trial === null) return false;
    after.add(predicted, trial.distance_m, trial.fuelToLanding_kg, top[S_ALT]);
    return true;
  };
  let x0 = usable(start.rampMass_kg, true) && start.rampMass_kg > ctx.zeroFuelMass_kg ? start.rampMass_kg : firstGuess_kg;
  after.aim(start.afterSolvable?.mass_kg ?? 0);
  let e0 = evaluateMission(scratch(ctx), x0, distance);
  let d = e0.trip.solvableDistance_m;
  if (failedFlight(e0)) return { kind: 'flightFailed', rampMass_kg: x0, distance_m: d, iterations: 1, residual_kg: e0.residual_kg, failure: e0 };
  // The passes flown (ramp mass, kg, and the pass) and how the residual bends: the warm start's, then the second
  // divided difference of the last three passes' residuals at the range (Burden & Faires, 3.3) when they are spread.
  const flown: { readonly x: number; readonly e: MissionEvaluation }[] = [];
  const priorBend = usable(start.curvature_per_kg) && Math.abs(start.curvature_per_kg) < 1e-3 ? start.curvature_per_kg : undefined;
  const bendOfPasses = (): number | undefined => {
    const n = flown.length;
    if (n < 3) return priorBend;
    const [a, b, c] = [flown[n - 3], flown[n - 2], flown[n - 1]];
    if (Math.min(Math.abs(b.x - a.x), Math.abs(c.x - b.x), Math.abs(c.x - a.x)) < 0.2) return priorBend;
    const ab = (atRange(b.e) - atRange(a.e)) / (b.x - a.x);
    const bc = (atRange(c.e) - atRange(b.e)) / (c.x - b.x);
    const bend = (2 * (bc - ab)) / (c.x - a.x);
    return Number.isFinite(bend) && Math.abs(bend) < 1e-3 ? bend : priorBend;
  };
  const bend = priorBend ?? 0;
  const converged = (x: number, e: MissionEvaluation, k: number, slope: number): IterationOutcome => {
    const curvature_per_kg = bendOfPasses();
    const warmStart: MissionStart = {
      rampMass_kg: x,
      slope,
      afterSolvable: after.model(e.trip.solvableEndMass_kg),
      ...(curvature_per_kg === undefined ? {} : { curvature_per_kg }),
    };
    return {
      kind: 'converged',
      rampMass_kg: x,
      distance_m: e.trip.solvableDistance_m,
      iterations: k,
      residual_kg: e.residual_kg,
      pass: e,
      warmStart: withLazySlopeFactor(warmStart, () => slope / powerLawSensitivity(ctx, e, x).slope),
    };
  };
  const warmSlope = plausibleRampSlope(start.slope);
  const cold = warmSlope ? null : powerLawSensitivity(ctx, e0, x0, 0, itemsPerKg);
  let slope = warmSlope ? (start.slope as number) : (cold as RampSensitivity).slope;
  if (cold !== null) landingPerKg = cold.landingPerKg;
  else if (warmSlope) landingPerKg = Math.min(Math.max(slope, 0.2), 1);
  flown.push({ x: x0, e: e0 });
  // A warm start may land in the band at once.
  if (fuelConverged(e0.residual_kg, band) && Math.abs(e0.trip.end[basis] - range_m) <= DISTANCE_TOLERANCE_M) {
    remember(e0);
    return converged(x0, e0, 1, slope);
  }
  remember(e0);
  // Newton's method on the parabola the bend gives (the tangent without one): the step solves
  // f + (slope + bend step / 2) step = 0, by fixed-point iteration from the tangent's step.
  const parabolaStep = (f: number, s: number): number => {
    let dx = -f / s;
    for (let i = 0; i < 3 && bend !== 0; i++) dx = -f / (s + 0.5 * bend * dx);
    return dx;
  };
  // A warm start's slope was the neighbour's at its root: carried here as its ratio to the power-law slope there,
  // times the power-law slope of this pass midway to the step (how the mission and the mass moved it).
  const factor = warmSlope && plausibleSlopeFactor(start.slopeFactor) ? start.slopeFactor : undefined;
  const firstStep = (): number => {
    const f = atRange(e0);
    if (factor === undefined) return parabolaStep(f, slope);
    let dx = -f / slope;
    for (let i = 0; i < 2; i++) {
      const s = factor * powerLawSensitivity(ctx, e0, x0, dx / 2).slope;
      if (plausibleRampSlope(s)) dx = -f / s;
    }
    return dx;
  };
  let x1 = x0 + firstStep();
  // The trial moves the correction (the descent's growth with the mass): step again with it.
  if (trialFor(e0, x0, x1)) x1 = x0 + firstStep();
  const guard = RAMP_MASS_GUARD * Math.max(input.airframe.mtow_kg, ctx.zeroFuelMass_kg + input.airframe.maxFuel_kg);
  for (let k = 2; k <= MAX_ITERATIONS; k++) {
    if (!Number.isFinite(x1) || x1 <= ctx.zeroFuelMass_kg * 0.5 || x1 > guard) {
      return notConverged('Fuel', { rampMass_kg: x0, distance_m: d, iterations: k - 1, residual_kg: e0.residual_kg });
    }
    const top = predictTop(e0, x0, x1);
    after.aim(Number.isFinite(top) && top > 0 ? top : e0.trip.solvableEndMass_kg);
    const e1 = evaluateMission(scratch(ctx), x1, distance);
    flown.push({ x: x1, e: e1 });
    d = e1.trip.solvableDistance_m;
    if (failedFlight(e1)) return { kind: 'flightFailed', rampMass_kg: x1, distance_m: d, iterations: k, residual_kg: e1.residual_kg, failure: e1 };
    const distanceError = e1.trip.end[basis] - range_m;
    learnItems(e0, e1);
    const secantOf = () => (atRange(e1) - atRange(e0)) / (x1 - x0);
    let secant = secantOf();
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
    // The prediction left the solvable leg no length though the trip falls short: start the model again from the
    // last pass that flew the leg.
    if (d === 0 && distanceError < -DISTANCE_TOLERANCE_M && e0.trip.solvableDistance_m > 0) after.keepOnly(e0.trip.solvableEndMass_kg);
    // A pass the model sent more than a kilometre off the range (its top of descent on another level, or within a
    // step climb): the model mixes levels; go on from this pass's top of descent alone.
    else if (Math.abs(distanceError) > MODEL_MISS_M && d > 0) after.keepOnly(e1.trip.solvableEndMass_kg);
    // Secant method on the residual at exactly the range (the last usable slope when the secant is degenerate),
    // stepped again when a trial moved the correction.
    // The secant is the slope midway between its passes: at the later one it is bend (x1 - x0) / 2 more.
    const step = () => {
      secant = secantOf();
      const tangent = secant + 0.5 * bend * (x1 - x0);
      return Number.isFinite(tangent) && Math.abs(tangent) > 0.05 ? x1 - atRange(e1) / tangent : x1 - atRange(e1) / slope;
    };
    let next = step();
    if (trialFor(e1, x1, next)) next = step();
    x0 = x1;
    e0 = e1;
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
 * 14 CFR 121.645(b)'s en-route time reserve per kg of trip fuel flown at the end of a pass's cruise (-): its
 * fraction of that time at its own mean fuel flow (its fuel over its time), over the cruise's fuel flow there; the
 * fraction alone when the latter is unknown, 0 for other policies.
 */
function enRouteShare(input: MissionInput, e: MissionEvaluation): number {
  const p = input.reserves;
  if (p.preset !== 'cfr121_645' || !(p.enRouteFraction > 0)) return 0;
  const tripTime_s = e.trip.landing[S_TIME] - e.trip.takeoff[S_TIME];
  const share = e.reserves.breakdown.contingency_kg / (tripTime_s * e.trip.solvableEndFuelFlow_kg_s);
  return Number.isFinite(share) && share > 0 && share < 1 ? share : p.enRouteFraction;
}

/** The contingency share of a pass's trip fuel when it is what sets the contingency (a custom policy, or ICAO Annex 6 with the fraction above its hold minimum), 0 otherwise. */
function boundContingencyShare(input: MissionInput, e: MissionEvaluation): number {
  const share = contingencyShare(input);
  if (share === 0) return 0;
  const tripFuel_kg = e.trip.takeoff[S_MASS] - e.trip.landing[S_MASS];
  return Math.abs(e.reserves.breakdown.contingency_kg - share * tripFuel_kg) <= 1e-9 * Math.max(tripFuel_kg, 1) ? share : 0;
}

/**
 * Distance (m, mission's basis) a cruise leg flies on `fuel_kg` from `startMass_kg`: the integral of the specific
 * range over the mass, by Simpson's rule on four intervals (Burden & Faires, Numerical Analysis, 4.3), at each mass
 * the best specific range among the leg's levels (its altitude, its steps up to the maximum, or for a cruise-climb
 * every 1,000 ft up to the maximum); NaN when a specific range is not positive.
 */
function spareFuelDistance(input: MissionInput, leg: Extract<Leg, { kind: 'cruise' }>, env: { readonly isaDev_K: number; readonly wind_m_s: number }, startMass_kg: number, fuel_kg: number): number {
  if (!(fuel_kg > 0) || !(startMass_kg - fuel_kg > 0)) return Number.NaN;
  const levels = cruiseLevels(leg);
  const srAt = (m: number) => bestLevelSpecificRange(input, leg.speed, levels, env, m);
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
 * d2(residual)/d(distance)2 (kg/m2) at the end of pass `b` of a fixed ramp mass: the fuel per metre at the solvable
 * leg's end as a power of the mass there, f ~ m^alpha (alpha from passes `a` and `b`), falls by alpha f^2 / m per
 * metre flown; times `factor` (1 - the reserve's growth with the landing mass). 0 when not usable.
 */
function endBend(a: MissionEvaluation, b: MissionEvaluation, factor: number): number {
  const fa = a.trip.solvableEndFuelPerMetre;
  const fb = b.trip.solvableEndFuelPerMetre;
  const ma = a.trip.solvableEndMass_kg;
  const mb = b.trip.solvableEndMass_kg;
  if (!(fa > 0 && fb > 0 && ma > 0 && mb > 0) || Math.abs(mb - ma) < 1) return 0;
  const alpha = Math.log(fb / fa) / Math.log(mb / ma);
  const bend = ((alpha * fb * fb) / mb) * factor;
  return Number.isFinite(bend) && alpha >= 0 && alpha <= 2 ? bend : 0;
}

/**
 * Fixed ramp mass: the solvable leg's distance (m, mission's basis) so the residual lies in the fuel band. A cold
 * start flies the leg at zero length first (so a reserve that cannot be carried is named), then steps by the
 * Breguet distance of the spare fuel at the leg's specific range; a warm start flies the given distance first
 * and steps with the given slope. Then the secant method.
 */
export function iterateDistance(
  ctx: MissionContext,
  rampMass_kg: number,
  start: MissionStart = {},
  band: FuelBand = fuelBand(undefined, FIXED_MASS_FUEL_TOLERANCE_KG),
  firstGuess?: { readonly distance_m: number; readonly itemsPerKg: number },
): IterationOutcome {
  const firstGuess_m = firstGuess?.distance_m;
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
    warmStart: {
      distance_m: dist_m,
      slope,
      // The slope over the fuel per metre at the leg's end (its marginal slope), for a neighbour to carry its own.
      ...(e.trip.solvableEndFuelPerMetre > 0 && plausibleSlopeFactor(slope / -e.trip.solvableEndFuelPerMetre) ? { slopeFactor: slope / -e.trip.solvableEndFuelPerMetre } : {}),
    },
  });
  const warm = usable(start.distance_m, true);
  const guessed = !warm && usable(firstGuess_m, true);
  let zeroFlown = !warm && !guessed;
  let d0 = warm ? (start.distance_m as number) : guessed ? (firstGuess_m as number) : 0;
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
  // A warm start's slope carried as its ratio to the neighbour's marginal slope, times this pass's.
  const carried = plausibleSlopeFactor(start.slopeFactor) && e0.trip.solvableEndFuelPerMetre > 0 ? -start.slopeFactor * e0.trip.solvableEndFuelPerMetre : Number.NaN;
  let slope = usable(start.slope) && start.slope < 0 ? (Number.isFinite(carried) ? carried : start.slope) : coldSlope;
  if (fuelConverged(e0.residual_kg, band)) return converged(d0, e0, 1, slope);
  // From the closed-form guess: Newton's method with the marginal slope at the leg's end (the fuel per metre there
  // times 1 + the contingency share that follows the trip fuel - the reserve items' growth with the landing mass,
  // the closed forms' own).
  const guessSlope =
    guessed && e0.trip.solvableEndFuelPerMetre > 0
      ? -e0.trip.solvableEndFuelPerMetre * (1 + boundContingencyShare(input, e0) + enRouteShare(input, e0) - (firstGuess?.itemsPerKg ?? 0))
      : Number.NaN;
  let d1 = usable(estimate, true) ? estimate : d0 - (e0.residual_kg - band.aim_kg) / (Number.isFinite(guessSlope) ? guessSlope : slope);
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
    // The secant is the slope midway between its passes; at the later one the fuel per metre at the leg's end has
    // fallen with the mass there (f ~ m^alpha, alpha between the two passes' ends), so the slope is
    // alpha f^2 / m (1 - dR/dm_L) (d1 - d0) / 2 less steep.
    const tangent = Number.isFinite(secant) && secant < 0 ? secant + 0.5 * endBend(e0, e1, factor) * (d1 - d0) : Number.NaN;
    const next =
      d0 === 0 && Number.isFinite(marginal)
        ? d1 - aimed / marginal
        : Number.isFinite(tangent) && tangent < 0
          ? d1 - aimed / tangent
          : Number.isFinite(secant) && secant < 0
            ? d1 - aimed / secant
            : d1 - aimed / coldSlope;
    d0 = d1;
    e0 = e1;
    d1 = next;
  }
  return notConverged('Range', { rampMass_kg, distance_m: d1, iterations: MAX_ITERATIONS, residual_kg: e0.residual_kg });
}
