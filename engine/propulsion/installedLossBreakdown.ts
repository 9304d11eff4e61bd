/**
 * Why installed thrust is below the deck's: one engine's loss split into
 * recovery, bleed, shaft power extraction and spillage, each in newtons,
 * from an EnginePoint and the installation settings that produced it.
 */
import {
  DEFAULT_C_BLEED,
  DEFAULT_C_RAM,
  bleedFraction,
  type InstallationSettings,
} from './installationCorrections';
import type { EnginePoint } from './propulsionModel';

export interface InstalledLossBreakdown {
  /** Thrust lost to recovery below the deck's reference (N); negative is a gain. */
  readonly recoveryLoss_N: number;
  /** Thrust lost to customer bleed (N). */
  readonly bleedLoss_N: number;
  /** Thrust lost to shaft power extraction (N). */
  readonly extractionLoss_N: number;
  /** Spillage drag net of lip suction (N). */
  readonly spillage_N: number;
  /** Sum of the four = uninstalled thrust - installed thrust (N). */
  readonly total_N: number;
}

/**
 * Splits one engine's installation loss (N) into its parts, using the same
 * Raymer corrections as installationCorrections.ts: recovery
 * T_deck C_ram (eta_ref - eta), bleed T_deck C_bleed f_bleed, extraction
 * k_T P, and the spillage drag. The parts add up to
 * uninstalledThrust_N - thrust_N.
 */
export function installedLossBreakdown(engine: EnginePoint, installation: InstallationSettings): InstalledLossBreakdown {
  const t = engine.uninstalledThrust_N;
  const recoveryLoss_N = t * (installation.cRam ?? DEFAULT_C_RAM) * (engine.referenceRecovery - engine.recovery);
  const bleedLoss_N = t * (installation.cBleed ?? DEFAULT_C_BLEED) * bleedFraction(installation.bleed, engine.airflow_kg_s);
  const extractionLoss_N = installation.powerExtraction_W * (installation.powerExtractionThrust_N_W ?? 0);
  const spillage_N = engine.spillageDrag_N;
  return {
    recoveryLoss_N,
    bleedLoss_N,
    extractionLoss_N,
    spillage_N,
    total_N: recoveryLoss_N + bleedLoss_N + extractionLoss_N + spillage_N,
  };
}
