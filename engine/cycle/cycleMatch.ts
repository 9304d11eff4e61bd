/**
 * Matching a cycle to a tabulated deck (docs/cycle.md, "Matching a cycle to
 * a deck"): the free parameters of a starting cycle spec are fitted by
 * bounded Levenberg-Marquardt least squares (engine/core/levenbergMarquardt)
 * so the cycle reproduces the deck's net thrust and fuel flow at its ratings.
 *
 * Power-axis mapping: a deck names its ratings as values on its power axis
 * (`# rating takeoff: 1`, ...). A deck point enters the fit only at a rating
 * both the deck and the cycle have: the deck's value at that rating's power
 * (linear within the (altitude, Mach) node; exact where the power is
 * tabulated) is compared with the cycle run at that rating
 * ({kind:'rating'}), at the node's altitude, Mach and ISA deviation and at
 * the deck's reference inlet recovery. Nothing is assumed about the deck's
 * power scale between the ratings. Flight idle is left out by default (a
 * cycle's idle is a fixed fan speed the fit does not adjust).
 *
 * Residuals: relative, (cycle - deck) / deck, for thrust and for fuel flow,
 * each times its weight (default 1 and 1). A point the cycle cannot match
 * enters the fit with residual 1 (100 %) times the weight per quantity, so the
 * fit is pushed away from parameters where it fails, and is listed in
 * `unmatched`; the reported RMS covers the matched points only.
 *
 * Free parameters: bypass ratio, fan pressure ratio, overall pressure ratio,
 * design turbine inlet temperature, design airflow (the size: the fitted
 * spec is sized by airflow), and optionally an offset added to every
 * rating's turbine inlet temperature limit (ratingTemperatureOffset).
 */
import { leastSquares } from '../core/levenbergMarquardt';
import { err, ok, type Result } from '../core/result';
import { assembleDeck } from '../propulsion/deckAssembly';
import { deckGridPoints, type DeckGridPoint } from '../propulsion/deckGrid';
import { referenceRecoveryAt, type EngineDeck } from '../propulsion/engineDeck';
import type { RatingName } from '../propulsion/propulsionModel';
import { cycleSensitivitiesAt, generatedDeckLocator } from './cycleDeck';
import type { CycleEngine } from './cycleEngine';
import { runCyclePoint, type CycleWarmStart } from './cyclePoint';
import type { CycleRating, CycleSpec, LimitValue } from './cycleSpec';
import { designEngine } from './designPoint';

export type MatchParameter = 'bypassRatio' | 'fanPressureRatio' | 'overallPressureRatio' | 'turbineInletTemperature' | 'airflow' | 'ratingTemperatureOffset';

export const MATCH_PARAMETERS: readonly MatchParameter[] = ['bypassRatio', 'fanPressureRatio', 'overallPressureRatio', 'turbineInletTemperature', 'airflow', 'ratingTemperatureOffset'];

/** Free by default: the five design parameters (the rating temperature offset is opt-in). */
export const DEFAULT_MATCH_FREE: readonly MatchParameter[] = ['bypassRatio', 'fanPressureRatio', 'overallPressureRatio', 'turbineInletTemperature', 'airflow'];

/** Ratings fitted by default (when both the deck and the cycle have them). */
export const DEFAULT_MATCH_RATINGS: readonly RatingName[] = ['takeoff', 'maxContinuous', 'maxClimb', 'maxCruise'];

/** At most this many (ISA deviation, altitude, Mach) nodes by default, taken evenly through the deck's node list. */
export const DEFAULT_MATCH_NODES = 24;

export interface CycleMatchOptions {
  readonly free?: readonly MatchParameter[];
  /** Bounds per parameter (SI: K, kg/s); defaults: matchDefaultBounds. */
  readonly bounds?: Partial<Record<MatchParameter, readonly [number, number]>>;
  readonly ratings?: readonly RatingName[];
  /** Most nodes to use (default DEFAULT_MATCH_NODES); `nodes` overrides. */
  readonly maxNodes?: number;
  /** Explicit nodes to use (each must be a deck node, ISA deviation 0 when the deck has none). */
  readonly nodes?: readonly { readonly altitude_m: number; readonly mach: number; readonly isaDev_K?: number }[];
  readonly weights?: { readonly thrust: number; readonly fuelFlow: number };
  readonly maxIterations?: number;
}

