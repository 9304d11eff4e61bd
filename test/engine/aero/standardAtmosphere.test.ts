import fc from 'fast-check';
import { describe, expect, it, vi } from 'vitest';
import { a0, p0, R_air, rho0, T0 } from '../../../engine/aero/constants';
import {
  atmosphere,
  geometricFromGeopotential,
  geopotentialFromGeometric,
  isaLapseRate_K_m,
  isaPressureAt,
  MAX_PRESSURE_ALTITUDE_M,
  MIN_PRESSURE_ALTITUDE_M,
  pressureAltitude,
  type AtmosphereState,
} from '../../../engine/aero/standardAtmosphere';
import { expectOk } from '../../../engine/core/result';
import { expectClose } from '../../support/assertInDelta';

function at(h_m: number, isaDev_K = 0): AtmosphereState {
  return expectOk(atmosphere(h_m, isaDev_K), `atmosphere(${h_m}, ${isaDev_K})`);
}

describe('constants', () => {
  it('are the U.S. Standard Atmosphere 1976 sea-level values', () => {
    // ICAO Doc 7488 (R = 287.05287 J/(kg K)) and U.S. Standard Atmosphere 1976 Part 4 tables at 0 m (from memory):
    // rho0 = 1.2250 kg/m^3, a0 = 340.294 m/s.
    expectClose(R_air, 287.05287, { abs: 5e-6 }, 'ICAO Doc 7488 R* / M');
    expectClose(rho0, 1.225, { abs: 5e-5 }, 'USSA 1976 table, 0 m');
    expectClose(a0, 340.294, { abs: 5e-4 }, 'USSA 1976 table, 0 m');
    expect(p0).toBe(101325);
    expect(T0).toBe(288.15);
  });
});

describe('atmosphere at the 1976 layer bases (geopotential)', () => {
  // U.S. Standard Atmosphere 1976, Table 4: base geopotential altitude, temperature and pressure
  // (from memory; the table prints pressure to 7 significant digits).
  const bases: readonly [number, number, number][] = [
    [0, 288.15, 101325.0],
    [11000, 216.65, 22632.06],
    [20000, 216.65, 5474.889],
    [32000, 228.65, 868.0187],
    [47000, 270.65, 110.9063],
    [51000, 270.65, 66.93887],
    [71000, 214.65, 3.95642],
  ];
  for (const [h, t, p] of bases) {
    it(`atmosphere(${h}) has T = ${t} K and p = ${p} Pa`, () => {
      const s = at(h);
      expectClose(s.temperature_K, t, { abs: 1e-9 }, 'USSA 1976 Table 4');
      expectClose(s.pressure_Pa, p, { rel: 5e-7 }, 'USSA 1976 Table 4');
    });
  }
});

