/**
 * The integrator's state vector and what one evaluation of a flight segment
 * returns. The state is a small Float64Array mutated only inside the
 * integrator's hot loop (docs/style.md §7).
 */
import type { Caution } from '../cautions/caution';

/** State layout: time (s), still-air distance (m), ground distance (m), pressure altitude (m), mass (kg), TAS (m/s). */
export const S_TIME = 0;
export const S_AIR = 1;
export const S_GROUND = 2;
export const S_ALT = 3;
export const S_MASS = 4;
export const S_TAS = 5;
export const STATE_SIZE = 6;

export type StateVector = Float64Array<ArrayBuffer>;

/** Everything recorded about one flight point. */
export interface FlightSample {
  readonly altitude_m: number;
  readonly mach: number;
  readonly cas_m_s: number;
  readonly tas_m_s: number;
  readonly thrustAvailable_N: number;
  readonly thrustUsed_N: number;
  readonly drag_N: number;
  readonly fuelFlow_kg_s: number;
  readonly cl: number;
  readonly clMax: number;
  readonly buffetLoadFactor: number;
  readonly liftToDrag: number;
  /** Pressure-altitude rate (m/s). */
  readonly climbRate_m_s: number;
  /** Inlet throat Mach (-) when the installation computes it. */
  readonly throatMach: number | null;
  /** True when the drag to balance is below idle thrust (level flight flown at idle fuel flow). */
  readonly idleAboveDrag: boolean;
  /** Polar tables the drag lookup left and was clamped on (empty inside). */
  readonly polarOutside: readonly string[];
  /** Cautions raised by the propulsion lookup at this point. */
  readonly propulsionCautions: readonly Caution[];
}

/**
 * What Segment.evaluate returns. A segment may write every evaluation into one derivative buffer and one sample
 * record of its own: an evaluation is valid until the segment's next evaluate or derivative call, so an integrator
 * copies what it keeps across them and returns a copy of its end sample.
 */
export interface Evaluation {
  /** d(state)/dt, STATE_SIZE entries. */
  readonly derivative: Float64Array<ArrayBuffer>;
  readonly sample: FlightSample;
  /** The segment's slope-break coordinate at this point (Segment.breakValues), when it has one. */
  readonly breakCoordinate?: number;
}

/** Why a segment stopped. */
export type SegmentStop =
  | 'altitude_reached'
  | 'speed_reached'
  | 'distance_reached'
  | 'time_reached'
  | 'fuel_exhausted'
  | 'thrust_below_drag'
  | 'climb_stalled'
  | 'descent_stalled'
  | 'step_climb_due'
  | 'numerical_failure'
  | 'step_limit'
  /** The next step would leave the models' domain (integrator.ts StateDomain) even when cut to 1/1024. */
  | 'left_domain'
  /** Ground speed at or below zero on a leg that must advance over the ground (a headwind at least the airspeed). */
  | 'no_ground_progress';

/** A terminal event: the segment stops where g(state) crosses zero from below. */
export interface SegmentEvent {
  readonly stop: SegmentStop;
  /** True when g reads only the state (not the sample): the event is then located on the step's cubic Hermite interpolant. */
  readonly stateOnly?: boolean;
  /**
   * Time (s) to which the event is located when that is coarser than the integrator's default (1e-10 of the step):
   * for a decision such as a step climb, whose exact second does not matter, so each trial (a full RK4 step) is saved.
   */
  readonly timeTolerance_s?: number;
  g(state: StateVector, sample: FlightSample): number;
}

/** One stretch of flight with smooth equations of motion. */
export interface Segment {
  /** Fixed step (s). */
  readonly step_s: number;
  /** The derivative and sample at `state`; valid until the segment's next evaluate or derivative call (Evaluation). */
  evaluate(state: StateVector): Evaluation;
  /**
   * Optional cheaper right-hand side for the RK4 stages, whose samples nobody reads: must return exactly the values
   * of `evaluate(state).derivative`, and may return the same buffer at every call (the integrators read a stage's
   * derivative before they ask for the next one).
   */
  derivative?(state: StateVector): Float64Array;
  readonly events: readonly SegmentEvent[];
  /** When true the altitude is algebraic (cruise-climb): the state takes the sample's altitude after each step. */
  readonly algebraicAltitude?: boolean;
  /**
   * Values of the evaluations' `breakCoordinate` (e.g. the part-power setting, whose deck nodes are slope breaks of
   * the fuel flow in level flight) where the right-hand side's slope breaks: a time step over which the coordinate
   * crosses one is cut to end where it crosses (integrator.ts), so RK4 keeps its order on both sides.
   */
  readonly breakValues?: readonly number[];
}
