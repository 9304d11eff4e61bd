/**
 * Loads test/reference/installationReference.json (written by
 * test/reference/installationReference.py, numpy/scipy) for the
 * installation tests.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export interface GeometryInletRow {
  readonly mach: number;
  readonly p0_Pa: number;
  readonly t0_K: number;
  readonly throatArea_m2: number;
  readonly fanFaceArea_m2: number;
  readonly diffuserLossCoefficient: number;
  readonly deckAirflow_kg_s: number;
  readonly referenceRecovery: number;
  readonly recovery: number;
  readonly throatMach: number;
  readonly fanFaceMach: number;
  readonly airflow_kg_s: number;
  readonly streamTubeArea_m2: number;
}

export interface AdditiveDragRow {
  readonly mach: number;
  readonly p0_Pa: number;
  readonly massFlowRatio: number;
  readonly captureArea_m2: number;
  readonly drag_N: number;
  readonly coefficient: number;
  readonly captureMach: number;
}

export interface InstallationReference {
  readonly milE5008b: readonly { readonly mach: number; readonly recovery: number }[];
  readonly geometryInlet: readonly GeometryInletRow[];
  readonly additiveDrag: readonly AdditiveDragRow[];
}

export const ref: InstallationReference = JSON.parse(
  readFileSync(fileURLToPath(new URL('../../reference/installationReference.json', import.meta.url)), 'utf8'),
) as InstallationReference;
