/**
 * engine/cautions's public surface (hand-written; docs/style.md §5): the caution
 * record, the user's thresholds and the catalogue of ids with their sources.
 */
export type { Caution, CautionSeverity } from './caution';
export { CAUTION_CATALOGUE, type CautionEntry, type MissionCautionId } from './cautionCatalogue';
export { DEFAULT_CAUTION_SETTINGS, type CautionSettings } from './cautionSettings';
export type { PropulsionCautionId } from './propulsionCautions';
