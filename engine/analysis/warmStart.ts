/**
 * Warm starts for missions flown one after another: an analysis's (the
 * Shapley corners differ by one inlet factor, the trade-factor missions by a
 * small step, the payload-range points by payload) and a sweep's (each case
 * next to the one before, engine/study/prepareSweep.ts). Each mission starts
 * from a converged neighbour, with its figures (ramp mass or solvable-leg
 * distance, top of descent) predicted as a weighted sum over missions already
 * flown, and its fuel iteration needs fewer passes. Answers stay the same to
 * the fuel iteration's tolerance; a warm-started mission that does not come
 * out ok is flown again cold (solveFrom).
 */
import { FIXED_MASS_FUEL_TOLERANCE_KG, FUEL_TOLERANCE_KG } from '../mission/fuelIteration';
import type { MissionInput, MissionResult, MissionStart } from '../mission/missionTypes';
import type { PassMemo } from '../mission/passMemo';
import { solveMission, type SolveOptions } from '../mission/solveMission';

/** What a prediction reads of a mission flown: its converged start and the residual it converged to (a MissionResult is one). */
export type FlownMission = Pick<MissionResult, 'warmStart' | 'residual_kg'>;

/** A mission already flown and its weight in a prediction. */
export interface Blend {
  readonly weight: number;
  readonly result: FlownMission;
}

/**
 * Where to start a mission from: a converged neighbour (its iteration's
 * slope and top-of-descent model are reused) and a prediction of this
 * mission's figures (ramp mass, solvable-leg distance, top of descent) as
 * sum(weight x figure of result) over missions already flown; the weights
 * add up to 1. Without `blend`, the neighbour's own figures.
 */
export interface NeighbourStart {
  readonly from: FlownMission;
  readonly blend?: readonly Blend[];
}

/**
 * Where a converged mission's fuel iteration has its root: the converged ramp mass (payloadRange) or solvable-leg
 * distance (fixed ramp mass) moved by the converged residual's offset from the middle of the mode's default band
 * over the iteration's last slope (one secant step: Burden & Faires, Numerical Analysis, section 2.3). The converged
 * values themselves scatter across the band's width (0 to FUEL_TOLERANCE_KG of residual, about 0.1 kg of ramp mass
 * on the demo); the roots lie on a smooth curve of the mission's inputs, so a blend of them lands a first pass in
 * the band. Undefined when the mission carries no start or its figure is not finite.
 */
export function iterationRoot(flown: FlownMission): number | undefined {
  const w = flown.warmStart;
  const x = w?.rampMass_kg ?? w?.distance_m;
  if (w === undefined || x === undefined || !Number.isFinite(x)) return undefined;
  const aim_kg = (w.rampMass_kg !== undefined ? FUEL_TOLERANCE_KG : FIXED_MASS_FUEL_TOLERANCE_KG) / 2;
  const slope = w.slope;
  const shift = slope !== undefined && Number.isFinite(slope) && Math.abs(slope) > 0 ? (flown.residual_kg - aim_kg) / slope : 0;
  return Number.isFinite(shift) ? x - shift : x;
}

/**
 * The warm start (engine/mission MissionStart) for a mission next to
 * `start`: the neighbour's, with each figure the blend predicts in place of
 * the neighbour's own (the ramp mass or distance from the blended missions'
 * iteration roots, iterationRoot); null when the neighbour or a blended
 * mission carries none (it did not converge).
 */
export function warmStartFor(start: NeighbourStart): MissionStart | null {
  const own = start.from.warmStart;
  const blend = start.blend ?? [{ weight: 1, result: start.from }];
  if (own === undefined || blend.some((b) => b.result.warmStart === undefined)) return null;
  const mix = (figure: (b: FlownMission) => number | undefined): number | undefined => {
    let sum = 0;
    for (const b of blend) {
      const v = figure(b.result);
      if (v === undefined || !Number.isFinite(v)) return undefined;
      sum += b.weight * v;
    }
    return sum;
  };
  const rampMass_kg = own.rampMass_kg === undefined ? undefined : mix((f) => (f.warmStart!.rampMass_kg === undefined ? undefined : iterationRoot(f)));
  const distance_m = own.distance_m === undefined ? undefined : mix((f) => (f.warmStart!.distance_m === undefined ? undefined : iterationRoot(f)));
  const todMass_kg = mix((f) => f.warmStart!.afterSolvable?.mass_kg);
  const after_m = mix((f) => f.warmStart!.afterSolvable?.distance_m);
  return {
    ...own,
    ...(rampMass_kg === undefined ? {} : { rampMass_kg }),
    ...(distance_m === undefined ? {} : { distance_m: Math.max(0, distance_m) }),
    ...(own.afterSolvable === undefined || todMass_kg === undefined || after_m === undefined
      ? {}
      : { afterSolvable: { ...own.afterSolvable, mass_kg: todMass_kg, distance_m: after_m } }),
  };
}

