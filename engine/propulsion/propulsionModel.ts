/**
 * The contract between the propulsion layer (deck + installation) and its
 * users (mission integrator, analyses, renderer). All quantities SI; all
 * forces and flows are for the WHOLE AIRCRAFT (every engine), per engine
 * values are in `perEngine`.
 *
 * Bookkeeping: `thrust_N` is the installed net propulsive force =
 * deck thrust corrected for inlet recovery, bleed and power extraction,
 * MINUS inlet spillage (additive) drag. The inlet's external (nacelle)
 * drag increment is an airframe drag increment (see InletDesign
 * `externalDragArea_m2` / dCD0) and is NOT in `thrust_N`.
 */
import type { Caution } from '../cautions/caution';
import type { InstallationMethodId } from './installationMethod';
import { sameNumber } from '../core/sameNumber';

export type RatingName = 'takeoff' | 'maxClimb' | 'maxCruise' | 'maxContinuous' | 'flightIdle';

export const RATING_NAMES: readonly RatingName[] = [
  'takeoff',
  'maxClimb',
  'maxCruise',
  'maxContinuous',
  'flightIdle',
];

/** Each rating as a reader names it (messages, screens, reports). */
export const RATING_LABEL: Readonly<Record<RatingName, string>> = {
  takeoff: 'take-off',
  maxClimb: 'maximum climb',
  maxCruise: 'maximum cruise',
  maxContinuous: 'maximum continuous',
  flightIdle: 'flight idle',
};

/** The deck axis a lookup left, if any. */
export type DeckAxis = 'altitude' | 'mach' | 'power' | 'isaDev';

export interface FlightCondition {
  /** Pressure altitude (m). */
  readonly altitude_m: number;
  readonly mach: number;
  /** ISA temperature deviation (K). */
  readonly isaDev_K: number;
}

/**
 * True when two flight conditions are the same three numbers (Object.is: -0 and 0 stay apart, NaN equals NaN), the
 * key of the installed model's one-entry memos (a point is a pure function of its condition).
 */
export function sameFlightCondition(a: FlightCondition, b: FlightCondition): boolean {
  return sameNumber(a.altitude_m, b.altitude_m) && sameNumber(a.mach, b.mach) && sameNumber(a.isaDev_K, b.isaDev_K);
}

/** A copy of a condition's three numbers (a memo's key must not be the caller's object, which it may change). */
export function conditionKey(c: FlightCondition): FlightCondition {
  return { altitude_m: c.altitude_m, mach: c.mach, isaDev_K: c.isaDev_K };
}

/** One engine's numbers at a flight condition and power setting. */
export interface EnginePoint {
  /** Deck (uninstalled) net thrust (N). */
  readonly uninstalledThrust_N: number;
  /** Deck (uninstalled) fuel flow (kg/s). */
  readonly uninstalledFuelFlow_kg_s: number;
  /** Installed net thrust before spillage drag (N). */
  readonly correctedThrust_N: number;
  /** Inlet spillage (additive) drag net of lip suction (N); 0 when not computed. */
  readonly spillageDrag_N: number;
  /** Installed net propulsive force = correctedThrust_N - spillageDrag_N (N). */
  readonly thrust_N: number;
  /** Installed fuel flow (kg/s). */
  readonly fuelFlow_kg_s: number;
  /** Engine inlet corrected... physical airflow (kg/s), null when the deck has no airflow. */
  readonly airflow_kg_s: number | null;
  /** Inlet total-pressure recovery used (-) and the deck's reference recovery (-). */
  readonly recovery: number;
  readonly referenceRecovery: number;
  /** Capture-area mass-flow ratio A0/Ac (-), null when not computed. */
  readonly massFlowRatio: number | null;
  readonly throatMach: number | null;
  readonly fanFaceMach: number | null;
  /** How recovery, bleed and extraction were applied: the deck's sensitivities, or Raymer's rule. */
  readonly installationMethod: InstallationMethodId;
  /**
   * Thrust lost (N) to recovery below the deck's reference (negative is a
   * gain), to customer bleed and to shaft power extraction, by that method;
   * uninstalledThrust_N - these three = correctedThrust_N.
   */
  readonly recoveryLoss_N: number;
  readonly bleedLoss_N: number;
  readonly extractionLoss_N: number;
}

/** Whole-aircraft installed numbers at a condition and power setting. */
export interface InstalledPoint extends FlightCondition {
  /** Power setting on the deck's power axis (-). */
  readonly power: number;
  /** Installed net propulsive force, all engines (N). */
  readonly thrust_N: number;
  /** Installed fuel flow, all engines (kg/s). */
  readonly fuelFlow_kg_s: number;
  /** Installed TSFC (kg/(N s)); fuelFlow / thrust, NaN-free: Infinity when thrust <= 0 is reported as null. */
  readonly tsfc_kg_N_s: number | null;
  readonly perEngine: EnginePoint;
  /** Deck axes the lookup left (empty when inside the table). */
  readonly outsideTable: readonly DeckAxis[];
  /** Cautions raised by this lookup (deck extrapolation, throat Mach, temperature approximation, no airflow...). */
  readonly cautions: readonly Caution[];
}

