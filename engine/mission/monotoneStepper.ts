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
 * the steps be long.
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
import { domainExit, integrateSegment, UNBOUNDED_DOMAIN, type SampleSink, type SegmentRun, type StateDomain } from './integrator';
import { S_GROUND, STATE_SIZE, type Segment, type SegmentStop, type StateVector } from './missionState';

export interface MonotonePlan {
  /** State index stepped on (S_ALT or S_TAS). */
  readonly component: number;
  /** Value of the component where the segment ends. */
  readonly to: number;
  /** Values strictly between start and `to` at which a step must end (any order; others are ignored). */
  readonly breaks: readonly number[];
  /** Longest step in the component's unit. */
  readonly maxStep: number;
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

const ascending = (a: number, b: number): number => a - b;
const descending = (a: number, b: number): number => b - a;

/** Step ends from `from` to `to`: every break between them, each interval cut evenly into steps of at most `maxStep`. */
export function monotoneStepEnds(from: number, to: number, breaks: readonly number[], maxStep: number): number[] {
  const up = to > from;
  // The breaks strictly inside, in flight order, each once (equal values end up side by side); then the target.
  const points: number[] = [];
  for (let k = 0; k < breaks.length; k++) {
    const b = breaks[k]!;
    if (up ? b > from && b < to : b < from && b > to) points.push(b);
  }
  if (points.length > 1) points.sort(up ? ascending : descending);
  points.push(to);
  const ends: number[] = [];
  let a = from;
  for (let k = 0; k < points.length; k++) {
    const b = points[k]!;
    if (k > 0 && b === points[k - 1]) continue;
    const n = Math.max(1, Math.ceil(Math.abs(b - a) / maxStep - 1e-9));
    for (let i = 1; i < n; i++) ends.push(a + ((b - a) * i) / n);
    ends.push(b);
    a = b;
  }
  return ends;
}

/** Fraction of a step by which a segment's first and last stages are moved inside it. */
const NUDGE = 1e-9;

function finite(y: Float64Array): boolean {
  for (let i = 0; i < STATE_SIZE; i++) if (!Number.isFinite(y[i])) return false;
  return true;
}

/**
 * Integrates `segment` from `start` (not modified) to `plan.to` along
 * `plan.component`, handing each accepted point to `sink`; see the file
 * comment for when it hands over to the time integrator.
 */
export function integrateMonotone(
  segment: Segment,
  start: StateVector,
  sink: SampleSink,
  plan: MonotonePlan,
  domain: StateDomain = UNBOUNDED_DOMAIN,
): SegmentRun {
  const c = plan.component;
  const direction = plan.to >= start[c] ? 1 : -1;
  const rhs = (y: StateVector): Float64Array => (segment.derivative !== undefined ? segment.derivative(y) : segment.evaluate(y).derivative);
  let y = Float64Array.from(start);
  const groundProgress = (d: Float64Array) => domain.requireGroundProgress !== true || d[S_GROUND] > 0;
  const timeIntegrator = (from: StateVector, skipFirst: boolean): SegmentRun => {
    let first = skipFirst;
    return integrateSegment(
      segment,
      from,
      (state, sample) => {
        if (first) first = false;
        else sink(state, sample);
      },
      domain,
    );
  };
  if (domainExit(domain, y) !== null) return timeIntegrator(y, false);
  let ev = segment.evaluate(y);
  if (!finite(ev.derivative) || !(direction * ev.derivative[c] >= plan.minRate) || !groundProgress(ev.derivative)) return timeIntegrator(y, false);
  const others = segment.events.filter((e) => e.stop !== plan.targetStop);
  for (const e of others) if (e.g(y, ev.sample) >= 0) return timeIntegrator(y, false);
  sink(y, ev.sample);
  const ends = monotoneStepEnds(start[c], plan.to, plan.breaks, plan.maxStep);
  const tmp = new Float64Array(STATE_SIZE) as StateVector;
  const k2 = new Float64Array(STATE_SIZE);
  const k3 = new Float64Array(STATE_SIZE);
  // The segment's own equations hold up to its ends, but the models there may already be those of the next
  // segment (the tropopause: the lapse rate changes at 11 km), so the last stage is taken a hair inside, NUDGE of
  // the step, and so is the first where the start lies on one of the plan's jumps (one extra evaluation); elsewhere
  // the right-hand side is continuous and the first stage is the start's own evaluation.
  let f1: Float64Array = ev.derivative;
  if (plan.jumps === undefined || plan.jumps.includes(start[c])) {
    const first = Float64Array.from(y) as StateVector;
    const firstStep = (ends[0] ?? plan.to) - start[c];
    first[c] = start[c] + NUDGE * firstStep;
    if (domainExit(domain, first) !== null) return timeIntegrator(y, true);
    f1 = rhs(first);
  }
  let s0 = start[c];
  for (let j = 0; j < ends.length; j++) {
    const s1 = ends[j]!;
    const last = j === ends.length - 1;
    const h = s1 - s0;
    // Stage slopes dy/ds = f / f_c; a stage below the least rate hands the step to the time integrator.
    if (j > 0) f1 = ev.derivative;
    const r1 = f1[c];
    if (!(direction * r1 >= plan.minRate)) return timeIntegrator(y, true);
    for (let i = 0; i < STATE_SIZE; i++) tmp[i] = y[i] + (0.5 * h * f1[i]) / r1;
    tmp[c] = s0 + 0.5 * h;
    if (domainExit(domain, tmp) !== null) return timeIntegrator(y, true);
    const f2 = rhs(tmp);
    const r2 = f2[c];
    if (!(direction * r2 >= plan.minRate)) return timeIntegrator(y, true);
    for (let i = 0; i < STATE_SIZE; i++) k2[i] = f2[i] / r2;
    for (let i = 0; i < STATE_SIZE; i++) tmp[i] = y[i] + 0.5 * h * k2[i];
    tmp[c] = s0 + 0.5 * h;
    if (domainExit(domain, tmp) !== null) return timeIntegrator(y, true);
    const f3 = rhs(tmp);
    const r3 = f3[c];
    if (!(direction * r3 >= plan.minRate)) return timeIntegrator(y, true);
    for (let i = 0; i < STATE_SIZE; i++) k3[i] = f3[i] / r3;
    for (let i = 0; i < STATE_SIZE; i++) tmp[i] = y[i] + h * k3[i];
    tmp[c] = last ? s1 - NUDGE * h : s1;
    if (domainExit(domain, tmp) !== null) return timeIntegrator(y, true);
    const f4 = rhs(tmp);
    const r4 = f4[c];
    if (!(direction * r4 >= plan.minRate)) return timeIntegrator(y, true);
    const next = new Float64Array(STATE_SIZE) as StateVector;
    for (let i = 0; i < STATE_SIZE; i++) next[i] = y[i] + (h / 6) * (f1[i] / r1 + 2 * k2[i] + 2 * k3[i] + f4[i] / r4);
    next[c] = s1;
    if (domainExit(domain, next) !== null) return timeIntegrator(y, true);
    const nextEv = segment.evaluate(next);
    if (!finite(nextEv.derivative) || !(direction * nextEv.derivative[c] >= plan.minRate) || !groundProgress(nextEv.derivative)) {
      return timeIntegrator(y, true);
    }
    for (const e of others) if (e.g(next, nextEv.sample) >= 0) return timeIntegrator(y, true);
    sink(next, nextEv.sample);
    y = next;
    ev = nextEv;
    s0 = s1;
  }
  return { end: y, endSample: ev.sample, stop: plan.targetStop };
}
