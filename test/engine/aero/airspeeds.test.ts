import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  airspeedsAt,
  casFromMach,
  casMachTransitionAltitude,
  dynamicPressure_Pa,
  easFromMach,
  impactPressure_Pa,
  impactPressureRatio,
  machFromCas,
  machFromEas,
  machFromImpactPressureRatio,
  machFromTas,
  tasFromMach,
} from '../../../engine/aero/airspeeds';
import { a0, p0 } from '../../../engine/aero/constants';
import { atmosphere, type AtmosphereState } from '../../../engine/aero/standardAtmosphere';
import { expectOk } from '../../../engine/core/result';
import { expectClose } from '../../support/assertInDelta';

const FT = 0.3048; // NIST SP 811
const KT = 1852 / 3600; // NIST SP 811

function at(h_m: number, isaDev_K = 0): AtmosphereState {
  return expectOk(atmosphere(h_m, isaDev_K), 'atmosphere');
}

describe('impactPressureRatio', () => {
  it('is (1 + 0.2 M^2)^3.5 - 1 below Mach 1', () => {
    // NACA Report 1135 eq. 44 with gamma = 1.4; M = 0.5 gives p/pt = 0.8430 in the NACA 1135 table (from memory).
    expectClose(impactPressureRatio(0.5), 1 / 0.843 - 1, { rel: 2e-4 }, 'NACA 1135 Table I, M = 0.5');
    expectClose(impactPressureRatio(0.8), Math.pow(1.128, 3.5) - 1, { rel: 1e-14 }, 'NACA 1135 eq. 44');
    expect(impactPressureRatio(0)).toBe(0);
  });
  it('follows the Rayleigh pitot formula above Mach 1', () => {
    // NACA Report 1135 eq. 100 in its gamma = 1.4 numeric form: pt2/p1 = 166.92 M^7 / (7 M^2 - 1)^2.5.
    for (const m of [1.2, 1.5, 2, 3, 5]) {
      expectClose(impactPressureRatio(m) + 1, (166.92158 * m ** 7) / (7 * m * m - 1) ** 2.5, { rel: 1e-8 }, `NACA 1135 eq. 100, M = ${m}`);
    }
    // NACA 1135 Table II at M = 2 (from memory): pt2/p1 = 5.640.
    expectClose(impactPressureRatio(2) + 1, 5.64, { abs: 0.0005 }, 'NACA 1135 Table II, M = 2');
  });
  it('is continuous with a continuous slope at Mach 1', () => {
    // The normal-shock loss vanishes to third order at M = 1 (NACA 1135 eq. 99 expanded; common practice).
    const h = 1e-6;
    expectClose(impactPressureRatio(1 + 1e-12), impactPressureRatio(1), { abs: 1e-11 });
    const slopeBelow = (impactPressureRatio(1) - impactPressureRatio(1 - h)) / h;
    const slopeAbove = (impactPressureRatio(1 + h) - impactPressureRatio(1)) / h;
    expectClose(slopeAbove, slopeBelow, { rel: 1e-4 }, 'C1 continuity at M = 1');
  });
  it('is inverted by machFromImpactPressureRatio on both branches', () => {
    for (const m of [0, 0.05, 0.3, 0.78, 0.999, 1, 1.001, 1.4, 2.5, 6, 20]) {
      expectClose(machFromImpactPressureRatio(impactPressureRatio(m)), m, { abs: 1e-12, rel: 1e-12 }, `round trip M = ${m}`);
    }
  });
  it('throws for a negative or non-finite Mach (a caller bug)', () => {
    expect(() => impactPressureRatio(-0.1)).toThrow(RangeError);
    expect(() => impactPressureRatio(Number.NaN)).toThrow(RangeError);
    expect(() => machFromImpactPressureRatio(-1)).toThrow(RangeError);
  });
});

