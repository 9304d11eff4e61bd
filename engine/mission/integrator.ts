/**
 * Fixed-step classical Runge-Kutta (RK4) integration of one flight segment,
 * stopped exactly at terminal events: when an event function changes sign
 * within a step, the step length to the event is found by the Illinois
 * (modified regula falsi) method on the RK4 step from the step's start, so the
 * leg ends on the event (altitude reached, distance reached, fuel exhausted,
 * thrust below drag...) to within a few parts in 1e10 of the step.
 *
 * The state never leaves the models' domain unannounced: a step whose end or
 * any RK4 stage falls outside `StateDomain` (altitude, mass, TAS) is halved,
 * down to 1/1024 of the segment's step; a state still outside then ends the
 * segment with 'left_domain' at the last state inside.
 *
 * Sources: RK4 - Hairer, Norsett & Wanner, Solving Ordinary Differential
 * Equations I, section II.1; Illinois method - Dowell & Jarratt (1971).
 */
import {
  S_ALT,
  S_GROUND,
  S_MASS,
  S_TAS,
  STATE_SIZE,
  type Evaluation,
  type FlightSample,
  type Segment,
  type SegmentStop,
  type StateVector,
} from './missionState';
import { copySampleInto, newSampleRecord, type SampleRecord } from './flightPoint';

export interface SegmentRun {
  readonly end: StateVector;
  /** The last sample (when the segment started outside its domain, nothing was evaluated: a blank sample at the start). */
  readonly endSample: FlightSample;
  readonly stop: SegmentStop;
  /** With stop 'left_domain': the bound the state would have passed. */
  readonly domainExit?: DomainExit;
}

/**
 * Receives every accepted point (including the segment's first); the state is the integrator's buffer and the sample
 * may be the segment's record (Segment.evaluate), both valid during the call only (copy what is kept).
 */
export type SampleSink = (state: StateVector, sample: FlightSample) => void;

const MAX_STEPS = 20000;
/** Smallest step tried when a full step leaves the domain, as a fraction of the segment's step. */
const MIN_STEP_FRACTION = 1 / 1024;

/** Where the models (atmosphere, polar, deck) are defined: every state the integrator evaluates lies inside. */
export interface StateDomain {
  readonly minAltitude_m: number;
  readonly maxAltitude_m: number;
  /** Mass (kg) at or below which the state is outside (the polar needs a positive weight). */
  readonly minMass_kg: number;
  /** Highest TAS (m/s) evaluated. */
  readonly maxTas_m_s: number;
  /** When true, an accepted point whose ground speed (d ground distance / dt) is <= 0 stops the segment ('no_ground_progress'). */
  readonly requireGroundProgress?: boolean;
  /** The leg's along-track wind (m/s, + tail), to say why the ground speed fell to zero. */
  readonly wind_m_s?: number;
}

/** A domain wide enough for any state; for callers that have their own limits. */
export const UNBOUNDED_DOMAIN: StateDomain = { minAltitude_m: -Infinity, maxAltitude_m: Infinity, minMass_kg: 0, maxTas_m_s: Infinity };

/** Which bound of the domain a state is past. */
export type DomainExit = 'not_finite' | 'altitude_low' | 'altitude_high' | 'mass_low' | 'tas_out_of_range';

/**
 * Whether any component of `y` is NaN or infinite: 0 x a finite value is (+/-)0 and so is a sum of them, while
 * 0 x NaN or 0 x Infinity is NaN (IEEE 754), so one sum replaces a Number.isFinite test per component.
 */
export function notFiniteState(y: StateVector): boolean {
  let zero = 0;
  for (let i = 0; i < STATE_SIZE; i++) zero += y[i]! * 0;
  return zero !== 0;
}

/** Whether `y` is not finite or outside `domain`: domainExit(domain, y) !== null, without naming the bound (hot loops). */
export function outsideDomain(domain: StateDomain, y: StateVector): boolean {
  if (notFiniteState(y)) return true;
  const h = y[S_ALT];
  const tas = y[S_TAS];
  return h < domain.minAltitude_m || h > domain.maxAltitude_m || !(y[S_MASS] > domain.minMass_kg) || tas < 0 || tas > domain.maxTas_m_s;
}

/** The bound `y` is past, or null when it is finite and inside `domain`. */
export function domainExit(domain: StateDomain, y: StateVector): DomainExit | null {
  if (notFiniteState(y)) return 'not_finite';
  const h = y[S_ALT];
  if (h < domain.minAltitude_m) return 'altitude_low';
  if (h > domain.maxAltitude_m) return 'altitude_high';
  if (!(y[S_MASS] > domain.minMass_kg)) return 'mass_low';
  if (y[S_TAS] < 0 || y[S_TAS] > domain.maxTas_m_s) return 'tas_out_of_range';
  return null;
}

