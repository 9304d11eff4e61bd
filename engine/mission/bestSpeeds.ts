/**
 * Cruise and hold speeds chosen by the mission: best-range Mach (maximum
 * specific range V/fuel flow at the current mass and altitude), long-range
 * Mach (the faster Mach giving 99 % of the best specific range, common
 * practice), and best-endurance speed (minimum drag, which for a jet with
 * TSFC independent of speed is minimum fuel flow; Anderson, Aircraft
 * Performance and Design, section 5.14).
 */
import { goldenMaximum } from '../core/scalarMaximum';
import { dragForceAt } from './flightPoint';
import { machOfCas, missionAir } from './missionAtmosphere';
import type { MissionInput } from './missionTypes';

/** Lowest Mach (-) the speed searches consider. */
export const MIN_SEARCH_MACH = 0.15;
/** Long-range cruise: fraction of the best specific range (common practice). */
export const LONG_RANGE_FRACTION = 0.99;

/** Highest Mach (-) the searches consider at an altitude: MMO or the Mach of VMO, whichever is lower. */
export function maxSearchMach(input: MissionInput, altitude_m: number): number {
  const p = missionAir(altitude_m, 0).pressure_Pa;
  return Math.max(MIN_SEARCH_MACH + 1e-3, Math.min(input.airframe.mmo, machOfCas(input.airframe.vmo_m_s, p)));
}

/**
 * Specific air range (m/kg) in level flight at pressure altitude (m), Mach,
 * mass (kg): TAS / fuel flow with thrust = drag (maxCruise ceiling); 0 where
 * the rating cannot balance the drag or fuel flow is not positive.
 */
export function specificRangeAt(input: MissionInput, altitude_m: number, mach: number, mass_kg: number, isaDev_K: number): number {
  // The drag force alone (dragForceAt: the same bits as the breakdown's drag_N) and the TAS as airPoint has it.
  const tas_m_s = mach * missionAir(altitude_m, isaDev_K).speedOfSound_m_s;
  const p = input.propulsion.forThrust({ altitude_m, mach, isaDev_K }, dragForceAt(input, altitude_m, mach, mass_kg), 'maxCruise');
  if (p.limit === 'above_rating' || !(p.fuelFlow_kg_s > 0)) return 0;
  const sr = tas_m_s / p.fuelFlow_kg_s;
  return Number.isFinite(sr) ? sr : 0;
}

/**
 * Specific range (m/kg) in the mission's distance basis: the specific air range `sr_m_kg` at a Mach, times
 * ground speed / TAS over the ground when the wind is not zero (dx/dm = (V + w) / fuel flow), else unchanged;
 * 0 when the ground speed is not positive.
 */
export function basisSpecificRange(
  input: MissionInput,
  sr_m_kg: number,
  altitude_m: number,
  mach: number,
  env: { readonly isaDev_K: number; readonly wind_m_s: number },
): number {
  if ((input.distanceBasis ?? 'ground') !== 'ground' || env.wind_m_s === 0) return sr_m_kg;
  const tas = mach * missionAir(altitude_m, env.isaDev_K).speedOfSound_m_s;
  return tas > 0 && tas + env.wind_m_s > 0 ? (sr_m_kg * (tas + env.wind_m_s)) / tas : 0;
}

/** Best-range Mach (-) at altitude (m) and mass (kg). */
export function bestRangeMach(input: MissionInput, altitude_m: number, mass_kg: number, isaDev_K: number): number {
  return goldenMaximum((m) => specificRangeAt(input, altitude_m, m, mass_kg, isaDev_K), MIN_SEARCH_MACH, maxSearchMach(input, altitude_m));
}

/** Long-range Mach (-): the Mach above best-range Mach where specific range is 99 % of its best. */
export function longRangeMach(input: MissionInput, altitude_m: number, mass_kg: number, isaDev_K: number): number {
  const best = bestRangeMach(input, altitude_m, mass_kg, isaDev_K);
  const target = LONG_RANGE_FRACTION * specificRangeAt(input, altitude_m, best, mass_kg, isaDev_K);
  let lo = best;
  let hi = maxSearchMach(input, altitude_m);
  if (specificRangeAt(input, altitude_m, hi, mass_kg, isaDev_K) >= target) return hi;
  for (let i = 0; i < 60 && hi - lo > 1e-7; i++) {
    const mid = 0.5 * (lo + hi);
    if (specificRangeAt(input, altitude_m, mid, mass_kg, isaDev_K) >= target) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/** Minimum-drag (best-endurance) Mach (-) at altitude (m) and mass (kg), at any ISA deviation (the 1 g drag at a pressure altitude and Mach does not depend on it). */
export function minimumDragMach(input: MissionInput, altitude_m: number, mass_kg: number, _isaDev_K: number): number {
  return goldenMaximum(
    (m) => -dragForceAt(input, altitude_m, m, mass_kg),
    MIN_SEARCH_MACH,
    maxSearchMach(input, altitude_m),
  );
}
