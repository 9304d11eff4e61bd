import { describe, expect, it } from 'vitest';
import {
  areaRatio,
  correctedFlowPerArea_kg_s_m2,
  isentropicDensityRatio,
  isentropicPressureRatio,
  isentropicTemperatureRatio,
  machFromAreaRatio,
  machFromCorrectedFlowPerArea,
  machFromMassFlowParameter,
  massFlowParameter,
  normalShock,
} from '../../../engine/aero/compressibleFlow';
import { expectOk } from '../../../engine/core/result';
import { expectClose } from '../../support/assertInDelta';

describe('isentropic ratios', () => {
  // NACA Report 1135, Table I (subsonic) and Table II (supersonic), gamma = 1.4, printed to 4
  // significant digits (from memory): M, p/pt, rho/rhot, T/Tt, A/A*.
  const rows: readonly [number, number, number, number, number][] = [
    [0.5, 0.843, 0.8852, 0.9524, 1.34],
    [1.0, 0.5283, 0.6339, 0.8333, 1.0],
    [1.5, 0.2724, 0.3950, 0.6897, 1.176],
    [2.0, 0.1278, 0.2300, 0.5556, 1.688],
    [3.0, 0.02722, 0.07623, 0.3571, 4.235],
  ];
  for (const [m, p, rho, t, a] of rows) {
    it(`gives the NACA 1135 table row at M = ${m}`, () => {
      const src = `NACA 1135 table, M = ${m}`;
      expectClose(isentropicPressureRatio(m), p, { rel: 6e-4 }, src);
      expectClose(isentropicDensityRatio(m), rho, { rel: 6e-4 }, src);
      expectClose(isentropicTemperatureRatio(m), t, { rel: 6e-4 }, src);
      expectClose(areaRatio(m), a, { rel: 6e-4 }, src);
    });
  }
  it('keeps p/pt = (rho/rhot)(T/Tt) for any gamma (perfect gas)', () => {
    for (const g of [1.3, 1.4, 5 / 3]) {
      for (const m of [0, 0.4, 1, 2.5]) {
        expectClose(isentropicPressureRatio(m, g), isentropicDensityRatio(m, g) * isentropicTemperatureRatio(m, g), { rel: 1e-13 });
      }
    }
    // T/Tt = 1 / (1 + (g-1)/2 M^2) (NACA 1135 eq. 43) with g = 1.3 at M = 2: 1 / 1.6.
    expectClose(isentropicTemperatureRatio(2, 1.3), 1 / 1.6, { rel: 1e-14 }, 'NACA 1135 eq. 43');
  });
  it('throws for a negative Mach (a caller bug)', () => {
    expect(() => isentropicTemperatureRatio(-1)).toThrow(RangeError);
    expect(() => areaRatio(0)).toThrow(RangeError);
  });
});

describe('machFromAreaRatio', () => {
  it('gives M = 0.3059 and 2.1972 at A/A* = 2', () => {
    // NACA 1135 Tables I/II (from memory) and scipy brentq (test/reference/atmosphere_airspeed_reference.py).
    expectClose(expectOk(machFromAreaRatio(2, 'subsonic'), 'sub'), 0.3059038341891082, { abs: 1e-12 }, 'scipy brentq');
    expectClose(expectOk(machFromAreaRatio(2, 'supersonic'), 'sup'), 2.1971981216521868, { abs: 1e-12 }, 'scipy brentq');
  });
  it('matches the scipy reference at A/A* = 1.2, 4 and 10', () => {
    const ref: readonly [number, number, number][] = [
      [1.2, 0.590248760988451, 1.5341497672017608],
      [4, 0.14654821395187886, 2.940179169312597],
      [10, 0.057987202922873855, 3.9225518209337236],
    ];
    for (const [r, sub, sup] of ref) {
      expectClose(expectOk(machFromAreaRatio(r, 'subsonic'), 'sub'), sub, { abs: 1e-12 }, `scipy, A/A* = ${r}`);
      expectClose(expectOk(machFromAreaRatio(r, 'supersonic'), 'sup'), sup, { abs: 1e-12 }, `scipy, A/A* = ${r}`);
    }
  });
  it('round-trips areaRatio on both branches, including near the throat', () => {
    for (const m of [0.001, 0.2, 0.9, 0.9999, 1.0001, 1.3, 4, 10]) {
      const branch = m < 1 ? 'subsonic' : 'supersonic';
      expectClose(expectOk(machFromAreaRatio(areaRatio(m), branch), 'inv'), m, { rel: 1e-6 }, `round trip M = ${m}`);
    }
    expect(expectOk(machFromAreaRatio(1, 'subsonic'), 'throat')).toBe(1);
  });
  it('returns no_bracket below A/A* = 1 and not_finite for NaN', () => {
    const below = machFromAreaRatio(0.9, 'subsonic');
    expect(below.ok ? 'ok' : below.error.code).toBe('no_bracket');
    if (!below.ok) expect(below.error.message).toContain('0.9');
    const nan = machFromAreaRatio(Number.NaN, 'supersonic');
    expect(nan.ok ? 'ok' : nan.error.code).toBe('not_finite');
  });
});

