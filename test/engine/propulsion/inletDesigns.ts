/**
 * Two invented inlet designs for the installation tests (no real aircraft
 * or engine data): a long pitot inlet (higher recovery, more external drag
 * area and weight) and a short inlet (lower recovery, less of both).
 */
import type { InletDesign } from '../../../engine/propulsion/inletDesign';

export const LONG_PITOT: InletDesign = {
  name: 'Long pitot',
  description: 'Invented long subsonic pitot inlet: gentle diffuser, larger nacelle.',
  source: {
    kind: 'geometry',
    captureArea_m2: 2.3,
    throatArea_m2: 2.1,
    fanFaceArea_m2: 2.6,
    diffuserLossCoefficient: 0.06,
  },
  lipSuctionFactor: 0.5,
  externalDragArea_m2: 0.55,
  weight_kg: 420,
};

export const SHORT_INLET: InletDesign = {
  name: 'Short inlet',
  description: 'Invented short inlet: steeper diffuser, smaller nacelle.',
  source: {
    kind: 'geometry',
    captureArea_m2: 2.0,
    throatArea_m2: 1.9,
    fanFaceArea_m2: 2.6,
    diffuserLossCoefficient: 0.2,
  },
  lipSuctionFactor: 0.5,
  externalDragArea_m2: 0.4,
  weight_kg: 300,
};

export const TABLE_INLET: InletDesign = {
  name: 'Tabulated',
  description: 'Invented recovery table.',
  source: { kind: 'recoveryTable', mach: [0, 0.5, 0.9], recovery: [0.99, 0.985, 0.97], captureArea_m2: 2.2 },
  lipSuctionFactor: 0.3,
  externalDragArea_m2: 0.5,
  weight_kg: 350,
};