export interface MatchPointResult {
  readonly isaDev_K: number;
  readonly altitude_m: number;
  readonly mach: number;
  /** The deck's power value of the rating. */
  readonly power: number;
  readonly rating: RatingName;
  readonly deckThrust_N: number;
  readonly deckFuelFlow_kg_s: number;
  readonly cycleThrust_N: number | null;
  readonly cycleFuelFlow_kg_s: number | null;
  /** (cycle - deck) / deck, unweighted; null when not matched. */
  readonly thrustResidual: number | null;
  readonly fuelFlowResidual: number | null;
  /** Why the cycle gave no point (null when matched). */
  readonly reason: string | null;
}

export interface MatchParameterValue {
  readonly start: number;
  readonly fitted: number;
  readonly lower: number;
  readonly upper: number;
  readonly free: boolean;
  /** True when the fitted value sits on a bound (a caution: the bound may be holding the fit). */
  readonly atBound: boolean;
}

export interface CycleMatchResult {
  readonly status: 'converged' | 'not_converged';
  readonly message: string;
  readonly spec: CycleSpec;
  readonly parameters: Readonly<Record<MatchParameter, MatchParameterValue>>;
  /** RMS of all relative residuals (thrust and fuel flow) of the matched points, unweighted. */
  readonly rms: number;
  readonly rmsThrust: number;
  readonly rmsFuelFlow: number;
  /** The largest |relative residual| among the matched points (null when none matched). */
  readonly worst: { readonly point: MatchPointResult; readonly quantity: 'thrust' | 'fuelFlow'; readonly residual: number } | null;
  readonly points: readonly MatchPointResult[];
  readonly unmatched: readonly MatchPointResult[];
  readonly weights: { readonly thrust: number; readonly fuelFlow: number };
  readonly ratings: readonly RatingName[];
  readonly nodesUsed: number;
  readonly nodesInDeck: number;
  readonly iterations: number;
  readonly evaluations: number;
}

export type CycleMatchErrorCode = 'invalid_options' | 'no_points' | 'start_not_designed' | 'fit_failed';

export interface CycleMatchError {
  readonly code: CycleMatchErrorCode;
  readonly message: string;
}

/** Default bounds about the start: ratios and airflow 0.5x to 2x (FPR above 1.05), Tt4 +-300 K, rating offset +-150 K. */
export function matchDefaultBounds(start: Readonly<Record<MatchParameter, number>>): Record<MatchParameter, readonly [number, number]> {
  return {
    bypassRatio: [Math.max(0.1, start.bypassRatio * 0.5), Math.max(0.2, start.bypassRatio * 2)],
    fanPressureRatio: [Math.max(1.05, 1 + (start.fanPressureRatio - 1) * 0.5), 1 + (start.fanPressureRatio - 1) * 2],
    overallPressureRatio: [Math.max(2, start.overallPressureRatio * 0.5), Math.min(80, start.overallPressureRatio * 2)],
    turbineInletTemperature: [Math.max(800, start.turbineInletTemperature - 300), Math.min(2400, start.turbineInletTemperature + 300)],
    airflow: [start.airflow * 0.5, start.airflow * 2],
    ratingTemperatureOffset: [-150, 150],
  };
}

function shiftLimit(v: LimitValue, dK: number): LimitValue {
  return typeof v === 'number' ? v + dK : { byAmbientTemperature: v.byAmbientTemperature.map(([t, x]) => [t, x + dK] as const) };
}

