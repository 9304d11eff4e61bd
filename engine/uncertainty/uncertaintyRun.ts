/**
 * The seeded Monte Carlo of a project's declared uncertainties: a Latin
 * hypercube over the inputs (latinHypercube.ts, seeded xoshiro128**), every
 * sample applied to the project (uncertainInputs.ts) and the mission flown
 * with each design (inlet) on the SAME sample (common random numbers), so the
 * difference B - A carries only what differs between the designs. Output:
 * mean, sd, P5/P50/P95 of block fuel per design and of B - A, the share of
 * samples in which B burns less than A, and the inputs that drive the spread
 * by Spearman's rank correlation. Pure and deterministic: the same project,
 * samples and seed give the same numbers bit for bit.
 */
import { adjustPropulsion } from '../analysis/adjustedPropulsion';
import type { AnalysisError, MissionSolver } from '../analysis/analysisTypes';
import { err, ok, type Result } from '../core/result';
import type { MissionInput } from '../mission/missionTypes';
import { solveMission } from '../mission/solveMission';
import { buildMissionInput } from '../project/buildMissionInput';
import { projectDeck } from '../project/projectDeck';
import type { Project } from '../project/projectSchema';
import type { EngineDeck } from '../propulsion/engineDeck';
import { distributionIssue, drawFromUnit } from './inputDistribution';
import { latinHypercube } from './latinHypercube';
import { spearmanRho } from './rankCorrelation';
import { summarize, shareBelowZero, type SampleSummary } from './sampleStatistics';
import { seededRandom } from './seededRandom';
import { applySample, uncertainInputsOf, type UncertainInput } from './uncertainInputs';

/** How the designs share samples: the same rows (common random numbers) or independent designs per inlet (for checks). */
export type SamplePairing = 'common' | 'independent';

export interface UncertaintyStudy {
  readonly project: Project;
  /** The deck a file reference names, read by the caller. */
  readonly resources: { readonly deck?: EngineDeck };
  /** Inlet designs to fly: one, or two (A then B) for a comparison. */
  readonly designs: readonly string[];
  /** Samples per design (>= 2); default the project's `uncertainty.samples` (200). */
  readonly samples?: number;
  /** Sampler seed (integer 0..2^32-1); default the project's `uncertainty.seed` (1). */
  readonly seed?: number;
  /** Default 'common'. */
  readonly pairing?: SamplePairing;
  /** Mission solver; default engine/mission/solveMission. */
  readonly solve?: MissionSolver;
}

export interface UncertaintyProgress {
  readonly done: number;
  readonly total: number;
}

export interface DriverFigure {
  readonly input: string;
  readonly label: string;
  /** Spearman's rho between the input's draw and B - A (null with one design or no spread). */
  readonly rhoDifference: number | null;
  /** Spearman's rho between the draw and each design's block fuel. */
  readonly rhoDesigns: readonly (number | null)[];
  /**
   * rho^2 of this input over the sum of rho^2 of all inputs, on B - A (on
   * design A's block fuel with one design): an approximate variance share,
   * fair for a monotone, nearly additive response with independent inputs.
   */
  readonly share: number | null;
}

export interface UncertaintyResult {
  readonly method: string;
  readonly sampler: 'latinHypercube';
  readonly pairing: SamplePairing;
  readonly samples: number;
  readonly seed: number;
  readonly inputs: readonly { readonly id: string; readonly label: string; readonly distribution: string; readonly reason: string }[];
  /** The project's own (deterministic) answer. */
  readonly deterministic: { readonly blockFuel_kg: readonly number[]; readonly difference_kg: number | null };
  readonly designs: readonly { readonly name: string; readonly blockFuel_kg: SampleSummary }[];
  /** B - A over the samples; null with one design. */
  readonly difference_kg: SampleSummary | null;
  /** Share of samples with B - A < 0 (-); null with one design. */
  readonly probabilityBBetter: number | null;
  /** Inputs by |rho| on B - A (on A's block fuel with one design), largest first. */
  readonly drivers: readonly DriverFigure[];
  /** Samples flown for every design (failed ones left out of every statistic). */
  readonly samplesUsed: number;
  readonly failures: { readonly count: number; readonly messages: readonly string[] };
  /** Values held at physical bounds, counted over the samples. */
  readonly held: readonly { readonly what: string; readonly samples: number }[];
  /** Per-sample values, in sample order: inputs[i][j] is input j's draw in sample i. */
  readonly values: {
    readonly inputs: readonly (readonly number[])[];
    readonly blockFuel_kg: readonly (readonly number[])[];
    readonly difference_kg: readonly number[] | null;
  };
  readonly missions: number;
}