describe('casFromMach and machFromCas', () => {
  it('gives CAS = a0 = 661.48 kt at Mach 1 at sea level', () => {
    // Definition of CAS (NACA 1135 / Gracey NASA RP-1046): at p0, CAS = TAS = M a0; a0 = 340.294 m/s
    // (USSA 1976), 661.48 kt.
    expectClose(casFromMach(1, p0), a0, { rel: 1e-12 }, 'CAS definition');
    expectClose(casFromMach(1, p0) / KT, 661.48, { abs: 0.005 }, 'USSA 1976 a0');
  });
  it('equals TAS and EAS at sea level standard for any Mach', () => {
    for (const m of [0.1, 0.5, 0.9, 1.3, 2]) {
      const s = at(0);
      expectClose(casFromMach(m, s.pressure_Pa), tasFromMach(m, s.temperature_K), { rel: 1e-12 }, 'CAS definition');
      expectClose(easFromMach(m, s.pressure_Pa), tasFromMach(m, s.temperature_K), { rel: 1e-12 }, 'EAS definition');
    }
  });
  // Independent reference: test/reference/atmosphere_airspeed_reference.py (numpy/scipy from NACA 1135
  // eqs. 44 and 100 and the 1976 atmosphere). Standard airspeed tables (from memory) give M 0.78 at
  // FL350 as about 264 kt CAS and 450 kt TAS.
  const cases: readonly { ft: number; mach: number; cas: number; eas: number; tas: number }[] = [
    { ft: 35000, mach: 0.78, cas: 264.42028, eas: 250.28, tas: 449.60661 },
    { ft: 35000, mach: 0.85, cas: 290.9284, eas: 272.74102, tas: 489.95592 },
    { ft: 10000, mach: 0.5, cas: 276.82587, eas: 274.27532, tas: 319.1667 },
    { ft: 41000, mach: 0.8, cas: 236.64571, eas: 222.25765, tas: 458.85537 },
    { ft: 20000, mach: 1.5, cas: 721.47541, eas: 672.62106, tas: 921.47521 },
    { ft: 0, mach: 2.0, cas: 1322.95719, eas: 1322.95719, tas: 1322.95719 },
  ];
  for (const c of cases) {
    it(`gives ${c.cas.toFixed(1)} kt CAS at M ${c.mach} and ${c.ft} ft`, () => {
      const s = at(c.ft * FT);
      const src = `numpy reference, ${c.ft} ft M ${c.mach}`;
      expectClose(casFromMach(c.mach, s.pressure_Pa) / KT, c.cas, { abs: 1e-4 }, src);
      expectClose(easFromMach(c.mach, s.pressure_Pa) / KT, c.eas, { abs: 1e-4 }, src);
      expectClose(tasFromMach(c.mach, s.temperature_K) / KT, c.tas, { abs: 1e-4 }, src);
      expectClose(machFromCas(c.cas * KT, s.pressure_Pa), c.mach, { abs: 1e-6 }, src);
    });
  }
  it('round-trips CAS -> Mach -> CAS from 0 to 1,200 kt at several altitudes', () => {
    for (const h of [-2000, 0, 5000, 10668, 15000, 25000]) {
      const p = at(h).pressure_Pa;
      for (let kt = 0; kt <= 1200; kt += 37) {
        const cas = kt * KT;
        expectClose(casFromMach(machFromCas(cas, p), p), cas, { abs: 1e-9, rel: 1e-12 }, `round trip ${kt} kt at ${h} m`);
      }
    }
  });
  it('has a continuous CAS through Mach 1 at altitude (supersonic pitot branch)', () => {
    const p = at(12000).pressure_Pa;
    expectClose(casFromMach(1 + 1e-10, p), casFromMach(1 - 1e-10, p), { rel: 1e-8 }, 'continuity at M = 1');
    // Sonic CAS at a0 (CAS/a0 = 1) happens where p = p0 (common practice): only at sea level.
    expectClose(casFromMach(1, p0), a0, { rel: 1e-14 });
  });
  it('throws for a negative CAS or a non-positive pressure (a caller bug)', () => {
    expect(() => machFromCas(-1, p0)).toThrow(RangeError);
    expect(() => casFromMach(0.5, 0)).toThrow(RangeError);
  });
});

describe('EAS and TAS relations', () => {
  it('gives EAS = TAS sqrt(sigma) including an ISA deviation', () => {
    // Definition of EAS (NACA 1135 eq. 48 with q = rho0 EAS^2 / 2).
    const s = at(9000, 12);
    const m = 0.7;
    expectClose(easFromMach(m, s.pressure_Pa), tasFromMach(m, s.temperature_K) * Math.sqrt(s.sigma), { rel: 1e-9 }, 'EAS definition');
  });
  it('round-trips EAS and TAS through Mach', () => {
    const s = at(11000, -5);
    for (const v of [0, 50, 150, 300, 600]) {
      expectClose(easFromMach(machFromEas(v, s.pressure_Pa), s.pressure_Pa), v, { abs: 1e-10 });
      expectClose(tasFromMach(machFromTas(v, s.temperature_K), s.temperature_K), v, { abs: 1e-10 });
    }
  });
  it('gives q = 0.7 p M^2 = rho V^2 / 2', () => {
    // NACA 1135 eq. 48 (gamma = 1.4).
    const s = at(10668);
    const q = dynamicPressure_Pa(0.78, s.pressure_Pa);
    expectClose(q, 0.7 * s.pressure_Pa * 0.78 ** 2, { rel: 1e-14 }, 'NACA 1135 eq. 48');
    const tas = tasFromMach(0.78, s.temperature_K);
    expectClose(q, 0.5 * s.density_kg_m3 * tas * tas, { rel: 1e-9 }, 'q = rho V^2 / 2');
    expectClose(impactPressure_Pa(0.78, s.pressure_Pa), s.pressure_Pa * impactPressureRatio(0.78), { rel: 1e-14 });
  });
});

