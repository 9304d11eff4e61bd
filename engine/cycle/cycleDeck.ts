/**
 * A deck generated from an engine cycle: thrust, fuel flow and airflow over
 * altitude x Mach x power (ISA deviation optional), with the per-point
 * installation sensitivities computed through the cycle (docs/cycle-deck.md).
 *
 * The power axis is a power-lever scale. A cycle's ratings come out of its
 * limits, so their fan speed differs from one condition to the next; the
 * deck puts each rating at a fixed lever value (POWER_LEVER) and, at each
 * (altitude, Mach) node, sets the mechanical fan speed N1 of a lever value
 * between two ratings by linear interpolation between those ratings' N1 at
 * that node. Below maximum cruise the lever runs from flight idle in steps
 * of 0.1 (fan speed linear in the lever). Every tabulated point is a matched
 * cycle point at that N1.
 *
 * Sensitivities, at the same power setting (the same N1 at the node): the
 * derivative of thrust, fuel flow and total airflow with respect to inlet
 * recovery, bleed fraction and shaft power extraction, about the deck's
 * reference (the design inlet recovery, no bleed, no extraction). The cycle
 * takes recovery up to 1 and bleed and extraction from 0, so a central
 * difference does not fit at the reference; the second-order one-sided
 * three-point formula is used instead (same O(h^2) error as a central
 * difference): f'(x) = (-3 f(x) + 4 f(x + h) - f(x + 2h)) / (2h), with
 * h = -0.005 in recovery, +0.005 in bleed fraction and +10 kW in
 * extraction (SENSITIVITY_STEPS).
 */
import { err, ok, type Result } from '../core/result';
import { assembleDeck, type DeckRowLocator } from '../propulsion/deckAssembly';
import type { DeckFileError } from '../propulsion/deckFileError';
import type { DeckGridPoint } from '../propulsion/deckGrid';
import { DEFAULT_DECK_POLICY, type EngineDeck } from '../propulsion/engineDeck';
import type { InstallationSensitivities } from '../propulsion/installationSensitivities';
import type { RatingName } from '../propulsion/propulsionModel';
import type { CycleEngine } from './cycleEngine';
import { runCyclePoint, type CyclePointResult, type CycleWarmStart } from './cyclePoint';
import { FOOT_M } from '../units/unitTable';

/** The lever value of each rating: fixed across the deck (the deck's `rating` lines). */
export const POWER_LEVER: Readonly<Record<RatingName, number>> = {
  flightIdle: 0.2,
  maxCruise: 0.85,
  maxClimb: 0.9,
  maxContinuous: 0.95,
  takeoff: 1,
};

/** Ratings in lever order. */
const LEVER_RATINGS: readonly RatingName[] = ['flightIdle', 'maxCruise', 'maxClimb', 'maxContinuous', 'takeoff'];

/** Lever values between flight idle and maximum cruise (fan speed linear in the lever). */
export const PART_POWER_LEVER: readonly number[] = [0.3, 0.4, 0.5, 0.6, 0.7, 0.8];

/** Finite-difference steps of the sensitivities (three-point one-sided formula, module comment). */
export const SENSITIVITY_STEPS = { recovery: -0.005, bleedFraction: 0.005, powerExtraction_W: 10e3 } as const;

const FT = FOOT_M;

/** The default grid: the demo class's envelope, 0 to 51,000 ft and Mach 0 to 0.9. */
export const DEFAULT_CYCLE_DECK_GRID: CycleDeckGrid = {
  altitudes_m: [0, 5000, 10000, 15000, 20000, 25000, 30000, 35000, 40000, 45000, 51000].map((ft) => ft * FT),
  machs: [0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9],
};

export interface CycleDeckGrid {
  /** Pressure altitudes (m), ascending. */
  readonly altitudes_m: readonly number[];
  /** Flight Mach numbers, ascending. */
  readonly machs: readonly number[];
  /** ISA deviations (K), ascending: two or more add an isa_dev axis; absent: ISA only. */
  readonly isaDevs_K?: readonly number[];
}

/** A tabulated point the cycle could not give, and why (it is left out of the deck). */
export interface CycleDeckGap {
  readonly isaDev_K: number;
  readonly altitude_m: number;
  readonly mach: number;
  /** Lever value, or null when the whole node is missing. */
  readonly power: number | null;
  readonly reason: string;
}

