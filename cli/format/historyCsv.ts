/**
 * A mission time history as CSV: one column per history field, the unit in
 * the header as `name[unit]` (the deck CSV convention), SI values at full
 * precision, one row per integrator sample.
 */
import { noticeCsvComment } from '../../engine/core/notice';
import type { TimeHistory } from '../../engine/mission/missionTypes';

/** Unit suffixes of history field names, longest first. */
const SUFFIX_UNITS: readonly (readonly [string, string])[] = [
  ['_m_s', 'm/s'],
  ['_kg_s', 'kg/s'],
  ['_kg', 'kg'],
  ['_m', 'm'],
  ['_s', 's'],
  ['_N', 'N'],
];

/** `fuelFlow_kg_s` -> `fuelFlow[kg/s]`; a field without a unit suffix gets `[-]`. */
export function historyHeader(field: string): string {
  for (const [suffix, unit] of SUFFIX_UNITS) {
    if (field.endsWith(suffix)) return `${field.slice(0, -suffix.length)}[${unit}]`;
  }
  return `${field}[-]`;
}

/** The time history as CSV text: the notice as `#` lines, a header row, the rows, a trailing newline. */
export function historyToCsv(history: TimeHistory): string {
  const fields = Object.keys(history) as (keyof TimeHistory)[];
  const columns = fields.map((f) => history[f]);
  const rows = Math.min(...columns.map((c) => c.length));
  const lines = [fields.map((f) => historyHeader(f)).join(',')];
  for (let i = 0; i < rows; i++) lines.push(columns.map((c) => String(c[i])).join(','));
  return `${noticeCsvComment()}${lines.join('\n')}\n`;
}
