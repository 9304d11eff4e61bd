/**
 * Reserve fuel flown with the same engine and airframe, as the published
 * rules word it (the texts, paragraphs and interpretations are in
 * reserveRules.ts), starting from the landing mass at the destination. Items
 * are flown in the rule's order, each from the mass the previous one leaves,
 * the final reserve last. Holds the rules place "in standard conditions" are
 * flown at ISA and in still air at the reserve hold speed; the alternate in the
 * mission's ISA deviation and the alternate's wind, its fuel being the missed
 * approach at the destination, the climb-cruise-descent and the approach and
 * landing at the alternate (ICAO Annex 6 "alternate fuel").
 *
 * - ICAO Annex 6 Part I, 4.3.6.3 (turbine aeroplanes): contingency = the
 *   larger of a fraction (5 %) of the planned trip fuel and the fuel to fly
 *   5 minutes at holding speed at 450 m (1,500 ft) above the destination in
 *   standard conditions; alternate fuel; final reserve = 30 minutes at
 *   holding speed at 450 m above the alternate (the destination when there is
 *   none) in standard conditions.
 * - 14 CFR 121.639 (domestic): fly to the destination, then to and land at the
 *   most distant alternate, then 45 minutes at normal cruising fuel
 *   consumption (flown at the mission's first cruise altitude and speed rule).
 * - 14 CFR 121.645(b) (flag, turbine): 10 % of the total time to the
 *   destination (flown at normal cruise: an interpretation), the alternate,
 *   30 minutes at holding speed at 1,500 ft above the alternate in standard
 *   temperature conditions.
 * - custom: contingency fraction of trip fuel, alternate, final-reserve hold
 *   at 1,500 ft above the alternate, and a fixed extra fuel.
 */
import type { AlternateSpec, LegRow, MissionInput, MissionStatus, ReserveBreakdown, SpeedSchedule } from './missionTypes';
import type { RatingName } from '../propulsion/propulsionModel';
import { destinationElevation, flyAllowance } from './allowanceLegs';
import { reserveArrival, reserveHoldSpeed, reserveItemName } from './reserveRules';
import { flyClimb } from './climbLeg';
import { basisSpecificRange, specificRangeAt } from './bestSpeeds';
import { cruiseMachOfMass, flyCruise } from './cruiseLeg';
import { flyDescent, type DescentMode } from './descentLeg';
import { flyHold } from './holdLeg';
import { makeLevelSegment } from './levelFlight';
import { flySegment, missionDomain } from './flySegment';
import { BASE_STEP_S, distanceIndex, type LegTarget, type MissionContext } from './missionContext';
import { FOOT_M, NAUTICAL_MILE_M } from '../units/unitTable';
import { S_AIR, S_ALT, S_GROUND, S_MASS, S_TIME, type StateVector } from './missionState';
import { appendCaution, createFlightLog } from './timeHistoryBuilder';
import { CAUTION_CATALOGUE } from '../cautions/cautionCatalogue';
import { legFailed, legOk, segmentStopFailure, type LegOutcome } from './legOutcome';
import { messageText, msg, partsOf, q, withParts, type MessageParts } from '../units/messageParts';

/** 1,500 ft above the aerodrome (m): ICAO Annex 6 Part I 4.3.6.3 (450 m) and 14 CFR 121.645(b)(4). */
export const HOLD_HEIGHT_M = 1500 * FOOT_M;

const DEFAULT_CLIMB: Omit<SpeedSchedule, 'mach'> = {
  lowCas_m_s: (250 * NAUTICAL_MILE_M) / 3600,
  lowAltitudeLimit_m: 10000 * FOOT_M,
  cas_m_s: (280 * NAUTICAL_MILE_M) / 3600,
};

export interface ReserveFlight {
  readonly status: MissionStatus;
  readonly message: string;
  readonly parts?: MessageParts;
  readonly breakdown: ReserveBreakdown;
  readonly rows: readonly LegRow[];
}

export interface TripSummary {
  readonly tripFuel_kg: number;
  /** Take-off to landing (s). */
  readonly tripTime_s: number;
  /** State at landing at the destination. */
  readonly landing: StateVector;
}