/** Right-hand side at a stage point: the segment's sample-free derivative when it has one. */
function stageDerivative(segment: Segment, y: StateVector): Float64Array {
  return segment.derivative !== undefined ? segment.derivative(y) : segment.evaluate(y).derivative;
}

/** One RK4 step of length h, or the bound a stage or the end would pass (nothing is evaluated outside `domain`). */
function rk4Step(segment: Segment, domain: StateDomain, y: StateVector, k1: Float64Array, h: number): StateVector | DomainExit {
  const tmp = new Float64Array(STATE_SIZE);
  for (let i = 0; i < STATE_SIZE; i++) tmp[i] = y[i] + 0.5 * h * k1[i];
  const e2 = domainExit(domain, tmp);
  if (e2 !== null) return e2;
  // k1 + 2 k2 + 2 k3 summed as each stage arrives, in the same order (a stage's buffer may be the next one's).
  const sum = new Float64Array(STATE_SIZE);
  const k2 = stageDerivative(segment, tmp);
  for (let i = 0; i < STATE_SIZE; i++) {
    sum[i] = k1[i] + 2 * k2[i];
    tmp[i] = y[i] + 0.5 * h * k2[i];
  }
  const e3 = domainExit(domain, tmp);
  if (e3 !== null) return e3;
  const k3 = stageDerivative(segment, tmp);
  for (let i = 0; i < STATE_SIZE; i++) {
    sum[i] += 2 * k3[i];
    tmp[i] = y[i] + h * k3[i];
  }
  const e4 = domainExit(domain, tmp);
  if (e4 !== null) return e4;
  const k4 = stageDerivative(segment, tmp);
  const out = new Float64Array(STATE_SIZE);
  for (let i = 0; i < STATE_SIZE; i++) out[i] = y[i] + (h / 6) * (sum[i] + k4[i]);
  return domainExit(domain, out) ?? out;
}

/** A sample that was not evaluated (a start outside the domain): its altitude and TAS from the state where finite, every force 0. */
function blankSample(y: StateVector): FlightSample {
  const finite = (v: number) => (Number.isFinite(v) ? v : 0);
  return {
    altitude_m: finite(y[S_ALT]),
    mach: 0,
    cas_m_s: 0,
    tas_m_s: Math.max(finite(y[S_TAS]), 0),
    thrustAvailable_N: 0,
    thrustUsed_N: 0,
    drag_N: 0,
    fuelFlow_kg_s: 0,
    cl: 0,
    clMax: 0,
    buffetLoadFactor: 0,
    liftToDrag: 0,
    climbRate_m_s: 0,
    throatMach: null,
    idleAboveDrag: false,
    polarOutside: [],
    propulsionCautions: [],
  };
}

/**
 * A cut closer than this fraction of the step to either of its ends is not made: the straddle left is that short
 * (a predicted step end that missed its break by a little), and its error that small against a straddle mid-step.
 */
const MIN_BREAK_FRACTION = 0.01;

/** The break coordinate's slope against the mass (unit/kg) from evaluation `a` at state `ya` to `b` at `yb`, NaN when unknown. */
function coordinateSlope(a: Evaluation, ya: StateVector, b: Evaluation, yb: StateVector): number {
  const dm = yb[S_MASS] - ya[S_MASS];
  return a.breakCoordinate !== undefined && b.breakCoordinate !== undefined && dm !== 0 ? (b.breakCoordinate - a.breakCoordinate) / dm : Number.NaN;
}

/**
 * Time (s) from evaluation `ev` until its break coordinate reaches the first of the segment's `breakValues` it is
 * moving towards, Infinity when none: the coordinate taken as moving with the mass at `slope` (unit/kg) and the
 * mass at its present rate (the level segments' coordinate, the part-power setting, is a smooth function of the
 * mass between breaks: altitude and Mach are).
 */
function timeToBreak(segment: Segment, ev: Evaluation, slope: number): number {
  const values = segment.breakValues;
  const c0 = ev.breakCoordinate;
  const rate = slope * ev.derivative[S_MASS];
  if (values === undefined || c0 === undefined || !Number.isFinite(c0) || !Number.isFinite(rate) || rate === 0) return Infinity;
  let tau = Infinity;
  for (const v of values) {
    const t = (v - c0) / rate;
    if (t > 0 && t < tau) tau = t;
  }
  return tau;
}

/** The segment's step (s), or less where the break coordinate will cross a break sooner (timeToBreak): the step then ends there. */
function predictedStep(segment: Segment, ev: Evaluation, slope: number): number {
  const h = segment.step_s;
  const tau = timeToBreak(segment, ev, slope);
  return tau > MIN_BREAK_FRACTION * h && tau < (1 - MIN_BREAK_FRACTION) * h ? tau : h;
}

