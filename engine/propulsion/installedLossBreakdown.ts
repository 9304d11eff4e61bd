/**
 * Why installed thrust is below the deck's: one engine's loss split into
 * recovery, bleed, shaft power extraction and spillage, each in newtons,
 * as the EnginePoint carries them.
 */
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
 * Splits one engine's installation loss (N) into its parts, as the
 * installation computed them by its method (the deck's sensitivities, or
 * Raymer's corrections: recovery T_deck C_ram (eta_ref - eta), bleed
 * T_deck C_bleed f_bleed, extraction k_T P), and the spillage drag. The
 * parts add up to uninstalledThrust_N - thrust_N.
 */
export function installedLossBreakdown(engine: EnginePoint): InstalledLossBreakdown {
  const { recoveryLoss_N, bleedLoss_N, extractionLoss_N } = engine;
  const spillage_N = engine.spillageDrag_N;
  return {
    recoveryLoss_N,
    bleedLoss_N,
    extractionLoss_N,
    spillage_N,
    total_N: recoveryLoss_N + bleedLoss_N + extractionLoss_N + spillage_N,
  };
}
