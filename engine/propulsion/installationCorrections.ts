/**
 * Installation corrections applied to the uninstalled deck, per engine:
 * inlet recovery (ram-recovery correction), customer bleed, shaft power
 * extraction. The method and coefficients follow Raymer, Aircraft Design:
 * A Conceptual Approach, installed-thrust methodology in the propulsion
 * chapter (ch. 13 in the 4th-6th editions; coefficients from memory, see
 * docs/installation.md); the power-extraction coefficients are common
 * practice and inputs.
 */

/** Customer bleed: a fraction of the core flow, or a mass flow with the core's share of deck airflow. */
export type BleedSpec =
  | { readonly kind: 'coreFraction'; readonly fraction: number }
  | { readonly kind: 'massFlow'; readonly bleed_kg_s: number; readonly coreFlowFraction: number };

export interface InstallationSettings {
  readonly bleed: BleedSpec;
  /** Shaft power extracted per engine (W), >= 0. */
  readonly powerExtraction_W: number;
  /** Ram-recovery correction coefficient C_ram (-); 1.35 subsonic (Raymer). */
  readonly cRam?: number;
  /** Above Mach 1, C_ram falls as Raymer's supersonic form C_ram - 0.15 (M - 1) (default true); false holds C_ram. */
  readonly cRamSupersonicForm?: boolean;
  /**
   * Fuel flow under the ram-recovery correction: 'heldAtPower' (the deck's
   * fuel flow at the power setting, Raymer's bookkeeping; default) or
   * 'scaledWithRecovery' (x eta/eta_ref, as an engine holding corrected fuel
   * flow Wf/(delta2 sqrt(theta2)) at the setting would: delta2 scales with
   * recovery).
   */
  readonly ramFuelFlow?: RamFuelFlowConvention;
  /**
   * How recovery, bleed and extraction are applied (installationMethod.ts):
   * 'raymerCorrections' or 'deckSensitivities'; absent = the deck's
   * sensitivities when it has them, else Raymer's corrections.
   */
  readonly method?: 'raymerCorrections' | 'deckSensitivities';
  /** What the deck is interpolated in (deckCorrection.ts); absent = 'raw' here (a project's default is 'corrected'). */
  readonly deckInterpolation?: 'raw' | 'corrected';
  /** Bleed correction coefficient C_bleed (-); 2.0 (Raymer). */
  readonly cBleed?: number;
  /** Fuel-flow increase per unit bleed fraction (-); 0 = fuel flow held at the power setting. */
  readonly bleedFuelFlowFactor?: number;
  /** Thrust lost per watt extracted (N/W); 0 by default (extraction costs fuel, not thrust). */
  readonly powerExtractionThrust_N_W?: number;
  /** Fuel flow added per watt extracted (kg/s/W); default 1/(0.35 x 43 MJ/kg). */
  readonly powerExtractionFuel_kg_s_W?: number;
}

export type RamFuelFlowConvention = 'heldAtPower' | 'scaledWithRecovery';

/** C_ram default (-): Raymer's subsonic value (from memory). */
export const DEFAULT_C_RAM = 1.35;
/** C_bleed default (-): Raymer's value (from memory). */
export const DEFAULT_C_BLEED = 2.0;
/**
 * Fuel flow per watt of shaft power (kg/s/W), common practice: the extra
 * fuel burnt at a core thermal efficiency of 0.35 with a fuel lower heating
 * value of 43 MJ/kg.
 */
export const DEFAULT_POWER_EXTRACTION_FUEL_kg_s_W = 1 / (0.35 * 43e6);

/**
 * Fractional thrust loss from inlet recovery below the deck's reference
 * (-): C_ram (eta_ref - eta); negative (a gain) above the reference.
 * Raymer, Aircraft Design: A Conceptual Approach, installed thrust:
 * "% thrust loss = C_ram (eta_ref - eta_actual) x 100". Recoveries in (0, 1].
 */
export function ramRecoveryThrustLoss(referenceRecovery: number, recovery: number, cRam: number = DEFAULT_C_RAM): number {
  return cRam * (referenceRecovery - recovery);
}

/**
 * C_ram (-) at flight Mach `mach`: the subsonic value `cRam` up to Mach 1,
 * and above it Raymer's supersonic form cRam - 0.15 (M - 1) (Raymer,
 * Aircraft Design: A Conceptual Approach, installed thrust; from memory),
 * not below 0; `supersonicForm` false holds cRam at every Mach.
 */
export function ramRecoveryCoefficient(cRam: number, mach: number, supersonicForm = true): number {
  if (!supersonicForm || !(mach > 1)) return cRam;
  return Math.max(0, cRam - 0.15 * (mach - 1));
}

/**
 * Fractional thrust loss from customer bleed (-): C_bleed x bleed mass
 * ratio (bleed flow over core flow, 0..1). Raymer, installed thrust:
 * "% thrust loss = C_bleed x (bleed mass flow / engine mass flow) x 100".
 */
export function bleedThrustLoss(bleedFraction: number, cBleed: number = DEFAULT_C_BLEED): number {
  return cBleed * bleedFraction;
}