export interface CycleDeckResult {
  readonly deck: EngineDeck;
  /** Points left out (not matched, or a rating that coincides with the one below it at a node). */
  readonly gaps: readonly CycleDeckGap[];
  /** Cycle points run. */
  readonly cyclePoints: number;
}

export type CycleDeckErrorCode = 'invalid_grid' | 'deck_invalid';

export interface CycleDeckError {
  readonly code: CycleDeckErrorCode;
  readonly message: string;
  /** The deck checks' own errors when the generated table fails them. */
  readonly deckErrors?: readonly DeckFileError[];
}

/** Lever values tabulated at every node, ascending. */
export function cycleDeckPowers(): readonly number[] {
  return [POWER_LEVER.flightIdle, ...PART_POWER_LEVER, POWER_LEVER.maxCruise, POWER_LEVER.maxClimb, POWER_LEVER.maxContinuous, POWER_LEVER.takeoff];
}

/**
 * N1 (fraction of design) at lever value `power`, from the ratings' N1 at
 * the node (in LEVER_RATINGS order): linear between the adjacent ratings.
 * Exact at each rating's lever value; `power` within [idle, takeoff].
 */
export function leverFanSpeed(power: number, ratingFanSpeeds: readonly number[]): number {
  for (let i = 1; i < LEVER_RATINGS.length; i++) {
    const p0 = POWER_LEVER[LEVER_RATINGS[i - 1]!];
    const p1 = POWER_LEVER[LEVER_RATINGS[i]!];
    if (power <= p1 || i === LEVER_RATINGS.length - 1) {
      const t = (power - p0) / (p1 - p0);
      return ratingFanSpeeds[i - 1]! + t * (ratingFanSpeeds[i]! - ratingFanSpeeds[i - 1]!);
    }
  }
  return ratingFanSpeeds[ratingFanSpeeds.length - 1]!;
}

function checkGrid(grid: CycleDeckGrid): string | null {
  const ascending = (a: readonly number[], what: string, n: number): string | null => {
    if (a.length < n) return `the ${what} axis needs at least ${n} values (got ${a.length})`;
    for (let i = 0; i < a.length; i++) {
      if (!Number.isFinite(a[i]!)) return `${what} value ${a[i]} is not a finite number`;
      if (i > 0 && !(a[i]! > a[i - 1]!)) return `the ${what} values must rise strictly (${a[i - 1]} then ${a[i]})`;
    }
    return null;
  };
  return (
    ascending(grid.altitudes_m, 'altitude', 2) ??
    ascending(grid.machs, 'Mach', 2) ??
    (grid.isaDevs_K !== undefined ? ascending(grid.isaDevs_K, 'ISA deviation', 2) : null) ??
    (grid.machs[0]! < 0 ? `Mach ${grid.machs[0]} is negative` : null)
  );
}

interface Reference {
  readonly recovery: number;
}

/** Thrust, fuel flow, airflow of a converged point, or null. */
function triple(p: CyclePointResult): readonly [number, number, number] | null {
  return p.status === 'converged' && p.thrust_N !== null && p.fuelFlow_kg_s !== null && p.airflow_kg_s !== null
    ? [p.thrust_N, p.fuelFlow_kg_s, p.airflow_kg_s]
    : null;
}

/** Second-order one-sided derivative from f(x), f(x + h), f(x + 2h). */
function threePoint(f0: number, f1: number, f2: number, h: number): number {
  return (-3 * f0 + 4 * f1 - f2) / (2 * h);
}

/** A matched point at a fixed N1 and its installation sensitivities, or why not. */
export type SensitivePoint =
  | {
      readonly ok: true;
      /** Thrust (N), fuel flow (kg/s), total airflow (kg/s) at the reference. */
      readonly values: readonly [number, number, number];
      readonly sensitivities: InstallationSensitivities;
      readonly start: CycleWarmStart | undefined;
      readonly runs: number;
    }
  | { readonly ok: false; readonly reason: string; readonly runs: number };

/**
 * The cycle matched at mechanical fan speed `n1` (fraction of design) at a
 * condition, at recovery `recovery`, no bleed, no extraction, and its
 * sensitivities by the three-point one-sided differences of the module
 * comment (seven cycle points).
 */
