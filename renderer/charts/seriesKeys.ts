/** Keys and labels shared by chart adapters. */

import { groupDigits } from '../../engine/units';

/** A data key safe for recharts (no dots): 'M0.78' -> 'M0_78'. */
export function seriesKey(prefix: string, index: number): string {
  return `${prefix}${index}`;
}

/** Every `step`-th index of n samples, always keeping the first and last (for long time histories). */
export function sampleIndices(n: number, maxPoints: number): number[] {
  if (n <= 0) return [];
  if (n <= maxPoints) return Array.from({ length: n }, (_, i) => i);
  const step = (n - 1) / (maxPoints - 1);
  const out: number[] = [];
  for (let k = 0; k < maxPoints; k++) out.push(Math.round(k * step));
  return out;
}

/**
 * Axis tick text: at most four significant digits, no float noise, thousands
 * grouped as every other figure in the app ("2999.99999" -> "3,000"); below
 * 0.001 and from 10 million up in exponent form.
 */
export function tickText(value: number): string {
  if (!Number.isFinite(value)) return '';
  if (value === 0) return '0';
  const rounded = Number(value.toPrecision(4));
  if (Math.abs(rounded) >= 1e7 || Math.abs(rounded) < 1e-3) return value.toExponential(2);
  const plain = String(rounded);
  const dot = plain.indexOf('.');
  return groupDigits(rounded, dot < 0 ? 0 : plain.length - dot - 1);
}
