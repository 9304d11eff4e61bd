/**
 * Inlet A vs inlet B on the same mission: block fuel, block time, trip fuel,
 * take-off mass, crossover Machs and ceilings side by side with differences
 * (B - A), and the block-fuel difference attributed to four factors of the
 * installation (recovery, spillage drag, external drag, weight) by Shapley
 * values: the parts add up to the total exactly, with interactions shared.
 */
import type { Caution } from '../cautions/caution';
import { err, ok, type Result } from '../core/result';
import type { MissionInput, MissionResult } from '../mission/missionTypes';
import type { RatingName } from '../propulsion/propulsionModel';
import type { AnalysisError, MissionSolver } from './analysisTypes';
import type { Ceiling } from './envelope';
import { shapleyValues } from './shapleyAttribution';
import { thrustDragCrossover, type CrossoverResult } from './crossover';
import { flightCeilings } from './envelope';
import { flySerially, type AnalysisSteps, type PlannedMission } from './missionPlan';
import { subsetWeights } from './warmStart';

export type InletFactor = 'recovery' | 'spillage' | 'externalDrag' | 'weight';

/** The factors, in bit order of the attribution (bit 0 = recovery ... bit 3 = weight). */
export const INLET_FACTORS: readonly InletFactor[] = ['recovery', 'spillage', 'externalDrag', 'weight'];

export type FactorChoice = Readonly<Record<InletFactor, 'A' | 'B'>>;

/** Builds the mission input with each factor taken from design A or B; all-A is design A's mission, all-B is B's. */
export type InletFactorBuilder = (choice: FactorChoice) => MissionInput;

export interface InletComparisonOptions {
  /** Mission solver; default warmStart.ts analysisSolver (solveMission started from neighbours, no time history). */
  readonly solve?: MissionSolver;
  readonly nameA: string;
  readonly nameB: string;
  /** Cruise altitude of the crossover comparison (m); default the first cruise leg's altitude. */
  readonly crossoverAltitude_m?: number;
  /** Rating of the crossover comparison; default maxCruise. Ceilings use maxClimb. */
  readonly crossoverRating?: RatingName;
  /** Altitude range and step of the ceiling search (m); default [0, 15000] by 1000 m. */
  readonly ceilingAltitudeRange?: readonly [number, number];
  readonly ceilingAltitudeStep_m?: number;
  readonly onProgress?: (done: number, total: number) => void;
  readonly shouldCancel?: () => boolean;
}

export interface DesignFigures {
  readonly name: string;
  readonly blockFuel_kg: number;
  readonly blockTime_s: number;
  readonly tripFuel_kg: number;
  readonly takeoffMass_kg: number;
  readonly crossover: {
    readonly status: 'ok' | 'above_ceiling';
    readonly lowMach: number | null;
    readonly highMach: number | null;
    readonly minThrustMach: number | null;
  };
  readonly ceilings: readonly Ceiling[];
  readonly cautions: readonly Caution[];
}

export interface BreakdownPart {
  readonly factor: InletFactor;
  /** Share of the block-fuel difference B - A (kg). */
  readonly blockFuel_kg: number;
}

export interface InletComparisonResult {
  readonly designs: readonly [DesignFigures, DesignFigures];
  /** B - A; null where either side is null. */
  readonly difference: {
    readonly blockFuel_kg: number;
    readonly blockTime_s: number;
    readonly tripFuel_kg: number;
    readonly takeoffMass_kg: number;
    readonly lowMach: number | null;
    readonly highMach: number | null;
    readonly ceilings: readonly { readonly name: string; readonly altitude_m: number | null }[];
  };
  /** Conditions of the crossover comparison: both designs at design A's mid-cruise mass. */
  readonly crossoverCondition: { readonly altitude_m: number; readonly mass_kg: number; readonly rating: RatingName; readonly isaDev_K: number };
  readonly breakdown: {
    readonly method: 'shapley';
    readonly parts: readonly BreakdownPart[];
    /** Block fuel B - A (kg) and the sum of the parts (kg); equal to rounding. */
    readonly total_kg: number;
    readonly sumOfParts_kg: number;
    /** Missions flown for the attribution (2^4). */
    readonly missions: number;
    readonly description: string;
  };
}