export function cycleSensitivitiesAt(
  engine: CycleEngine,
  condition: { readonly altitude_m: number; readonly mach: number; readonly isaDeviation_K: number },
  n1: number,
  recovery: number,
  start?: CycleWarmStart,
): SensitivePoint {
  let runs = 0;
  const run = (extra: { recovery?: number; bleedFraction?: number; powerExtraction_W?: number }, warm?: CycleWarmStart): CyclePointResult => {
    runs++;
    return runCyclePoint(engine, {
      ...condition,
      throttle: { kind: 'fanSpeed', fraction: n1 },
      recovery: extra.recovery ?? recovery,
      bleedFraction: extra.bleedFraction ?? 0,
      powerExtraction_W: extra.powerExtraction_W ?? 0,
      ...(warm ? { start: warm } : {}),
    });
  };
  const base = run({}, start);
  const b = triple(base);
  if (b === null) return { ok: false, reason: `not matched at N1 ${n1.toFixed(4)} (${base.status}: ${base.message})`, runs };
  const w = base.start ?? undefined;
  const hR = SENSITIVITY_STEPS.recovery;
  const hB = SENSITIVITY_STEPS.bleedFraction;
  const hP = SENSITIVITY_STEPS.powerExtraction_W;
  const r1 = triple(run({ recovery: recovery + hR }, w));
  const r2 = triple(run({ recovery: recovery + 2 * hR }, w));
  const b1 = triple(run({ bleedFraction: hB }, w));
  const b2 = triple(run({ bleedFraction: 2 * hB }, w));
  const e1 = triple(run({ powerExtraction_W: hP }, w));
  const e2 = triple(run({ powerExtraction_W: 2 * hP }, w));
  if (r1 === null || r2 === null || b1 === null || b2 === null || e1 === null || e2 === null) {
    return { ok: false, reason: `a sensitivity step did not match at N1 ${n1.toFixed(4)}`, runs };
  }
  const d = (k: 0 | 1 | 2, f1: readonly number[], f2: readonly number[], h: number): number => threePoint(b[k], f1[k]!, f2[k]!, h);
  return {
    ok: true,
    values: b,
    start: w,
    runs,
    sensitivities: {
      dThrust_dRecovery_N: d(0, r1, r2, hR),
      dFuelFlow_dRecovery_kg_s: d(1, r1, r2, hR),
      dAirflow_dRecovery_kg_s: d(2, r1, r2, hR),
      dThrust_dBleed_N: d(0, b1, b2, hB),
      dFuelFlow_dBleed_kg_s: d(1, b1, b2, hB),
      dAirflow_dBleed_kg_s: d(2, b1, b2, hB),
      dThrust_dExtraction_N_W: d(0, e1, e2, hP),
      dFuelFlow_dExtraction_kg_s_W: d(1, e1, e2, hP),
      dAirflow_dExtraction_kg_s_W: d(2, e1, e2, hP),
    },
  };
}

/**
 * Generates the deck of `engine` over `grid` (default DEFAULT_CYCLE_DECK_GRID)
 * with airflow and sensitivity columns, per engine, uninstalled at the
 * design inlet recovery with no bleed and no extraction. Points the cycle
 * cannot match are left out and listed in `gaps`; an error when the grid is
 * invalid or what is left does not make a valid deck. Never throws.
 */
