/**
 * Cruise leg: constant Mach (set, best-range or long-range) at constant
 * altitude, with optional step climbs or a cruise-climb, flown for a
 * still-air distance. Thrust = drag at part power (maxCruise ceiling).
 *
 * Step climb: a step of `step_m` is taken as soon as the higher level gives a
 * better specific range at the current mass AND the climb rate at maxClimb
 * there (held Mach, energy share factor) is at least the residual climb rate
 * set in the caution settings; the step is flown as a held-Mach climb at
 * maxClimb. Cruise-climb: climbs (maxClimb, held Mach) from the leg altitude
 * to the best specific range among the levels within the cruise limits
 * (residual climb rate, buffet margin) up to the maximum, then holds that Mach
 * and lift coefficient, so the altitude rises as mass falls (pressure
 * proportional to mass). Step climbs keep the same limits at the higher level.
 */
import { goldenMaximum } from '../core/scalarMaximum';
import { bestRangeMach, longRangeMach, specificRangeAt } from './bestSpeeds';
import { CLIMB_STALL_RATE_M_S, makeClimbSegment } from './climbLeg';
import { energyShareFactor, pressureAltitudeRate } from './energyShareFactor';
import { airPoint, ratingPoint } from './flightPoint';
import { flyMonotoneSegment, flySegment, missionDomain } from './flySegment';
import { legFailed, legOk, segmentStopFailure, type LegOutcome } from './legOutcome';
import { makeLevelSegment } from './levelFlight';
import { BASE_MONOTONE_STEP, BASE_STEP_S, distanceIndex, type LegTarget, type MissionContext } from './missionContext';
import { pathBreakAltitudes } from './stepBreaks';
import type { SegmentRun } from './integrator';
import { altitudeOfPressure, LAPSE_JUMPS_M, missionAir } from './missionAtmosphere';
import type { CruiseProfile, CruiseSpeed, MissionInput } from './missionTypes';
import { S_AIR, S_ALT, S_GROUND, S_MASS, S_TAS, type FlightSample, type SegmentEvent, type StateVector } from './missionState';
import { appendCaution } from './timeHistoryBuilder';
import { CAUTION_CATALOGUE } from '../cautions/cautionCatalogue';
import { msg, q, withParts, type MessageParts } from '../units/messageParts';

export interface CruiseSpec {
  readonly altitude_m: number;
  readonly speed: CruiseSpeed;
  readonly profile: CruiseProfile;
  /** Distance to fly (m) in the mission's distance basis (over the ground unless the mission is a still-air study). */
  readonly distance_m: number;
  /** When set, the leg ends at this absolute distance (m, same basis) as a function of mass (kg) instead (top of descent predicted by the fuel iteration). */
  readonly endDistanceOf?: (mass_kg: number) => number;
}

/** Cruise Mach (-) for a speed rule at altitude (m) and mass (kg), searched afresh. */
export function cruiseMach(input: MissionInput, speed: CruiseSpeed, altitude_m: number, mass_kg: number, isaDev_K: number): number {
  if (speed.kind === 'mach') return speed.mach;
  if (speed.kind === 'bestRange') return bestRangeMach(input, altitude_m, mass_kg, isaDev_K);
  return longRangeMach(input, altitude_m, mass_kg, isaDev_K);
}

/** Time (s) to which the start of a step climb is located (the fuel it moves is of order fuel flow x 1 s x the few-% flow change). */
export const STEP_DECISION_S = 1;

/** Mass nodes of the cruise-Mach table. */
const MACH_TABLE_NODES = 5;

/**
 * The speed rule's Mach at one altitude as a smooth function of mass (kg):
 * searched at 5 masses spread evenly from `heavy_kg` down to 55 % of it and
 * interpolated by the Lagrange polynomial through them (mass clamped to that
 * band), so the integrator sees a smooth right-hand side at the cost of five
 * searches per level instead of one per evaluation.
 */
