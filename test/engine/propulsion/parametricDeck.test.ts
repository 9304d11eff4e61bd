import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { lookupDeck } from '../../../engine/propulsion/deckLookup';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import {
  buildParametricDeck,
  mattinglyThrustLapse,
  mattinglyTsfcRatio,
  partPowerFuelFlowFraction,
  type ParametricDeckSpec,
} from '../../../engine/propulsion/parametricDeck';
import { expectClose } from '../../support/assertInDelta';

// Hand calculations from Mattingly, Heiser & Pratt, Aircraft Engine Design, 2nd ed., §2.3.2,
// eqs. 2.54a-c, with theta0 = theta (1 + 0.2 M^2), delta0 = delta (1 + 0.2 M^2)^3.5 and the
// U.S. Standard Atmosphere 1976 at 10668 m (35000 ft): theta = 218.808/288.15 = 0.7593545,
// delta = theta^5.255877 = 0.2353052 (tables give 0.2353; from memory).
const SL = { theta: 1, delta: 1 };
const FL350 = { theta: 218.808 / 288.15, delta: 0.23530517840618698 };
function ram(c: { theta: number; delta: number }, mach: number): { theta0: number; delta0: number } {
  const r = 1 + 0.2 * mach * mach;
  return { theta0: c.theta * r, delta0: c.delta * r ** 3.5 };
}

describe('mattinglyThrustLapse', () => {
  it('high bypass, sea level, M 0.3, TR 1.05 (theta0 1.018 <= TR): delta0 (1 - 0.49 sqrt(M)) = 0.778754', () => {
    const { theta0, delta0 } = ram(SL, 0.3);
    expectClose(mattinglyThrustLapse('highBypassTurbofan', delta0, theta0, 0.3, 1.05), 0.778754171630293, { rel: 1e-12 }, 'Mattingly eq. 2.54a, hand calculation');
  });

  it('high bypass, 35000 ft, M 0.8, TR 1.05 (theta0 0.8566): 0.201484', () => {
    const { theta0, delta0 } = ram(FL350, 0.8);
    expectClose(mattinglyThrustLapse('highBypassTurbofan', delta0, theta0, 0.8, 1.05), 0.20148442266206687, { rel: 1e-9 }, 'Mattingly eq. 2.54a, hand calculation');
  });

  it('high bypass, sea level, M 0.6, TR 1.0 (theta0 1.072 > TR): delta0 (1 - 0.49 sqrt(M) - 3 (theta0 - TR)/(1.5 + M)) = 0.660189', () => {
    const { theta0, delta0 } = ram(SL, 0.6);
    expectClose(mattinglyThrustLapse('highBypassTurbofan', delta0, theta0, 0.6, 1.0), 0.6601886235911608, { rel: 1e-12 }, 'Mattingly eq. 2.54a, hand calculation');
  });

  it('low bypass (dry), sea level, M 0.9, TR 1.0: 0.6 delta0 (1 - 3.8 (theta0 - TR)/theta0) = 0.477175', () => {
    const { theta0, delta0 } = ram(SL, 0.9);
    expectClose(mattinglyThrustLapse('lowBypassTurbofan', delta0, theta0, 0.9, 1.0), 0.4771745374501285, { rel: 1e-12 }, 'Mattingly eq. 2.54b, hand calculation');
  });

  it('turbojet (dry), sea level, M 0.8, TR 1.0: 0.8 delta0 (1 - 0.16 sqrt(M) - 24 (theta0 - TR)/((9 + M) theta0)) = 0.706066', () => {
    const { theta0, delta0 } = ram(SL, 0.8);
    expectClose(mattinglyThrustLapse('turbojet', delta0, theta0, 0.8, 1.0), 0.7060660683572474, { rel: 1e-12 }, 'Mattingly eq. 2.54c, hand calculation');
  });

  it('low bypass and turbojet below the throttle break at 35000 ft, M 0.8: 0.6 delta0 and 0.8 delta0 (1 - 0.16 sqrt(M))', () => {
    const { theta0, delta0 } = ram(FL350, 0.8);
    expectClose(mattinglyThrustLapse('lowBypassTurbofan', delta0, theta0, 0.8, 1.0), 0.21521105874053192, { rel: 1e-9 }, 'Mattingly eq. 2.54b, hand calculation');
    expectClose(mattinglyThrustLapse('turbojet', delta0, theta0, 0.8, 1.0), 0.2458834121358747, { rel: 1e-9 }, 'Mattingly eq. 2.54c, hand calculation');
  });
});

