/**
 * An engine maker's uninstalled performance deck, parsed and gridded. ALL
 * values are PER ENGINE and UNINSTALLED, i.e. at the deck's reference inlet
 * recovery (`referenceRecovery`). SI inside.
 */
import type { DeckWarning } from './deckPlausibility';
import type { DeckAxis, RatingName } from './propulsionModel';
import type { DeckGrid } from './deckGrid';
import { milE5008bRecovery } from './milE5008b';

/** What a lookup does when it leaves the table on one axis. */
export type OutOfTablePolicy = 'refuse' | 'clamp' | 'extrapolate';

export type DeckPolicy = Readonly<Record<DeckAxis, OutOfTablePolicy>>;

/**
 * Default out-of-table policy: altitude and Mach extrapolate linearly from the
 * last two grid values (with a `deck_extrapolation` caution); power and ISA
 * deviation clamp to the nearest grid value (with a `deck_clamped` caution).
 */
export const DEFAULT_DECK_POLICY: DeckPolicy = {
  altitude: 'extrapolate',
  mach: 'extrapolate',
  power: 'clamp',
  isaDev: 'clamp',
};

/** The inlet recovery the deck's numbers assume. */
export type ReferenceRecovery =
  | { readonly kind: 'constant'; readonly value: number }
  | { readonly kind: 'milE5008b' };

export interface EngineDeck {
  readonly title: string;
  /** True when generated from a parametric model rather than tabulated by a maker. */
  readonly parametric: boolean;
  readonly referenceRecovery: ReferenceRecovery;
  /** Named ratings as values on the power axis (-). */
  readonly ratings: Readonly<Partial<Record<RatingName, number>>>;
  readonly hasAirflow: boolean;
  readonly hasIsaDev: boolean;
  /**
   * The deck carries per-point installation sensitivities
   * (installationSensitivities.ts); the installation then uses them instead
   * of Raymer's rule.
   */
  readonly hasSensitivities: boolean;
  readonly notes: readonly string[];
  readonly policy: DeckPolicy;
  /** The tabulated points, ragged, in flat arrays (SI); corrected parameters when `interpolation` is 'corrected' (deckCorrection.ts). */
  readonly grid: DeckGrid;
  /** Implausible values found when the deck was read (deckPlausibility.ts): warnings with the line; the deck still loads. */
  readonly warnings?: readonly DeckWarning[];
  /** What `grid` holds and is interpolated in; absent = 'raw' (the file's values). */
  readonly interpolation?: 'raw' | 'corrected';
}

/** Every EngineDeck field, the optional ones present (undefined when absent): engineDeckOf's argument. */
export type EngineDeckParts = { readonly [K in keyof Required<EngineDeck>]: EngineDeck[K] | (undefined extends EngineDeck[K] ? undefined : never) };

/**
 * An EngineDeck of `parts` in the one key order of EngineDeck, `warnings` and `interpolation` always present
 * (undefined when the deck has none), the policy in DEFAULT_DECK_POLICY's key order. Every deck the engine builds (file, parametric, cycle, corrected copy) comes
 * from here, so the deck lookups of a mission meet one object shape whatever decks ran before in the process.
 */
export function engineDeckOf(parts: EngineDeckParts): EngineDeck {
  return {
    title: parts.title,
    parametric: parts.parametric,
    referenceRecovery: parts.referenceRecovery,
    ratings: parts.ratings,
    hasAirflow: parts.hasAirflow,
    hasIsaDev: parts.hasIsaDev,
    hasSensitivities: parts.hasSensitivities,
    notes: parts.notes,
    // A fresh record in DEFAULT_DECK_POLICY's key order: the file readers' spread copies had a shape of their own.
    policy: { altitude: parts.policy.altitude, mach: parts.policy.mach, power: parts.policy.power, isaDev: parts.policy.isaDev },
    grid: parts.grid,
    warnings: parts.warnings,
    interpolation: parts.interpolation,
  };
}

/**
 * The deck's reference inlet total-pressure recovery pt2/pt0 (-) at flight
 * Mach `mach` (>= 0): the stated constant, or the MIL-E-5008B standard curve.
 */
export function referenceRecoveryAt(reference: ReferenceRecovery, mach: number): number {
  return reference.kind === 'constant' ? reference.value : milE5008bRecovery(mach);
}

/** Human-readable form of a reference recovery, e.g. "MIL-E-5008B" or "constant 0.98". */
export function describeReferenceRecovery(reference: ReferenceRecovery): string {
  return reference.kind === 'constant' ? `constant ${reference.value}` : 'MIL-E-5008B';
}