export function cruiseMachOfMass(
  input: MissionInput,
  speed: CruiseSpeed,
  altitude_m: number,
  heavy_kg: number,
  isaDev_K: number,
): (mass_kg: number) => number {
  if (speed.kind === 'mach') return () => speed.mach;
  const hi = Math.max(heavy_kg, 1);
  const lo = 0.55 * hi;
  const xs: number[] = [];
  const ys: number[] = [];
  for (let i = 0; i < MACH_TABLE_NODES; i++) {
    const m = lo + ((hi - lo) * i) / (MACH_TABLE_NODES - 1);
    xs.push(m);
    ys.push(cruiseMach(input, speed, altitude_m, m, isaDev_K));
  }
  return (mass_kg) => {
    const m = Math.min(Math.max(mass_kg, lo), hi);
    let sum = 0;
    for (let i = 0; i < xs.length; i++) {
      let w = 1;
      for (let j = 0; j < xs.length; j++) if (j !== i) w *= (m - xs[j]) / (xs[i] - xs[j]);
      sum += w * ys[i];
    }
    return sum;
  };
}

/** Climb rate (m/s) at maxClimb holding Mach at altitude (m) and mass (kg). */
function heldMachClimbRate(input: MissionInput, altitude_m: number, mach: number, mass_kg: number, isaDev_K: number): number {
  const air = missionAir(altitude_m, isaDev_K);
  const at = airPoint(input, altitude_m, mach, mass_kg, isaDev_K);
  const thrust = ratingPoint(input, at, isaDev_K, 'maxClimb').thrust_N;
  const f = energyShareFactor('mach', mach, air.lapse_K_m, air.temperature_K, air.isaTemperature_K);
  return pressureAltitudeRate(thrust, at.drag.drag_N, at.tas_m_s, mass_kg, f, air.temperature_K, air.isaTemperature_K);
}

function failed(ctx: MissionContext, target: LegTarget, state: StateVector, run: Pick<SegmentRun, 'stop' | 'domainExit'>, last: FlightSample): LegOutcome {
  if (run.stop === 'thrust_below_drag') {
    appendCaution(
      ctx.log,
      target,
      {
        id: 'thrust_below_drag',
        severity: CAUTION_CATALOGUE.thrust_below_drag.severity,
        ...withParts(msg`On ${target.legName} the drag ${q(last.drag_N, 'force')} exceeds the maximum-cruise thrust ${q(last.thrustAvailable_N, 'force')} at Mach ${q(last.mach, 'mach')}, ${q(last.altitude_m, 'altitude')}.`),
        value: last.thrustAvailable_N,
        threshold: last.drag_N,
      },
      state[0],
    );
    return legFailed(state, 'thrust_below_drag', `Thrust below drag in the cruise on ${target.legName}.`, last);
  }
  return segmentStopFailure(state, run, `the cruise on ${target.legName}`, missionDomain(ctx, target), last);
}

/** Why a level lies outside the cruise limits: null when within them. */
function cruiseLimitBroken(input: MissionInput, altitude_m: number, mach: number, mass_kg: number, isaDev_K: number): 'climb-rate limit' | 'buffet margin' | null {
  const minRate = Math.max(input.cautionSettings.minResidualClimbRate_m_s, 1e-3);
  if (!(heldMachClimbRate(input, altitude_m, mach, mass_kg, isaDev_K) >= minRate)) return 'climb-rate limit';
  const at = airPoint(input, altitude_m, mach, mass_kg, isaDev_K);
  return at.drag.buffetLoadFactor >= input.cautionSettings.minBuffetLoadFactor ? null : 'buffet margin';
}

/**
 * Start level (m) of a cruise-climb at mass (kg): the best specific range between `floor_m` and `ceiling_m` among
 * the levels within the cruise limits (maxClimb climb rate at the held Mach at least the residual climb rate of
 * the caution settings, buffet load factor at least their minimum). The highest level within the limits is
 * found by bisection to 1 m, the best SR below it by golden section; `limitedBy` names the limit that held the
 * start below the unconstrained optimum (null when none did).
 */
