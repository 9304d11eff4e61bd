/**
 * The part-power solve: the power between flight idle and a ceiling rating
 * where one engine's installed thrust equals the thrust asked for. With the
 * deck's fixed-condition curve, the root is first bracketed on one of the
 * deck's power segments (between two tabulated powers every deck column is
 * linear in power, so the installed thrust before spillage is too), then
 * refined on it by a bracketed secant (engine/core/rootFind.ts) whose first
 * step is the exact linear inversion on the segment and whose later steps
 * take out the spillage drag's curvature. Its state lives in one
 * PartPowerSolve object per model (reused; a solve sets it at its start), so
 * the residual is one function made once, not a closure per call (forThrust
 * runs thousands of times per mission).
 *
 * What a solve needs of a condition that does not depend on the thrust asked (the installed thrusts at idle, the
 * ceiling and the deck's power nodes the bracket is narrowed on, and the curve's power breakpoints) is kept per
 * condition in a bounded exact-key memo (conditionSlots.ts): a mission asks for a few hundred part-power points at
 * a few dozen conditions, and every fuel pass, the alternate and later missions on the model ask at the same ones.
 * Each value is a pure function of the condition (and the power), so the memo changes no answer, only how often a
 * value is computed.
 */
import { bracketedSecant } from '../core/rootFind';
import { createConditionSlots, type ConditionSlots } from './conditionSlots';
import { CURVE_VALUES, type DeckAccess, type DeckCurve } from './deckAccess';
import { emptySensitivities, readSensitivitiesInto, type MutableSensitivities } from './installationSensitivities';
import {
  evaluateEngineInto,
  installDeckPointInto,
  netThrustOf,
  newEngineScratch,
  type EngineScratch,
  type InstallationContext,
} from './engineEvaluation';
import type { FreeStream } from './inletFlow';
import { sameFlightCondition, type FlightCondition, type ThrustLimit } from './propulsionModel';

/**
 * Relative thrust tolerance of `forThrust` (-): |installed - required| <=
 * this x required (at least this x 10 N per engine), on either side (the
 * secant's last step lands on whichever side it lands: no bias).
 */
export const FOR_THRUST_TOLERANCE = 1e-12;

export interface PartPowerSolve {
  readonly ctx: InstallationContext;
  readonly access: DeckAccess;
  /** Scratch of full lookups (shared with the model's point queries) and of the fast deck curve. */
  readonly full: EngineScratch;
  readonly fast: EngineScratch;
  readonly curveOut: Float64Array;
  /** The curve's sensitivities at the last power (reused). */
  readonly curveSensitivities: MutableSensitivities;
  /** Installed thrust per engine at a power less `required_N` (N): made once per solve object. */
  readonly residual: (power: number) => number;
  condition: FlightCondition;
  free: FreeStream;
  curve: DeckCurve | undefined;
  /** Per-engine thrust asked for (N). */
  required_N: number;
  /**
   * The per-condition memo: its slots (one per condition held), and per slot the installed thrusts at the solve's
   * fixed powers (idle, the ceiling, the deck's power nodes), by power, with the deck thrust of each (N per engine;
   * MEMO_POWERS entries a slot, memoCount[slot] of them used), and the curve's power breakpoints in ascending order
   * (null until the slot's first solve with a curve needs them).
   */
  readonly slots: ConditionSlots;
  readonly memoCount: Int32Array;
  readonly memoPower: Float64Array;
  readonly memoThrust: Float64Array;
  readonly memoDeck: Float64Array;
  readonly breaks: (Float64Array | null)[];
  /** The slot of the solve in progress, and the condition it was found for (a copy: the caller's object may change). */
  slot: number;
  readonly slotCondition: { altitude_m: number; mach: number; isaDev_K: number };
  /** Deck thrust per engine (N) at the power of the last memoThrustAt. */
  lastDeck_N: number;
}

/** Powers kept per condition: idle, the ceiling and the power nodes between them on any deck so far. */
const MEMO_POWERS = 16;

/**
 * Conditions a model's part-power memo holds by default: a converged demo solve asks at 21, and an analysis's
 * missions at a few dozen more each (holds and approaches at their own speeds); 48 kB of thrusts, a few kB of
 * breakpoints.
 */
export const PART_POWER_MEMO_CONDITIONS = 128;

