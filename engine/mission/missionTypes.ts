/**
 * The mission contract: what the project file becomes after parsing (all SI)
 * and what the solver returns. engine/project builds a MissionInput from a
 * project file; engine/mission solves it; analyses and the renderer read
 * MissionResult. Owned by engine/mission — extend, do not fork.
 */
import type { AeroModel } from '../aero/aeroModel';
import type { Caution } from '../cautions/caution';
import type { CautionSettings } from '../cautions/cautionSettings';
import type { PropulsionModel, RatingName } from '../propulsion/propulsionModel';
import type { MessageParts } from '../units/messageParts';

export interface Airframe {
  /** Operating empty mass including the active inlet's weight (kg). */
  readonly oew_kg: number;
  readonly mzfw_kg: number;
  readonly mtow_kg: number;
  readonly mlw_kg: number;
  readonly maxFuel_kg: number;
  readonly wingArea_m2: number;
  /** Maximum operating speed as CAS (m/s) and Mach (-). */
  readonly vmo_m_s: number;
  readonly mmo: number;
}

/** Per-leg atmosphere and wind; unset fields fall back to the mission's. */
export interface LegEnvironment {
  /** ISA temperature deviation (K). */
  readonly isaDev_K?: number;
  /** Along-track wind (m/s): positive is a tailwind, negative a headwind. */
  readonly wind_m_s?: number;
}

/** Climb/descent speed schedule: a low CAS below a limit altitude, then a CAS, then a Mach above the crossover. */
export interface SpeedSchedule {
  /** CAS below `lowAltitudeLimit_m` (m/s), e.g. 250 kt below 10,000 ft. */
  readonly lowCas_m_s: number;
  readonly lowAltitudeLimit_m: number;
  /** CAS above the limit (m/s). */
  readonly cas_m_s: number;
  /** Mach held above the CAS/Mach transition altitude (-). */
  readonly mach: number;
}

export type CruiseSpeed =
  | { readonly kind: 'mach'; readonly mach: number }
  | { readonly kind: 'bestRange' }
  | { readonly kind: 'longRange' };

/**
 * Holding speed: best endurance (minimum drag for a jet), optionally flown at `speedFactor` times the
 * minimum-drag speed (same lift coefficient scaling, so the factor holds as the mass falls) and never below
 * `minCas_m_s`; or a set CAS.
 */
export type HoldSpeed =
  | { readonly kind: 'bestEndurance'; readonly minCas_m_s?: number; readonly speedFactor?: number }
  | { readonly kind: 'cas'; readonly cas_m_s: number };

/** An allowance flown in the reserves: a set fuel (kg), or the time (s) at the allowance's rating. */
export interface ReserveAllowance {
  readonly time_s: number;
  readonly fuel_kg: number | null;
}

/**
 * The arrival allowances of the alternate fuel (ICAO Annex 6 Part I: "perform a missed approach at the
 * destination ... conduct the approach and landing at the destination alternate", from memory).
 */
export interface ReserveArrival {
  /** Missed approach at the destination before the alternate: set fuel, or time at the takeoff rating, Mach 0. */
  readonly missedApproach: ReserveAllowance;
  /** Approach and landing at the alternate: set fuel, or time at the flightIdle fuel flow at Mach 0.2. */
  readonly alternateApproach: ReserveAllowance;
}

/** Settings every reserve preset shares; absent = the defaults of engine/mission/reserveRules.ts. */
export interface ReserveCommon {
  /** Arrival allowances of the alternate; absent = the mission's take-off and approach allowances (common practice). */
  readonly arrival?: ReserveArrival;
  /** Speed of the contingency and final-reserve holds; absent = best endurance at 1.1 x the minimum-drag speed (common practice). */
  readonly holdSpeed?: HoldSpeed;
}

export type CruiseProfile =
  | { readonly kind: 'constantAltitude' }
  | { readonly kind: 'stepClimb'; readonly step_m: number; readonly maxAltitude_m: number }
  | { readonly kind: 'cruiseClimb'; readonly maxAltitude_m: number };

export type Leg = LegEnvironment & { readonly name: string } & (
    | { readonly kind: 'taxiOut'; readonly time_s: number; readonly fuelFlow_kg_s: number | 'idle' }
    | { readonly kind: 'takeoff'; readonly fuel_kg: number | null; readonly time_s: number }
    | {
        readonly kind: 'climb';
        readonly toAltitude_m: number;
        readonly schedule: SpeedSchedule;
        readonly rating: RatingName;
      }
    | {
        readonly kind: 'cruise';
        readonly altitude_m: number;
        readonly speed: CruiseSpeed;
        readonly profile: CruiseProfile;
        /** Distance of this leg (m) in the mission's distance basis (over the ground by default); null = solved so the mission meets its range. At most one cruise leg is null. */
        readonly distance_m: number | null;
      }
    | {
        readonly kind: 'descent';
        readonly toAltitude_m: number;
        readonly schedule: SpeedSchedule;
        readonly mode: { readonly kind: 'idle' } | { readonly kind: 'rate'; readonly rate_m_s: number };
      }
    | {
        readonly kind: 'hold';
        readonly altitude_m: number;
        readonly time_s: number;
        readonly speed: HoldSpeed;
      }
    | { readonly kind: 'approach'; readonly time_s: number; readonly fuel_kg: number | null }
    | { readonly kind: 'taxiIn'; readonly time_s: number; readonly fuelFlow_kg_s: number | 'idle' }
  );