export function cruiseClimbStart(
  input: MissionInput,
  speed: CruiseSpeed,
  floor_m: number,
  ceiling_m: number,
  mass_kg: number,
  isaDev_K: number,
): { readonly altitude_m: number; readonly limitedBy: 'climb-rate limit' | 'buffet margin' | null } {
  const broken = (h: number) => cruiseLimitBroken(input, h, cruiseMach(input, speed, h, mass_kg, isaDev_K), mass_kg, isaDev_K);
  const sr = (h: number) => specificRangeAt(input, h, cruiseMach(input, speed, h, mass_kg, isaDev_K), mass_kg, isaDev_K);
  if (ceiling_m - floor_m < 1) return { altitude_m: floor_m, limitedBy: null };
  const atTop = broken(ceiling_m);
  let top = ceiling_m;
  let limit: 'climb-rate limit' | 'buffet margin' | null = null;
  if (atTop !== null) {
    const atFloor = broken(floor_m);
    if (atFloor !== null) return { altitude_m: floor_m, limitedBy: atFloor };
    let lo = floor_m;
    let hi = ceiling_m;
    limit = atTop;
    for (let i = 0; i < 60 && hi - lo > 1; i++) {
      const mid = 0.5 * (lo + hi);
      const why = broken(mid);
      if (why === null) lo = mid;
      else {
        hi = mid;
        limit = why;
      }
    }
    top = lo;
  }
  const best = goldenMaximum(sr, floor_m, top, 1);
  const unconstrained = top < ceiling_m ? goldenMaximum(sr, floor_m, ceiling_m, 1) : best;
  return { altitude_m: best, limitedBy: limit !== null && unconstrained > top + 1 ? limit : null };
}

/**
 * Sets the distance in basis `k` to its exact end value and moves the other distance by the same amount (both
 * to the value when they are equal, as in still air, so a windless flight is the same whichever the basis).
 */
function setEndDistance(state: StateVector, k: typeof S_AIR | typeof S_GROUND, value: number): void {
  const other = k === S_AIR ? S_GROUND : S_AIR;
  state[other] = state[other] === state[k] ? value : state[other] + (value - state[k]);
  state[k] = value;
}

/** Flies a cruise leg from `start` for `spec.distance_m` (over the ground, or in still air in a still-air study). */
/**
 * Climbs at maxClimb and the held `mach` to `toAltitude_m` within a cruise leg (a cruise-climb start or a step),
 * stopped also by the leg's end, so the distance flown stays a continuous function of the mass. Returns the
 * run's end (true airspeed set from its last sample) and the leg's outcome when the climb ends the leg: the leg's
 * end reached (ok), a stall (`stalled` words it at the altitude reached) or another failure; null to fly on.
 */
function climbWithinLeg(
  ctx: MissionContext,
  target: LegTarget,
  start: StateVector,
  mach: number,
  toAltitude_m: number,
  k: typeof S_AIR | typeof S_GROUND,
  endAt: (mass_kg: number) => number,
  stalled: (altitude_m: number) => MessageParts,
): { readonly state: StateVector; readonly last: FlightSample; readonly outcome: LegOutcome | null } {
  const climbSegment = makeClimbSegment(ctx, target, 'mach', mach, toAltitude_m, 'maxClimb');
  const legEnd: SegmentEvent = { stop: 'distance_reached', stateOnly: true, g: (y) => y[k] - endAt(y[S_MASS]) };
  // Stepped by altitude with step ends on the models' slope breaks, as the climb legs are (monotoneStepper.ts); the
  // leg's end, met within a step, hands that step to the time integrator, which locates it.
  const climb = flyMonotoneSegment(ctx, target, { ...climbSegment, events: [...climbSegment.events, legEnd] }, start, {
    component: S_ALT,
    to: toAltitude_m,
    breaks: pathBreakAltitudes(ctx.input, 'mach', mach, start[S_ALT], toAltitude_m),
    maxStep: BASE_MONOTONE_STEP.altitude_m * ctx.options.stepScale,
    minRate: CLIMB_STALL_RATE_M_S,
    targetStop: 'altitude_reached',
    jumps: LAPSE_JUMPS_M,
  });
  const state = climb.end;
  const last = climb.endSample;
  state[S_TAS] = last.tas_m_s;
  if (climb.stop === 'distance_reached') {
    setEndDistance(state, k, endAt(state[S_MASS]));
    return { state, last, outcome: legOk(state, last) };
  }
  if (climb.stop !== 'altitude_reached') {
    const outcome = climb.stop !== 'climb_stalled' ? failed(ctx, target, state, climb, last) : legFailed(state, 'climb_not_reached', stalled(state[S_ALT]), last);
    return { state, last, outcome };
  }
  return { state, last, outcome: null };
}

