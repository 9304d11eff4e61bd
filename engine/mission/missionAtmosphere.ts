/**
 * The ISA and airspeed relations the mission integrator needs, as a thin
 * adapter over the shared engine/aero modules (standardAtmosphere.ts,
 * airspeeds.ts): it adds the layer lapse rate the energy share factor needs
 * and unwraps the atmosphere's Result, since mission input is range-checked
 * first (missionInputCheck.ts) so a failure here is a bug.
 *
 * Sources: U.S. Standard Atmosphere 1976; NACA Report 1135 (pitot relation).
 */
import { atmosphere, ISA_LAPSE_BREAKS_M, isaLapseRate_K_m, pressureAltitude } from '../aero/standardAtmosphere';
import { casFromMach, casMachTransitionAltitude, impactPressureRatio, machFromCas, machFromImpactPressureRatio } from '../aero/airspeeds';
import { a0, g0, p0, R_air, T0 } from '../aero/constants';

export const G0_M_S2 = g0;
export const GAS_CONSTANT_J_KG_K = R_air;
export const SEA_LEVEL_TEMPERATURE_K = T0;
export const SEA_LEVEL_PRESSURE_PA = p0;
export const SEA_LEVEL_SPEED_OF_SOUND_M_S = a0;
export const TROPOPAUSE_M = 11000;
/**
 * Pressure altitudes (m) where the ISA lapse rate, and with it the energy share factor of a climb or descent,
 * jumps (U.S. Standard Atmosphere 1976 layer bases): the right-hand side's value itself, not only its slope.
 */
export const LAPSE_JUMPS_M = ISA_LAPSE_BREAKS_M;

export interface MissionAir {
  readonly temperature_K: number;
  /** ISA temperature at this pressure altitude (K), without the deviation. */
  readonly isaTemperature_K: number;
  readonly pressure_Pa: number;
  readonly density_kg_m3: number;
  readonly speedOfSound_m_s: number;
  /** ISA temperature lapse dT/dHp at this altitude (K/m), U.S. Standard Atmosphere 1976 layers to 32 km. */
  readonly lapse_K_m: number;
}

// One-entry memo of missionAir, keyed purely by its arguments (a leg evaluation asks for the same point two or
// three times in a row); the value is immutable, so sharing it cannot change any answer.
let memoAltitude_m = Number.NaN;
let memoIsaDev_K = Number.NaN;
let memoAir: MissionAir | null = null;

/**
 * ISA at a pressure altitude (m) with an ISA deviation (K), valid where
 * engine/aero/standardAtmosphere.ts is (-5,004 m to 71,000 m, T > 0).
 * Throws only for out-of-range input, which missionInputCheck.ts excludes.
 */
export function missionAir(altitude_m: number, isaDev_K: number): MissionAir {
  if (memoAir !== null && altitude_m === memoAltitude_m && isaDev_K === memoIsaDev_K) return memoAir;
  const air = computeMissionAir(altitude_m, isaDev_K);
  memoAltitude_m = altitude_m;
  memoIsaDev_K = isaDev_K;
  memoAir = air;
  return air;
}

function computeMissionAir(altitude_m: number, isaDev_K: number): MissionAir {
  const r = atmosphere(altitude_m, isaDev_K);
  if (!r.ok) throw new RangeError(`missionAir: ${r.error.message}`);
  const a = r.value;
  return {
    temperature_K: a.temperature_K,
    isaTemperature_K: a.isaTemperature_K,
    pressure_Pa: a.pressure_Pa,
    density_kg_m3: a.density_kg_m3,
    speedOfSound_m_s: a.speedOfSound_m_s,
    lapse_K_m: isaLapseRate_K_m(altitude_m),
  };
}

/** Pressure altitude (m) of an ISA pressure (Pa); inverse of missionAir's pressure. */
export function altitudeOfPressure(pressure_Pa: number): number {
  const r = pressureAltitude(pressure_Pa);
  if (!r.ok) throw new RangeError(`altitudeOfPressure: ${r.error.message}`);
  return r.value;
}

