import { STATE_SIZE, type FlightSample, type Segment, type StateVector } from '../../engine/mission/missionState';

/**
 * `segment` as a segment that writes every evaluation, and every RK4 stage, into one derivative buffer and one
 * sample record (the most Segment.evaluate allows): an integrator that reads an evaluation after the segment's next
 * call reads another point's numbers, so its run differs from the run on `segment` itself.
 */
export function reusingSegment(segment: Segment): Segment {
  const derivative = new Float64Array(STATE_SIZE);
  const sample = {} as FlightSample;
  return {
    ...segment,
    evaluate: (y) => {
      const ev = segment.evaluate(y);
      derivative.set(ev.derivative);
      Object.assign(sample, ev.sample);
      return { derivative, sample, ...(ev.breakCoordinate === undefined ? {} : { breakCoordinate: ev.breakCoordinate }) };
    },
    derivative: (y) => {
      derivative.set(segment.derivative !== undefined ? segment.derivative(y) : segment.evaluate(y).derivative);
      return derivative;
    },
  };
}

/** What a sink was handed, copied (the state and the sample are valid during the call only). */
export function recordingSink(): { readonly points: { state: number[]; sample: FlightSample }[]; sink: (state: StateVector, sample: FlightSample) => void } {
  const points: { state: number[]; sample: FlightSample }[] = [];
  return { points, sink: (state, sample) => points.push({ state: Array.from(state), sample: { ...sample } }) };
}