describe('mattinglyTsfcRatio', () => {
  it('high bypass at M 0.8, 35000 ft: (0.45 + 0.54*0.8)/0.45 * sqrt(0.7593545) = 1.7080', () => {
    expectClose(mattinglyTsfcRatio('highBypassTurbofan', 0.8, FL350.theta), (0.882 / 0.45) * Math.sqrt(FL350.theta), { rel: 1e-14 }, 'Mattingly eq. 2.55a');
    expectClose(mattinglyTsfcRatio('highBypassTurbofan', 0.8, FL350.theta), 1.70796, { rel: 1e-4 }, 'hand calculation');
  });

  it('low bypass and turbojet (dry) forms: (0.9 + 0.30 M)/0.9 and (1.1 + 0.30 M)/1.1 times sqrt(theta)', () => {
    expectClose(mattinglyTsfcRatio('lowBypassTurbofan', 0.5, 1), 1.05 / 0.9, { rel: 1e-14 }, 'Mattingly eq. 2.55b');
    expectClose(mattinglyTsfcRatio('turbojet', 0.5, 0.81), (1.25 / 1.1) * 0.9, { rel: 1e-14 }, 'Mattingly eq. 2.55c');
  });
});

describe('partPowerFuelFlowFraction', () => {
  it('partPowerFuelFlowFraction is the Willans line k0 + (1 - k0) power (common practice)', () => {
    expect(partPowerFuelFlowFraction(1, 0.1)).toBe(1);
    expectClose(partPowerFuelFlowFraction(0.5, 0.1), 0.55, { rel: 1e-15 }, 'hand calculation');
    // TSFC ratio k0/power + 1 - k0 rises as power falls
    expect(partPowerFuelFlowFraction(0.2, 0.1) / 0.2).toBeGreaterThan(partPowerFuelFlowFraction(0.8, 0.1) / 0.8);
  });
});

const SMALL: ParametricDeckSpec = {
  kind: 'highBypassTurbofan',
  title: 'Test fan',
  seaLevelStaticThrust_N: 30000,
  throttleRatio: 1.05,
  tsfcSeaLevelStatic_kg_N_s: 1.2e-5,
  seaLevelStaticAirflow_kg_s: 95,
  grid: { altitudes_m: [0, 10668], machs: [0, 0.3, 0.8], powers: [0.1, 0.5, 1] },
};

