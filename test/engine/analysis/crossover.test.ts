import { describe, expect, it } from 'vitest';
import { CROSSOVER_RELATIVE_THRUST_TOL, thrustDragCrossover } from '../../../engine/analysis/crossover';
import { expectOk } from '../../../engine/core/result';
import { expectClose } from '../../support/assertInDelta';
import { G0, TEST_POLAR, analyticPropulsion, isaPressure_Pa, parabolicAero } from './analyticModels';

const constantThrust = {
  aero: parabolicAero(TEST_POLAR),
  propulsion: analyticPropulsion({ thrust_N: 30e3, lapse: 'constant', tsfc_kg_N_s: 1.6e-5 }),
};
const lapsed = {
  aero: parabolicAero({ ...TEST_POLAR, mCrit: 0.78 }),
  propulsion: analyticPropulsion({ thrust_N: 160e3, lapse: 'mattingly', tsfc_kg_N_s: 1.6e-5 }),
};

describe('thrustDragCrossover', () => {
  it('thrustDragCrossover with constant thrust and a parabolic polar matches the closed-form quadratic in q', () => {
    // Thrust required T = q S CD0 + K W^2 / (q S) = T_avail gives
    // CD0 S q^2 - T q + K W^2 / S = 0 (Anderson, Aircraft Performance and Design, ch. 5, thrust-required curve).
    const h = 5000;
    const m = 40000;
    const W = m * G0;
    const { cd0, k, wingArea_m2: S } = TEST_POLAR;
    const T = 30e3;
    const disc = Math.sqrt(T * T - 4 * cd0 * k * W * W);
    const qHigh = (T + disc) / (2 * cd0 * S);
    const qLow = (T - disc) / (2 * cd0 * S);
    const p = isaPressure_Pa(h);
    const machOf = (q: number) => Math.sqrt(q / (0.7 * p)); // q = 0.7 p M^2 (NACA Report 1135)
    const r = expectOk(thrustDragCrossover(constantThrust, { altitude_m: h, mass_kg: m, rating: 'maxCruise', isaDev_K: 0 }), 'crossover');
    expect(r.status).toBe('ok');
    expectClose(r.lowMach!, machOf(qLow), { rel: 1e-8 }, 'closed-form quadratic in q, low root');
    expectClose(r.highMach!, machOf(qHigh), { rel: 1e-8 }, 'closed-form quadratic in q, high root');
    // Constant thrust: no thrust minimum inside the range.
    expect(r.minThrustMach).toBeNull();
    // Max excess thrust = min drag, at CL = sqrt(CD0/K) (Anderson, minimum thrust required).
    const qMinDrag = W / (S * Math.sqrt(cd0 / k));
    expectClose(r.maxExcessThrustMach!, machOf(qMinDrag), { rel: 1e-6 }, 'minimum-drag speed, CL = sqrt(CD0/K)');
  });

  it('thrustDragCrossover with the Mattingly lapse finds both crossings of the scipy reference and T = D there', () => {
    const r = expectOk(
      thrustDragCrossover(lapsed, { altitude_m: 9000, mass_kg: 60000, rating: 'maxCruise', isaDev_K: 0 }),
      'crossover',
    );
    // test/reference/analysisReference.py (scipy brentq): 0.5558286009, 0.8802441604
    expectClose(r.lowMach!, 0.5558286009, { abs: 1e-8 }, 'scipy brentq reference');
    expectClose(r.highMach!, 0.8802441604, { abs: 1e-8 }, 'scipy brentq reference');
    for (const mach of [r.lowMach!, r.highMach!]) {
      const d = lapsed.aero.drag({ altitude_m: 9000, mach, mass_kg: 60000, loadFactor: 1 }).drag_N;
      const t = lapsed.propulsion.atRating({ altitude_m: 9000, mach, isaDev_K: 0 }, 'maxCruise').thrust_N;
      expect(Math.abs(t - d) / d).toBeLessThan(CROSSOVER_RELATIVE_THRUST_TOL);
    }
    // Least thrust of alpha = delta0 (1 - 0.49 sqrt(M)): scipy minimize_scalar, M = 0.4113666755.
    // It lies below the stall Mach at this weight, so search the unrestricted scan at light weight.
    const light = expectOk(
      thrustDragCrossover(lapsed, { altitude_m: 9000, mass_kg: 20000, rating: 'maxCruise', isaDev_K: 0 }),
      'crossover',
    );
    expectClose(light.minThrustMach!, 0.4113666755, { abs: 1e-7 }, 'scipy minimize_scalar reference');
    expect(light.stallMach!).toBeLessThan(0.41);
  });

  it('thrustDragCrossover curves hold thrust, drag, excess and Ps consistently', () => {
    const r = expectOk(thrustDragCrossover(lapsed, { altitude_m: 9000, mass_kg: 60000, rating: 'maxCruise', isaDev_K: 0, samples: 11 }), 'crossover');
    expect(r.curves.mach).toHaveLength(11);
    expect(r.curves.mach[0]).toBeCloseTo(r.machRange[0], 12);
    r.curves.mach.forEach((_, i) => {
      expectClose(r.curves.excessThrust_N[i]!, r.curves.thrustAvailable_N[i]! - r.curves.drag_N[i]!, { abs: 1e-9 });
    });
    // The low end of the scan is the stall Mach: CL = CLmax there (CL = W / (q S)).
    const q = 0.7 * isaPressure_Pa(9000) * r.stallMach! ** 2;
    expectClose((60000 * G0) / (q * TEST_POLAR.wingArea_m2), TEST_POLAR.clMax, { rel: 1e-8 }, 'definition of CLmax');
    expect(r.machRange[0]).toBe(r.stallMach);
  });

  it('thrustDragCrossover says above_ceiling with no crossings when thrust stays below drag', () => {
    const r = expectOk(thrustDragCrossover(lapsed, { altitude_m: 13000, mass_kg: 60000, rating: 'maxCruise', isaDev_K: 0 }), 'crossover');
    expect(r.status).toBe('above_ceiling');
    expect(r.lowMach).toBeNull();
    expect(r.highMach).toBeNull();
    expect(r.message).toMatch(/above the ceiling/);
  });

  it('thrustDragCrossover band narrows with altitude', () => {
    const widths = [5000, 7000, 9000].map((h) => {
      const r = expectOk(thrustDragCrossover(lapsed, { altitude_m: h, mass_kg: 60000, rating: 'maxCruise', isaDev_K: 0 }), 'crossover');
      const lo = r.lowMach ?? r.machRange[0];
      const hi = r.highMach ?? r.machRange[1];
      return hi - lo;
    });
    expect(widths[1]!).toBeLessThan(widths[0]!);
    expect(widths[2]!).toBeLessThan(widths[1]!);
  });

  it('thrustDragCrossover rejects bad input with a message naming the field', () => {
    const r = thrustDragCrossover(lapsed, { altitude_m: 9000, mass_kg: -1, rating: 'maxCruise', isaDev_K: 0 });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('invalid_input');
      expect(r.error.message).toMatch(/mass -1 kg/);
    }
    const r2 = thrustDragCrossover(lapsed, { altitude_m: 9000, mass_kg: 6e4, rating: 'maxCruise', isaDev_K: 0, machRange: [0.9, 0.5] });
    expect(r2.ok).toBe(false);
    const r3 = thrustDragCrossover(lapsed, { altitude_m: 1e6, mass_kg: 6e4, rating: 'maxCruise', isaDev_K: 0 });
    expect(r3.ok ? 'ok' : r3.error.code).toBe('atmosphere_out_of_range');
  });
});

