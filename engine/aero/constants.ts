/**
 * Physical constants of air and the standard atmosphere, SI. Values are those
 * of the U.S. Standard Atmosphere, 1976 (NOAA-S/T 76-1562), Table 2 and
 * section 1.2, which agree with the ICAO Standard Atmosphere (Doc 7488/3)
 * up to 32 km.
 */
import { STANDARD_GRAVITY_M_S2 } from '../units/unitTable';

/** Standard acceleration of gravity (m/s^2), exact. */
export const g0 = STANDARD_GRAVITY_M_S2;
/**
 * Specific gas constant of air (J/(kg K)): R* / M with R* = 8314.32 J/(kmol K)
 * and M = 28.96442 kg/kmol, as tabulated by ICAO Doc 7488/3. (The 1976
 * standard's M0 = 28.9644 gives 287.0531; the two differ by 7e-7, below the
 * tables' printed precision.)
 */
export const R_air = 287.05287;
/** Universal gas constant of the 1976 standard (J/(kmol K)). */
export const R_STAR_J_KMOL_K = 8314.32;
/** Sea-level mean molar mass of air of the 1976 standard (kg/kmol). */
export const M0_KG_KMOL = 28.9644;
/** Ratio of specific heats of air (-). */
export const gamma = 1.4;
/** Sea-level standard pressure (Pa). */
export const p0 = 101325;
/** Sea-level standard temperature (K). */
export const T0 = 288.15;
/** Sea-level standard density p0 / (R T0) = 1.225 kg/m^3. */
export const rho0 = p0 / (R_air * T0);
/** Sea-level standard speed of sound sqrt(gamma R T0) = 340.294 m/s. */
export const a0 = Math.sqrt(gamma * R_air * T0);
/** Effective Earth radius for geopotential altitude (m), 1976 standard. */
export const r0_m = 6356766;