describe('buildParametricDeck', () => {
  it('buildParametricDeck labels the deck parametric and names its source', () => {
    const deck = buildParametricDeck(SMALL);
    expect(deck.title).toBe('Test fan (parametric)');
    expect(deck.parametric).toBe(true);
    expect(deck.referenceRecovery).toEqual({ kind: 'milE5008b' });
    expect(deck.notes.join(' ')).toContain('Mattingly');
    expect(deck.notes.join(' ')).toContain('UNINSTALLED');
    expect(deck.ratings.flightIdle).toBe(0.1);
    expect(deck.hasAirflow).toBe(true);
    expect(deck.hasIsaDev).toBe(false);
  });

  it('buildParametricDeck tabulates F_SLS * alpha at full power and the TSFC model', () => {
    const deck = buildParametricDeck(SMALL);
    const r = expectOk(lookupDeck(deck, { altitude_m: 10668, mach: 0.8, isaDev_K: 0 }, 1), 'FL350');
    expectClose(r.thrust_N, 30000 * 0.20148442266206687, { rel: 1e-9 }, 'Mattingly eq. 2.54a, hand calculation');
    expectClose(r.fuelFlow_kg_s / r.thrust_N, 1.2e-5 * (0.882 / 0.45) * Math.sqrt(FL350.theta), { rel: 1e-9 }, 'Mattingly eq. 2.55a');
    const half = expectOk(lookupDeck(deck, { altitude_m: 10668, mach: 0.8, isaDev_K: 0 }, 0.5), 'half');
    expectClose(half.thrust_N, r.thrust_N / 2, { rel: 1e-12 }, 'power = thrust fraction');
    expectClose(half.fuelFlow_kg_s, r.fuelFlow_kg_s * 0.55, { rel: 1e-12 }, 'Willans line, k0 = 0.1');
    // airflow: W_SLS delta0/sqrt(theta0) power^0.3
    const { theta0, delta0 } = ram(FL350, 0.8);
    expectClose(half.airflow_kg_s!, (95 * delta0 * 0.5 ** 0.3) / Math.sqrt(theta0), { rel: 1e-9 }, 'airflow model');
  });

  it('at a fixed rating, high-bypass thrust falls with Mach to a minimum near M 0.4-0.6 and then partly recovers (common practice)', () => {
    const deck = buildParametricDeck(DEMO_ENGINE_SPEC);
    const alt = 35000 * 0.3048;
    const machs = [0.3, 0.35, 0.4, 0.45, 0.5, 0.55, 0.6, 0.7, 0.8, 0.9];
    const t = machs.map((m) => expectOk(lookupDeck(deck, { altitude_m: alt, mach: m, isaDev_K: 0 }, 0.92), 'maxClimb').thrust_N);
    const iMin = t.indexOf(Math.min(...t));
    expect(machs[iMin]).toBeGreaterThanOrEqual(0.35);
    expect(machs[iMin]).toBeLessThanOrEqual(0.6);
    expect(t[0]).toBeGreaterThan(t[iMin]!);
    expect(t.at(-1)).toBeGreaterThan(t[iMin]!);
    // at sea level thrust falls steadily with Mach over the take-off range
    const sl = [0, 0.1, 0.2, 0.3].map((m) => expectOk(lookupDeck(deck, { altitude_m: 0, mach: m, isaDev_K: 0 }, 1), 'SL').thrust_N);
    for (let i = 1; i < sl.length; i++) expect(sl[i]).toBeLessThan(sl[i - 1]!);
    // and falls with altitude at a fixed Mach
    const a = [0, 20000, 40000].map((ft) => expectOk(lookupDeck(deck, { altitude_m: ft * 0.3048, mach: 0.5, isaDev_K: 0 }, 1), 'alt').thrust_N);
    expect(a[1]).toBeLessThan(a[0]!);
    expect(a[2]).toBeLessThan(a[1]!);
  });

  it('buildParametricDeck scales the dry low-bypass and turbojet lapses by their static values (0.6, 0.8)', () => {
    for (const [kind, lapse, staticLapse, tsfcRatio] of [
      ['lowBypassTurbofan', 0.21521105874053192, 0.6, (0.9 + 0.3 * 0.8) / 0.9],
      ['turbojet', 0.2458834121358747, 0.8, (1.1 + 0.3 * 0.8) / 1.1],
    ] as const) {
      const deck = buildParametricDeck({ ...SMALL, kind, throttleRatio: 1.0 });
      const sls = expectOk(lookupDeck(deck, { altitude_m: 0, mach: 0, isaDev_K: 0 }, 1), 'SLS');
      expectClose(sls.thrust_N, 30000, { rel: 1e-12 }, 'F_SLS is the full-throttle static thrust');
      const r = expectOk(lookupDeck(deck, { altitude_m: 10668, mach: 0.8, isaDev_K: 0 }, 1), 'FL350');
      expectClose(r.thrust_N, (30000 * lapse) / staticLapse, { rel: 1e-9 }, `Mattingly eq. 2.54 (${kind}), hand calculation`);
      expectClose(r.fuelFlow_kg_s / r.thrust_N, 1.2e-5 * tsfcRatio * Math.sqrt(FL350.theta), { rel: 1e-9 }, `Mattingly eq. 2.55 (${kind})`);
    }
  });

  it('buildParametricDeck with isaDevs_K tabulates an ISA-deviation axis: hotter days lose thrust above the throttle break', () => {
    const deck = buildParametricDeck({ ...SMALL, grid: { ...SMALL.grid, isaDevs_K: [0, 20] } });
    expect(deck.hasIsaDev).toBe(true);
    const c = { altitude_m: 0, mach: 0.3, isaDev_K: 0 };
    const isa = expectOk(lookupDeck(deck, c, 1), 'ISA').thrust_N;
    const hot = expectOk(lookupDeck(deck, { ...c, isaDev_K: 20 }, 1), 'hot').thrust_N;
    expect(hot).toBeLessThan(isa);
  });

  it('buildParametricDeck throws on an invalid spec (a caller bug)', () => {
    expect(() => buildParametricDeck({ ...SMALL, seaLevelStaticThrust_N: -1 })).toThrow(RangeError);
    expect(() => buildParametricDeck({ ...SMALL, grid: { ...SMALL.grid, powers: [1] } })).toThrow(/powers/);
    expect(() => buildParametricDeck({ ...SMALL, ratings: { maxCruise: 2 } })).toThrow(/maxCruise/);
  });
});
