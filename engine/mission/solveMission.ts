/**
 * The one entry point of the mission solver: MissionInput -> MissionResult.
 * Deterministic; never returns NaN (input is checked first; every failure is
 * a status with a message).
 *
 * Solve modes:
 * - takeoffWeight: flies from the given take-off mass and reports what is
 *   left; when a cruise leg has distance_m null its still-air distance is
 *   solved so the aircraft lands with exactly the reserve.
 * - payloadRange: the fuel (ramp mass) is iterated until the aircraft
 *   lands with exactly the reserve fuel on board (0 to 0.02 kg over) and the
 *   solvable cruise leg's distance until the trip's total distance equals
 *   the range (within 1 m). The distances are GROUND distances (the wind
 *   changes the air distance, the fuel and the time), or still-air ones in a
 *   design-range study (MissionInput.distanceBasis 'stillAir', which every
 *   result then says: distanceBasis and the still_air_distances caution).
 * - maxRange: take-off mass = min(MTOW, zero-fuel mass + fuel capacity - taxi-out
 *   fuel); the solvable cruise leg is stretched until the fuel at landing equals the
 *   reserve; the range is the trip's distance in the mission's basis.
 * Block fuel is the fuel burned from block-out to block-in (taxi out, trip,
 * taxi in); trip fuel is take-off to landing; the reserve is carried.
 */
import type { Caution } from '../cautions/caution';
import { CAUTION_CATALOGUE } from '../cautions/cautionCatalogue';
import { checkFuelCapacity, checkMlw, checkMtow, checkMzfw, checkReserve } from '../cautions/checks';
import { allowanceFuel } from './allowanceLegs';
import { basisSpecificRange, specificRangeAt } from './bestSpeeds';
import { cruiseMach } from './cruiseLeg';
import { evaluateMission, FIXED_MASS_FUEL_TOLERANCE_KG, fuelBand, iterateDistance, iterateRampMass, type IterationOutcome, type MissionEvaluation } from './fuelIteration';
import { solvableLegIndex, tripBounds } from './flyTrip';
import { distanceBasis, legEnvironment, type FlightOptions, type LegTarget, type MissionContext } from './missionContext';
import { missionInputProblem } from './missionInputCheck';
import { rampMassGuess, solvableDistanceGuess } from './rampMassGuess';
import { createPassMemo, type PassMemo } from './passMemo';
import { S_AIR, S_GROUND, S_MASS, S_TIME } from './missionState';
import type { MissionInput, MissionResult, MissionStart, MissionStatus, ReserveBreakdown } from './missionTypes';
import { appendCaution, buildTimeHistory, createFlightLog, freshFlightLog } from './timeHistoryBuilder';
import { newSegmentBuffers } from './segmentBuffers';
import { messageText, msg, partsOf, q, withParts, type MessageParts } from '../units/messageParts';

const NO_RESERVES: ReserveBreakdown = { contingency_kg: 0, alternate_kg: 0, missedApproach_kg: 0, alternateApproach_kg: 0, finalReserve_kg: 0, extra_kg: 0, total_kg: 0 };

/** The info caution every still-air (design-range) result carries. */
function stillAirCaution(input: MissionInput): Caution {
  return {
    id: 'still_air_distances',
    severity: CAUTION_CATALOGUE.still_air_distances.severity,
    ...withParts(msg`Still-air distances (design-range study): the range, set cruise distances and the alternate are flown in still air; the wind (mission ${q(input.wind_m_s, 'speed')}) changes only the ground distance, not the fuel or the time.`),
    value: input.wind_m_s,
  };
}

/** Fuel (kg) of the taxi-out legs that precede take-off. */
export function taxiOutFuel(input: MissionInput): number {
  let fuel = 0;
  for (const leg of input.legs) {
    if (leg.kind !== 'taxiOut') break;
    fuel += allowanceFuel(input, leg, 0, legEnvironment(input, leg).isaDev_K).fuel_kg;
  }
  return fuel;
}

