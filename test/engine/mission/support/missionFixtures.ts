/** Mission inputs shared by the mission tests (invented aircraft, SI). */
import { DEFAULT_CAUTION_SETTINGS } from '../../../../engine/cautions/cautionSettings';
import type { Airframe, Leg, MissionInput, ReservePolicy, SolveMode, SpeedSchedule } from '../../../../engine/mission/missionTypes';
import type { AeroModel } from '../../../../engine/aero/aeroModel';
import type { PropulsionModel } from '../../../../engine/propulsion/propulsionModel';
import { constantTsfcPropulsion, parabolicAero } from './analyticModels';

export const FT = 0.3048;
export const KT = 1852 / 3600;
export const NM = 1852;

export const TEST_AIRFRAME: Airframe = {
  oew_kg: 40000,
  mzfw_kg: 60000,
  mtow_kg: 80000,
  mlw_kg: 66000,
  maxFuel_kg: 25000,
  wingArea_m2: 120,
  vmo_m_s: 340 * KT,
  mmo: 0.86,
};

export const SCHEDULE: SpeedSchedule = { lowCas_m_s: 250 * KT, lowAltitudeLimit_m: 10000 * FT, cas_m_s: 290 * KT, mach: 0.78 };

export const NO_RESERVES: ReservePolicy = { preset: 'custom', contingencyFraction: 0, alternate: null, finalReserve_s: 0, extraFuel_kg: 0 };

/** The demo-like mission's legs; the cruise distance is `cruise_m` (null = solved). */
export function demoLegs(cruise_m: number | null): Leg[] {
  return [
    { kind: 'taxiOut', name: 'taxi out', time_s: 600, fuelFlow_kg_s: 'idle' },
    { kind: 'takeoff', name: 'take-off', fuel_kg: null, time_s: 60 },
    { kind: 'climb', name: 'climb', toAltitude_m: 35000 * FT, schedule: SCHEDULE, rating: 'maxClimb' },
    {
      kind: 'cruise',
      name: 'cruise',
      altitude_m: 35000 * FT,
      speed: { kind: 'mach', mach: 0.78 },
      profile: { kind: 'constantAltitude' },
      distance_m: cruise_m,
    },
    { kind: 'descent', name: 'descent', toAltitude_m: 1500 * FT, schedule: SCHEDULE, mode: { kind: 'idle' } },
    { kind: 'approach', name: 'approach', time_s: 300, fuel_kg: null },
    { kind: 'taxiIn', name: 'taxi in', time_s: 300, fuelFlow_kg_s: 'idle' },
  ];
}

export const DEMO_AERO: AeroModel = parabolicAero(0.022, 0.045, { wingArea_m2: 120, clMax: 1.4, buffetCl: 0.9 });
export const DEMO_ENGINES: PropulsionModel = constantTsfcPropulsion({ thrust0_N: 240000, tsfc_kg_N_s: 1.7e-5, lapseExponent: 0.75 });

export function missionInput(parts: {
  legs: readonly Leg[];
  solve: SolveMode;
  reserves?: ReservePolicy;
  aero?: AeroModel;
  propulsion?: PropulsionModel;
  airframe?: Airframe;
  isaDev_K?: number;
  wind_m_s?: number;
}): MissionInput {
  return {
    airframe: parts.airframe ?? TEST_AIRFRAME,
    aero: parts.aero ?? DEMO_AERO,
    propulsion: parts.propulsion ?? DEMO_ENGINES,
    legs: parts.legs,
    reserves: parts.reserves ?? NO_RESERVES,
    solve: parts.solve,
    cautionSettings: DEFAULT_CAUTION_SETTINGS,
    isaDev_K: parts.isaDev_K ?? 0,
    wind_m_s: parts.wind_m_s ?? 0,
  };
}
