/** Integrates one segment of a leg into the flight log, inside the mission's domain: in time, or along a monotone component (altitude, speed). */
import { integrateSegment, type SegmentRun, type StateDomain } from './integrator';
import type { MissionContext, LegTarget } from './missionContext';
import { MAX_ALTITUDE_M, MIN_ALTITUDE_M } from './missionInputCheck';
import { integrateMonotone, type MonotonePlan } from './monotoneStepper';
import type { Segment, StateVector } from './missionState';
import { appendSample } from './timeHistoryBuilder';

/**
 * Mass (kg), as a fraction of zero-fuel mass, below which a state is outside the domain: the fuel iteration lets a
 * pass burn more than it carries, but not without bound (the polar needs a positive weight).
 */
export const MASS_FLOOR_FRACTION = 0.05;
/** Highest TAS (m/s) the mission evaluates: about Mach 5 in the stratosphere, the schema's highest Mach. */
export const MAX_TAS_M_S = 1500;

/** Leg kinds that must advance over the ground (a hold circles; allowances stand still). */
const EN_ROUTE = new Set(['climb', 'cruise', 'descent']);

/**
 * The states a leg may reach: the solver's pressure altitudes (missionInputCheck.ts), a mass above
 * MASS_FLOOR_FRACTION of zero-fuel mass, TAS from 0 to MAX_TAS_M_S; trip legs that travel must have a
 * positive ground speed.
 */
export function missionDomain(ctx: MissionContext, target: LegTarget): StateDomain {
  const leg = target.recordHistory ? ctx.input.legs[target.legIndex] : undefined;
  return {
    minAltitude_m: MIN_ALTITUDE_M,
    maxAltitude_m: MAX_ALTITUDE_M,
    minMass_kg: MASS_FLOOR_FRACTION * ctx.zeroFuelMass_kg,
    maxTas_m_s: MAX_TAS_M_S,
    requireGroundProgress: leg !== undefined && EN_ROUTE.has(leg.kind),
    wind_m_s: target.env.wind_m_s,
  };
}

/** Integrates `segment` from `start`, writing every accepted point to the context's flight log for `target`. */
export function flySegment(ctx: MissionContext, target: LegTarget, segment: Segment, start: StateVector): SegmentRun {
  return integrateSegment(segment, start, (state, sample) => appendSample(ctx.log, target, state, sample), missionDomain(ctx, target));
}

/** Integrates `segment` from `start` along a monotone component (monotoneStepper.ts), writing every accepted point to the flight log. */
export function flyMonotoneSegment(ctx: MissionContext, target: LegTarget, segment: Segment, start: StateVector, plan: MonotonePlan): SegmentRun {
  // The solve's shared stage scratch where the context has one (segmentBuffers.ts), else the run's own.
  return integrateMonotone(segment, start, (state, sample) => appendSample(ctx.log, target, state, sample), plan, missionDomain(ctx, target), ctx.buffers?.monotone);
}
