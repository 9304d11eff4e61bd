/**
 * ISA temperature and pressure ratios at a pressure altitude, as needed by the
 * deck's temperature correction and the parametric deck. Layers and constants
 * of the U.S. Standard Atmosphere 1976 (identical to ICAO Doc 7488 to 32 km),
 * with the altitude read as geopotential (the definition of pressure altitude).
 */

/** Sea-level standard temperature (K) and pressure (Pa), U.S. Standard Atmosphere 1976. */
export const ISA_SEA_LEVEL_TEMPERATURE_K = 288.15;
export const ISA_SEA_LEVEL_PRESSURE_PA = 101325;

// g0 * M0 / R* (K/m): 9.80665 * 0.0289644 / 8.31432, U.S. Standard Atmosphere 1976.
const G_M_OVER_R = (9.80665 * 0.0289644) / 8.31432;
const BASE_M = [0, 11000, 20000, 32000, 47000, 51000, 71000, 84852];
const LAPSE_K_M = [-0.0065, 0, 0.001, 0.0028, 0, -0.0028, -0.002];
const BASE_T_K: number[] = [ISA_SEA_LEVEL_TEMPERATURE_K];
const BASE_DELTA: number[] = [1];
for (let i = 0; i < LAPSE_K_M.length; i++) {
  const dh = BASE_M[i + 1]! - BASE_M[i]!;
  const t0 = BASE_T_K[i]!;
  const lapse = LAPSE_K_M[i]!;
  const t1 = t0 + lapse * dh;
  BASE_T_K.push(t1);
  BASE_DELTA.push(BASE_DELTA[i]! * layerPressureRatio(t0, lapse, dh));
}

function layerPressureRatio(baseT_K: number, lapse_K_m: number, dh_m: number): number {
  if (lapse_K_m === 0) return Math.exp((-G_M_OVER_R * dh_m) / baseT_K);
  return Math.pow((baseT_K + lapse_K_m * dh_m) / baseT_K, -G_M_OVER_R / lapse_K_m);
}

function layerIndex(altitude_m: number): number {
  if (!(altitude_m >= -5000 && altitude_m <= 84852)) {
    throw new RangeError(`ISA: pressure altitude must be within -5000..84852 m, got ${altitude_m}`);
  }
  let i = 0;
  while (i < LAPSE_K_M.length - 1 && altitude_m > BASE_M[i + 1]!) i++;
  return i;
}

/** ISA static temperature (K) at pressure altitude -5 km..84.852 km (U.S. Standard Atmosphere 1976). */
export function isaTemperature_K(altitude_m: number): number {
  const i = layerIndex(altitude_m);
  return BASE_T_K[i]! + LAPSE_K_M[i]! * (altitude_m - BASE_M[i]!);
}

/** ISA static pressure ratio delta = p / 101325 Pa (-) at pressure altitude -5 km..84.852 km (U.S. Standard Atmosphere 1976). */
export function isaPressureRatio(altitude_m: number): number {
  const i = layerIndex(altitude_m);
  return BASE_DELTA[i]! * layerPressureRatio(BASE_T_K[i]!, LAPSE_K_M[i]!, altitude_m - BASE_M[i]!);
}
