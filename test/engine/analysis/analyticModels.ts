/**
 * Small analytic models implementing the AeroModel and PropulsionModel
 * contracts, so the analyses can be checked against closed-form results:
 * a parabolic polar CD = CD0 + dCD0 + K CL^2 (+ an optional Lock fourth-power
 * drag rise) and either constant thrust or Mattingly's high-bypass lapse
 * alpha = delta0 (1 - 0.49 sqrt(M)) (Mattingly, Aircraft Engine Design,
 * 2nd ed., eq. 2.45a form, from memory), with constant TSFC.
 */
import type { AeroModel, DragBreakdown, DragQuery } from '../../../engine/aero/aeroModel';
import type {
  FlightCondition,
  InstalledPoint,
  PartPowerPoint,
  PropulsionModel,
  RatingName,
} from '../../../engine/propulsion/propulsionModel';

export const G0 = 9.80665;

/**
 * Static pressure (Pa) of the U.S. Standard Atmosphere 1976 at a
 * geopotential altitude (m), troposphere and lower stratosphere only
 * (p = p0 (T/T0)^(g0/(L R)) below 11 km, exponential above).
 */
export function isaPressure_Pa(h_m: number): number {
  const p0 = 101325;
  const T0 = 288.15;
  const L = 0.0065;
  const R = 287.05287;
  if (h_m <= 11000) return p0 * Math.pow(1 - (L * h_m) / T0, G0 / (L * R));
  const p11 = p0 * Math.pow(1 - (L * 11000) / T0, G0 / (L * R));
  return p11 * Math.exp((-G0 * (h_m - 11000)) / (R * 216.65));
}

export interface ParabolicPolar {
  readonly wingArea_m2: number;
  readonly cd0: number;
  readonly k: number;
  readonly clMax: number;
  /** Buffet-onset CL at M = 0; falls linearly by buffetSlope per unit Mach. */
  readonly buffetCl: number;
  readonly buffetSlope?: number;
  /** Drag-rise: cdWave = 20 (M - mCrit)^4 above mCrit (Lock); omitted = no wave drag. */
  readonly mCrit?: number;
}

export function parabolicAero(polar: ParabolicPolar, increment = 0): AeroModel {
  return {
    wingArea_m2: polar.wingArea_m2,
    drag(query: DragQuery): DragBreakdown {
      const p = isaPressure_Pa(query.altitude_m);
      const q = 0.7 * p * query.mach * query.mach;
      const cl = (query.loadFactor * query.mass_kg * G0) / (q * polar.wingArea_m2);
      const cdInduced = polar.k * cl * cl;
      const cdWave = polar.mCrit !== undefined && query.mach > polar.mCrit ? 20 * (query.mach - polar.mCrit) ** 4 : 0;
      const cd = polar.cd0 + increment + cdInduced + cdWave;
      const buffetCl = polar.buffetCl - (polar.buffetSlope ?? 0) * query.mach;
      return {
        cl,
        cd,
        cd0: polar.cd0,
        cdIncrement: increment,
        cdInduced,
        cdWave,
        q_Pa: q,
        drag_N: q * polar.wingArea_m2 * cd,
        liftToDrag: cl / cd,
        buffetCl,
        buffetLoadFactor: buffetCl / (cl / query.loadFactor),
        clMax: polar.clMax,
        outsideTables: [],
      };
    },
    withIncrement(deltaCd0: number): AeroModel {
      return parabolicAero(polar, increment + deltaCd0);
    },
  };
}

export interface AnalyticEngine {
  /** Whole-aircraft thrust at the rating: sea-level static value (N). */
  readonly thrust_N: number;
  /** 'constant': thrust independent of altitude and Mach; 'mattingly': alpha = delta0 (1 - 0.49 sqrt(M)). */
  readonly lapse: 'constant' | 'mattingly';
  /** Constant TSFC (kg/(N s)). */
  readonly tsfc_kg_N_s: number;
  /** Thrust multiplier for a recovery offset, e.g. Raymer's 1 + C_ram * dEta; fuel flow is held at the power setting. */
  readonly thrustScale?: number;
  /** Spillage drag subtracted from the thrust at every point, all engines (N). */
  readonly spillage_N?: number;
}

function ratingThrust(engine: AnalyticEngine, c: FlightCondition): number {
  const scale = engine.thrustScale ?? 1;
  if (engine.lapse === 'constant') return engine.thrust_N * scale;
  const delta = isaPressure_Pa(c.altitude_m) / 101325;
  const delta0 = delta * Math.pow(1 + 0.2 * c.mach * c.mach, 3.5);
  return engine.thrust_N * scale * delta0 * (1 - 0.49 * Math.sqrt(c.mach));
}

export function analyticPropulsion(engine: AnalyticEngine): PropulsionModel {
  const spill = engine.spillage_N ?? 0;
  const point = (c: FlightCondition, power: number): InstalledPoint => {
    const gross = ratingThrust(engine, c) * power;
    const thrust = gross - spill;
    const fuel = (engine.tsfc_kg_N_s * gross) / (engine.thrustScale ?? 1);
    return {
      ...c,
      power,
      thrust_N: thrust,
      fuelFlow_kg_s: fuel,
      tsfc_kg_N_s: thrust > 0 ? fuel / thrust : null,
      perEngine: {
        uninstalledThrust_N: gross / (engine.thrustScale ?? 1) / 2,
        uninstalledFuelFlow_kg_s: fuel / 2,
        correctedThrust_N: gross / 2,
        spillageDrag_N: spill / 2,
        thrust_N: thrust / 2,
        fuelFlow_kg_s: fuel / 2,
        airflow_kg_s: null,
        recovery: 1,
        referenceRecovery: 1,
        massFlowRatio: null,
        throatMach: null,
        fanFaceMach: null,
        installationMethod: 'raymerCorrections',
        recoveryLoss_N: 0,
        bleedLoss_N: 0,
        extractionLoss_N: 0,
      },
      outsideTable: [],
      cautions: [],
    };
  };
  const ratingPower = (r: RatingName) => (r === 'flightIdle' ? 0.05 : 1);
  return {
    engineCount: 2,
    label: `analytic ${engine.lapse}-thrust test engine`,
    parametric: true,
    installationMethod: 'raymerCorrections',
    inletName: 'analytic',
    atRating: (c, r) => point(c, ratingPower(r)),
    atPower: (c, p) => point(c, p),
    forThrust(c, required, ceiling = 'maxCruise'): PartPowerPoint {
      const full = ratingThrust(engine, c);
      const p = (required + spill) / full;
      const top = ratingPower(ceiling);
      const limit = p > top ? 'above_rating' : p < 0.05 ? 'below_idle' : 'within';
      const used = limit === 'above_rating' ? top : limit === 'below_idle' ? 0.05 : p;
      return { ...point(c, used), limit, thrustRequired_N: required };
    },
  };
}

/** An invented twin-jet-sized parabolic polar (demo numbers, not any real aircraft). */
export const TEST_POLAR: ParabolicPolar = {
  wingArea_m2: 90,
  cd0: 0.02,
  k: 0.045,
  clMax: 1.5,
  buffetCl: 0.9,
  buffetSlope: 0.3,
};
