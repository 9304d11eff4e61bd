/**
 * The seam between the installed model and an uninstalled deck: what the
 * installed model asks of a deck and the atmosphere (installedPropulsion.ts
 * wires it to the engine deck and the standard atmosphere).
 */
import type { Caution } from '../cautions/caution';
import type { Result } from '../core/result';
import type { DeckLookup } from './deckLookup';
import type { ReferenceRecovery } from './engineDeck';
import type { FlightCondition, RatingName, SlopeBreaks } from './propulsionModel';
import { SENSITIVITY_STRIDE } from './installationSensitivities';

/** One engine's uninstalled deck numbers at a condition and power: the deck lookup's own result. */
export type DeckPoint = DeckLookup;

/** A failed deck or atmosphere query: a literal code and a readable message. */
export interface AccessError {
  readonly code: string;
  readonly message: string;
}

/**
 * Evaluator of the deck at one prepared condition: thrust (N) and airflow
 * (kg/s, NaN without airflow) into out[0], out[1], for a deck with
 * sensitivities the nine of them (slot order of SENSITIVITY_FIELDS,
 * installationSensitivities.ts) into out[2..10], and the fuel flow (kg/s)
 * into out[CURVE_FUEL_FLOW]: each the value `lookup` returns at that power,
 * to the bit; `out` has CURVE_VALUES entries. False where the deck refuses.
 */
export type DeckCurve = (power: number, out: Float64Array) => boolean;

/** Where a DeckCurve writes the fuel flow: after thrust, airflow and the nine sensitivities. */
export const CURVE_FUEL_FLOW = 2 + SENSITIVITY_STRIDE;

/** Length of the buffer a DeckCurve writes. */
export const CURVE_VALUES = CURVE_FUEL_FLOW + 1;

/** What the installed model needs from an uninstalled deck and the atmosphere. */
export interface DeckAccess {
  readonly title: string;
  readonly parametric: boolean;
  readonly hasAirflow: boolean;
  /** The deck carries installation sensitivities (its lookups and curves then return them). */
  readonly hasSensitivities: boolean;
  readonly referenceRecovery: ReferenceRecovery;
  lookup(condition: FlightCondition, power: number): Result<DeckPoint, AccessError>;
  /** Power-axis value of a rating, or null when the deck does not name it. */
  ratingPower(rating: RatingName): number | null;
  /** Smallest and largest power on the deck at this condition. */
  powerBounds(condition: FlightCondition): { readonly idle: number; readonly max: number };
  /** Uninstalled power for a per-engine thrust (a first guess), or null. */
  powerForThrust(condition: FlightCondition, thrust_N: number, ceilingPower: number): number | null;
  /**
   * Optional fast path for solves at one condition: prepares the deck at
   * `condition` and returns its DeckCurve. Must agree with `lookup` to the bit. The
   * evaluator may share buffers: it is valid until the next `curveAt` call.
   */
  curveAt?(condition: FlightCondition): DeckCurve;
  /**
   * With `curveAt`: the smallest power breakpoint of the curve last prepared
   * strictly above `after` (-), Infinity when none. Between two breakpoints
   * every value the curve writes is linear in power (the grid is linear in
   * power between its tabulated powers); the part-power solve brackets its
   * root on one such segment.
   */
  curveBreakAfter?(after: number): number;
  /**
   * With `curveAt`: when the curve's last evaluation (at the condition last prepared) was inside the table on every
   * axis, the cautions `lookup` gives there (its outside list is then empty); else null (`lookup` then builds them).
   */
  curveInsideCautions?(): readonly Caution[] | null;
  /** The deck's grid altitudes (m) and Machs (-), ascending: where its interpolated numbers have slope breaks. */
  readonly slopeBreaks?: SlopeBreaks;
  /** Free-stream static pressure (Pa) and temperature (K). */
  ambient(condition: FlightCondition): Result<{ readonly pressure_Pa: number; readonly temperature_K: number }, AccessError>;
}
