/**
 * Installation by a deck's own sensitivities: per tabulated point, the change
 * of net thrust, fuel flow and engine airflow per unit inlet recovery, per
 * unit customer-bleed fraction and per watt of shaft power extraction, at the
 * same power setting (docs/deck-format.md, docs/installation.md). Where a
 * deck carries them (a deck generated from an engine cycle, or a maker's deck
 * with installation data), the installed engine is the first-order Taylor
 * expansion about the deck's own point:
 *
 *   X = X_deck + dX/deta (eta - eta_ref) + dX/dbeta beta + dX/dP P
 *
 * for X = thrust, fuel flow, airflow; eta the inlet recovery, eta_ref the
 * deck's reference recovery, beta the bleed flow over the core (compressor
 * inlet) flow and P the extracted shaft power. Where a deck does not carry
 * them, Raymer's rule (installationCorrections.ts) stays.
 */

/**
 * Per-point sensitivities, SI: derivatives per unit recovery (-), per unit
 * bleed fraction (bleed flow over core flow, -) and per watt of extraction.
 * The airflow derivatives are null when the deck has no airflow column.
 */
export interface InstallationSensitivities {
  readonly dThrust_dRecovery_N: number;
  readonly dFuelFlow_dRecovery_kg_s: number;
  readonly dAirflow_dRecovery_kg_s: number | null;
  readonly dThrust_dBleed_N: number;
  readonly dFuelFlow_dBleed_kg_s: number;
  readonly dAirflow_dBleed_kg_s: number | null;
  readonly dThrust_dExtraction_N_W: number;
  readonly dFuelFlow_dExtraction_kg_s_W: number;
  readonly dAirflow_dExtraction_kg_s_W: number | null;
}

/** What a sensitivity column differentiates and by what. */
export type SensitivityQuantity = 'thrust' | 'fuelFlow' | 'airflow';
export type SensitivityVariable = 'recovery' | 'bleed' | 'extraction';

/** CSV column names of the sensitivities (a unit in brackets follows). */
export type SensitivityCsvName =
  | 'dthrust_drecovery'
  | 'dfuel_flow_drecovery'
  | 'dairflow_drecovery'
  | 'dthrust_dbleed'
  | 'dfuel_flow_dbleed'
  | 'dairflow_dbleed'
  | 'dthrust_dextraction'
  | 'dfuel_flow_dextraction'
  | 'dairflow_dextraction';

export interface SensitivityField {
  /** Key in InstallationSensitivities, also the JSON column name (SI). */
  readonly key: keyof InstallationSensitivities;
  /** CSV column name. */
  readonly csv: SensitivityCsvName;
  readonly quantity: SensitivityQuantity;
  readonly variable: SensitivityVariable;
  /** Index in the 9-wide per-point block of a deck grid. */
  readonly slot: number;
}

/**
 * The nine sensitivity columns in grid order (the slot). CSV names follow
 * the deck's `name[unit]` style: `dthrust_drecovery[lbf]` is lbf per unit
 * recovery, `dthrust_dextraction[lbf/hp]` lbf per horsepower extracted.
 */
export const SENSITIVITY_FIELDS: readonly SensitivityField[] = [
  { key: 'dThrust_dRecovery_N', csv: 'dthrust_drecovery', quantity: 'thrust', variable: 'recovery', slot: 0 },
  { key: 'dFuelFlow_dRecovery_kg_s', csv: 'dfuel_flow_drecovery', quantity: 'fuelFlow', variable: 'recovery', slot: 1 },
  { key: 'dAirflow_dRecovery_kg_s', csv: 'dairflow_drecovery', quantity: 'airflow', variable: 'recovery', slot: 2 },
  { key: 'dThrust_dBleed_N', csv: 'dthrust_dbleed', quantity: 'thrust', variable: 'bleed', slot: 3 },
  { key: 'dFuelFlow_dBleed_kg_s', csv: 'dfuel_flow_dbleed', quantity: 'fuelFlow', variable: 'bleed', slot: 4 },
  { key: 'dAirflow_dBleed_kg_s', csv: 'dairflow_dbleed', quantity: 'airflow', variable: 'bleed', slot: 5 },
  { key: 'dThrust_dExtraction_N_W', csv: 'dthrust_dextraction', quantity: 'thrust', variable: 'extraction', slot: 6 },
  { key: 'dFuelFlow_dExtraction_kg_s_W', csv: 'dfuel_flow_dextraction', quantity: 'fuelFlow', variable: 'extraction', slot: 7 },
  { key: 'dAirflow_dExtraction_kg_s_W', csv: 'dairflow_dextraction', quantity: 'airflow', variable: 'extraction', slot: 8 },
];