interface Flown {
  readonly out: LegOutcome;
  readonly fuel_kg: number;
}

/** The alternate's climb: the mission's first climb leg's schedule and rating, else the default schedule at the alternate's cruise Mach and maxClimb. */
export function climbSettings(input: MissionInput, alternate: AlternateSpec): { schedule: SpeedSchedule; rating: RatingName } {
  const climb = input.legs.find((l) => l.kind === 'climb');
  if (climb && climb.kind === 'climb') return { schedule: climb.schedule, rating: climb.rating };
  return { schedule: { ...DEFAULT_CLIMB, mach: alternate.cruiseMach }, rating: 'maxClimb' };
}

/** The alternate's descent: the mission's first descent leg's schedule and mode, else the climb's schedule at idle. */
export function descentSettings(input: MissionInput, alternate: AlternateSpec): { schedule: SpeedSchedule; mode: DescentMode } {
  const descent = input.legs.find((l) => l.kind === 'descent');
  if (descent && descent.kind === 'descent') return { schedule: descent.schedule, mode: descent.mode };
  return { schedule: climbSettings(input, alternate).schedule, mode: { kind: 'idle' } };
}

/** How far (factor) the contingency fraction must exceed the minimum's hold fuel, predicted from an earlier pass, for the hold not to be flown again. */
const CONTINGENCY_SKIP_MARGIN = 1.25;

/** Widest bracket (kg of mass at the top of descent) the alternate's descent table interpolates across. */
const ALTERNATE_TABLE_SPAN_KG = 600;

/** Flies to the alternate: climb, cruise, descent to 1,500 ft above it. */
function flyAlternate(ctx: MissionContext, target: LegTarget, start: StateVector, alt: AlternateSpec): LegOutcome {
  const input = ctx.input;
  const holdAltitude = alt.elevation_m + HOLD_HEIGHT_M;
  const climbSpec = climbSettings(input, alt);
  const descentSpec = descentSettings(input, alt);
  const top = Math.max(alt.cruiseAltitude_m, holdAltitude);
  const k = distanceIndex(input);
  const startAir = start[k];
  const climb = flyClimb(ctx, target, start, top, climbSpec.schedule, climbSpec.rating);
  if (climb.status !== 'ok') return climb;
  // Descent distance from a trial descent at the estimated top-of-descent mass (cruise fuel from the
  // specific range at the top of climb), so the alternate's still-air distance is met closely. The descent
  // distance depends only on the mass at its top (same altitude, air and wind): the passes of one solve share the
  // ones flown (PassMemo.alternateDescent), read where the table brackets the mass (parabola through the three
  // nearest) or, for the first estimate only, lies within 10 kg of them (farther out a read misses by centimetres,
  // which move the second trial's mass and the alternate's fuel by 1e-4 kg).
  // The trials' quiet log, made when a trial is flown (a pass that reads both from the table needs none).
  let scratch: MissionContext | null = null;
  // Only from the alternate's cruise level: its descents from another level are another function of the mass.
  const table = ctx.options.allowNegativeFuel && Math.abs(climb.state[S_ALT] - top) <= 1 ? ctx.memo?.alternateDescent : undefined;
  const climbed = climb.state[k] - startAir;
  const trialDescent = (mass_kg: number, maxExtrapolation_kg: number): { readonly failure: LegOutcome | null; readonly distance_m: number } => {
    const known = table?.at(mass_kg, ALTERNATE_TABLE_SPAN_KG, maxExtrapolation_kg) ?? null;
    if (known !== null) return { failure: null, distance_m: known };
    const from = Float64Array.from(climb.state);
    from[S_MASS] = mass_kg;
    scratch ??= { ...ctx, log: createFlightLog(input.airframe, input.cautionSettings, true) };
    const trial = flyDescent(scratch, target, from, holdAltitude, descentSpec.schedule, descentSpec.mode);
    const distance_m = trial.state[k] - from[k];
    if (trial.status !== 'ok') return { failure: trial, distance_m };
    table?.add(mass_kg, distance_m);
    return { failure: null, distance_m };
  };
  const first = trialDescent(climb.state[S_MASS], 10);
  if (first.failure !== null) return first.failure;
  const sr = basisSpecificRange(input, specificRangeAt(input, top, alt.cruiseMach, climb.state[S_MASS], target.env.isaDev_K), top, alt.cruiseMach, target.env);
  const cruiseEstimate = Math.max(alt.distance_m - climbed - first.distance_m, 0);
  const second = sr > 0 ? trialDescent(climb.state[S_MASS] - cruiseEstimate / sr, 0) : first;
  const descentDistance = second.failure === null ? second.distance_m : first.distance_m;
  const cruiseDistance = alt.distance_m - climbed - descentDistance;
  let state = climb.state;
  if (cruiseDistance < 0) {
    appendCaution(
      ctx.log,
      target,
      {
        id: 'alternate_too_short',
        severity: CAUTION_CATALOGUE.alternate_too_short.severity,
        ...withParts(msg`The alternate's ${q(alt.distance_m, 'distance')} is shorter than its climb and descent; flown ${q(alt.distance_m - cruiseDistance, 'distance')}.`),
        value: alt.distance_m,
        threshold: alt.distance_m - cruiseDistance,
      },
      state[S_TIME],
    );
  } else {
    const cruise = flyCruise(ctx, target, state, {
      altitude_m: top,
      speed: { kind: 'mach', mach: alt.cruiseMach },
      profile: { kind: 'constantAltitude' },
      distance_m: cruiseDistance,
    });
    if (cruise.status !== 'ok') return cruise;
    state = cruise.state;
  }
  const descent = flyDescent(ctx, target, state, holdAltitude, descentSpec.schedule, descentSpec.mode);
  if (descent.status === 'ok') table?.add(state[S_MASS], descent.state[k] - state[k]);
  return descent;
}

