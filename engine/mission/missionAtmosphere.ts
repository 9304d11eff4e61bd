/**
 * The ISA and airspeed relations the mission integrator needs, kept local to
 * engine/mission so the solver does not depend on modules still being written.
 * Pressure altitude is the altitude variable throughout; an ISA deviation
 * shifts temperature at constant pressure (common practice).
 *
 * Sources: U.S. Standard Atmosphere 1976 (layers to 32 km); NACA Report 1135
 * (subsonic pitot relation between impact pressure and Mach number).
 */

export const G0_M_S2 = 9.80665;
export const GAS_CONSTANT_J_KG_K = 287.05287;
export const GAMMA_AIR = 1.4;
export const SEA_LEVEL_TEMPERATURE_K = 288.15;
export const SEA_LEVEL_PRESSURE_PA = 101325;
export const SEA_LEVEL_SPEED_OF_SOUND_M_S = Math.sqrt(GAMMA_AIR * GAS_CONSTANT_J_KG_K * SEA_LEVEL_TEMPERATURE_K);
export const TROPOSPHERE_LAPSE_K_M = -0.0065;
export const TROPOPAUSE_M = 11000;
export const FEET_M = 0.3048;

export interface MissionAir {
  readonly temperature_K: number;
  /** ISA temperature at this pressure altitude (K), without the deviation. */
  readonly isaTemperature_K: number;
  readonly pressure_Pa: number;
  readonly density_kg_m3: number;
  readonly speedOfSound_m_s: number;
  /** ISA temperature lapse dT/dHp at this altitude (K/m): -0.0065 below 11 km, 0 to 20 km, +0.001 above. */
  readonly lapse_K_m: number;
}

const LAYERS: readonly { readonly base_m: number; readonly lapse: number; readonly t_K: number; readonly p_Pa: number }[] = [
  { base_m: 0, lapse: -0.0065, t_K: 288.15, p_Pa: 101325 },
  { base_m: 11000, lapse: 0, t_K: 216.65, p_Pa: 22632.06 },
  { base_m: 20000, lapse: 0.001, t_K: 216.65, p_Pa: 5474.889 },
];

function layerFor(altitude_m: number): (typeof LAYERS)[number] {
  if (altitude_m >= 20000) return LAYERS[2];
  if (altitude_m >= 11000) return LAYERS[1];
  return LAYERS[0];
}

/**
 * ISA at a pressure altitude (m), valid from -2,000 m to 32,000 m, with an ISA
 * deviation (K). Source: U.S. Standard Atmosphere 1976, hydrostatic layers.
 */
export function missionAir(altitude_m: number, isaDev_K: number): MissionAir {
  const layer = layerFor(altitude_m);
  const dh = altitude_m - layer.base_m;
  const tIsa = layer.t_K + layer.lapse * dh;
  const gmr = G0_M_S2 / GAS_CONSTANT_J_KG_K;
  const p =
    layer.lapse === 0
      ? layer.p_Pa * Math.exp((-gmr * dh) / layer.t_K)
      : layer.p_Pa * Math.pow(tIsa / layer.t_K, -gmr / layer.lapse);
  const t = tIsa + isaDev_K;
  return {
    temperature_K: t,
    isaTemperature_K: tIsa,
    pressure_Pa: p,
    density_kg_m3: p / (GAS_CONSTANT_J_KG_K * t),
    speedOfSound_m_s: Math.sqrt(GAMMA_AIR * GAS_CONSTANT_J_KG_K * t),
    lapse_K_m: layer.lapse,
  };
}

/** Pressure altitude (m) of an ISA pressure (Pa); inverse of missionAir, 500 Pa to 120 kPa. */
export function altitudeOfPressure(pressure_Pa: number): number {
  const gmr = G0_M_S2 / GAS_CONSTANT_J_KG_K;
  for (let i = LAYERS.length - 1; i >= 0; i--) {
    const layer = LAYERS[i];
    if (pressure_Pa <= layer.p_Pa || i === 0) {
      if (layer.lapse === 0) return layer.base_m - (layer.t_K / gmr) * Math.log(pressure_Pa / layer.p_Pa);
      const tRatio = Math.pow(pressure_Pa / layer.p_Pa, -layer.lapse / gmr);
      return layer.base_m + (layer.t_K * (tRatio - 1)) / layer.lapse;
    }
  }
  return 0;
}

/** Mach (-) from CAS (m/s) at a static pressure (Pa); subsonic pitot relation, NACA Report 1135. */
export function machOfCas(cas_m_s: number, pressure_Pa: number): number {
  const a0 = SEA_LEVEL_SPEED_OF_SOUND_M_S;
  const qc = SEA_LEVEL_PRESSURE_PA * (Math.pow(1 + 0.2 * (cas_m_s / a0) ** 2, 3.5) - 1);
  return Math.sqrt(5 * (Math.pow(qc / pressure_Pa + 1, 2 / 7) - 1));
}

/** CAS (m/s) from Mach (-) at a static pressure (Pa); subsonic pitot relation, NACA Report 1135. */
export function casOfMach(mach: number, pressure_Pa: number): number {
  const a0 = SEA_LEVEL_SPEED_OF_SOUND_M_S;
  const qc = pressure_Pa * (Math.pow(1 + 0.2 * mach * mach, 3.5) - 1);
  return a0 * Math.sqrt(5 * (Math.pow(qc / SEA_LEVEL_PRESSURE_PA + 1, 2 / 7) - 1));
}

/**
 * Pressure altitude (m) where a CAS (m/s) and a Mach (-) give the same speed
 * (the CAS/Mach transition altitude): the static pressure whose impact
 * pressure at that Mach equals the CAS's impact pressure. NACA Report 1135.
 */
export function transitionAltitude(cas_m_s: number, mach: number): number {
  const a0 = SEA_LEVEL_SPEED_OF_SOUND_M_S;
  const qc = SEA_LEVEL_PRESSURE_PA * (Math.pow(1 + 0.2 * (cas_m_s / a0) ** 2, 3.5) - 1);
  const denominator = Math.pow(1 + 0.2 * mach * mach, 3.5) - 1;
  if (!(denominator > 0)) return Infinity;
  return altitudeOfPressure(qc / denominator);
}