export type ThrustLimit = 'within' | 'above_rating' | 'below_idle';

export interface PartPowerPoint extends InstalledPoint {
  /** 'within' when the thrust asked for lies between flight idle and the rating; else the point is AT the limit. */
  readonly limit: ThrustLimit;
  /** The thrust asked for, all engines (N). */
  readonly thrustRequired_N: number;
}

/** Pressure altitudes (m) and Machs (-) at which a model's numbers have slope breaks, ascending. */
export interface SlopeBreaks {
  readonly altitudes_m: readonly number[];
  readonly machs: readonly number[];
  /**
   * Power settings (-) at which the numbers at one condition have slope breaks (the deck's tabulated powers), so
   * where the fuel flow of a part-power point breaks as the thrust asked for changes; absent: none known.
   */
  readonly powers?: readonly number[];
}

export interface PropulsionModel {
  readonly engineCount: number;
  /** Deck title; parametric decks say "parametric" in it. */
  readonly label: string;
  readonly parametric: boolean;
  /** Name of the inlet design applied. */
  readonly inletName: string;
  /**
   * Where the installed numbers have slope breaks (the deck's grid altitudes
   * and Machs, the inlet's recovery-table Machs): mission climbs, descents
   * and speed changes end their steps there. Absent for smooth models.
   */
  readonly slopeBreaks?: SlopeBreaks;
  /** How the installation applies recovery, bleed and extraction (every point also says so). */
  readonly installationMethod: InstallationMethodId;
  /** Installed numbers at a named rating. */
  atRating(condition: FlightCondition, rating: RatingName): InstalledPoint;
  /** Installed numbers at a power-axis value. */
  atPower(condition: FlightCondition, power: number): InstalledPoint;
  /**
   * Part power: the setting between flight idle and `ceilingRating` (default
   * maxCruise... callers pass what applies) where installed thrust equals
   * `thrustRequired_N` (all engines). At a limit the point is the limit and
   * `limit` says which.
   */
  forThrust(
    condition: FlightCondition,
    thrustRequired_N: number,
    ceilingRating?: RatingName,
  ): PartPowerPoint;
  /**
   * forThrust(condition, thrustRequired_N, ceilingRating).fuelFlow_kg_s (kg/s, all engines), to the bit, without
   * building the point (no cautions, no full deck lookup where the deck's curve serves): for integrator stages that
   * read the fuel flow alone. Absent: callers take forThrust's (flightPoint.ts partPowerFuelFlow).
   */
  fuelFlowForThrust?(condition: FlightCondition, thrustRequired_N: number, ceilingRating?: RatingName): number;
  /**
   * The same propulsion with the inlet recovery raised by `delta` (-),
   * carried through the installation method (for trade factors); absent
   * when the model cannot rebuild itself.
   */
  withRecoveryOffset?(delta: number): PropulsionModel;
}

/**
 * The one shape of every PropulsionModel the engine builds (makeInstalledModel, adjustPropulsion): the same keys in
 * the same order, each optional member present (undefined when the model has none). A mission's call sites then
 * meet one object shape whatever models ran before in the process (a second shape made them polymorphic).
 */
export interface PropulsionModelParts {
  readonly engineCount: number;
  readonly label: string;
  readonly parametric: boolean;
  readonly inletName: string;
  readonly slopeBreaks: SlopeBreaks | undefined;
  readonly installationMethod: InstallationMethodId;
  readonly atRating: PropulsionModel['atRating'];
  readonly atPower: PropulsionModel['atPower'];
  readonly forThrust: PropulsionModel['forThrust'];
  readonly fuelFlowForThrust: PropulsionModel['fuelFlowForThrust'] | undefined;
  readonly withRecoveryOffset: PropulsionModel['withRecoveryOffset'] | undefined;
}

/** A PropulsionModel of `parts`, in the one key order (PropulsionModelParts). */
export function propulsionModelOf(parts: PropulsionModelParts): PropulsionModel {
  return {
    engineCount: parts.engineCount,
    label: parts.label,
    parametric: parts.parametric,
    inletName: parts.inletName,
    slopeBreaks: parts.slopeBreaks,
    installationMethod: parts.installationMethod,
    atRating: parts.atRating,
    atPower: parts.atPower,
    forThrust: parts.forThrust,
    fuelFlowForThrust: parts.fuelFlowForThrust,
    withRecoveryOffset: parts.withRecoveryOffset,
  };
}
