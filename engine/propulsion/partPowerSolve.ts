/**
 * The part-power solve: the power between flight idle and a ceiling rating
 * where one engine's installed thrust equals the thrust asked for. With the
 * deck's fixed-condition curve, the root is first bracketed on one of the
 * deck's power segments (between two tabulated powers every deck column is
 * linear in power, so the installed thrust before spillage is too; the
 * spillage drag bends it smoothly, except where the lip-suction table has a
 * node), then on one of SEGMENT_DIVISIONS equal parts of the segment by
 * interpolation search over its nodes, and the first guess is the inverse cubic
 * interpolation through the four nodes around that part
 * (core/inverseInterpolation.ts): on a smooth segment it meets the
 * tolerance at once, so one curve evaluation checks it. Where it does not
 * (a kink inside the part), a bracketed secant (engine/core/rootFind.ts)
 * from the guess and the part's far node finishes. Its state lives in one
 * PartPowerSolve object per model (reused; a solve sets it at its start), so
 * the residual is one function made once, not a closure per call (forThrust
 * runs thousands of times per mission).
 *
 * What a solve needs of a condition that does not depend on the thrust asked (the installed thrusts at idle, the
 * ceiling and the deck's power nodes the bracket is narrowed on, at the nodes of the segments' parts, and the
 * curve's power breakpoints) is kept per
 * condition in a bounded exact-key memo (conditionSlots.ts): a mission asks for a few hundred part-power points at
 * a few dozen conditions, and every fuel pass, the alternate and later missions on the model ask at the same ones.
 * A condition is admitted when it is asked again among the last few new ones (PartPowerSolve.recent): a hold whose
 * Mach follows the mass asks at a new condition every time, and those passed through a slot of their own instead of
 * filling the memo (which emptied it every few solves). Each value is a pure function of the condition (and the
 * power), so the memo changes no answer, only how often a value is computed.
 */
import { inverseCubicZero } from '../core/inverseInterpolation';
import { bracketedSecant } from '../core/rootFind';
import { createConditionSlots, type ConditionSlots } from './conditionSlots';
import { CURVE_FUEL_FLOW, CURVE_VALUES, type DeckAccess, type DeckCurve } from './deckAccess';
import { emptySensitivities, readSensitivitiesInto, type MutableSensitivities } from './installationSensitivities';
import {
  evaluateEngineInto,
  installDeckPointInto,
  netThrustOf,
  newEngineScratch,
  type EngineScratch,
  type InstallationContext,
} from './engineEvaluation';
import { INSIDE_TABLE } from './deckLookup';
import type { FreeStream } from './inletFlow';
import { sameFlightCondition, type FlightCondition, type ThrustLimit } from './propulsionModel';
import { sameNumber } from '../core/sameNumber';

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
   * The per-condition memo: its slots (one per condition held), and per slot the installed thrusts at idle and the
   * ceilings asked, by power, with the deck thrust of each (N per engine; MEMO_POWERS entries a slot, memoCount[slot]
   * of them used), and the curve's power breakpoints in ascending order (null until the slot's first solve with a
   * curve needs them).
   */
  readonly slots: ConditionSlots;
  readonly memoCount: Int32Array;
  readonly memoPower: Float64Array;
  readonly memoThrust: Float64Array;
  readonly memoDeck: Float64Array;
  readonly breaks: (Float64Array | null)[];
  /** Per slot, the installed thrust per engine at each of its breaks (N; NaN until computed; made with the breaks). */
  readonly breakThrust: (Float64Array | null)[];
  /**
   * Per slot, the segments whose part nodes are kept (SEGMENTS_PER_CONDITION a slot, segmentCount[slot] used, the
   * next to replace when all are segmentNext[slot]): their ends (power), and the installed thrust per engine at
   * each node (N; NaN until computed; SEGMENT_NODES a segment, the ends included; the slot's array is made on its
   * first segment solve, so a condition only ever asked at a limit holds none).
   */
  readonly segmentCount: Int32Array;
  readonly segmentNext: Int32Array;
  readonly segmentLo: Float64Array;
  readonly segmentHi: Float64Array;
  readonly nodeThrust: (Float64Array | null)[];
  /** nodeThrust of the segment solve in progress. */
  nodes: Float64Array;
  /** The power solveThrustAt last evaluated in this solve (NaN: none yet), and whether on the curve (into `fast`). */
  lastPower: number;
  lastOnCurve: boolean;
  /** The slot of the solve in progress, and the condition it was found for (a copy: the caller's object may change). */
  slot: number;
  readonly slotCondition: { altitude_m: number; mach: number; isaDev_K: number };
  /** Deck thrust per engine (N) at the power of the last memoThrustAt. */
  lastDeck_N: number;
  /**
   * Admission: a condition takes a slot of the memo only when it was asked within the last RECENT_CONDITIONS new
   * conditions (a level leg asks at one condition again and again; a hold whose Mach follows the mass asks at a new
   * one each time, and once admitted those filled the memo and emptied it every few solves). Until then it is
   * solved in the passing slot (index `slots.limit`), emptied for each new condition. The recent conditions'
   * numbers (3 a condition) and the next to overwrite.
   */
  readonly recent: Float64Array;
  recentNext: number;
}

