/**
 * Classical RK4 with a monotone state component as the independent variable:
 * pressure altitude in a climb or descent, TAS in a level speed change. The
 * state y(s) obeys dy/ds = f(y) / f_c(y), with f the segment's time
 * derivative and c the stepping component, so the segment ends exactly on
 * its target (no event location) and every step ends exactly on the
 * breakpoints given: the altitudes and speeds where the right-hand side has a
 * slope break (the deck's grid altitudes, the Mach nodes of the deck, polar
 * and inlet tables, the tropopause). Between breakpoints the right-hand side
 * is smooth and the fourth-order error constant applies, which is what lets
 * the steps be long. Each interval between breaks is cut into equal steps, at
 * most `maxStep` long and, with `maxStepTime_s`, at most that long in time at
 * the rate met at the interval's start (the climbs' and descents' error of an
 * interval goes as its duration to the fifth over its steps to the fourth).
 *
 * Wherever the rate f_c falls below `minRate` (a stall, or progress too slow
 * for the change of variable) at a stage, or another terminal event of the
 * segment (fuel exhausted, stalled) fires at a step end, or a stage or step
 * end leaves the state domain (or stops making ground progress), the segment is
 * handed from that step's start to the fixed-step time integrator
 * (integrator.ts), which locates the event exactly; the answer is then what
 * the time integrator gives.
 *
 * Source: RK4 and the change of independent variable - Hairer, Norsett &
 * Wanner, Solving Ordinary Differential Equations I, sections II.1 and I.7
 * (from memory); step ends on slope breaks - common practice for
 * piecewise-linear tables.
 */
import { integrateSegment, notFiniteState, outsideDomain, UNBOUNDED_DOMAIN, type SampleSink, type SegmentRun, type StateDomain } from './integrator';
import { copyOfSample } from './flightPoint';
import { S_GROUND, STATE_SIZE, type Segment, type SegmentEvent, type SegmentStop, type StateVector } from './missionState';

export interface MonotonePlan {
  /** State index stepped on (S_ALT or S_TAS). */
  readonly component: number;
  /** Value of the component where the segment ends. */
  readonly to: number;
  /** Values strictly between start and `to` at which a step must end (any order; others are ignored). */
  readonly breaks: readonly number[];
  /** Longest step in the component's unit. */
  readonly maxStep: number;
  /**
   * Longest step in time (s), judged at each break interval's start: an interval of length L entered at the rate r
   * (the accepted point's |d component / dt|) gets at least ceil(L / (r maxStepTime_s)) even steps (that bound
   * asks at most MAX_INTERVAL_STEPS). Absent: the steps are bounded by `maxStep` alone.
   */
  readonly maxStepTime_s?: number;
  /** Least |d component / dt| (unit/s) for the change of variable; slower progress goes to the time integrator. */
  readonly minRate: number;
  /** The stop reported on reaching `to`; the segment's event with this stop is not checked at step ends. */
  readonly targetStop: SegmentStop;
  /**
   * Values of the component where the right-hand side's value itself jumps (not only its slope), e.g. the lapse
   * rate at the atmosphere's layer bases: a segment starting on one takes its first stage a hair inside (NUDGE),
   * any other starts from the evaluation at its start. Absent: every segment nudges.
   */
  readonly jumps?: readonly number[];
}

/** The breaks strictly between `from` and `to` in flight order, each once, then `to`: the ends of the break intervals. */
export function monotoneIntervalEnds(from: number, to: number, breaks: readonly number[]): number[] {
  const up = to > from;
  const points: number[] = [];
  // Insertion in flight order as they are found (a few dozen breaks at most: no sort's work array).
  for (let k = 0; k < breaks.length; k++) {
    const b = breaks[k]!;
    if (!(up ? b > from && b < to : b < from && b > to)) continue;
    let i = points.length;
    points.push(b);
    while (i > 0 && (up ? points[i - 1]! > b : points[i - 1]! < b)) {
      points[i] = points[i - 1]!;
      i--;
    }
    points[i] = b;
  }
  points.push(to);
  const out: number[] = [];
  for (let k = 0; k < points.length; k++) if (k === 0 || points[k] !== points[k - 1]) out.push(points[k]!);
  return out;
}

/**
 * Most steps the time bound asks of one break interval (where the rate is near the least rate): far above what it
 * asks in production (a 1,600 m interval at the 0.5 m/s least rate in 145 s steps is 23) and at stepScale 1/64
 * (about 1,400), so that refinement studies refine every interval. The length bound is not capped.
 */
export const MAX_INTERVAL_STEPS = 4096;

