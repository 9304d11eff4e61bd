/**
 * Energy share (acceleration) factor of a climb or descent flown at constant
 * CAS or constant Mach, and the pressure-altitude rate from the energy
 * equation.
 *
 * With pressure altitude Hp, true altitude h (dh/dHp = T/T_isa) and V = V(Hp):
 *   (Thr - D) V / (m g) = dh/dt + (V/g) dV/dt
 * gives dHp/dt = (T_isa/T) (Thr - D) V / (m g) * f, with
 *   f = [1 + (T_isa/T) (V/g) dV/dHp]^-1.
 * Closed forms for the ISA lapse beta (K/m), kappa = 1.4, mu = (kappa - 1)/2:
 *   constant Mach: 1/f = 1 + (kappa R beta / (2 g)) M^2 (T_isa/T)
 *   constant CAS:  1/f = the Mach term + (1 + mu M^2)^(-1/(kappa-1)) [(1 + mu M^2)^(kappa/(kappa-1)) - 1]
 *   (beta = 0 above the tropopause).
 * Source: EUROCONTROL BADA 3 User Manual, energy share factor f{M} for
 * constant Mach / constant CAS below and above the tropopause (from memory;
 * re-derived here from the pitot relation of NACA Report 1135 and the ISA
 * lapse, and checked numerically in test/reference/missionReference.py).
 */
import { gamma as GAMMA_AIR } from '../aero/constants';
import { G0_M_S2, GAS_CONSTANT_J_KG_K } from './missionAtmosphere';

export type HeldSpeed = 'cas' | 'mach' | 'tas';

/**
 * f (-) for a climb/descent holding CAS or Mach (or TAS: f = 1) at Mach `mach`,
 * with ISA lapse `lapse_K_m` (K/m) and temperatures T and T_isa (K).
 * Valid subsonic (M < 1). Source: see file comment (BADA 3 energy share factor).
 */
export function energyShareFactor(
  held: HeldSpeed,
  mach: number,
  lapse_K_m: number,
  temperature_K: number,
  isaTemperature_K: number,
): number {
  if (held === 'tas') return 1;
  const m2 = mach * mach;
  const tempTerm = ((GAMMA_AIR * GAS_CONSTANT_J_KG_K * lapse_K_m) / (2 * G0_M_S2)) * m2 * (isaTemperature_K / temperature_K);
  let inverse = 1 + tempTerm;
  if (held === 'cas') {
    const mu = (GAMMA_AIR - 1) / 2;
    const base = 1 + mu * m2;
    inverse += Math.pow(base, -1 / (GAMMA_AIR - 1)) * (Math.pow(base, GAMMA_AIR / (GAMMA_AIR - 1)) - 1);
  }
  return 1 / inverse;
}

/**
 * Pressure-altitude rate (m/s) from the energy equation with the energy share
 * factor: dHp/dt = (T_isa/T) (Thr - D) V / (m g0) f. Thrust and drag (N),
 * TAS (m/s), mass (kg). Source: BADA 3 User Manual total-energy model (from memory).
 */
export function pressureAltitudeRate(
  thrust_N: number,
  drag_N: number,
  tas_m_s: number,
  mass_kg: number,
  factor: number,
  temperature_K: number,
  isaTemperature_K: number,
): number {
  if (!(mass_kg > 0) || !(temperature_K > 0)) return 0;
  return ((isaTemperature_K / temperature_K) * (thrust_N - drag_N) * tas_m_s * factor) / (mass_kg * G0_M_S2);
}