/** `spec` with the parameter values applied (sized by airflow; rating turbine temperature limits shifted). */
export function applyMatchParameters(spec: CycleSpec, p: Readonly<Record<MatchParameter, number>>): CycleSpec {
  const ratings: Partial<Record<RatingName, CycleRating>> = {};
  for (const [name, r] of Object.entries(spec.ratings) as [RatingName, CycleRating][]) {
    const t = r.kind === 'limits' ? r.limits.turbineInletTemperature : undefined;
    ratings[name] = r.kind === 'limits' && t !== undefined && p.ratingTemperatureOffset !== 0 ? { kind: 'limits', limits: { ...r.limits, turbineInletTemperature: shiftLimit(t, p.ratingTemperatureOffset) } } : r;
  }
  return {
    ...spec,
    design: {
      ...spec.design,
      bypassRatio: p.bypassRatio,
      fanPressureRatio: p.fanPressureRatio,
      overallPressureRatio: p.overallPressureRatio,
      turbineInletTemperature_K: p.turbineInletTemperature,
      size: { kind: 'airflow', airflow_kg_s: p.airflow },
    },
    ratings,
  };
}

interface Target {
  readonly isaDev_K: number;
  readonly altitude_m: number;
  readonly mach: number;
  readonly power: number;
  readonly rating: RatingName;
  readonly thrust_N: number;
  readonly fuelFlow_kg_s: number;
  readonly recovery: number;
}

interface Node {
  readonly isaDev_K: number;
  readonly altitude_m: number;
  readonly mach: number;
  readonly points: readonly DeckGridPoint[];
}

function deckNodes(deck: EngineDeck): Node[] {
  const nodes: Node[] = [];
  for (const p of deckGridPoints(deck.grid)) {
    const last = nodes[nodes.length - 1];
    if (last && last.isaDev_K === p.isaDev_K && last.altitude_m === p.altitude_m && last.mach === p.mach) (last.points as DeckGridPoint[]).push(p);
    else nodes.push({ isaDev_K: p.isaDev_K, altitude_m: p.altitude_m, mach: p.mach, points: [p] });
  }
  return nodes;
}

/** Thrust and fuel flow at `power` within a node, linear between its points; null outside them. */
function atPower(node: Node, power: number): readonly [number, number] | null {
  const ps = node.points;
  for (let i = 0; i < ps.length; i++) {
    const p = ps[i]!;
    if (Math.abs(p.power - power) <= 1e-9 * Math.max(1, Math.abs(power))) return [p.thrust_N, p.fuelFlow_kg_s];
    if (i > 0 && ps[i - 1]!.power < power && power < p.power) {
      const q = ps[i - 1]!;
      const t = (power - q.power) / (p.power - q.power);
      return [q.thrust_N + t * (p.thrust_N - q.thrust_N), q.fuelFlow_kg_s + t * (p.fuelFlow_kg_s - q.fuelFlow_kg_s)];
    }
  }
  return null;
}

const SAME = (a: number, b: number): boolean => Math.abs(a - b) <= 1e-6 * Math.max(1, Math.abs(a), Math.abs(b));

function selectNodes(all: readonly Node[], options: CycleMatchOptions): Result<Node[], string> {
  if (options.nodes !== undefined) {
    const out: Node[] = [];
    for (const n of options.nodes) {
      const found = all.find((m) => SAME(m.altitude_m, n.altitude_m) && SAME(m.mach, n.mach) && SAME(m.isaDev_K, n.isaDev_K ?? 0));
      if (!found) return err(`no deck node at altitude ${n.altitude_m} m, Mach ${n.mach}${n.isaDev_K ? `, ISA deviation ${n.isaDev_K} K` : ''}`);
      out.push(found);
    }
    return ok(out);
  }
  const max = options.maxNodes ?? DEFAULT_MATCH_NODES;
  if (!Number.isInteger(max) || max < 1) return err(`the most nodes to use must be a whole number of 1 or more (got ${max})`);
  if (all.length <= max) return ok([...all]);
  const out: Node[] = [];
  for (let i = 0; i < max; i++) out.push(all[Math.round((i * (all.length - 1)) / (max - 1 || 1))]!);
  return ok(out);
}

