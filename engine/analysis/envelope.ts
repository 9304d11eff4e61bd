/**
 * Level-flight envelope at one mass and rating: over pressure altitude, the
 * thrust-drag crossover Machs, the CLmax (stall) and buffet-onset low and
 * high Machs at 1 g and at the buffet-margin load factor, the VMO/MMO line,
 * and the ceilings: absolute (greatest Ps = 0) and at the residual climb
 * rates the user sets (default 100 ft/min service, 300 ft/min cruise, common
 * practice).
 */
import { machFromCas } from '../aero/airspeeds';
import { brent } from '../core/rootFind';
import { err, ok, type Result } from '../core/result';
import type { RatingName } from '../propulsion/propulsionModel';
import type { AnalysisError, PerformanceModels } from './analysisTypes';
import { climbPeak, thrustDragCrossover, type ClimbPeak, type CrossoverQuery, type CrossoverResult } from './crossover';
import { liftLimitMachs } from './liftLimitMach';
import { airAt } from './pointState';
import { msg, q, withParts, type MessageParts } from '../units/messageParts';
import { FOOT_M } from '../units/unitTable';

export interface ResidualClimbRate {
  /** Name shown beside the ceiling, e.g. "service". */
  readonly name: string;
  readonly climbRate_m_s: number;
}

const FT_PER_MIN = FOOT_M / 60;

/** 100 ft/min service and 300 ft/min cruise ceilings (common practice). */
export const DEFAULT_RESIDUAL_CLIMB_RATES: readonly ResidualClimbRate[] = [
  { name: 'service', climbRate_m_s: 100 * FT_PER_MIN },
  { name: 'cruise', climbRate_m_s: 300 * FT_PER_MIN },
];

export interface EnvelopeQuery {
  readonly mass_kg: number;
  readonly rating: RatingName;
  readonly isaDev_K: number;
  /** Altitude rows (m); default [0, 15000] in steps of altitudeStep_m. */
  readonly altitudeRange?: readonly [number, number];
  /** Default 500 m. */
  readonly altitudeStep_m?: number;
  /** Mach scan of each row; default [0.1, 0.95]. */
  readonly machRange?: readonly [number, number];
  /** Load factor for the buffet-margin boundary (-); default 1.3 (common practice). */
  readonly buffetLoadFactor?: number;
  readonly residualClimbRates?: readonly ResidualClimbRate[];
  /** VMO (CAS, m/s) and MMO (-) for the speed-limit line; omitted = no line. */
  readonly speedLimits?: { readonly vmo_m_s: number; readonly mmo: number };
}

export interface EnvelopeRow {
  readonly altitude_m: number;
  readonly status: CrossoverResult['status'];
  readonly lowMach: number | null;
  readonly highMach: number | null;
  readonly stallMach: number | null;
  /** Buffet onset at 1 g: low-speed and high-speed Machs (null where none in range). */
  readonly buffetLowMach: number | null;
  readonly buffetHighMach: number | null;
  /** Buffet onset at the margin load factor (-). */
  readonly buffetMarginLowMach: number | null;
  readonly buffetMarginHighMach: number | null;
  /** min(Mach at VMO, MMO); null without speed limits. */
  readonly speedLimitMach: number | null;
  /** The band inside every limit, as the crossover defines it (low: max of stall, buffet onset, low crossover; high: min of high crossover, MMO/VMO), with the binding limit; null where there is none. */
  readonly lowSpeedLimit: CrossoverResult['lowSpeedLimit'];
  readonly highSpeedLimit: CrossoverResult['highSpeedLimit'];
  readonly bestClimbMach: number | null;
  /** Greatest steady climb rate Ps over Mach (m/s); null where the wing cannot lift the mass. */
  readonly maxClimbRate_m_s: number | null;
}

export interface Ceiling {
  readonly name: string;
  /** Residual climb rate that defines it (m/s); 0 for the absolute ceiling. */
  readonly climbRate_m_s: number;
  /** Pressure altitude (m); null when outside the altitude range (see message). */
  readonly altitude_m: number | null;
  /** Best-climb Mach at the ceiling and the climb rate computed there (m/s). */
  readonly bestClimbMach: number | null;
  readonly climbRateAtCeiling_m_s: number | null;
  readonly message: string;
  /** The message with its numbers as quantities. */
  readonly parts?: MessageParts;
}