/** A solve object for `ctx` over `access`; `memoConditions` bounds its per-condition memo (a whole number >= 1). */
export function newPartPowerSolve(ctx: InstallationContext, access: DeckAccess, full: EngineScratch, memoConditions = PART_POWER_MEMO_CONDITIONS): PartPowerSolve {
  const solve: PartPowerSolve = {
    ctx,
    access,
    full,
    fast: newEngineScratch(),
    curveOut: new Float64Array(CURVE_VALUES),
    curveSensitivities: emptySensitivities(),
    residual: (power) => solveThrustAt(solve, power) - solve.required_N,
    condition: { altitude_m: 0, mach: 0, isaDev_K: 0 },
    free: { mach: 0, pressure_Pa: 0, temperature_K: 0 },
    curve: undefined,
    required_N: 0,
    slots: createConditionSlots(memoConditions),
    memoCount: new Int32Array(memoConditions),
    memoPower: new Float64Array(memoConditions * MEMO_POWERS),
    memoThrust: new Float64Array(memoConditions * MEMO_POWERS),
    memoDeck: new Float64Array(memoConditions * MEMO_POWERS),
    breaks: new Array<Float64Array | null>(memoConditions).fill(null),
    slot: -1,
    slotCondition: { altitude_m: Number.NaN, mach: Number.NaN, isaDev_K: Number.NaN },
    lastDeck_N: 0,
  };
  return solve;
}

/** Points the solve at the memo slot of `condition`, taking a fresh one (nothing kept yet) when it has none. */
function selectSlot(solve: PartPowerSolve, condition: FlightCondition): void {
  const key = solve.slotCondition;
  if (solve.slot >= 0 && sameFlightCondition(key, condition)) return;
  let slot = solve.slots.find(condition);
  if (slot < 0) {
    // A fresh slot (after an emptying, every slot is fresh again): forget what it held for another condition.
    slot = solve.slots.add(condition);
    solve.memoCount[slot] = 0;
    solve.breaks[slot] = null;
  }
  solve.slot = slot;
  key.altitude_m = condition.altitude_m;
  key.mach = condition.mach;
  key.isaDev_K = condition.isaDev_K;
}

/** solveThrustAt at one of the solve's fixed powers, kept per condition (PartPowerSolve.memoPower); sets lastDeck_N. */
function memoThrustAt(solve: PartPowerSolve, power: number): number {
  const base = solve.slot * MEMO_POWERS;
  const count = solve.memoCount[solve.slot]!;
  for (let i = base; i < base + count; i++) {
    if (Object.is(solve.memoPower[i], power)) {
      solve.lastDeck_N = solve.memoDeck[i]!;
      return solve.memoThrust[i]!;
    }
  }
  const thrust = solveThrustAt(solve, power);
  const deck = solve.curve ? solve.fast.deck.thrust_N : solve.full.deck.thrust_N;
  if (count < MEMO_POWERS) {
    solve.memoPower[base + count] = power;
    solve.memoThrust[base + count] = thrust;
    solve.memoDeck[base + count] = deck;
    solve.memoCount[solve.slot] = count + 1;
  }
  solve.lastDeck_N = deck;
  return thrust;
}

/**
 * The curve's power breakpoints at the slot's condition, ascending: the chain breakAfter(-Infinity),
 * breakAfter(that), ... (so the first entry above any power is breakAfter's answer there, to the bit).
 */
function breaksOf(solve: PartPowerSolve, breakAfter: (after: number) => number): Float64Array {
  let list = solve.breaks[solve.slot] ?? null;
  if (list === null) {
    const found: number[] = [];
    for (let q = breakAfter(-Infinity); q < Infinity; q = breakAfter(q)) found.push(q);
    list = Float64Array.from(found);
    solve.breaks[solve.slot] = list;
  }
  return list;
}

/** The first of the ascending `list` strictly above `after`, Infinity when none (DeckAccess.curveBreakAfter's answer). */
function nextBreak(list: Float64Array, after: number): number {
  let l = 0;
  let h = list.length;
  while (l < h) {
    const m = (l + h) >> 1;
    if (list[m]! <= after) l = m + 1;
    else h = m;
  }
  return l < list.length ? list[l]! : Infinity;
}

