import { describe, expect, it } from 'vitest';
import { optimumAltitude } from '../../../engine/analysis/optimumAltitude';
import { specificRange } from '../../../engine/analysis/specificRange';
import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';
import { expectOk } from '../../../engine/core/result';
import { expectClose } from '../../support/assertInDelta';
import { TEST_POLAR, analyticPropulsion, parabolicAero } from './analyticModels';

const models = {
  aero: parabolicAero({ ...TEST_POLAR, mCrit: 0.78 }),
  propulsion: analyticPropulsion({ thrust_N: 160e3, lapse: 'mattingly', tsfc_kg_N_s: 1.6e-5 }),
};

describe('optimumAltitude', () => {
  it('optimumAltitude matches the scipy reference for the Mattingly-lapse model', () => {
    const r = expectOk(
      optimumAltitude(models, { mass_kg: 60000, isaDev_K: 0, altitudeRange: [3000, 12000], cautionSettings: DEFAULT_CAUTION_SETTINGS }),
      'optimum altitude',
    );
    // test/reference/analysisReference.py: 9897.191 m, best SR 422.760364 m/kg
    expectClose(r.altitude_m, 9897.191, { abs: 5 }, 'scipy reference');
    expectClose(r.specificRange_m_kg, 422.760364, { rel: 1e-5 }, 'scipy reference');
  });

  it('optimumAltitude beats the best SR 300 m above and below', () => {
    const r = expectOk(
      optimumAltitude(models, { mass_kg: 50000, isaDev_K: 0, altitudeRange: [3000, 12000], cautionSettings: DEFAULT_CAUTION_SETTINGS }),
      'optimum altitude',
    );
    for (const dh of [-300, 300]) {
      const s = specificRange(models, { altitude_m: r.altitude_m + dh, mass_kg: 50000, isaDev_K: 0 });
      if (s.ok) expect(s.value.maxSpecificRange_m_kg).toBeLessThan(r.specificRange_m_kg);
    }
  });

  it('optimumAltitude raises buffet and MMO cautions at the optimum', () => {
    const r = expectOk(
      optimumAltitude(models, {
        mass_kg: 60000,
        isaDev_K: 0,
        altitudeRange: [3000, 12000],
        mmo: 0.7,
        cautionSettings: { ...DEFAULT_CAUTION_SETTINGS, minBuffetLoadFactor: 5 },
      }),
      'optimum altitude',
    );
    const ids = r.cautions.map((c) => c.id);
    expect(ids).toContain('mmo_exceeded');
    expect(ids).toContain('buffet_margin_low');
    const quiet = expectOk(
      optimumAltitude(models, { mass_kg: 60000, isaDev_K: 0, altitudeRange: [3000, 12000], mmo: 0.95, cautionSettings: { ...DEFAULT_CAUTION_SETTINGS, minBuffetLoadFactor: 1.0 } }),
      'optimum altitude',
    );
    expect(quiet.cautions.map((c) => c.id)).not.toContain('mmo_exceeded');
    expect(quiet.cautions.map((c) => c.id)).not.toContain('buffet_margin_low');
  });
});