export const SHAPLEY_DESCRIPTION =
  'Shapley attribution: each factor\'s share is its effect on block fuel when switched from A to B, averaged over all 24 orders of switching the four factors (16 missions). The shares add up exactly to the total; interaction effects are shared between the factors involved, not left as a residual.';

/** The mix of bit mask `mask`: bit i set takes INLET_FACTORS[i] from design B. */
export function choiceOf(mask: number): FactorChoice {
  const pick = (bit: number): 'A' | 'B' => ((mask >> bit) & 1 ? 'B' : 'A');
  return { recovery: pick(0), spillage: pick(1), externalDrag: pick(2), weight: pick(3) };
}

/** The crossover and the ceilings of one design. */
interface PointOutput {
  readonly crossover: Result<CrossoverResult, AnalysisError>;
  readonly ceilings: Result<readonly Ceiling[], AnalysisError>;
}

function midCruiseMass(r: MissionResult): number {
  const cruise = r.legs.filter((l) => l.kind === 'cruise');
  if (cruise.length === 0) return 0.5 * (r.takeoffMass_kg + r.landingMass_kg);
  return 0.5 * (cruise[0]!.startMass_kg + cruise[cruise.length - 1]!.endMass_kg);
}

/**
 * Flies the 16 missions with every mix of the four factors from A and B,
 * then compares A and B and attributes the block-fuel difference by Shapley
 * values (Shapley 1953). The crossover compares both designs at one stated
 * condition: the cruise altitude and design A's mid-cruise mass (mean of the
 * cruise start and end masses). Ceilings use maxClimb at the same mass.
 * On the calling thread (missionPlan.ts flySerially).
 */
export function compareInlets(
  build: InletFactorBuilder,
  options: InletComparisonOptions,
): Result<InletComparisonResult, AnalysisError> {
  const total = 1 << INLET_FACTORS.length;
  let done = 0;
  return flySerially(compareInletsSteps(build, options), {
    ...(options.solve ? { solve: options.solve } : {}),
    ...(options.shouldCancel ? { shouldCancel: options.shouldCancel } : {}),
    onMission: () => options.onProgress?.(++done, total),
  });
}

/**
 * compareInlets as one round of 16 planned missions (missionPlan.ts): all-A
 * and the four single-factor mixes start cold; each mix of two or more
 * factors from B starts from the mix with its lowest factor back at A, its
 * figures predicted from all its sub-mixes (subsetWeights), so it is planned
 * after them. Options' solve, onProgress and shouldCancel are the runner's.
 */
export function* compareInletsSteps(build: InletFactorBuilder, options: InletComparisonOptions): AnalysisSteps<Result<InletComparisonResult, AnalysisError>> {
  const total = 1 << INLET_FACTORS.length;
  const missions: PlannedMission[] = [];
  for (let mask = 0; mask < total; mask++) {
    // A single factor has nothing to predict it but all-A, another aircraft: it starts cold.
    const single = (mask & (mask - 1)) === 0;
    const weights = single ? [] : subsetWeights(mask);
    missions.push({
      input: build(choiceOf(mask)),
      after: weights.map((w) => w.mask),
      lane: 0,
      start: (results) => {
        if (single) return undefined;
        const from = results[mask & (mask - 1)];
        if (from === undefined || weights.some((w) => results[w.mask] === undefined)) return undefined;
        return { from, blend: weights.map((w) => ({ weight: w.weight, result: results[w.mask]! })) };
      },
    });
  }
  const flown = yield { missions, laneMemos: false, stopAtFailure: true };
  const results: MissionResult[] = [];
  for (let mask = 0; mask < total; mask++) {
    const r = flown.results[mask];
    if (r === undefined) return err({ code: 'cancelled', message: `inlet comparison cancelled after ${mask} of ${total} missions` });
    if (r.status !== 'ok') {
      const choice = choiceOf(mask);
      const mix = INLET_FACTORS.map((f) => `${f} ${choice[f]}`).join(', ');
      return err({ code: 'mission_failed', message: `inlet comparison: the mission with ${mix} failed: ${r.status}: ${r.statusMessage}` });
    }
    results.push(r);
  }
  // The crossovers and ceilings of A and B, at design A's mid-cruise mass.
  const inputA = build(choiceOf(0));
  const cruiseLeg = inputA.legs.find((l) => l.kind === 'cruise');
  const altitude_m = options.crossoverAltitude_m ?? (cruiseLeg && cruiseLeg.kind === 'cruise' ? cruiseLeg.altitude_m : 10000);
  const rating = options.crossoverRating ?? 'maxCruise';
  const mass_kg = midCruiseMass(results[0]!);
  const condition = { altitude_m, mass_kg, rating, isaDev_K: inputA.isaDev_K };
  const points = [0, total - 1].map((mask): PointOutput => {
    const input = build(choiceOf(mask));
    const models = { aero: input.aero, propulsion: input.propulsion };
    const ceilings = { mass_kg, rating: 'maxClimb', isaDev_K: input.isaDev_K, altitudeRange: options.ceilingAltitudeRange ?? [0, 15000], altitudeStep_m: options.ceilingAltitudeStep_m ?? 1000 } as const;
    return { crossover: thrustDragCrossover(models, condition), ceilings: flightCeilings(models, ceilings) };
  });
  return inletComparisonOf(build, options, results, condition, points);
}

