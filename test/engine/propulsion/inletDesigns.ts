/**
 * Two invented inlet designs for the installation tests (no real aircraft
 * or engine data), sized for the invented demo turbofan (DEMO_ENGINE_SPEC,
 * about 35 kg/s airflow in cruise): a long pitot inlet (higher recovery, more
 * external drag area and weight) and a short inlet (lower recovery, less of
 * both).
 */
import type { InletDesign } from '../../../engine/propulsion/inletDesign';

export const LONG_PITOT: InletDesign = {
  name: 'Long pitot',
  description: 'Invented long subsonic pitot inlet: gentle diffuser, larger nacelle.',
  source: {
    kind: 'geometry',
    captureArea_m2: 0.56,
    throatArea_m2: 0.5,
    fanFaceArea_m2: 0.6,
    diffuserLossCoefficient: 0.04,
  },
  lipSuctionFactor: 0.8,
  externalDragArea_m2: 0.14,
  weight_kg: 110,
};

export const SHORT_INLET: InletDesign = {
  name: 'Short inlet',
  description: 'Invented short inlet: steeper diffuser, smaller nacelle.',
  source: {
    kind: 'geometry',
    captureArea_m2: 0.5,
    throatArea_m2: 0.46,
    fanFaceArea_m2: 0.6,
    diffuserLossCoefficient: 0.1,
  },
  lipSuctionFactor: 0.8,
  externalDragArea_m2: 0.1,
  weight_kg: 80,
};

export const TABLE_INLET: InletDesign = {
  name: 'Tabulated',
  description: 'Invented recovery table.',
  source: { kind: 'recoveryTable', mach: [0, 0.5, 0.9], recovery: [0.99, 0.985, 0.97], captureArea_m2: 0.55 },
  lipSuctionFactor: 0.8,
  externalDragArea_m2: 0.12,
  weight_kg: 95,
};