export function flyCruise(ctx: MissionContext, target: LegTarget, start: StateVector, spec: CruiseSpec): LegOutcome {
  const input = ctx.input;
  const dev = target.env.isaDev_K;
  const k = distanceIndex(input);
  const fixedEnd = start[k] + Math.max(spec.distance_m, 0);
  const endOf = spec.endDistanceOf;
  const endAir: number | ((mass_kg: number) => number) = endOf ? (m: number) => Math.max(endOf(m), start[k]) : fixedEnd;
  const endAt = (mass_kg: number) => (typeof endAir === 'number' ? endAir : endAir(mass_kg));
  let state = start.slice();
  state[S_ALT] = spec.altitude_m;
  let last: FlightSample | null = null;
  const step_s = BASE_STEP_S.cruise * ctx.options.stepScale;
  const profile = spec.profile;

  if (profile.kind === 'cruiseClimb') {
    // Start at the best specific range among the levels within the cruise limits (maxClimb climb rate at the
    // residual rate, buffet margin) between the leg altitude and the cap, climbing there at maxClimb and the
    // held Mach; then constant Mach and constant CL: p(h) = p(h0) m / m0, the classic cruise-climb that stays at
    // the optimum while specific range depends on W/delta only (common practice; Anderson, Aircraft Performance
    // and Design, section 5.13).
    const floor = Math.max(spec.altitude_m, Math.min(start[S_ALT], profile.maxAltitude_m));
    const ceiling = Math.max(profile.maxAltitude_m, floor);
    const begin = cruiseClimbStart(input, spec.speed, floor, ceiling, state[S_MASS], dev);
    const h0 = begin.altitude_m;
    const mach = cruiseMach(input, spec.speed, h0, state[S_MASS], dev);
    state[S_ALT] = floor;
    if (h0 > state[S_ALT] + 1) {
      const climb = climbWithinLeg(ctx, target, state, mach, h0, k, endAt, (h) => msg`The climb to the cruise-climb start on ${target.legName} stalled at ${q(h, 'altitude')}.`);
      state = climb.state;
      last = climb.last;
      if (climb.outcome !== null) return climb.outcome;
    }
    state[S_ALT] = h0;
    if (begin.limitedBy !== null) {
      appendCaution(
        ctx.log,
        target,
        {
          id: 'cruise_climb_start_limited',
          severity: CAUTION_CATALOGUE.cruise_climb_start_limited.severity,
          ...withParts(msg`The cruise-climb on ${target.legName} starts at ${q(h0, 'altitude')}, held below its optimum by the ${begin.limitedBy}.`),
          value: h0,
          threshold: ceiling,
        },
        state[0],
      );
    }
    const m0 = state[S_MASS];
    const p0 = missionAir(h0, 0).pressure_Pa;
    const pCeiling = missionAir(ceiling, 0).pressure_Pa;
    const pFloor = missionAir(floor, 0).pressure_Pa;
    const altitudeOf = (m: number) => {
      const p = Math.min(Math.max((p0 * Math.max(m, 1)) / m0, pCeiling), pFloor);
      return Math.min(Math.max(altitudeOfPressure(p), floor), ceiling);
    };
    state[S_ALT] = h0;
    const run = flySegment(
      ctx,
      target,
      makeLevelSegment(ctx, target, {
        altitudeOf,
        algebraicAltitude: true,
        machOf: () => mach,
        ceiling: 'maxCruise',
        step_s,
        endDistance_m: endAir,
        endTime_s: null,
      }),
      state,
    );
    state = run.end;
    state[S_TAS] = run.endSample.tas_m_s;
    if (run.endSample.altitude_m >= ceiling - 1 && ceiling > floor) {
      appendCaution(
        ctx.log,
        target,
        {
          id: 'profile_altitude_limited',
          severity: CAUTION_CATALOGUE.profile_altitude_limited.severity,
          ...withParts(msg`The cruise-climb on ${target.legName} reached its maximum altitude ${q(ceiling, 'altitude')}.`),
          value: run.endSample.altitude_m,
          threshold: ceiling,
        },
        state[0],
      );
    }
    if (run.stop === 'distance_reached') {
      setEndDistance(state, k, endAt(state[S_MASS]));
      return legOk(state, run.endSample);
    }
    return failed(ctx, target, state, run, run.endSample);
  }

  for (let guard = 0; guard < 200; guard++) {
    const h = state[S_ALT];
    const machHere = cruiseMachOfMass(input, spec.speed, h, state[S_MASS], dev);
    const extra: SegmentEvent[] = [];
    const canStep = profile.kind === 'stepClimb' && profile.step_m > 0 && h + profile.step_m <= profile.maxAltitude_m + 1e-6;
    if (canStep) {
      const up = h + profile.step_m;
      const machUpOf = cruiseMachOfMass(input, spec.speed, up, state[S_MASS], dev);
      const minRate = Math.max(ctx.input.cautionSettings.minResidualClimbRate_m_s, 1e-3);
      const minBuffet = Math.max(ctx.input.cautionSettings.minBuffetLoadFactor, 1);
      extra.push({
        stop: 'step_climb_due',
        // When to step is a decision, not a state to hit: located to a second, not to 1e-7 s (STEP_DECISION_S).
        timeTolerance_s: STEP_DECISION_S,
        g: (y, s) => {
          const m = y[S_MASS];
          // Specific range here from the sample the integrator just evaluated (same thrust = drag point as
          // specificRangeAt, without solving it again); 0 where maxCruise cannot balance the drag.
          const srNow = s.drag_N > s.thrustAvailable_N || !(s.fuelFlow_kg_s > 0) ? 0 : s.tas_m_s / s.fuelFlow_kg_s;
          const machUp = machUpOf(m);
          const srUp = specificRangeAt(input, up, machUp, m, dev);
          const gain = srNow > 0 ? (srUp - srNow) / srNow : srUp > 0 ? 1 : -1;
          const rateMargin = (heldMachClimbRate(input, up, machUp, m, dev) - minRate) / minRate;
          // The higher level must keep the buffet margin too (the cruise limits of cruiseLimitBroken).
          const buffet = airPoint(input, up, machUp, m, dev).drag.buffetLoadFactor;
          const buffetMargin = (buffet - minBuffet) / minBuffet;
          return Math.min(gain, rateMargin, buffetMargin);
        },
      });
    }
    const run = flySegment(
      ctx,
      target,
      makeLevelSegment(ctx, target, {
        altitudeOf: () => h,
        algebraicAltitude: false,
        machOf: (_alt, m) => machHere(m),
        ceiling: 'maxCruise',
        step_s,
        endDistance_m: endAir,
        endTime_s: null,
        extraEvents: extra,
      }),
      state,
    );
    state = run.end;
    last = run.endSample;
    state[S_TAS] = last.tas_m_s;
    if (run.stop === 'distance_reached') {
      setEndDistance(state, k, endAt(state[S_MASS]));
      return legOk(state, last);
    }
    if (run.stop !== 'step_climb_due' || profile.kind !== 'stepClimb') return failed(ctx, target, state, run, last);
    const up = h + profile.step_m;
    const climbMach = last.mach;
    // The leg's end stops a step climb too (top of descent reached while climbing), so the distance flown,
    // and with it the fuel-iteration residual, stays a continuous function of the mass.
    const climb = climbWithinLeg(ctx, target, state, climbMach, up, k, endAt, (h) => msg`The step climb on ${target.legName} stalled at ${q(h, 'altitude')}.`);
    state = climb.state;
    last = climb.last;
    if (climb.outcome !== null) return climb.outcome;
    state[S_ALT] = up;
    if (state[k] >= endAt(state[S_MASS])) return legOk(state, last);
  }
  return legFailed(state, 'infeasible', `Too many step climbs on ${target.legName}.`, last);
}
