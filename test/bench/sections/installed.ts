import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import type { GeometrySource, InletDesign } from '../../../engine/propulsion/inletDesign';
import { geometryInletFlow } from '../../../engine/propulsion/inletFlow';
import { makeInstalledPropulsion } from '../../../engine/propulsion/installedPropulsion';
import { buildParametricDeck } from '../../../engine/propulsion/parametricDeck';
import { additiveDrag } from '../../../engine/propulsion/spillageDrag';
import { callCounter, type BenchSection } from '../benchTypes';

// Invented inlets on the invented demo deck; queries cycle so each call differs.
const deck = buildParametricDeck(DEMO_ENGINE_SPEC);
const geometrySource: GeometrySource = { kind: 'geometry', captureArea_m2: 0.56, throatArea_m2: 0.5, fanFaceArea_m2: 0.6, diffuserLossCoefficient: 0.04 };
const geometry: InletDesign = {
  name: 'bench geometry inlet',
  description: 'invented',
  source: geometrySource,
  lipSuctionFactor: 0.8,
  externalDragArea_m2: 0.14,
  weight_kg: 110,
};
const table: InletDesign = {
  ...geometry,
  name: 'bench table inlet',
  source: { kind: 'recoveryTable', mach: [0, 0.5, 0.9], recovery: [0.99, 0.985, 0.97], captureArea_m2: 0.55 },
};
const options = {
  deck,
  engineCount: 2,
  installation: { bleed: { kind: 'coreFraction', fraction: 0.01 }, powerExtraction_W: 30e3 },
  cautionSettings: DEFAULT_CAUTION_SETTINGS,
} as const;
const geometryModel = makeInstalledPropulsion({ ...options, inlet: geometry });
const tableModel = makeInstalledPropulsion({ ...options, inlet: table });
const top = geometryModel.atRating({ altitude_m: 10668, mach: 0.8, isaDev_K: 0 }, 'maxCruise').thrust_N;

const next = callCounter();

function condition() {
  const i = next();
  return { altitude_m: 6000 + 100 * i, mach: 0.5 + 0.005 * i, isaDev_K: 0 };
}

export const section: BenchSection = {
  title: 'installed propulsion',
  cases: [
    { name: 'additiveDrag (subsonic)', run: () => additiveDrag(0.6 + 0.004 * next(), 25000, 0.7, 0.56) },
    {
      name: 'geometryInletFlow',
      run: () => geometryInletFlow(geometrySource, { mach: 0.6 + 0.004 * next(), pressure_Pa: 25000, temperature_K: 220 }, 35, 1),
    },
    { name: 'atPower, geometry inlet', run: () => geometryModel.atPower(condition(), 0.5 + 0.005 * next()) },
    { name: 'atRating, table inlet', run: () => tableModel.atRating(condition(), 'maxClimb') },
    { name: 'forThrust, geometry inlet', run: () => geometryModel.forThrust({ altitude_m: 10668, mach: 0.8, isaDev_K: 0 }, top * (0.3 + 0.01 * next()), 'maxCruise') },
  ],
};
