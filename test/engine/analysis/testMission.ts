/** An invented mission input on the analytic models, for the analysis tests (no real aircraft). */
import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';
import type { MissionInput } from '../../../engine/mission/missionTypes';
import { TEST_POLAR, analyticPropulsion, parabolicAero } from './analyticModels';

export function testMissionInput(): MissionInput {
  return {
    airframe: { oew_kg: 38000, mzfw_kg: 52000, mtow_kg: 64000, mlw_kg: 58000, maxFuel_kg: 19000, wingArea_m2: 90, vmo_m_s: 180, mmo: 0.82 },
    aero: parabolicAero(TEST_POLAR),
    propulsion: analyticPropulsion({ thrust_N: 250e3, lapse: 'mattingly', tsfc_kg_N_s: 1.6e-5 }),
    legs: [],
    reserves: { preset: 'custom', contingencyFraction: 0.05, alternate: null, finalReserve_s: 1800, extraFuel_kg: 0 },
    solve: { kind: 'payloadRange', payload_kg: 10000, range_m: 3e6 },
    cautionSettings: DEFAULT_CAUTION_SETTINGS,
    isaDev_K: 0,
    wind_m_s: 0,
  };
}

