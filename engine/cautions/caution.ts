/**
 * Cautions are data (DESIGN.md §2.6, §7): each has an id, a severity, a
 * message, and where and when it fired. Thresholds live in CautionSettings
 * (engine/cautions/cautionSettings.ts) and are edited by the user.
 */
import type { MessageParts } from '../units/messageParts';

export type CautionSeverity = 'info' | 'caution' | 'warning';

export interface Caution {
  /** Stable identifier, e.g. `deck_extrapolation`, `mmo_exceeded`. */
  readonly id: string;
  readonly severity: CautionSeverity;
  /** One readable sentence that says what happened, where and by how much. */
  readonly message: string;
  /** The message with its numbers as quantities, for display in the reader's units (messageIn). */
  readonly parts?: MessageParts;
  /** Leg index in the mission, when raised during a mission. */
  readonly legIndex?: number;
  /** Leg name, when raised during a mission. */
  readonly legName?: string;
  /** Mission time since brake release or block-out (s). */
  readonly time_s?: number;
  /** The value that crossed the threshold, in SI. */
  readonly value?: number;
  /** The threshold it crossed, in SI. */
  readonly threshold?: number;
}
