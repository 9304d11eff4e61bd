/**
 * A synthetic deck whose every column, sensitivities included, is an affine
 * function of (altitude, Mach, power), so that its interpolated values and
 * the installation built on it are known exactly in closed form: multilinear
 * interpolation reproduces an affine function at any point of the table, and
 * the first-order installation is X_deck + dX/deta (eta - eta_ref) +
 * dX/dbeta beta + dX/dP P.
 */
import { expectOk } from '../../../engine/core/result';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import type { EngineDeck } from '../../../engine/propulsion/engineDeck';
import type { InstallationSensitivities } from '../../../engine/propulsion/installationSensitivities';

type Affine = readonly [c: number, perAltitude_m: number, perMach: number, perPower: number];

const at = (f: Affine, h: number, m: number, p: number): number => f[0] + f[1] * h + f[2] * m + f[3] * p;

/** The closed-form columns (SI). Thrust rises with power; flows stay positive on the grid. */
export const SYNTHETIC = {
  thrust_N: [20000, -1.2, -6000, 30000] as Affine,
  fuelFlow_kg_s: [0.15, -1e-5, 0.02, 0.45] as Affine,
  airflow_kg_s: [60, -0.004, 12, 40] as Affine,
  dThrust_dRecovery_N: [38000, -2.5, 9000, 42000] as Affine,
  dFuelFlow_dRecovery_kg_s: [0.2, -1e-5, 0.05, 0.3] as Affine,
  dAirflow_dRecovery_kg_s: [70, -0.004, 10, 35] as Affine,
  dThrust_dBleed_N: [-60000, 2, -3000, -40000] as Affine,
  dFuelFlow_dBleed_kg_s: [0.05, -1e-6, 0.01, 0.08] as Affine,
  dAirflow_dBleed_kg_s: [-4, 1e-4, -1, -6] as Affine,
  dThrust_dExtraction_N_W: [-2e-3, 5e-8, -5e-4, -1e-3] as Affine,
  dFuelFlow_dExtraction_kg_s_W: [9e-8, -1e-12, 1e-8, -2e-8] as Affine,
  dAirflow_dExtraction_kg_s_W: [2e-6, 0, 1e-6, -1e-6] as Affine,
} as const;

export const SYNTHETIC_ALTITUDES_M = [0, 6000, 11000];
export const SYNTHETIC_MACHS = [0, 0.4, 0.85];
export const SYNTHETIC_POWERS = [0.2, 0.6, 1];

/** Deck values at a condition and power (SI), closed form. */
export function syntheticAt(altitude_m: number, mach: number, power: number) {
  const v = (f: Affine) => at(f, altitude_m, mach, power);
  const sensitivities: InstallationSensitivities = {
    dThrust_dRecovery_N: v(SYNTHETIC.dThrust_dRecovery_N),
    dFuelFlow_dRecovery_kg_s: v(SYNTHETIC.dFuelFlow_dRecovery_kg_s),
    dAirflow_dRecovery_kg_s: v(SYNTHETIC.dAirflow_dRecovery_kg_s),
    dThrust_dBleed_N: v(SYNTHETIC.dThrust_dBleed_N),
    dFuelFlow_dBleed_kg_s: v(SYNTHETIC.dFuelFlow_dBleed_kg_s),
    dAirflow_dBleed_kg_s: v(SYNTHETIC.dAirflow_dBleed_kg_s),
    dThrust_dExtraction_N_W: v(SYNTHETIC.dThrust_dExtraction_N_W),
    dFuelFlow_dExtraction_kg_s_W: v(SYNTHETIC.dFuelFlow_dExtraction_kg_s_W),
    dAirflow_dExtraction_kg_s_W: v(SYNTHETIC.dAirflow_dExtraction_kg_s_W),
  };
  return {
    thrust_N: v(SYNTHETIC.thrust_N),
    fuelFlow_kg_s: v(SYNTHETIC.fuelFlow_kg_s),
    airflow_kg_s: v(SYNTHETIC.airflow_kg_s),
    sensitivities,
  };
}

/** The synthetic deck as SI CSV text (17 significant digits, exact), with or without the airflow columns. */
export function syntheticDeckCsv(withAirflow = true, referenceRecovery = '1'): string {
  const air = withAirflow;
  const header = [
    'altitude[m]',
    'mach[-]',
    'power[-]',
    'thrust[N]',
    'fuel_flow[kg/s]',
    ...(air ? ['airflow[kg/s]'] : []),
    'dthrust_drecovery[N]',
    'dfuel_flow_drecovery[kg/s]',
    ...(air ? ['dairflow_drecovery[kg/s]'] : []),
    'dthrust_dbleed[N]',
    'dfuel_flow_dbleed[kg/s]',
    ...(air ? ['dairflow_dbleed[kg/s]'] : []),
    'dthrust_dextraction[N/W]',
    'dfuel_flow_dextraction[kg/s/W]',
    ...(air ? ['dairflow_dextraction[kg/s/W]'] : []),
  ];
  const rows: string[] = [];
  for (const h of SYNTHETIC_ALTITUDES_M) {
    for (const m of SYNTHETIC_MACHS) {
      for (const p of SYNTHETIC_POWERS) {
        const d = syntheticAt(h, m, p);
        const s = d.sensitivities;
        rows.push(
          [
            h,
            m,
            p,
            d.thrust_N,
            d.fuelFlow_kg_s,
            ...(air ? [d.airflow_kg_s] : []),
            s.dThrust_dRecovery_N,
            s.dFuelFlow_dRecovery_kg_s,
            ...(air ? [s.dAirflow_dRecovery_kg_s!] : []),
            s.dThrust_dBleed_N,
            s.dFuelFlow_dBleed_kg_s,
            ...(air ? [s.dAirflow_dBleed_kg_s!] : []),
            s.dThrust_dExtraction_N_W,
            s.dFuelFlow_dExtraction_kg_s_W,
            ...(air ? [s.dAirflow_dExtraction_kg_s_W!] : []),
          ]
            .map((x) => String(x))
            .join(','),
        );
      }
    }
  }
  return [
    '# title: synthetic sensitivity deck',
    `# reference recovery: ${referenceRecovery}`,
    '# rating flightIdle: 0.2',
    '# rating maxCruise: 0.9',
    '# rating maxClimb: 0.95',
    '# rating takeoff: 1',
    header.join(','),
    ...rows,
    '',
  ].join('\n');
}

export function syntheticDeck(withAirflow = true, referenceRecovery = '1'): EngineDeck {
  return expectOk(parseDeckCsv(syntheticDeckCsv(withAirflow, referenceRecovery), 'synthetic.csv'), 'synthetic deck');
}