/** New conditions remembered for admission to the part-power memo (a condition asked twice among them is admitted). */
const RECENT_CONDITIONS = 8;

/** Powers kept per condition in memoPower: idle and the ceilings asked (the curve's breakpoints have breakThrust). */
const MEMO_POWERS = 8;

/**
 * Equal parts a deck power segment is cut into for the first guess (a power of two, so each node's fraction of the
 * segment is exact). On the demo deck the cubic through four equally spaced points of a whole segment is within
 * about 1e-8 of the installed thrust; the error of a cubic falls with the fourth power of the spacing, so a part a
 * 64th wide leaves the guess near or inside FOR_THRUST_TOLERANCE.
 */
export const SEGMENT_DIVISIONS = 64;

/** Segments whose nodes a condition keeps (a level leg's roots at one condition lie in one or two). */
const SEGMENTS_PER_CONDITION = 4;
const SEGMENT_NODES = SEGMENT_DIVISIONS + 1;

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
    memoCount: new Int32Array(memoConditions + 1),
    memoPower: new Float64Array((memoConditions + 1) * MEMO_POWERS),
    memoThrust: new Float64Array((memoConditions + 1) * MEMO_POWERS),
    memoDeck: new Float64Array((memoConditions + 1) * MEMO_POWERS),
    breaks: new Array<Float64Array | null>(memoConditions + 1).fill(null),
    breakThrust: new Array<Float64Array | null>(memoConditions + 1).fill(null),
    segmentCount: new Int32Array(memoConditions + 1),
    segmentNext: new Int32Array(memoConditions + 1),
    segmentLo: new Float64Array((memoConditions + 1) * SEGMENTS_PER_CONDITION),
    segmentHi: new Float64Array((memoConditions + 1) * SEGMENTS_PER_CONDITION),
    nodeThrust: new Array<Float64Array | null>(memoConditions + 1).fill(null),
    nodes: new Float64Array(0),
    lastPower: Number.NaN,
    lastOnCurve: false,
    slot: -1,
    slotCondition: { altitude_m: Number.NaN, mach: Number.NaN, isaDev_K: Number.NaN },
    lastDeck_N: 0,
    recent: new Float64Array(3 * RECENT_CONDITIONS).fill(Number.NaN),
    recentNext: 0,
  };
  return solve;
}

/** Points the solve at the memo slot of `condition`, taking a fresh one (nothing kept yet) when it has none. */
function selectSlot(solve: PartPowerSolve, condition: FlightCondition): void {
  const key = solve.slotCondition;
  if (solve.slot >= 0 && sameFlightCondition(key, condition)) return;
  let slot = solve.slots.find(condition);
  if (slot < 0) {
    // A fresh slot (after an emptying, every slot is fresh again) for a condition asked recently, else the passing
    // slot: forget what it held for another condition.
    slot = askedRecently(solve, condition) ? solve.slots.add(condition) : solve.slots.limit;
    solve.memoCount[slot] = 0;
    solve.breaks[slot] = null;
    solve.breakThrust[slot] = null;
    solve.segmentCount[slot] = 0;
    solve.segmentNext[slot] = 0;
  }
  solve.slot = slot;
  key.altitude_m = condition.altitude_m;
  key.mach = condition.mach;
  key.isaDev_K = condition.isaDev_K;
}

