/**
 * Descent along a CAS/Mach speed schedule to a pressure altitude: at idle
 * (flightIdle rating, rate from the energy equation with the energy share
 * factor) or at a set rate (thrust from the energy equation solved for
 * thrust, then the part-power setting giving it). The level deceleration at
 * the low-altitude speed limit is flown at idle. Energy method as in
 * climbLeg.ts (BADA 3 User Manual total-energy model, from memory).
 */
import { sameNumber } from '../core/sameNumber';
import type { InstalledPoint } from '../propulsion/propulsionModel';
import type { SpeedSchedule } from './missionTypes';
import { pressureAltitudeRate } from './energyShareFactor';
import { dragForceAt, dragSampleAt, fuelExhaustedEvents, packSampleInto, writePathDerivative } from './flightPoint';
import { flyMonotoneSegment, missionDomain } from './flySegment';
import { BASE_ALTITUDE_STEP, pathBreakAltitudes } from './stepBreaks';
import { legFailed, legOk, segmentStopFailure, type LegOutcome } from './legOutcome';
import { flyLevelSpeedChange } from './levelSpeedChange';
import { segmentBuffers } from './segmentBuffers';
import { BASE_STEP_S, type LegTarget, type MissionContext } from './missionContext';
import { G0_M_S2, LAPSE_JUMPS_M, missionAir, type MissionAir } from './missionAtmosphere';
import { S_ALT, S_MASS, S_TAS, type Evaluation, type FlightSample, type Segment, type SegmentEvent, type StateVector } from './missionState';
import { schedulePhases } from './speedSchedule';
import { stageTrack } from './stageMemo';
import { appendCaution } from './timeHistoryBuilder';
import { CAUTION_CATALOGUE } from '../cautions/cautionCatalogue';
import { msg, q, withParts } from '../units/messageParts';

export type DescentMode = { readonly kind: 'idle' } | { readonly kind: 'rate'; readonly rate_m_s: number };

/** Least descent rate (m/s) for stepping a descent in altitude; slower descents go to the time integrator. */
const MONOTONE_DESCENT_RATE_M_S = 0.5;

/** Least descent rate (m/s) that counts as progress at idle. */
export const DESCENT_STALL_RATE_M_S = 0.05;

function makeDescentSegment(
  ctx: MissionContext,
  target: LegTarget,
  held: 'cas' | 'mach',
  value: number,
  toAltitude_m: number,
  mode: DescentMode,
  onBelowIdle: (time_s: number, thrustRequired_N: number, idle_N: number) => void,
): Segment {
  const input = ctx.input;
  const dev = target.env.isaDev_K;
  // What depends on the altitude alone (air data, Mach, energy share factor, idle thrust): kept per altitude on the
  // model (stageMemo.ts), and the last altitude's here, since an RK4 step evaluates its two middle stages at one
  // altitude and its last stage and accepted point at another (pure functions of it: no answer can change).
  const track = stageTrack(input.propulsion, held, value, dev, mode.kind === 'idle' ? 'flightIdle' : null);
  let cached = false;
  let cachedAltitude_m = 0;
  let cachedAir: MissionAir | null = null;
  let cachedMach = 0;
  let cachedFactor = 1;
  let cachedIdle: InstalledPoint | null = null;
  const prepare = (h: number): void => {
    if (!cached || !sameNumber(h, cachedAltitude_m)) {
      const stage = track.at(h);
      cachedAir = stage.air;
      cachedMach = stage.mach;
      cachedFactor = stage.factor;
      cachedIdle = stage.engine;
      cachedAltitude_m = h;
      cached = true;
    }
  };
  // The drag of a point, written into one record (no air point or breakdown objects: the same bits as airPointIn),
  // and an accepted point's derivative and sample into one buffer and one record (Segment.evaluate).
  const { drag, rates, stage, point } = segmentBuffers(ctx);
  const pointOf = (y: StateVector, withSample: boolean, d: Float64Array<ArrayBuffer>) => {
    const h = y[S_ALT];
    const m = y[S_MASS];
    prepare(h);
    const air = cachedAir!;
    const mach = cachedMach;
    dragSampleAt(input, h, mach, m, drag);
    const tas_m_s = mach * air.speedOfSound_m_s;
    const f = cachedFactor;
    let rate: number;
    let thrust: number;
    let engine;
    let thrustAvailable: number;
    if (mode.kind === 'idle') {
      engine = cachedIdle!;
      thrust = engine.thrust_N;
      thrustAvailable = thrust;
      rate = pressureAltitudeRate(thrust, drag.drag_N, tas_m_s, m, f, air.temperature_K, air.isaTemperature_K);
    } else {
      rate = -Math.abs(mode.rate_m_s);
      const denominator = tas_m_s * f;
      const required = denominator > 0 ? drag.drag_N + (m * G0_M_S2 * (air.temperature_K / air.isaTemperature_K) * rate) / denominator : drag.drag_N;
      const condition = { altitude_m: h, mach, isaDev_K: dev };
      engine = input.propulsion.forThrust(condition, required, 'maxClimb');
      thrust = engine.thrust_N;
      // Thrust available is only for the sample (the RK4 stages skip it).
      thrustAvailable = withSample ? input.propulsion.atRating(condition, 'maxClimb').thrust_N : Number.NaN;
      if (engine.limit === 'below_idle') onBelowIdle(y[0], required, engine.thrust_N);
    }
    writePathDerivative(d, rate, tas_m_s, air, target.env.wind_m_s, engine.fuelFlow_kg_s);
    return withSample ? packSampleInto(point, h, mach, air, tas_m_s, drag, thrustAvailable, thrust, engine.fuelFlow_kg_s, rate, engine) : null;
  };
  const evaluate: Segment['evaluate'] = (y) => ({ derivative: rates, sample: pointOf(y, true, rates)! });
  // An idle RK4 stage (no sample): the same drag query, TAS (M a) and rate as pointOf, without its objects, written
  // into one buffer the stages share (Segment.derivative).
  const idleStage = (y: StateVector): Evaluation['derivative'] => {
    const h = y[S_ALT];
    const m = y[S_MASS];
    prepare(h);
    const air = cachedAir!;
    const drag_N = dragForceAt(input, h, cachedMach, m);
    const tas_m_s = cachedMach * air.speedOfSound_m_s;
    const engine = cachedIdle!;
    const rate = pressureAltitudeRate(engine.thrust_N, drag_N, tas_m_s, m, cachedFactor, air.temperature_K, air.isaTemperature_K);
    return writePathDerivative(stage, rate, tas_m_s, air, target.env.wind_m_s, engine.fuelFlow_kg_s);
  };
  // RK4 stages need no sample.
  const derivative = (y: StateVector): Evaluation['derivative'] => {
    if (mode.kind === 'idle') return idleStage(y);
    pointOf(y, false, stage);
    return stage;
  };

  const events: SegmentEvent[] = [
    { stop: 'altitude_reached', stateOnly: true, g: (y) => toAltitude_m - y[S_ALT] },
    { stop: 'descent_stalled', g: (_y, s) => s.climbRate_m_s + DESCENT_STALL_RATE_M_S },
  ];
  events.push(...fuelExhaustedEvents(ctx));
  return { step_s: BASE_STEP_S.descent * ctx.options.stepScale, evaluate, derivative, events };
}

