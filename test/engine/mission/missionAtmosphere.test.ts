import { describe, expect, it } from 'vitest';
import { altitudeOfPressure, casOfMach, heldCasMach, machOfCas, missionAir, transitionAltitude } from '../../../engine/mission/missionAtmosphere';
import { expectClose } from '../../support/assertInDelta';

describe('missionAtmosphere', () => {
  // U.S. Standard Atmosphere 1976 table values at GEOPOTENTIAL (= pressure) altitude (from memory:
  // 5 km 255.65 K 54,019.9 Pa; 11 km 216.65 K 22,632 Pa; 15 km 216.65 K 12,044.6 Pa; 20 km 5,474.9 Pa).
  for (const [h, t, p] of [
    [0, 288.15, 101325],
    [5000, 255.65, 54019.9],
    [11000, 216.65, 22632],
    [15000, 216.65, 12044.6],
    [20000, 216.65, 5474.9],
  ] as const) {
    it(`missionAir at ${h} m gives the USSA 1976 temperature and pressure`, () => {
      const air = missionAir(h, 0);
      expectClose(air.temperature_K, t, { abs: 1e-9 }, 'USSA 1976');
      expectClose(air.pressure_Pa, p, { rel: 2e-4 }, 'USSA 1976 (from memory)');
      expectClose(altitudeOfPressure(air.pressure_Pa), h, { abs: 1e-6 }, 'inverse');
    });
  }

  it('missionAir with an ISA deviation keeps pressure and shifts temperature', () => {
    const a = missionAir(8000, 0);
    const b = missionAir(8000, 15);
    expectClose(b.pressure_Pa, a.pressure_Pa, { rel: 0 }, 'pressure altitude');
    expectClose(b.temperature_K, a.temperature_K + 15, { abs: 1e-12 }, 'T = T_isa + dev');
  });

  it('machOfCas at sea level is CAS / a0 for low speed and casOfMach matches at 0.5', () => {
    // At sea level CAS = TAS by definition (NACA Report 1135).
    expectClose(machOfCas(170.1, 101325), 170.1 / 340.294, { rel: 1e-5 }, 'a0 = 340.294 m/s (USSA 1976)');
    expectClose(casOfMach(0.5, 101325), 0.5 * 340.294, { rel: 1e-5 }, 'CAS = TAS at sea level');
  });

  it('heldCasMach is machOfCas to the bit along a held CAS, and CAS = TAS at sea level', () => {
    // At sea level CAS = TAS by definition (NACA Report 1135); elsewhere the held-CAS Mach is machOfCas's.
    const cas = (280 * 1852) / 3600;
    const machAt = heldCasMach(cas);
    expectClose(machAt(101325), cas / 340.294, { rel: 1e-5 }, 'a0 = 340.294 m/s (USSA 1976)');
    for (const h of [0, 3048, 7500, 11000, 12500]) {
      const p = missionAir(h, 0).pressure_Pa;
      expect(machAt(p)).toBe(machOfCas(cas, p));
    }
    expect(() => machAt(0)).toThrow(/pressure/);
    expect(() => heldCasMach(-1)(101325)).toThrow(/CAS/);
  });

  it('transitionAltitude for 300 kt and Mach 0.78 is about 29,300 ft', () => {
    // Common-practice figure: 300 KCAS / M0.78 crossover near FL290-FL300 (from memory).
    const h = transitionAltitude((300 * 1852) / 3600, 0.78);
    expectClose(h / 0.3048, 29300, { abs: 600 }, 'from memory');
    const p = missionAir(h, 0).pressure_Pa;
    expectClose(casOfMach(0.78, p), (300 * 1852) / 3600, { rel: 1e-9 }, 'CAS of M0.78 at the transition is 300 kt');
  });
});