/** Whether `condition` is among the recent new conditions (exact numbers); if not, it becomes the newest of them. */
function askedRecently(solve: PartPowerSolve, condition: FlightCondition): boolean {
  const r = solve.recent;
  for (let i = 0; i < r.length; i += 3) {
    if (sameNumber(r[i], condition.altitude_m) && sameNumber(r[i + 1], condition.mach) && sameNumber(r[i + 2], condition.isaDev_K)) return true;
  }
  const at = 3 * solve.recentNext;
  r[at] = condition.altitude_m;
  r[at + 1] = condition.mach;
  r[at + 2] = condition.isaDev_K;
  solve.recentNext = (solve.recentNext + 1) % RECENT_CONDITIONS;
  return false;
}

/** solveThrustAt at one of the solve's fixed powers, kept per condition (PartPowerSolve.memoPower); sets lastDeck_N. */
function memoThrustAt(solve: PartPowerSolve, power: number): number {
  const base = solve.slot * MEMO_POWERS;
  const count = solve.memoCount[solve.slot]!;
  for (let i = base; i < base + count; i++) {
    if (sameNumber(solve.memoPower[i], power)) {
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
    solve.breakThrust[solve.slot] = new Float64Array(list.length).fill(Number.NaN);
  }
  return list;
}

/** Index of the first of the ascending `list` strictly above `after` (list.length when none: DeckAccess.curveBreakAfter's Infinity). */
function firstBreakAbove(list: Float64Array, after: number): number {
  let l = 0;
  let h = list.length;
  while (l < h) {
    const m = (l + h) >> 1;
    if (list[m]! <= after) l = m + 1;
    else h = m;
  }
  return l;
}

/** Installed thrust per engine (N) at break `k` of the slot's breaks (kept; computed on first use). */
function breakThrustAt(solve: PartPowerSolve, breaks: Float64Array, k: number): number {
  const kept = solve.breakThrust[solve.slot]!;
  const t = kept[k]!;
  if (!Number.isNaN(t)) return t;
  const thrust = solveThrustAt(solve, breaks[k]!);
  kept[k] = thrust;
  return thrust;
}

/** Installed thrust per engine (N) at `power` for the solve in progress: the deck's fixed-condition curve when it offers one, else full lookups. */
export function solveThrustAt(solve: PartPowerSolve, power: number): number {
  solve.lastPower = power;
  if (solve.curve !== undefined && solve.curve(power, solve.curveOut)) {
    const out = solve.curveOut;
    const air = out[1]!;
    const hasAir = !Number.isNaN(air);
    const sens = solve.access.hasSensitivities ? readSensitivitiesInto(out, 2, hasAir, 1, solve.curveSensitivities) : null;
    installDeckPointInto(solve.fast, solve.ctx, solve.free, out[0]!, out[CURVE_FUEL_FLOW]!, hasAir ? air : null, sens);
    solve.lastOnCurve = true;
    return netThrustOf(solve.fast);
  }
  evaluateEngineInto(solve.full, solve.ctx, solve.access, solve.condition, solve.free, power);
  solve.lastOnCurve = false;
  return netThrustOf(solve.full);
}

/**
 * Installed fuel flow per engine (kg/s) at `power`, the root solvePartPower just returned, at its condition: the
 * last evaluation's when it was at that power (the usual case), else one evaluation there. The curve carries
 * lookupDeck's values to the bit, so this is the fuel flow of the full point at the root, to the bit.
 */
export function solvedFuelFlow(solve: PartPowerSolve, power: number): number {
  if (!sameNumber(solve.lastPower, power)) solveThrustAt(solve, power);
  return solve.lastOnCurve ? solve.fast.fuelFlow_kg_s : solve.full.fuelFlow_kg_s;
}

/**
 * The scratch of the last evaluation when it was on the curve at `power` (the root solvePartPower just returned)
 * and inside the deck's table there, completed with the lookup's outside list and cautions: then it holds what a
 * full evaluation at that power would (the curve carries lookupDeck's values to the bit, and installDeckPointInto
 * is the same step), so the root's point needs no second lookup. Null otherwise (the caller evaluates in full).
 */
export function solvedScratch(solve: PartPowerSolve, power: number): EngineScratch | null {
  if (!solve.lastOnCurve || !sameNumber(solve.lastPower, power)) return null;
  const cautions = solve.access.curveInsideCautions?.() ?? null;
  if (cautions === null) return null;
  const s = solve.fast;
  s.deckError = null;
  s.outside = INSIDE_TABLE;
  s.deckCautions = cautions;
  return s;
}

/**
 * Points solve.nodes at the slot's node array and returns the offset in it of the segment [lo, hi], taking one
 * (the oldest when all are taken) if the slot has none.
 */
function segmentBase(solve: PartPowerSolve, lo: number, hi: number): number {
  const slot = solve.slot;
  const nodes = (solve.nodeThrust[slot] ??= new Float64Array(SEGMENTS_PER_CONDITION * SEGMENT_NODES));
  solve.nodes = nodes;
  const first = slot * SEGMENTS_PER_CONDITION;
  const count = solve.segmentCount[slot]!;
  for (let i = first; i < first + count; i++) {
    if (sameNumber(solve.segmentLo[i], lo) && sameNumber(solve.segmentHi[i], hi)) return (i - first) * SEGMENT_NODES;
  }
  let i: number;
  if (count < SEGMENTS_PER_CONDITION) {
    i = first + count;
    solve.segmentCount[slot] = count + 1;
  } else {
    i = first + solve.segmentNext[slot]!;
    solve.segmentNext[slot] = (solve.segmentNext[slot]! + 1) % SEGMENTS_PER_CONDITION;
  }
  solve.segmentLo[i] = lo;
  solve.segmentHi[i] = hi;
  const base = (i - first) * SEGMENT_NODES;
  nodes.fill(Number.NaN, base, base + SEGMENT_NODES);
  return base;
}

/** Power of node `j` (0 .. SEGMENT_DIVISIONS) of the segment [lo, hi]: its ends exactly, else lo + (hi - lo) j / SEGMENT_DIVISIONS. */
function nodePower(lo: number, hi: number, j: number): number {
  return j === SEGMENT_DIVISIONS ? hi : lo + (hi - lo) * (j / SEGMENT_DIVISIONS);
}

/** Installed thrust per engine (N) at node `j` of the segment at `base` (kept; computed on first use). */
function nodeThrustAt(solve: PartPowerSolve, base: number, lo: number, hi: number, j: number): number {
  const kept = solve.nodes[base + j]!;
  if (!Number.isNaN(kept)) return kept;
  const thrust = solveThrustAt(solve, nodePower(lo, hi, j));
  solve.nodes[base + j] = thrust;
  return thrust;
}

/**
 * The root on the deck power segment [lo, hi] (a bracket: installed thrust loThrust_N < required < hiThrust_N, no
 * curve breakpoint inside): a search over the segment's nodes to the part holding the sign change, the inverse
 * cubic through the four nodes around it as the first guess, then a bracketed secant on the part if the guess
 * misses the tolerance.
 */
function solveOnSegment(solve: PartPowerSolve, lo: number, loThrust_N: number, hi: number, hiThrust_N: number, fTol: number): PartPowerRoot {
  const required = solve.required_N;
  const base = segmentBase(solve, lo, hi);
  solve.nodes[base] = loThrust_N;
  solve.nodes[base + SEGMENT_DIVISIONS] = hiThrust_N;
  // Nodes a (thrust below the asked) and b (above), closed in on the part holding the root by interpolation search
  // (the node just below the chord's root between them: on a nearly linear curve one or two probes), bisection
  // after three probes.
  let a = 0;
  let fa = loThrust_N - required;
  let b = SEGMENT_DIVISIONS;
  let fb = hiThrust_N - required;
  for (let probe = 0; b - a > 1; probe++) {
    const m = probe < 3 ? Math.min(Math.max(Math.floor(a + ((b - a) * fa) / (fa - fb)), a + 1), b - 1) : (a + b) >> 1;
    const f = nodeThrustAt(solve, base, lo, hi, m) - required;
    if (Math.abs(f) <= fTol) return { ok: true, power: nodePower(lo, hi, m), limit: 'within' };
    if (f < 0) {
      a = m;
      fa = f;
    } else {
      b = m;
      fb = f;
    }
  }
  const j = Math.min(Math.max(a - 1, 0), SEGMENT_DIVISIONS - 3);
  const f0 = nodeThrustAt(solve, base, lo, hi, j) - required;
  const f1 = nodeThrustAt(solve, base, lo, hi, j + 1) - required;
  const f2 = nodeThrustAt(solve, base, lo, hi, j + 2) - required;
  const f3 = nodeThrustAt(solve, base, lo, hi, j + 3) - required;
  const xa = nodePower(lo, hi, a);
  const xb = nodePower(lo, hi, b);
  let guess = inverseCubicZero(nodePower(lo, hi, j), nodePower(lo, hi, j + 1), nodePower(lo, hi, j + 2), nodePower(lo, hi, j + 3), f0, f1, f2, f3);
  if (!(guess > xa && guess < xb)) guess = xa - (fa * (xb - xa)) / (fb - fa);
  return rootFromGuess(solve, guess, xa, fa, xb, fb, fTol);
}

/**
 * The root in the bracket [lo, hi] (residuals fLo < 0 < fHi): `guess` evaluated first when it lies strictly inside
 * (NaN: no guess), returned when it meets the tolerance, else the side of the bracket it replaces; then a bracketed
 * secant on what is left.
 */
function rootFromGuess(solve: PartPowerSolve, guess: number, lo: number, fLo: number, hi: number, fHi: number, fTol: number): PartPowerRoot {
  if (guess > lo && guess < hi) {
    const g = solve.residual(guess);
    if (Math.abs(g) <= fTol) return { ok: true, power: guess, limit: 'within' };
    if (g < 0) {
      lo = guess;
      fLo = g;
    } else {
      hi = guess;
      fHi = g;
    }
  }
  const root = bracketedSecant(solve.residual, lo, fLo, hi, fHi, { fTol, xTol: 0, maxIterations: 100 });
  if (!root.ok) return { ok: false, error: { code: 'did_not_converge', message: root.error.message } };
  return { ok: true, power: root.value.x, limit: 'within' };
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
  solve.lastPower = Number.NaN;
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
  let loT = loThrust;
  let fLo = loThrust - perEngineRequired_N;
  let hi = ceilingPower;
  let hiT = hiThrust;
  let fHi = hiThrust - perEngineRequired_N;
  const fTol = FOR_THRUST_TOLERANCE * Math.max(Math.abs(perEngineRequired_N), 10);
  const curveBreakAfter = curve ? solve.access.curveBreakAfter : undefined;
  if (curveBreakAfter !== undefined) {
    const breaks = breaksOf(solve, curveBreakAfter);
    const n = breaks.length;
    // Narrow the bracket to one deck power segment: evaluate the breakpoint inside it nearest the chord's root
    // until none is left inside (usually two evaluations, fewer when idle or the ceiling bounds the segment). By
    // index in the strictly ascending breaks: `first` is the first above lo (the list's successor of a break is
    // curveBreakAfter's answer there).
    let first = firstBreakAbove(breaks, lo);
    for (;;) {
      if (!(first < n && breaks[first]! < hi)) break;
      const chord = lo - (fLo * (hi - lo)) / (fHi - fLo);
      let below = -1;
      let k = first;
      while (k < n && breaks[k]! < hi && breaks[k]! <= chord) {
        below = k;
        k++;
      }
      const above = k < n && breaks[k]! < hi ? k : -1;
      const pick = below < 0 ? above : above < 0 || chord - breaks[below]! <= breaks[above]! - chord ? below : above;
      const at = breaks[pick]!;
      const t = breakThrustAt(solve, breaks, pick);
      const f = t - perEngineRequired_N;
      if (Math.abs(f) <= fTol) return { ok: true, power: at, limit: 'within' };
      if (f < 0) {
        lo = at;
        loT = t;
        fLo = f;
        first = pick + 1;
      } else {
        hi = at;
        hiT = t;
        fHi = f;
      }
    }
    return solveOnSegment(solve, lo, loT, hi, hiT, fTol);
  }
  // Without a curve, the deck's own inversion at the deck thrust scaled as the ceiling's is the first guess.
  const ratio = hiThrust > 0 ? hiDeck / hiThrust : 1;
  const guess = curve ? null : solve.access.powerForThrust(condition, perEngineRequired_N * ratio, ceilingPower);
  return rootFromGuess(solve, guess ?? Number.NaN, lo, fLo, hi, fHi, fTol);
}