export type LegKind = Leg['kind'];

/**
 * What a mission's distances (the range, a cruise leg's set distance, the alternate's distance) measure:
 * - 'ground': over the ground, as between two aerodromes; the air distance, the fuel and the time follow
 *   each leg's wind (default);
 * - 'stillAir': in still air, for design-range studies; the wind then changes only the ground distance
 *   reported, and every result says so.
 */
export type DistanceBasis = 'ground' | 'stillAir';

/** How the alternate is flown: climb, cruise, descent with the same engine and airframe. */
export interface AlternateSpec {
  /** Distance from the destination to the alternate (m) in the mission's distance basis. */
  readonly distance_m: number;
  readonly cruiseAltitude_m: number;
  readonly cruiseMach: number;
  /** Elevation of the alternate aerodrome (m); the final-reserve hold is 1,500 ft above it. */
  readonly elevation_m: number;
  /** Along-track wind on the way to the alternate (m/s, + tailwind); absent = the mission's wind. */
  readonly wind_m_s?: number;
}

export type ReservePolicy = ReserveCommon &
  (
  | {
      /** ICAO Annex 6 Part I, 4.3.6.3 style: contingency, alternate, final reserve. */
      readonly preset: 'icaoAnnex6';
      readonly contingencyFraction: number;
      readonly minContingency_s: number;
      readonly alternate: AlternateSpec | null;
      readonly finalReserve_s: number;
    }
  | {
      /** 14 CFR 121.639: fly to the destination, then the most distant alternate, then 45 min at normal cruise fuel consumption. */
      readonly preset: 'cfr121_639';
      readonly alternate: AlternateSpec | null;
      readonly finalReserve_s: number;
    }
  | {
      /** 14 CFR 121.645(b): plus 10 % of the en-route flight time, alternate, and 30 min holding at 1,500 ft above the alternate. */
      readonly preset: 'cfr121_645';
      readonly enRouteFraction: number;
      readonly alternate: AlternateSpec | null;
      readonly finalReserve_s: number;
    }
  | {
      readonly preset: 'custom';
      readonly contingencyFraction: number;
      readonly alternate: AlternateSpec | null;
      readonly finalReserve_s: number;
      readonly extraFuel_kg: number;
    }
  );

export type SolveMode =
  | { readonly kind: 'takeoffWeight'; readonly takeoffMass_kg: number; readonly payload_kg: number }
  | { readonly kind: 'payloadRange'; readonly payload_kg: number; readonly range_m: number }
  | { readonly kind: 'maxRange'; readonly payload_kg: number };

export interface MissionInput {
  readonly airframe: Airframe;
  /** Polar including the active inlet's external drag increment. */
  readonly aero: AeroModel;
  readonly propulsion: PropulsionModel;
  readonly legs: readonly Leg[];
  readonly reserves: ReservePolicy;
  readonly solve: SolveMode;
  readonly cautionSettings: CautionSettings;
  /** Mission-wide ISA deviation (K) and along-track wind (m/s, + tailwind). */
  readonly isaDev_K: number;
  readonly wind_m_s: number;
  /** What the distances measure; absent = 'ground'. */
  readonly distanceBasis?: DistanceBasis;
  /**
   * Elevation of the destination aerodrome (m, pressure altitude); absent = 0 m (sea level). The approach
   * allowance ends the trip at it, taxi in is flown at it, the reserves' holds "1,500 ft above the destination"
   * and the alternate start from it.
   */
  readonly destinationElevation_m?: number;
}

export interface LegRow {
  readonly index: number;
  readonly name: string;
  readonly kind: LegKind | 'reserve';
  readonly startTime_s: number;
  readonly endTime_s: number;
  /** Still-air distance (m) from block-out (reserve items: from the start of the reserves). */
  readonly startDistance_m: number;
  readonly endDistance_m: number;
  /** Ground distance (m), counted like the still-air distance. */
  readonly startGroundDistance_m: number;
  readonly endGroundDistance_m: number;
  readonly startAltitude_m: number;
  readonly endAltitude_m: number;
  readonly startMass_kg: number;
  readonly endMass_kg: number;
  readonly fuel_kg: number;
}

/** Time history, one sample per integrator step, columns as typed arrays. */
export interface TimeHistory {
  readonly time_s: Float64Array;
  readonly distance_m: Float64Array;
  readonly altitude_m: Float64Array;
  readonly mach: Float64Array;
  readonly cas_m_s: Float64Array;
  readonly tas_m_s: Float64Array;
  readonly mass_kg: Float64Array;
  readonly thrustAvailable_N: Float64Array;
  readonly thrustUsed_N: Float64Array;
  readonly drag_N: Float64Array;
  readonly fuelFlow_kg_s: Float64Array;
  readonly cl: Float64Array;
  readonly liftToDrag: Float64Array;
  readonly climbRate_m_s: Float64Array;
  /** Leg index of each sample. */
  readonly legIndex: Int32Array;
}