function rms(values: readonly number[]): number {
  return values.length === 0 ? 0 : Math.sqrt(values.reduce((s, v) => s + v * v, 0) / values.length);
}

/** The starting values of every parameter, from `spec` and its designed engine. */
export function matchStartValues(spec: CycleSpec, engine: CycleEngine): Record<MatchParameter, number> {
  return {
    bypassRatio: spec.design.bypassRatio,
    fanPressureRatio: spec.design.fanPressureRatio,
    overallPressureRatio: spec.design.overallPressureRatio,
    turbineInletTemperature: spec.design.turbineInletTemperature_K,
    airflow: engine.summary.airflow_kg_s,
    ratingTemperatureOffset: 0,
  };
}

/**
 * Fits `start`'s free parameters to `deck` (module comment). Never throws;
 * an error only when the options are invalid, no deck point can be used or
 * the starting cycle cannot be designed.
 */
export function matchCycleToDeck(deck: EngineDeck, start: CycleSpec, options: CycleMatchOptions = {}): Result<CycleMatchResult, CycleMatchError> {
  const bad = (message: string): Result<CycleMatchResult, CycleMatchError> => err({ code: 'invalid_options', message });
  if (deck.interpolation === 'corrected') return bad('the deck must be the file\'s own (raw) values');
  const free = options.free ?? DEFAULT_MATCH_FREE;
  for (const f of free) if (!MATCH_PARAMETERS.includes(f)) return bad(`"${String(f)}" is not a parameter that can be fitted (${MATCH_PARAMETERS.join(', ')})`);
  if (free.length === 0) return bad('no free parameter to fit');
  const weights = options.weights ?? { thrust: 1, fuelFlow: 1 };
  if (!(weights.thrust >= 0 && weights.fuelFlow >= 0 && weights.thrust + weights.fuelFlow > 0 && Number.isFinite(weights.thrust + weights.fuelFlow))) {
    return bad(`the weights must be zero or positive, not both zero (got thrust ${weights.thrust}, fuel flow ${weights.fuelFlow})`);
  }
  const maxIterations = options.maxIterations ?? 40;
  if (!Number.isInteger(maxIterations) || maxIterations < 1) return bad(`the iteration limit must be a whole number of 1 or more (got ${maxIterations})`);

  const startEngine = designEngine(start);
  if (!startEngine.ok) return err({ code: 'start_not_designed', message: `the starting cycle cannot be designed: ${startEngine.error.message}` });
  const x0All = matchStartValues(start, startEngine.value);
  const defaults = matchDefaultBounds(x0All);
  const bounds: Record<MatchParameter, readonly [number, number]> = { ...defaults };
  for (const [name, b] of Object.entries(options.bounds ?? {}) as [MatchParameter, readonly [number, number]][]) {
    if (!MATCH_PARAMETERS.includes(name)) return bad(`bounds given for "${name}", which is not a parameter that can be fitted`);
    if (!(Number.isFinite(b[0]) && Number.isFinite(b[1]) && b[0] < b[1])) return bad(`the bounds of ${name} must be two finite numbers, lower below upper (got ${b[0]}, ${b[1]})`);
    bounds[name] = b;
  }
  for (const f of free) {
    const [lo, hi] = bounds[f];
    if (x0All[f] < lo || x0All[f] > hi) return bad(`the starting ${f} ${x0All[f]} lies outside its bounds ${lo} to ${hi}`);
  }

  const ratings = (options.ratings ?? DEFAULT_MATCH_RATINGS).filter((r) => deck.ratings[r] !== undefined && start.ratings[r] !== undefined);
  if (ratings.length === 0) return err({ code: 'no_points', message: `the deck and the cycle share none of the ratings ${(options.ratings ?? DEFAULT_MATCH_RATINGS).join(', ')}` });
  const allNodes = deckNodes(deck);
  const chosen = selectNodes(allNodes, options);
  if (!chosen.ok) return bad(chosen.error);
  const targets: Target[] = [];
  for (const node of chosen.value) {
    for (const rating of ratings) {
      const power = deck.ratings[rating]!;
      const v = atPower(node, power);
      if (v === null || !(v[0] > 0 && v[1] > 0)) continue;
      targets.push({ isaDev_K: node.isaDev_K, altitude_m: node.altitude_m, mach: node.mach, power, rating, thrust_N: v[0], fuelFlow_kg_s: v[1], recovery: referenceRecoveryAt(deck.referenceRecovery, node.mach) });
    }
  }
  if (targets.length === 0) return err({ code: 'no_points', message: 'no deck point at a rating with positive thrust and fuel flow in the chosen nodes' });

  const full = (x: readonly number[]): Record<MatchParameter, number> => {
    const p = { ...x0All };
    free.forEach((f, i) => {
      p[f] = x[i]!;
    });
    return p;
  };
  const warm = new Map<number, CycleWarmStart>();
  const evaluate = (x: readonly number[]): { engine: CycleEngine; points: MatchPointResult[] } | null => {
    const engine = designEngine(applyMatchParameters(start, full(x)));
    if (!engine.ok) return null;
    const points = targets.map((t, i): MatchPointResult => {
      const w = warm.get(i);
      const p = runCyclePoint(engine.value, {
        altitude_m: t.altitude_m,
        mach: t.mach,
        isaDeviation_K: t.isaDev_K,
        throttle: { kind: 'rating', rating: t.rating },
        recovery: t.recovery,
        bleedFraction: 0,
        powerExtraction_W: 0,
        ...(w ? { start: w } : {}),
      });
      const base = { isaDev_K: t.isaDev_K, altitude_m: t.altitude_m, mach: t.mach, power: t.power, rating: t.rating, deckThrust_N: t.thrust_N, deckFuelFlow_kg_s: t.fuelFlow_kg_s };
      if (p.status !== 'converged' || p.thrust_N === null || p.fuelFlow_kg_s === null || !Number.isFinite(p.thrust_N) || !Number.isFinite(p.fuelFlow_kg_s)) {
        return { ...base, cycleThrust_N: null, cycleFuelFlow_kg_s: null, thrustResidual: null, fuelFlowResidual: null, reason: `${p.status}: ${p.message}` };
      }
      if (p.start) warm.set(i, p.start);
      return { ...base, cycleThrust_N: p.thrust_N, cycleFuelFlow_kg_s: p.fuelFlow_kg_s, thrustResidual: p.thrust_N / t.thrust_N - 1, fuelFlowResidual: p.fuelFlow_kg_s / t.fuelFlow_kg_s - 1, reason: null };
    });
    return { engine: engine.value, points };
  };
  const residuals = (x: readonly number[]): number[] | null => {
    const e = evaluate(x);
    if (e === null) return null;
    const r: number[] = [];
    for (const p of e.points) {
      r.push(weights.thrust * (p.thrustResidual ?? 1), weights.fuelFlow * (p.fuelFlowResidual ?? 1));
    }
    return r;
  };

  const lower = free.map((f) => bounds[f][0]);
  const upper = free.map((f) => bounds[f][1]);
  const fit = leastSquares(residuals, free.map((f) => x0All[f]), { lower, upper, maxIterations, jacobianStep: 1e-5, costTolerance: 1e-12, stepTolerance: 1e-9 });
  const fitted = full(fit.x);
  const final = evaluate(fit.x);
  if (final === null) return err({ code: 'fit_failed', message: `the fitted cycle cannot be designed (${fit.message})` });
  const matched = final.points.filter((p) => p.reason === null);
  const unmatched = final.points.filter((p) => p.reason !== null);
  const tr = matched.map((p) => p.thrustResidual!);
  const fr = matched.map((p) => p.fuelFlowResidual!);
  let worst: CycleMatchResult['worst'] = null;
  for (const p of matched) {
    for (const [quantity, residual] of [['thrust', p.thrustResidual!], ['fuelFlow', p.fuelFlowResidual!]] as const) {
      if (worst === null || Math.abs(residual) > Math.abs(worst.residual)) worst = { point: p, quantity, residual };
    }
  }
  const parameters = {} as Record<MatchParameter, MatchParameterValue>;
  for (const name of MATCH_PARAMETERS) {
    const [lo, hi] = bounds[name];
    const isFree = free.includes(name);
    const tol = 1e-6 * (hi - lo);
    parameters[name] = { start: x0All[name], fitted: fitted[name], lower: lo, upper: hi, free: isFree, atBound: isFree && (fitted[name] - lo <= tol || hi - fitted[name] <= tol) };
  }
  const status = fit.converged && unmatched.length === 0 ? 'converged' : 'not_converged';
  const message = !fit.converged ? `not converged: ${fit.message}` : unmatched.length > 0 ? `the cycle could not be matched at ${unmatched.length} of ${final.points.length} point(s)` : fit.message;
  return ok({
    status,
    message,
    spec: final.engine.spec,
    parameters,
    rms: rms([...tr, ...fr]),
    rmsThrust: rms(tr),
    rmsFuelFlow: rms(fr),
    worst,
    points: final.points,
    unmatched,
    weights,
    ratings,
    nodesUsed: chosen.value.length,
    nodesInDeck: allNodes.length,
    iterations: fit.iterations,
    evaluations: fit.evaluations,
  });
}

