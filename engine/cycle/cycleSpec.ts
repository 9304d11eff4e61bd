/**
 * The cycle specification: a two-spool, separate-exhaust turbofan (a
 * two-spool turbojet when the bypass ratio is 0), in SI, as read from a
 * cycle file (cycleFile.ts). Station numbers follow the usual trade
 * numbering (SAE AS755): 0 free stream, 2 fan face, 13 fan exit (bypass),
 * 18/19 bypass nozzle throat/exit, 25 compressor inlet, 3 compressor exit,
 * 31 burner inlet (after bleed), 4 HP turbine inlet, 45 LP turbine inlet,
 * 5 LP turbine exit, 8/9 core nozzle throat/exit.
 */
import type { RatingName } from '../propulsion/propulsionModel';

/**
 * Gas properties of one section, constant through it (Mattingly's "real
 * cycle" treatment: one cp and gamma upstream of the burner, one from the
 * burner exit on). R follows as cp (gamma - 1) / gamma.
 */
export interface GasSection {
  readonly cp_J_kgK: number;
  readonly gamma: number;
}

export type NozzleType = 'convergent' | 'fullyExpanded';

export type CycleSize =
  | { readonly kind: 'airflow'; readonly airflow_kg_s: number }
  | { readonly kind: 'thrust'; readonly thrust_N: number };

export interface CycleDesignPoint {
  /** Pressure altitude (m). */
  readonly altitude_m: number;
  readonly mach: number;
  readonly isaDeviation_K: number;
  /** Bypass over core mass flow at the fan (0: turbojet). */
  readonly bypassRatio: number;
  /** Pt13/Pt2; on a turbojet the LP compressor's ratio. */
  readonly fanPressureRatio: number;
  /** Product of the compressor pressure ratios, fan included (Pt3/Pt2 without duct losses). */
  readonly overallPressureRatio: number;
  readonly turbineInletTemperature_K: number;
  /** Fan-face over free-stream total pressure at design (inlet recovery). */
  readonly inletRecovery: number;
  /** Customer bleed at design, off the compressor exit, as a fraction of the core flow. */
  readonly bleedFraction: number;
  /** Shaft power extraction from the HP spool at design (W). */
  readonly powerExtraction_W: number;
  /** Total engine airflow (core + bypass) or net thrust at the design point. */
  readonly size: CycleSize;
}

export interface CycleComponents {
  readonly fanPolytropicEfficiency: number;
  readonly compressorPolytropicEfficiency: number;
  readonly hpTurbinePolytropicEfficiency: number;
  readonly lpTurbinePolytropicEfficiency: number;
  /** Fraction of the fuel's heating value released. */
  readonly burnerEfficiency: number;
  /** Pt4/Pt31. */
  readonly burnerPressureRatio: number;
  /** Pt25/Pt13 (fan exit to compressor inlet). */
  readonly interCompressorDuctPressureRatio: number;
  /** Pt18/Pt13 (bypass duct). */
  readonly bypassDuctPressureRatio: number;
  /** Pt8/Pt5 (jet pipe). */
  readonly coreNozzlePressureRatio: number;
  /** Shaft power delivered over turbine power, HP spool. */
  readonly hpMechanicalEfficiency: number;
  /** Shaft power delivered over turbine power, LP spool. */
  readonly lpMechanicalEfficiency: number;
}

/** The quantities a limit schedule can hold. Speeds are fractions of their design values. */
export type LimitName =
  | 'turbineInletTemperature'
  | 'fanSpeed'
  | 'fanCorrectedSpeed'
  | 'coreSpeed'
  | 'compressorExitPressure'
  | 'compressorExitTemperature';

export const LIMIT_NAMES: readonly LimitName[] = [
  'turbineInletTemperature',
  'fanSpeed',
  'fanCorrectedSpeed',
  'coreSpeed',
  'compressorExitPressure',
  'compressorExitTemperature',
];

/**
 * A limit's maximum: a constant, or a schedule by ambient static
 * temperature (K), linear between the points and held at the end values
 * beyond them (how a flat rating is written: e.g. a corrected fan speed that
 * holds to the corner temperature and a turbine temperature above it).
 */
export type LimitValue = number | { readonly byAmbientTemperature: readonly (readonly [number, number])[] };

export type LimitSet = Readonly<Partial<Record<LimitName, LimitValue>>>;

/**
 * A rating: the highest throttle that respects a set of limits (with the
 * engine's hard limits), or a fixed fan speed (mechanical or corrected,
 * fraction of design), as an idle is usually set.
 */
export type CycleRating =
  | { readonly kind: 'limits'; readonly limits: LimitSet }
  | { readonly kind: 'fanSpeed'; readonly fraction: number }
  | { readonly kind: 'fanCorrectedSpeed'; readonly fraction: number };

export interface CycleSpec {
  readonly title: string;
  readonly design: CycleDesignPoint;
  readonly components: CycleComponents;
  readonly nozzles: { readonly core: NozzleType; readonly bypass: NozzleType };
  readonly gas: { readonly cold: GasSection; readonly hot: GasSection };
  readonly fuel: {
    readonly heatingValue_J_kg: number;
    /**
     * true: the fuel's mass is carried through the turbines and the core
     * nozzle (m4 = m31 + mf). false: neglected there, as the textbook ideal
     * forms do (m4 = m31; f from m31 cp (Tt4 - Tt3) = eta_b mf h).
     */
    readonly massInCore: boolean;
  };
  /** Hard limits, applied to every limits rating and reported when a fixed setting exceeds them. */
  readonly limits: LimitSet;
  readonly ratings: Readonly<Partial<Record<RatingName, CycleRating>>>;
}
