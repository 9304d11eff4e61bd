/**
 * The jobs of the analyses' planned missions (missionPlan.ts) as plain data,
 * and the mission input of each: a worker thread given the same study builds
 * the same input from the job as the calling thread did.
 */
import type { Result } from '../core/result';
import type { MissionInput } from '../mission/missionTypes';
import type { AnalysisError } from './analysisTypes';
import { thrustDragCrossover, type CrossoverQuery, type CrossoverResult } from './crossover';
import { flightCeilings, type Ceiling, type EnvelopeQuery } from './envelope';
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

/** A point task of an analysis (missionPlan.ts PointsRound): the crossover and the ceilings of the comparison's mix `mask` (0 all-A, 15 all-B). */
export interface PointJob {
  readonly kind: 'designFigures';
  readonly mask: number;
  readonly crossover: CrossoverQuery;
  readonly ceilings: EnvelopeQuery;
}

export interface PointOutput {
  readonly crossover: Result<CrossoverResult, AnalysisError>;
  readonly ceilings: Result<readonly Ceiling[], AnalysisError>;
}

/** The output of a point task on its mix's models; null when the task is not of the base's analysis. */
export function pointJobOutput(base: AnalysisJobBase, job: PointJob): PointOutput | null {
  if (base.kind !== 'compare') return null;
  const input = base.build(choiceOf(job.mask));
  return designPoints({ aero: input.aero, propulsion: input.propulsion }, job);
}

/** The crossover and ceilings of a point task on given models. */
export function designPoints(models: { readonly aero: MissionInput['aero']; readonly propulsion: MissionInput['propulsion'] }, job: PointJob): PointOutput {
  return { crossover: thrustDragCrossover(models, job.crossover), ceilings: flightCeilings(models, job.ceilings) };
}