export function cycleDeck(engine: CycleEngine, grid: CycleDeckGrid = DEFAULT_CYCLE_DECK_GRID): Result<CycleDeckResult, CycleDeckError> {
  const bad = checkGrid(grid);
  if (bad !== null) return err({ code: 'invalid_grid', message: `cycle deck grid: ${bad}` });
  const ref: Reference = { recovery: engine.spec.design.inletRecovery };
  const isaDevs = grid.isaDevs_K ?? [0];
  const hasIsaDev = grid.isaDevs_K !== undefined;
  const powers = cycleDeckPowers();
  const rows: DeckGridPoint[] = [];
  const gaps: CycleDeckGap[] = [];
  let runs = 0;
  const run = (altitude_m: number, mach: number, isaDeviation_K: number, fanSpeed: number | null, rating: RatingName | null, extra: { recovery?: number; bleedFraction?: number; powerExtraction_W?: number }, start?: CycleWarmStart): CyclePointResult => {
    runs++;
    return runCyclePoint(engine, {
      altitude_m,
      mach,
      isaDeviation_K,
      throttle: rating !== null ? { kind: 'rating', rating } : { kind: 'fanSpeed', fraction: fanSpeed! },
      recovery: extra.recovery ?? ref.recovery,
      bleedFraction: extra.bleedFraction ?? 0,
      powerExtraction_W: extra.powerExtraction_W ?? 0,
      ...(start ? { start } : {}),
    });
  };

  for (const isaDev_K of isaDevs) {
    for (const altitude_m of grid.altitudes_m) {
      for (const mach of grid.machs) {
        const gap = (power: number | null, reason: string): void => {
          gaps.push({ isaDev_K, altitude_m, mach, power, reason });
        };
        // The ratings' fan speeds at this node.
        const ratingN1: number[] = [];
        let missing: string | null = null;
        for (const rating of LEVER_RATINGS) {
          const p = run(altitude_m, mach, isaDev_K, null, rating, {});
          if (p.status !== 'converged' || p.fanSpeed === null) {
            missing = `rating ${rating} did not match (${p.status}: ${p.message})`;
            break;
          }
          ratingN1.push(p.fanSpeed);
        }
        if (missing !== null) {
          gap(null, missing);
          continue;
        }
        let start: CycleWarmStart | undefined;
        let lastN1 = -Infinity;
        for (const power of powers) {
          const n1 = leverFanSpeed(power, ratingN1);
          if (!(n1 > lastN1 * (1 + 1e-9))) {
            gap(power, `fan speed ${n1.toFixed(6)} does not rise above the point below (${lastN1.toFixed(6)}): the ratings coincide here`);
            continue;
          }
          const at = cycleSensitivitiesAt(engine, { altitude_m, mach, isaDeviation_K: isaDev_K }, n1, ref.recovery, start);
          runs += at.runs;
          if (!at.ok) {
            gap(power, at.reason);
            continue;
          }
          start = at.start;
          const b = at.values;
          const sensitivities = at.sensitivities;
          lastN1 = n1;
          rows.push({ isaDev_K, altitude_m, mach, power, thrust_N: b[0], fuelFlow_kg_s: b[1], airflow_kg_s: b[2], sensitivities });
        }
      }
    }
  }
  const spec = engine.spec;
  const notes = [
    `Generated from the engine cycle "${spec.title}" (matched off-design points; docs/cycle.md, docs/cycle-deck.md).`,
    `Per engine, uninstalled at the design inlet recovery ${ref.recovery}, no customer bleed, no shaft power extraction.`,
    `Power axis: a power-lever scale with each rating at a fixed value (${LEVER_RATINGS.map((r) => `${r} ${POWER_LEVER[r]}`).join(', ')}); between two ratings the mechanical fan speed N1 is interpolated linearly between their N1 at the condition.`,
    `Installation sensitivities at the same N1, by the three-point one-sided difference with steps ${SENSITIVITY_STEPS.recovery} in recovery, ${SENSITIVITY_STEPS.bleedFraction} in bleed fraction (of core flow) and ${SENSITIVITY_STEPS.powerExtraction_W / 1000} kW of extraction.`,
    ...(gaps.length > 0 ? [`${gaps.length} point(s) left out where the cycle gave none (see the generator's report).`] : []),
  ];
  const title = `${spec.title} (deck from its cycle)`;
  const assembled = assembleDeck({
    source: title,
    title,
    parametric: false,
    referenceRecovery: { kind: 'constant', value: ref.recovery },
    ratings: LEVER_RATINGS.map((name) => ({ name, value: POWER_LEVER[name], line: null, column: null })),
    notes,
    policy: DEFAULT_DECK_POLICY,
    hasAirflow: true,
    hasIsaDev,
    hasSensitivities: true,
    rows,
    locate: generatedDeckLocator(rows),
  });
  if (!assembled.ok) {
    return err({
      code: 'deck_invalid',
      message: `the deck generated from "${spec.title}" fails the deck checks (${assembled.error.length} problem(s)): ${assembled.error[0]!.message}`,
      deckErrors: assembled.error,
    });
  }
  return ok({ deck: assembled.value, gaps, cyclePoints: runs });
}

/**
 * Where a problem sits in a deck made in memory (from a cycle, or a deck copy with the cycle's sensitivities): no
 * file line, the grid point named instead.
 */
export function generatedDeckLocator(rows: readonly DeckGridPoint[]): DeckRowLocator {
  return {
    line: () => null,
    column: (row, column) => {
      const p = rows[row]!;
      return `point (ISA${p.isaDev_K >= 0 ? '+' : ''}${p.isaDev_K} K, ${Number((p.altitude_m / FT).toFixed(1))} ft, Mach ${p.mach}, power ${p.power}) ${column}`;
    },
    show: (_column, v) => String(Number(v.toPrecision(8))),
  };
}