/** The comparison from the 16 missions flown (by mask) and the crossovers and ceilings of A and B: differences and the Shapley breakdown. */
function inletComparisonOf(
  build: InletFactorBuilder,
  options: InletComparisonOptions,
  results: readonly MissionResult[],
  condition: InletComparisonResult['crossoverCondition'],
  points: readonly PointOutput[],
): Result<InletComparisonResult, AnalysisError> {
  const total = 1 << INLET_FACTORS.length;
  const attribution = shapleyValues(INLET_FACTORS.length, (mask) => results[mask]!.blockFuel_kg);
  const a = results[0]!;
  const b = results[total - 1]!;
  const inputA = build(choiceOf(0));
  const inputB = build(choiceOf(total - 1));

  const figures = (name: string, input: MissionInput, r: MissionResult, p: PointOutput): Result<DesignFigures, AnalysisError> => {
    const c = p.crossover;
    if (!c.ok) return err({ ...c.error, message: `inlet comparison, ${name}: ${c.error.message}` });
    const ceilings = p.ceilings;
    if (!ceilings.ok) return err({ ...ceilings.error, message: `inlet comparison, ${name}: ${ceilings.error.message}` });
    return ok({
      name,
      blockFuel_kg: r.blockFuel_kg,
      blockTime_s: r.blockTime_s,
      tripFuel_kg: r.tripFuel_kg,
      takeoffMass_kg: r.takeoffMass_kg,
      crossover: { status: c.value.status, lowMach: c.value.lowMach, highMach: c.value.highMach, minThrustMach: c.value.minThrustMach },
      ceilings: ceilings.value,
      cautions: [...r.cautions, ...c.value.cautions],
    });
  };
  const fa = figures(options.nameA, inputA, a, points[0]!);
  if (!fa.ok) return fa;
  const fb = figures(options.nameB, inputB, b, points[1]!);
  if (!fb.ok) return fb;
  const diff = (x: number | null, y: number | null) => (x === null || y === null ? null : y - x);
  const parts = INLET_FACTORS.map((factor, i) => ({ factor, blockFuel_kg: attribution.shares[i]! }));
  return ok({
    designs: [fa.value, fb.value],
    difference: {
      blockFuel_kg: b.blockFuel_kg - a.blockFuel_kg,
      blockTime_s: b.blockTime_s - a.blockTime_s,
      tripFuel_kg: b.tripFuel_kg - a.tripFuel_kg,
      takeoffMass_kg: b.takeoffMass_kg - a.takeoffMass_kg,
      lowMach: diff(fa.value.crossover.lowMach, fb.value.crossover.lowMach),
      highMach: diff(fa.value.crossover.highMach, fb.value.crossover.highMach),
      ceilings: fa.value.ceilings.map((c, i) => ({ name: c.name, altitude_m: diff(c.altitude_m, fb.value.ceilings[i]?.altitude_m ?? null) })),
    },
    crossoverCondition: condition,
    breakdown: {
      method: 'shapley',
      parts,
      total_kg: attribution.alternative - attribution.baseline,
      sumOfParts_kg: parts.reduce((s, p) => s + p.blockFuel_kg, 0),
      missions: total,
      description: SHAPLEY_DESCRIPTION,
    },
  });
}
