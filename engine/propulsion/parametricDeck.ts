/**
 * A labelled PARAMETRIC deck for when no maker's deck is at hand: full-
 * throttle thrust lapse and TSFC from Mattingly, Heiser & Pratt, "Aircraft
 * Engine Design", 2nd ed. (AIAA, 2002), §2.3.2 "installed engine" algebraic
 * models (eqs. 2.54a-c thrust lapse, 2.55a-c TSFC), plus documented
 * part-power and airflow models of our own.
 *
 * Mattingly's models estimate the installed thrust of a typical engine of
 * each kind. Here they generate an INVENTED, UNINSTALLED deck that is taken
 * to be at the MIL-E-5008B reference recovery (1.0 below Mach 1) with no
 * bleed or shaft-power extraction; the deck's notes and title say so.
 */
import { buildDeckGrid, type DeckGridPoint } from './deckGrid';
import { isaPressureRatio, isaTemperature_K, ISA_SEA_LEVEL_TEMPERATURE_K } from './deckIsa';
import { DEFAULT_DECK_POLICY, engineDeckOf, type EngineDeck } from './engineDeck';
import type { RatingName } from './propulsionModel';

export type ParametricEngineKind = 'highBypassTurbofan' | 'lowBypassTurbofan' | 'turbojet';

export interface ParametricDeckGrid {
  /** Tabulated pressure altitudes (m), ascending. */
  readonly altitudes_m: readonly number[];
  /** Tabulated Mach numbers, ascending; each altitude keeps those within its `machRanges` entry. */
  readonly machs: readonly number[];
  /** Optional [lowest, highest] Mach per altitude (same length as altitudes_m): a ragged grid. */
  readonly machRanges?: readonly (readonly [number, number])[];
  /** Power settings (-): fraction of full-throttle thrust at the condition, ascending, in (0, 1]. */
  readonly powers: readonly number[];
  /** Optional ISA deviations (K) to tabulate (at least two); without, the deck has no isa_dev axis. */
  readonly isaDevs_K?: readonly number[];
}

export interface ParametricDeckSpec {
  readonly kind: ParametricEngineKind;
  /** Deck title; " (parametric)" is appended when it does not say "parametric". */
  readonly title: string;
  /** Full-throttle (dry) sea-level static thrust per engine (N), > 0. */
  readonly seaLevelStaticThrust_N: number;
  /** Mattingly's throttle ratio TR = theta0 at the control break (-), 0.9..1.3. */
  readonly throttleRatio: number;
  /** Full-throttle TSFC at sea-level static (kg/(N s)), > 0; scales Mattingly's TSFC model. */
  readonly tsfcSeaLevelStatic_kg_N_s: number;
  /** Sea-level static full-throttle airflow per engine (kg/s), > 0. */
  readonly seaLevelStaticAirflow_kg_s: number;
  /** Ratings on the power axis; defaults in DEFAULT_PARAMETRIC_RATINGS, flightIdle = lowest power. */
  readonly ratings?: Readonly<Partial<Record<RatingName, number>>>;
  /** Part-power fuel-flow intercept k0 (-), 0..0.5; default 0.1 (see partPowerFuelFlowFraction). */
  readonly partPowerFuelIntercept?: number;
  readonly grid: ParametricDeckGrid;
}

export const DEFAULT_PARAMETRIC_RATINGS: Readonly<Partial<Record<RatingName, number>>> = {
  takeoff: 1,
  maxContinuous: 0.95,
  maxClimb: 0.92,
  maxCruise: 0.88,
};

/**
 * Full-throttle thrust lapse alpha = F / F_SLS,max (-) from Mattingly, Aircraft
 * Engine Design, 2nd ed., §2.3.2, eqs. 2.54a-c ("mil" power for the dry
 * low-bypass turbofan and turbojet), with delta0 = delta (1 + 0.2 M0^2)^3.5 and
 * theta0 = theta (1 + 0.2 M0^2), TR the throttle ratio:
 *   high bypass:  delta0 (1 - 0.49 sqrt(M0))                                 theta0 <= TR
 *                 delta0 (1 - 0.49 sqrt(M0) - 3 (theta0 - TR) / (1.5 + M0))  theta0 >  TR
 *   low bypass:   0.6 delta0                                                  theta0 <= TR
 *                 0.6 delta0 (1 - 3.8 (theta0 - TR) / theta0)                 theta0 >  TR
 *   turbojet:     0.8 delta0 (1 - 0.16 sqrt(M0))                              theta0 <= TR
 *                 0.8 delta0 (1 - 0.16 sqrt(M0) - 24 (theta0 - TR) / ((9 + M0) theta0))
 * Valid for subsonic and moderate supersonic Mach (Mattingly plots to M 2).
 */
