/**
 * Mission results as CSV text, the one writer behind the CLI's `fly --csv`
 * and the app's export: the time history (one row per integrator step) and
 * the legs table. The safety notice as "#" lines, then one header row of
 * `name[unit]` columns in SI (the deck CSV convention), "." decimal point,
 * "," separator, full precision, a non-finite value as an empty cell. The
 * columns are documented in docs/results-csv.md.
 */
import { noticeCsvComment } from '../core/notice';
import type { MissionResult, TimeHistory } from '../mission/missionTypes';
import { displayUnit, toDisplay, type DisplayKind, type UnitSystem } from '../units';

/** Header and history field of each time-history column, in file order. */
export const HISTORY_COLUMNS = [
  ['time[s]', 'time_s'],
  ['distance[m]', 'distance_m'],
  ['altitude[m]', 'altitude_m'],
  ['mach[-]', 'mach'],
  ['cas[m/s]', 'cas_m_s'],
  ['tas[m/s]', 'tas_m_s'],
  ['mass[kg]', 'mass_kg'],
  ['thrust_available[N]', 'thrustAvailable_N'],
  ['thrust_used[N]', 'thrustUsed_N'],
  ['drag[N]', 'drag_N'],
  ['fuel_flow[kg/s]', 'fuelFlow_kg_s'],
  ['cl[-]', 'cl'],
  ['lift_to_drag[-]', 'liftToDrag'],
  ['climb_rate[m/s]', 'climbRate_m_s'],
  ['leg[-]', 'legIndex'],
] as const satisfies readonly (readonly [string, keyof TimeHistory])[];

/** The display kind of each time-history column (null: no unit, written as is). */
const HISTORY_KIND: Readonly<Record<keyof TimeHistory, DisplayKind | null>> = {
  time_s: 'time',
  distance_m: 'distance',
  altitude_m: 'altitude',
  mach: null,
  cas_m_s: 'speed',
  tas_m_s: 'speed',
  mass_kg: 'mass',
  thrustAvailable_N: 'force',
  thrustUsed_N: 'force',
  drag_N: 'force',
  fuelFlow_kg_s: 'fuelFlow',
  cl: null,
  liftToDrag: null,
  climbRate_m_s: 'climbRate',
  legIndex: null,
};

/**
 * What the numbers are written in: absent, SI base units as the headers above say (s, m, kg, N, kg/s: for
 * programs); with `display`, the display units of that unit system (min or h, km or nmi, kt, lb, lbf, lb/h ...: what
 * the screens show), each header naming its unit.
 */
export interface CsvUnits {
  readonly display?: UnitSystem;
}

function headerIn(head: string, kind: DisplayKind | null, units: CsvUnits): string {
  if (kind === null || units.display === undefined) return head;
  return `${head.slice(0, head.indexOf('['))}[${displayUnit(kind, units.display)}]`;
}

function valueIn(value: number, kind: DisplayKind | null, units: CsvUnits): number {
  return kind === null || units.display === undefined ? value : toDisplay(value, kind, units.display);
}

function csvText(value: string): string {
  return /[",\n\r]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

function num(value: number): string {
  return Number.isFinite(value) ? String(value) : '';
}

/** The time history as CSV; a non-finite value is an empty cell. */
export function historyCsv(h: TimeHistory, units: CsvUnits = {}): string {
  const lines = [HISTORY_COLUMNS.map(([head, key]) => headerIn(head, HISTORY_KIND[key], units)).join(',')];
  for (let i = 0; i < h.time_s.length; i++) {
    lines.push(HISTORY_COLUMNS.map(([, key]) => num(valueIn(h[key][i]!, HISTORY_KIND[key], units))).join(','));
  }
  return `${noticeCsvComment()}${lines.join('\n')}\n`;
}

/** The numeric columns of the legs table after leg, name and kind: header (SI), kind, value. */
const LEG_COLUMNS = [
  ['start_time[s]', 'time', (l) => l.startTime_s],
  ['end_time[s]', 'time', (l) => l.endTime_s],
  ['start_distance[m]', 'distance', (l) => l.startDistance_m],
  ['end_distance[m]', 'distance', (l) => l.endDistance_m],
  ['start_altitude[m]', 'altitude', (l) => l.startAltitude_m],
  ['end_altitude[m]', 'altitude', (l) => l.endAltitude_m],
  ['start_mass[kg]', 'mass', (l) => l.startMass_kg],
  ['end_mass[kg]', 'mass', (l) => l.endMass_kg],
  ['fuel[kg]', 'mass', (l) => l.fuel_kg],
] as const satisfies readonly (readonly [string, DisplayKind, (l: MissionResult['legs'][number]) => number])[];

/** The legs table as CSV (reserve rows have leg number "R"). */
export function legsCsv(result: MissionResult, units: CsvUnits = {}): string {
  const lines = [['leg', 'name', 'kind', ...LEG_COLUMNS.map(([head, kind]) => headerIn(head, kind, units))].join(',')];
  for (const l of result.legs) {
    lines.push([l.kind === 'reserve' ? 'R' : String(l.index + 1), csvText(l.name), l.kind, ...LEG_COLUMNS.map(([, kind, of]) => num(valueIn(of(l), kind, units)))].join(','));
  }
  return `${noticeCsvComment()}${lines.join('\n')}\n`;
}

/** File name stem of exports from a project file name: "demo.blockwise.json" -> "demo". */
export function fileStem(name: string): string {
  const base = name.replace(/\.blockwise\.json$/i, '').replace(/\.json$/i, '').trim();
  return base === '' ? 'blockwise' : base;
}