/** Flies a whole descent from the current altitude to `toAltitude_m`. */
export function flyDescent(
  ctx: MissionContext,
  target: LegTarget,
  start: StateVector,
  toAltitude_m: number,
  schedule: SpeedSchedule,
  mode: DescentMode,
): LegOutcome {
  let state = start.slice();
  let last: FlightSample | null = null;
  if (toAltitude_m >= state[S_ALT]) return legOk(state, null);
  let belowIdle: { time_s: number; required: number; idle: number } | null = null;
  const onBelowIdle = (time_s: number, required: number, idle: number) => {
    if (belowIdle === null) belowIdle = { time_s, required, idle };
  };
  for (const phase of schedulePhases(schedule, state[S_ALT], toAltitude_m)) {
    if (phase.kind === 'speedChange') {
      if (state[S_TAS] <= 0) state[S_TAS] = phase.fromMach * missionAir(state[S_ALT], target.env.isaDev_K).speedOfSound_m_s;
      const out = flyLevelSpeedChange(ctx, target, state, phase.toMach, 'flightIdle');
      if (out.status !== 'ok') return out;
      state = out.state;
      last = out.lastSample ?? last;
      continue;
    }
    const run = flyMonotoneSegment(ctx, target, makeDescentSegment(ctx, target, phase.held, phase.value, phase.to_m, mode, onBelowIdle), state, {
      component: S_ALT,
      to: phase.to_m,
      breaks: pathBreakAltitudes(ctx.input, phase.held, phase.value, state[S_ALT], phase.to_m),
      maxStep: BASE_ALTITUDE_STEP.altitude_m * ctx.options.stepScale,
      maxStepTime_s: BASE_ALTITUDE_STEP.time_s * ctx.options.stepScale,
      minRate: MONOTONE_DESCENT_RATE_M_S,
      targetStop: 'altitude_reached',
      jumps: LAPSE_JUMPS_M,
    });
    state = run.end;
    last = run.endSample;
    state[S_TAS] = run.endSample.tas_m_s;
    if (run.stop === 'altitude_reached') {
      state[S_ALT] = phase.to_m;
      continue;
    }
    if (run.stop === 'descent_stalled') {
      return legFailed(state, 'infeasible', msg`Idle thrust exceeds drag: the descent on ${target.legName} cannot continue below ${q(state[S_ALT], 'altitude')}.`, last);
    }
    return segmentStopFailure(state, run, `the descent on ${target.legName}`, missionDomain(ctx, target), last);
  }
  const found = belowIdle as { time_s: number; required: number; idle: number } | null;
  if (found !== null) {
    appendCaution(
      ctx.log,
      target,
      {
        id: 'descent_thrust_below_idle',
        severity: CAUTION_CATALOGUE.descent_thrust_below_idle.severity,
        ...withParts(msg`The set descent rate on ${target.legName} needs ${q(found.required, 'force')}, below idle thrust ${q(found.idle, 'force')}; idle fuel flow used.`),
        value: found.required,
        threshold: found.idle,
      },
      found.time_s,
    );
  }
  return legOk(state, last);
}