function emptyResult(input: MissionInput, status: MissionStatus, reason: string | MessageParts): MissionResult {
  const message = typeof reason === 'string' ? reason : messageText(reason, 'both');
  const statusParts = typeof reason === 'string' ? [reason] : reason;
  const zfw = Number.isFinite(input.airframe?.oew_kg + input.solve?.payload_kg) ? input.airframe.oew_kg + input.solve.payload_kg : 0;
  const log = createFlightLog(input.airframe, input.cautionSettings);
  return {
    status,
    statusMessage: message,
    statusParts,
    blockFuel_kg: 0,
    blockTime_s: 0,
    tripFuel_kg: 0,
    tripTime_s: 0,
    reserveFuel_kg: 0,
    reserves: NO_RESERVES,
    takeoffMass_kg: 0,
    rampMass_kg: 0,
    landingMass_kg: 0,
    zeroFuelMass_kg: zfw,
    payload_kg: Number.isFinite(input.solve?.payload_kg) ? input.solve.payload_kg : 0,
    airDistance_m: 0,
    groundDistance_m: 0,
    distanceBasis: distanceBasis(input),
    legs: [],
    history: buildTimeHistory(log),
    cautions: [],
    iterations: 0,
    residual_kg: 0,
  };
}

/**
 * First guess of the ramp mass (kg) for payloadRange: the Breguet range
 * equation m_TO = m_L exp(R / (SR m)) with the specific range SR of the
 * solvable cruise leg at 1.2 x zero-fuel mass and a landing mass of 1.05 x
 * zero-fuel mass (Anderson, Aircraft Performance and Design, section 5.13).
 * Falls back to 1.1 x zero-fuel mass when the specific range is not positive.
 */
function breguetRampGuess(input: MissionInput, zfw_kg: number, taxi_kg: number, range_m: number): number {
  const fallback = 1.1 * zfw_kg + taxi_kg;
  const leg = input.legs[solvableLegIndex(input)];
  if (!leg || leg.kind !== 'cruise') return fallback;
  const env = legEnvironment(input, leg);
  const dev = env.isaDev_K;
  const m = 1.2 * zfw_kg;
  const mach = cruiseMach(input, leg.speed, leg.altitude_m, m, dev);
  const sr = basisSpecificRange(input, specificRangeAt(input, leg.altitude_m, mach, m, dev), leg.altitude_m, mach, env);
  if (!(sr > 0)) return fallback;
  const exponent = Math.min(range_m / (sr * m), 2);
  return 1.05 * zfw_kg * Math.exp(exponent) + taxi_kg;
}

/**
 * Where a cold payloadRange iteration starts: the closed forms of rampMassGuess.ts (the ramp mass, and the distance
 * after the solvable leg at the top of descent they fly, so the first pass ends close to the range), or the Breguet
 * guess alone when they have no usable figure or land outside (zero-fuel mass, 3 x the Breguet guess).
 */
function coldStart(input: MissionInput, zfw_kg: number, taxi_kg: number, range_m: number): { readonly rampMass_kg: number; readonly closed: boolean; readonly itemsPerKg?: number; readonly start: MissionStart } {
  const breguet = breguetRampGuess(input, zfw_kg, taxi_kg, range_m);
  const closed = rampMassGuess(input, zfw_kg, range_m, breguet);
  if (closed === null || !(closed.rampMass_kg > zfw_kg && closed.rampMass_kg < 3 * breguet)) return { rampMass_kg: breguet, closed: false, start: {} };
  return { rampMass_kg: closed.rampMass_kg, closed: true, itemsPerKg: closed.itemsPerKg, start: { afterSolvable: { mass_kg: closed.top_kg, distance_m: closed.after_m, perKg_m: 0 } } };
}

/**
 * The mission's status from how the iteration ended (null: nothing
 * iterated) and the final flight: the iteration's own verdict first, then
 * the final flight's trip and reserves; a converged or single flight that
 * flew is ok.
 */
function missionStatus(outcome: IterationOutcome | null, final: MissionEvaluation): { readonly status: MissionStatus; readonly parts: MessageParts } {
  if (outcome !== null) {
    switch (outcome.kind) {
      case 'notConverged':
        return { status: 'did_not_converge', parts: outcome.message };
      case 'infeasible':
        return { status: 'infeasible', parts: outcome.message };
      case 'converged':
      case 'flightFailed':
        break;
    }
  }
  if (final.trip.status !== 'ok') return { status: final.trip.status, parts: partsOf(final.trip) };
  if (final.reserves.status !== 'ok') return { status: final.reserves.status, parts: partsOf(final.reserves) };
  if (outcome?.kind === 'flightFailed') {
    return {
      status: 'did_not_converge',
      parts: msg`The fuel iteration stopped on pass ${outcome.iterations}, whose flight failed (ramp mass ${q(outcome.rampMass_kg, 'mass')}): ${failedPassCause(outcome.failure)}`,
    };
  }
  return { status: 'ok', parts: [] };
}

