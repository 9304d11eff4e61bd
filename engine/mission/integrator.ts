/**
 * Fixed-step classical Runge-Kutta (RK4) integration of one flight segment,
 * stopped exactly at terminal events: when an event function changes sign
 * within a step, the step length to the event is found by the Illinois
 * (modified regula falsi) method on the RK4 step from the step's start, so the
 * leg ends on the event (altitude reached, distance reached, fuel exhausted,
 * thrust below drag...) to within a few parts in 1e10 of the step.
 *
 * Sources: RK4 - Hairer, Norsett & Wanner, Solving Ordinary Differential
 * Equations I, section II.1; Illinois method - Dowell & Jarratt (1971).
 */
import {
  S_ALT,
  STATE_SIZE,
  type Evaluation,
  type FlightSample,
  type Segment,
  type SegmentStop,
  type StateVector,
} from './missionState';

export interface SegmentRun {
  readonly end: StateVector;
  readonly endSample: FlightSample;
  readonly stop: SegmentStop;
}

/** Receives every accepted point (including the segment's first). */
export type SampleSink = (state: StateVector, sample: FlightSample) => void;

const MAX_STEPS = 20000;

function rk4Step(segment: Segment, y: StateVector, k1: Float64Array, h: number): StateVector {
  const tmp = new Float64Array(STATE_SIZE);
  for (let i = 0; i < STATE_SIZE; i++) tmp[i] = y[i] + 0.5 * h * k1[i];
  const k2 = segment.evaluate(tmp).derivative;
  for (let i = 0; i < STATE_SIZE; i++) tmp[i] = y[i] + 0.5 * h * k2[i];
  const k3 = segment.evaluate(tmp).derivative;
  for (let i = 0; i < STATE_SIZE; i++) tmp[i] = y[i] + h * k3[i];
  const k4 = segment.evaluate(tmp).derivative;
  const out = new Float64Array(STATE_SIZE);
  for (let i = 0; i < STATE_SIZE; i++) out[i] = y[i] + (h / 6) * (k1[i] + 2 * k2[i] + 2 * k3[i] + k4[i]);
  return out;
}

function finiteState(y: StateVector): boolean {
  for (let i = 0; i < STATE_SIZE; i++) if (!Number.isFinite(y[i])) return false;
  return true;
}

function accept(segment: Segment, y: StateVector): Evaluation {
  const ev = segment.evaluate(y);
  if (segment.algebraicAltitude) y[S_ALT] = ev.sample.altitude_m;
  return ev;
}

/** Step length tau in (0, h] where event `index` first reaches zero; Illinois method on tau. */
function locateEvent(segment: Segment, y: StateVector, k1: Float64Array, h: number, index: number, gStart: number): number {
  const event = segment.events[index];
  let a = 0;
  let ga = gStart;
  let b = h;
  const yb = rk4Step(segment, y, k1, b);
  let gb = event.g(yb, segment.evaluate(yb).sample);
  let side = 0;
  for (let iter = 0; iter < 80 && b - a > 1e-10 * h; iter++) {
    let c = b - (gb * (b - a)) / (gb - ga);
    if (!(c > a && c < b)) c = 0.5 * (a + b);
    const yc = rk4Step(segment, y, k1, c);
    const gc = event.g(yc, segment.evaluate(yc).sample);
    if (!Number.isFinite(gc)) break;
    if (gc >= 0) {
      b = c;
      gb = gc;
      if (side === 1) ga /= 2;
      side = 1;
    } else {
      a = c;
      ga = gc;
      if (side === -1) gb /= 2;
      side = -1;
    }
    if (gc === 0) break;
  }
  return b;
}

/**
 * Integrates `segment` from `start` (not modified) until a terminal event
 * fires, handing each accepted point to `sink`. Events already met at the
 * start stop the segment at once. Stops with 'numerical_failure' on a
 * non-finite state and 'step_limit' after 20,000 steps; never returns NaN
 * silently.
 */
export function integrateSegment(segment: Segment, start: StateVector, sink: SampleSink): SegmentRun {
  const y = Float64Array.from(start);
  let ev = accept(segment, y);
  if (!finiteState(y) || !finiteState(ev.derivative)) return { end: y, endSample: ev.sample, stop: 'numerical_failure' };
  sink(y, ev.sample);
  const gNow = segment.events.map((e) => e.g(y, ev.sample));
  for (let i = 0; i < gNow.length; i++) {
    if (gNow[i] >= 0) return { end: y, endSample: ev.sample, stop: segment.events[i].stop };
  }
  let current = y;
  for (let step = 0; step < MAX_STEPS; step++) {
    const h = segment.step_s;
    let next = rk4Step(segment, current, ev.derivative, h);
    let nextEv = accept(segment, next);
    if (!finiteState(next) || !finiteState(nextEv.derivative)) {
      return { end: current, endSample: ev.sample, stop: 'numerical_failure' };
    }
    let firstTau = Infinity;
    let firstIndex = -1;
    for (let i = 0; i < segment.events.length; i++) {
      const g = segment.events[i].g(next, nextEv.sample);
      if (g >= 0 || !Number.isFinite(g)) {
        const tau = locateEvent(segment, current, ev.derivative, h, i, gNow[i]);
        if (tau < firstTau) {
          firstTau = tau;
          firstIndex = i;
        }
      } else {
        gNow[i] = g;
      }
    }
    if (firstIndex >= 0) {
      if (firstTau < h) {
        next = rk4Step(segment, current, ev.derivative, firstTau);
        nextEv = accept(segment, next);
      }
      sink(next, nextEv.sample);
      return { end: next, endSample: nextEv.sample, stop: segment.events[firstIndex].stop };
    }
    sink(next, nextEv.sample);
    current = next;
    ev = nextEv;
  }
  return { end: current, endSample: ev.sample, stop: 'step_limit' };
}
