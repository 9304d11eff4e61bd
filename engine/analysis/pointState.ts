/**
 * Level-flight point performance at one altitude, Mach and mass: thrust
 * available at a rating, drag, excess thrust and specific excess power.
 */
import { atmosphere } from '../aero/standardAtmosphere';
import { err, ok, type Result } from '../core/result';
import type { RatingName } from '../propulsion/propulsionModel';
import { g0 } from '../aero/constants';
import type { AnalysisError, PerformanceModels } from './analysisTypes';

export interface LevelPoint {
  readonly mach: number;
  /** True airspeed (m/s). */
  readonly tas_m_s: number;
  readonly thrustAvailable_N: number;
  readonly drag_N: number;
  readonly excessThrust_N: number;
  /** Specific excess power Ps = (T - D) V / W (m/s), no acceleration factor. */
  readonly specificExcessPower_m_s: number;
  readonly cl: number;
  readonly clMax: number;
  readonly buffetCl: number;
  readonly buffetLoadFactor: number;
}

export interface LevelFlightConditions {
  readonly altitude_m: number;
  readonly mass_kg: number;
  readonly rating: RatingName;
  readonly isaDev_K: number;
  /** Load factor (-); 1 in level flight. */
  readonly loadFactor?: number;
}

/** Speed of sound (m/s) and static pressure (Pa) at a pressure altitude, or an error naming the altitude. */
export function airAt(
  altitude_m: number,
  isaDev_K: number,
): Result<{ speedOfSound_m_s: number; pressure_Pa: number }, AnalysisError> {
  const a = atmosphere(altitude_m, isaDev_K);
  if (!a.ok) {
    return err({
      code: 'atmosphere_out_of_range',
      message: `altitude ${altitude_m} m with ISA deviation ${isaDev_K} K: ${a.error.message}`,
    });
  }
  return ok({ speedOfSound_m_s: a.value.speedOfSound_m_s, pressure_Pa: a.value.pressure_Pa });
}

/**
 * Thrust available, drag and Ps at one Mach. Ps = (T - D) V / (m g0), the
 * energy-height rate (any text on the energy method, e.g. Anderson, Aircraft
 * Performance and Design, ch. 5); it equals the climb rate of a constant-TAS
 * climb (no acceleration factor). `speedOfSound_m_s` from airAt.
 */
export function levelPoint(
  models: PerformanceModels,
  conditions: LevelFlightConditions,
  speedOfSound_m_s: number,
  mach: number,
): LevelPoint {
  const loadFactor = conditions.loadFactor ?? 1;
  const d = models.aero.drag({ altitude_m: conditions.altitude_m, mach, mass_kg: conditions.mass_kg, loadFactor });
  const t = models.propulsion.atRating(
    { altitude_m: conditions.altitude_m, mach, isaDev_K: conditions.isaDev_K },
    conditions.rating,
  );
  const tas_m_s = mach * speedOfSound_m_s;
  const excess = t.thrust_N - d.drag_N;
  return {
    mach,
    tas_m_s,
    thrustAvailable_N: t.thrust_N,
    drag_N: d.drag_N,
    excessThrust_N: excess,
    specificExcessPower_m_s: (excess * tas_m_s) / (conditions.mass_kg * g0),
    cl: d.cl,
    clMax: d.clMax,
    buffetCl: d.buffetCl,
    buffetLoadFactor: d.buffetLoadFactor,
  };
}
