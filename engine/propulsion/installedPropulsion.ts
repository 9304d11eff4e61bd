/**
 * The installed PropulsionModel of an engine deck: the deck (deckLookup.ts,
 * deckInversion.ts) and the standard atmosphere wired into the installed
 * model (installedModel.ts). Also the airframe increments of an inlet.
 */
import { atmosphere } from '../aero/standardAtmosphere';
import type { Caution } from '../cautions/caution';
import type { CautionSettings } from '../cautions/cautionSettings';
import { createDeckNodeSet, DECK_VALUES_WITH_SENSITIVITIES, evaluateDeckNodesInto, fillDeckNodes, nextPowerBreakpoint } from './deckGrid';
import { powerForThrust } from './deckInversion';
import { insideTableCautions, lookupDeck, lookupFilledDeck, powerBounds, ratingPower } from './deckLookup';
import { correctionFactorsOfAir, deckForInterpolation } from './deckCorrection';
import { temperatureFlowFactor } from './deckTemperature';
import type { EngineDeck } from './engineDeck';
import type { InletDesign } from './inletDesign';
import type { InstallationSettings } from './installationCorrections';
import { CURVE_FUEL_FLOW, type DeckAccess } from './deckAccess';
import { scaleSensitivitiesInto } from './installationSensitivities';
import { makeInstalledModel } from './installedModel';
import { conditionKey, sameFlightCondition, type FlightCondition, type PropulsionModel } from './propulsionModel';
import { sameNumber } from '../core/sameNumber';

export { inletDragIncrementCd0, inletWeight } from './inletDesign';

export interface InstalledPropulsionOptions {
  /** Uninstalled deck, per engine. */
  readonly deck: EngineDeck;
  readonly engineCount: number;
  readonly inlet: InletDesign;
  /** Design whose recovery (throat and fan-face Mach) is used; default `inlet` (for the A-vs-B breakdown). */
  readonly recoveryFrom?: InletDesign;
  /** Design whose capture area and lip suction set spillage drag; default `inlet`. */
  readonly spillageFrom?: InletDesign;
  readonly installation: InstallationSettings;
  readonly cautionSettings: CautionSettings;
  /** Entries of the model's rating memo (installedModel.ts); default ratingMemo.ts RATING_MEMO_ENTRIES. */
  readonly ratingMemoEntries?: number;
  /** Conditions of the model's part-power memo (installedModel.ts); default partPowerSolve.ts PART_POWER_MEMO_CONDITIONS. */
  readonly partPowerMemoConditions?: number;
}

/** The distinct values of `values`, ascending. */
export function sortedUnique(values: ArrayLike<number>): number[] {
  return [...new Set(Array.from(values))].sort((a, b) => a - b);
}

/** The deck and the 1976 standard atmosphere as the installed model's DeckAccess. */
export function deckAccess(deck: EngineDeck): DeckAccess {
  // One-entry memo of the standard atmosphere, keyed purely by altitude and ISA deviation (a mission asks for the
  // same condition several times in a row, and the ambient air and the corrected-parameter factors of a deck
  // without an ISA axis on a standard day need the same one); the Result is immutable, so sharing it cannot
  // change any answer.
  let airAltitude_m = Number.NaN;
  let airIsaDev_K = Number.NaN;
  let airValue: ReturnType<typeof atmosphere> | null = null;
  const air = (altitude_m: number, isaDev_K: number): ReturnType<typeof atmosphere> => {
    if (airValue === null || !sameNumber(altitude_m, airAltitude_m) || !sameNumber(isaDev_K, airIsaDev_K)) {
      airValue = atmosphere(altitude_m, isaDev_K);
      airAltitude_m = altitude_m;
      airIsaDev_K = isaDev_K;
    }
    return airValue;
  };
  const curve = deckCurve(deck, air);
  const evaluate = curve.evaluate;
  return {
    title: deck.title,
    parametric: deck.parametric,
    hasAirflow: deck.hasAirflow,
    hasSensitivities: deck.hasSensitivities,
    referenceRecovery: deck.referenceRecovery,
    slopeBreaks: { altitudes_m: sortedUnique(deck.grid.altitudes_m), machs: sortedUnique(deck.grid.machs), powers: sortedUnique(deck.grid.power) },
    lookup: curve.lookup,
    ratingPower: (rating) => {
      const r = ratingPower(deck, rating);
      return r.ok ? r.value : null;
    },
    powerBounds: (condition) => powerBounds(deck, condition),
    powerForThrust: (condition, thrust_N, ceilingPower) => {
      const r = powerForThrust(deck, condition, thrust_N, ceilingPower);
      return r.ok ? r.value.lookup.power : null;
    },
    curveAt: (condition) => {
      curve.prepare(condition);
      return evaluate;
    },
    curveBreakAfter: curve.breakAfter,
    curveInsideCautions: curve.insideCautions,
    ambient: (condition) => air(condition.altitude_m, condition.isaDev_K),
  };
}

/**
 * The deck at one condition as a function of power: `prepare(condition)`
 * finds the grid nodes and weights once, then `evaluate(power, out)` writes
 * thrust (N), airflow (kg/s, NaN without an airflow column), for a deck
 * with sensitivities the nine of them, and the fuel flow (kg/s) into `out`
 * (deckAccess.ts DeckCurve's layout, CURVE_VALUES entries), by the same
 * weights, corrected-parameter factors and temperature approximation as
 * lookupDeck and in the same order of operations (deckGrid.ts,
 * deckLookup.ts finishLookup, deckTemperature.ts), so each equals
 * lookupDeck's value to the bit; thrust, fuel flow and airflow floored at
 * zero off the table like lookupDeck's extrapolations. `evaluate` returns false where
 * lookupDeck would refuse. One prepared condition at a time (buffers reused).
 */
