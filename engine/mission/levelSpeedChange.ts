/**
 * Level acceleration or deceleration at constant pressure altitude between two
 * Mach numbers (the speed change at the low-altitude speed limit): TAS is a
 * state, dV/dt = (Thr - D)/m at the given rating (point-mass equation, any
 * performance text, e.g. Anderson, Aircraft Performance and Design, ch. 6).
 */
import type { RatingName } from '../propulsion/propulsionModel';
import { dragForceAt, dragSampleAt, fuelExhaustedEvents, packSampleInto } from './flightPoint';
import { flyMonotoneSegment, missionDomain } from './flySegment';
import { speedBreaks } from './stepBreaks';
import { legFailed, legOk, segmentStopFailure, type LegOutcome } from './legOutcome';
import { segmentBuffers } from './segmentBuffers';
import { BASE_MONOTONE_STEP, BASE_STEP_S, type LegTarget, type MissionContext } from './missionContext';
import { missionAir } from './missionAtmosphere';
import { S_ALT, S_MASS, S_TAS, type Evaluation, type Segment, type SegmentEvent, type StateVector } from './missionState';
import { msg, q } from '../units/messageParts';

/** Least acceleration (m/s^2) for stepping a speed change in TAS; a slower change goes to the time integrator. */
const MONOTONE_SPEED_CHANGE_M_S2 = 0.05;

/** Least acceleration (m/s^2) that counts as progress; below it the speed change is abandoned. */
export const MIN_SPEED_CHANGE_M_S2 = 0.01;

/** Flies a level speed change at the current altitude to Mach `toMach` (-) at `rating`. */
export function flyLevelSpeedChange(
  ctx: MissionContext,
  target: LegTarget,
  start: StateVector,
  toMach: number,
  rating: RatingName,
): LegOutcome {
  const input = ctx.input;
  const dev = target.env.isaDev_K;
  const altitude_m = start[S_ALT];
  const a = missionAir(altitude_m, dev).speedOfSound_m_s;
  const vTarget = toMach * a;
  const direction = vTarget >= start[S_TAS] ? 1 : -1;
  const derivativeInto = (d: Float64Array<ArrayBuffer>, tas_m_s: number, mass_kg: number, thrust_N: number, fuelFlow_kg_s: number, drag_N: number): Evaluation['derivative'] => {
    d[0] = 1;
    d[1] = tas_m_s;
    d[2] = tas_m_s + target.env.wind_m_s;
    d[S_ALT] = 0;
    d[S_MASS] = -fuelFlow_kg_s;
    d[S_TAS] = mass_kg > 0 ? (thrust_N - drag_N) / mass_kg : 0;
    return d;
  };
  // Accepted points write their drag into one record (no air point or breakdown objects: the same bits as airPoint)
  // and their derivative and sample into one buffer and one record (Segment.evaluate).
  const air = missionAir(altitude_m, dev);
  const { drag, rates, stage, point } = segmentBuffers(ctx);
  const evaluate: Segment['evaluate'] = (y) => {
    const m = y[S_MASS];
    const mach = Math.max(y[S_TAS], 0) / a;
    dragSampleAt(input, altitude_m, mach, m, drag);
    const tas_m_s = mach * air.speedOfSound_m_s;
    const th = input.propulsion.atRating({ altitude_m, mach, isaDev_K: dev }, rating);
    const d = derivativeInto(rates, tas_m_s, m, th.thrust_N, th.fuelFlow_kg_s, drag.drag_N);
    return { derivative: d, sample: packSampleInto(point, altitude_m, mach, air, tas_m_s, drag, th.thrust_N, th.thrust_N, th.fuelFlow_kg_s, 0, th) };
  };
  // RK4 stages need no sample, so no air point or drag breakdown: the same drag force and rated point as pointOf,
  // written into one buffer the stages share (Segment.derivative).
  const derivative = (y: StateVector): Evaluation['derivative'] => {
    const m = y[S_MASS];
    const mach = Math.max(y[S_TAS], 0) / a;
    const tas_m_s = mach * a;
    const th = input.propulsion.atRating({ altitude_m, mach, isaDev_K: dev }, rating);
    return derivativeInto(stage, tas_m_s, m, th.thrust_N, th.fuelFlow_kg_s, m > 0 ? dragForceAt(input, altitude_m, mach, m) : 0);
  };
  const events: SegmentEvent[] = [
    { stop: 'speed_reached', stateOnly: true, g: (y) => direction * (y[S_TAS] - vTarget) },
    {
      stop: 'climb_stalled',
      g: (y, s) => MIN_SPEED_CHANGE_M_S2 - (direction * (s.thrustUsed_N - s.drag_N)) / Math.max(y[S_MASS], 1),
    },
  ];
  events.push(...fuelExhaustedEvents(ctx));
  const startState = start.slice();
  startState[S_TAS] = start[S_TAS] > 0 ? start[S_TAS] : vTarget;
  if (Math.abs(startState[S_TAS] - vTarget) < 1e-9) return legOk(startState, null);
  const run = flyMonotoneSegment(ctx, target, { step_s: BASE_STEP_S.speedChange * ctx.options.stepScale, evaluate, derivative, events }, startState, {
    component: S_TAS,
    to: vTarget,
    breaks: speedBreaks(input, a, startState[S_TAS], vTarget),
    maxStep: BASE_MONOTONE_STEP.speed_m_s * ctx.options.stepScale,
    minRate: MONOTONE_SPEED_CHANGE_M_S2,
    targetStop: 'speed_reached',
    // Nothing jumps along the speed at one altitude (the polar and deck are continuous in Mach).
    jumps: [],
  });
  if (run.stop === 'speed_reached') {
    run.end[S_TAS] = vTarget;
    return legOk(run.end, run.endSample);
  }
  if (run.stop === 'climb_stalled') {
    return legFailed(
      run.end,
      direction > 0 ? 'climb_not_reached' : 'infeasible',
      msg`${direction > 0 ? 'Thrust' : 'Idle drag'} cannot change the speed to Mach ${q(toMach, 'mach')} at ${q(altitude_m, 'altitude')} on ${target.legName}.`,
      run.endSample,
    );
  }
  return segmentStopFailure(run.end, run, `the speed change on ${target.legName}`, missionDomain(ctx, target), run.endSample);
}