/** Why a pass of the iteration failed: its trip's or its reserves' message (naming the leg, the time and the cause). */
function failedPassCause(failure: MissionEvaluation): MessageParts {
  if (failure.trip.status !== 'ok') return [`${failure.trip.status}: `, ...partsOf(failure.trip)];
  return [`${failure.reserves.status}: `, ...partsOf(failure.reserves)];
}

/** Relative excess (-) over a hard limit that still counts as at the limit (rounding of a flight flown to it). */
const HARD_LIMIT_TOLERANCE = 1e-9;

/**
 * The first hard limit a flown mission breaks (take-off mass above MTOW, fuel at block-out above the tanks'
 * capacity, landing mass above MLW), as a status and a sentence; null when none is broken. The same limits are
 * raised as cautions with their figures (engine/cautions/checks.ts).
 */
function hardLimitBroken(
  input: MissionInput,
  takeoffMass_kg: number,
  rampFuel_kg: number,
  landingMass_kg: number,
): { readonly status: MissionStatus; readonly parts: MessageParts } | null {
  const a = input.airframe;
  const above = (value: number, limit: number) => value > limit * (1 + HARD_LIMIT_TOLERANCE);
  const kg = (v: number) => q(v, 'mass');
  if (above(takeoffMass_kg, a.mtow_kg)) {
    return { status: 'above_mtow', parts: msg`The take-off mass ${kg(takeoffMass_kg)} is above the maximum take-off mass ${kg(a.mtow_kg)} by ${kg(takeoffMass_kg - a.mtow_kg)}.` };
  }
  if (above(rampFuel_kg, a.maxFuel_kg)) {
    return { status: 'fuel_above_capacity', parts: msg`The fuel at block-out ${kg(rampFuel_kg)} is above the tanks' capacity ${kg(a.maxFuel_kg)} by ${kg(rampFuel_kg - a.maxFuel_kg)}.` };
  }
  if (above(landingMass_kg, a.mlw_kg)) {
    return { status: 'landing_above_mlw', parts: msg`The landing mass ${kg(landingMass_kg)} is above the maximum landing mass ${kg(a.mlw_kg)} by ${kg(landingMass_kg - a.mlw_kg)}.` };
  }
  return null;
}

/** Options of one solve. */
export interface SolveOptions {
  /** Below 1 refines every integration step (convergence studies). */
  readonly stepScale?: number;
  /**
   * Where the fuel iteration starts: a neighbouring mission's converged `MissionResult.warmStart` (an analysis or a
   * sweep that has just solved a similar mission). payloadRange flies its first pass from `rampMass_kg` with the top
   * of descent predicted by `afterSolvable`, and steps with `slope`; a fixed ramp mass flies its solvable leg at
   * `distance_m` first. Only the start moves: the answer is the same converged flight (within the fuel band) with
   * or without it, and an unusable field is ignored.
   */
  readonly warmStart?: MissionStart;
  /**
   * The fuel band's width (kg; default FUEL_TOLERANCE_KG, 0.02 kg, in payloadRange and FIXED_MASS_FUEL_TOLERANCE_KG,
   * 0.004 kg, with a fixed ramp mass): narrower for a tightly converged reference.
   */
  readonly fuelTolerance_kg?: number;
  /**
   * False: no time history is kept (MissionResult.history has no samples), for a caller that reads only the
   * figures, legs, cautions and status (a sweep's rows). Every pass flies exactly as with it, so every other
   * field of the result is bit-identical (test/engine/mission/solveOptions.test.ts). Default true.
   */
  readonly timeHistory?: boolean;
  /**
   * What earlier solves flew that this one may read (passMemo.ts: the alternate's descent distance against its mass
   * at the top of descent, the contingency minimum's hold fuel against its starting mass), instead of a fresh memo:
   * a sweep passes one along cases whose inputs differ in `solve` alone (payload, range, take-off weight), where
   * those flights depend on the mass alone. Only for such missions; the iteration's passes read it as they read
   * their own solve's, so a figure moves by the memo's interpolation error (within 1e-9 relative on the demo,
   * test/engine/mission/solveOptions.test.ts).
   */
  readonly passMemo?: PassMemo;
}

