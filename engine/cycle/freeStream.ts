/**
 * Free-stream static and total conditions for the cycle: the standard
 * atmosphere (engine/aero/standardAtmosphere.ts) for static temperature and
 * pressure, and the cycle's cold-section gas (cp, gamma) for the speed of
 * sound and the totals, so that V0^2 / 2 = cp (Tt0 - T0) holds exactly in
 * the cycle's energy balance (Mattingly, Elements of Propulsion, the free-stream relations
 * of parametric cycle analysis).
 */
import { atmosphere } from '../aero/standardAtmosphere';
import { err, ok, type Result } from '../core/result';
import type { Gas } from './gasProperties';

export interface FreeStream {
  readonly altitude_m: number;
  readonly mach: number;
  readonly isaDeviation_K: number;
  readonly t0_K: number;
  readonly p0_Pa: number;
  readonly speedOfSound_m_s: number;
  readonly velocity_m_s: number;
  readonly tt0_K: number;
  readonly pt0_Pa: number;
}

/** Highest flight Mach number the cycle accepts (no supersonic inlet model). */
export const MAX_CYCLE_MACH = 2.5;

export function freeStream(cold: Gas, altitude_m: number, mach: number, isaDeviation_K: number): Result<FreeStream, string> {
  if (!Number.isFinite(mach) || mach < 0 || mach > MAX_CYCLE_MACH) {
    return err(`Mach ${mach} is outside 0 to ${MAX_CYCLE_MACH}`);
  }
  const air = atmosphere(altitude_m, isaDeviation_K);
  if (!air.ok) return err(air.error.message);
  const t0 = air.value.temperature_K;
  const p0 = air.value.pressure_Pa;
  const a0 = Math.sqrt(cold.gamma * cold.R * t0);
  const tauR = 1 + ((cold.gamma - 1) / 2) * mach * mach;
  return ok({
    altitude_m,
    mach,
    isaDeviation_K,
    t0_K: t0,
    p0_Pa: p0,
    speedOfSound_m_s: a0,
    velocity_m_s: mach * a0,
    tt0_K: t0 * tauR,
    pt0_Pa: p0 * Math.pow(tauR, 1 / cold.k),
  });
}
