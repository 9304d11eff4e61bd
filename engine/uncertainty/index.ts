/**
 * engine/uncertainty's public surface (hand-written; docs/style.md §5): the
 * seeded Monte Carlo run over a project's declared uncertain inputs.
 */
export type { UncertainInputKind } from './uncertainInputs';
export { runUncertainty, type UncertaintyResult } from './uncertaintyRun';