export interface ReserveBreakdown {
  readonly contingency_kg: number;
  /** Alternate fuel: missed approach at the destination + climb, cruise, descent + approach and landing at the alternate. */
  readonly alternate_kg: number;
  /** The two arrival allowances inside alternate_kg. */
  readonly missedApproach_kg: number;
  readonly alternateApproach_kg: number;
  readonly finalReserve_kg: number;
  readonly extra_kg: number;
  readonly total_kg: number;
}

/**
 * How a mission ended. Only 'ok' is a flight that reaches its destination
 * within the hard limits; each other status has a sentence in
 * MissionResult.statusMessage and a class in missionStatus.ts.
 */
export type MissionStatus =
  | 'ok'
  | 'did_not_converge'
  | 'fuel_exhausted'
  | 'thrust_below_drag'
  | 'climb_not_reached'
  | 'infeasible'
  /** Ground speed <= 0 on a leg that must advance: the destination cannot be reached. */
  | 'no_ground_progress'
  /** The flight would leave the altitudes or speeds the atmosphere, polar and deck cover. */
  | 'outside_model_range'
  /** Hard limits: flown, but take-off above MTOW, fuel above the tanks' capacity, or landing above MLW. */
  | 'above_mtow'
  | 'fuel_above_capacity'
  | 'landing_above_mlw'
  /** A fault inside the solver (a bug): the leg and what was being done are in the message. */
  | 'internal_error';

/**
 * Where a fuel iteration starts (solveMission's `options.warmStart`): what a neighbouring mission's converged solve
 * returned (`MissionResult.warmStart`), so an analysis or a sweep solving missions one after another starts each
 * from the last. Every field is optional; an absent or invalid field falls back to the cold start.
 */
export interface MissionStart {
  /** payloadRange: the first pass's ramp mass (kg), e.g. the neighbour's converged ramp mass. */
  readonly rampMass_kg?: number;
  /** Fixed ramp mass (maxRange, takeoffWeight with a solvable leg): the first pass's solvable-leg distance (m, mission's basis). */
  readonly distance_m?: number;
  /**
   * The second pass's slope: d(residual)/d(ramp mass) (-) in payloadRange, d(residual)/d(distance) (kg/m) with a
   * fixed ramp mass; the neighbour's last secant slope.
   */
  readonly slope?: number;
  /**
   * payloadRange: how the residual bends with the ramp mass, d2(residual)/d(ramp mass)2 (1/kg), from the neighbour's
   * last three passes; the second pass steps on the parabola it gives instead of the tangent.
   */
  readonly curvature_per_kg?: number;
  /**
   * The neighbour's last secant slope over a model slope of its converged pass: in payloadRange the power-law slope
   * (fuelIteration.ts powerLawSensitivity), with a fixed ramp mass minus the fuel per metre at the solvable leg's end.
   */
  readonly slopeFactor?: number;
  /**
   * The distance after the solvable cruise leg (m, mission's basis: the descent and what follows) as a linear
   * function of the mass at the leg's end (the predicted top of descent): at `mass_kg` it is `distance_m`, and it
   * grows by `perKg_m` per kg.
   */
  readonly afterSolvable?: { readonly mass_kg: number; readonly distance_m: number; readonly perKg_m: number };
}

export interface MissionResult {
  readonly status: MissionStatus;
  /** Human-readable reason when status is not 'ok' (SI text; statusParts for display). */
  readonly statusMessage: string;
  /** The reason with its numbers as quantities (messageText(parts, units)); empty when ok. */
  readonly statusParts?: MessageParts;
  readonly blockFuel_kg: number;
  readonly blockTime_s: number;
  readonly tripFuel_kg: number;
  readonly tripTime_s: number;
  readonly reserveFuel_kg: number;
  readonly reserves: ReserveBreakdown;
  readonly takeoffMass_kg: number;
  readonly rampMass_kg: number;
  readonly landingMass_kg: number;
  readonly zeroFuelMass_kg: number;
  readonly payload_kg: number;
  /** Still-air and ground distance of the trip (m). */
  readonly airDistance_m: number;
  readonly groundDistance_m: number;
  /** What the range and the set distances measured (MissionInput.distanceBasis); 'stillAir' = a design-range study. */
  readonly distanceBasis: DistanceBasis;
  readonly legs: readonly LegRow[];
  readonly history: TimeHistory;
  readonly cautions: readonly Caution[];
  /** Fuel-iteration report (solve modes b and c). */
  readonly iterations: number;
  readonly residual_kg: number;
  /** Where a neighbouring mission's fuel iteration can start (solveMission's options.warmStart); set when the iteration converged. */
  readonly warmStart?: MissionStart;
}
