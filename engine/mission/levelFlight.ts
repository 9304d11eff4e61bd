/**
 * Level (or cruise-climb) flight with thrust = drag: fuel flow from the
 * part-power point giving the drag, distance at TAS, ground distance at
 * TAS + wind; a set end distance is measured in the mission's distance basis. Used by cruise, hold and the reserve legs. The cruise-climb
 * variant takes its altitude algebraically from the mass and neglects the
 * slow climb's potential-energy term (flight-path angle about 1e-4 rad).
 */
import type { RatingName } from '../propulsion/propulsionModel';
import { dragForceAt, dragSampleAt, fuelExhaustedEvents, packSampleInto, partPowerFuelFlow } from './flightPoint';
import { missionAir } from './missionAtmosphere';
import { segmentBuffers } from './segmentBuffers';
import { distanceIndex, type LegTarget, type MissionContext } from './missionContext';
import { S_ALT, S_MASS, S_TAS, S_TIME, type Evaluation, type Segment, type SegmentEvent, type StateVector } from './missionState';

export interface LevelFlightSpec {
  /** Pressure altitude (m) as a function of mass (kg); constant for level flight. */
  readonly altitudeOf: (mass_kg: number) => number;
  readonly algebraicAltitude: boolean;
  /** Mach (-) at an altitude (m) and mass (kg). */
  readonly machOf: (altitude_m: number, mass_kg: number) => number;
  /** Highest rating the part-power search may use. */
  readonly ceiling: RatingName;
  readonly step_s: number;
  /**
   * Absolute distance (m) in the mission's distance basis (missionContext.ts distanceIndex: over the ground or
   * in still air), or that distance as a function of mass (kg), at which the segment ends; null = none.
   */
  readonly endDistance_m: number | ((mass_kg: number) => number) | null;
  readonly endTime_s: number | null;
  readonly extraEvents?: readonly SegmentEvent[];
}

/** A level (or cruise-climb) segment with thrust = drag, ending on the spec's distance or time, fuel exhaustion or thrust below drag. */
export function makeLevelSegment(ctx: MissionContext, target: LegTarget, spec: LevelFlightSpec): Segment {
  const input = ctx.input;
  const dev = target.env.isaDev_K;
  const derivativeInto = (d: Float64Array<ArrayBuffer>, tas_m_s: number, fuelFlow_kg_s: number): Evaluation['derivative'] => {
    d[0] = 1;
    d[1] = tas_m_s;
    d[2] = tas_m_s + target.env.wind_m_s;
    d[S_ALT] = 0;
    d[S_MASS] = -fuelFlow_kg_s;
    d[S_TAS] = 0;
    return d;
  };
  // Accepted points write their drag into one record (no air point or breakdown objects: the same bits as airPoint)
  // and their derivative and sample into one buffer and one record (Segment.evaluate).
  const { drag, rates, stage, point } = segmentBuffers(ctx);
  const evaluate: Segment['evaluate'] = (y) => {
    const m = y[S_MASS];
    const h = spec.altitudeOf(m);
    const mach = spec.machOf(h, m);
    const air = missionAir(h, dev);
    dragSampleAt(input, h, mach, m, drag);
    const tas_m_s = mach * air.speedOfSound_m_s;
    const condition = { altitude_m: h, mach, isaDev_K: dev };
    const engine = input.propulsion.forThrust(condition, drag.drag_N, spec.ceiling);
    const available = input.propulsion.atRating(condition, spec.ceiling).thrust_N;
    return {
      derivative: derivativeInto(rates, tas_m_s, engine.fuelFlow_kg_s),
      sample: packSampleInto(point, h, mach, air, tas_m_s, drag, available, engine.thrust_N, engine.fuelFlow_kg_s, 0, engine),
      breakCoordinate: engine.power,
    };
  };
  // RK4 stages need no sample, so no thrust-available query (a full rated-thrust lookup) and no sample object,
  // no air point or drag breakdown, and no part-power point either: the same air data, drag force and part-power
  // solve as evaluate, and its fuel flow alone (the same bits), written into one buffer the stages share.
  const derivative = (y: StateVector): Evaluation['derivative'] => {
    const m = y[S_MASS];
    const h = spec.altitudeOf(m);
    const mach = spec.machOf(h, m);
    const tas_m_s = mach * missionAir(h, dev).speedOfSound_m_s;
    return derivativeInto(stage, tas_m_s, partPowerFuelFlow(input, h, mach, dev, dragForceAt(input, h, mach, m), spec.ceiling));
  };
  const events: SegmentEvent[] = [{ stop: 'thrust_below_drag', g: (_y, s) => s.drag_N - s.thrustAvailable_N }];
  if (spec.endDistance_m !== null) {
    const end = spec.endDistance_m;
    const k = distanceIndex(input);
    events.push({ stop: 'distance_reached', stateOnly: true, g: (y) => y[k] - (typeof end === 'number' ? end : end(y[S_MASS])) });
  }
  if (spec.endTime_s !== null) {
    const end = spec.endTime_s;
    events.push({ stop: 'time_reached', stateOnly: true, g: (y) => y[S_TIME] - end });
  }
  events.push(...fuelExhaustedEvents(ctx));
  events.push(...(spec.extraEvents ?? []));
  // The deck's tabulated powers are slope breaks of the part-power fuel flow: the time steps end where the
  // setting crosses one (integrator.ts), instead of straddling it at first order.
  const powers = input.propulsion.slopeBreaks?.powers;
  // breakValues always written (undefined: none) so that level segments have one shape whether or not the model states
  // its powers (a wrapped model, adjustedPropulsion.ts, states none): two shapes made the integrator's reads polymorphic.
  return { step_s: spec.step_s, evaluate, derivative, events, algebraicAltitude: spec.algebraicAltitude, breakValues: powers };
}

