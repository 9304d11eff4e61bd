/**
 * The INVENTED demo engine: a parametric high-bypass turbofan (bypass ratio
 * about 4.5) sized for an invented mid-size business twinjet, about 36 kN
 * sea-level static thrust per engine. Not any real engine's data.
 * fixtures/demo/demo-engine.deck.csv is this deck written by
 * scripts/writeDemoDeck.ts.
 */
import { FOOT_M, POUND_FORCE_N, POUND_KG } from '../units/unitTable';
import type { ParametricDeckSpec } from './parametricDeck';

const FT = [0, 5000, 10000, 15000, 20000, 25000, 30000, 35000, 40000, 45000, 51000];
// Highest (and lowest) tabulated Mach at each altitude: a ragged grid like a maker's deck.
const MACH_RANGES: readonly (readonly [number, number])[] = [
  [0, 0.6],
  [0, 0.6],
  [0, 0.7],
  [0, 0.7],
  [0.1, 0.8],
  [0.2, 0.9],
  [0.2, 0.9],
  [0.3, 0.9],
  [0.3, 0.9],
  [0.4, 0.9],
  [0.4, 0.9],
];

export const DEMO_ENGINE_SPEC: ParametricDeckSpec = {
  kind: 'highBypassTurbofan',
  title: 'Blockwise demo turbofan, 36 kN class (invented, parametric)',
  seaLevelStaticThrust_N: 36000,
  throttleRatio: 1.05,
  // 0.43 lb/(lbf h) at sea-level static, an invented value for bypass ratio ~4.5.
  tsfcSeaLevelStatic_kg_N_s: (0.43 * POUND_KG) / (POUND_FORCE_N * 3600),
  seaLevelStaticAirflow_kg_s: 114,
  ratings: { takeoff: 1, maxContinuous: 0.95, maxClimb: 0.92, maxCruise: 0.88, flightIdle: 0.06 },
  partPowerFuelIntercept: 0.1,
  grid: {
    altitudes_m: FT.map((ft) => ft * FOOT_M),
    machs: [0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9],
    machRanges: MACH_RANGES,
    powers: [0.06, 0.1, 0.15, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.88, 0.92, 0.95, 1],
  },
};
