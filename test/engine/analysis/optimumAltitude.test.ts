import { describe, expect, it } from 'vitest';
import { optimumAltitude } from '../../../engine/analysis/optimumAltitude';
import { specificRange } from '../../../engine/analysis/specificRange';
import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';
import { expectOk } from '../../../engine/core/result';
import { expectClose } from '../../support/assertInDelta';
import { TEST_POLAR, analyticPropulsion, parabolicAero } from './analyticModels';

/** No limits: residual climb rate 0 and buffet margin 1 g, so the optimum is the best SR alone. */
const NO_LIMITS = { ...DEFAULT_CAUTION_SETTINGS, minResidualClimbRate_m_s: 0, minBuffetLoadFactor: 1 };

const models = {
  aero: parabolicAero({ ...TEST_POLAR, mCrit: 0.78 }),
  propulsion: analyticPropulsion({ thrust_N: 160e3, lapse: 'mattingly', tsfc_kg_N_s: 1.6e-5 }),
};

// Each optimum flies about a hundred specific-range searches: generous limits on a shared machine, not speed checks.
describe('optimumAltitude', { timeout: 60_000 }, () => {
  it('optimumAltitude matches the scipy reference for the Mattingly-lapse model', () => {
    const r = expectOk(
      optimumAltitude(models, { mass_kg: 60000, isaDev_K: 0, altitudeRange: [3000, 12000], cautionSettings: NO_LIMITS }),
      'optimum altitude',
    );
    // test/reference/analysisReference.py (no limits): 9897.191 m, best SR 422.760364 m/kg
    expect(r.binding).toBe('specificRange');
    expectClose(r.unconstrainedAltitude_m, 9897.191, { abs: 5 }, 'scipy reference');
    expectClose(r.altitude_m, 9897.191, { abs: 5 }, 'scipy reference');
    expectClose(r.specificRange_m_kg, 422.760364, { rel: 1e-5 }, 'scipy reference');
  });

  it('optimumAltitude beats the best SR 300 m above and below', () => {
    const r = expectOk(
      optimumAltitude(models, { mass_kg: 50000, isaDev_K: 0, altitudeRange: [3000, 12000], cautionSettings: NO_LIMITS }),
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
        cautionSettings: NO_LIMITS,
      }),
      'optimum altitude',
    );
    const ids = r.cautions.map((c) => c.id);
    expect(ids).toContain('mmo_exceeded');
    // The optimum honours the buffet margin, so a margin no altitude meets is an answer of its own, not a caution.
    const none = optimumAltitude(models, { mass_kg: 60000, isaDev_K: 0, altitudeRange: [3000, 12000], cautionSettings: { ...NO_LIMITS, minBuffetLoadFactor: 5 } });
    expect(none.ok).toBe(false);
    if (!none.ok) expect(none.error.message).toMatch(/buffet margin/);
    const quiet = expectOk(
      optimumAltitude(models, { mass_kg: 60000, isaDev_K: 0, altitudeRange: [3000, 12000], mmo: 0.95, cautionSettings: { ...DEFAULT_CAUTION_SETTINGS, minBuffetLoadFactor: 1.0 } }),
      'optimum altitude',
    );
    expect(quiet.cautions.map((c) => c.id)).not.toContain('mmo_exceeded');
    expect(quiet.cautions.map((c) => c.id)).not.toContain('buffet_margin_low');
  });

  it('optimumAltitude is the best SR among the altitudes meeting the cruise-ceiling climb rate and the buffet margin', () => {
    // Limits (common practice): Ps = (T - D) V / W at maxClimb and the best-range Mach at least 300 ft/min (the cruise
    // ceiling's residual rate), load factor to buffet onset at least 1.3 g. Ps definition: energy method (Anderson,
    // Aircraft Performance and Design, ch. 5).
    const heavy = 75000;
    const free = expectOk(optimumAltitude(models, { mass_kg: heavy, isaDev_K: 0, altitudeRange: [3000, 13000], cautionSettings: NO_LIMITS }), 'free');
    const r = expectOk(optimumAltitude(models, { mass_kg: heavy, isaDev_K: 0, altitudeRange: [3000, 13000], cautionSettings: DEFAULT_CAUTION_SETTINGS }), 'limited');
    expectClose(r.unconstrainedAltitude_m, free.altitude_m, { abs: 1e-6 }, 'the same unconstrained optimum');
    expect(r.altitude_m).toBeLessThanOrEqual(free.altitude_m + 1e-6);
    expect(r.climbRate_m_s).toBeGreaterThanOrEqual(DEFAULT_CAUTION_SETTINGS.minResidualClimbRate_m_s - 1e-3);
    expect(r.buffetLoadFactor).toBeGreaterThanOrEqual(DEFAULT_CAUTION_SETTINGS.minBuffetLoadFactor - 1e-6);
    const lowest = Math.min(free.altitude_m, r.cruiseCeilingAltitude_m ?? Infinity, r.buffetLimitAltitude_m ?? Infinity);
    expectClose(r.altitude_m, lowest, { abs: 1e-6 }, 'optimum = lowest of the unconstrained optimum and the limit altitudes');
    if (r.binding === 'cruiseCeiling') expectClose(r.climbRate_m_s, DEFAULT_CAUTION_SETTINGS.minResidualClimbRate_m_s, { abs: 0.01 }, 'on the cruise ceiling');
    if (r.binding === 'buffetMargin') expectClose(r.buffetLoadFactor, DEFAULT_CAUTION_SETTINGS.minBuffetLoadFactor, { abs: 1e-3 }, 'on the buffet margin');
    expect(r.binding).not.toBe('specificRange');
  });
});