describe('atmosphere against the 1976 tables by geometric altitude', () => {
  // U.S. Standard Atmosphere 1976, Part 4, Table I (SI units), rows by GEOMETRIC altitude Z
  // (from memory): T printed to 0.001 K, p and rho to 5 significant digits. The engine takes
  // GEOPOTENTIAL pressure altitude H, so each Z is converted with H = r0 Z / (r0 + Z), r0 = 6356766 m.
  // An independent numpy implementation (test/reference/atmosphere_airspeed_reference.py) reproduces
  // every row.
  const rows: readonly { z: number; t: number; p: number; rho: number }[] = [
    { z: -5000, t: 320.676, p: 1.7776e5, rho: 1.9311 },
    { z: -2000, t: 301.154, p: 1.2778e5, rho: 1.4782 },
    { z: 0, t: 288.15, p: 1.01325e5, rho: 1.225 },
    { z: 1000, t: 281.651, p: 8.9876e4, rho: 1.1117 },
    { z: 5000, t: 255.676, p: 5.4048e4, rho: 7.3643e-1 },
    { z: 10000, t: 223.252, p: 2.65e4, rho: 4.1351e-1 },
    { z: 11000, t: 216.774, p: 2.27e4, rho: 3.648e-1 },
    { z: 15000, t: 216.65, p: 1.2112e4, rho: 1.9476e-1 },
    { z: 20000, t: 216.65, p: 5.5293e3, rho: 8.891e-2 },
    { z: 25000, t: 221.552, p: 2.5492e3, rho: 4.0084e-2 },
    { z: 30000, t: 226.509, p: 1.197e3, rho: 1.841e-2 },
    { z: 32000, t: 228.49, p: 8.8906e2, rho: 1.3555e-2 },
    { z: 47000, t: 269.684, p: 1.1585e2, rho: 1.4965e-3 },
  ];
  for (const { z, t, p, rho } of rows) {
    it(`atmosphere(H(Z = ${z} m)) matches the table to its printed precision`, () => {
      const s = at(geopotentialFromGeometric(z));
      expectClose(s.temperature_K, t, { abs: 0.0005 }, `USSA 1976 Table I, Z = ${z} m`);
      expectClose(s.pressure_Pa, p, { rel: 5e-5 }, `USSA 1976 Table I, Z = ${z} m`);
      expectClose(s.density_kg_m3, rho, { rel: 5e-5 }, `USSA 1976 Table I, Z = ${z} m`);
    });
  }

  it('converts geometric to geopotential altitude and back', () => {
    // USSA 1976 eq. 18: H = r0 Z / (r0 + Z); Table I lists H = 10,981 m at Z = 11,000 m (from memory).
    expectClose(geopotentialFromGeometric(11000), 10981, { abs: 0.5 }, 'USSA 1976 Table I');
    expectClose(geometricFromGeopotential(geopotentialFromGeometric(32000)), 32000, { abs: 1e-8 });
  });
});

describe('atmosphere against ICAO Doc 7488 (feet)', () => {
  // ICAO Doc 7488/3, Manual of the ICAO Standard Atmosphere, Table 1 in feet (from memory):
  // 10,000 ft: 268.338 K, 696.82 hPa; 35,000 ft: 218.808 K, 238.42 hPa, 0.37960 kg/m^3;
  // tropopause 11,000 m = 36,089 ft.
  it('gives 268.338 K and 696.82 hPa at 10,000 ft', () => {
    const s = at(10000 * 0.3048);
    expectClose(s.temperature_K, 268.338, { abs: 0.0005 }, 'ICAO Doc 7488');
    expectClose(s.pressure_Pa / 100, 696.82, { abs: 0.005 }, 'ICAO Doc 7488');
  });
  it('gives 218.808 K, 238.42 hPa and 0.37960 kg/m^3 at 35,000 ft', () => {
    const s = at(35000 * 0.3048);
    expectClose(s.temperature_K, 218.808, { abs: 0.0005 }, 'ICAO Doc 7488');
    expectClose(s.pressure_Pa / 100, 238.42, { abs: 0.005 }, 'ICAO Doc 7488');
    expectClose(s.density_kg_m3, 0.3796, { abs: 5e-5 }, 'ICAO Doc 7488');
  });
  it('has an isothermal layer from 36,089 ft (11,000 m) to 20,000 m', () => {
    expectClose(at(36089 * 0.3048).temperature_K, 216.65, { abs: 0.001 }, 'ICAO Doc 7488, tropopause');
    expect(at(15000).temperature_K).toBe(at(19999).temperature_K);
  });
});