/**
 * Steps (at least 1) for a break interval of `length` (>= 0, the component's unit): at most `maxStep` long and,
 * with `maxStepTime_s`, at most that many seconds at `rate` (|d component / dt|; the time bound asks at most
 * MAX_INTERVAL_STEPS).
 */
export function intervalSteps(length: number, maxStep: number, rate: number, maxStepTime_s?: number): number {
  let n = Math.ceil(length / maxStep - 1e-9);
  if (maxStepTime_s !== undefined) n = Math.max(n, Math.min(Math.ceil(length / (Math.abs(rate) * maxStepTime_s) - 1e-9), MAX_INTERVAL_STEPS));
  return n >= 1 ? n : 1;
}

/** Step ends from `from` to `to`: every break between them, each interval cut evenly into steps of at most `maxStep`. */
export function monotoneStepEnds(from: number, to: number, breaks: readonly number[], maxStep: number): number[] {
  const ends: number[] = [];
  let a = from;
  for (const b of monotoneIntervalEnds(from, to, breaks)) {
    const n = intervalSteps(Math.abs(b - a), maxStep, 0);
    for (let i = 1; i < n; i++) ends.push(a + ((b - a) * i) / n);
    ends.push(b);
    a = b;
  }
  return ends;
}

/**
 * The stepper's stage point and its first three stage slopes (k1 at [0, STATE_SIZE), k2 after it, then k3): written
 * and read within each step only, so runs flown one after another can share one (segmentBuffers.ts).
 */
export interface MonotoneScratch {
  readonly stagePoint: StateVector;
  readonly slopes: Float64Array<ArrayBuffer>;
}

export function newMonotoneScratch(): MonotoneScratch {
  return { stagePoint: new Float64Array(STATE_SIZE), slopes: new Float64Array(3 * STATE_SIZE) };
}

/** Fraction of a step by which a segment's first and last stages are moved inside it. */
const NUDGE = 1e-9;

/** A stage's right-hand side: the segment's sample-free derivative when it has one. */
function stageRate(segment: Segment, y: StateVector): Float64Array {
  return segment.derivative !== undefined ? segment.derivative(y) : segment.evaluate(y).derivative;
}

/** The time integrator from `from` (integrator.ts), its first point handed to `sink` unless `skipFirst` (it was already). */
function handOver(segment: Segment, from: StateVector, skipFirst: boolean, sink: SampleSink, domain: StateDomain): SegmentRun {
  if (!skipFirst) return integrateSegment(segment, from, sink, domain);
  let first = true;
  return integrateSegment(
    segment,
    from,
    (state, sample) => {
      if (first) first = false;
      else sink(state, sample);
    },
    domain,
  );
}

/**
 * Integrates `segment` from `start` (not modified) to `plan.to` along
 * `plan.component`, handing each accepted point to `sink`; see the file
 * comment for when it hands over to the time integrator. `scratch` holds the
 * stage point and slopes (a run's own when not given).
 */