export function mattinglyThrustLapse(
  kind: ParametricEngineKind,
  delta0: number,
  theta0: number,
  mach: number,
  throttleRatio: number,
): number {
  const over = theta0 - throttleRatio;
  const hot = over > 0;
  switch (kind) {
    case 'highBypassTurbofan':
      return delta0 * (1 - 0.49 * Math.sqrt(mach) - (hot ? (3 * over) / (1.5 + mach) : 0));
    case 'lowBypassTurbofan':
      return 0.6 * delta0 * (1 - (hot ? (3.8 * over) / theta0 : 0));
    case 'turbojet':
      return 0.8 * delta0 * (1 - 0.16 * Math.sqrt(mach) - (hot ? (24 * over) / ((9 + mach) * theta0) : 0));
  }
}

/**
 * Mattingly's full-throttle TSFC model divided by its sea-level static value
 * (-), eqs. 2.55a-c, theta the static temperature ratio T / 288.15 K:
 *   high bypass: (0.45 + 0.54 M0) sqrt(theta) / 0.45;
 *   low bypass (mil): (0.9 + 0.30 M0) sqrt(theta) / 0.9;
 *   turbojet (mil): (1.1 + 0.30 M0) sqrt(theta) / 1.1.
 */
export function mattinglyTsfcRatio(kind: ParametricEngineKind, mach: number, theta: number): number {
  const [a, b] = kind === 'highBypassTurbofan' ? [0.45, 0.54] : kind === 'lowBypassTurbofan' ? [0.9, 0.3] : [1.1, 0.3];
  return ((a + b * mach) / a) * Math.sqrt(theta);
}

/** Mattingly's full-throttle thrust lapse at sea-level static for each kind (-): 1, 0.6, 0.8. */
function staticLapse(kind: ParametricEngineKind): number {
  return kind === 'highBypassTurbofan' ? 1 : kind === 'lowBypassTurbofan' ? 0.6 : 0.8;
}

/**
 * Part-power fuel flow as a fraction of full-throttle fuel flow at the same
 * condition (-): k0 + (1 - k0) * power, power = thrust fraction in (0, 1].
 * A straight fuel-flow-vs-thrust line with a positive intercept (the Willans
 * line; common practice), so TSFC rises as thrust falls: TSFC / TSFC_full =
 * k0 / power + 1 - k0.
 */
export function partPowerFuelFlowFraction(power: number, intercept: number): number {
  return intercept + (1 - intercept) * power;
}

/**
 * Airflow model (ours, documented): corrected airflow W sqrt(theta0)/delta0
 * equals the sea-level static value at full throttle and falls as power^0.3
 * at part power (common practice shape), so physical airflow =
 * W_SLS (delta0 / sqrt(theta0)) power^0.3.
 */
export function parametricAirflow_kg_s(seaLevelStaticAirflow_kg_s: number, delta0: number, theta0: number, power: number): number {
  return seaLevelStaticAirflow_kg_s * (delta0 / Math.sqrt(theta0)) * Math.pow(power, 0.3);
}

function check(ok: boolean, what: string): void {
  if (!ok) throw new RangeError(`buildParametricDeck: ${what}`);
}

function ascending(values: readonly number[]): boolean {
  return values.every((v, i) => Number.isFinite(v) && (i === 0 || v > values[i - 1]!));
}

/**
 * Builds a parametric, UNINSTALLED, per-engine deck (see the file comment):
 * thrust = power * F_SLS * alpha / alpha_SLS, fuel flow = thrust_full * TSFC *
 * partPowerFuelFlowFraction, airflow from parametricAirflow_kg_s, on the
 * given (optionally ragged) grid. An invalid spec is a caller bug and throws.
 */
