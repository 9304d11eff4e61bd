/**
 * Airspeed relations for a pitot-static system in compressible flow:
 * calibrated (CAS), equivalent (EAS) and true (TAS) airspeed and Mach.
 * Subsonic: isentropic impact pressure; supersonic: Rayleigh pitot formula
 * (normal shock ahead of the probe). Source: NACA Report 1135 (1953),
 * equations 44/48 and 100; CAS definitions as in any airspeed text (e.g.
 * Gracey, NASA RP-1046, "Measurement of Aircraft Speed and Altitude").
 * gamma = 1.4 throughout.
 */
import { brent } from '../core/rootFind';
import { err, ok, type Result } from '../core/result';
import { a0, gamma, p0, R_air } from './constants';
import { pressureAltitude, type AtmosphereError, type AtmosphereState } from './standardAtmosphere';

const G1 = (gamma - 1) / 2;
const EXP = gamma / (gamma - 1);
/** qc/p at Mach 1: (1 + (gamma-1)/2)^(gamma/(gamma-1)) - 1 = 0.892929. */
const SONIC_IMPACT_RATIO = Math.pow(1 + G1, EXP) - 1;

function requireMach(mach: number, what: string): void {
  if (!(mach >= 0) || !Number.isFinite(mach)) throw new RangeError(`${what}: Mach must be finite and >= 0, got ${mach}`);
}

