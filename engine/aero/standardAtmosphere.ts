/**
 * The standard atmosphere by pressure altitude (geopotential), with an ISA
 * temperature deviation. Layers and lapse rates of the U.S. Standard
 * Atmosphere, 1976 (NOAA-S/T 76-1562, Table 4), identical to the ICAO
 * Standard Atmosphere (Doc 7488/3) to 32 km; hydrostatic pressure per layer
 * (ibid., equations 33a and 33b).
 */
import { sameNumber } from '../core/sameNumber';
import { err, ok, type Result } from '../core/result';
import { g0, gamma, M0_KG_KMOL, p0, r0_m, R_air, R_STAR_J_KMOL_K, rho0, T0 } from './constants';

export interface AtmosphereState {
  /** Geopotential pressure altitude (m). */
  readonly pressureAltitude_m: number;
  /** Temperature deviation from ISA (K). */
  readonly isaDev_K: number;
  /** Ambient static temperature including the deviation (K). */
  readonly temperature_K: number;
  /** Ambient static pressure (Pa); unaffected by the deviation. */
  readonly pressure_Pa: number;
  readonly density_kg_m3: number;
  readonly speedOfSound_m_s: number;
  /** T / T0 including the deviation (-). */
  readonly theta: number;
  /** p / p0 (-). */
  readonly delta: number;
  /** rho / rho0 (-). */
  readonly sigma: number;
  /** ISA temperature at this pressure altitude (K). */
  readonly isaTemperature_K: number;
}

export type AtmosphereError =
  | {
      readonly code: 'altitude_out_of_range';
      readonly altitude_m: number;
      readonly min_m: number;
      readonly max_m: number;
      readonly message: string;
    }
  | {
      readonly code: 'pressure_out_of_range';
      readonly pressure_Pa: number;
      readonly min_Pa: number;
      readonly max_Pa: number;
      readonly message: string;
    }
  | {
      readonly code: 'isa_dev_out_of_range';
      readonly isaDev_K: number;
      readonly min_K: number;
      readonly max_K: number;
      readonly message: string;
    }
  | { readonly code: 'not_finite'; readonly message: string };

/**
 * Lowest pressure altitude served (m): the bottom of the 1976 tables,
 * geometric -5,000 m, as geopotential altitude (-5,003.94 m).
 */
export const MIN_PRESSURE_ALTITUDE_M = (r0_m * -5000) / (r0_m - 5000);
/** Highest pressure altitude served (m), the top of the 1976 standard's 51-71 km layer. */
export const MAX_PRESSURE_ALTITUDE_M = 71000;

/**
 * ISA deviations accepted (K). Wider than any observed atmosphere (surface
 * records lie within about -80 K and +60 K of ISA; common practice), and
 * keeps the temperature positive everywhere in the altitude range.
 */
export const MIN_ISA_DEV_K = -100;
export const MAX_ISA_DEV_K = 100;

/** Layer base geopotential altitudes (m) and lapse rates (K/m), 1976 Table 4. */
const BASE_H = [0, 11000, 20000, 32000, 47000, 51000, 71000] as const;
const LAPSE = [-0.0065, 0, 0.001, 0.0028, 0, -0.0028, -0.002] as const;
/** Pressure altitudes (m) where the 1976 lapse rate changes (the layer bases above sea level, Table 4), ascending. */
export const ISA_LAPSE_BREAKS_M: readonly number[] = Object.freeze(BASE_H.slice(1, -1));
/**
 * g0 M0 / R* (K/m): the hydrostatic constant of 1976 equations 33a/33b, with
 * the 1976 M0 so that layer-base pressures match Table 4 to its 7 digits.
 */
const GMR = (g0 * M0_KG_KMOL) / R_STAR_J_KMOL_K;

/** Layer base temperatures (K) and pressures (Pa), integrated up from sea level once. */
function layerBases(): { readonly t: readonly number[]; readonly p: readonly number[] } {
  const t = [T0];
  const p = [p0];
  for (let i = 1; i < BASE_H.length; i++) {
    const dh = BASE_H[i] - BASE_H[i - 1];
    const tb = t[i - 1]!;
    const pb = p[i - 1]!;
    const l = LAPSE[i - 1];
    t.push(tb + l * dh);
    p.push(l === 0 ? pb * Math.exp((-GMR * dh) / tb) : pb * Math.pow(tb / (tb + l * dh), GMR / l));
  }
  return { t, p };
}
const BASES = layerBases();
const BASE_T = BASES.t;
const BASE_P = BASES.p;

function layerIndex(h: number): number {
  // Below 0 the first layer is extended (the 1976 tables do so down to -5 km).
  let i = 0;
  while (i < BASE_H.length - 2 && h >= BASE_H[i + 1]) i++;
  return i;
}