describe('thrustDragCrossover edge cases', () => {
  it('thrustDragCrossover is above_ceiling with null extremes when the wing cannot lift the mass in the range', () => {
    const r = expectOk(thrustDragCrossover(lapsed, { altitude_m: 15000, mass_kg: 300000, rating: 'maxCruise', isaDev_K: 0 }), 'crossover');
    expect(r.status).toBe('above_ceiling');
    expect(r.stallMach).toBeNull();
    expect(r.maxExcessThrustMach).toBeNull();
    expect(r.curves.mach).toHaveLength(0);
    expect(r.message).toMatch(/CLmax/);
  });

  it('thrustDragCrossover refuses too few samples', () => {
    const r = thrustDragCrossover(lapsed, { altitude_m: 9000, mass_kg: 60000, rating: 'maxCruise', isaDev_K: 0, samples: 3 });
    expect(r.ok ? '' : r.error.message).toMatch(/samples 3/);
  });
});

describe('thrustDragCrossover on the demo deck', () => {
  it('thrustDragCrossover on the demo deck: T = D at the crossings; the band narrows with altitude and weight', async () => {
    const { readFileSync } = await import('node:fs');
    const { fileURLToPath } = await import('node:url');
    const { parseProject } = await import('../../../engine/project/parseProject');
    const { parseDeckCsv } = await import('../../../engine/propulsion/deckCsv');
    const { buildMissionInput } = await import('../../../engine/project/buildMissionInput');
    const root = fileURLToPath(new URL('../../../fixtures/demo/', import.meta.url));
    const project = expectOk(parseProject(readFileSync(`${root}demo.blockwise.json`, 'utf8'), 'demo'), 'demo');
    const deck = expectOk(parseDeckCsv(readFileSync(`${root}demo-engine.deck.csv`, 'utf8'), 'deck'), 'deck');
    const input = expectOk(buildMissionInput(project, { deck }), 'input');
    const models = { aero: input.aero, propulsion: input.propulsion };
    const at = (altitude_m: number, mass_kg: number) =>
      expectOk(thrustDragCrossover(models, { altitude_m, mass_kg, rating: 'maxCruise', isaDev_K: 0 }), 'crossover');
    const width = (r: ReturnType<typeof at>) => (r.highMach ?? r.machRange[1]) - (r.lowMach ?? r.machRange[0]);
    const bands = [12000, 12500, 13000].map((h) => at(h, 14000));
    for (const b of bands) expect(b.status).toBe('ok');
    expect(width(bands[1]!)).toBeLessThan(width(bands[0]!));
    expect(width(bands[2]!)).toBeLessThan(width(bands[1]!));
    expect(width(at(12500, 15500))).toBeLessThan(width(bands[1]!));
    for (const b of bands) {
      for (const m of [b.lowMach, b.highMach].filter((x): x is number => x !== null)) {
        const t = models.propulsion.atRating({ altitude_m: b.altitude_m, mach: m, isaDev_K: 0 }, 'maxCruise').thrust_N;
        const d = models.aero.drag({ altitude_m: b.altitude_m, mach: m, mass_kg: 14000, loadFactor: 1 }).drag_N;
        expect(Math.abs(t - d) / d).toBeLessThan(CROSSOVER_RELATIVE_THRUST_TOL);
      }
    }
    expect(bands[2]!.lowMach).not.toBeNull();
  });

  it('thrustDragCrossover bounds level flight by the highest of stall, buffet onset and the low crossover, and the lowest of the high crossover and MMO/VMO', () => {
    // Lift limits at 1 g: CL = W / (0.7 p M^2 S) (NACA Report 1135 form of q); stall at CLmax, buffet onset at the
    // polar's buffet CL 0.9 - 0.3 M (TEST_POLAR), solved here by bisection independently of the engine.
    const h = 10000;
    const m = 45000;
    const W = m * G0;
    const p = isaPressure_Pa(h);
    const { clMax, wingArea_m2: S } = TEST_POLAR;
    const clNeeded = (M: number) => W / (0.7 * p * M * M * S);
    const stall = Math.sqrt(W / (0.7 * p * S * clMax));
    let lo = 0.05;
    let hi = 0.95;
    for (let i = 0; i < 100; i++) {
      const mid = 0.5 * (lo + hi);
      if (clNeeded(mid) > 0.9 - 0.3 * mid) lo = mid;
      else hi = mid;
    }
    const buffet = 0.5 * (lo + hi);
    const vmo_m_s = 400; // CAS well above, so MMO binds (its Mach at 10 km is far beyond 0.7)
    const r = expectOk(
      thrustDragCrossover(lapsed, { altitude_m: h, mass_kg: m, rating: 'maxCruise', isaDev_K: 0, speedLimits: { vmo_m_s, mmo: 0.7 } }),
      'crossover',
    );
    expect(r.status).toBe('ok');
    expectClose(r.stallMach!, stall, { rel: 1e-6 }, 'stall Mach, CL = CLmax');
    expectClose(r.buffetOnsetMach!, buffet, { rel: 1e-6 }, 'buffet onset at 1 g');
    const low = Math.max(stall, buffet, r.lowMach ?? 0);
    expectClose(r.lowSpeedLimit!.mach, low, { rel: 1e-9 }, 'low-speed limit = highest of stall, buffet onset, low crossover');
    expect(r.lowSpeedLimit!.source).toBe(low === buffet ? 'buffetOnset' : low === stall ? 'stall' : 'crossover');
    expect(r.highSpeedLimit!.mach).toBeLessThanOrEqual(Math.min(r.highMach ?? 1, 0.7));
    expect(r.highSpeedLimit!.source).toBe((r.highMach ?? 1) < 0.7 ? 'crossover' : 'mmo');
    expect(r.message).toMatch(/buffet onset|stall|crossover/);
    // Without speed limits the high-speed limit is the high crossover itself.
    const free = expectOk(thrustDragCrossover(lapsed, { altitude_m: h, mass_kg: m, rating: 'maxCruise', isaDev_K: 0 }), 'crossover');
    if (free.highMach !== null) {
      expect(free.highSpeedLimit).toEqual({ mach: free.highMach, source: 'crossover' });
    }
  });
});
