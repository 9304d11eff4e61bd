/**
 * Cautions at a cruise point: load factor to buffet onset below the user's
 * margin, and Mach above MMO less its margin (ids from the caution
 * catalogue: `buffet_margin_low`, `mmo_exceeded`).
 */
import type { AeroModel } from '../aero/aeroModel';
import type { Caution } from '../cautions/caution';
import type { CautionSettings } from '../cautions/cautionSettings';
import { msg, q, withParts } from '../units/messageParts';

/**
 * Buffet-margin and MMO cautions at an altitude (m), Mach and mass (kg);
 * `where` names the point in the message (e.g. "the maximum-range Mach").
 * MMO (-) omitted = not checked.
 */
export function cruisePointCautions(
  aero: AeroModel,
  point: { readonly altitude_m: number; readonly mach: number; readonly mass_kg: number },
  settings: CautionSettings,
  mmo: number | undefined,
  where: string,
): Caution[] {
  const cautions: Caution[] = [];
  const d = aero.drag({ altitude_m: point.altitude_m, mach: point.mach, mass_kg: point.mass_kg, loadFactor: 1 });
  const minN = settings.minBuffetLoadFactor;
  if (d.buffetLoadFactor < minN) {
    cautions.push({
      id: 'buffet_margin_low',
      severity: 'caution',
      ...withParts(msg`At ${where} (${q(point.altitude_m, 'altitude')}, M ${q(point.mach, 'mach')}) the load factor to buffet onset is ${q(d.buffetLoadFactor, 'loadFactor')}, below the ${q(minN, 'loadFactor')} margin.`),
      value: d.buffetLoadFactor,
      threshold: minN,
    });
  }
  if (mmo !== undefined && point.mach > mmo - settings.mmoMargin) {
    const limit = mmo - settings.mmoMargin;
    cautions.push({
      id: 'mmo_exceeded',
      severity: 'warning',
      ...withParts(msg`${where[0]!.toUpperCase()}${where.slice(1)} M ${q(point.mach, 'mach')} exceeds MMO ${q(mmo, 'mach')} less its margin (${q(limit, 'mach')}).`),
      value: point.mach,
      threshold: limit,
    });
  }
  return cautions;
}