/** ISA temperature lapse rate dT/dH (K/m) of the 1976 layer holding a pressure altitude (m); the lowest layer extends below sea level (1976 Table 4). */
export function isaLapseRate_K_m(pressureAltitude_m: number): number {
  return LAPSE[layerIndex(pressureAltitude_m)];
}

/** ISA temperature (K) at a geopotential altitude already known to be in range. */
function isaTemperature(h: number, i: number): number {
  return BASE_T[i]! + LAPSE[i] * (h - BASE_H[i]);
}

/** ISA pressure (Pa) at a geopotential altitude already known to be in range. */
function isaPressure(h: number, i: number): number {
  const l = LAPSE[i];
  const tb = BASE_T[i]!;
  const pb = BASE_P[i]!;
  if (l === 0) return pb * Math.exp((-GMR * (h - BASE_H[i])) / tb);
  return pb * Math.pow(tb / (tb + l * (h - BASE_H[i])), GMR / l);
}

/** Pressure (Pa) at the lowest and highest pressure altitude served. */
export const MAX_PRESSURE_PA = isaPressure(MIN_PRESSURE_ALTITUDE_M, 0);
export const MIN_PRESSURE_PA = isaPressure(MAX_PRESSURE_ALTITUDE_M, layerIndex(MAX_PRESSURE_ALTITUDE_M));

// One-entry memo of `atmosphere`'s answer in range, keyed by its two arguments alone (Object.is: -0 and 0 stay
// apart): a mission point asks the same altitude of the mission's air data, the drag polar and the installed
// engine in a row, and the state is a pure function of them, read-only, so sharing it cannot change any answer.
let memoAltitude_m = Number.NaN;
let memoIsaDev_K = Number.NaN;
let memoResult: Result<AtmosphereState, AtmosphereError> | null = null;

// A direct-mapped table of isaPressureAt's answers, keyed by the altitude's bits: the pressure is a pure function of
// the altitude, so an entry read back is the very number isaPressure returns (no rounding of the key, no
// interpolation). A mission asks a few dozen altitudes over and over (a climb's and a descent's altitude steps are
// the same in every fuel pass and for every mass), each one a pow or exp; the drag asks it at every right-hand side.
// -0 and 0 share an entry: both give the sea-level layer's pressure from h - 0 = +-0, the same bits.
const PRESSURE_SLOT_BITS = 8;
const PRESSURE_SLOTS = 1 << PRESSURE_SLOT_BITS;
const pressureKeys = new Float64Array(PRESSURE_SLOTS).fill(Number.NaN);
const pressureValues = new Float64Array(PRESSURE_SLOTS);
const keyBits = new Float64Array(1);
const keyWords = new Int32Array(keyBits.buffer);

/**
 * Static pressure (Pa) of the standard atmosphere at a pressure altitude (m):
 * `atmosphere(h).pressure_Pa` (the same arithmetic, the same bits) without the
 * state object, for hot paths; NaN where `atmosphere` would refuse the altitude.
 */
export function isaPressureAt(pressureAltitude_m: number): number {
  keyBits[0] = pressureAltitude_m;
  // Fibonacci hashing of the two 32-bit words (Knuth, TAOCP vol. 3, 6.4; the multiplier 2^32 / golden ratio).
  const slot = Math.imul(keyWords[0]! ^ keyWords[1]!, 0x9e3779b1) >>> (32 - PRESSURE_SLOT_BITS);
  if (pressureKeys[slot] === pressureAltitude_m) return pressureValues[slot]!;
  if (!(pressureAltitude_m >= MIN_PRESSURE_ALTITUDE_M && pressureAltitude_m <= MAX_PRESSURE_ALTITUDE_M)) return Number.NaN;
  const pressure_Pa = isaPressure(pressureAltitude_m, layerIndex(pressureAltitude_m));
  pressureKeys[slot] = pressureAltitude_m;
  pressureValues[slot] = pressure_Pa;
  return pressure_Pa;
}


/**
 * The atmosphere at a geopotential pressure altitude (m), -5,003.9 m to
 * 71,000 m, with an ISA temperature deviation (K, default 0; -100 K to
 * +100 K). The deviation
 * changes temperature, density and speed of sound, not pressure. Source:
 * U.S. Standard Atmosphere 1976 (= ICAO Doc 7488/3 to 32 km).
 */
