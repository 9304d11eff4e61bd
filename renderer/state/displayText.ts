/**
 * The words and numbers the screens show for engine data: every message in
 * the chosen units (from its quantity parts), human labels for statuses,
 * ratings, solve modes and severities, and project paths as a reader names
 * them (legs numbered from 1 as the list shows them). Pure; one place.
 */
import type { Caution } from '../../engine/cautions';
import { MISSION_STATUSES, type MissionResult, type MissionStatus, missionStatusTitle } from '../../engine/mission';
import type { ProjectIssue } from '../../engine/project';
import { RATING_LABEL, type RatingName } from '../../engine/propulsion';
import { groupDigits, messageIn, messageText, type UnitSystem } from '../../engine/units';

/** Statuses of analyses (the mission's come from engine/mission/missionStatus.ts). */
const OTHER_STATUS_LABEL: Readonly<Record<string, string>> = {
  above_ceiling: 'above the ceiling',
};

/** A literal code (`climb_not_reached`, `maxClimb`) as words. */
export function codeWords(code: string): string {
  return code
    .replace(/_/g, ' ')
    .replace(/([a-z])([A-Z])/g, '$1 $2')
    .toLowerCase();
}

/** A mission or analysis status in words ("fuel exhausted"); an unknown code spelled out. */
export function statusLabel(status: string): string {
  if ((MISSION_STATUSES as readonly string[]).includes(status)) return missionStatusTitle(status as MissionStatus);
  return OTHER_STATUS_LABEL[status] ?? codeWords(status);
}

export function ratingLabel(rating: RatingName | string): string {
  return (RATING_LABEL as Readonly<Record<string, string>>)[rating] ?? codeWords(rating);
}

const SOLVE_MODE_LABEL: Readonly<Record<string, string>> = {
  payloadRange: 'payload and range (fuel found)',
  takeoffWeight: 'payload and take-off mass',
  maxRange: 'payload (longest range)',
};

export function solveModeLabel(mode: string): string {
  return SOLVE_MODE_LABEL[mode] ?? codeWords(mode);
}

const SEVERITY_LABEL: Readonly<Record<string, string>> = { info: 'note', caution: 'caution', warning: 'warning' };

export function severityLabel(severity: string): string {
  return SEVERITY_LABEL[severity] ?? codeWords(severity);
}

/** A caution's sentence in the chosen units. */
export function cautionText(caution: Caution, units: UnitSystem): string {
  return messageIn(caution, units);
}

/** Why the mission is not `ok`, in the chosen units ('' when it is). */
export function missionStatusText(mission: MissionResult, units: UnitSystem): string {
  return mission.statusParts === undefined ? mission.statusMessage : messageText(mission.statusParts, units);
}

const FIELD_WORDS: Readonly<Record<string, string>> = {
  maxZeroFuel: 'maximum zero-fuel weight',
  maxTakeoff: 'maximum take-off weight',
  maxLanding: 'maximum landing weight',
  operatingEmpty: 'operating empty weight',
  maxFuel: 'maximum fuel',
  toAltitude: 'target altitude',
  maxAltitude: 'highest altitude',
  destinationElevation: 'destination elevation',
  activeInlet: 'inlet flown',
  takeoffWeight: 'take-off weight',
  isaDeviation: 'ISA deviation',
  cd0: 'CD0',
  vmo: 'VMO',
  mmo: 'MMO',
};

/**
 * A project path as a reader names it: `mission.legs[2].toAltitude` ->
 * "leg 3 › target altitude"; `inlets[0].name` -> "inlet design 1 › name".
 */
export function pathLabel(path: string): string {
  if (path === '(file)') return 'the file';
  const words: string[] = [];
  for (const part of path.split('.')) {
    const m = /^([^[]*)((?:\[\d+\])*)$/.exec(part);
    const name = m?.[1] ?? part;
    const indexes = [...(m?.[2] ?? '').matchAll(/\[(\d+)\]/g)].map((x) => Number(x[1]) + 1);
    if (name === 'mission' || name === 'airframe' || name === 'weights' || name === 'source' || name === 'schedule') {
      if (indexes.length === 0) continue;
    }
    const word = name === 'legs' ? 'leg' : name === 'inlets' ? 'inlet design' : name === 'rows' ? 'row' : (FIELD_WORDS[name] ?? codeWords(name));
    words.push(indexes.length > 0 ? `${word} ${indexes.join(', ')}` : word);
  }
  return words.length === 0 ? path : words.join(' › ');
}

const DIGITS_IN_TEXT = /(\d+\.\d{4,})/g;

/** The reason of a project issue in the chosen units (no path), float noise rounded. */
export function issueReason(issue: ProjectIssue, units: UnitSystem): string {
  if (issue.reasonParts !== undefined) return messageText(issue.reasonParts, units);
  const prefix = `${issue.path}: `;
  const reason = issue.message.startsWith(prefix) ? issue.message.slice(prefix.length) : issue.message;
  return reason.replace(DIGITS_IN_TEXT, (d) => groupDigits(Number(Number(d).toPrecision(6)), Math.min(6, Math.max(0, 5 - Math.floor(Math.log10(Math.abs(Number(d)) || 1))))).replace(/\.?0+$/, ''));
}

/** Mach as shown in tables ("0.780"); a dash when missing. */
export function machText(mach: number | null): string {
  return mach === null || !Number.isFinite(mach) ? '—' : groupDigits(mach, 3);
}
