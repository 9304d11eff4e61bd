/**
 * What a worker thread builds an analysis's planned missions from
 * (engine/analysis analysisJobInput): the same study as the calling thread,
 * and the analysis named by plain data, so both build the same mission
 * inputs from the same jobs.
 */
import { inletFactorBuilder, type AnalysisJobBase } from '../analysis';
import { err, ok, type Result } from '../core';
import type { ProjectFailure, Study } from './prepareStudy';

/** The analysis whose missions a worker flies: the comparison of two inlets, or the trade factors or payload-range diagram of one (the project's active inlet when none is named). */
export type AnalysisSpec =
  | { readonly kind: 'compare'; readonly nameA: string; readonly nameB: string }
  | { readonly kind: 'trade'; readonly inlet?: string; readonly cRam: number }
  | { readonly kind: 'payloadRange'; readonly inlet?: string };

/** The job base of `spec` on `study`: the comparison's factor builder, or the inlet's mission input. */
export function analysisJobBase(study: Study, spec: AnalysisSpec): Result<AnalysisJobBase, ProjectFailure> {
  if (spec.kind === 'compare') {
    const pair = study.inletPair(spec.nameA, spec.nameB);
    return pair.ok ? ok({ kind: 'compare', build: inletFactorBuilder(pair.value) }) : err(pair.error);
  }
  const input = study.inputFor(spec.inlet);
  if (!input.ok) return input;
  return ok(spec.kind === 'trade' ? { kind: 'trade', input: input.value, cRam: spec.cRam } : { kind: 'payloadRange', input: input.value });
}
