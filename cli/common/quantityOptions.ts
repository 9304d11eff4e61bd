/**
 * Quantity options of the command line ("--altitude 35000ft", "--weight
 * 15000 kg"): parsed to SI with engine/units, and a UsageError naming the
 * option and the problem when they cannot be.
 */
import { parseQuantity, type Dimension } from '../../engine/units/quantity';
import { optionalString, requireString, UsageError } from '../verb';

function parseOption(text: string, name: string, dimension: Dimension): number {
  const parsed = parseQuantity(text, dimension);
  if (!parsed.ok) throw new UsageError(`--${name}: ${parsed.error.message}`);
  return parsed.value;
}

/** An optional quantity option in SI; undefined when absent. */
export function optionalQuantityOption(values: Readonly<Record<string, unknown>>, name: string, dimension: Dimension): number | undefined {
  const text = optionalString(values, name);
  return text === undefined ? undefined : parseOption(text, name, dimension);
}

/** A quantity option in SI, or `fallback` when absent; without a fallback the option is required ("missing --name"). */
export function quantityOption(
  values: Readonly<Record<string, unknown>>,
  name: string,
  dimension: Dimension,
  fallback?: number,
): number {
  if (fallback === undefined) return parseOption(requireString(values, name), name, dimension);
  return optionalQuantityOption(values, name, dimension) ?? fallback;
}

/** A quantity option that must be positive (a mass, a step, a climb rate). */
export function positiveQuantityOption(
  values: Readonly<Record<string, unknown>>,
  name: string,
  dimension: Dimension,
  fallback?: number,
): number {
  const v = quantityOption(values, name, dimension, fallback);
  if (!(v > 0)) throw new UsageError(`--${name}: must be positive (got ${String(values[name] ?? v)})`);
  return v;
}
