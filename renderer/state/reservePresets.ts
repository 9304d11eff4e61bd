/**
 * Reserve presets with their default values: titles and defaults come from
 * the engine's one table of reserve rules (engine/mission/reserveRules.ts,
 * RESERVE_RULES), so the app and the leg rows never disagree.
 */
import { RESERVE_RULES } from '../../engine/mission';
import type { Project } from '../../engine/project';

type Reserves = Project['mission']['reserves'];
export type ReservePreset = Reserves['preset'];

const PRESETS: readonly ReservePreset[] = ['icaoAnnex6', 'cfr121_639', 'cfr121_645', 'custom'];

export const RESERVE_PRESET_LABEL: Readonly<Record<ReservePreset, string>> = Object.fromEntries(
  PRESETS.map((p) => [p, RESERVE_RULES[p].title]),
) as Record<ReservePreset, string>;

/** The preset with its rule's defaults (RESERVE_RULES), keeping the current alternate. */
export function reservesForPreset(preset: ReservePreset, alternate: Reserves['alternate']): Reserves {
  switch (preset) {
    case 'icaoAnnex6': {
      const d = RESERVE_RULES.icaoAnnex6.defaults;
      return { preset, contingencyFraction: d.contingencyFraction, minContingencyTime: d.minContingencyTime_s, alternate, finalReserveTime: d.finalReserveTime_s };
    }
    case 'cfr121_639':
      return { preset, alternate, finalReserveTime: RESERVE_RULES.cfr121_639.defaults.finalReserveTime_s };
    case 'cfr121_645': {
      const d = RESERVE_RULES.cfr121_645.defaults;
      return { preset, enRouteFraction: d.enRouteFraction, alternate, finalReserveTime: d.finalReserveTime_s };
    }
    case 'custom': {
      const d = RESERVE_RULES.custom.defaults;
      return { preset, contingencyFraction: d.contingencyFraction, alternate, finalReserveTime: d.finalReserveTime_s, extraFuel: d.extraFuel_kg };
    }
  }
}
