import { describe, expect, it } from 'vitest';
import { compareInlets, type FactorChoice } from '../../../engine/analysis/inletComparison';
import { expectOk } from '../../../engine/core/result';
import type { MissionInput } from '../../../engine/mission/missionTypes';
import { expectClose } from '../../support/assertInDelta';
import { TEST_POLAR, analyticPropulsion, parabolicAero } from './analyticModels';
import { makeBreguetSolver, type BreguetCounter } from './breguetSolver';
import { testMissionInput } from './testMission';

interface Design {
  readonly recoveryScale: number;
  readonly spillage_N: number;
  readonly dCd0: number;
  readonly weight_kg: number;
}
const A: Design = { recoveryScale: 1.0, spillage_N: 400, dCd0: 0.0004, weight_kg: 0 };
// B: 2 % better recovery (C_ram 1.35, Raymer), more spillage, more external drag, heavier: invented numbers.
const B: Design = { recoveryScale: 1 + 1.35 * 0.02, spillage_N: 900, dCd0: 0.0007, weight_kg: 180 };

function builder(a: Design, b: Design, base: MissionInput = testMissionInput()) {
  return (c: FactorChoice): MissionInput => {
    const pick = (k: 'A' | 'B') => (k === 'A' ? a : b);
    return {
      ...base,
      airframe: { ...base.airframe, oew_kg: base.airframe.oew_kg + pick(c.weight).weight_kg },
      aero: parabolicAero(TEST_POLAR, pick(c.externalDrag).dCd0),
      propulsion: analyticPropulsion({
        thrust_N: 250e3,
        lapse: 'mattingly',
        tsfc_kg_N_s: 1.6e-5,
        thrustScale: pick(c.recovery).recoveryScale,
        spillage_N: pick(c.spillage).spillage_N,
      }),
    };
  };
}

describe('compareInlets', () => {
  const counter: BreguetCounter = { calls: 0 };
  const solve = makeBreguetSolver(counter);
  const r = expectOk(compareInlets(builder(A, B), { solve, nameA: 'Pitot short', nameB: 'Pitot long' }), 'compare');

  it('compareInlets breakdown adds up to the block-fuel difference to 1e-9 kg', () => {
    expect(r.breakdown.method).toBe('shapley');
    expect(r.breakdown.missions).toBe(16);
    expect(counter.calls).toBe(16);
    expectClose(r.breakdown.sumOfParts_kg, r.difference.blockFuel_kg, { abs: 1e-9 }, 'Shapley efficiency (Shapley 1953)');
    expectClose(r.breakdown.total_kg, r.difference.blockFuel_kg, { abs: 1e-9 });
    expect(r.breakdown.parts.map((p) => p.factor)).toEqual(['recovery', 'spillage', 'externalDrag', 'weight']);
  });

  it('compareInlets designs carry the missions flown directly', () => {
    const a = solve(builder(A, B)({ recovery: 'A', spillage: 'A', externalDrag: 'A', weight: 'A' }));
    const b = solve(builder(A, B)({ recovery: 'B', spillage: 'B', externalDrag: 'B', weight: 'B' }));
    expect(r.designs[0].name).toBe('Pitot short');
    expectClose(r.designs[0].blockFuel_kg, a.blockFuel_kg, { abs: 1e-12 });
    expectClose(r.designs[1].blockFuel_kg, b.blockFuel_kg, { abs: 1e-12 });
    expectClose(r.difference.blockFuel_kg, b.blockFuel_kg - a.blockFuel_kg, { abs: 1e-12 });
  });

  it('compareInlets signs: better recovery saves fuel; more spillage, drag and weight cost fuel', () => {
    const part = (f: string) => r.breakdown.parts.find((p) => p.factor === f)!.blockFuel_kg;
    expect(part('recovery')).toBeLessThan(0);
    expect(part('spillage')).toBeGreaterThan(0);
    expect(part('externalDrag')).toBeGreaterThan(0);
    expect(part('weight')).toBeGreaterThan(0);
  });

  it('compareInlets: higher recovery alone gives less block fuel and the whole difference goes to recovery', () => {
    const better = { ...A, recoveryScale: 1 + 1.35 * 0.03 };
    const only = expectOk(compareInlets(builder(A, better), { solve: makeBreguetSolver(), nameA: 'A', nameB: 'A+' }), 'compare');
    expect(only.difference.blockFuel_kg).toBeLessThan(0);
    expectClose(only.breakdown.parts[0]!.blockFuel_kg, only.difference.blockFuel_kg, { abs: 1e-9 });
    for (const p of only.breakdown.parts.slice(1)) expectClose(p.blockFuel_kg, 0, { abs: 1e-9 });
  });

  it('compareInlets compares crossovers at one stated condition and ceilings', () => {
    expect(r.crossoverCondition.rating).toBe('maxCruise');
    expect(r.crossoverCondition.altitude_m).toBe(10000);
    for (const d of r.designs) expect(d.ceilings.map((c) => c.name)).toEqual(['absolute', 'service', 'cruise']);
    // B has more thrust at the same spill-adjusted drag: its absolute ceiling is higher here.
    expect(r.difference.ceilings[0]!.altitude_m!).toBeGreaterThan(0);
  });

  it('compareInlets reports progress after each of the 16 missions', () => {
    const seen: number[] = [];
    expectOk(compareInlets(builder(A, B), { solve, nameA: 'A', nameB: 'B', onProgress: (d, t) => seen.push(d * 100 + t) }), 'compare');
    expect(seen).toEqual(Array.from({ length: 16 }, (_, i) => (i + 1) * 100 + 16));
  });

  it('compareInlets stops on cancel and names a failed mission mix', () => {
    const c = compareInlets(builder(A, B), { solve, nameA: 'A', nameB: 'B', shouldCancel: () => true });
    expect(c.ok ? '' : c.error.code).toBe('cancelled');
    const failing = compareInlets(builder(A, B), {
      solve: (i) => ({ ...solve(i), status: 'fuel_exhausted', statusMessage: 'tanks empty' }),
      nameA: 'A',
      nameB: 'B',
    });
    expect(failing.ok ? '' : failing.error.message).toMatch(/recovery A, spillage A, externalDrag A, weight A failed: fuel_exhausted: tanks empty/);
  });
});