/** Mach (-) from CAS (m/s) at a static pressure (Pa); NACA Report 1135 (engine/aero/airspeeds.ts). */
export function machOfCas(cas_m_s: number, pressure_Pa: number): number {
  return machFromCas(cas_m_s, pressure_Pa);
}

/**
 * Mach (-) as a function of static pressure (Pa) along a held CAS (m/s): machOfCas(cas_m_s, p) to the bit, with the
 * CAS's impact pressure (its part independent of the altitude) worked out once; NACA Report 1135 via
 * engine/aero/airspeeds.ts. For the climbs and descents, which ask it at every right-hand side.
 */
export function heldCasMach(cas_m_s: number): (pressure_Pa: number) => number {
  if (!(cas_m_s >= 0) || !Number.isFinite(cas_m_s)) return (pressure_Pa) => machOfCas(cas_m_s, pressure_Pa); // throws with machFromCas's message
  const qc_Pa = SEA_LEVEL_PRESSURE_PA * impactPressureRatio(cas_m_s / SEA_LEVEL_SPEED_OF_SOUND_M_S);
  return (pressure_Pa) => {
    if (!(pressure_Pa > 0) || !Number.isFinite(pressure_Pa)) return machOfCas(cas_m_s, pressure_Pa); // throws likewise
    return machFromImpactPressureRatio(qc_Pa / pressure_Pa);
  };
}

// A direct-mapped table of casOfMach's answers keyed by both arguments' bits: a pure function, so an entry read back
// is casFromMach's very number. Every sample asks it, and a mission's samples repeat their (Mach, pressure) pairs
// from pass to pass (a climb's and a descent's altitude steps, a cruise's Mach and level): about 54 pairs among 389
// calls in a converged demo solve. -0 and 0 may take different slots; either answer is the one casFromMach gives.
const CAS_SLOT_BITS = 7;
const casMachKeys = new Float64Array(1 << CAS_SLOT_BITS).fill(Number.NaN);
const casPressureKeys = new Float64Array(1 << CAS_SLOT_BITS).fill(Number.NaN);
const casValues = new Float64Array(1 << CAS_SLOT_BITS);
const casKeyBits = new Float64Array(2);
const casKeyWords = new Int32Array(casKeyBits.buffer);

/** CAS (m/s) from Mach (-) at a static pressure (Pa); NACA Report 1135 (engine/aero/airspeeds.ts). */
export function casOfMach(mach: number, pressure_Pa: number): number {
  casKeyBits[0] = mach;
  casKeyBits[1] = pressure_Pa;
  // Fibonacci hashing of the four 32-bit words (Knuth, TAOCP vol. 3, 6.4; the multiplier 2^32 / golden ratio).
  const mixed = casKeyWords[0]! ^ casKeyWords[1]! ^ Math.imul(casKeyWords[2]! ^ casKeyWords[3]!, 0x85ebca6b);
  const slot = Math.imul(mixed, 0x9e3779b1) >>> (32 - CAS_SLOT_BITS);
  if (casMachKeys[slot] === mach && casPressureKeys[slot] === pressure_Pa) return casValues[slot]!;
  const cas_m_s = casFromMach(mach, pressure_Pa);
  casMachKeys[slot] = mach;
  casPressureKeys[slot] = pressure_Pa;
  casValues[slot] = cas_m_s;
  return cas_m_s;
}

/**
 * Pressure altitude (m) where a CAS (m/s) and a Mach (-) give the same speed
 * (the CAS/Mach transition altitude); +Infinity when it lies above the
 * atmosphere's range, -Infinity below (the schedule then holds one of them
 * throughout). NACA Report 1135 via engine/aero/airspeeds.ts.
 */
export function transitionAltitude(cas_m_s: number, mach: number): number {
  const r = casMachTransitionAltitude(cas_m_s, mach);
  if (r.ok) return r.value;
  if (r.error.code === 'pressure_out_of_range') return r.error.pressure_Pa < r.error.min_Pa ? Infinity : -Infinity;
  return Infinity;
}