export interface EnvelopeResult {
  readonly mass_kg: number;
  readonly rating: RatingName;
  readonly isaDev_K: number;
  readonly buffetLoadFactor: number;
  readonly rows: readonly EnvelopeRow[];
  readonly ceilings: readonly Ceiling[];
  /** Climb-rate definition used for the ceilings (plain words). */
  readonly climbRateDefinition: string;
  /** Altitude tolerance of the ceilings (m). */
  readonly altitudeTolerance_m: number;
}

/** Altitude tolerance of the ceilings (m). */
export const CEILING_ALTITUDE_TOL_M = 0.01;

export const CLIMB_RATE_DEFINITION =
  'Steady climb rate = Ps = (T - D) V / W at the best-climb Mach (greatest Ps over Mach), at constant TAS: no acceleration factor, load factor 1.';

/** The checked altitude rows, Mach range and residual rates of a query, or what is wrong with it. */
function envelopeSetup(query: EnvelopeQuery): Result<{ readonly altitudes: number[]; readonly machRange: readonly [number, number]; readonly rates: readonly ResidualClimbRate[] }, AnalysisError> {
  const [hLo, hHi] = query.altitudeRange ?? [0, 15000];
  const step = query.altitudeStep_m ?? 500;
  const nBuffet = query.buffetLoadFactor ?? 1.3;
  const machRange = query.machRange ?? ([0.1, 0.95] as const);
  if (!(hHi > hLo) || !Number.isFinite(hLo) || !Number.isFinite(hHi)) {
    return err({ code: 'invalid_input', message: `envelope: altitude range [${hLo}, ${hHi}] m must be finite and ascending` });
  }
  if (!(step > 0) || (hHi - hLo) / step > 2000) {
    return err({ code: 'invalid_input', message: `envelope: altitude step ${step} m must be positive and give at most 2000 rows` });
  }
  if (!(nBuffet >= 1) || !Number.isFinite(nBuffet)) {
    return err({ code: 'invalid_input', message: `envelope: buffet load factor ${nBuffet} must be at least 1` });
  }
  const rates = query.residualClimbRates ?? DEFAULT_RESIDUAL_CLIMB_RATES;
  for (const r of rates) {
    if (!(r.climbRate_m_s > 0) || !Number.isFinite(r.climbRate_m_s)) {
      return err({ code: 'invalid_input', message: `envelope: residual climb rate "${r.name}" ${r.climbRate_m_s} m/s must be positive` });
    }
  }
  const altitudes: number[] = [];
  for (let h = hLo; h < hHi - 1e-9; h += step) altitudes.push(h);
  altitudes.push(hHi);
  return ok({ altitudes, machRange, rates });
}

/** The climb-peak query of the envelope at altitude h (m). */
function peakQuery(query: EnvelopeQuery, machRange: readonly [number, number], h: number): CrossoverQuery {
  return {
    altitude_m: h,
    mass_kg: query.mass_kg,
    rating: query.rating,
    isaDev_K: query.isaDev_K,
    machRange,
    ...(query.speedLimits ? { speedLimits: query.speedLimits } : {}),
  };
}

/** An envelope row's altitude (m) and climb peak, all the ceilings need of it. */
interface PeakRow {
  readonly altitude_m: number;
  readonly bestClimbMach: number | null;
  readonly maxClimbRate_m_s: number | null;
  /** True when maxClimbRate_m_s is only a lower bound, at least every residual rate (climbPeak's lowerBound), and bestClimbMach a sample near the peak. */
  readonly lowerBound?: boolean;
}

/**
 * The absolute ceiling and one per residual rate from rows of (altitude,
 * greatest Ps or null): each bracketed between the first row where the
 * greatest Ps falls below the rate and the row before, then refined by
 * Brent's method on the climb peak to CEILING_ALTITUDE_TOL_M.
 */
