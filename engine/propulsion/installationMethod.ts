/**
 * The recovery and installation-correction step: one engine's uninstalled
 * deck point and the inlet's recovery in, installed (pre-spillage) thrust,
 * fuel flow and airflow out, with the method named. This is the seam where
 * another method (deck sensitivity columns, a cycle re-run) is added: a new
 * id in `InstallationMethodId`, its case in `correctDeckPoint`, and its
 * entry in INSTALLATION_METHODS; the compiler then finds every place that
 * must handle it.
 */
import { applyInstallationCorrections, bleedFraction, type InstallationSettings } from './installationCorrections';
import { applyDeckSensitivitiesInto, type InstallationSensitivities, type MutableSensitivityInstalledEngine } from './installationSensitivities';

export type InstallationMethodId = 'raymerCorrections' | 'deckSensitivities';

export interface InstallationMethodEntry {
  readonly id: InstallationMethodId;
  readonly title: string;
  /** Published source of the method. */
  readonly source: string;
}

export const INSTALLATION_METHODS: Readonly<Record<InstallationMethodId, InstallationMethodEntry>> = {
  raymerCorrections: {
    id: 'raymerCorrections',
    title: "Raymer's ram-recovery, bleed and power-extraction corrections of the deck point (thrust loss C_ram x recovery shortfall and C_bleed x bleed fraction, fuel flow held at the power setting)",
    source: 'Raymer, Aircraft Design: A Conceptual Approach, installed thrust methodology (coefficients from memory, docs/installation.md)',
  },
  deckSensitivities: {
    id: 'deckSensitivities',
    title: "The deck's installation sensitivities (thrust, fuel flow and airflow linear in recovery, bleed fraction and extracted power at the power setting)",
    source: 'First-order expansion about the deck point in its per-point sensitivity columns (docs/deck-format.md); a cycle-generated deck computes them through the cycle',
  },
};

/** One line naming the method, for every installed result. */
export function describeInstallationMethod(method: InstallationMethodId): string {
  return INSTALLATION_METHODS[method].title;
}

/** The method a deck calls for: its sensitivities when it carries them, else Raymer's corrections. */
export function defaultInstallationMethod(hasSensitivities: boolean): InstallationMethodId {
  return hasSensitivities ? 'deckSensitivities' : 'raymerCorrections';
}

/** One engine's uninstalled deck numbers at the query (SI): the input of the step. */
export interface DeckPointValues {
  readonly thrust_N: number;
  readonly fuelFlow_kg_s: number;
  /** Physical airflow at the inlet's recovery (kg/s), null without an airflow column. */
  readonly airflow_kg_s: number | null;
  /** Deck airflow at the reference recovery (kg/s), null without an airflow column: the base of the sensitivities' expansion. */
  readonly deckAirflow_kg_s?: number | null;
  /** The deck's installation sensitivities at the point; null (or absent) when it has none. */
  readonly sensitivities?: InstallationSensitivities | null;
}

/** What the inlet delivers at the query: recovery pt2/pt0 (-) and the deck's reference recovery (-). */
export interface InletRecoveryValues {
  readonly recovery: number;
  readonly referenceRecovery: number;
  /** Flight Mach (-), for Raymer's supersonic C_ram; 0 when absent. */
  readonly mach?: number;
}

/** One engine after the step, before spillage drag. */
export interface CorrectedDeckPoint {
  readonly thrust_N: number;
  readonly fuelFlow_kg_s: number;
  readonly airflow_kg_s: number | null;
  readonly method: InstallationMethodId;
  /** Thrust lost (N) to recovery below the reference (negative: a gain), to bleed and to extraction, by the method. */
  readonly recoveryLoss_N: number;
  readonly bleedLoss_N: number;
  readonly extractionLoss_N: number;
}