/** Flies `time_s` at the mission's normal cruise (first cruise leg's altitude and speed rule) from `start`. */
function flyNormalCruiseTime(ctx: MissionContext, target: LegTarget, start: StateVector, time_s: number): LegOutcome {
  const input = ctx.input;
  const cruise = input.legs.find((l) => l.kind === 'cruise');
  if (!cruise || cruise.kind !== 'cruise') {
    return flyHold(ctx, target, start, start[S_ALT], time_s, { kind: 'bestEndurance' });
  }
  if (!(time_s > 0)) return legOk(Float64Array.from(start), null);
  const dev = target.env.isaDev_K;
  const state = Float64Array.from(start);
  state[S_ALT] = cruise.altitude_m;
  const machOf = cruiseMachOfMass(input, cruise.speed, cruise.altitude_m, state[S_MASS], dev);
  const run = flySegment(
    ctx,
    target,
    makeLevelSegment(ctx, target, {
      altitudeOf: () => cruise.altitude_m,
      algebraicAltitude: false,
      machOf: (_h, m) => machOf(m),
      ceiling: 'maxCruise',
      step_s: BASE_STEP_S.cruise * ctx.options.stepScale,
      endDistance_m: null,
      endTime_s: state[S_TIME] + time_s,
    }),
    state,
  );
  if (run.stop === 'time_reached') return legOk(run.end, run.endSample);
  if (run.stop === 'thrust_below_drag') return legFailed(run.end, 'thrust_below_drag', `Thrust below drag in the reserve cruise on ${target.legName}.`, run.endSample);
  return segmentStopFailure(run.end, run, `the reserve cruise on ${target.legName}`, missionDomain(ctx, target), run.endSample);
}

/** A reserve item flown with a last-resort guard: a fault inside it (a bug) is 'internal_error' naming the item. */
function flyGuarded(fly: (t: LegTarget, s: StateVector) => LegOutcome, target: LegTarget, start: StateVector): LegOutcome {
  try {
    return fly(target, start);
  } catch (e) {
    const what = e instanceof Error ? e.message : String(e);
    return legFailed(Float64Array.from(start), 'internal_error', `Internal error while flying the reserve ${target.legName}: ${what}. Please report it with the project file.`, null);
  }
}

