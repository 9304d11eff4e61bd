import { describe, expect, it, vi } from 'vitest';
import { altitudeOfPressure, casOfMach, heldCasMach, machOfCas, missionAir, transitionAltitude } from '../../../engine/mission/missionAtmosphere';
import { casFromMach } from '../../../engine/aero/airspeeds';
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

describe('casOfMach asked again (its table of answers)', () => {
  it('gives casFromMach to the bit in any order of asking, with entries evicted, subsonic and supersonic', () => {
    // The reference is engine/aero/airspeeds.ts casFromMach (NACA Report 1135 eqs. 44 and 100), which keeps no
    // table; Object.is tells every bit. 400 pairs (Mach, pressure) asked three times in different orders, far more
    // than the table holds, repeats and -0 among them.
    let s = 11;
    const next = () => {
      s = (Math.imul(s, 1664525) + 1013904223) >>> 0; // Numerical Recipes' LCG constants (from memory)
      return s / 2 ** 32;
    };
    const pairs: [number, number][] = [[0, 101325], [-0, 101325], [0.78, 17873.4], [0.78, 17873.4], [1.6, 5000]];
    for (let i = 0; i < 400; i++) pairs.push([next() * 1.9, 3000 + next() * 100000]);
    for (let round = 0; round < 3; round++) {
      for (let i = 0; i < pairs.length; i++) {
        const [mach, p] = pairs[(i * (2 * round + 1) + round * 31) % pairs.length]!;
        expect(Object.is(casOfMach(mach, p), casFromMach(mach, p))).toBe(true);
      }
    }
    expect(() => casOfMach(Number.NaN, 101325)).toThrow(/Mach/);
    expect(() => casOfMach(0.5, 0)).toThrow(/pressure/);
  });
});

describe('tables of answers across whole solves', () => {
  it('a demo solve after other missions equals, bit for bit, the same solve on fresh modules (every table cold)', async () => {
    // The reference is a solve on a fresh copy of every engine module (vi.resetModules): nothing remembered, so each
    // pressure, CAS and drag is computed at its first ask. The warm side first flies other payloads, ranges and an
    // ISA deviation on the same modules, so the tables hold other missions' entries, partly evicted.
    // toStrictEqual compares numbers with Object.is: every figure, leg row, caution and time-history column.
    const load = async () => {
      const [{ solveMission }, { demoMissionInput }] = await Promise.all([
        import('../../../engine/mission/solveMission'),
        import('./support/demoProject'),
      ]);
      return { solveMission, input: demoMissionInput() };
    };
    const warm = await load();
    const NM = 1852;
    const solve = warm.input.solve;
    if (solve.kind !== 'payloadRange') throw new Error('the demo project is a payload-range mission');
    for (const [payload_kg, range_m, isaDev_K] of [[solve.payload_kg + 150, 2200 * NM, 0], [solve.payload_kg, 1200 * NM, 15], [solve.payload_kg - 100, solve.range_m, -10]] as const) {
      expect(warm.solveMission({ ...warm.input, isaDev_K, solve: { ...solve, payload_kg, range_m } }).status).toBe('ok');
    }
    const warmResult = warm.solveMission(warm.input);
    vi.resetModules();
    const cold = await load();
    expect(cold.solveMission).not.toBe(warm.solveMission); // a fresh module graph, so fresh tables
    const coldResult = cold.solveMission(cold.input);
    expect(coldResult.status).toBe('ok');
    expect(warmResult).toStrictEqual(coldResult);
  });
});