/** Bleed as a fraction of core flow (-), given the engine's physical airflow (kg/s) when the spec is a mass flow. */
export function bleedFraction(bleed: BleedSpec, airflow_kg_s: number | null): number {
  if (bleed.kind === 'coreFraction') return bleed.fraction;
  if (airflow_kg_s === null || !(airflow_kg_s > 0)) return 0;
  return bleed.bleed_kg_s / (bleed.coreFlowFraction * airflow_kg_s);
}

export interface CorrectedEngine {
  /** Thrust after the ram, bleed and extraction corrections (N). */
  readonly thrust_N: number;
  readonly fuelFlow_kg_s: number;
  /** Fractional thrust losses (-) and the extraction thrust loss (N). */
  readonly ramLoss: number;
  readonly bleedLoss: number;
  readonly extractionThrust_N: number;
  readonly extractionFuel_kg_s: number;
}

/**
 * Applies the corrections to one engine's deck point: thrust
 * T = T_deck (1 - ramLoss - bleedLoss) - k_T P, fuel flow
 * W_f = W_f,deck (1 + k_b f_bleed) [x eta/eta_ref] + k_f P (losses added as
 * Raymer adds the percentages; at a fixed power setting the deck fuel flow is
 * kept, so TSFC rises by the thrust loss; with ramFuelFlow
 * 'scaledWithRecovery' it scales with recovery). C_ram at flight Mach `mach`
 * (ramRecoveryCoefficient). Inputs in N, kg/s, W; recoveries (-).
 */
export function applyInstallationCorrections(
  deckThrust_N: number,
  deckFuelFlow_kg_s: number,
  referenceRecovery: number,
  recovery: number,
  bleedFractionOfCore: number,
  settings: InstallationSettings,
  mach = 0,
): CorrectedEngine {
  const cRam = ramRecoveryCoefficient(settings.cRam ?? DEFAULT_C_RAM, mach, settings.cRamSupersonicForm ?? true);
  const ramLoss = ramRecoveryThrustLoss(referenceRecovery, recovery, cRam);
  const bleedLoss = bleedThrustLoss(bleedFractionOfCore, settings.cBleed ?? DEFAULT_C_BLEED);
  const power = settings.powerExtraction_W;
  const extractionThrust_N = power * (settings.powerExtractionThrust_N_W ?? 0);
  const extractionFuel_kg_s = power * (settings.powerExtractionFuel_kg_s_W ?? DEFAULT_POWER_EXTRACTION_FUEL_kg_s_W);
  return {
    thrust_N: deckThrust_N * (1 - ramLoss - bleedLoss) - extractionThrust_N,
    fuelFlow_kg_s:
      deckFuelFlow_kg_s * (1 + (settings.bleedFuelFlowFactor ?? 0) * bleedFractionOfCore) * (settings.ramFuelFlow === 'scaledWithRecovery' ? recovery / referenceRecovery : 1) +
      extractionFuel_kg_s,
    ramLoss,
    bleedLoss,
    extractionThrust_N,
    extractionFuel_kg_s,
  };
}

export interface InstallationIssue {
  readonly path: string;
  readonly message: string;
}

/** Checks installation settings; `deckHasAirflow` is needed for a mass-flow bleed. Issues carry field paths. */
export function validateInstallation(settings: InstallationSettings, deckHasAirflow: boolean): readonly InstallationIssue[] {
  const issues: InstallationIssue[] = [];
  const check = (path: string, v: number | undefined, lo: number, hi: number, what: string): void => {
    if (v === undefined) return;
    if (typeof v !== 'number' || !Number.isFinite(v) || v < lo || v > hi) {
      issues.push({ path, message: `${path} is ${String(v)}, expected ${what}` });
    }
  };
  const b = settings.bleed;
  if (b.kind === 'coreFraction') {
    check('bleed.fraction', b.fraction, 0, 0.5, 'a fraction of core flow 0..0.5');
  } else if (b.kind === 'massFlow') {
    check('bleed.bleed_kg_s', b.bleed_kg_s, 0, Infinity, 'a bleed flow >= 0 kg/s');
    check('bleed.coreFlowFraction', b.coreFlowFraction, 1e-3, 1, 'the core share of engine airflow, 0..1');
    if (!deckHasAirflow && b.bleed_kg_s > 0) {
      issues.push({ path: 'bleed', message: 'bleed is given as a mass flow but the deck has no airflow column; give it as a fraction of core flow' });
    }
  } else {
    issues.push({ path: 'bleed.kind', message: `bleed.kind is ${String((b as { kind: unknown }).kind)}, expected 'coreFraction' or 'massFlow'` });
  }
  check('powerExtraction_W', settings.powerExtraction_W, 0, Infinity, 'a shaft power >= 0 W');
  check('cRam', settings.cRam, 0, 5, 'a coefficient 0..5');
  check('cBleed', settings.cBleed, 0, 10, 'a coefficient 0..10');
  check('bleedFuelFlowFactor', settings.bleedFuelFlowFactor, 0, 10, 'a factor 0..10');
  check('powerExtractionThrust_N_W', settings.powerExtractionThrust_N_W, 0, 1, 'N per W >= 0');
  check('powerExtractionFuel_kg_s_W', settings.powerExtractionFuel_kg_s_W, 0, 1e-5, 'kg/s per W >= 0');
  return issues;
}