describe('atmosphere asked again (its one-entry memo)', () => {
  it('gives the same ICAO Doc 7488 state at 35,000 ft whatever was asked before, and isaPressureAt agrees', () => {
    // ICAO Doc 7488/3 Table 1 (from memory): 35,000 ft 218.808 K, 238.42 hPa; 10,000 ft 696.82 hPa.
    const h = 35000 * 0.3048;
    const first = at(h);
    const warmer = at(h, 15);
    expectClose(warmer.temperature_K, 218.808 + 15, { abs: 0.0005 }, 'ICAO Doc 7488 + 15 K');
    expectClose(isaPressureAt(10000 * 0.3048) / 100, 696.82, { abs: 0.005 }, 'ICAO Doc 7488 at 10,000 ft, another altitude than the last asked');
    expectClose(isaPressureAt(h) / 100, 238.42, { abs: 0.005 }, 'ICAO Doc 7488, pressure unaffected by the deviation');
    const again = at(h);
    expect(again).toEqual(first);
    expectClose(again.temperature_K, 218.808, { abs: 0.0005 }, 'ICAO Doc 7488');
    expect(isaPressureAt(h)).toBe(first.pressure_Pa);
    expect(atmosphere(h, 150).ok).toBe(false);
    expect(at(-0).pressureAltitude_m).toBe(-0);
    expect(at(0).pressureAltitude_m).toBe(0);
  });
});

describe('atmosphere speed of sound and ratios', () => {
  it('gives a = 295.07 m/s in the isothermal layer', () => {
    // USSA 1976 Table I, Z = 15 km (from memory): 295.07 m/s.
    expectClose(at(15000).speedOfSound_m_s, 295.07, { abs: 0.005 }, 'USSA 1976 Table I');
  });
  it('gives theta, delta and sigma consistent with the state (definitions)', () => {
    const s = at(9000, -7);
    expectClose(s.theta, s.temperature_K / 288.15, { rel: 1e-15 });
    expectClose(s.delta, s.pressure_Pa / 101325, { rel: 1e-15 });
    expectClose(s.sigma, s.delta / s.theta, { rel: 1e-12 }, 'perfect gas: sigma = delta / theta');
    expectClose(s.density_kg_m3, s.pressure_Pa / (287.05287 * s.temperature_K), { rel: 1e-8 }, 'perfect gas');
    expectClose(s.speedOfSound_m_s, Math.sqrt(1.4 * 287.05287 * s.temperature_K), { rel: 1e-8 }, 'a = sqrt(gamma R T)');
  });
  it('is continuous across every layer boundary', () => {
    for (const h of [11000, 20000, 32000, 47000, 51000]) {
      const below = at(h - 1e-6);
      const above = at(h + 1e-6);
      expectClose(above.pressure_Pa, below.pressure_Pa, { rel: 1e-9 }, `continuity at ${h} m`);
      expectClose(above.temperature_K, below.temperature_K, { abs: 1e-8 }, `continuity at ${h} m`);
    }
  });
});

describe('atmosphere with an ISA deviation', () => {
  it('shifts temperature, keeps pressure and scales density and speed of sound', () => {
    // Pressure altitude is defined by pressure, so a deviation leaves p unchanged (common practice).
    const std = at(10668);
    const hot = at(10668, 15);
    expectClose(hot.temperature_K, std.temperature_K + 15, { abs: 1e-12 });
    expect(hot.pressure_Pa).toBe(std.pressure_Pa);
    expect(hot.delta).toBe(std.delta);
    expect(hot.isaTemperature_K).toBe(std.temperature_K);
    expectClose(hot.density_kg_m3, (std.density_kg_m3 * std.temperature_K) / hot.temperature_K, { rel: 1e-12 }, 'perfect gas');
    expectClose(hot.speedOfSound_m_s, std.speedOfSound_m_s * Math.sqrt(hot.temperature_K / std.temperature_K), { rel: 1e-12 });
    expect(hot.isaDev_K).toBe(15);
  });
  it('accepts -100 K to +100 K and refuses a deviation outside, naming the range', () => {
    // The coldest layer is 214.65 K (USSA 1976 Table 4, 71 km), so -100 K keeps T > 0.
    expect(at(71000, -100).temperature_K).toBeCloseTo(114.65, 10);
    expect(at(0, 100).temperature_K).toBeCloseTo(388.15, 10);
    for (const dev of [-216.65, 100.5, 4e305]) {
      const r = atmosphere(11000, dev);
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.error.code).toBe('isa_dev_out_of_range');
        expect(r.error.message).toContain('-100 K to +100 K');
      }
    }
  });
});

