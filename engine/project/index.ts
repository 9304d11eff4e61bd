/**
 * engine/project's public surface (hand-written; docs/style.md §5): the project
 * file (schema, parsing with located issues, writing), the specs built from
 * it, and the deck it names. Building a study from it: engine/study.
 */
export type { BuildOptions, ProjectResources } from './buildMissionInput';
export { parseJsonText } from './jsonText';
export { LEG_KIND_ORDER, LEG_KINDS, legKindLabel, type LegKindInfo, type ProjectLegKind } from './legKinds';
export { parseProject, parseProjectData } from './parseProject';
export { deckReference, embeddedDeckFile, withEmbeddedDeckText, withoutEmbeddedDeckText, type DeckReference } from './projectDeck';
export { formatJsonPath, fromZodIssues, makeIssue, type ProjectIssue } from './projectIssue';
export { inletSchema, type Project, type ProjectLeg } from './projectSchema';
export { inletDesignOf, installationOf } from './projectSpecs';
export { projectToJson } from './projectToJson';
export { MAX_UNCERTAINTY_SAMPLES } from './uncertaintySchema';
export { gridSize, parseShard, parseVary, shardRange, type Shard, type SweepAxis } from './sweepGrid';
export { flySweepCase, sweepCsvHead, sweepCsvLine, sweepJsonLine, sweepJsonlHead, type SweepRow } from './sweepCase';
export { installationAssumptions } from './installationAssumptions';
export { recoveryMethodVariants } from './recoveryMethodVariants';
