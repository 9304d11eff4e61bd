import { describe, expect, it } from 'vitest';
import { climbPeak, thrustDragCrossover } from '../../../engine/analysis/crossover';
import { flightCeilings, flightEnvelope, type Ceiling } from '../../../engine/analysis/envelope';
import { expectOk } from '../../../engine/core/result';
import { expectClose } from '../../support/assertInDelta';
import { G0, TEST_POLAR, analyticPropulsion, isaPressure_Pa, parabolicAero } from './analyticModels';

const models = {
  aero: parabolicAero({ ...TEST_POLAR, mCrit: 0.78 }),
  propulsion: analyticPropulsion({ thrust_N: 160e3, lapse: 'mattingly', tsfc_kg_N_s: 1.6e-5 }),
};
const query = { mass_kg: 60000, rating: 'maxCruise' as const, isaDev_K: 0, altitudeRange: [0, 14000] as const, altitudeStep_m: 1000 };
const env = expectOk(flightEnvelope(models, query), 'envelope');

describe('flightEnvelope', () => {
  it('flightEnvelope finds the absolute, service and cruise ceilings of the scipy reference', () => {
    const abs = env.ceilings.find((c) => c.name === 'absolute')!;
    // test/reference/analysisReference.py (scipy brentq on max over Mach of T - D): 9956.560136 m
    expectClose(abs.altitude_m!, 9956.560136, { abs: 0.05 }, 'scipy reference');
    // test/reference/analysisReference.py: service (100 ft/min) 9676.708104 m, cruise (300 ft/min) 9126.187228 m
    expectClose(env.ceilings[1]!.altitude_m!, 9676.708104, { abs: 0.05 }, 'scipy reference');
    expectClose(env.ceilings[2]!.altitude_m!, 9126.187228, { abs: 0.05 }, 'scipy reference');
  });

  it('flightEnvelope ceilings agree with the climb rate computed at them', () => {
    for (const c of env.ceilings) {
      const at = expectOk(
        thrustDragCrossover(models, { altitude_m: c.altitude_m!, mass_kg: 60000, rating: 'maxCruise', isaDev_K: 0 }),
        'crossover at ceiling',
      );
      // Ps = (T - D) V / W at the best-climb Mach equals the residual rate (definition; 100 and 300 ft/min common practice)
      expectClose(at.maxSpecificExcessPower_m_s!, c.climbRate_m_s, { abs: 1e-4 }, `${c.name} ceiling definition`);
      expectClose(c.climbRateAtCeiling_m_s!, c.climbRate_m_s, { abs: 1e-4 });
    }
    const [absolute, service, cruise] = env.ceilings;
    expectClose(service!.climbRate_m_s, 100 * 0.3048 / 60, { rel: 1e-12 }, '100 ft/min, common practice');
    expect(absolute!.altitude_m!).toBeGreaterThan(service!.altitude_m!);
    expect(service!.altitude_m!).toBeGreaterThan(cruise!.altitude_m!);
  });

  it('flightEnvelope lowers the ceilings for a heavier aircraft', () => {
    const heavy = expectOk(flightEnvelope(models, { ...query, mass_kg: 70000 }), 'envelope');
    heavy.ceilings.forEach((c, i) => expect(c.altitude_m!).toBeLessThan(env.ceilings[i]!.altitude_m!));
  });

  it('flightEnvelope rows put buffet onset where n CL equals the buffet CL', () => {
    const row = env.rows.find((r) => r.altitude_m === 9000)!;
    expect(row.buffetMarginLowMach).not.toBeNull();
    const m = row.buffetMarginLowMach!;
    const q = 0.7 * isaPressure_Pa(9000) * m * m; // NACA Report 1135
    const cl = (1.3 * 60000 * G0) / (q * TEST_POLAR.wingArea_m2);
    expectClose(cl, TEST_POLAR.buffetCl - TEST_POLAR.buffetSlope! * m, { rel: 1e-7 }, 'buffet onset definition');
    expect(row.buffetLowMach!).toBeLessThan(m);
    // The margin boundary narrows the buffet-free band at both ends.
    if (row.buffetHighMach !== null && row.buffetMarginHighMach !== null) expect(row.buffetMarginHighMach).toBeLessThan(row.buffetHighMach);
    const top = env.rows[env.rows.length - 1]!;
    expect(top.status).toBe('above_ceiling');
  });

  it('flightEnvelope speed-limit line is VMO / a0 at sea level (CAS = TAS in ISA at sea level)', () => {
    const e = expectOk(
      flightEnvelope(models, { ...query, altitudeRange: [0, 2000], speedLimits: { vmo_m_s: 350 * 1852 / 3600, mmo: 0.82 } }),
      'envelope',
    );
    // a0 = 340.294 m/s, U.S. Standard Atmosphere 1976; CAS = TAS at sea level ISA (NACA Report 1135)
    expectClose(e.rows[0]!.speedLimitMach!, (350 * 1852) / 3600 / 340.294, { rel: 1e-5 }, 'U.S. Standard Atmosphere 1976 a0');
    const high = expectOk(flightEnvelope(models, { ...query, altitudeRange: [11000, 12000], speedLimits: { vmo_m_s: 350 * 1852 / 3600, mmo: 0.82 } }), 'envelope');
    expect(high.rows[0]!.speedLimitMach).toBe(0.82);
  });

  it('flightEnvelope reports a ceiling above the altitude range as null with a message, and rejects bad rates', () => {
    const low = expectOk(flightEnvelope(models, { ...query, altitudeRange: [0, 4000] }), 'envelope');
    expect(low.ceilings[0]!.altitude_m).toBeNull();
    expect(low.ceilings[0]!.message).toMatch(/above 13,123 ft \(4,000 m\)/);
    const bad = flightEnvelope(models, { ...query, residualClimbRates: [{ name: 'odd', climbRate_m_s: -1 }] });
    expect(bad.ok ? '' : bad.error.message).toMatch(/"odd" -1 m\/s/);
  });

  it('flightCeilings (climb peaks only) gives the envelope\'s ceilings, on the scipy reference', () => {
    const only = expectOk(flightCeilings(models, query), 'ceilings');
    // Its rows search the peak near the row below's (1e-6 in Mach): the same ceilings far inside their 0.01 m tolerance.
    const same = (a: readonly Ceiling[], b: readonly Ceiling[]) => {
      expect(a.map((c) => c.name)).toEqual(b.map((c) => c.name));
      a.forEach((c, i) => {
        expectClose(c.altitude_m!, b[i]!.altitude_m!, { abs: 1e-6 }, `${c.name} ceiling, CEILING_ALTITUDE_TOL_M 0.01 m`);
        expectClose(c.bestClimbMach!, b[i]!.bestClimbMach!, { abs: 1e-5 }, `${c.name} best-climb Mach`);
      });
    };
    same(only, env.ceilings);
    // test/reference/analysisReference.py: absolute ceiling 9956.560136 m
    expectClose(only[0]!.altitude_m!, 9956.560136, { abs: 0.05 }, 'scipy reference');
    const heavy = expectOk(flightCeilings(models, { ...query, mass_kg: 70000 }), 'ceilings');
    same(heavy, expectOk(flightEnvelope(models, { ...query, mass_kg: 70000 }), 'envelope').ceilings);
    const low = expectOk(flightCeilings(models, { ...query, altitudeRange: [0, 4000] }), 'ceilings');
    expect(low[0]!.altitude_m).toBeNull();
    const bad = flightCeilings(models, { ...query, residualClimbRates: [{ name: 'odd', climbRate_m_s: -1 }] });
    expect(bad.ok ? '' : bad.error.message).toMatch(/"odd" -1 m\/s/);
  });

  it('climbPeak is the crossover\'s best climb (Mach and Ps), and null where the wing cannot lift the mass', () => {
    for (const h of [0, 5000, 9000, 9900]) {
      const full = expectOk(thrustDragCrossover(models, { altitude_m: h, mass_kg: 60000, rating: 'maxCruise', isaDev_K: 0 }), 'crossover');
      const peak = expectOk(climbPeak(models, { altitude_m: h, mass_kg: 60000, rating: 'maxCruise', isaDev_K: 0 }), 'peak');
      expect(peak).toEqual({ bestClimbMach: full.bestClimbMach, maxSpecificExcessPower_m_s: full.maxSpecificExcessPower_m_s });
    }
    const stalled = expectOk(climbPeak(models, { altitude_m: 30000, mass_kg: 60000, rating: 'maxCruise', isaDev_K: 0, machRange: [0.1, 0.5] }), 'stalled');
    expect(stalled.maxSpecificExcessPower_m_s).toBeNull();
  });

  it('climbPeak searched near given Machs finds the same peak, and searches the whole scan when the peak is not there', () => {
    const q = { altitude_m: 9000, mass_kg: 60000, rating: 'maxCruise' as const, isaDev_K: 0 };
    const full = expectOk(climbPeak(models, q), 'full');
    const m = full.bestClimbMach!;
    const local = expectOk(climbPeak(models, q, [m - 0.01, m + 0.02]), 'local');
    // The local search stops at LOCAL_PEAK_MACH_TOL (1e-6 in Mach); the value of a flat maximum is far better.
    expectClose(local.bestClimbMach!, m, { abs: 2e-6 }, 'same maximum');
    expectClose(local.maxSpecificExcessPower_m_s!, full.maxSpecificExcessPower_m_s!, { rel: 1e-12 }, 'same maximum');
    // A window far below the peak: its best sample is on the window's edge, so the whole scan is searched.
    expect(expectOk(climbPeak(models, q, [0.15, 0.15]), 'elsewhere')).toEqual(full);
  });

  it('climbPeak with clearAbove stops at a window sample that climbs that fast: a lower bound of the peak', () => {
    const q = { altitude_m: 9000, mass_kg: 60000, rating: 'maxCruise' as const, isaDev_K: 0 };
    const full = expectOk(climbPeak(models, q), 'full');
    const m = full.bestClimbMach!;
    const peak = full.maxSpecificExcessPower_m_s!;
    const bound = expectOk(climbPeak(models, q, [m, m], 0.5 * peak), 'bound');
    expect(bound.lowerBound).toBe(true);
    expect(bound.maxSpecificExcessPower_m_s!).toBeGreaterThanOrEqual(0.5 * peak);
    expect(bound.maxSpecificExcessPower_m_s!).toBeLessThanOrEqual(peak);
    // Above the peak no sample reaches it: the peak is searched as without it.
    expect(expectOk(climbPeak(models, q, [m, m], 2 * peak), 'searched')).toEqual(expectOk(climbPeak(models, q, [m, m]), 'local'));
  });
});