describe('airspeedsAt', () => {
  const s = at(10668, 10);
  it('gives the same airspeeds from any one of CAS, EAS, TAS or Mach', () => {
    const fromMach = expectOk(airspeedsAt(s, { mach: 0.8 }), 'mach');
    for (const speed of [
      { cas_m_s: fromMach.cas_m_s },
      { eas_m_s: fromMach.eas_m_s },
      { tas_m_s: fromMach.tas_m_s },
    ]) {
      const r = expectOk(airspeedsAt(s, speed), JSON.stringify(speed));
      expectClose(r.mach, 0.8, { rel: 1e-12 });
      expectClose(r.cas_m_s, fromMach.cas_m_s, { rel: 1e-12 });
      expectClose(r.eas_m_s, fromMach.eas_m_s, { rel: 1e-12 });
      expectClose(r.tas_m_s, fromMach.tas_m_s, { rel: 1e-12 });
      expectClose(r.dynamicPressure_Pa, fromMach.dynamicPressure_Pa, { rel: 1e-12 });
      expectClose(r.impactPressure_Pa, fromMach.impactPressure_Pa, { rel: 1e-12 });
    }
  });
  it('returns invalid_speed for a negative or non-finite speed', () => {
    for (const speed of [{ cas_m_s: -1 }, { mach: Number.NaN }, { tas_m_s: Infinity }]) {
      const r = airspeedsAt(s, speed);
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.error.code).toBe('invalid_speed');
        expect(r.error.message).toMatch(/CAS|Mach|TAS/);
      }
    }
  });
});

describe('casMachTransitionAltitude', () => {
  it('puts 300 kt / M 0.78 at about 29,300 ft', () => {
    // Commonly quoted crossover altitude for 300 kt / M 0.78 (from memory): about 29,300 ft.
    const h = expectOk(casMachTransitionAltitude(300 * KT, 0.78), 'transition');
    expectClose(h / FT, 29300, { abs: 100 }, 'commonly quoted, from memory');
  });
  it('matches the numpy reference for four schedules', () => {
    // test/reference/atmosphere_airspeed_reference.py (scipy brentq on the 1976 pressure).
    const ref: readonly [number, number, number][] = [
      [300, 0.78, 29314.117],
      [280, 0.76, 31180.056],
      [310, 0.8, 29076.342],
      [250, 0.7, 32259.788],
    ];
    for (const [kt, m, ft] of ref) {
      const h = expectOk(casMachTransitionAltitude(kt * KT, m), 'transition');
      expectClose(h / FT, ft, { abs: 0.01 }, `numpy reference ${kt} kt / M ${m}`);
      // At that altitude the CAS gives the Mach (and so the same TAS).
      expectClose(machFromCas(kt * KT, at(h).pressure_Pa), m, { rel: 1e-10 });
    }
  });
  it('does not depend on the ISA deviation (both speeds are pressure-based)', () => {
    const h = expectOk(casMachTransitionAltitude(290 * KT, 0.79), 'transition');
    const hot = at(h, 20);
    expectClose(tasFromMach(machFromCas(290 * KT, hot.pressure_Pa), hot.temperature_K), tasFromMach(0.79, hot.temperature_K), { rel: 1e-10 });
  });
  it('returns an error for a non-positive speed or a crossover outside the atmosphere', () => {
    const bad = casMachTransitionAltitude(0, 0.8);
    expect(bad.ok ? 'ok' : bad.error.code).toBe('invalid_speed');
    // 600 kt CAS is Mach 0.5 only far below sea level.
    const low = casMachTransitionAltitude(600 * KT, 0.5);
    expect(low.ok ? 'ok' : low.error.code).toBe('pressure_out_of_range');
  });
});

describe('airspeed inversions (property)', () => {
  it('round-trip CAS, EAS and TAS through Mach at any altitude, deviation and speed up to Mach 4', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -5000, max: 30000, noNaN: true }),
        fc.double({ min: -60, max: 60, noNaN: true }),
        fc.double({ min: 0, max: 4, noNaN: true }),
        (h, dev, mach) => {
          const s = at(h, dev);
          const r = expectOk(airspeedsAt(s, { mach }), 'airspeedsAt');
          const tol = (v: number, ref: number) => Math.abs(v - ref) <= 1e-9 * Math.abs(ref) + 1e-15;
          return (
            tol(machFromCas(r.cas_m_s, s.pressure_Pa), mach) &&
            tol(machFromEas(r.eas_m_s, s.pressure_Pa), mach) &&
            tol(machFromTas(r.tas_m_s, s.temperature_K), mach) &&
            // Above sea level (p < p0) EAS <= CAS: the compressibility correction is subtracted (common practice).
            (s.pressure_Pa > p0 || r.eas_m_s <= r.cas_m_s * (1 + 1e-12) + 1e-12)
          );
        },
      ),
      { numRuns: 500 },
    );
  });
});
