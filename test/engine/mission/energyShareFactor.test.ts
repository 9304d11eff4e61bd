import { describe, it } from 'vitest';
import { energyShareFactor } from '../../../engine/mission/energyShareFactor';
import { casOfMach, machOfCas, missionAir } from '../../../engine/mission/missionAtmosphere';
import { expectClose } from '../../support/assertInDelta';

const G0 = 9.80665;

/** 1/f - 1 = (T_isa/T)(V/g) dV/dHp, dV/dHp by central differences of the held-speed V(Hp) (definition of f). */
function numericalFactor(held: 'cas' | 'mach', value: number, h: number, dev: number): number {
  const v = (hp: number) => {
    const air = missionAir(hp, dev);
    const mach = held === 'mach' ? value : machOfCas(value, air.pressure_Pa);
    return mach * air.speedOfSound_m_s;
  };
  const d = 0.5;
  const dv = (v(h + d) - v(h - d)) / (2 * d);
  const air = missionAir(h, dev);
  return 1 / (1 + (air.isaTemperature_K / air.temperature_K) * (v(h) / G0) * dv);
}

describe('energyShareFactor', () => {
  it('energyShareFactor at constant Mach in the troposphere is [1 - 0.13335 M^2]^-1', () => {
    // kappa R beta / (2 g0) = 1.4 * 287.05287 * (-0.0065) / (2 * 9.80665) = -0.133184 (ISA lapse; performance texts).
    const m = 0.78;
    expectClose(energyShareFactor('mach', m, -0.0065, 250, 250), 1 / (1 - 0.1331844 * m * m), { rel: 1e-6 }, 'closed form');
  });

  it('energyShareFactor at constant Mach above the tropopause is 1', () => {
    expectClose(energyShareFactor('mach', 0.8, 0, 216.65, 216.65), 1, { abs: 0 }, 'no temperature gradient');
  });

  for (const [held, value, h, dev] of [
    ['cas', 150, 3000, 0],
    ['cas', 150, 8000, 15],
    ['cas', 140, 12000, -10],
    ['mach', 0.8, 6000, 20],
    ['mach', 0.8, 15000, 0],
  ] as const) {
    it(`energyShareFactor matches the finite-difference definition for held ${held} ${value} at ${h} m, ISA${dev >= 0 ? '+' : ''}${dev}`, () => {
      const air = missionAir(h, dev);
      const mach = held === 'mach' ? value : machOfCas(value, air.pressure_Pa);
      const closed = energyShareFactor(held, mach, air.lapse_K_m, air.temperature_K, air.isaTemperature_K);
      expectClose(closed, numericalFactor(held, value, h, dev), { rel: 1e-6 }, 'f = [1 + (T_isa/T)(V/g) dV/dHp]^-1 by finite differences');
    });
  }

  it('casOfMach inverts machOfCas (NACA Report 1135 pitot relation)', () => {
    const p = missionAir(9000, 0).pressure_Pa;
    expectClose(casOfMach(machOfCas(140, p), p), 140, { rel: 1e-12 }, 'round trip');
  });
});
