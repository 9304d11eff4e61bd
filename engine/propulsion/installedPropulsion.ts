/**
 * The installed PropulsionModel of an engine deck: the deck (deckLookup.ts,
 * deckInversion.ts) and the standard atmosphere wired into the installed
 * model (installedModel.ts). Also the airframe increments of an inlet.
 */
import { atmosphere } from '../aero/standardAtmosphere';
import type { CautionSettings } from '../cautions/cautionSettings';
import { powerForThrust } from './deckInversion';
import { lookupDeck, powerBounds, ratingPower } from './deckLookup';
import type { EngineDeck } from './engineDeck';
import type { InletDesign } from './inletDesign';
import type { InstallationSettings } from './installationCorrections';
import { makeInstalledModel, type DeckAccess } from './installedModel';
import type { PropulsionModel } from './propulsionModel';

export { inletDragIncrementCd0, inletWeight } from './inletDesign';

export interface InstalledPropulsionOptions {
  /** Uninstalled deck, per engine. */
  readonly deck: EngineDeck;
  readonly engineCount: number;
  readonly inlet: InletDesign;
  /** Design whose recovery (throat and fan-face Mach) is used; default `inlet` (for the A-vs-B breakdown). */
  readonly recoveryFrom?: InletDesign;
  /** Design whose capture area and lip suction set spillage drag; default `inlet`. */
  readonly spillageFrom?: InletDesign;
  readonly installation: InstallationSettings;
  readonly cautionSettings: CautionSettings;
}

/** The deck and the 1976 standard atmosphere as the installed model's DeckAccess. */
export function deckAccess(deck: EngineDeck): DeckAccess {
  return {
    title: deck.title,
    parametric: deck.parametric,
    hasAirflow: deck.hasAirflow,
    referenceRecovery: deck.referenceRecovery,
    lookup: (condition, power) => lookupDeck(deck, condition, power),
    ratingPower: (rating) => {
      const r = ratingPower(deck, rating);
      return r.ok ? r.value : null;
    },
    powerBounds: (condition) => powerBounds(deck, condition),
    powerForThrust: (condition, thrust_N, ceilingPower) => {
      const r = powerForThrust(deck, condition, thrust_N, ceilingPower);
      return r.ok ? r.value.lookup.power : null;
    },
    ambient: (condition) => atmosphere(condition.altitude_m, condition.isaDev_K),
  };
}

/**
 * Installed propulsion, all engines, on an uninstalled deck: inlet recovery
 * against the deck's reference (Raymer's ram-recovery correction), customer
 * bleed, shaft power extraction, minus spillage drag (NACA Report 1187
 * additive drag less lip suction). Forces in N, flows in kg/s, for the
 * whole aircraft; `perEngine` has the breakdown. `recoveryFrom` /
 * `spillageFrom` build hybrid models (one design's recovery with another's
 * spillage). Invalid designs or settings throw (validate them first).
 */
export function makeInstalledPropulsion(options: InstalledPropulsionOptions): PropulsionModel {
  return makeInstalledModel(deckAccess(options.deck), options);
}