describe('flightCeilings on the demo deck', () => {
  it('gives the ceilings of a plain search: rows and Brent on the whole-scan crossover\'s greatest Ps, within 1e-6 m', async () => {
    // The plain search: the crossover's own peak at every altitude (81 Machs and golden sections to 1e-10 over the
    // whole scan), bracketed on the same rows and refined by Brent's method (engine/core/rootFind.ts) to 0.01 m.
    const { readFileSync } = await import('node:fs');
    const { fileURLToPath } = await import('node:url');
    const { parseProject } = await import('../../../engine/project/parseProject');
    const { parseDeckCsv } = await import('../../../engine/propulsion/deckCsv');
    const { buildMissionInput } = await import('../../../engine/project/buildMissionInput');
    const { brent } = await import('../../../engine/core/rootFind');
    const root = fileURLToPath(new URL('../../../fixtures/demo/', import.meta.url));
    const project = expectOk(parseProject(readFileSync(`${root}demo.blockwise.json`, 'utf8'), 'demo'), 'demo');
    const deck = expectOk(parseDeckCsv(readFileSync(`${root}demo-engine.deck.csv`, 'utf8'), 'deck'), 'deck');
    const input = expectOk(buildMissionInput(project, { deck }), 'demo input');
    const demo = { aero: input.aero, propulsion: input.propulsion };
    const q = { mass_kg: 13500, rating: 'maxClimb' as const, isaDev_K: 0, altitudeRange: [0, 15000] as const, altitudeStep_m: 1000 };
    const ceilings = expectOk(flightCeilings(demo, q), 'ceilings');
    const maxPs = (h: number) => expectOk(thrustDragCrossover(demo, { altitude_m: h, mass_kg: q.mass_kg, rating: 'maxClimb', isaDev_K: 0 }), 'crossover').maxSpecificExcessPower_m_s!;
    for (const c of ceilings) {
      const top = Math.ceil(c.altitude_m! / 1000) * 1000;
      const plain = expectOk(brent((h) => maxPs(h) - c.climbRate_m_s, top - 1000, top, { xTol: 0.01 }), `${c.name} plain`).x;
      expectClose(c.altitude_m!, plain, { abs: 1e-6 }, `${c.name} ceiling`);
      expectClose(c.climbRateAtCeiling_m_s!, maxPs(c.altitude_m!), { abs: 1e-9 }, `${c.name} climb rate there`);
    }
  });
});
