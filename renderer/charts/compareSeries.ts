/** Inlet comparison and payload-range results -> chart rows. */
import type { InletComparisonResult, InletFactor, PayloadRangeResult } from '../../engine/analysis';
import { toDisplay, type UnitSystem } from '../../engine/units';

export const FACTOR_LABEL: Readonly<Record<InletFactor, string>> = {
  recovery: 'Pressure recovery',
  spillage: 'Spillage drag',
  externalDrag: 'External drag',
  weight: 'Inlet weight',
};

export interface WaterfallRow {
  readonly name: string;
  /** Invisible base of the bar and its visible height (display mass units); `value` keeps the sign. */
  readonly base: number;
  readonly height: number;
  readonly value: number;
  readonly total: boolean;
}

/**
 * Waterfall of the block-fuel difference B - A: one bar per factor starting
 * where the previous one ended, then the total from zero. Mass display units.
 */
export function breakdownWaterfall(result: InletComparisonResult, units: UnitSystem): WaterfallRow[] {
  const rows: WaterfallRow[] = [];
  let level = 0;
  for (const part of result.breakdown.parts) {
    const v = toDisplay(part.blockFuel_kg, 'mass', units);
    const next = level + v;
    rows.push({ name: FACTOR_LABEL[part.factor], base: Math.min(level, next), height: Math.abs(v), value: v, total: false });
    level = next;
  }
  const total = toDisplay(result.breakdown.total_kg, 'mass', units);
  rows.push({ name: 'Total B - A', base: Math.min(0, total), height: Math.abs(total), value: total, total: true });
  return rows;
}

export interface PayloadRangeRow {
  readonly range: number;
  readonly payload: number;
  readonly kind: string;
}

/** Payload against range, starting at zero range with the maximum payload (the implied first segment). */
export function payloadRangeRows(result: PayloadRangeResult, units: UnitSystem): PayloadRangeRow[] {
  const first = { range: 0, payload: toDisplay(result.maxPayload.payload_kg, 'mass', units), kind: 'start' };
  return [first, ...result.points.map((p) => ({ range: toDisplay(p.range_m, 'distance', units), payload: toDisplay(p.payload_kg, 'mass', units), kind: p.kind }))];
}