describe('massFlowParameter', () => {
  it('peaks at 0.6847 at Mach 1 for gamma = 1.4', () => {
    // mdot sqrt(R Tt)/(A pt) at M = 1 = sqrt(g) (2/(g+1))^((g+1)/(2(g-1))) = 0.68473 (common practice).
    expectClose(massFlowParameter(1), 0.6847314563772704, { rel: 1e-12 }, 'closed form at M = 1');
    expect(massFlowParameter(0.99)).toBeLessThan(massFlowParameter(1));
    expect(massFlowParameter(1.01)).toBeLessThan(massFlowParameter(1));
  });
  it('equals the sonic value divided by A/A* (NACA 1135 eq. 80)', () => {
    for (const m of [0.2, 0.5, 0.8, 1.5, 2.5]) {
      expectClose(massFlowParameter(m), massFlowParameter(1) / areaRatio(m), { rel: 1e-12 }, 'NACA 1135 eq. 80');
    }
  });
  it('gives about 241 kg/(s m^2) corrected flow per area when choked', () => {
    // Common practice (from memory): a choked area passes about 241 kg/s per m^2 at sea-level total conditions.
    expectClose(correctedFlowPerArea_kg_s_m2(1), 241.2, { abs: 0.1 }, 'common practice, from memory');
  });
  it('is inverted by machFromMassFlowParameter on both branches', () => {
    for (const m of [0, 0.1, 0.45, 0.6, 0.95, 1.2, 2, 3]) {
      const branch = m <= 1 ? 'subsonic' : 'supersonic';
      expectClose(expectOk(machFromMassFlowParameter(massFlowParameter(m), branch), 'inv'), m, { abs: 1e-9 }, `round trip M = ${m}`);
    }
    const flow = correctedFlowPerArea_kg_s_m2(0.55);
    expectClose(expectOk(machFromCorrectedFlowPerArea(flow, 'subsonic'), 'inv'), 0.55, { abs: 1e-10 });
  });
  it('returns no_bracket above the choked value and for negative flow', () => {
    for (const v of [0.69, -0.1]) {
      const r = machFromMassFlowParameter(v, 'subsonic');
      expect(r.ok ? 'ok' : r.error.code).toBe('no_bracket');
      if (!r.ok) expect(r.error.message).toContain('choked');
    }
    const inf = machFromMassFlowParameter(Infinity, 'subsonic');
    expect(inf.ok ? 'ok' : inf.error.code).toBe('not_finite');
  });
});

describe('normalShock', () => {
  // NACA Report 1135, Table II normal-shock columns, gamma = 1.4 (from memory; the brief quotes M = 2):
  // M1, M2, p2/p1, rho2/rho1, T2/T1, pt2/pt1.
  const rows: readonly [number, number, number, number, number, number][] = [
    [1.5, 0.7011, 2.458, 1.862, 1.320, 0.9298],
    [2.0, 0.5774, 4.5, 2.667, 1.688, 0.7209],
    [3.0, 0.4752, 10.33, 3.857, 2.679, 0.3283],
  ];
  for (const [m1, m2, pr, dr, tr, ptr] of rows) {
    it(`gives the NACA 1135 normal-shock row at M1 = ${m1}`, () => {
      const s = normalShock(m1);
      const src = `NACA 1135 Table II, M1 = ${m1}`;
      expectClose(s.mach2, m2, { rel: 6e-4 }, src);
      expectClose(s.pressureRatio, pr, { rel: 6e-4 }, src);
      expectClose(s.densityRatio, dr, { rel: 6e-4 }, src);
      expectClose(s.temperatureRatio, tr, { rel: 6e-4 }, src);
      expectClose(s.totalPressureRatio, ptr, { rel: 6e-4 }, src);
    });
  }
  it('is the identity at M1 = 1 and conserves total temperature', () => {
    const s = normalShock(1);
    for (const v of [s.mach2, s.pressureRatio, s.densityRatio, s.temperatureRatio, s.totalPressureRatio]) expectClose(v, 1, { abs: 1e-14 });
    // Adiabatic shock: Tt2 = Tt1, so T2/T1 = (T/Tt)(M2) / (T/Tt)(M1) (NACA 1135 eq. 43).
    const t = normalShock(2.4);
    expectClose(t.temperatureRatio, isentropicTemperatureRatio(t.mach2) / isentropicTemperatureRatio(2.4), { rel: 1e-12 });
    // pt2/pt1 = (p2/p1) (p/pt)(M1) / (p/pt)(M2).
    expectClose(t.totalPressureRatio, (t.pressureRatio * isentropicPressureRatio(2.4)) / isentropicPressureRatio(t.mach2), { rel: 1e-12 });
  });
  it('throws below Mach 1 (no shock: a caller bug)', () => {
    expect(() => normalShock(0.9)).toThrow(RangeError);
  });
});