/** Values per point in a grid's sensitivity block. */
export const SENSITIVITY_STRIDE = 9;

/** The columns a deck with sensitivities must carry: all six thrust and fuel-flow ones, and the three airflow ones exactly when it has airflow. */
export function requiredSensitivityFields(hasAirflow: boolean): readonly SensitivityField[] {
  return SENSITIVITY_FIELDS.filter((f) => hasAirflow || f.quantity !== 'airflow');
}

/** Packs sensitivities into `out[offset .. offset + 9)` (airflow ones 0 when null). */
export function writeSensitivities(s: InstallationSensitivities, out: Float64Array, offset: number): void {
  for (const f of SENSITIVITY_FIELDS) out[offset + f.slot] = s[f.key] ?? 0;
}


/** A writable InstallationSensitivities, for scratch use in hot loops. */
export type MutableSensitivities = { -readonly [K in keyof InstallationSensitivities]: InstallationSensitivities[K] };

/** A fresh all-zero sensitivities object (airflow ones null). */
export function emptySensitivities(): MutableSensitivities {
  return {
    dThrust_dRecovery_N: 0,
    dFuelFlow_dRecovery_kg_s: 0,
    dAirflow_dRecovery_kg_s: null,
    dThrust_dBleed_N: 0,
    dFuelFlow_dBleed_kg_s: 0,
    dAirflow_dBleed_kg_s: null,
    dThrust_dExtraction_N_W: 0,
    dFuelFlow_dExtraction_kg_s_W: 0,
    dAirflow_dExtraction_kg_s_W: null,
  };
}

/**
 * Reads sensitivities from `v[offset .. offset + 9)` into `target` (the
 * airflow ones null when `hasAirflow` is false) and returns it.
 * `fuelFactor` is the temperature factor sqrt(T/T_ISA) of deckTemperature.ts
 * (1 on a standard day or a deck with an ISA-deviation axis): with the
 * referred groups F/delta, Wf/(delta sqrt(theta)), W sqrt(theta)/delta and
 * P/(delta sqrt(theta)) held at the same pressure altitude (Walsh &
 * Fletcher, referred parameters), the recovery and bleed derivatives of fuel
 * flow scale by sqrt(theta) and of airflow by 1/sqrt(theta); the extraction
 * derivatives of thrust by 1/sqrt(theta), of fuel flow not at all, and of
 * airflow by 1/theta.
 */
export function readSensitivitiesInto(
  v: Float64Array,
  offset: number,
  hasAirflow: boolean,
  fuelFactor: number,
  target: MutableSensitivities,
): InstallationSensitivities {
  // Slot by slot, each times sqrt(theta ratio)^e with e = 0, 1, -1, 0, 1, -1, -1, 0, -2 in slot order; written out
  // (no loop over the field table): this runs on every deck lookup.
  const f = fuelFactor;
  const inverse = 1 / f;
  target.dThrust_dRecovery_N = v[offset]!;
  target.dFuelFlow_dRecovery_kg_s = v[offset + 1]! * f;
  target.dThrust_dBleed_N = v[offset + 3]!;
  target.dFuelFlow_dBleed_kg_s = v[offset + 4]! * f;
  target.dThrust_dExtraction_N_W = v[offset + 6]! * inverse;
  target.dFuelFlow_dExtraction_kg_s_W = v[offset + 7]!;
  if (hasAirflow) {
    target.dAirflow_dRecovery_kg_s = v[offset + 2]! * inverse;
    target.dAirflow_dBleed_kg_s = v[offset + 5]! * inverse;
    target.dAirflow_dExtraction_kg_s_W = v[offset + 8]! * (1 / (f * f));
  } else {
    target.dAirflow_dRecovery_kg_s = null;
    target.dAirflow_dBleed_kg_s = null;
    target.dAirflow_dExtraction_kg_s_W = null;
  }
  return target;
}

/**
 * As readSensitivitiesInto, into the packed slots `out[outOffset .. outOffset + 9)` (the airflow ones 0 without
 * airflow, as writeSensitivities packs null): the same products, so reading them back with factor 1 gives the same
 * numbers to the bit.
 */