/** Installed thrust per engine (N) at `power` for the solve in progress: the deck's fixed-condition curve when it offers one, else full lookups. */
export function solveThrustAt(solve: PartPowerSolve, power: number): number {
  if (solve.curve !== undefined && solve.curve(power, solve.curveOut)) {
    const air = solve.curveOut[1]!;
    const hasAir = !Number.isNaN(air);
    const sens = solve.access.hasSensitivities ? readSensitivitiesInto(solve.curveOut, 2, hasAir, 1, solve.curveSensitivities) : null;
    installDeckPointInto(solve.fast, solve.ctx, solve.free, solve.curveOut[0]!, 0, hasAir ? air : null, sens);
    return netThrustOf(solve.fast);
  }
  evaluateEngineInto(solve.full, solve.ctx, solve.access, solve.condition, solve.free, power);
  return netThrustOf(solve.full);
}

/** The power found and where it sits against the limits. */
export type PartPowerRoot =
  | { readonly ok: true; readonly power: number; readonly limit: ThrustLimit }
  | { readonly ok: false; readonly error: { readonly code: 'did_not_converge'; readonly message: string } };

/**
 * Power (-) in [idlePower, ceilingPower] where one engine's installed thrust
 * is `perEngineRequired_N` at `condition`: the ceiling (above_rating) or idle
 * (below_idle) when the thrust lies outside their range. Without a fast
 * curve, the first guess is the deck inversion at the uninstalled thrust
 * scaled by the ceiling's installed/uninstalled ratio.
 */
export function solvePartPower(
  solve: PartPowerSolve,
  condition: FlightCondition,
  free: FreeStream,
  perEngineRequired_N: number,
  idlePower: number,
  ceilingPower: number,
): PartPowerRoot {
  solve.condition = condition;
  solve.free = free;
  solve.curve = solve.access.curveAt?.(condition);
  solve.required_N = perEngineRequired_N;
  selectSlot(solve, condition);
  const curve = solve.curve;
  const hiThrust = memoThrustAt(solve, ceilingPower);
  const hiDeck = solve.lastDeck_N;
  if (hiThrust <= perEngineRequired_N) {
    return { ok: true, power: ceilingPower, limit: hiThrust === perEngineRequired_N ? 'within' : 'above_rating' };
  }
  const loThrust = memoThrustAt(solve, idlePower);
  if (loThrust >= perEngineRequired_N) {
    return { ok: true, power: idlePower, limit: loThrust === perEngineRequired_N ? 'within' : 'below_idle' };
  }
  let lo = idlePower;
  let fLo = loThrust - perEngineRequired_N;
  let hi = ceilingPower;
  let fHi = hiThrust - perEngineRequired_N;
  const fTol = FOR_THRUST_TOLERANCE * Math.max(Math.abs(perEngineRequired_N), 10);
  const curveBreakAfter = curve ? solve.access.curveBreakAfter : undefined;
  if (curveBreakAfter !== undefined) {
    const breaks = breaksOf(solve, curveBreakAfter);
    // Narrow the bracket to one deck power segment: evaluate the breakpoint inside it nearest the chord's root
    // until none is left inside (usually two evaluations, fewer when idle or the ceiling bounds the segment).
    for (;;) {
      let below = Number.NaN;
      let q = nextBreak(breaks, lo);
      if (!(q < hi)) break;
      const chord = lo - (fLo * (hi - lo)) / (fHi - fLo);
      while (q < hi && q <= chord) {
        below = q;
        q = nextBreak(breaks, q);
      }
      const above = q < hi ? q : Number.NaN;
      const at = Number.isNaN(below) ? above : Number.isNaN(above) || chord - below <= above - chord ? below : above;
      const f = memoThrustAt(solve, at) - perEngineRequired_N;
      if (Math.abs(f) <= fTol) return { ok: true, power: at, limit: 'within' };
      if (f < 0) {
        lo = at;
        fLo = f;
      } else {
        hi = at;
        fHi = f;
      }
    }
  } else if (!curve) {
    const ratio = hiThrust > 0 ? hiDeck / hiThrust : 1;
    const guess = solve.access.powerForThrust(condition, perEngineRequired_N * ratio, ceilingPower);
    if (guess !== null && guess > lo && guess < hi) {
      const g = solve.residual(guess);
      if (Math.abs(g) <= fTol) return { ok: true, power: guess, limit: 'within' };
      if (g > 0) {
        hi = guess;
        fHi = g;
      } else {
        lo = guess;
        fLo = g;
      }
    }
  }
  const root = bracketedSecant(solve.residual, lo, fLo, hi, fHi, {
    fTol,
    xTol: 0,
    maxIterations: 100,
  });
  if (!root.ok) return { ok: false, error: { code: 'did_not_converge', message: root.error.message } };
  return { ok: true, power: root.value.x, limit: 'within' };
}