/** solveFrom's options: the solve's own (its start is the neighbour's) and who counts the passes flown. */
export interface SolveFromOptions extends Omit<SolveOptions, 'warmStart'> {
  /** Called with the passes of each solve flown: the warm one and, when it did not come out ok, the cold one. */
  readonly onPasses?: (passes: number) => void;
}

/**
 * solveMission started next to `start` when given (warmStartFor). A
 * warm-started mission that does not come out ok is flown again from the
 * solver's own first guess, so a failure reads exactly as it always has
 * (its status and message name the cold solve's figures) and a start that
 * led the iteration astray costs nothing else.
 */
export function solveFrom(input: MissionInput, start?: NeighbourStart, options: SolveFromOptions = {}): MissionResult {
  const { onPasses, ...solveOptions } = options;
  const warm = start === undefined ? null : warmStartFor(start);
  const cold = (): MissionResult => {
    const r = solveMission(input, solveOptions);
    onPasses?.(r.iterations);
    return r;
  };
  if (warm === null) return cold();
  const r = solveMission(input, { ...solveOptions, warmStart: warm });
  onPasses?.(r.iterations);
  return r.status === 'ok' ? r : cold();
}

/**
 * The analyses' default mission solver: solveFrom keeping no time history (an analysis reads each mission's
 * figures, legs, cautions and status, never its samples; every one of those is the same bit for bit without it,
 * SolveOptions.timeHistory). Given a pass memo, every solve reads and adds to it (SolveOptions.passMemo): only for
 * missions that differ in `solve` alone (the payload-range diagram's), whose alternate descents and contingency
 * holds depend on the mass alone.
 */
export function analysisSolver(passMemo?: PassMemo): (input: MissionInput, start?: NeighbourStart) => MissionResult {
  const options: SolveFromOptions = passMemo === undefined ? { timeHistory: false } : { timeHistory: false, passMemo };
  return (input, start) => solveFrom(input, start, options);
}

/**
 * Weights predicting v(S) for the subset `mask` (> 0) from all its proper
 * subsets, taking its highest-order interaction as zero:
 * v(S) ~ sum over T strictly inside S of (-1)^(|S| - |T| + 1) v(T)
 * (Moebius inversion of a set function: Grabisch, Set Functions, Games and
 * Capacities in Decision Making, 2016, ch. 2). One factor: v(none); two:
 * v(i) + v(j) - v(none). The weights add up to 1.
 */
export function subsetWeights(mask: number): readonly { readonly mask: number; readonly weight: number }[] {
  if (!(mask > 0)) return [];
  const bits = popCount(mask);
  const out: { mask: number; weight: number }[] = [];
  // Every proper subset: sub = (sub - 1) & mask down to 0.
  for (let sub = (mask - 1) & mask; ; sub = (sub - 1) & mask) {
    out.push({ mask: sub, weight: (bits - popCount(sub)) % 2 === 1 ? 1 : -1 });
    if (sub === 0) break;
  }
  return out;
}

function popCount(mask: number): number {
  let n = 0;
  for (let m = mask; m; m &= m - 1) n++;
  return n;
}

/**
 * Lagrange weights predicting the value at t from values at the nodes ts
 * (distinct): sum_k w_k v(t_k) is the polynomial through the nodes at t
 * (any numerical-analysis text, e.g. Burden & Faires, section 3.1).
 */
export function lagrangeWeights(ts: readonly number[], t: number): number[] {
  return ts.map((tk, k) => ts.reduce((w, tj, j) => (j === k ? w : (w * (t - tj)) / (tk - tj)), 1));
}


/** A mission of a central-difference trade flown at step u (units of the factor; the baseline at 0). */
export interface StepMission {
  readonly u: number;
  readonly result: MissionResult;
}

/** The order the steps of a trade are flown in: each is predicted from those before, the nearest first. */
export const STEP_ORDER: readonly number[] = [0.5, -0.5, 1, -1];

/**
 * Start for the mission at step u: the polynomial through the missions flown
 * so far at their steps (Lagrange weights), from the last one flown. None
 * while only the baseline is known: a perturbed aircraft has nothing to
 * predict its figures but another aircraft, and starts cold.
 */
export function stepStart(flown: readonly StepMission[], u: number): NeighbourStart | undefined {
  if (flown.length < 2) return undefined;
  const weights = lagrangeWeights(flown.map((f) => f.u), u);
  return { from: flown[flown.length - 1]!.result, blend: flown.map((f, k) => ({ weight: weights[k]!, result: f.result })) };
}
