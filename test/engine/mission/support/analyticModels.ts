/**
 * Small analytic models implementing AeroModel and PropulsionModel for the
 * mission tests, mirrored exactly by test/reference/missionReference.py:
 * - constant-L/D airframe: drag = n m g0 / (L/D) at any speed (makes the
 *   Breguet range and endurance equations exact);
 * - parabolic polar: CD = CD0 + K CL^2, q = 0.7 p M^2 (ISA pressure);
 * - engines with constant TSFC c (kg/(N s)) and thrust = T0 * rating factor
 *   * (rho/rho0)^lapseExponent (density lapse, common practice).
 */
import type { AeroModel, DragBreakdown, DragQuery } from '../../../../engine/aero/aeroModel';
import { missionAir } from '../../../../engine/mission/missionAtmosphere';
import type {
  FlightCondition,
  InstalledPoint,
  PartPowerPoint,
  PropulsionModel,
  RatingName,
} from '../../../../engine/propulsion/propulsionModel';
import type { Caution } from '../../../../engine/cautions/caution';

const G0 = 9.80665;

export interface AeroOptions {
  readonly wingArea_m2?: number;
  readonly clMax?: number;
  readonly buffetCl?: number;
  /** Polar tables reported as left (to test the caution pass-through). */
  readonly outsideTables?: readonly string[];
}

function breakdown(q: DragQuery, cd: number, cd0: number, area: number, liftToDrag: number | null, opts: AeroOptions): DragBreakdown {
  const p = missionAir(q.altitude_m, 0).pressure_Pa;
  const dyn = 0.7 * p * q.mach * q.mach;
  const lift = q.loadFactor * q.mass_kg * G0;
  const cl = dyn > 0 ? lift / (dyn * area) : 0;
  const drag = liftToDrag !== null ? lift / liftToDrag : dyn * area * cd;
  const buffetCl = opts.buffetCl ?? 0.8;
  return {
    cl,
    cd: liftToDrag !== null ? cl / liftToDrag : cd,
    cd0,
    cdIncrement: 0,
    cdInduced: liftToDrag !== null ? 0 : cd - cd0,
    cdWave: 0,
    q_Pa: dyn,
    drag_N: drag,
    liftToDrag: liftToDrag ?? (cd > 0 ? cl / cd : 0),
    buffetCl,
    buffetLoadFactor: cl > 0 ? buffetCl / cl : 99,
    clMax: opts.clMax ?? 1.5,
    outsideTables: opts.outsideTables ?? [],
  };
}

/** Drag = n m g0 / liftToDrag whatever the speed. */
export function constantLiftToDragAero(liftToDrag: number, opts: AeroOptions = {}): AeroModel {
  const area = opts.wingArea_m2 ?? 100;
  return {
    wingArea_m2: area,
    drag: (q) => breakdown(q, 0, 0, area, liftToDrag, opts),
    withIncrement: () => constantLiftToDragAero(liftToDrag, opts),
  };
}

/** CD = CD0 + K CL^2 on wing area S. */
export function parabolicAero(cd0: number, k: number, opts: AeroOptions = {}): AeroModel {
  const area = opts.wingArea_m2 ?? 100;
  const model: AeroModel = {
    wingArea_m2: area,
    drag: (q) => {
      const p = missionAir(q.altitude_m, 0).pressure_Pa;
      const dyn = 0.7 * p * q.mach * q.mach;
      const cl = dyn > 0 ? (q.loadFactor * q.mass_kg * G0) / (dyn * area) : 0;
      return breakdown(q, cd0 + k * cl * cl, cd0, area, null, opts);
    },
    withIncrement: (d) => parabolicAero(cd0 + d, k, opts),
  };
  return model;
}

export interface EngineOptions {
  /** Sea-level static maxClimb thrust, all engines (N). */
  readonly thrust0_N: number;
  /** TSFC (kg/(N s)), constant. */
  readonly tsfc_kg_N_s: number;
  /** Thrust proportional to (rho/rho0)^lapseExponent. */
  readonly lapseExponent: number;
  /** Rating factors on thrust0_N. */
  readonly ratings?: Partial<Record<RatingName, number>>;
  /** Cautions returned with every lookup (to test pass-through). */
  readonly cautions?: readonly Caution[];
  readonly throatMach?: number | null;
}

const DEFAULT_RATINGS: Record<RatingName, number> = {
  takeoff: 1.2,
  maxClimb: 1,
  maxCruise: 0.9,
  maxContinuous: 0.95,
  flightIdle: 0.05,
};

/** Installed engines with constant TSFC and a density thrust lapse. */
export function constantTsfcPropulsion(opts: EngineOptions): PropulsionModel {
  const ratings = { ...DEFAULT_RATINGS, ...(opts.ratings ?? {}) };
  const rho0 = 101325 / (287.05287 * 288.15);
  const ratingThrust = (c: FlightCondition, power: number) => {
    const rho = missionAir(c.altitude_m, c.isaDev_K).density_kg_m3;
    return opts.thrust0_N * power * Math.pow(rho / rho0, opts.lapseExponent);
  };
  // Literal fields, no object spreads: the bench flies these models thousands of times per mission.
  const point = (c: FlightCondition, power: number, thrust: number): InstalledPoint => ({
    altitude_m: c.altitude_m,
    mach: c.mach,
    isaDev_K: c.isaDev_K,
    power,
    thrust_N: thrust,
    fuelFlow_kg_s: opts.tsfc_kg_N_s * Math.max(thrust, 0),
    tsfc_kg_N_s: opts.tsfc_kg_N_s,
    perEngine: {
      uninstalledThrust_N: thrust,
      uninstalledFuelFlow_kg_s: opts.tsfc_kg_N_s * thrust,
      correctedThrust_N: thrust,
      spillageDrag_N: 0,
      thrust_N: thrust,
      fuelFlow_kg_s: opts.tsfc_kg_N_s * thrust,
      airflow_kg_s: null,
      recovery: 1,
      referenceRecovery: 1,
      massFlowRatio: null,
      throatMach: opts.throatMach ?? null,
      fanFaceMach: null,
      installationMethod: 'raymerCorrections',
      recoveryLoss_N: 0,
      bleedLoss_N: 0,
      extractionLoss_N: 0,
    },
    outsideTable: [],
    cautions: opts.cautions ?? [],
  });
  return {
    engineCount: 2,
    label: 'analytic test engines',
    parametric: true,
    installationMethod: 'raymerCorrections',
    inletName: 'none',
    atRating: (c, r) => point(c, ratings[r], ratingThrust(c, ratings[r])),
    atPower: (c, p) => point(c, p, ratingThrust(c, p)),
    forThrust: (c, required, ceiling = 'maxCruise'): PartPowerPoint => {
      const top = ratingThrust(c, ratings[ceiling]);
      const idle = ratingThrust(c, ratings.flightIdle);
      const limit: PartPowerPoint['limit'] = required > top ? 'above_rating' : required < idle ? 'below_idle' : 'within';
      const thrust = limit === 'above_rating' ? top : limit === 'below_idle' ? idle : required;
      const full = ratingThrust(c, 1);
      return Object.assign(point(c, full > 0 ? thrust / full : 0, thrust), { limit, thrustRequired_N: required });
    },
  };
}