describe('atmosphere out of range and bad input', () => {
  it('returns altitude_out_of_range naming the range below -5,004 m and above 71,000 m', () => {
    for (const h of [MIN_PRESSURE_ALTITUDE_M - 1, MAX_PRESSURE_ALTITUDE_M + 1]) {
      const r = atmosphere(h);
      expect(r.ok).toBe(false);
      if (!r.ok && r.error.code === 'altitude_out_of_range') {
        expect(r.error.altitude_m).toBe(h);
        // Geometric -5,000 m (the bottom of the 1976 tables) as geopotential: H = r0 Z / (r0 + Z).
        expectClose(r.error.min_m, -5003.936, { abs: 0.001 }, 'USSA 1976 eq. 18');
        expect(r.error.max_m).toBe(71000);
        expect(r.error.message).toContain('-5004 m to 71000 m');
      } else {
        expect.fail(`expected altitude_out_of_range for ${h}`);
      }
    }
  });
  it('serves both ends of its range', () => {
    expect(atmosphere(MIN_PRESSURE_ALTITUDE_M).ok).toBe(true);
    expect(atmosphere(MAX_PRESSURE_ALTITUDE_M).ok).toBe(true);
  });
  it('returns not_finite for NaN or infinite input', () => {
    for (const [h, d] of [[Number.NaN, 0], [Infinity, 0], [0, Number.NaN]] as const) {
      const r = atmosphere(h, d);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error.code).toBe('not_finite');
    }
  });
});

describe('pressureAltitude', () => {
  it('inverts the pressure of atmosphere() in every layer', () => {
    for (let h = -5000; h <= 71000; h += 1234.5) {
      const back = expectOk(pressureAltitude(at(h).pressure_Pa), 'pressureAltitude');
      expectClose(back, h, { abs: 1e-6 }, 'round trip');
    }
  });
  it('gives 11,000 m at 22,632.06 Pa and 0 m at 101,325 Pa', () => {
    // USSA 1976 Table 4 (from memory).
    expectClose(expectOk(pressureAltitude(22632.06), 'p'), 11000, { abs: 0.01 }, 'USSA 1976 Table 4');
    expectClose(expectOk(pressureAltitude(101325), 'p'), 0, { abs: 1e-9 });
  });
  it('gives about 5,000 ft at 843.1 hPa', () => {
    // ICAO Doc 7488 in feet (from memory): 5,000 ft <-> 843.07 hPa.
    expectClose(expectOk(pressureAltitude(84307), 'p') / 0.3048, 5000, { abs: 1 }, 'ICAO Doc 7488');
  });
  it('returns pressure_out_of_range and not_finite for bad pressures', () => {
    for (const p of [0, -1, 2e5, 1]) {
      const r = pressureAltitude(p);
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.error.code).toBe('pressure_out_of_range');
        expect(r.error.message).toContain(`${p} Pa`);
      }
    }
    const nan = pressureAltitude(Number.NaN);
    expect(nan.ok ? 'ok' : nan.error.code).toBe('not_finite');
  });
});

describe('atmosphere over its whole range (property)', () => {
  it('is finite and positive, and pressure falls with altitude, for any altitude and deviation', () => {
    const altitude = fc.double({ min: MIN_PRESSURE_ALTITUDE_M, max: MAX_PRESSURE_ALTITUDE_M, noNaN: true });
    fc.assert(
      fc.property(altitude, altitude, fc.double({ min: -100, max: 100, noNaN: true }), (h1, h2, dev) => {
        const a = at(h1, dev);
        const b = at(h2, dev);
        for (const v of [a.temperature_K, a.pressure_Pa, a.density_kg_m3, a.speedOfSound_m_s, a.theta, a.delta, a.sigma]) {
          if (!(Number.isFinite(v) && v > 0)) return false;
        }
        // Hydrostatic balance: pressure decreases upwards (common practice); equal only within rounding.
        return h1 <= h2 ? a.pressure_Pa >= b.pressure_Pa : a.pressure_Pa <= b.pressure_Pa;
      }),
      { numRuns: 1000 },
    );
  });
  it('never returns a non-finite value for any double input', () => {
    fc.assert(
      fc.property(fc.double(), fc.double(), (h, dev) => {
        const r = atmosphere(h, dev);
        if (!r.ok) return r.error.message.length > 0;
        return Object.values(r.value).every((v) => Number.isFinite(v));
      }),
      { numRuns: 1000 },
    );
  });
});