export function scaleSensitivitiesInto(v: Float64Array, offset: number, hasAirflow: boolean, fuelFactor: number, out: Float64Array, outOffset: number): void {
  const f = fuelFactor;
  const inverse = 1 / f;
  out[outOffset] = v[offset]!;
  out[outOffset + 1] = v[offset + 1]! * f;
  out[outOffset + 2] = hasAirflow ? v[offset + 2]! * inverse : 0;
  out[outOffset + 3] = v[offset + 3]!;
  out[outOffset + 4] = v[offset + 4]! * f;
  out[outOffset + 5] = hasAirflow ? v[offset + 5]! * inverse : 0;
  out[outOffset + 6] = v[offset + 6]! * inverse;
  out[outOffset + 7] = v[offset + 7]!;
  out[outOffset + 8] = hasAirflow ? v[offset + 8]! * (1 / (f * f)) : 0;
}

/** As readSensitivitiesInto, into a new object. */
export function readSensitivities(v: Float64Array, offset: number, hasAirflow: boolean, fuelFactor = 1): InstallationSensitivities {
  return readSensitivitiesInto(v, offset, hasAirflow, fuelFactor, emptySensitivities());
}

/** One engine after installation by sensitivities; the loss parts add up to deck thrust minus thrust. */
export interface SensitivityInstalledEngine {
  readonly thrust_N: number;
  readonly fuelFlow_kg_s: number;
  /** Airflow after recovery, bleed and extraction (kg/s); null without airflow. */
  readonly airflow_kg_s: number | null;
  /** Thrust lost to recovery below the reference (N; negative is a gain), to bleed and to extraction (N). */
  readonly recoveryLoss_N: number;
  readonly bleedLoss_N: number;
  readonly extractionLoss_N: number;
  /** Fuel flow added by extraction (kg/s). */
  readonly extractionFuel_kg_s: number;
}

/**
 * The first-order installed engine (module comment): deck thrust (N), fuel
 * flow (kg/s) and airflow (kg/s or null) at the power setting, the
 * recovery difference eta - eta_ref (-), the bleed fraction of core flow (-)
 * and the extracted power (W).
 */
export function applyDeckSensitivities(
  deckThrust_N: number,
  deckFuelFlow_kg_s: number,
  deckAirflow_kg_s: number | null,
  s: InstallationSensitivities,
  recoveryDifference: number,
  bleedFractionOfCore: number,
  powerExtraction_W: number,
): SensitivityInstalledEngine {
  const out = { thrust_N: 0, fuelFlow_kg_s: 0, airflow_kg_s: null, recoveryLoss_N: 0, bleedLoss_N: 0, extractionLoss_N: 0, extractionFuel_kg_s: 0 };
  return applyDeckSensitivitiesInto(out, deckThrust_N, deckFuelFlow_kg_s, deckAirflow_kg_s, s, recoveryDifference, bleedFractionOfCore, powerExtraction_W);
}

/** A writable SensitivityInstalledEngine, for scratch use in hot loops. */
export type MutableSensitivityInstalledEngine = { -readonly [K in keyof SensitivityInstalledEngine]: SensitivityInstalledEngine[K] };

/** As applyDeckSensitivities, into `out` (returned). */
export function applyDeckSensitivitiesInto(
  out: MutableSensitivityInstalledEngine,
  deckThrust_N: number,
  deckFuelFlow_kg_s: number,
  deckAirflow_kg_s: number | null,
  s: InstallationSensitivities,
  recoveryDifference: number,
  bleedFractionOfCore: number,
  powerExtraction_W: number,
): SensitivityInstalledEngine {
  const recoveryLoss_N = -s.dThrust_dRecovery_N * recoveryDifference;
  const bleedLoss_N = -s.dThrust_dBleed_N * bleedFractionOfCore;
  const extractionLoss_N = -s.dThrust_dExtraction_N_W * powerExtraction_W;
  const extractionFuel_kg_s = s.dFuelFlow_dExtraction_kg_s_W * powerExtraction_W;
  out.thrust_N = deckThrust_N - recoveryLoss_N - bleedLoss_N - extractionLoss_N;
  out.fuelFlow_kg_s =
    deckFuelFlow_kg_s + s.dFuelFlow_dRecovery_kg_s * recoveryDifference + s.dFuelFlow_dBleed_kg_s * bleedFractionOfCore + extractionFuel_kg_s;
  out.airflow_kg_s =
    deckAirflow_kg_s === null
      ? null
      : deckAirflow_kg_s +
        (s.dAirflow_dRecovery_kg_s ?? 0) * recoveryDifference +
        (s.dAirflow_dBleed_kg_s ?? 0) * bleedFractionOfCore +
        (s.dAirflow_dExtraction_kg_s_W ?? 0) * powerExtraction_W;
  out.recoveryLoss_N = recoveryLoss_N;
  out.bleedLoss_N = bleedLoss_N;
  out.extractionLoss_N = extractionLoss_N;
  out.extractionFuel_kg_s = extractionFuel_kg_s;
  return out;
}
