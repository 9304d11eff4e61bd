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

/** Right-hand side at a stage point: the segment's sample-free derivative when it has one. */
function stageDerivative(segment: Segment, y: StateVector): Float64Array {
  return segment.derivative !== undefined ? segment.derivative(y) : segment.evaluate(y).derivative;
}

function rk4Step(segment: Segment, y: StateVector, k1: Float64Array, h: number): StateVector {
  const tmp = new Float64Array(STATE_SIZE);
  for (let i = 0; i < STATE_SIZE; i++) tmp[i] = y[i] + 0.5 * h * k1[i];
  const k2 = stageDerivative(segment, tmp);
  for (let i = 0; i < STATE_SIZE; i++) tmp[i] = y[i] + 0.5 * h * k2[i];
  const k3 = stageDerivative(segment, tmp);
  for (let i = 0; i < STATE_SIZE; i++) tmp[i] = y[i] + h * k3[i];
  const k4 = stageDerivative(segment, tmp);
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

/** Cubic Hermite interpolant of the state at fraction theta of a step (dense output of order 3; Hairer, Norsett & Wanner, II.6). */
function hermite(y0: StateVector, f0: Float64Array, y1: StateVector, f1: Float64Array, h: number, theta: number): StateVector {
  const t2 = theta * theta;
  const t3 = t2 * theta;
  const h00 = 2 * t3 - 3 * t2 + 1;
  const h10 = t3 - 2 * t2 + theta;
  const h01 = -2 * t3 + 3 * t2;
  const h11 = t3 - t2;
  const out = new Float64Array(STATE_SIZE);
  for (let i = 0; i < STATE_SIZE; i++) out[i] = h00 * y0[i] + h10 * h * f0[i] + h01 * y1[i] + h11 * h * f1[i];
  return out;
}

/**
 * Step length tau in (0, h] where event `index` first reaches zero, by the
 * Illinois method: on the step's Hermite interpolant for state-only events
 * (no extra evaluations), else on RK4 steps of length tau from the step start.
 */
function locateEvent(
  segment: Segment,
  y: StateVector,
  k1: Float64Array,
  h: number,
  index: number,
  gStart: number,
  end: Evaluation & { readonly state: StateVector },
): number {
  const event = segment.events[index];
  const onStep = (tau: number) => {
    const yt = rk4Step(segment, y, k1, tau);
    return event.g(yt, segment.evaluate(yt).sample);
  };
  if (event.stateOnly) {
    // A state-only event ignores the sample: no evaluation at the trial point (a quarter of each trial's cost).
    const onStepState = (tau: number) => event.g(rk4Step(segment, y, k1, tau), end.sample);
    const guess = illinois((tau) => event.g(hermite(y, k1, end.state, end.derivative, h, tau / h), end.sample), gStart, h, 0);
    return refineOnStep(onStepState, guess, gStart, event.g(end.state, end.sample), h);
  }
  return illinois(onStep, gStart, h, 0, event.timeTolerance_s ?? 0);
}

/**
 * Secant refinement of an interpolated event time on the true RK4 step (the
 * interpolant is only third order and the model may change at the event, e.g.
 * at the tropopause); falls back to the Illinois method when it strays.
 */
function refineOnStep(onStep: (tau: number) => number, guess: number, gStart: number, gEnd: number, h: number): number {
  const scale = 1e-9 * Math.abs(gEnd - gStart);
  let x0 = guess;
  let g0 = onStep(x0);
  let x1 = h;
  let g1 = gEnd;
  for (let i = 0; i < 6; i++) {
    if (Math.abs(g0) <= scale || Math.abs(x1 - x0) <= 1e-10 * h) return x0;
    const next = x0 - (g0 * (x0 - x1)) / (g0 - g1);
    if (!(next > 0 && next <= h) || !Number.isFinite(next)) break;
    x1 = x0;
    g1 = g0;
    x0 = next;
    g0 = onStep(x0);
  }
  if (Math.abs(x1 - x0) <= 1e-10 * h) return x0;
  return illinois(onStep, gStart, h, 0);
}

/**
 * Illinois method for the first zero of `at` on (lo, h] with at(lo) = gLo < 0, to a bracket of 1e-10 h or
 * `tolerance` (s) if larger; returns the bracket end where g >= 0.
 */
function illinois(at: (tau: number) => number, gLo: number, h: number, lo: number, tolerance = 0): number {
  const width = Math.max(1e-10 * h, tolerance);
  let a = lo;
  let ga = gLo;
  let b = h;
  let gb = at(b);
  let side = 0;
  for (let iter = 0; iter < 80 && b - a > width; iter++) {
    let c = b - (gb * (b - a)) / (gb - ga);
    if (!(c > a && c < b)) c = 0.5 * (a + b);
    const gc = at(c);
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
        const tau = locateEvent(segment, current, ev.derivative, h, i, gNow[i], { ...nextEv, state: next });
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