function requirePositive(value: number, name: string, what: string): void {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${what}: ${name} must be finite and > 0, got ${value}`);
}

/**
 * Impact-pressure ratio qc/p at a Mach number (-). M <= 1: (1 + 0.2 M^2)^3.5 - 1
 * (NACA 1135 eq. 44); M > 1: Rayleigh pitot formula (NACA 1135 eq. 100) minus 1.
 */
export function impactPressureRatio(mach: number): number {
  requireMach(mach, 'impactPressureRatio');
  // expm1/log1p keep full relative precision at low Mach, where the ratio is about 0.7 M^2.
  if (mach <= 1) return Math.expm1(EXP * Math.log1p(G1 * mach * mach));
  const m2 = mach * mach;
  const a = Math.pow(((gamma + 1) * (gamma + 1) * m2) / (4 * gamma * m2 - 2 * (gamma - 1)), EXP);
  return (a * (1 - gamma + 2 * gamma * m2)) / (gamma + 1) - 1;
}

/**
 * Mach number (-) whose impact-pressure ratio qc/p is `ratio` (>= 0): the
 * subsonic branch in closed form, the supersonic (Rayleigh) branch by Brent's
 * method. Inverse of impactPressureRatio.
 */
export function machFromImpactPressureRatio(ratio: number): number {
  if (!(ratio >= 0) || !Number.isFinite(ratio)) {
    throw new RangeError(`machFromImpactPressureRatio: ratio must be finite and >= 0, got ${ratio}`);
  }
  if (ratio <= SONIC_IMPACT_RATIO) return Math.sqrt(Math.expm1(Math.log1p(ratio) / EXP) / G1);
  // (qc/p + 1) / M^2 falls from 1.893 at M = 1 towards 1.2904 as M grows, so this bounds the root.
  const hi = Math.sqrt((ratio + 1) / 1.2) + 1;
  const root = brent((m) => impactPressureRatio(m) - ratio, 1, hi, { xTol: 1e-14 });
  if (!root.ok) throw new Error(`machFromImpactPressureRatio(${ratio}): ${root.error.message}`);
  return root.value.x;
}

/** Impact pressure qc = pt - p (Pa) at a Mach number and static pressure (Pa) (NACA 1135 eqs. 44, 100). */
export function impactPressure_Pa(mach: number, pressure_Pa: number): number {
  requirePositive(pressure_Pa, 'pressure', 'impactPressure_Pa');
  return pressure_Pa * impactPressureRatio(mach);
}

/** Dynamic pressure q = rho V^2 / 2 = (gamma/2) p M^2 = 0.7 p M^2 (Pa) (NACA 1135 eq. 48). */
export function dynamicPressure_Pa(mach: number, pressure_Pa: number): number {
  requireMach(mach, 'dynamicPressure_Pa');
  requirePositive(pressure_Pa, 'pressure', 'dynamicPressure_Pa');
  return 0.5 * gamma * pressure_Pa * mach * mach;
}

/**
 * Calibrated airspeed (m/s) at a Mach number and static pressure (Pa): the
 * sea-level-standard speed giving the same impact pressure (a0 = 340.294 m/s,
 * p0 = 101325 Pa); above a0 the Rayleigh pitot branch applies.
 */
export function casFromMach(mach: number, pressure_Pa: number): number {
  const qc = impactPressure_Pa(mach, pressure_Pa);
  return a0 * machFromImpactPressureRatio(qc / p0);
}

/** Mach number (-) at a calibrated airspeed (m/s, >= 0) and static pressure (Pa); inverse of casFromMach. */
export function machFromCas(cas_m_s: number, pressure_Pa: number): number {
  requirePositive(pressure_Pa, 'pressure', 'machFromCas');
  if (!(cas_m_s >= 0) || !Number.isFinite(cas_m_s)) throw new RangeError(`machFromCas: CAS must be finite and >= 0, got ${cas_m_s}`);
  const qc = p0 * impactPressureRatio(cas_m_s / a0);
  return machFromImpactPressureRatio(qc / pressure_Pa);
}

/** Equivalent airspeed EAS = TAS sqrt(sigma) = a0 M sqrt(delta) (m/s) (NACA 1135 eq. 48 with q = rho0 EAS^2 / 2). */
export function easFromMach(mach: number, pressure_Pa: number): number {
  requireMach(mach, 'easFromMach');
  requirePositive(pressure_Pa, 'pressure', 'easFromMach');
  return a0 * mach * Math.sqrt(pressure_Pa / p0);
}

/** Mach number (-) at an equivalent airspeed (m/s) and static pressure (Pa); inverse of easFromMach. */
export function machFromEas(eas_m_s: number, pressure_Pa: number): number {
  requirePositive(pressure_Pa, 'pressure', 'machFromEas');
  if (!(eas_m_s >= 0) || !Number.isFinite(eas_m_s)) throw new RangeError(`machFromEas: EAS must be finite and >= 0, got ${eas_m_s}`);
  return eas_m_s / (a0 * Math.sqrt(pressure_Pa / p0));
}

/** True airspeed TAS = M sqrt(gamma R T) (m/s) at a static temperature (K). */
export function tasFromMach(mach: number, temperature_K: number): number {
  requireMach(mach, 'tasFromMach');
  requirePositive(temperature_K, 'temperature', 'tasFromMach');
  return mach * Math.sqrt(gamma * R_air * temperature_K);
}

/** Mach number (-) at a true airspeed (m/s) and static temperature (K); inverse of tasFromMach. */
export function machFromTas(tas_m_s: number, temperature_K: number): number {
  requirePositive(temperature_K, 'temperature', 'machFromTas');
  if (!(tas_m_s >= 0) || !Number.isFinite(tas_m_s)) throw new RangeError(`machFromTas: TAS must be finite and >= 0, got ${tas_m_s}`);
  return tas_m_s / Math.sqrt(gamma * R_air * temperature_K);
}

export type SpeedInput =
  | { readonly cas_m_s: number }
  | { readonly eas_m_s: number }
  | { readonly tas_m_s: number }
  | { readonly mach: number };

export interface Airspeeds {
  readonly mach: number;
  readonly cas_m_s: number;
  readonly eas_m_s: number;
  readonly tas_m_s: number;
  /** 0.7 p M^2 (Pa). */
  readonly dynamicPressure_Pa: number;
  /** pt - p as a pitot would read it (Pa). */
  readonly impactPressure_Pa: number;
}

export interface AirspeedError {
  readonly code: 'invalid_speed';
  readonly message: string;
}

function speedOf(speed: SpeedInput): { name: string; value: number } {
  if ('cas_m_s' in speed) return { name: 'CAS', value: speed.cas_m_s };
  if ('eas_m_s' in speed) return { name: 'EAS', value: speed.eas_m_s };
  if ('tas_m_s' in speed) return { name: 'TAS', value: speed.tas_m_s };
  return { name: 'Mach', value: speed.mach };
}

/**
 * All airspeeds at an atmosphere state, from any one of CAS, EAS, TAS (m/s)
 * or Mach. Speeds must be finite and >= 0. Relations: NACA Report 1135.
 */
export function airspeedsAt(state: AtmosphereState, speed: SpeedInput): Result<Airspeeds, AirspeedError> {
  const { name, value } = speedOf(speed);
  if (!Number.isFinite(value) || value < 0) {
    return err({ code: 'invalid_speed', message: `${name} must be a finite number >= 0, got ${value}` });
  }
  const p = state.pressure_Pa;
  let mach: number;
  if ('cas_m_s' in speed) mach = machFromCas(speed.cas_m_s, p);
  else if ('eas_m_s' in speed) mach = machFromEas(speed.eas_m_s, p);
  else if ('tas_m_s' in speed) mach = machFromTas(speed.tas_m_s, state.temperature_K);
  else mach = speed.mach;
  const qc = impactPressure_Pa(mach, p);
  return ok({
    mach,
    cas_m_s: 'cas_m_s' in speed ? speed.cas_m_s : a0 * machFromImpactPressureRatio(qc / p0),
    eas_m_s: 'eas_m_s' in speed ? speed.eas_m_s : easFromMach(mach, p),
    tas_m_s: 'tas_m_s' in speed ? speed.tas_m_s : tasFromMach(mach, state.temperature_K),
    dynamicPressure_Pa: dynamicPressure_Pa(mach, p),
    impactPressure_Pa: qc,
  });
}

/**
 * The pressure altitude (m) where a CAS (m/s) and a Mach number (-) give the
 * same TAS, i.e. the same impact pressure: p = qc(CAS at sea level) / (qc/p)(M).
 * Independent of ISA deviation. Above it a CAS/Mach schedule flies the Mach.
 */
export function casMachTransitionAltitude(cas_m_s: number, mach: number): Result<number, AirspeedError | AtmosphereError> {
  if (!(cas_m_s > 0) || !Number.isFinite(cas_m_s) || !(mach > 0) || !Number.isFinite(mach)) {
    return err({ code: 'invalid_speed', message: `CAS and Mach must be finite and > 0, got ${cas_m_s} m/s and M ${mach}` });
  }
  const qc = p0 * impactPressureRatio(cas_m_s / a0);
  return pressureAltitude(qc / impactPressureRatio(mach));
}
