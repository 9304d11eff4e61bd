/**
 * The user-editable caution thresholds (DESIGN.md §2.6), SI. Each default is
 * common practice or from a named source, stated in CAUTION_CATALOGUE
 * (engine/cautions/cautionCatalogue.ts, owned by engine/mission).
 */
import { FOOT_M } from '../units/unitTable';
export interface CautionSettings {
  /** Least residual climb rate at top of climb (m/s); 300 ft/min common practice. */
  readonly minResidualClimbRate_m_s: number;
  /** Least load factor to buffet onset (-); 1.3 g common practice. */
  readonly minBuffetLoadFactor: number;
  /** Margin below VMO/MMO that still passes (m/s CAS, - Mach); 0 by default. */
  readonly vmoMargin_m_s: number;
  readonly mmoMargin: number;
  /** Least reserve fuel as a fraction of the preset's minimum (-); 1.0. */
  readonly minReserveFraction: number;
  /** Raise a caution for any deck lookup outside the table. */
  readonly cautionOnDeckExtrapolation: boolean;
  /** Highest inlet throat Mach (-); about 0.8 common practice. */
  readonly maxThroatMach: number;
  /** Fan-face Mach band (-); about 0.4 to 0.6 common practice. */
  readonly minFanFaceMach: number;
  readonly maxFanFaceMach: number;
  /** Largest spillage drag as a share of the engine's thrust (-); 5 % by default. */
  readonly maxSpillageShare: number;
}

export const DEFAULT_CAUTION_SETTINGS: CautionSettings = {
  minResidualClimbRate_m_s: 300 * FOOT_M / 60,
  minBuffetLoadFactor: 1.3,
  vmoMargin_m_s: 0,
  mmoMargin: 0,
  minReserveFraction: 1.0,
  cautionOnDeckExtrapolation: true,
  maxThroatMach: 0.8,
  minFanFaceMach: 0.4,
  maxFanFaceMach: 0.6,
  maxSpillageShare: 0.05,
};

/**
 * Whether a caution passed on from the propulsion model is shown under
 * `settings`: deck extrapolation only when `cautionOnDeckExtrapolation`;
 * everything else always. The one place this setting is read.
 */
export function propulsionCautionShown(caution: { readonly id: string }, settings: CautionSettings): boolean {
  return settings.cautionOnDeckExtrapolation || caution.id !== 'deck_extrapolation';
}