export function buildParametricDeck(spec: ParametricDeckSpec): EngineDeck {
  const { grid } = spec;
  check(spec.seaLevelStaticThrust_N > 0 && Number.isFinite(spec.seaLevelStaticThrust_N), 'seaLevelStaticThrust_N must be > 0');
  check(spec.throttleRatio >= 0.9 && spec.throttleRatio <= 1.3, 'throttleRatio must be within 0.9..1.3');
  check(spec.tsfcSeaLevelStatic_kg_N_s > 0 && Number.isFinite(spec.tsfcSeaLevelStatic_kg_N_s), 'tsfcSeaLevelStatic_kg_N_s must be > 0');
  check(spec.seaLevelStaticAirflow_kg_s > 0 && Number.isFinite(spec.seaLevelStaticAirflow_kg_s), 'seaLevelStaticAirflow_kg_s must be > 0');
  const k0 = spec.partPowerFuelIntercept ?? 0.1;
  check(k0 >= 0 && k0 <= 0.5, 'partPowerFuelIntercept must be within 0..0.5');
  check(grid.altitudes_m.length >= 2 && ascending(grid.altitudes_m), 'at least two ascending altitudes are needed');
  check(grid.machs.length >= 2 && ascending(grid.machs) && grid.machs[0]! >= 0, 'at least two ascending Machs >= 0 are needed');
  check(grid.powers.length >= 2 && ascending(grid.powers) && grid.powers[0]! > 0 && grid.powers.at(-1)! <= 1, 'at least two ascending powers in (0, 1] are needed');
  check(grid.machRanges === undefined || grid.machRanges.length === grid.altitudes_m.length, 'machRanges needs one entry per altitude');
  const isaDevs = grid.isaDevs_K ?? [0];
  check(grid.isaDevs_K === undefined || (isaDevs.length >= 2 && ascending(isaDevs)), 'isaDevs_K needs at least two ascending values');

  const lapse0 = staticLapse(spec.kind);
  const points: DeckGridPoint[] = [];
  for (const isaDev_K of isaDevs) {
    grid.altitudes_m.forEach((altitude_m, j) => {
      const range = grid.machRanges?.[j] ?? [grid.machs[0]!, grid.machs.at(-1)!];
      const machs = grid.machs.filter((m) => m >= range[0] && m <= range[1]);
      check(machs.length >= 2, `altitude ${altitude_m} m keeps fewer than two Machs`);
      const delta = isaPressureRatio(altitude_m);
      const theta = (isaTemperature_K(altitude_m) + isaDev_K) / ISA_SEA_LEVEL_TEMPERATURE_K;
      for (const mach of machs) {
        const ram = 1 + 0.2 * mach * mach;
        const delta0 = delta * Math.pow(ram, 3.5);
        const theta0 = theta * ram;
        const alpha = mattinglyThrustLapse(spec.kind, delta0, theta0, mach, spec.throttleRatio) / lapse0;
        check(alpha > 0, `full-throttle thrust lapse is not positive at ${altitude_m} m, Mach ${mach}, ISA${isaDev_K >= 0 ? '+' : ''}${isaDev_K} K`);
        const fullThrust_N = spec.seaLevelStaticThrust_N * alpha;
        const fullFuel_kg_s = fullThrust_N * spec.tsfcSeaLevelStatic_kg_N_s * mattinglyTsfcRatio(spec.kind, mach, theta);
        for (const power of grid.powers) {
          points.push({
            isaDev_K,
            altitude_m,
            mach,
            power,
            thrust_N: power * fullThrust_N,
            fuelFlow_kg_s: fullFuel_kg_s * partPowerFuelFlowFraction(power, k0),
            airflow_kg_s: parametricAirflow_kg_s(spec.seaLevelStaticAirflow_kg_s, delta0, theta0, power),
          });
        }
      }
    });
  }
  const title = /parametric/i.test(spec.title) ? spec.title : `${spec.title} (parametric)`;
  const ratings: Partial<Record<RatingName, number>> = { ...DEFAULT_PARAMETRIC_RATINGS, flightIdle: grid.powers[0]!, ...spec.ratings };
  for (const [name, value] of Object.entries(ratings)) {
    check(value >= grid.powers[0]! && value <= grid.powers.at(-1)!, `rating ${name} = ${value} is outside the power grid`);
  }
  return engineDeckOf({
    title,
    parametric: true,
    referenceRecovery: { kind: 'milE5008b' },
    ratings,
    hasAirflow: true,
    hasIsaDev: grid.isaDevs_K !== undefined,
    hasSensitivities: false,
    notes: [
      `Parametric ${spec.kind} deck: thrust lapse and TSFC from Mattingly, Aircraft Engine Design, 2nd ed., section 2.3.2 (eqs. 2.54, 2.55), throttle ratio ${spec.throttleRatio}.`,
      'Invented engine; treated as UNINSTALLED at the MIL-E-5008B reference recovery with no bleed or power extraction; per engine.',
      `Power axis = fraction of full-throttle thrust at the condition; part-power fuel flow = full * (${k0} + ${1 - k0} * power) (Willans line, common practice).`,
      'Airflow: corrected airflow at sea-level static value times power^0.3 (our model).',
    ],
    policy: DEFAULT_DECK_POLICY,
    grid: buildDeckGrid(points),
    warnings: undefined,
    interpolation: undefined,
  });
}