/**
 * Fraction in (0, 1) of the step of length `h` from evaluation `a` (state `ya`) to `b` (`yb`) at which the
 * segment's break coordinate crosses one of its `breakValues` (timeToBreak with the step's own slope against the
 * mass), or null when it crosses none, or one within MIN_BREAK_FRACTION of an end. Stepping across a slope break
 * costs RK4 its order there (an error of the step length times the break's distance from the step's end, common
 * practice for tables); the cut leaves only the prediction's miss.
 */
function breakFraction(segment: Segment, a: Evaluation, ya: StateVector, b: Evaluation, yb: StateVector, h: number): number | null {
  const values = segment.breakValues;
  const c0 = a.breakCoordinate;
  const c1 = b.breakCoordinate;
  if (values === undefined || c0 === undefined || c1 === undefined || !(c0 !== c1)) return null;
  const lo = Math.min(c0, c1);
  const hi = Math.max(c0, c1);
  if (!values.some((v) => v > lo && v < hi)) return null;
  const theta = timeToBreak(segment, a, coordinateSlope(a, ya, b, yb)) / h;
  return theta > MIN_BREAK_FRACTION && theta < 1 - MIN_BREAK_FRACTION ? theta : null;
}

function noGroundProgress(domain: StateDomain, ev: Evaluation): boolean {
  return domain.requireGroundProgress === true && !(ev.derivative[S_GROUND] > 0);
}

function accept(segment: Segment, y: StateVector): Evaluation {
  const ev = segment.evaluate(y);
  if (segment.algebraicAltitude) y[S_ALT] = ev.sample.altitude_m;
  return ev;
}

/**
 * An accepted point the time integrator keeps while it evaluates others: its own copies of the derivative and the
 * sample, since a segment may write every evaluation into one buffer and one record (Segment.evaluate).
 */
interface HeldPoint {
  readonly derivative: Float64Array<ArrayBuffer>;
  readonly sample: SampleRecord;
  breakCoordinate?: number;
}

function newHeldPoint(): HeldPoint {
  return { derivative: new Float64Array(STATE_SIZE), sample: newSampleRecord(), breakCoordinate: Number.NaN };
}