describe('isaLapseRate_K_m', () => {
  it('isaLapseRate_K_m gives each layer its 1976 Table 4 lapse rate, the first layer extended below sea level', () => {
    // U.S. Standard Atmosphere 1976, Table 4 (geopotential layer bases and lapse rates; from memory)
    expect(isaLapseRate_K_m(-2000)).toBe(-0.0065);
    expect(isaLapseRate_K_m(10999)).toBe(-0.0065);
    expect(isaLapseRate_K_m(11000)).toBe(0);
    expect(isaLapseRate_K_m(20000)).toBe(0.001);
    expect(isaLapseRate_K_m(40000)).toBe(0.0028);
    expect(isaLapseRate_K_m(50000)).toBe(0);
    expect(isaLapseRate_K_m(60000)).toBe(-0.0028);
  });
});

/** A deterministic sequence in [0, 1) (a linear congruential generator; Numerical Recipes' constants, from memory). */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

describe('isaPressureAt asked again (its table of answers)', () => {
  it('gives, in any order of asking and with entries evicted, the bits a fresh module computes at its first ask', async () => {
    // The reference is the pressure computed without the table: a fresh copy of the module asked each altitude
    // once, in reverse order, every ask a miss. The asks here repeat altitudes, interleave far more altitudes than
    // the table holds (so entries collide and are replaced) and include out-of-range ones (NaN, no entry).
    const next = lcg(7);
    const altitudes = [-0, 0, 11000, 20000, 32000, 47000, 51000, MIN_PRESSURE_ALTITUDE_M, MAX_PRESSURE_ALTITUDE_M, 12496.800000000001];
    for (let i = 0; i < 1500; i++) altitudes.push(MIN_PRESSURE_ALTITUDE_M + next() * (MAX_PRESSURE_ALTITUDE_M - MIN_PRESSURE_ALTITUDE_M));
    for (let i = 0; i < 200; i++) altitudes.push(Math.round(next() * 13000) * 0.3048);
    const distinct = [...new Set(altitudes)];
    vi.resetModules();
    const fresh = await import('../../../engine/aero/standardAtmosphere');
    const reference = new Map<number, number>();
    for (const h of [...distinct].reverse()) reference.set(h, fresh.isaPressureAt(h));
    expect(Object.is(fresh.isaPressureAt(-0), fresh.isaPressureAt(0))).toBe(true);
    for (let round = 0; round < 3; round++) {
      for (let i = 0; i < altitudes.length; i++) {
        const h = altitudes[(i * (2 * round + 1) + round * 97) % altitudes.length]!;
        expect(Object.is(isaPressureAt(h), reference.get(h))).toBe(true);
        if (i % 5 === 0) {
          expect(isaPressureAt(MAX_PRESSURE_ALTITUDE_M + 1)).toBeNaN();
          expect(isaPressureAt(Number.NaN)).toBeNaN();
          expect(isaPressureAt(MIN_PRESSURE_ALTITUDE_M - 1)).toBeNaN();
        }
      }
    }
    // And the answers are the 1976 standard's: ICAO Doc 7488 at 10,000 ft 696.82 hPa (from memory).
    expectClose(isaPressureAt(10000 * 0.3048) / 100, 696.82, { abs: 0.005 }, 'ICAO Doc 7488');
    expect(isaPressureAt(12496.800000000001)).toBe(at(12496.800000000001).pressure_Pa);
  });
});