/** A deck point whose sensitivities were taken at the nearest end of the cycle's range, or could not be given. */
export interface DeckCopyCaution {
  readonly isaDev_K: number;
  readonly altitude_m: number;
  readonly mach: number;
  readonly power: number;
  readonly message: string;
}

export interface DeckCopyResult {
  readonly deck: EngineDeck;
  readonly cautions: readonly DeckCopyCaution[];
  readonly cyclePoints: number;
}

/**
 * A copy of `deck` with the installation-sensitivity columns of `engine`
 * added at every tabulated point; the deck's own thrust, fuel flow and
 * airflow are unchanged. Each point's sensitivities are taken at the cycle's
 * fan speed N1 that gives the deck point's thrust at that node (regula falsi
 * between the cycle's flight idle and takeoff N1), at the deck's reference
 * recovery. A deck thrust outside the cycle's idle-to-takeoff range takes
 * the sensitivities at that end, with a caution. An error when a node's
 * ratings do not match (no sensitivities can be given there) or the copy
 * fails the deck checks.
 */
export function deckWithCycleSensitivities(deck: EngineDeck, engine: CycleEngine): Result<DeckCopyResult, CycleMatchError> {
  if (deck.interpolation === 'corrected') return err({ code: 'invalid_options', message: 'the deck must be the file\'s own (raw) values' });
  const rows: DeckGridPoint[] = [];
  const cautions: DeckCopyCaution[] = [];
  let runs = 0;
  const failed: string[] = [];
  for (const node of deckNodes(deck)) {
    const condition = { altitude_m: node.altitude_m, mach: node.mach, isaDeviation_K: node.isaDev_K };
    const recovery = referenceRecoveryAt(deck.referenceRecovery, node.mach);
    const thrustAt = (n1: number): number | null => {
      runs++;
      const p = runCyclePoint(engine, { ...condition, throttle: { kind: 'fanSpeed', fraction: n1 }, recovery, bleedFraction: 0, powerExtraction_W: 0 });
      return p.status === 'converged' && p.thrust_N !== null && Number.isFinite(p.thrust_N) ? p.thrust_N : null;
    };
    const ends: number[] = [];
    for (const rating of ['flightIdle', 'takeoff'] as const) {
      if (engine.spec.ratings[rating] === undefined) continue;
      runs++;
      const p = runCyclePoint(engine, { ...condition, throttle: { kind: 'rating', rating }, recovery, bleedFraction: 0, powerExtraction_W: 0 });
      if (p.status === 'converged' && p.fanSpeed !== null) ends.push(p.fanSpeed);
    }
    const lo = ends.length === 2 ? ends[0]! : null;
    const hi = ends.length === 2 ? ends[1]! : null;
    const tLo = lo !== null ? thrustAt(lo) : null;
    const tHi = hi !== null ? thrustAt(hi) : null;
    if (lo === null || hi === null || tLo === null || tHi === null || !(hi > lo) || !(tHi > tLo)) {
      failed.push(`${node.altitude_m.toFixed(1)} m, Mach ${node.mach}${node.isaDev_K !== 0 ? `, ISA${node.isaDev_K > 0 ? '+' : ''}${node.isaDev_K} K` : ''}`);
      continue;
    }
    let warm: CycleWarmStart | undefined;
    for (const p of node.points) {
      let n1: number;
      const caution = (message: string): void => {
        cautions.push({ isaDev_K: p.isaDev_K, altitude_m: p.altitude_m, mach: p.mach, power: p.power, message });
      };
      if (p.thrust_N <= tLo) {
        n1 = lo;
        if (p.thrust_N < tLo * (1 - 1e-6)) caution(`deck thrust ${p.thrust_N.toFixed(0)} N is below the cycle's flight idle thrust ${tLo.toFixed(0)} N here: sensitivities taken at flight idle`);
      } else if (p.thrust_N >= tHi) {
        n1 = hi;
        if (p.thrust_N > tHi * (1 + 1e-6)) caution(`deck thrust ${p.thrust_N.toFixed(0)} N is above the cycle's takeoff thrust ${tHi.toFixed(0)} N here: sensitivities taken at takeoff`);
      } else {
        // Regula falsi (Illinois variant) on thrust(N1) - deck thrust.
        let a = lo;
        let fa = tLo - p.thrust_N;
        let b = hi;
        let fb = tHi - p.thrust_N;
        let side = 0;
        n1 = b;
        for (let it = 0; it < 30; it++) {
          const c = (a * fb - b * fa) / (fb - fa);
          const t = thrustAt(c);
          if (t === null) {
            n1 = c;
            break;
          }
          const fc = t - p.thrust_N;
          n1 = c;
          if (Math.abs(fc) <= 1e-6 * p.thrust_N) break;
          if (fc * fb > 0) {
            b = c;
            fb = fc;
            if (side === -1) fa /= 2;
            side = -1;
          } else {
            a = c;
            fa = fc;
            if (side === 1) fb /= 2;
            side = 1;
          }
        }
      }
      const s = cycleSensitivitiesAt(engine, condition, n1, recovery, warm);
      runs += s.runs;
      if (!s.ok) {
        failed.push(`${p.altitude_m.toFixed(1)} m, Mach ${p.mach}, power ${p.power}: ${s.reason}`);
        continue;
      }
      warm = s.start;
      rows.push({ ...p, sensitivities: s.sensitivities });
    }
  }
  if (failed.length > 0) {
    return err({ code: 'fit_failed', message: `no sensitivities from the cycle at ${failed.length} node(s) or point(s), first ${failed.slice(0, 3).join('; ')}` });
  }
  const assembled = assembleDeck({
    source: deck.title,
    title: deck.title,
    parametric: deck.parametric,
    referenceRecovery: deck.referenceRecovery,
    ratings: (Object.entries(deck.ratings) as [RatingName, number][]).map(([name, value]) => ({ name, value, line: null, column: null })),
    notes: [
      ...deck.notes,
      `Installation-sensitivity columns added from the matched cycle "${engine.spec.title}" (blockwise cycle match), at the fan speed giving each point's thrust; thrust, fuel flow and airflow are the deck's own.`,
    ],
    policy: deck.policy,
    hasAirflow: deck.hasAirflow,
    hasIsaDev: deck.hasIsaDev,
    hasSensitivities: true,
    rows,
    locate: generatedDeckLocator(rows),
  });
  if (!assembled.ok) return err({ code: 'fit_failed', message: `the deck copy fails the deck checks: ${assembled.error[0]!.message}` });
  return ok({ deck: assembled.value, cautions, cyclePoints: runs });
}