/** Copies evaluation `ev` into `held` (valid until `held` is written again) and returns `held`. */
function holdInto(held: HeldPoint, ev: Evaluation): HeldPoint {
  held.derivative.set(ev.derivative);
  copySampleInto(held.sample, ev.sample);
  held.breakCoordinate = ev.breakCoordinate;
  return held;
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
 * The RK4 steps tried from one step's start while its events are located, by length: the step to the event found
 * is then taken from here instead of being integrated again.
 */
type TrialSteps = Map<number, StateVector>;

/**
 * Step length tau in (0, h] where event `index` first reaches zero, by the
 * Illinois method: on the step's Hermite interpolant for state-only events
 * (no extra evaluations), else on RK4 steps of length tau from the step start.
 */
function locateEvent(
  segment: Segment,
  domain: StateDomain,
  y: StateVector,
  k1: Float64Array,
  h: number,
  index: number,
  gStart: number,
  end: Evaluation,
  endState: StateVector,
  trials: TrialSteps,
): number {
  const event = segment.events[index];
  // A trial step that leaves the domain reads as NaN: the root finders then keep the bracket they have.
  const trialStep = (tau: number) => {
    const yt = rk4Step(segment, domain, y, k1, tau);
    if (typeof yt !== 'string') trials.set(tau, yt);
    return yt;
  };
  const onStep = (tau: number) => {
    const yt = trialStep(tau);
    return typeof yt === 'string' ? Number.NaN : event.g(yt, segment.evaluate(yt).sample);
  };
  if (event.stateOnly) {
    // A state-only event ignores the sample: no evaluation at the trial point (a quarter of each trial's cost).
    const onStepState = (tau: number) => {
      const yt = trialStep(tau);
      return typeof yt === 'string' ? Number.NaN : event.g(yt, end.sample);
    };
    const guess = illinois((tau) => event.g(hermite(y, k1, endState, end.derivative, h, tau / h), end.sample), gStart, h, 0);
    return refineOnStep(onStepState, guess, gStart, event.g(endState, end.sample), h);
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

/** The longest step in [h MIN_STEP_FRACTION, h], halving from h, whose stages and end stay inside `domain`; else the bound the shortest passed. */
function stepInside(segment: Segment, domain: StateDomain, y: StateVector, k1: Float64Array, h: number): { readonly h: number; readonly next: StateVector } | DomainExit {
  let exit: DomainExit = 'not_finite';
  for (let trial = h; trial >= h * MIN_STEP_FRACTION; trial *= 0.5) {
    const next = rk4Step(segment, domain, y, k1, trial);
    if (typeof next !== 'string') return { h: trial, next };
    exit = next;
  }
  return exit;
}

/**
 * Integrates `segment` from `start` (not modified) until a terminal event
 * fires, handing each accepted point to `sink`. Events already met at the
 * start stop the segment at once. Stops with 'left_domain' when the state
 * would leave `domain` even on a step of 1/1024 of the segment's step (or
 * starts outside it), 'numerical_failure' on a non-finite state and
 * 'step_limit' after 20,000 steps; never returns NaN silently.
 */
export function integrateSegment(segment: Segment, start: StateVector, sink: SampleSink, domain: StateDomain = UNBOUNDED_DOMAIN): SegmentRun {
  const y = start.slice();
  const outside = domainExit(domain, y);
  if (outside !== null) return { end: y, endSample: blankSample(y), stop: 'left_domain', domainExit: outside };
  // The accepted point and the next one alternate between two held copies (holdInto), the run's own: it returns
  // one as its end sample.
  let ev = holdInto(newHeldPoint(), accept(segment, y));
  if (notFiniteState(y) || notFiniteState(ev.derivative)) return { end: y, endSample: ev.sample, stop: 'numerical_failure' };
  let spare = newHeldPoint();
  sink(y, ev.sample);
  if (noGroundProgress(domain, ev)) return { end: y, endSample: ev.sample, stop: 'no_ground_progress' };
  const gNow = segment.events.map((e) => e.g(y, ev.sample));
  for (let i = 0; i < gNow.length; i++) {
    if (gNow[i] >= 0) return { end: y, endSample: ev.sample, stop: segment.events[i].stop };
  }
  let current = y;
  // The break coordinate's slope against the mass over the last step, to end the next step where it will cross a break.
  let breakSlope = Number.NaN;
  for (let step = 0; step < MAX_STEPS; step++) {
    const inside = stepInside(segment, domain, current, ev.derivative, predictedStep(segment, ev, breakSlope));
    if (typeof inside === 'string') {
      return inside === 'not_finite'
        ? { end: current, endSample: ev.sample, stop: 'numerical_failure' }
        : { end: current, endSample: ev.sample, stop: 'left_domain', domainExit: inside };
    }
    let h = inside.h;
    let next = inside.next;
    const reached = accept(segment, next);
    if (notFiniteState(next) || notFiniteState(reached.derivative)) {
      return { end: current, endSample: ev.sample, stop: 'numerical_failure' };
    }
    const nextEv = holdInto(spare, reached);
    // A slope break of the right-hand side crossed well inside the step (none predicted, or the prediction missed):
    // the step is taken again to end there.
    const cut = breakFraction(segment, ev, current, nextEv, next, h);
    if (cut !== null) {
      const shorter = rk4Step(segment, domain, current, ev.derivative, cut * h);
      if (typeof shorter !== 'string') {
        const shorterEv = accept(segment, shorter);
        if (!notFiniteState(shorter) && !notFiniteState(shorterEv.derivative)) {
          h = cut * h;
          next = shorter;
          holdInto(nextEv, shorterEv);
        }
      }
    }
    let firstTau = Infinity;
    let firstIndex = -1;
    let trials: TrialSteps | null = null;
    for (let i = 0; i < segment.events.length; i++) {
      const event = segment.events[i];
      const g = event.g(next, nextEv.sample);
      if (g >= 0 || !Number.isFinite(g)) {
        // A state-only event exactly met at the step's end (a hold's time on a whole step) needs no search.
        let tau = h;
        if (!(g === 0 && event.stateOnly)) {
          trials ??= new Map();
          tau = locateEvent(segment, domain, current, ev.derivative, h, i, gNow[i], nextEv, next, trials);
        }
        if (tau < firstTau) {
          firstTau = tau;
          firstIndex = i;
        }
      } else {
        gNow[i] = g;
      }
    }
    if (firstIndex >= 0) {
      let endSample: FlightSample = nextEv.sample;
      if (firstTau < h) {
        const located = trials?.get(firstTau) ?? rk4Step(segment, domain, current, ev.derivative, firstTau);
        if (typeof located === 'string') return { end: current, endSample: ev.sample, stop: 'left_domain', domainExit: located };
        next = located;
        endSample = holdInto(nextEv, accept(segment, next)).sample;
      }
      sink(next, endSample);
      return { end: next, endSample, stop: segment.events[firstIndex].stop };
    }
    sink(next, nextEv.sample);
    if (noGroundProgress(domain, nextEv)) return { end: next, endSample: nextEv.sample, stop: 'no_ground_progress' };
    breakSlope = coordinateSlope(ev, current, nextEv, next);
    current = next;
    spare = ev;
    ev = nextEv;
  }
  return { end: current, endSample: ev.sample, stop: 'step_limit' };
}