export function deckCurve(
  deck: EngineDeck,
  air: (altitude_m: number, isaDev_K: number) => ReturnType<typeof atmosphere> = atmosphere,
): {
  prepare(condition: FlightCondition): void;
  evaluate(power: number, out: Float64Array): boolean;
  /** The prepared condition's next power breakpoint strictly above `after` (Infinity when none; deckGrid's nextPowerBreakpoint). */
  breakAfter(after: number): number;
  /** lookupDeck's cautions at the last evaluated power when it was inside the table on every axis, else null. */
  insideCautions(): readonly Caution[] | null;
  /** lookupDeck at `condition` and `power` (the same answer to the bit), preparing the condition first. */
  lookup(condition: FlightCondition, power: number): ReturnType<typeof lookupDeck>;
} {
  const nodes = createDeckNodeSet();
  const values = new Float64Array(DECK_VALUES_WITH_SENSITIVITIES);
  // One prepared condition, keyed by its three numbers (Object.is) alone: the nodes, weights and factors are a
  // pure function of them, so preparing again at the same condition is skipped without changing any answer.
  let preparedAt: FlightCondition | null = null;
  let conditionMask = 0;
  let filled = false;
  // Whether the last evaluate (since the last prepare) stayed inside the table on every axis.
  let lastInside = false;
  // The corrected-parameter factors of thrust, fuel flow and airflow (1 for a raw deck: x * 1 is x to the bit).
  let thrustFactor = 1;
  let fuelFlowFactor = 1;
  let airflowFactor = 1;
  // The temperature factor sqrt(T/T_ISA) alone: the sensitivities are tabulated raw in a corrected deck too, so
  // they take it and not the corrected-parameter multiply-back (as in finishLookup).
  let temperatureFactor = 1;
  const factors = new Float64Array(3);
  function prepare(condition: FlightCondition): void {
    if (preparedAt !== null && sameFlightCondition(preparedAt, condition)) return;
    lastInside = false;
    filled = fillDeckNodes(deck.grid, deck.policy, condition.isaDev_K, condition.altitude_m, condition.mach, nodes);
    conditionMask = nodes.outsideMask;
    temperatureFactor = !deck.hasIsaDev && condition.isaDev_K !== 0 ? temperatureFlowFactor(condition.altitude_m, condition.isaDev_K) : 1;
    thrustFactor = 1;
    fuelFlowFactor = 1;
    airflowFactor = 1;
    if (deck.interpolation === 'corrected') {
      // queryCorrectionInto's factors, from the atmosphere at the deck's own ISA level.
      correctionFactorsOfAir(air(condition.altitude_m, deck.hasIsaDev ? condition.isaDev_K : 0), condition.mach, factors);
      thrustFactor = factors[0]!;
      fuelFlowFactor = factors[1]!;
      airflowFactor = factors[2]!;
    }
    preparedAt = conditionKey(condition);
  }
  return {
    prepare,
    evaluate(power, out) {
      if (!filled) return false;
      // As lookupFilledDeck: from the condition's own outside flags (a previous power may have left the power axis).
      nodes.outsideMask = conditionMask;
      nodes.refusedAxis = -1;
      lastInside = false;
      if (!evaluateDeckNodesInto(deck.grid, nodes, power, deck.policy.power, values)) return false;
      // finishLookup's products in its order ((value x factor) x or / the temperature factor, which is 1 on an ISA
      // axis or a standard day), floored at zero off the table as lookupDeck floors them (the point finally
      // evaluated carries the caution).
      const off = nodes.outsideMask !== 0;
      lastInside = !off;
      const thrust = values[0]! * thrustFactor;
      const fuelFlow = values[1]! * fuelFlowFactor * temperatureFactor;
      const airflow = (values[2]! * airflowFactor) / temperatureFactor;
      out[0] = off && !(thrust >= 0) ? 0 : thrust;
      out[1] = !deck.hasAirflow ? Number.NaN : off && !(airflow >= 0) ? 0 : airflow;
      if (deck.hasSensitivities) scaleSensitivitiesInto(values, 3, deck.hasAirflow, temperatureFactor, out, 2);
      out[CURVE_FUEL_FLOW] = off && !(fuelFlow >= 0) ? 0 : fuelFlow;
      return true;
    },
    breakAfter(after) {
      return filled ? nextPowerBreakpoint(deck.grid, nodes, after) : Infinity;
    },
    insideCautions() {
      return lastInside && preparedAt !== null ? insideTableCautions(deck, preparedAt.isaDev_K) : null;
    },
    lookup(condition, power) {
      if (!Number.isFinite(condition.altitude_m) || !Number.isFinite(condition.mach) || !Number.isFinite(condition.isaDev_K)) {
        return lookupDeck(deck, condition, power); // throws with the deck lookup's message
      }
      prepare(condition);
      return lookupFilledDeck(deck, condition, power, nodes, filled, conditionMask, factors);
    },
  };
}

/**
 * Installed propulsion, all engines, on an uninstalled deck: inlet recovery
 * against the deck's reference (Raymer's ram-recovery correction), customer
 * bleed, shaft power extraction, minus spillage drag (NACA Report 1187
 * additive drag less lip suction). Forces in N, flows in kg/s, for the
 * whole aircraft; `perEngine` has the breakdown. `recoveryFrom` /
 * `spillageFrom` build hybrid models (one design's recovery with another's
 * spillage). Invalid designs or settings throw (validate them first).
 */
export function makeInstalledPropulsion(options: InstalledPropulsionOptions): PropulsionModel {
  return makeInstalledModel(deckAccess(deckForInterpolation(options.deck, options.installation.deckInterpolation ?? 'raw')), options);
}
