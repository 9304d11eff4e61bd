/**
 * The cautions the installed propulsion model raises at a query, one builder
 * and one text per id (throat_mach_high is checkThroatMach in checks.ts, the
 * same builder the mission uses). Table of ids: docs/installation.md,
 * "Cautions raised by every query".
 */
import type { Caution } from './caution';

/** Ids raised by the installed propulsion model itself (the deck's own cautions pass through unchanged). */
export type PropulsionCautionId =
  | 'deck_lookup_failed'
  | 'no_airflow_spillage_skipped'
  | 'inlet_recovery_table_range'
  | 'inlet_throat_choked'
  | 'fan_face_mach_range'
  | 'rating_not_in_deck'
  | 'lip_suction_table_range'
  | 'spillage_share_high';

export type PropulsionCaution = Caution & { readonly id: PropulsionCautionId };

function fixed(x: number, digits: number): string {
  return Number.isFinite(x) ? x.toFixed(digits) : String(x);
}

/** The deck refused a lookup (its code and message); the point carries zero thrust and fuel flow. */
export function deckLookupFailedCaution(code: string, message: string): PropulsionCaution {
  return { id: 'deck_lookup_failed', severity: 'warning', message: `Deck lookup failed (${code}): ${message}; thrust and fuel flow set to 0.` };
}

/** The deck has no airflow column, so spillage (and, for a geometry inlet, the diffuser loss) is not computed. */
export function noAirflowCaution(geometryInlet: boolean): PropulsionCaution {
  return {
    id: 'no_airflow_spillage_skipped',
    severity: 'info',
    message: geometryInlet
      ? 'The deck has no airflow column: spillage drag, mass-flow ratio, throat and fan-face Mach not computed; recovery excludes the diffuser loss.'
      : 'The deck has no airflow column: spillage drag and mass-flow ratio not computed.',
  };
}

/** Flight Mach left an inlet's recovery table on one side; the end recovery (-) is held. */
export function recoveryTableRangeCaution(side: 'below' | 'above', inletName: string, heldRecovery: number): PropulsionCaution {
  return {
    id: 'inlet_recovery_table_range',
    severity: 'caution',
    message: `Flight Mach is ${side} the inlet recovery table of "${inletName}"; its end recovery ${fixed(heldRecovery, 4)} is held.`,
    value: heldRecovery,
  };
}

/** The engine asks for more airflow than the inlet throat passes at Mach 1. */
export function throatChokedCaution(inletName: string): PropulsionCaution {
  return {
    id: 'inlet_throat_choked',
    severity: 'warning',
    message: `The inlet throat of "${inletName}" is choked: the engine asks for more airflow than the throat passes at Mach 1; figures assume throat Mach 1.`,
    value: 1,
  };
}

/** Fan-face Mach (-) outside [min, max] (-), or null when it is inside or not computed. A value on a bound passes. */
export function checkFanFaceMach(fanFaceMach: number | null, min: number, max: number, fanFaceChoked: boolean): PropulsionCaution | null {
  if (fanFaceMach === null || !(fanFaceMach < min || fanFaceMach > max)) return null;
  return {
    id: 'fan_face_mach_range',
    severity: 'caution',
    message: `Fan-face Mach ${fixed(fanFaceMach, 3)} is outside the band ${fixed(min, 3)} to ${fixed(max, 3)}${fanFaceChoked ? ' (fan face choked)' : ''}.`,
    value: fanFaceMach,
    threshold: fanFaceMach < min ? min : max,
  };
}

/** The lip-suction table was left (Mach or mass-flow ratio beyond its axes); its edge value (-) is held. */
export function lipSuctionTableRangeCaution(heldFactor: number, massFlowRatio: number): PropulsionCaution {
  return {
    id: 'lip_suction_table_range',
    severity: 'info',
    message: `Flight Mach or mass-flow ratio ${fixed(massFlowRatio, 3)} is outside the lip-suction table; its edge value ${fixed(heldFactor, 3)} is held.`,
    value: heldFactor,
  };
}

/**
 * Spillage drag above `maxShare` of the engine's corrected thrust (both N,
 * per engine), where the engine makes positive net thrust; null otherwise.
 */
export function checkSpillageShare(spillage_N: number, correctedThrust_N: number, maxShare: number): PropulsionCaution | null {
  if (!(correctedThrust_N > 0) || !(spillage_N > maxShare * correctedThrust_N) || !(correctedThrust_N - spillage_N > 0)) return null;
  const share = spillage_N / correctedThrust_N;
  return {
    id: 'spillage_share_high',
    severity: 'caution',
    message: `Inlet spillage drag is ${fixed(100 * share, 1)} % of the engine's thrust, above ${fixed(100 * maxShare, 1)} %: the inlet is oversized for this airflow, or the lip-suction assumption carries the answer.`,
    value: share,
    threshold: maxShare,
  };
}

/** The deck names no such rating; its lowest (flight idle) or highest power (-) is used instead. */
export function ratingNotInDeckCaution(rating: string, lowest: boolean, power: number): PropulsionCaution {
  return {
    id: 'rating_not_in_deck',
    severity: 'caution',
    message: `The deck names no "${rating}" rating; the deck's ${lowest ? 'lowest' : 'highest'} power ${fixed(power, 4)} is used.`,
    value: power,
  };
}
