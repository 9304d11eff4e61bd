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

export type InstallationMethodId = 'raymerCorrections';

export interface InstallationMethodEntry {
  readonly id: InstallationMethodId;
  readonly title: string;
  /** Published source of the method. */
  readonly source: string;
}

export const INSTALLATION_METHODS: Readonly<Record<InstallationMethodId, InstallationMethodEntry>> = {
  raymerCorrections: {
    id: 'raymerCorrections',
    title: 'Ram-recovery, bleed and power-extraction corrections of the deck point',
    source: 'Raymer, Aircraft Design: A Conceptual Approach, installed thrust methodology (coefficients from memory, docs/installation.md)',
  },
};

/** One engine's uninstalled deck numbers at the query (SI): the input of the step. */
export interface DeckPointValues {
  readonly thrust_N: number;
  readonly fuelFlow_kg_s: number;
  /** Physical airflow at the inlet's recovery (kg/s), null without an airflow column. */
  readonly airflow_kg_s: number | null;
}

/** What the inlet delivers at the query: recovery pt2/pt0 (-) and the deck's reference recovery (-). */
export interface InletRecoveryValues {
  readonly recovery: number;
  readonly referenceRecovery: number;
}

/** One engine after the step, before spillage drag. */
export interface CorrectedDeckPoint {
  readonly thrust_N: number;
  readonly fuelFlow_kg_s: number;
  readonly airflow_kg_s: number | null;
  readonly method: InstallationMethodId;
}

/**
 * Installed thrust (N), fuel flow (kg/s) and airflow (kg/s) of one engine by
 * `method`. raymerCorrections: T = T_deck (1 - C_ram (eta_ref - eta) -
 * C_bleed f_bleed) - k_T P, W_f = W_f,deck (1 + k_b f_bleed) + k_f P
 * (installationCorrections.ts); airflow passes through.
 */
export function correctDeckPoint(
  method: InstallationMethodId,
  deck: DeckPointValues,
  inlet: InletRecoveryValues,
  installation: InstallationSettings,
): CorrectedDeckPoint {
  switch (method) {
    case 'raymerCorrections': {
      const corrected = applyInstallationCorrections(
        deck.thrust_N,
        deck.fuelFlow_kg_s,
        inlet.referenceRecovery,
        inlet.recovery,
        bleedFraction(installation.bleed, deck.airflow_kg_s),
        installation,
      );
      return { thrust_N: corrected.thrust_N, fuelFlow_kg_s: corrected.fuelFlow_kg_s, airflow_kg_s: deck.airflow_kg_s, method };
    }
  }
}
