import { describe, expect, it } from 'vitest';
import { liftLimitMachs } from '../../../engine/analysis/liftLimitMach';
import { expectClose } from '../../support/assertInDelta';
import { G0, TEST_POLAR, isaPressure_Pa, parabolicAero } from './analyticModels';

const aero = parabolicAero(TEST_POLAR);

describe('liftLimitMachs', () => {
  it('liftLimitMachs puts the stall Mach at CL = CLmax: M = sqrt(n W / (0.7 p S CLmax))', () => {
    // CL = n W / (q S), q = 0.7 p M^2 (NACA Report 1135): closed form for a constant CLmax.
    for (const [h, m, n] of [[0, 40000, 1], [9000, 60000, 1], [11000, 55000, 1.5]] as const) {
      const r = liftLimitMachs(aero, { altitude_m: h, mass_kg: m, loadFactor: n }, 'clMax', 0.02, 0.95);
      const exact = Math.sqrt((n * m * G0) / (0.7 * isaPressure_Pa(h) * TEST_POLAR.wingArea_m2 * TEST_POLAR.clMax));
      expectClose(r.lowMach!, exact, { rel: 1e-9 }, 'closed form');
      expect(r.highMach).toBeNull();
      expect(r.exceededEverywhere).toBe(false);
    }
  });

  it('liftLimitMachs finds the low- and high-speed buffet Machs of a buffet CL falling with Mach', () => {
    // buffet CL = 1.5 - 1.2 M: n W / (0.7 p S M^2) = 1.5 - 1.2 M, i.e. M^2 (1.5 - 1.2 M) = c, has two roots
    // in (0, 0.95) when 0.325 < c < 0.347 (the cubic's maximum at M = 0.833); c ~ 0.335 here. Checked by substitution.
    const steep = parabolicAero({ ...TEST_POLAR, buffetCl: 1.5, buffetSlope: 1.2 });
    const q = { altitude_m: 12000, mass_kg: 32114, loadFactor: 1.3 };
    const r = liftLimitMachs(steep, q, 'buffetCl', 0.1, 0.95);
    expect(r.lowMach).not.toBeNull();
    expect(r.highMach).not.toBeNull();
    for (const m of [r.lowMach!, r.highMach!]) {
      const cl = (q.loadFactor * q.mass_kg * G0) / (0.7 * isaPressure_Pa(q.altitude_m) * m * m * TEST_POLAR.wingArea_m2);
      expectClose(cl, 1.5 - 1.2 * m, { rel: 1e-8 }, 'buffet onset definition');
    }
    expect(r.highMach!).toBeGreaterThan(r.lowMach!);
  });

  it('liftLimitMachs says when the limit is exceeded over the whole range, and when it is met at the range start', () => {
    const heavy = liftLimitMachs(aero, { altitude_m: 15000, mass_kg: 200000, loadFactor: 1 }, 'clMax', 0.1, 0.9);
    expect(heavy.exceededEverywhere).toBe(true);
    expect(heavy.lowMach).toBeNull();
    const light = liftLimitMachs(aero, { altitude_m: 0, mass_kg: 1000, loadFactor: 1 }, 'clMax', 0.3, 0.9);
    expect(light.exceededEverywhere).toBe(false);
    expect(light.lowMach).toBeNull();
  });
});