export const UNCERTAINTY_METHOD =
  "Latin hypercube sampling (McKay, Beckman & Conover 1979) of the declared inputs, seeded xoshiro128**; normal inputs drawn by inverting the truncated normal CDF; every design flown on the same samples (common random numbers); drivers by Spearman's rank correlation.";

/** Stream of the k-th design's independent sample (pairing 'independent'): a seed far from `seed` in SplitMix32 terms. */
function independentSeed(seed: number, k: number): number {
  return (seed + Math.imul(k, 0x6a09e667)) >>> 0;
}

function studyIssue(study: UncertaintyStudy, inputs: readonly UncertainInput[], n: number, seed: number): string | null {
  if (study.designs.length < 1 || study.designs.length > 2) return `give one or two inlet designs (got ${study.designs.length})`;
  if (!Number.isInteger(n) || n < 2) return `samples is ${n}, expected a whole number >= 2`;
  if (!Number.isInteger(seed) || seed < 0 || seed > 4294967295) return `seed is ${seed}, expected a whole number 0..4294967295`;
  for (const name of study.designs) {
    if (!study.project.inlets.some((i) => i.name === name)) return `"${name}" is not an inlet design of the project`;
  }
  for (const input of inputs) {
    const issue = distributionIssue(input.distribution);
    if (issue !== null) return `uncertain input ${input.id}: ${issue}`;
  }
  return null;
}

/**
 * The Monte Carlo as a generator: yields progress after every mission and
 * returns the result; a caller cancels by not resuming it (or by calling
 * `return()`). `runUncertainty` drives it with callbacks.
 * Missions: designs x (samples + 1), the +1 being the deterministic answer.
 */