export function atmosphere(pressureAltitude_m: number, isaDev_K = 0): Result<AtmosphereState, AtmosphereError> {
  if (!Number.isFinite(pressureAltitude_m) || !Number.isFinite(isaDev_K)) {
    return err({
      code: 'not_finite',
      message: `atmosphere needs a finite pressure altitude and ISA deviation, got ${pressureAltitude_m} m and ${isaDev_K} K`,
    });
  }
  if (pressureAltitude_m < MIN_PRESSURE_ALTITUDE_M || pressureAltitude_m > MAX_PRESSURE_ALTITUDE_M) {
    return err({
      code: 'altitude_out_of_range',
      altitude_m: pressureAltitude_m,
      min_m: MIN_PRESSURE_ALTITUDE_M,
      max_m: MAX_PRESSURE_ALTITUDE_M,
      message: `pressure altitude ${pressureAltitude_m} m is outside the standard atmosphere's range ${MIN_PRESSURE_ALTITUDE_M.toFixed(0)} m to ${MAX_PRESSURE_ALTITUDE_M} m`,
    });
  }
  if (isaDev_K < MIN_ISA_DEV_K || isaDev_K > MAX_ISA_DEV_K) {
    return err({
      code: 'isa_dev_out_of_range',
      isaDev_K,
      min_K: MIN_ISA_DEV_K,
      max_K: MAX_ISA_DEV_K,
      message: `ISA deviation ${isaDev_K} K is outside ${MIN_ISA_DEV_K} K to +${MAX_ISA_DEV_K} K`,
    });
  }
  if (memoResult !== null && sameNumber(pressureAltitude_m, memoAltitude_m) && sameNumber(isaDev_K, memoIsaDev_K)) return memoResult;
  const i = layerIndex(pressureAltitude_m);
  const isaTemperature_K = isaTemperature(pressureAltitude_m, i);
  const temperature_K = isaTemperature_K + isaDev_K;
  const pressure_Pa = isaPressureAt(pressureAltitude_m);
  const density_kg_m3 = pressure_Pa / (R_air * temperature_K);
  const state: AtmosphereState = {
    pressureAltitude_m,
    isaDev_K,
    temperature_K,
    pressure_Pa,
    density_kg_m3,
    speedOfSound_m_s: Math.sqrt(gamma * R_air * temperature_K),
    theta: temperature_K / T0,
    delta: pressure_Pa / p0,
    sigma: density_kg_m3 / rho0,
    isaTemperature_K,
  };
  memoAltitude_m = pressureAltitude_m;
  memoIsaDev_K = isaDev_K;
  memoResult = ok(state);
  return memoResult;
}

/**
 * The geopotential pressure altitude (m) at which the standard atmosphere has
 * this static pressure (Pa); the exact inverse of `atmosphere`'s pressure
 * (1976 equations 33a/33b solved for H). Range: the pressures at 71,000 m
 * and -5,003.9 m.
 */
export function pressureAltitude(pressure_Pa: number): Result<number, AtmosphereError> {
  if (!Number.isFinite(pressure_Pa)) {
    return err({ code: 'not_finite', message: `pressure altitude needs a finite pressure, got ${pressure_Pa} Pa` });
  }
  if (pressure_Pa < MIN_PRESSURE_PA || pressure_Pa > MAX_PRESSURE_PA) {
    return err({
      code: 'pressure_out_of_range',
      pressure_Pa,
      min_Pa: MIN_PRESSURE_PA,
      max_Pa: MAX_PRESSURE_PA,
      message: `pressure ${pressure_Pa} Pa is outside the standard atmosphere's range ${MIN_PRESSURE_PA.toPrecision(4)} Pa to ${MAX_PRESSURE_PA.toPrecision(6)} Pa (${MAX_PRESSURE_ALTITUDE_M} m to ${MIN_PRESSURE_ALTITUDE_M.toFixed(0)} m)`,
    });
  }
  let i = 0;
  while (i < BASE_H.length - 2 && pressure_Pa <= BASE_P[i + 1]!) i++;
  const l = LAPSE[i];
  const tb = BASE_T[i]!;
  const pb = BASE_P[i]!;
  const h =
    l === 0
      ? BASE_H[i] - (tb / GMR) * Math.log(pressure_Pa / pb)
      : BASE_H[i] + (tb / l) * (Math.pow(pressure_Pa / pb, -l / GMR) - 1);
  return ok(h);
}

/** Geopotential altitude H (m) from geometric altitude z (m): H = r0 z / (r0 + z) (1976 eq. 18). */
export function geopotentialFromGeometric(geometric_m: number): number {
  return (r0_m * geometric_m) / (r0_m + geometric_m);
}

/** Geometric altitude z (m) from geopotential altitude H (m): z = r0 H / (r0 - H) (1976 eq. 19). */
export function geometricFromGeopotential(geopotential_m: number): number {
  return (r0_m * geopotential_m) / (r0_m - geopotential_m);
}