function ceilingsOf(
  models: PerformanceModels,
  query: EnvelopeQuery,
  machRange: readonly [number, number],
  rows: readonly PeakRow[],
  rates: readonly ResidualClimbRate[],
  hLo: number,
  hHi: number,
): Ceiling[] {
  // Peaks by altitude, the rows' first: Brent starts at two rows and ends where it last looked.
  const peaks = new Map<number, Result<ClimbPeak, AnalysisError>>();
  // A row known by a lower bound only is searched when a bracket needs its value (its margin is positive for every rate).
  for (const r of rows) if (r.lowerBound !== true) peaks.set(r.altitude_m, ok({ bestClimbMach: r.bestClimbMach, maxSpecificExcessPower_m_s: r.maxClimbRate_m_s }));
  // Between two rows the peak is searched near their best-climb Machs (climbPeak's local search).
  let near: readonly [number, number] | undefined;
  const peakAt = (h: number) => {
    let p = peaks.get(h);
    if (p === undefined) {
      p = climbPeak(models, peakQuery(query, machRange, h), near);
      peaks.set(h, p);
    }
    return p;
  };
  const maxPsAt = (h: number): number => {
    const c = peakAt(h);
    return c.ok && c.value.maxSpecificExcessPower_m_s !== null ? c.value.maxSpecificExcessPower_m_s : Number.NaN;
  };
  const ceilingFor = (name: string, rate: number): Ceiling => {
    const margin = (i: number) => (rows[i]!.maxClimbRate_m_s ?? -Infinity) - rate;
    if (margin(0) < 0) {
      return { name, climbRate_m_s: rate, altitude_m: null, bestClimbMach: null, climbRateAtCeiling_m_s: null, ...withParts(msg`The ${name} ceiling lies below ${q(hLo, 'altitude')}: the climb rate there is under ${q(rate, 'climbRate')}.`) };
    }
    const i = rows.findIndex((_, k) => margin(k) < 0);
    if (i < 0) {
      return { name, climbRate_m_s: rate, altitude_m: null, bestClimbMach: null, climbRateAtCeiling_m_s: null, ...withParts(msg`The ${name} ceiling lies above ${q(hHi, 'altitude')}, the top of the altitude range.`) };
    }
    const [m1, m2] = [rows[i - 1]!.bestClimbMach, rows[i]!.bestClimbMach];
    near = m1 !== null && m2 !== null ? [m1, m2] : undefined;
    const root = brent((h) => maxPsAt(h) - rate, rows[i - 1]!.altitude_m, rows[i]!.altitude_m, { xTol: CEILING_ALTITUDE_TOL_M });
    if (!root.ok) {
      return { name, climbRate_m_s: rate, altitude_m: null, bestClimbMach: null, climbRateAtCeiling_m_s: null, ...withParts(msg`The ${name} ceiling could not be refined between ${q(rows[i - 1]!.altitude_m, 'altitude')} and ${q(rows[i]!.altitude_m, 'altitude')}: ${root.error.message}`) };
    }
    const c = peakAt(root.value.x);
    const at = c.ok ? c.value : null;
    return {
      name,
      climbRate_m_s: rate,
      altitude_m: root.value.x,
      bestClimbMach: at?.bestClimbMach ?? null,
      climbRateAtCeiling_m_s: at?.maxSpecificExcessPower_m_s ?? null,
      ...withParts(msg`${name} ceiling ${q(root.value.x, 'altitude')} (greatest steady climb rate ${q(rate, 'climbRate')} at M ${at?.bestClimbMach == null ? '?' : q(at.bestClimbMach, 'mach')}).`),
    };
  };
  return [ceilingFor('absolute', 0), ...rates.map((r) => ceilingFor(r.name, r.climbRate_m_s))];
}

/**
 * Level-flight envelope and ceilings for a mass (kg), rating and ISA
 * deviation (K). Each ceiling is bracketed between envelope rows where the
 * greatest Ps crosses the residual rate and refined by Brent's method to
 * CEILING_ALTITUDE_TOL_M. Ps = (T - D) V / W (energy method, Anderson,
 * Aircraft Performance and Design, ch. 5 and 6); see CLIMB_RATE_DEFINITION.
 */
