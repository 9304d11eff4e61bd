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

function csvText(value: string): string {
  return /[",\n\r]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

function num(value: number): string {
  return Number.isFinite(value) ? String(value) : '';
}

/** The time history as CSV; a non-finite value is an empty cell. */
export function historyCsv(h: TimeHistory): string {
  const lines = [HISTORY_COLUMNS.map(([head]) => head).join(',')];
  for (let i = 0; i < h.time_s.length; i++) {
    lines.push(HISTORY_COLUMNS.map(([, key]) => num(h[key][i]!)).join(','));
  }
  return `${noticeCsvComment()}${lines.join('\n')}\n`;
}

/** The legs table as CSV (reserve rows have leg number "R"). */
export function legsCsv(result: MissionResult): string {
  const head = 'leg,name,kind,start_time[s],end_time[s],start_distance[m],end_distance[m],start_altitude[m],end_altitude[m],start_mass[kg],end_mass[kg],fuel[kg]';
  const lines = [head];
  for (const l of result.legs) {
    lines.push(
      [
        l.kind === 'reserve' ? 'R' : String(l.index + 1),
        csvText(l.name),
        l.kind,
        num(l.startTime_s),
        num(l.endTime_s),
        num(l.startDistance_m),
        num(l.endDistance_m),
        num(l.startAltitude_m),
        num(l.endAltitude_m),
        num(l.startMass_kg),
        num(l.endMass_kg),
        num(l.fuel_kg),
      ].join(','),
    );
  }
  return `${noticeCsvComment()}${lines.join('\n')}\n`;
}

/** File name stem of exports from a project file name: "demo.blockwise.json" -> "demo". */
export function fileStem(name: string): string {
  const base = name.replace(/\.blockwise\.json$/i, '').replace(/\.json$/i, '').trim();
  return base === '' ? 'blockwise' : base;
}
