/** Reserve presets with their default values, named after the rules they implement. */
import type { Project } from '../../engine/project';

type Reserves = Project['mission']['reserves'];
export type ReservePreset = Reserves['preset'];

export const RESERVE_PRESET_LABEL: Readonly<Record<ReservePreset, string>> = {
  icaoAnnex6: 'ICAO Annex 6 Part I (contingency, alternate, 30 min final reserve)',
  cfr121_639: '14 CFR 121.639 (alternate, then 45 min)',
  cfr121_645: '14 CFR 121.645(b) (10 % en-route time, alternate, 30 min hold)',
  custom: 'Custom',
};

/** The preset with the schema's defaults (projectSchema.ts), keeping the current alternate. */
export function reservesForPreset(preset: ReservePreset, alternate: Reserves['alternate']): Reserves {
  switch (preset) {
    case 'icaoAnnex6':
      return { preset, contingencyFraction: 0.05, minContingencyTime: 300, alternate, finalReserveTime: 1800 };
    case 'cfr121_639':
      return { preset, alternate, finalReserveTime: 2700 };
    case 'cfr121_645':
      return { preset, enRouteFraction: 0.1, alternate, finalReserveTime: 1800 };
    case 'custom':
      return { preset, contingencyFraction: 0.05, alternate, finalReserveTime: 1800, extraFuel: 0 };
  }
}
