/**
 * A robust match at one throttle equation: from a caller's warm start, else
 * from the corrected-similar start, else by continuation: match at the
 * corrected-similar turbine inlet temperature, then walk the throttle
 * quantity to its target in steps, each started from the last.
 */
import type { CycleEngine } from './cycleEngine';
import type { FreeStream } from './freeStream';
import { matchEngine, similarStart, throttleValue, unknownCount, type Installation, type MatchOutcome, type ThrottleEquation } from './offDesign';

export interface ThrottleOutcome extends MatchOutcome {
  /** The throttle value of the last matched point on the way when the target was not reached (else null). */
  readonly reached: number | null;
}

function walk(engine: CycleEngine, free: FreeStream, inst: Installation, throttle: ThrottleEquation, from: MatchOutcome, steps: number): ThrottleOutcome {
  const state = from.state!;
  const startValue = throttleValue(engine, state, throttle.quantity);
  // Re-express the start in this throttle's unknowns: Tt4 becomes an unknown (or is dropped).
  let x = reshape(engine, from.unknowns, from.state!.variables.tt4_K, throttle);
  let last: MatchOutcome = from;
  let reached = startValue;
  let spent = 0;
  for (let i = 1; i <= steps; i++) {
    const value = startValue + ((throttle.value - startValue) * i) / steps;
    const step = matchEngine(engine, free, inst, { quantity: throttle.quantity, value }, x);
    spent += step.evaluations;
    if (!step.converged) return { ...last, converged: false, reached, reason: step.reason, evaluations: spent };
    last = step;
    reached = value;
    x = step.unknowns;
  }
  return { ...last, reached: null, evaluations: spent };
}

/** Unknowns for `throttle` from a converged vector that may or may not carry Tt4. */
function reshape(engine: CycleEngine, x: Float64Array, tt4_K: number, throttle: ThrottleEquation): Float64Array {
  const n = unknownCount(engine, throttle);
  const out = new Float64Array(n);
  const base = engine.spec.design.bypassRatio > 0 ? 5 : 4;
  for (let i = 0; i < base; i++) out[i] = x[i]!;
  if (n > base) out[base] = tt4_K / engine.design.variables.tt4_K;
  return out;
}

/** Matches the engine at the throttle equation; `start` is a previous point's unknowns for the same throttle kind. */
export function solveThrottle(
  engine: CycleEngine,
  free: FreeStream,
  inst: Installation,
  throttle: ThrottleEquation,
  start?: ArrayLike<number>,
): ThrottleOutcome {
  const n = unknownCount(engine, throttle);
  let spent = 0;
  if (start && start.length === n) {
    const warm = matchEngine(engine, free, inst, throttle, start);
    spent += warm.evaluations;
    if (warm.converged) return { ...warm, reached: null, evaluations: spent };
  }
  const direct = matchEngine(engine, free, inst, throttle, similarStart(engine, throttle, free, inst));
  spent += direct.evaluations;
  if (direct.converged) return { ...direct, reached: null, evaluations: spent };
  const similarTt4 = { quantity: 'turbineInletTemperature' as const, value: (engine.design.variables.tt4_K * free.tt0_K) / engine.design.tt2_K };
  const anchor = matchEngine(engine, free, inst, similarTt4, similarStart(engine, similarTt4, free, inst));
  spent += anchor.evaluations;
  if (!anchor.converged) return { ...direct, reached: null, evaluations: spent };
  let best: ThrottleOutcome = { ...direct, reached: null, evaluations: spent };
  for (const steps of [6, 24]) {
    const walked = walk(engine, free, inst, throttle, anchor, steps);
    spent += walked.evaluations;
    if (walked.converged) return { ...walked, evaluations: spent };
    best = { ...walked, evaluations: spent };
  }
  return best;
}
