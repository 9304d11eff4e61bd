/**
 * The jobs of the analyses' planned missions (missionPlan.ts) as plain data,
 * and the mission input of each: a worker thread given the same study builds
 * the same input from the job as the calling thread did.
 */
import type { MissionInput } from '../mission/missionTypes';
import type { InletFactorBuilder } from './inletComparison';
import { choiceOf } from './inletComparison';
import { tradeMissionInput, type TradeFactorName } from './tradeFactors';

export type AnalysisJob =
  /** The inlet comparison's mix `mask` (bit i set: factor i from design B, inletComparison.ts INLET_FACTORS). */
  | { readonly kind: 'compare'; readonly mask: number }
  /** A trade-factor mission: the design mission (`solve`) with `factor` moved by `u` units (null: not moved). */
  | { readonly kind: 'trade'; readonly factor: TradeFactorName | null; readonly u: number; readonly solve: MissionInput['solve'] }
  /** A payload-range point: the mission in maximum-range mode at `payload_kg`. */
  | { readonly kind: 'payloadRange'; readonly payload_kg: number };

/** What the jobs of one analysis are built from: the comparison's builder, or the mission input (and C_ram) of the others. */
export type AnalysisJobBase =
  | { readonly kind: 'compare'; readonly build: InletFactorBuilder }
  | { readonly kind: 'trade'; readonly input: MissionInput; readonly cRam: number }
  | { readonly kind: 'payloadRange'; readonly input: MissionInput };

/** The mission input of a job; null when the job is not of the base's analysis. */
export function analysisJobInput(base: AnalysisJobBase, job: AnalysisJob): MissionInput | null {
  if (base.kind === 'compare' && job.kind === 'compare') return base.build(choiceOf(job.mask));
  if (base.kind === 'trade' && job.kind === 'trade') return tradeMissionInput({ ...base.input, solve: job.solve }, job.factor, job.u, base.cRam);
  if (base.kind === 'payloadRange' && job.kind === 'payloadRange') return { ...base.input, solve: { kind: 'maxRange', payload_kg: job.payload_kg } };
  return null;
}