export function flightEnvelope(
  models: PerformanceModels,
  query: EnvelopeQuery,
): Result<EnvelopeResult, AnalysisError> {
  const setup = envelopeSetup(query);
  if (!setup.ok) return setup;
  const { altitudes, machRange, rates } = setup.value;
  const nBuffet = query.buffetLoadFactor ?? 1.3;
  const rows: EnvelopeRow[] = [];
  for (const h of altitudes) {
    const c = thrustDragCrossover(models, peakQuery(query, machRange, h));
    if (!c.ok) return err({ ...c.error, message: `envelope at ${h} m: ${c.error.message}` });
    const lift = { altitude_m: h, mass_kg: query.mass_kg };
    const b1 = liftLimitMachs(models.aero, { ...lift, loadFactor: 1 }, 'buffetCl', machRange[0], machRange[1]);
    const bn = liftLimitMachs(models.aero, { ...lift, loadFactor: nBuffet }, 'buffetCl', machRange[0], machRange[1]);
    let speedLimitMach: number | null = null;
    if (query.speedLimits) {
      const air = airAt(h, query.isaDev_K);
      if (!air.ok) return air;
      speedLimitMach = Math.min(machFromCas(query.speedLimits.vmo_m_s, air.value.pressure_Pa), query.speedLimits.mmo);
    }
    const v = c.value;
    rows.push({
      altitude_m: h,
      status: v.status,
      lowMach: v.lowMach,
      highMach: v.highMach,
      stallMach: v.stallMach,
      buffetLowMach: b1.exceededEverywhere ? null : b1.lowMach,
      buffetHighMach: b1.highMach,
      buffetMarginLowMach: bn.exceededEverywhere ? null : bn.lowMach,
      buffetMarginHighMach: bn.highMach,
      speedLimitMach,
      lowSpeedLimit: v.lowSpeedLimit,
      highSpeedLimit: v.highSpeedLimit,
      bestClimbMach: v.bestClimbMach,
      maxClimbRate_m_s: v.maxSpecificExcessPower_m_s,
    });
  }
  return ok({
    mass_kg: query.mass_kg,
    rating: query.rating,
    isaDev_K: query.isaDev_K,
    buffetLoadFactor: nBuffet,
    rows,
    ceilings: ceilingsOf(models, query, machRange, rows, rates, altitudes[0]!, altitudes[altitudes.length - 1]!),
    climbRateDefinition: CLIMB_RATE_DEFINITION,
    altitudeTolerance_m: CEILING_ALTITUDE_TOL_M,
  });
}

/**
 * The ceilings of flightEnvelope alone (the same rows, brackets and Brent
 * refinement, so the same altitudes), with only the climb peak computed at
 * each altitude: no crossings, buffet or speed-limit lines. For analyses
 * that report ceilings only (the inlet comparison).
 */
export function flightCeilings(models: PerformanceModels, query: EnvelopeQuery): Result<readonly Ceiling[], AnalysisError> {
  const setup = envelopeSetup(query);
  if (!setup.ok) return setup;
  const { altitudes, machRange, rates } = setup.value;
  const rows: PeakRow[] = [];
  // A row where a sample near the peak already climbs at every residual rate brackets no ceiling: it needs no peak.
  const clearAbove = Math.max(0, ...rates.map((r) => r.climbRate_m_s));
  for (const h of altitudes) {
    // Each row after the first searches near the row below's best-climb Mach (climbPeak's local search).
    const below = rows.length > 0 ? rows[rows.length - 1]!.bestClimbMach : null;
    const c = climbPeak(models, peakQuery(query, machRange, h), below === null ? undefined : [below, below], clearAbove);
    if (!c.ok) return err({ ...c.error, message: `envelope at ${h} m: ${c.error.message}` });
    rows.push({ altitude_m: h, bestClimbMach: c.value.bestClimbMach, maxClimbRate_m_s: c.value.maxSpecificExcessPower_m_s, ...(c.value.lowerBound ? { lowerBound: true } : {}) });
    // Every ceiling is bracketed at or below the first row without a positive climb rate (the rates are >= 0): the rows above are not needed.
    if (!((c.value.maxSpecificExcessPower_m_s ?? -Infinity) >= 0)) break;
  }
  return ok(ceilingsOf(models, query, machRange, rows, rates, altitudes[0]!, altitudes[altitudes.length - 1]!));
}
