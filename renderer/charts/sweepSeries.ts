/** A parameter study's rows -> block fuel against the varied input (display units), and its CSV file. */
import { sweepCsvHead, sweepCsvLine } from '../../engine/project';
import { toDisplay, type UnitSystem } from '../../engine/units';
import type { SweepReply } from '../worker/engineProtocol';

/** The number of a value as written ("1000 nmi" -> 1000), null when it is not one. */
export function writtenNumber(value: number | string): number | null {
  const x = typeof value === 'number' ? value : Number.parseFloat(value);
  return Number.isFinite(x) ? x : null;
}

/** The unit the values are written in ('' for a plain number). */
export function writtenUnit(reply: SweepReply): string {
  const first = reply.axes[0]?.values[0];
  return typeof first === 'string' ? first.replace(/^[-+0-9.eE\s]+/, '').trim() : '';
}

/** One row per case: the input as written and the block fuel in display units, null for a case not flown to its destination. */
export function sweepRows(reply: SweepReply, units: UnitSystem): { readonly input: number; readonly blockFuel: number | null }[] {
  const out: { input: number; blockFuel: number | null }[] = [];
  for (const row of reply.rows) {
    const x = writtenNumber(row.inputs[0]!);
    if (x === null) continue;
    out.push({ input: x, blockFuel: row.status === 'ok' ? toDisplay(row.blockFuel_kg, 'mass', units) : null });
  }
  return out;
}

/** The study as the CLI's `blockwise sweep --format csv` writes it: the notice as # lines, the header, one line per case. */
export function sweepCsv(reply: SweepReply): string {
  return sweepCsvHead(reply.axes) + reply.rows.map(sweepCsvLine).join('');
}
