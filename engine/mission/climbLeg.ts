/**
 * Climb at a rating along a CAS/Mach speed schedule by the energy method:
 * dHp/dt = (T_isa/T) (Thr - D) V / (m g0) f, with the energy share factor f
 * for held CAS or Mach (energyShareFactor.ts), distance at V cos(gamma), and
 * the level speed change at the low-altitude limit. Lift = weight (n = 1),
 * common practice for the energy method.
 */
import { sameNumber } from '../core/sameNumber';
import type { InstalledPoint, RatingName } from '../propulsion/propulsionModel';
import type { SpeedSchedule } from './missionTypes';
import { pressureAltitudeRate } from './energyShareFactor';
import { dragForceAt, dragSampleAt, fuelExhaustedEvents, packSampleInto, writePathDerivative } from './flightPoint';
import { flyMonotoneSegment, missionDomain } from './flySegment';
import { BASE_ALTITUDE_STEP, pathBreakAltitudes } from './stepBreaks';
import { legFailed, legOk, segmentStopFailure, type LegOutcome } from './legOutcome';
import { flyLevelSpeedChange } from './levelSpeedChange';
import { segmentBuffers } from './segmentBuffers';
import { BASE_STEP_S, type LegTarget, type MissionContext } from './missionContext';
import { LAPSE_JUMPS_M, type MissionAir } from './missionAtmosphere';
import { S_ALT, S_MASS, S_TAS, type Evaluation, type FlightSample, type Segment, type SegmentEvent, type StateVector } from './missionState';
import { schedulePhases } from './speedSchedule';
import { stageTrack } from './stageMemo';
import { msg, q } from '../units/messageParts';
import { FOOT_M } from '../units/unitTable';

/** Climb rate (m/s) below which a climb counts as stalled: 100 ft/min, the service-ceiling rate (common practice). */
export const CLIMB_STALL_RATE_M_S = (100 * FOOT_M) / 60;

/** A held-CAS or held-Mach climb segment at a rating to `toAltitude_m`. */
export function makeClimbSegment(
  ctx: MissionContext,
  target: LegTarget,
  held: 'cas' | 'mach',
  value: number,
  toAltitude_m: number,
  rating: RatingName,
): Segment {
  const input = ctx.input;
  const dev = target.env.isaDev_K;
  // What depends on the altitude alone (air data, Mach, rated thrust, energy share factor): kept per altitude on the
  // model (stageMemo.ts), and the last altitude's here, since an RK4 step evaluates its two middle stages at one
  // altitude and its last stage and accepted point at another (pure functions of it: no answer can change).
  const track = stageTrack(input.propulsion, held, value, dev, rating);
  let cached = false;
  let cachedAltitude_m = 0;
  let air: MissionAir | null = null;
  let mach = 0;
  let th: InstalledPoint | null = null;
  let f = 1;
  const prepare = (h: number): void => {
    if (!cached || !sameNumber(h, cachedAltitude_m)) {
      const stage = track.at(h);
      air = stage.air;
      mach = stage.mach;
      th = stage.engine;
      f = stage.factor;
      cachedAltitude_m = h;
      cached = true;
    }
  };
  // Accepted points write their drag into one record (no air point or breakdown objects: the same bits as airPointIn)
  // and their derivative and sample into one buffer and one record (Segment.evaluate).
  const { drag, rates, stage, point } = segmentBuffers(ctx);
  const evaluate: Segment['evaluate'] = (y) => {
    const h = y[S_ALT];
    prepare(h);
    dragSampleAt(input, h, mach, y[S_MASS], drag);
    const tas_m_s = mach * air!.speedOfSound_m_s;
    const rate = pressureAltitudeRate(th!.thrust_N, drag.drag_N, tas_m_s, y[S_MASS], f, air!.temperature_K, air!.isaTemperature_K);
    const d = writePathDerivative(rates, rate, tas_m_s, air!, target.env.wind_m_s, th!.fuelFlow_kg_s);
    return { derivative: d, sample: packSampleInto(point, h, mach, air!, tas_m_s, drag, th!.thrust_N, th!.thrust_N, th!.fuelFlow_kg_s, rate, th!) };
  };
  // RK4 stages need no sample, so no air point object either: the same drag query and TAS (M a) as airPointIn,
  // written into one buffer the stages share (Segment.derivative).
  const derivative = (y: StateVector): Evaluation['derivative'] => {
    const h = y[S_ALT];
    const m = y[S_MASS];
    prepare(h);
    const drag_N = dragForceAt(input, h, mach, m);
    const tas_m_s = mach * air!.speedOfSound_m_s;
    const rate = pressureAltitudeRate(th!.thrust_N, drag_N, tas_m_s, m, f, air!.temperature_K, air!.isaTemperature_K);
    return writePathDerivative(stage, rate, tas_m_s, air!, target.env.wind_m_s, th!.fuelFlow_kg_s);
  };
  const events: SegmentEvent[] = [
    { stop: 'altitude_reached', stateOnly: true, g: (y) => y[S_ALT] - toAltitude_m },
    { stop: 'climb_stalled', g: (_y, s) => CLIMB_STALL_RATE_M_S - s.climbRate_m_s },
  ];
  events.push(...fuelExhaustedEvents(ctx));
  return { step_s: BASE_STEP_S.climb * ctx.options.stepScale, evaluate, derivative, events };
}

/** Flies a whole climb from the current altitude to `toAltitude_m` along `schedule` at `rating`. */
export function flyClimb(
  ctx: MissionContext,
  target: LegTarget,
  start: StateVector,
  toAltitude_m: number,
  schedule: SpeedSchedule,
  rating: RatingName,
): LegOutcome {
  let state = start.slice();
  let last: FlightSample | null = null;
  if (toAltitude_m <= state[S_ALT]) return legOk(state, null);
  for (const phase of schedulePhases(schedule, state[S_ALT], toAltitude_m)) {
    if (phase.kind === 'speedChange') {
      const out = flyLevelSpeedChange(ctx, target, state, phase.toMach, rating);
      if (out.status !== 'ok') return out;
      state = out.state;
      last = out.lastSample ?? last;
      continue;
    }
    const run = flyMonotoneSegment(ctx, target, makeClimbSegment(ctx, target, phase.held, phase.value, phase.to_m, rating), state, {
      component: S_ALT,
      to: phase.to_m,
      breaks: pathBreakAltitudes(ctx.input, phase.held, phase.value, state[S_ALT], phase.to_m),
      maxStep: BASE_ALTITUDE_STEP.altitude_m * ctx.options.stepScale,
      maxStepTime_s: BASE_ALTITUDE_STEP.time_s * ctx.options.stepScale,
      minRate: CLIMB_STALL_RATE_M_S,
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
    if (run.stop === 'climb_stalled') {
      return legFailed(
        state,
        'climb_not_reached',
        msg`The climb on ${target.legName} stalled at ${q(state[S_ALT], 'altitude')}, below its ${q(toAltitude_m, 'altitude')} target.`,
        last,
      );
    }
    return segmentStopFailure(state, run, `the climb on ${target.legName}`, missionDomain(ctx, target), last);
  }
  return legOk(state, last);
}