/**
 * Solves a mission (see file comment for the modes). All quantities SI.
 * Returns status 'ok' or the reason it could not (missionStatus.ts lists every
 * status and its class: not solved, cannot reach, hard limit, internal error).
 * A converged iteration's result carries `warmStart`: pass it as
 * `options.warmStart` when solving a neighbouring mission (another payload,
 * range, engine or drag) and the iteration starts from it (2 or 3 passes
 * instead of 4 on the demo; same answer within the fuel band).
 */
export function solveMission(input: MissionInput, options: SolveOptions = {}): MissionResult {
  try {
    return solveGuarded(input, options);
  } catch (e) {
    // Last-resort guard: a fault inside the solver is a bug, reported as a status instead of escaping.
    const what = e instanceof Error ? e.message : String(e);
    return emptyResult(input, 'internal_error', `Internal error while solving the mission (${input.solve?.kind ?? 'unknown'} mode): ${what}. Please report it with the project file.`);
  }
}

function solveGuarded(input: MissionInput, options: SolveOptions): MissionResult {
  const problem = missionInputProblem(input);
  if (problem !== null) return emptyResult(input, 'infeasible', `Mission input: ${problem}`);
  const stepScale = options.stepScale !== undefined && options.stepScale > 0 && Number.isFinite(options.stepScale) ? options.stepScale : 1;
  const payload = input.solve.payload_kg;
  const zfw = input.airframe.oew_kg + payload;
  const taxi = taxiOutFuel(input);
  const flightOptions: FlightOptions = { stepScale, allowNegativeFuel: false };
  const log = createFlightLog(input.airframe, input.cautionSettings, false, options.timeHistory !== false);
  const base: MissionContext = { input, options: flightOptions, zeroFuelMass_kg: zfw, log, memo: options.passMemo ?? createPassMemo(), buffers: newSegmentBuffers() };
  const solve = input.solve;
  const hasSolvable = solvableLegIndex(input) >= 0;

  let rampMass = 0;
  let distance = 0;
  let iterations = 0;
  let residual = 0;
  // null: one flight from a given mass, nothing iterated.
  let outcome: IterationOutcome | null = null;
  if (solve.kind === 'payloadRange') {
    // A warm start's ramp mass is where the iteration starts (fuelIteration.ts takes one above zero-fuel mass):
    // the Breguet guess (a cruise point of the models) is only worked out when there is none.
    const warmRamp = options.warmStart?.rampMass_kg;
    const warm = warmRamp !== undefined && Number.isFinite(warmRamp) && warmRamp > zfw;
    const cold = warm ? null : coldStart(input, zfw, taxi, solve.range_m);
    const start = cold === null ? options.warmStart : { ...cold.start, ...options.warmStart };
    outcome = iterateRampMass(base, solve.range_m, cold?.rampMass_kg ?? (warmRamp as number), start, fuelBand(options.fuelTolerance_kg), cold?.itemsPerKg);
    // A first pass from the closed forms that cannot be flown (a heavier start than the Breguet guess may hit the
    // cruise's thrust limit the answer does not): start again from the Breguet guess, as before them.
    if (cold?.closed === true && outcome.kind === 'flightFailed' && outcome.iterations === 1) {
      const again = iterateRampMass(base, solve.range_m, breguetRampGuess(input, zfw, taxi, solve.range_m), options.warmStart, fuelBand(options.fuelTolerance_kg));
      outcome = { ...again, iterations: again.iterations + 1 };
    }
    ({ rampMass_kg: rampMass, distance_m: distance, iterations, residual_kg: residual } = outcome);
    if (outcome.kind === 'infeasible') {
      return { ...emptyResult(input, 'infeasible', outcome.message), iterations, residual_kg: residual };
    }
  } else {
    rampMass =
      solve.kind === 'takeoffWeight'
        ? solve.takeoffMass_kg + taxi
        : Math.min(input.airframe.mtow_kg + taxi, zfw + input.airframe.maxFuel_kg);
    if (rampMass <= zfw) {
      return emptyResult(input, 'infeasible', msg`No fuel can be carried: ramp mass ${q(rampMass, 'mass')} is not above zero-fuel mass ${q(zfw, 'mass')}.`);
    }
    if (hasSolvable) {
      const guess = options.warmStart?.distance_m === undefined ? solvableDistanceGuess(input, zfw, rampMass) : null;
      outcome = iterateDistance(base, rampMass, options.warmStart, fuelBand(options.fuelTolerance_kg, FIXED_MASS_FUEL_TOLERANCE_KG), guess ?? undefined);
      ({ distance_m: distance, iterations, residual_kg: residual } = outcome);
    }
  }

  // Final flight, recorded, fuel exhaustion enforced.
  // The converged pass is the result when it never went below zero-fuel mass (its mass only falls, so
  // checking block-in suffices; taxi in is burned after landing); otherwise the final flight is flown again with fuel exhaustion enforced.
  const convergedPass = outcome?.kind === 'converged' ? outcome.pass : undefined;
  const reuse = convergedPass !== undefined && convergedPass.trip.end[S_MASS] >= zfw && convergedPass.reserves.status === 'ok';
  const final: MissionEvaluation =
    reuse && convergedPass !== undefined
      ? convergedPass
      : evaluateMission({ ...base, log: freshFlightLog(log) }, rampMass, distance);
  const ctx = { log: final.log };
  const { trip, reserves } = final;
  if (solve.kind === 'takeoffWeight' && !hasSolvable) residual = final.residual_kg;
  let { status, parts: statusParts } = missionStatus(outcome, final);

  const { first, last } = tripBounds(input);
  const at = (index: number, name: string): LegTarget => ({
    legIndex: Math.max(Math.min(index, input.legs.length - 1), 0),
    legName: name,
    env: legEnvironment(input, null),
    recordHistory: false,
  });
  const legName = (i: number) => input.legs[Math.max(Math.min(i, input.legs.length - 1), 0)].name;
  const takeoffMass = trip.takeoff[S_MASS];
  const landingMass = trip.landing[S_MASS];
  const landingFuel = landingMass - zfw;
  if (status === 'ok') {
    const broken = hardLimitBroken(input, takeoffMass, rampMass - zfw, landingMass);
    if (broken !== null) ({ status, parts: statusParts } = broken);
  }
  appendCaution(ctx.log, at(first, legName(first)), checkMtow(takeoffMass, input.airframe.mtow_kg), trip.takeoff[S_TIME]);
  appendCaution(ctx.log, at(0, legName(0)), checkMzfw(zfw, input.airframe.mzfw_kg), 0);
  appendCaution(ctx.log, at(0, legName(0)), checkFuelCapacity(rampMass - zfw, input.airframe.maxFuel_kg), 0);
  if (status === 'ok' || status === 'landing_above_mlw') {
    appendCaution(ctx.log, at(last, legName(last)), checkMlw(landingMass, input.airframe.mlw_kg), trip.landing[S_TIME]);
    const reserveCheck = landingFuel;
    appendCaution(
      ctx.log,
      at(last, legName(last)),
      checkReserve(reserveCheck, reserves.breakdown.total_kg, input.cautionSettings.minReserveFraction),
      trip.landing[S_TIME],
    );
  }

  if (distanceBasis(input) === 'stillAir') appendCaution(ctx.log, at(0, legName(0)), stillAirCaution(input), 0);

  // The reserves are flown from the landing state; when the mission did not succeed and that flight would pass below
  // zero-fuel mass, its rows are left out (the breakdown still says what the reserve needs): no row shows negative fuel.
  const reservesShown = status === 'ok' || reserves.rows.every((row) => row.endMass_kg >= zfw);
  const cautions: Caution[] = [...ctx.log.cautions].sort((a, b) => (a.time_s ?? 0) - (b.time_s ?? 0));
  return {
    status,
    statusMessage: messageText(statusParts, 'both'),
    statusParts,
    blockFuel_kg: rampMass - trip.end[S_MASS],
    blockTime_s: trip.end[S_TIME],
    tripFuel_kg: takeoffMass - landingMass,
    tripTime_s: trip.landing[S_TIME] - trip.takeoff[S_TIME],
    reserveFuel_kg: reserves.breakdown.total_kg,
    reserves: reserves.breakdown,
    takeoffMass_kg: takeoffMass,
    rampMass_kg: rampMass,
    landingMass_kg: landingMass,
    zeroFuelMass_kg: zfw,
    payload_kg: payload,
    airDistance_m: trip.end[S_AIR],
    groundDistance_m: trip.end[S_GROUND],
    distanceBasis: distanceBasis(input),
    legs: [...trip.rows, ...(reservesShown ? reserves.rows : [])],
    history: buildTimeHistory(ctx.log),
    cautions,
    iterations,
    residual_kg: residual,
    ...(outcome?.kind === 'converged' ? { warmStart: outcome.warmStart } : {}),
  };
}
