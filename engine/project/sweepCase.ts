/**
 * One case of a parameter study flown from the project document, and the
 * study's rows as CSV or JSON lines. Every front door (the CLI's sweep, the
 * app's study view) goes through here, so a row means the same everywhere.
 */
import { noticeCsvComment, SAFETY_NOTICE } from '../core/notice';
import type { MissionResult } from '../mission/missionTypes';
import { solveMission } from '../mission/solveMission';
import { buildMissionInput, type ProjectResources } from './buildMissionInput';
import { parseProjectData } from './parseProject';
import type { ProjectIssue } from './projectIssue';
import { caseDocument, gridCase, type SweepAxis } from './sweepGrid';

/** One flown case. Masses in kg, times in s. */
export interface SweepRow {
  /** 0-based index of the case in the whole grid. */
  readonly case: number;
  /** The value of each axis, as written into the file. */
  readonly inputs: readonly (number | string)[];
  /** The mission status, or 'invalid_input' when the case's project does not build. */
  readonly status: string;
  readonly message: string;
  readonly blockFuel_kg: number;
  readonly blockTime_s: number;
  readonly tripFuel_kg: number;
  readonly takeoffMass_kg: number;
  /** Ids of the cautions and warnings raised (info left out), each once. */
  readonly cautions: readonly string[];
}

/** Flies case `k` of the grid `axes` over the project document `doc` with the inlet `inletName` (default the active one). */
export function flySweepCase(
  doc: unknown,
  axes: readonly SweepAxis[],
  k: number,
  resources: ProjectResources,
  inletName?: string,
): SweepRow {
  const inputs = gridCase(axes, k);
  const project = parseProjectData(caseDocument(doc, axes, inputs));
  if (!project.ok) return invalidSweepRow(k, inputs, project.error);
  const input = buildMissionInput(project.value, resources, inletName === undefined ? {} : { inletName });
  if (!input.ok) return invalidSweepRow(k, inputs, input.error);
  return sweepRowOf(k, inputs, solveMission(input.value));
}

/** The row of case `k` whose project does not build: status invalid_input, the issues' messages. */
export function invalidSweepRow(k: number, inputs: readonly (number | string)[], issues: readonly ProjectIssue[]): SweepRow {
  return {
    case: k,
    inputs,
    status: 'invalid_input',
    message: issues.map((i) => i.message).join('; '),
    blockFuel_kg: 0,
    blockTime_s: 0,
    tripFuel_kg: 0,
    takeoffMass_kg: 0,
    cautions: [],
  };
}

/** The row of case `k` flown to the mission result `r`. */
export function sweepRowOf(k: number, inputs: readonly (number | string)[], r: MissionResult): SweepRow {
  return {
    case: k,
    inputs,
    status: r.status,
    message: r.statusMessage,
    blockFuel_kg: r.blockFuel_kg,
    blockTime_s: r.blockTime_s,
    tripFuel_kg: r.tripFuel_kg,
    takeoffMass_kg: r.takeoffMass_kg,
    cautions: [...new Set(r.cautions.filter((c) => c.severity !== 'info').map((c) => c.id))],
  };
}

/** A CSV field: quoted when it holds a comma, quote or line break (RFC 4180). */
function csvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/** The top of a study's CSV file: the notice as `#` lines, then the header (units in `name[unit]`, as every Blockwise CSV). */
export function sweepCsvHead(axes: readonly SweepAxis[]): string {
  const header = ['case', ...axes.map((a) => a.field), 'status', 'blockFuel[kg]', 'blockTime[s]', 'tripFuel[kg]', 'takeoffMass[kg]', 'cautions', 'message'];
  return `${noticeCsvComment()}${header.map(csvField).join(',')}\n`;
}

/** One CSV line of a row (SI at full precision; cautions separated by spaces). */
export function sweepCsvLine(row: SweepRow): string {
  const cells = [
    String(row.case),
    ...row.inputs.map((v) => String(v)),
    row.status,
    String(row.blockFuel_kg),
    String(row.blockTime_s),
    String(row.tripFuel_kg),
    String(row.takeoffMass_kg),
    row.cautions.join(' '),
    row.message,
  ];
  return `${cells.map(csvField).join(',')}\n`;
}

/** The first line of a study's JSON-lines file: the notice and the axes. */
export function sweepJsonlHead(axes: readonly SweepAxis[], total: number): string {
  return `${JSON.stringify({ notice: SAFETY_NOTICE, fields: axes.map((a) => a.field), cases: total })}\n`;
}

/** One JSON line of a row, the inputs keyed by field. */
export function sweepJsonLine(axes: readonly SweepAxis[], row: SweepRow): string {
  const inputs: Record<string, number | string> = {};
  axes.forEach((a, i) => (inputs[a.field] = row.inputs[i]!));
  const { inputs: _values, ...rest } = row;
  return `${JSON.stringify({ ...rest, inputs })}\n`;
}