/**
 * Installed thrust (N), fuel flow (kg/s) and airflow (kg/s) of one engine by
 * `method`. raymerCorrections: T = T_deck (1 - C_ram (eta_ref - eta) -
 * C_bleed f_bleed) - k_T P, W_f = W_f,deck (1 + k_b f_bleed) + k_f P
 * (installationCorrections.ts); airflow passes through. deckSensitivities:
 * X = X_deck + dX/deta (eta - eta_ref) + dX/dbeta beta + dX/dP P for
 * thrust, fuel flow and airflow (installationSensitivities.ts), the bleed
 * fraction beta taken on the airflow at the inlet's recovery; needs
 * `deck.sensitivities` (a caller bug without them: throws).
 */
export function correctDeckPoint(
  method: InstallationMethodId,
  deck: DeckPointValues,
  inlet: InletRecoveryValues,
  installation: InstallationSettings,
): CorrectedDeckPoint {
  const out: MutableCorrectedDeckPoint = { thrust_N: 0, fuelFlow_kg_s: 0, airflow_kg_s: null, method, recoveryLoss_N: 0, bleedLoss_N: 0, extractionLoss_N: 0 };
  return correctDeckPointInto(out, method, deck, inlet, installation);
}

/** A writable CorrectedDeckPoint, for scratch use in hot loops. */
export type MutableCorrectedDeckPoint = { -readonly [K in keyof CorrectedDeckPoint]: CorrectedDeckPoint[K] };

// Scratch of the sensitivities case (never escapes correctDeckPointInto). Its airflow starts as a number, so that
// the engine evaluation's NaN for none (engineEvaluation.ts EngineScratch) keeps the field a number in place.
const sensitivityScratch: MutableSensitivityInstalledEngine = {
  thrust_N: 0,
  fuelFlow_kg_s: 0,
  airflow_kg_s: Number.NaN,
  recoveryLoss_N: 0,
  bleedLoss_N: 0,
  extractionLoss_N: 0,
  extractionFuel_kg_s: 0,
};

/**
 * As correctDeckPoint, into `out` (returned): no allocation for the deck-sensitivities method. An airflow of NaN
 * (the engine evaluation's scratch, engineEvaluation.ts) is read as none, as null is, and passed through as NaN.
 */
export function correctDeckPointInto(
  out: MutableCorrectedDeckPoint,
  method: InstallationMethodId,
  deck: DeckPointValues,
  inlet: InletRecoveryValues,
  installation: InstallationSettings,
): CorrectedDeckPoint {
  out.method = method;
  switch (method) {
    case 'raymerCorrections': {
      const corrected = applyInstallationCorrections(
        deck.thrust_N,
        deck.fuelFlow_kg_s,
        inlet.referenceRecovery,
        inlet.recovery,
        bleedFraction(installation.bleed, deck.airflow_kg_s),
        installation,
        inlet.mach ?? 0,
      );
      out.thrust_N = corrected.thrust_N;
      out.fuelFlow_kg_s = corrected.fuelFlow_kg_s;
      out.airflow_kg_s = deck.airflow_kg_s;
      out.recoveryLoss_N = deck.thrust_N * corrected.ramLoss;
      out.bleedLoss_N = deck.thrust_N * corrected.bleedLoss;
      out.extractionLoss_N = corrected.extractionThrust_N;
      return out;
    }
    case 'deckSensitivities': {
      const s = deck.sensitivities;
      if (s == null) throw new Error('correctDeckPoint: method deckSensitivities needs the deck point\'s sensitivities');
      const e = applyDeckSensitivitiesInto(
        sensitivityScratch,
        deck.thrust_N,
        deck.fuelFlow_kg_s,
        deck.deckAirflow_kg_s ?? deck.airflow_kg_s,
        s,
        inlet.recovery - inlet.referenceRecovery,
        bleedFraction(installation.bleed, deck.airflow_kg_s),
        installation.powerExtraction_W,
      );
      out.thrust_N = e.thrust_N;
      out.fuelFlow_kg_s = e.fuelFlow_kg_s;
      out.airflow_kg_s = e.airflow_kg_s;
      out.recoveryLoss_N = e.recoveryLoss_N;
      out.bleedLoss_N = e.bleedLoss_N;
      out.extractionLoss_N = e.extractionLoss_N;
      return out;
    }
  }
}
