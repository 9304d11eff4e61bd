import { describe, expect, it } from 'vitest';
import { tradeFactors } from '../../../engine/analysis/tradeFactors';
import { expectOk } from '../../../engine/core/result';
import { expectClose } from '../../support/assertInDelta';
import { analyticPropulsion } from './analyticModels';
import { CONTINGENCY, FINAL_RESERVE_KG, cruiseFactor, makeBreguetSolver } from './breguetSolver';
import { testMissionInput } from './testMission';

const input = testMissionInput(); // payload 10000 kg, range 3000 km, payload-and-range mode
const solve = makeBreguetSolver();
const r = expectOk(tradeFactors(input, { solve }), 'trade factors');
const factor = (n: string) => r.factors.find((f) => f.name === n)!;

// Closed form of the stand-in mission (Breguet, Anderson ch. 5, constant range factor F):
// W0/W1 = E = exp(R/F), W1 = Z + 0.05 trip, Z = ZFW + final reserve
// => trip = Z (E - 1) / (1 - 0.05 (E - 1)).
const F = cruiseFactor(input.aero, input.propulsion, input.airframe.mtow_kg);
const solveKind = input.solve.kind === 'payloadRange' ? input.solve : null;
const R = solveKind!.range_m;
const Z = input.airframe.oew_kg + solveKind!.payload_kg + FINAL_RESERVE_KG;
const E = Math.exp(R / F);
const denom = 1 - CONTINGENCY * (E - 1);

describe('tradeFactors', () => {
  it('tradeFactors per 100 kg OEW matches the Breguet closed form', () => {
    expectClose(factor('oew').blockFuelPerUnit_kg!, (100 * (E - 1)) / denom, { rel: 1e-9 }, 'Breguet closed form, d trip / d Z');
    expect(factor('oew').converged).toBe(true);
  });

  it('tradeFactors per 1 % TSFC matches the Breguet closed-form derivative', () => {
    // d trip / dx with R/F scaled by (1 + x): Z E (R/F) / (1 - 0.05 (E - 1))^2 per unit x; 1 % = 0.01.
    const exact = (0.01 * Z * E * (R / F)) / (denom * denom);
    expectClose(factor('tsfc').blockFuelPerUnit_kg!, exact, { rel: 2e-4 }, 'Breguet derivative (central difference, O(h^2))');
    expectClose(factor('tsfc').blockFuelPerUnitHalfStep_kg!, exact, { rel: 5e-5 }, 'Breguet derivative, half step');
    expect(factor('tsfc').converged).toBe(true);
  });

  it('tradeFactors signs: recovery saves fuel, drag and TSFC and weight cost fuel', () => {
    expect(factor('recovery').blockFuelPerUnit_kg!).toBeLessThan(0);
    expect(factor('dragCount').blockFuelPerUnit_kg!).toBeGreaterThan(0);
    expect(r.missions).toBe(17);
    expectClose(r.baselineBlockFuel_kg, solve(input).blockFuel_kg, { abs: 1e-12 });
    for (const f of r.factors) {
      expect(f.converged).toBe(true);
      expect(f.note).toBeNull();
    }
  });

  it('tradeFactors with the recovery wrapper agrees with a model whose thrust is scaled by 1 + C_ram dEta', () => {
    // Raymer's correction: +dEta recovery = thrust x (1 + C_ram dEta) at the same fuel flow.
    const exact = expectOk(
      tradeFactors(input, {
        solve,
        recoveryModel: (d) => analyticPropulsion({ thrust_N: 250e3, lapse: 'mattingly', tsfc_kg_N_s: 1.6e-5, thrustScale: 1 + 1.35 * d }),
      }),
      'trade factors',
    );
    const e = exact.factors.find((f) => f.name === 'recovery')!;
    expectClose(factor('recovery').blockFuelPerUnit_kg!, e.blockFuelPerUnit_kg!, { rel: 1e-6 }, 'Raymer C_ram correction');
  });

  it('tradeFactors flies a non-design-mode input once to fix the design mission', () => {
    const other = { ...input, solve: { kind: 'maxRange' as const, payload_kg: 8000 } };
    const t = expectOk(tradeFactors(other, { solve }), 'trade factors');
    expect(t.missions).toBe(18);
    expectClose(t.designMission.range_m, solve(other).airDistance_m, { rel: 1e-12 });
    expect(tradeFactors(input, { solve, cRam: -1 }).ok).toBe(false);
  });

  it('tradeFactors reports progress and stops when cancelled', () => {
    const seen: [number, number][] = [];
    expectOk(tradeFactors(input, { solve, onProgress: (d, t) => seen.push([d, t]) }), 'trade factors');
    expect(seen).toHaveLength(17);
    expect(seen[16]).toEqual([17, 17]);
    let polls = 0;
    const c = tradeFactors(input, { solve, shouldCancel: () => ++polls > 5 });
    expect(c.ok ? '' : c.error.code).toBe('cancelled');
  });

  it('tradeFactors keeps the other factors when one perturbed mission fails, and says which', () => {
    const flaky = (i: typeof input) => {
      const res = solve(i);
      return i.airframe.oew_kg === input.airframe.oew_kg + 50 ? { ...res, status: 'did_not_converge' as const, statusMessage: 'residual 44 kg' } : res;
    };
    const t = expectOk(tradeFactors(input, { solve: flaky }), 'trade factors');
    const oew = t.factors.find((f) => f.name === 'oew')!;
    expect(oew.blockFuelPerUnitHalfStep_kg).toBeNull();
    expect(oew.converged).toBe(false);
    expect(oew.note).toMatch(/oew \+0.5 unit mission failed: did_not_converge: residual 44 kg/);
    expectClose(oew.blockFuelPerUnit_kg!, factor('oew').blockFuelPerUnit_kg!, { rel: 1e-12 });
    expect(t.factors.find((f) => f.name === 'tsfc')!.converged).toBe(true);
  });
});