export function integrateMonotone(
  segment: Segment,
  start: StateVector,
  sink: SampleSink,
  plan: MonotonePlan,
  domain: StateDomain = UNBOUNDED_DOMAIN,
  scratch?: MonotoneScratch,
): SegmentRun {
  const c = plan.component;
  const direction = plan.to >= start[c] ? 1 : -1;
  const minRate = plan.minRate;
  let y = start.slice();
  const groundProgress = domain.requireGroundProgress === true;
  if (outsideDomain(domain, y)) return handOver(segment, y, false, sink, domain);
  let ev = segment.evaluate(y);
  let d = ev.derivative;
  if (notFiniteState(d) || !(direction * d[c] >= minRate) || (groundProgress && !(d[S_GROUND] > 0))) return handOver(segment, y, false, sink, domain);
  const others: SegmentEvent[] = [];
  for (let e = 0; e < segment.events.length; e++) if (segment.events[e]!.stop !== plan.targetStop) others.push(segment.events[e]!);
  const eventCount = others.length;
  for (let e = 0; e < eventCount; e++) if (others[e]!.g(y, ev.sample) >= 0) return handOver(segment, y, false, sink, domain);
  sink(y, ev.sample);
  const intervals = monotoneIntervalEnds(start[c], plan.to, plan.breaks);
  const intervalCount = intervals.length;
  const stageScratch = scratch ?? newMonotoneScratch();
  const tmp = stageScratch.stagePoint;
  const ks = stageScratch.slopes;
  // The accepted state and the next one alternate between `y` and `spare` (the sink and the events read a state
  // when it is handed over and keep nothing of it).
  let spare = new Float64Array(STATE_SIZE) as StateVector;
  let a = start[c];
  let b = intervals[0]!;
  // Steps of the interval [a, b], from the rate at its start.
  let n = intervalSteps(Math.abs(b - a), plan.maxStep, d[c]!, plan.maxStepTime_s);
  // The segment's own equations hold up to its ends, but the models there may already be those of the next
  // segment (the tropopause: the lapse rate changes at 11 km), so the last stage is taken a hair inside, NUDGE of
  // the step, and so is the first where the start lies on one of the plan's jumps (one extra evaluation); elsewhere
  // the right-hand side is continuous and the first stage is the start's own evaluation.
  let f1: Float64Array = d;
  if (plan.jumps === undefined || plan.jumps.includes(start[c])) {
    const first = start.slice();
    const firstStep = (n > 1 ? a + (b - a) / n : b) - start[c];
    first[c] = start[c] + NUDGE * firstStep;
    if (outsideDomain(domain, first)) return handOver(segment, y, true, sink, domain);
    f1 = stageRate(segment, first);
  }
  let s0 = start[c];
  let interval = 0;
  let i = 1;
  for (let j = 0; ; j++) {
    const lastOfInterval = i === n;
    const s1 = lastOfInterval ? b : a + ((b - a) * i) / n;
    const last = lastOfInterval && interval === intervalCount - 1;
    const h = s1 - s0;
    const half = 0.5 * h;
    const mid = s0 + half;
    // Stage slopes dy/ds = f / f_c; a stage below the least rate hands the step to the time integrator.
    if (j > 0) f1 = d;
    const r1 = f1[c]!;
    if (!(direction * r1 >= minRate)) return handOver(segment, y, true, sink, domain);
    for (let q = 0; q < STATE_SIZE; q++) {
      const f = f1[q]!;
      ks[q] = f / r1;
      tmp[q] = y[q] + (half * f) / r1;
    }
    tmp[c] = mid;
    if (outsideDomain(domain, tmp)) return handOver(segment, y, true, sink, domain);
    const f2 = stageRate(segment, tmp);
    const r2 = f2[c]!;
    if (!(direction * r2 >= minRate)) return handOver(segment, y, true, sink, domain);
    for (let q = 0; q < STATE_SIZE; q++) {
      const k = f2[q]! / r2;
      ks[STATE_SIZE + q] = k;
      tmp[q] = y[q] + half * k;
    }
    tmp[c] = mid;
    if (outsideDomain(domain, tmp)) return handOver(segment, y, true, sink, domain);
    const f3 = stageRate(segment, tmp);
    const r3 = f3[c]!;
    if (!(direction * r3 >= minRate)) return handOver(segment, y, true, sink, domain);
    for (let q = 0; q < STATE_SIZE; q++) {
      const k = f3[q]! / r3;
      ks[2 * STATE_SIZE + q] = k;
      tmp[q] = y[q] + h * k;
    }
    tmp[c] = last ? s1 - NUDGE * h : s1;
    if (outsideDomain(domain, tmp)) return handOver(segment, y, true, sink, domain);
    const f4 = stageRate(segment, tmp);
    const r4 = f4[c]!;
    if (!(direction * r4 >= minRate)) return handOver(segment, y, true, sink, domain);
    const next = spare;
    const sixth = h / 6;
    for (let q = 0; q < STATE_SIZE; q++) next[q] = y[q] + sixth * (ks[q]! + 2 * ks[STATE_SIZE + q]! + 2 * ks[2 * STATE_SIZE + q]! + f4[q]! / r4);
    next[c] = s1;
    if (outsideDomain(domain, next)) return handOver(segment, y, true, sink, domain);
    const nextEv = segment.evaluate(next);
    const nd = nextEv.derivative;
    if (notFiniteState(nd) || !(direction * nd[c] >= minRate) || (groundProgress && !(nd[S_GROUND] > 0))) return handOver(segment, y, true, sink, domain);
    for (let e = 0; e < eventCount; e++) if (others[e]!.g(next, nextEv.sample) >= 0) return handOver(segment, y, true, sink, domain);
    sink(next, nextEv.sample);
    spare = y;
    y = next;
    ev = nextEv;
    d = nd;
    s0 = s1;
    if (last) break;
    if (lastOfInterval) {
      interval++;
      a = b;
      b = intervals[interval]!;
      n = intervalSteps(Math.abs(b - a), plan.maxStep, d[c]!, plan.maxStepTime_s);
      i = 1;
    } else {
      i++;
    }
  }
  // The segment may write its next evaluation into the same record (Segment.evaluate): the run keeps a copy.
  return { end: y, endSample: copyOfSample(ev.sample), stop: plan.targetStop };
}
