import { describe, expect, it } from 'vitest';
import { specificRange } from '../../../engine/analysis/specificRange';
import { expectOk } from '../../../engine/core/result';
import { expectClose } from '../../support/assertInDelta';
import { G0, TEST_POLAR, analyticPropulsion, isaPressure_Pa, parabolicAero } from './analyticModels';

const TSFC = 1.6e-5;
const constantTsfc = {
  aero: parabolicAero(TEST_POLAR),
  propulsion: analyticPropulsion({ thrust_N: 100e3, lapse: 'constant', tsfc_kg_N_s: TSFC }),
};

describe('specificRange', () => {
  it('specificRange puts the maximum-range Mach of a constant-TSFC jet at CL = sqrt(CD0 / (3K))', () => {
    // Anderson, Aircraft Performance and Design, ch. 5: max range of a jet with constant TSFC
    // flies at the maximum of sqrt(CL)/CD, i.e. CL = sqrt(CD0 / (3K)).
    const h = 8000;
    const m = 55000;
    const r = expectOk(specificRange(constantTsfc, { altitude_m: h, mass_kg: m, isaDev_K: 0 }), 'specific range');
    const clStar = Math.sqrt(TEST_POLAR.cd0 / (3 * TEST_POLAR.k));
    const qStar = (m * G0) / (TEST_POLAR.wingArea_m2 * clStar);
    const machStar = Math.sqrt(qStar / (0.7 * isaPressure_Pa(h))); // q = 0.7 p M^2 (NACA Report 1135)
    expectClose(r.maxRangeMach, machStar, { abs: 1e-7 }, 'Anderson, CL = sqrt(CD0/3K)');
    expectClose(r.maxRangeMach, 0.79044865, { abs: 1e-7 }, 'test/reference/analysisReference.py, scipy');
    // SR = V / (c D): V = M a, a = sqrt(gamma R T), T = 288.15 - 6.5 h/1000 (U.S. Standard Atmosphere 1976)
    const a = Math.sqrt(1.4 * 287.05287 * (288.15 - 0.0065 * h));
    const cd = TEST_POLAR.cd0 + TEST_POLAR.k * clStar * clStar;
    const D = qStar * TEST_POLAR.wingArea_m2 * cd;
    expectClose(r.maxSpecificRange_m_kg, (machStar * a) / (TSFC * D), { rel: 1e-6 }, 'SR = V/(c D), Anderson');
  });

  it('specificRange finds the long-range Mach at 99 % of the best SR on the fast side', () => {
    const r = expectOk(specificRange(constantTsfc, { altitude_m: 8000, mass_kg: 55000, isaDev_K: 0 }), 'specific range');
    // test/reference/analysisReference.py (scipy brentq): 0.8599661287; 99 % is common practice
    expectClose(r.longRangeMach!, 0.8599661287, { abs: 1e-7 }, 'scipy reference');
    expect(r.longRangeMach!).toBeGreaterThan(r.maxRangeMach);
    expectClose(r.longRangeSpecificRange_m_kg!, 0.99 * r.maxSpecificRange_m_kg, { rel: 1e-12 });
  });

  it('specificRange curves are TAS over fuel flow and null where thrust cannot hold level flight', () => {
    const weak = {
      aero: parabolicAero({ ...TEST_POLAR, mCrit: 0.78 }),
      propulsion: analyticPropulsion({ thrust_N: 160e3, lapse: 'mattingly', tsfc_kg_N_s: TSFC }),
    };
    const r = expectOk(specificRange(weak, { altitude_m: 9000, mass_kg: 60000, isaDev_K: 0, samples: 21 }), 'specific range');
    // The feasible band is the crossover band: test/reference/analysisReference.py 0.5558286009..0.8802441604
    expectClose(r.feasibleMachRange[0], 0.5558286009, { abs: 1e-6 }, 'scipy reference');
    expectClose(r.feasibleMachRange[1], 0.8802441604, { abs: 1e-6 }, 'scipy reference');
    r.curves.mach.forEach((_, i) => {
      const sr = r.curves.specificRange_m_kg[i];
      const ff = r.curves.fuelFlow_kg_s[i];
      expect(sr).not.toBeNull();
      expectClose(sr!, r.curves.tas_m_s[i]! / ff!, { rel: 1e-12 });
      expectClose(ff!, TSFC * r.curves.drag_N[i]!, { rel: 1e-9 }, 'constant TSFC: fuel flow = c D');
    });
  });

  it('specificRange reports no_solution above the ceiling and rejects a bad long-range fraction', () => {
    const weak = {
      aero: parabolicAero({ ...TEST_POLAR, mCrit: 0.78 }),
      propulsion: analyticPropulsion({ thrust_N: 160e3, lapse: 'mattingly', tsfc_kg_N_s: TSFC }),
    };
    const r = specificRange(weak, { altitude_m: 13000, mass_kg: 60000, isaDev_K: 0 });
    expect(r.ok ? 'ok' : r.error.code).toBe('no_solution');
    const r2 = specificRange(weak, { altitude_m: 9000, mass_kg: 60000, isaDev_K: 0, longRangeFraction: 1.2 });
    expect(r2.ok ? 'ok' : r2.error.message).toMatch(/long-range fraction 1.2/);
  });
});

describe('specificRange cautions', () => {
  it('specificRange raises buffet-margin and MMO cautions at the best-range and long-range Machs when asked', async () => {
    const { DEFAULT_CAUTION_SETTINGS } = await import('../../../engine/cautions/cautionSettings');
    const q = { altitude_m: 8000, mass_kg: 55000, isaDev_K: 0 };
    const quiet = expectOk(specificRange(constantTsfc, q), 'specific range');
    expect(quiet.cautions.map((c) => c.id)).not.toContain('mmo_exceeded');
    // best-range M 0.790, long-range M 0.860 (scipy reference): MMO 0.82 is exceeded only at the long-range Mach.
    const r = expectOk(specificRange(constantTsfc, { ...q, mmo: 0.82, cautionSettings: { ...DEFAULT_CAUTION_SETTINGS, minBuffetLoadFactor: 3 } }), 'specific range');
    const mmo = r.cautions.filter((c) => c.id === 'mmo_exceeded');
    expect(mmo).toHaveLength(1);
    expectClose(mmo[0]!.value!, 0.8599661287, { abs: 1e-7 }, 'scipy reference');
    expect(mmo[0]!.message).toMatch(/long-range Mach/);
    expect(r.cautions.filter((c) => c.id === 'buffet_margin_low').length).toBe(2);
  });
});
