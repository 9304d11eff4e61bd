/**
 * Cautions at a cruise point: load factor to buffet onset below the user's
 * margin, and Mach above MMO less its margin (ids from the caution
 * catalogue: `buffet_margin_low`, `mmo_exceeded`).
 */
import type { AeroModel } from '../aero/aeroModel';
import type { Caution } from '../cautions/caution';
import type { CautionSettings } from '../cautions/cautionSettings';

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
      message: `At ${where} (${point.altitude_m.toFixed(0)} m, M ${point.mach.toFixed(3)}) the load factor to buffet onset is ${d.buffetLoadFactor.toFixed(2)} g, below the ${minN.toFixed(2)} g margin.`,
      value: d.buffetLoadFactor,
      threshold: minN,
    });
  }
  if (mmo !== undefined && point.mach > mmo - settings.mmoMargin) {
    const limit = mmo - settings.mmoMargin;
    cautions.push({
      id: 'mmo_exceeded',
      severity: 'warning',
      message: `${where[0]!.toUpperCase()}${where.slice(1)} M ${point.mach.toFixed(3)} exceeds MMO ${mmo.toFixed(3)} less its margin (${limit.toFixed(3)}).`,
      value: point.mach,
      threshold: limit,
    });
  }
  return cautions;
}
