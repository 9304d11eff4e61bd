/**
 * The text summary of a flown mission: headline figures in customary and SI
 * units, reserves by part, weights, distance, the legs table, the cautions
 * with their leg and time, and the safety notice.
 */
import type { Caution } from '../../engine/cautions';
import type { LegRow, MissionResult } from '../../engine/mission';
import { type DisplayKind, formatQuantity } from '../../engine/units';
import { describeInstallationMethod, type InstallationMethodId } from '../../engine/propulsion';
import { formatPairs, formatTable, numberColumns, textColumns } from './textTable';
import { reportText } from '../common/report';

export interface MissionSummaryContext {
  readonly projectName: string;
  readonly inletName: string;
  readonly deckTitle: string;
  readonly installationMethod: InstallationMethodId;
  /** The installation assumptions the figures rest on (engine/project/installationAssumptions.ts), one line each. */
  readonly assumptions?: readonly string[];
}

function both(value_si: number, kind: DisplayKind, customaryDigits?: number, siDigits?: number): [string, string] {
  return [formatQuantity(value_si, kind, 'customary', customaryDigits), formatQuantity(value_si, kind, 'si', siDigits)];
}

/** Mission time as "h:mm:ss" (e.g. 2 h 5 min 3 s -> "2:05:03"). */
export function clockTime(time_s: number): string {
  if (!Number.isFinite(time_s)) return '—';
  const total = Math.round(Math.abs(time_s));
  const h = Math.floor(total / 3600);
  const m = Math.floor((total % 3600) / 60);
  const s = total % 60;
  return `${time_s < 0 ? '-' : ''}${h}:${String(m).padStart(2, '0')}:${String(s).padStart(2, '0')}`;
}

function legRows(legs: readonly LegRow[]): string[][] {
  // Numbered from 1, as the app's legs table and every message number them (the JSON keeps the 0-based index).
  return legs.map((l) => [
    String(l.index + 1),
    l.name,
    l.kind,
    clockTime(l.startTime_s),
    clockTime(l.endTime_s - l.startTime_s),
    formatQuantity(l.endDistance_m - l.startDistance_m, 'distance', 'customary', 1),
    formatQuantity(l.endGroundDistance_m - l.startGroundDistance_m, 'distance', 'customary', 1),
    `${formatQuantity(l.startAltitude_m, 'altitude', 'customary')} -> ${formatQuantity(l.endAltitude_m, 'altitude', 'customary')}`,
    formatQuantity(l.fuel_kg, 'mass', 'customary'),
    formatQuantity(l.endMass_kg, 'mass', 'customary'),
  ]);
}

/** One line per caution: severity, id, where and when, and its message. */
export function cautionLines(cautions: readonly Caution[]): string[] {
  return cautions.map((c) => {
    const where = c.legName !== undefined ? `leg "${c.legName}"` : c.legIndex !== undefined ? `leg ${c.legIndex + 1}` : 'mission';
    const when = c.time_s !== undefined ? ` at ${clockTime(c.time_s)}` : '';
    return `  [${c.severity}] ${c.id} (${where}${when}): ${c.message}`;
  });
}

/** What the mission's distances measured, in one sentence (text and JSON reports). */
export function distanceBasisText(basis: MissionResult['distanceBasis']): string {
  return basis === 'ground'
    ? 'over the ground: the range and set distances are ground distances; the wind changes the air distance, fuel and time'
    : 'still air (design-range study): the range and set distances are still-air distances; the wind changes only the ground distance';
}

/** A blank line, "Installation assumptions:" and one indented line each; nothing when there are none. */
export function assumptionLines(assumptions: readonly string[]): string[] {
  return assumptions.length === 0 ? [] : ['', 'Installation assumptions:', ...assumptions.map((a) => `  ${a}`)];
}

/** The whole text report of `blockwise fly`. */
export function missionSummaryText(result: MissionResult, context: MissionSummaryContext): string {
  const r = result;
  const status =
    r.status === 'ok'
      ? `ok (${r.iterations} iteration${r.iterations === 1 ? '' : 's'}, fuel residual ${formatQuantity(Math.abs(r.residual_kg), 'mass', 'si', 2)})`
      : `${r.status}: ${r.statusMessage}`;
  const headline = formatPairs([
    ['', 'customary', 'SI'],
    ['Block fuel', ...both(r.blockFuel_kg, 'mass')],
    ['Block time', formatQuantity(r.blockTime_s, 'time', 'customary'), formatQuantity(r.blockTime_s, 'time', 'si')],
    ['Trip fuel', ...both(r.tripFuel_kg, 'mass')],
    ['Trip time', formatQuantity(r.tripTime_s, 'time', 'customary'), formatQuantity(r.tripTime_s, 'time', 'si')],
    ['Reserve fuel', ...both(r.reserveFuel_kg, 'mass')],
    ['  contingency', ...both(r.reserves.contingency_kg, 'mass')],
    ['  alternate', ...both(r.reserves.alternate_kg, 'mass')],
    ['    missed approach', ...both(r.reserves.missedApproach_kg, 'mass')],
    ['    approach and landing', ...both(r.reserves.alternateApproach_kg, 'mass')],
    ['  final reserve', ...both(r.reserves.finalReserve_kg, 'mass')],
    ['  extra', ...both(r.reserves.extra_kg, 'mass')],
    ['Ramp weight', ...both(r.rampMass_kg, 'mass')],
    ['Takeoff weight (TOW)', ...both(r.takeoffMass_kg, 'mass')],
    ['Landing weight (LW)', ...both(r.landingMass_kg, 'mass')],
    ['Zero-fuel weight (ZFW)', ...both(r.zeroFuelMass_kg, 'mass')],
    ['Payload', ...both(r.payload_kg, 'mass')],
    ['Distance (still air)', ...both(r.airDistance_m, 'distance', 1, 1)],
    ['Distance (ground)', ...both(r.groundDistance_m, 'distance', 1, 1)],
  ]);
  const legs = formatTable(
    [...numberColumns('#'), ...textColumns('leg', 'kind'), ...numberColumns('start', 'duration', 'air distance', 'ground distance', 'altitude', 'fuel', 'end weight')],
    legRows(r.legs),
  );
  const cautions = r.cautions.length === 0 ? ['  none'] : cautionLines(r.cautions);
  return reportText([
    `Mission: ${context.projectName}`,
    `Inlet: ${context.inletName}    Deck: ${context.deckTitle}`,
    `Installation method: ${describeInstallationMethod(context.installationMethod)}`,
    `Status: ${status}`,
    `Distances: ${distanceBasisText(r.distanceBasis)}`,
    '',
    headline,
    '',
    'Legs (times h:mm:ss from block-out):',
    legs,
    '',
    `Cautions (${r.cautions.length}):`,
    ...cautions,
    ...assumptionLines(context.assumptions ?? []),
  ]);
}