/** Flies the reserve policy from the landing state; one LegRow per reserve item (kind 'reserve'). */
export function flyReserves(ctx: MissionContext, trip: TripSummary): ReserveFlight {
  const input = ctx.input;
  const policy = input.reserves;
  const rows: LegRow[] = [];
  const missionEnv = { isaDev_K: input.isaDev_K, wind_m_s: input.wind_m_s };
  const alternateEnv = { isaDev_K: input.isaDev_K, wind_m_s: policy.alternate?.wind_m_s ?? input.wind_m_s };
  const standardEnv = { isaDev_K: 0, wind_m_s: 0 };
  // The reserves start on the ground at the destination (MissionInput.destinationElevation_m, default 0 m).
  const destination = destinationElevation(input);
  let state = Float64Array.from(trip.landing);
  state[S_ALT] = destination;
  state[S_AIR] = 0;
  state[S_GROUND] = 0;
  let contingency = 0;
  let alternateFuel = 0;
  let missedApproach = 0;
  let alternateApproach = 0;
  let finalFuel = 0;
  const holdSpeed = reserveHoldSpeed(policy);
  let status: MissionStatus = 'ok';
  let message = '';
  let parts: MessageParts = [];

  const run = (name: string, env: typeof missionEnv, fly: (t: LegTarget, s: StateVector) => LegOutcome): Flown | null => {
    const target: LegTarget = { legIndex: input.legs.length + rows.length, legName: name, env, recordHistory: false };
    const start = state;
    const out = flyGuarded(fly, target, start);
    rows.push({
      index: target.legIndex,
      name,
      kind: 'reserve',
      startTime_s: start[S_TIME],
      endTime_s: out.state[S_TIME],
      startDistance_m: start[S_AIR],
      endDistance_m: out.state[S_AIR],
      startGroundDistance_m: start[S_GROUND],
      endGroundDistance_m: out.state[S_GROUND],
      startAltitude_m: start[S_ALT],
      endAltitude_m: out.state[S_ALT],
      startMass_kg: start[S_MASS],
      endMass_kg: out.state[S_MASS],
      fuel_kg: start[S_MASS] - out.state[S_MASS],
    });
    if (out.status !== 'ok') {
      status = out.status;
      parts = [`Reserve ${name}: `, ...partsOf(out), ...msg` (${q(out.state[S_TIME] - start[S_TIME], 'time')} into the item)`];
      message = messageText(parts, 'both');
      return null;
    }
    state = out.state;
    return { out, fuel_kg: start[S_MASS] - out.state[S_MASS] };
  };

  // Contingency (ICAO, custom) or the 10 % en-route time (121.645(b)(2)).
  if (policy.preset === 'icaoAnnex6') {
    const fraction = policy.contingencyFraction * trip.tripFuel_kg;
    const holdTarget: LegTarget = { legIndex: -1, legName: 'contingency minimum', env: standardEnv, recordHistory: false };
    // The minimum's hold is flown unless an earlier pass of the same solve flew it and, scaled in proportion to the
    // mass (fuel flow ~ weight at the hold's constant lift coefficient), it stays below the fraction by a quarter.
    const table = ctx.options.allowNegativeFuel ? ctx.memo?.contingencyHold : undefined;
    const flown = table?.nearest(state[S_MASS]) ?? null;
    const predicted = flown !== null && flown.mass_kg > 0 ? (flown.value * state[S_MASS]) / flown.mass_kg : Infinity;
    if (fraction >= CONTINGENCY_SKIP_MARGIN * predicted) {
      contingency = fraction;
    } else {
      const scratch: MissionContext = { ...ctx, log: createFlightLog(input.airframe, input.cautionSettings, true) };
      const hold = flyHold(scratch, holdTarget, state, destination + HOLD_HEIGHT_M, policy.minContingency_s, holdSpeed);
      const holdFuel = state[S_MASS] - hold.state[S_MASS];
      if (hold.status === 'ok') table?.add(state[S_MASS], holdFuel);
      contingency = Math.max(fraction, hold.status === 'ok' ? holdFuel : 0);
    }
    const start = state;
    state = Float64Array.from(state);
    state[S_MASS] -= contingency;
    rows.push(reserveRow(input.legs.length + rows.length, reserveItemName(policy.preset, 'contingency'), start, state));
  } else if (policy.preset === 'custom') {
    contingency = policy.contingencyFraction * trip.tripFuel_kg;
    const start = state;
    state = Float64Array.from(state);
    state[S_MASS] -= contingency;
    rows.push(reserveRow(input.legs.length + rows.length, reserveItemName(policy.preset, 'contingency'), start, state));
  } else if (policy.preset === 'cfr121_645') {
    const flown = run(reserveItemName(policy.preset, 'enRouteTime'), missionEnv, (t, s) =>
      flyNormalCruiseTime(ctx, t, s, policy.enRouteFraction * trip.tripTime_s),
    );
    if (flown === null) return finish();
    contingency = flown.fuel_kg;
    // The en-route time is fuel flown at the cruise level; the items after it start at the destination again.
    state = Float64Array.from(state);
    state[S_ALT] = destination;
  }

  if (policy.alternate !== null) {
    const alternate = policy.alternate;
    const arrival = reserveArrival(input);
    // ICAO Annex 6 "alternate fuel": a missed approach at the destination, the flight, the approach and landing at the alternate.
    const missed = run(reserveItemName(policy.preset, 'missedApproach'), alternateEnv, (t, s) =>
      flyAllowance(ctx, t, s, { kind: 'takeoff', name: t.legName, time_s: arrival.missedApproach.time_s, fuel_kg: arrival.missedApproach.fuel_kg }),
    );
    if (missed === null) return finish();
    missedApproach = missed.fuel_kg;
    const flown = run(reserveItemName(policy.preset, 'alternate'), alternateEnv, (t, s) => flyAlternate(ctx, t, s, alternate));
    if (flown === null) return finish();
    const landing = run(reserveItemName(policy.preset, 'alternateApproach'), alternateEnv, (t, s) =>
      flyAllowance(
        ctx,
        t,
        s,
        { kind: 'approach', name: t.legName, time_s: arrival.alternateApproach.time_s, fuel_kg: arrival.alternateApproach.fuel_kg },
        alternate.elevation_m,
      ),
    );
    if (landing === null) return finish();
    alternateApproach = landing.fuel_kg;
    alternateFuel = missed.fuel_kg + flown.fuel_kg + landing.fuel_kg;
  } else {
    state = Float64Array.from(state);
    state[S_ALT] = destination + HOLD_HEIGHT_M;
  }

  if (policy.preset === 'cfr121_639') {
    const flown = run(reserveItemName(policy.preset, 'finalReserve'), missionEnv, (t, s) =>
      flyNormalCruiseTime(ctx, t, s, policy.finalReserve_s),
    );
    if (flown === null) return finish();
    finalFuel = flown.fuel_kg;
  } else {
    const holdAltitude = (policy.alternate?.elevation_m ?? destination) + HOLD_HEIGHT_M;
    const flown = run(reserveItemName(policy.preset, 'finalReserve'), standardEnv, (t, s) =>
      flyHold(ctx, t, s, holdAltitude, policy.finalReserve_s, holdSpeed),
    );
    if (flown === null) return finish();
    finalFuel = flown.fuel_kg;
  }
  return finish();

  function finish(): ReserveFlight {
    const extra = policy.preset === 'custom' ? policy.extraFuel_kg : 0;
    return {
      status,
      message,
      parts,
      rows,
      breakdown: {
        contingency_kg: contingency,
        alternate_kg: alternateFuel,
        missedApproach_kg: missedApproach,
        alternateApproach_kg: alternateApproach,
        finalReserve_kg: finalFuel,
        extra_kg: extra,
        total_kg: contingency + alternateFuel + finalFuel + extra,
      },
    };
  }
}

function reserveRow(index: number, name: string, start: StateVector, end: StateVector): LegRow {
  return {
    index,
    name,
    kind: 'reserve',
    startTime_s: start[S_TIME],
    endTime_s: end[S_TIME],
    startDistance_m: start[S_AIR],
    endDistance_m: end[S_AIR],
    startGroundDistance_m: start[S_GROUND],
    endGroundDistance_m: end[S_GROUND],
    startAltitude_m: start[S_ALT],
    endAltitude_m: end[S_ALT],
    startMass_kg: start[S_MASS],
    endMass_kg: end[S_MASS],
    fuel_kg: start[S_MASS] - end[S_MASS],
  };
}
