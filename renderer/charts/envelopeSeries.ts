/**
 * Envelope rows -> altitude (display units) against Mach for each limit line
 * (stall, buffet onset at 1 g and at the margin load factor, the thrust-drag
 * crossovers, VMO/MMO), and the ceilings as horizontal marks.
 */
import { SPEED_LIMIT_SOURCE_TEXT, type EnvelopeResult, type EnvelopeRow } from '../../engine/analysis';
import { displayUnit, toDisplay, type UnitSystem } from '../../engine/units';
import type { SeriesDef } from './polarSeries';

type Row = Record<string, number | null>;

/** The limit lines of the envelope chart: key, the row's Mach, the legend name. */
export function envelopeLines(buffetLoadFactor: number): readonly { readonly key: string; readonly mach: (r: EnvelopeRow) => number | null; readonly name: string }[] {
  const n = buffetLoadFactor.toFixed(2);
  return [
    { key: 'stall', mach: (r) => r.stallMach, name: 'stall (CLmax, 1 g)' },
    { key: 'buffetLow', mach: (r) => r.buffetLowMach, name: 'buffet onset 1 g, low speed' },
    { key: 'buffetHigh', mach: (r) => r.buffetHighMach, name: 'buffet onset 1 g, high speed' },
    { key: 'marginLow', mach: (r) => r.buffetMarginLowMach, name: `buffet onset ${n} g, low speed` },
    { key: 'marginHigh', mach: (r) => r.buffetMarginHighMach, name: `buffet onset ${n} g, high speed` },
    { key: 'crossLow', mach: (r) => r.lowMach, name: 'thrust-drag crossover, low' },
    { key: 'crossHigh', mach: (r) => r.highMach, name: 'thrust-drag crossover, high' },
    { key: 'speedLimit', mach: (r) => r.speedLimitMach, name: 'VMO/MMO' },
  ];
}

/**
 * Rows `{ mach, <line>: altitude }`, one per point, each line's points
 * together in altitude order (the chart draws each line through its own
 * points in data order), the series, the ceilings (altitude in display
 * units) and the unit of altitude.
 */
export function envelopeSeries(result: EnvelopeResult, units: UnitSystem): { rows: Row[]; series: SeriesDef[]; ceilings: { readonly name: string; readonly altitude: number }[]; unit: string } {
  const lines = envelopeLines(result.buffetLoadFactor);
  const rows: Row[] = [];
  const series: SeriesDef[] = [];
  lines.forEach((line, i) => {
    let any = false;
    for (const r of result.rows) {
      const m = line.mach(r);
      if (m === null || !Number.isFinite(m)) continue;
      any = true;
      const row: Row = { mach: m };
      for (const other of lines) row[other.key] = null;
      row[line.key] = toDisplay(r.altitude_m, 'altitude', units);
      rows.push(row);
    }
    if (any) series.push({ key: line.key, name: line.name, colorIndex: i });
  });
  const ceilings = result.ceilings.flatMap((c) => (c.altitude_m === null ? [] : [{ name: c.name, altitude: toDisplay(c.altitude_m, 'altitude', units) }]));
  return { rows, series, ceilings, unit: displayUnit('altitude', units) };
}

/**
 * The limits that bound level flight at a ceiling: the envelope row nearest
 * below it (or at it), in words; null when no row has a band.
 */
export function limitsAtCeiling(result: EnvelopeResult, altitude_m: number): string | null {
  let row: EnvelopeRow | null = null;
  for (const r of result.rows) if (r.altitude_m <= altitude_m + 1e-6 && r.lowSpeedLimit !== null && r.highSpeedLimit !== null) row = r;
  if (row === null || row.lowSpeedLimit === null || row.highSpeedLimit === null) return null;
  return `${SPEED_LIMIT_SOURCE_TEXT[row.lowSpeedLimit.source]} to ${SPEED_LIMIT_SOURCE_TEXT[row.highSpeedLimit.source]}`;
}
