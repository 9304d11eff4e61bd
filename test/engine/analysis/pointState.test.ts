import { describe, expect, it } from 'vitest';
import { airAt, levelPoint } from '../../../engine/analysis/pointState';
import { expectOk } from '../../../engine/core/result';
import { expectClose } from '../../support/assertInDelta';
import { G0, TEST_POLAR, analyticPropulsion, parabolicAero } from './analyticModels';

describe('levelPoint', () => {
  it('levelPoint gives Ps = (T - D) V / W with V = M a (energy method, Anderson ch. 5)', () => {
    const models = { aero: parabolicAero(TEST_POLAR), propulsion: analyticPropulsion({ thrust_N: 40e3, lapse: 'constant', tsfc_kg_N_s: 1.6e-5 }) };
    const air = expectOk(airAt(11000, 0), 'air');
    // a = sqrt(1.4 * 287.05287 * 216.65) at 11 km ISA (U.S. Standard Atmosphere 1976)
    expectClose(air.speedOfSound_m_s, Math.sqrt(1.4 * 287.05287 * 216.65), { rel: 1e-6 }, 'U.S. Standard Atmosphere 1976');
    const p = levelPoint(models, { altitude_m: 11000, mass_kg: 50000, rating: 'maxCruise', isaDev_K: 0 }, air.speedOfSound_m_s, 0.7);
    const drag = models.aero.drag({ altitude_m: 11000, mach: 0.7, mass_kg: 50000, loadFactor: 1 }).drag_N;
    expectClose(p.drag_N, drag, { rel: 1e-15 });
    expectClose(p.thrustAvailable_N, 40e3, { rel: 1e-15 });
    expectClose(p.specificExcessPower_m_s, ((40e3 - drag) * 0.7 * air.speedOfSound_m_s) / (50000 * G0), { rel: 1e-12 }, 'Ps definition');
  });

  it('airAt names the altitude when it is out of the atmosphere range', () => {
    const r = airAt(500000, 0);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('atmosphere_out_of_range');
      expect(r.error.message).toMatch(/altitude 500000 m/);
    }
  });
});
