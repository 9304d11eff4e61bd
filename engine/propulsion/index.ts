/**
 * engine/propulsion's public surface (hand-written; docs/style.md §5): the deck
 * (type, lookups, its file errors), inlet designs, installation settings and
 * methods, and the installed propulsion model with its loss breakdown.
 * Reading a deck file's text: engine/study (parseDeckText).
 */
export type { DeckFileError } from './deckFileError';
export { deckGridPoints } from './deckGrid';
export { lookupDeck, ratingPower } from './deckLookup';
export { describeReferenceRecovery, type EngineDeck } from './engineDeck';
export { validateInletDesign, type InletDesign } from './inletDesign';
export { DEFAULT_C_RAM, validateInstallation, type InstallationSettings } from './installationCorrections';
export { ROUNDED_PITOT_LIP_SOURCE } from './lipSuction';
export { DECK_INTERPOLATION_TEXT } from './deckCorrection';
export { defaultInstallationMethod, describeInstallationMethod, type InstallationMethodId } from './installationMethod';
export { installedLossBreakdown, type InstalledLossBreakdown } from './installedLossBreakdown';
export { makeInstalledPropulsion } from './installedPropulsion';
export { RATING_LABEL, RATING_NAMES, type FlightCondition, type InstalledPoint, type PropulsionModel, type RatingName } from './propulsionModel';
export { CUSTOMARY_DECK_UNITS, deckToCsv, SI_DECK_UNITS } from './deckCsv';
export { deckToJson } from './deckJson';