export function* uncertaintySteps(study: UncertaintyStudy): Generator<UncertaintyProgress, Result<UncertaintyResult, AnalysisError>, void> {
  const settings = study.project.uncertainty;
  const n = study.samples ?? settings?.samples ?? 200;
  const seed = study.seed ?? settings?.seed ?? 1;
  const pairing = study.pairing ?? 'common';
  const solve: MissionSolver = study.solve ?? ((m) => solveMission(m));
  const inputs = uncertainInputsOf(study.project);
  const issue = studyIssue(study, inputs, n, seed);
  if (issue !== null) return err({ code: 'invalid_input', message: `uncertainty: ${issue}` });

  // Resolve the deck once: every sample then flies the same deck object.
  const deck = projectDeck(study.project, study.resources);
  if (!deck.ok) return err({ code: 'invalid_input', message: `uncertainty: ${deck.error.map((e) => e.message).join('; ')}` });
  const resources = { deck: deck.value };
  const needsSensitivities = inputs.some((i) => i.alternatives?.includes('deckSensitivities'));
  if (needsSensitivities && !deck.value.hasSensitivities) {
    return err({ code: 'invalid_input', message: `uncertainty: the recovery-method alternative "deckSensitivities" needs a deck with sensitivity columns; deck "${deck.value.title}" has none` });
  }
  const withDeck = (p: Project): Project => ({ ...p, engine: { ...p.engine, deck: { kind: 'file', path: '(resolved deck)' } } });

  const designs = study.designs;
  const total = designs.length * (n + 1);
  let done = 0;
  const build = (project: Project, design: string, fuelFlowScale: number): Result<MissionInput, string> => {
    const built = buildMissionInput(withDeck(project), resources, { inletName: design });
    if (!built.ok) return err(built.error.map((e) => `${e.path}: ${e.message}`).join('; '));
    if (fuelFlowScale === 1) return ok(built.value);
    return ok({ ...built.value, propulsion: adjustPropulsion(built.value.propulsion, { recoveryDelta: 0, cRam: 0, fuelFlowScale }) });
  };

  // The deterministic answer.
  const nominal: number[] = [];
  for (const design of designs) {
    const input = build(study.project, design, 1);
    if (!input.ok) return err({ code: 'invalid_input', message: `uncertainty: the project does not build with "${design}": ${input.error}` });
    const r = solve(input.value);
    done++;
    yield { done, total };
    if (r.status !== 'ok') return err({ code: 'mission_failed', message: `uncertainty: the project's own mission with "${design}" failed: ${r.status}: ${r.statusMessage}` });
    nominal.push(r.blockFuel_kg);
  }

  const d = inputs.length;
  const unitRows = designs.map((_, k) => latinHypercube(n, d, seededRandom(pairing === 'common' || k === 0 ? seed : independentSeed(seed, k))));
  const drawn = unitRows.map((rows) => rows.map((u) => Array.from(u, (x, j) => drawFromUnit(inputs[j]!.distribution, x))));

  const blockFuel: number[][] = designs.map(() => []);
  const kept: number[][] = [];
  const failures: string[] = [];
  let failureCount = 0;
  const heldCounts = new Map<string, number>();
  for (let i = 0; i < n; i++) {
    const fuel: number[] = [];
    let failed: string | null = null;
    for (let k = 0; k < designs.length; k++) {
      const values = drawn[pairing === 'common' ? 0 : k]![i]!;
      const applied = applySample(study.project, inputs, values);
      for (const h of new Set(applied.held.map((line) => line.replace(/ -?[\d.]+ held/, ' held')))) heldCounts.set(h, (heldCounts.get(h) ?? 0) + 1);
      const input = build(applied.project, designs[k]!, applied.fuelFlowScale);
      if (!input.ok) {
        failed ??= `sample ${i + 1}, "${designs[k]}": ${input.error}`;
        done++;
        yield { done, total };
        continue;
      }
      const r = solve(input.value);
      done++;
      yield { done, total };
      if (r.status !== 'ok') failed ??= `sample ${i + 1}, "${designs[k]}": ${r.status}: ${r.statusMessage}`;
      else fuel.push(r.blockFuel_kg);
    }
    if (failed !== null) {
      failureCount++;
      if (failures.length < 5) failures.push(failed);
      continue;
    }
    fuel.forEach((f, k) => blockFuel[k]!.push(f));
    kept.push(drawn[0]![i]!);
  }
  const used = kept.length;
  if (used < 2) {
    return err({ code: 'mission_failed', message: `uncertainty: only ${used} of ${n} samples flew with every design; first failures: ${failures.join(' | ')}` });
  }
  const difference = designs.length === 2 ? blockFuel[1]!.map((b, i) => b - blockFuel[0]![i]!) : null;
  const target = difference ?? blockFuel[0]!;
  const column = (j: number) => kept.map((row) => row[j]!);
  const rhos = inputs.map((_, j) => (pairing === 'common' ? spearmanRho(column(j), target) : null));
  const sumSq = rhos.reduce<number>((s, r) => s + (r === null ? 0 : r * r), 0);
  const drivers: DriverFigure[] = inputs.map((input, j) => ({
    input: input.id,
    label: input.label,
    rhoDifference: difference === null || pairing !== 'common' ? null : rhos[j]!,
    rhoDesigns: pairing === 'common' ? blockFuel.map((f) => spearmanRho(column(j), f)) : designs.map(() => null),
    share: rhos[j] === null || !(sumSq > 0) ? null : (rhos[j]! * rhos[j]!) / sumSq,
  }));
  drivers.sort((a, b) => Math.abs(b.share ?? 0) - Math.abs(a.share ?? 0) || a.input.localeCompare(b.input));

  return ok({
    method: UNCERTAINTY_METHOD + (pairing === 'independent' ? ' (Independent samples per design requested: no common random numbers, no drivers.)' : ''),
    sampler: 'latinHypercube',
    pairing,
    samples: n,
    seed,
    inputs: inputs.map((i) => ({ id: i.id, label: i.label, distribution: i.description, reason: i.reason })),
    deterministic: { blockFuel_kg: nominal, difference_kg: nominal.length === 2 ? nominal[1]! - nominal[0]! : null },
    designs: designs.map((name, k) => ({ name, blockFuel_kg: summarize(blockFuel[k]!) })),
    difference_kg: difference === null ? null : summarize(difference),
    probabilityBBetter: difference === null ? null : shareBelowZero(difference),
    drivers,
    samplesUsed: used,
    failures: { count: failureCount, messages: failures },
    held: [...heldCounts].map(([what, samples]) => ({ what, samples })),
    values: { inputs: kept, blockFuel_kg: blockFuel, difference_kg: difference },
    missions: done,
  });
}

export interface RunOptions {
  readonly onProgress?: (done: number, total: number) => void;
  readonly shouldCancel?: () => boolean;
}

/** Runs uncertaintySteps to the end with progress and cancel callbacks (checked after every mission). */
export function runUncertainty(study: UncertaintyStudy, options: RunOptions = {}): Result<UncertaintyResult, AnalysisError> {
  const steps = uncertaintySteps(study);
  for (;;) {
    const next = steps.next();
    if (next.done) return next.value;
    options.onProgress?.(next.value.done, next.value.total);
    if (options.shouldCancel?.()) {
      steps.return(err({ code: 'cancelled', message: '' }));
      return err({ code: 'cancelled', message: `uncertainty cancelled after ${next.value.done} of ${next.value.total} missions` });
    }
  }
}
