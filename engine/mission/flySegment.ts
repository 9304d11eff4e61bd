/** Integrates one segment of a leg into the flight log. */
import { integrateSegment, type SegmentRun } from './integrator';
import type { MissionContext, LegTarget } from './missionContext';
import type { Segment, StateVector } from './missionState';
import { appendSample } from './timeHistoryBuilder';

/** Integrates `segment` from `start`, writing every accepted point to the context's flight log for `target`. */
export function flySegment(ctx: MissionContext, target: LegTarget, segment: Segment, start: StateVector): SegmentRun {
  return integrateSegment(segment, start, (state, sample) => appendSample(ctx.log, target, state, sample));
}
