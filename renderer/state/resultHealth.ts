/**
 * How far the figures on screen can be trusted, from the live study: none
 * yet, good, flown but a hard limit broken, or not a valid flight; and
 * whether they are out of date (an edit is pending or the newest inputs
 * could not be flown). One selector, read by the headline, the summary
 * strip, the result views and the export and print commands.
 */
import { type MissionResult, missionStatusClass } from '../../engine/mission';
import type { UnitSystem } from '../../engine/units';
import { missionStatusText, statusLabel } from './displayText';

export type MissionHealth = 'good' | 'limit' | 'failed';

export interface ResultHealth {
  readonly mission: MissionHealth | null;
  readonly stale: boolean;
}

/** The health of a mission result: flown within the hard limits, flown with one broken, or not a valid flight. */
export function missionHealth(mission: MissionResult): MissionHealth {
  const c = missionStatusClass(mission.status);
  return c === 'solved' ? 'good' : c === 'hard_limit' ? 'limit' : 'failed';
}

export function resultHealth(live: { readonly snapshot: { readonly mission: MissionResult } | null; readonly stale: boolean }): ResultHealth {
  return { mission: live.snapshot === null ? null : missionHealth(live.snapshot.mission), stale: live.stale };
}

/** CSS classes for a block of figures: `figures-stale`, `figures-failed`, `figures-limit`. */
export function healthClass(h: ResultHealth): string {
  return [h.stale ? 'figures-stale' : '', h.mission === 'failed' ? 'figures-failed' : h.mission === 'limit' ? 'figures-limit' : ''].filter(Boolean).join(' ');
}

/** The question to ask before exporting or printing figures that are not good and current; null when there is nothing to ask. */
export function exportQuestion(h: ResultHealth, mission: MissionResult | null, units: UnitSystem): string | null {
  const reasons: string[] = [];
  if (h.stale) reasons.push('they are out of date: they belong to the project as it was before the latest edit');
  if (h.mission === 'failed' && mission) reasons.push(`the mission was not flown to its destination (${statusLabel(mission.status)}: ${missionStatusText(mission, units)})`);
  if (h.mission === 'limit' && mission) reasons.push(`the mission breaks a hard limit (${statusLabel(mission.status)}: ${missionStatusText(mission, units)})`);
  return reasons.length === 0 ? null : `These figures are not a valid current result: ${reasons.join('; and ')}. Export them anyway?`;
}
