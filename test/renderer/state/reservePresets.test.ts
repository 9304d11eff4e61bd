import { describe, expect, it } from 'vitest';
import { RESERVE_RULES } from '../../../engine/mission';
import { reservesSchema } from '../../../engine/project/projectSchema';
import { RESERVE_PRESET_LABEL, reservesForPreset, type ReservePreset } from '../../../renderer/state/reservePresets';

const PRESETS: ReservePreset[] = ['icaoAnnex6', 'cfr121_639', 'cfr121_645', 'custom'];
const ALTERNATE = null;

describe('reservePresets draw on RESERVE_RULES', () => {
  it('every preset is labelled with its rule title from RESERVE_RULES', () => {
    expect(Object.keys(RESERVE_PRESET_LABEL).sort()).toEqual(Object.keys(RESERVE_RULES).sort());
    for (const p of PRESETS) expect(RESERVE_PRESET_LABEL[p]).toBe(RESERVE_RULES[p].title);
  });

  it('each preset carries the defaults RESERVE_RULES gives it', () => {
    for (const p of PRESETS) {
      const r = reservesForPreset(p, ALTERNATE) as Record<string, unknown>;
      const d = RESERVE_RULES[p].defaults as Record<string, number>;
      for (const [k, v] of Object.entries(d)) expect(r[k.replace(/_(s|kg)$/, '')], `${p}.${k}`).toBe(v);
      expect(r.preset).toBe(p);
    }
  });

  it('the published rules\' figures (quoted from memory): ICAO Annex 6 4.3.6.3 5 %, 5 min, 30 min; 14 CFR 121.639(c) 45 min; 121.645(b) 10 %, 30 min', () => {
    expect(reservesForPreset('icaoAnnex6', ALTERNATE)).toEqual({ preset: 'icaoAnnex6', contingencyFraction: 0.05, minContingencyTime: 5 * 60, alternate: null, finalReserveTime: 30 * 60 });
    expect(reservesForPreset('cfr121_639', ALTERNATE)).toEqual({ preset: 'cfr121_639', alternate: null, finalReserveTime: 45 * 60 });
    expect(reservesForPreset('cfr121_645', ALTERNATE)).toEqual({ preset: 'cfr121_645', enRouteFraction: 0.1, alternate: null, finalReserveTime: 30 * 60 });
  });

  it('the project schema\'s defaults agree with the presets (a preset with only its alternate parses to the same reserves)', () => {
    for (const p of ['icaoAnnex6', 'cfr121_639', 'cfr121_645'] as const) {
      const parsed = reservesSchema.safeParse({ preset: p, alternate: null });
      expect(parsed.success).toBe(true);
      if (parsed.success) expect(parsed.data).toEqual(reservesForPreset(p, ALTERNATE));
    }
    // custom has no schema defaults for fraction and time: its preset must still parse.
    expect(reservesSchema.safeParse(reservesForPreset('custom', ALTERNATE)).success).toBe(true);
  });

  it('the alternate given is kept', () => {
    const alt = { distance: 370400, altitude: 7620, mach: 0.6 } as unknown as Parameters<typeof reservesForPreset>[1];
    for (const p of PRESETS) expect(reservesForPreset(p, alt).alternate).toBe(alt);
  });
});
