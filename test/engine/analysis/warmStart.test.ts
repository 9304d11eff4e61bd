import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { compareInlets } from '../../../engine/analysis/inletComparison';
import { inletFactorBuilder } from '../../../engine/analysis/inletFactorBuilder';
import { payloadRangeDiagram } from '../../../engine/analysis/payloadRange';
import { tradeFactors } from '../../../engine/analysis/tradeFactors';
import { iterationRoot, lagrangeWeights, solveFrom, subsetWeights, warmStartFor } from '../../../engine/analysis/warmStart';
import { expectOk } from '../../../engine/core/result';
import { prepareStudy } from '../../../engine/study';
import { FIXED_MASS_FUEL_TOLERANCE_KG, FUEL_TOLERANCE_KG } from '../../../engine/mission/fuelIteration';
import type { MissionInput, MissionResult } from '../../../engine/mission/missionTypes';
import { solveMission } from '../../../engine/mission/solveMission';
import { buildMissionInput } from '../../../engine/project/buildMissionInput';
import { parseProject } from '../../../engine/project/parseProject';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { expectClose } from '../../support/assertInDelta';

const root = fileURLToPath(new URL('../../../fixtures/demo/', import.meta.url));
const project = expectOk(parseProject(readFileSync(`${root}demo.blockwise.json`, 'utf8'), 'demo'), 'demo');
const deck = expectOk(parseDeckCsv(readFileSync(`${root}demo-engine.deck.csv`, 'utf8'), 'deck'), 'deck');
const demo: MissionInput = expectOk(buildMissionInput(project, { deck }), 'demo input');
const withOew = (dm: number): MissionInput => ({ ...demo, airframe: { ...demo.airframe, oew_kg: demo.airframe.oew_kg + dm } });

/** Counts the passes of every mission an analysis flies, with or without its warm starts. */
function counting(warm: boolean) {
  const passes: number[] = [];
  const solve = (input: MissionInput, start?: Parameters<typeof solveFrom>[1]): MissionResult => {
    const r = warm ? solveFrom(input, start) : solveMission(input);
    passes.push(r.iterations);
    return r;
  };
  return { passes, solve, total: () => passes.reduce((a, b) => a + b, 0) };
}

describe('warm starts of an analysis', () => {
  it('subsetWeights is the Moebius prediction: exact when the subset adds no interaction of its own order', () => {
    // v(S) = 3 + sum of singles + sum of pair interactions (no order-3 or order-4 terms): Moebius inversion
    // (Grabisch 2016, ch. 2) predicts every subset of 3 or 4 exactly and misses a pair by its own interaction.
    const single = [1.5, -2, 0.25, 4];
    const pair = (i: number, j: number) => 0.1 * (i + 1) * (j + 2);
    const v = (mask: number) => {
      let s = 3;
      for (let i = 0; i < 4; i++) if (mask & (1 << i)) s += single[i]!;
      for (let i = 0; i < 4; i++) for (let j = i + 1; j < 4; j++) if (mask & (1 << i) && mask & (1 << j)) s += pair(i, j);
      return s;
    };
    const predict = (mask: number) => subsetWeights(mask).reduce((s, w) => s + w.weight * v(w.mask), 0);
    for (const mask of [7, 11, 13, 14, 15]) expectClose(predict(mask), v(mask), { abs: 1e-12 }, 'Moebius inversion, no top-order term');
    expectClose(v(5) - predict(5), pair(0, 2), { abs: 1e-12 }, 'Moebius coefficient of the pair');
    expect(subsetWeights(1)).toEqual([{ mask: 0, weight: 1 }]);
    for (const mask of [3, 6, 15]) expectClose(subsetWeights(mask).reduce((s, w) => s + w.weight, 0), 1, { abs: 0 });
    expect(subsetWeights(0)).toEqual([]);
  });

  it('lagrangeWeights reproduce a quadratic exactly, inside and outside the nodes (Lagrange interpolation)', () => {
    const p = (t: number) => 2 - 3 * t + 0.7 * t * t;
    const nodes = [0, 0.5, -0.5];
    for (const t of [1, -1, 0.25]) {
      const w = lagrangeWeights(nodes, t);
      expectClose(w.reduce((s, x, k) => s + x * p(nodes[k]!), 0), p(t), { abs: 1e-12 }, 'polynomial through three nodes');
      expectClose(w.reduce((s, x) => s + x, 0), 1, { abs: 1e-12 });
    }
    expect(lagrangeWeights([0], 0.5)).toEqual([1]);
  });

  it('iterationRoot is where the converged iteration\'s residual reaches the band\'s middle: the same root wherever in the band it stopped', () => {
    // The same mission converged twice, cold and from a neighbour's start: the iterations stop at different points of
    // the band, but one secant step from each (Burden & Faires, Numerical Analysis, 2.3; the residual is close to
    // linear in the ramp mass over the band's width) lands on the same root, far closer than the two stops are.
    const cold = solveMission(withOew(0));
    // A neighbour 40 kg of empty mass away: its start lands the second pass elsewhere in the band than the cold
    // solve's third (both iterations now step close to the band's middle, so a farther one may stop as close).
    const warm = solveMission(withOew(0), { warmStart: solveMission(withOew(40)).warmStart });
    const stops = Math.abs(warm.rampMass_kg - cold.rampMass_kg);
    expect(stops).toBeGreaterThan(1e-3);
    const roots = Math.abs(iterationRoot(warm)! - iterationRoot(cold)!);
    expect(roots).toBeLessThan(0.1 * stops);
    expect(roots).toBeLessThan(1e-3);
    expect(iterationRoot({ residual_kg: 0 })).toBeUndefined();
  });

  it('warmStartFor blends the neighbours\' iteration roots and top of descent, keeping the slope of the one it starts from', () => {
    const a = solveMission(withOew(0));
    const b = solveMission(withOew(100));
    expect(a.warmStart).toBeDefined();
    const w = warmStartFor({ from: b, blend: [{ weight: 2, result: b }, { weight: -1, result: a }] })!;
    expectClose(w.rampMass_kg!, 2 * iterationRoot(b)! - iterationRoot(a)!, { abs: 1e-9 });
    expectClose(w.afterSolvable!.mass_kg, 2 * b.warmStart!.afterSolvable!.mass_kg - a.warmStart!.afterSolvable!.mass_kg, { abs: 1e-9 });
    expect(w.slope).toBe(b.warmStart!.slope);
    const failed = { ...a, status: 'did_not_converge' as const, warmStart: undefined };
    expect(warmStartFor({ from: failed })).toBeNull();
  });

  it('solveFrom flies a warm start that does not come out ok again cold, and counts both solves\' passes', () => {
    // The demo's converged start on a mission that cannot be flown (9,000 NM, beyond the tanks): the warm solve does
    // not come out ok, so it is flown again cold and the cold solve's status and message are the answer.
    const far: MissionInput = { ...demo, solve: { ...demo.solve, range_m: 9000 * 1852 } as MissionInput['solve'] };
    const cold = solveMission(far);
    expect(cold.status).not.toBe('ok');
    const passes: number[] = [];
    const start = { from: solveMission(demo) };
    const r = solveFrom(far, start, { onPasses: (n) => passes.push(n) });
    expect(r.status).toBe(cold.status);
    expect(r.statusMessage).toBe(cold.statusMessage);
    expect(passes).toHaveLength(2);
    expect(passes[1]).toBe(cold.iterations);
  });

  it('a mission started from its neighbours lands on the cold answer within the fuel band, in fewer passes', () => {
    const base = solveMission(withOew(0));
    const up = solveMission(withOew(100));
    const cold = solveMission(withOew(200));
    const warm = solveFrom(withOew(200), { from: up, blend: lagrangeWeights([0, 100], 200).map((weight, k) => ({ weight, result: [base, up][k]! })) });
    expect(warm.status).toBe('ok');
    // The fuel band (fuelIteration.ts): each answer lands 0 to FUEL_TOLERANCE_KG over the reserve.
    expectClose(warm.blockFuel_kg, cold.blockFuel_kg, { abs: FUEL_TOLERANCE_KG }, 'same converged flight within the fuel band');
    expect(warm.iterations).toBeLessThan(cold.iterations);
  });

  it('trade factors and the payload-range diagram give the cold answers within the fuel band in fewer passes', () => {
    const coldT = counting(false);
    const warmT = counting(true);
    const c = expectOk(tradeFactors(demo, { solve: coldT.solve }), 'cold trade');
    const w = expectOk(tradeFactors(demo, { solve: warmT.solve }), 'warm trade');
    c.factors.forEach((f, i) => {
      const g = w.factors[i]!;
      // d = (v+ - v-) / 2h: each v within the band, so d within band / h (h = 1 and 1/2 unit).
      expectClose(g.blockFuelPerUnit_kg!, f.blockFuelPerUnit_kg!, { abs: FUEL_TOLERANCE_KG }, `${f.name}, step 1`);
      expectClose(g.blockFuelPerUnitHalfStep_kg!, f.blockFuelPerUnitHalfStep_kg!, { abs: 2 * FUEL_TOLERANCE_KG }, `${f.name}, step 1/2`);
    });
    expect(warmT.total()).toBeLessThan(coldT.total());
    const coldP = counting(false);
    const warmP = counting(true);
    const cp = expectOk(payloadRangeDiagram(demo, { solve: coldP.solve }), 'cold payload-range');
    const wp = expectOk(payloadRangeDiagram(demo, { solve: warmP.solve }), 'warm payload-range');
    cp.points.forEach((p, i) => expectClose(wp.points[i]!.blockFuel_kg, p.blockFuel_kg, { abs: FUEL_TOLERANCE_KG }, `point ${i}`));
    expect(warmP.total()).toBeLessThan(coldP.total());
  }, 60_000);

  it('the inlet comparison gives the cold breakdown within the fuel band in fewer passes, its parts still adding up', () => {
    const [nameA, nameB] = [project.inlets[0]!.name, project.inlets[1]!.name];
    // The pair as the front doors build it (engine/study: the CLI's compare and the app's worker).
    const build = inletFactorBuilder(expectOk(expectOk(prepareStudy(project, { name: 'demo-engine.deck.csv', text: readFileSync(`${root}demo-engine.deck.csv`, 'utf8') }), 'demo study').inletPair(nameA, nameB), 'inlet pair'));
    const cold = counting(false);
    const warm = counting(true);
    const c = expectOk(compareInlets(build, { nameA, nameB, solve: cold.solve }), 'cold compare');
    const w = expectOk(compareInlets(build, { nameA, nameB, solve: warm.solve }), 'warm compare');
    // A Shapley share is a weighted mean (weights adding to 1) of differences v(S + i) - v(S), each block fuel
    // within one band of the cold one: the share is within 2 bands of the cold share.
    w.breakdown.parts.forEach((p, i) => expectClose(p.blockFuel_kg, c.breakdown.parts[i]!.blockFuel_kg, { abs: 2 * FUEL_TOLERANCE_KG }, p.factor));
    expectClose(w.breakdown.sumOfParts_kg, w.breakdown.total_kg, { abs: 1e-9 }, 'Shapley efficiency (Shapley 1953)');
    expect(w.designs[0].ceilings).toEqual(c.designs[0].ceilings);
    expect(warm.total()).toBeLessThan(cold.total());
  }, 60_000);
});

describe('analysisSolver, the analyses\' default solver', () => {
  const withHistory = (input: MissionInput, start?: Parameters<typeof solveFrom>[1]) => solveFrom(input, start);

  it('gives the trade factors and the inlet comparison bit for bit as solveFrom with a time history', () => {
    // SolveOptions.timeHistory: every pass flies the same without the samples (test/engine/mission/solveOptions.test.ts).
    expect(expectOk(tradeFactors(demo, {}), 'default trade')).toEqual(expectOk(tradeFactors(demo, { solve: withHistory }), 'trade with history'));
    const [nameA, nameB] = [project.inlets[0]!.name, project.inlets[1]!.name];
    const build = inletFactorBuilder(expectOk(expectOk(prepareStudy(project, { name: 'demo-engine.deck.csv', text: readFileSync(`${root}demo-engine.deck.csv`, 'utf8') }), 'demo study').inletPair(nameA, nameB), 'inlet pair'));
    expect(expectOk(compareInlets(build, { nameA, nameB }), 'default compare')).toEqual(expectOk(compareInlets(build, { nameA, nameB, solve: withHistory }), 'compare with history'));
  }, 60_000);

  it('the payload-range diagram with one pass memo per lane: every point within the fuel band of its own memo\'s', () => {
    // The shared memo interpolates the alternate's descent and the contingency hold between flights of the same
    // aircraft (engine/mission/passMemo.ts); the iteration then stops elsewhere in the same fuel band
    // (FIXED_MASS_FUEL_TOLERANCE_KG, 0.004 kg; on the demo 1.4e-4 kg and 0.22 m apart at most, 3.5e-4 kg and
    // 0.54 m with 10 points between corners). 1 m of range is about 0.6 g of fuel at the end of the cruise.
    const shared = expectOk(payloadRangeDiagram(demo, {}), 'shared memo');
    const own = expectOk(payloadRangeDiagram(demo, { solve: withHistory }), 'own memo');
    expect(shared.points.length).toBe(own.points.length);
    own.points.forEach((p, i) => {
      const q = shared.points[i]!;
      expect(q.kind).toBe(p.kind);
      expect(q.payload_kg).toBe(p.payload_kg);
      expectClose(q.blockFuel_kg, p.blockFuel_kg, { abs: FIXED_MASS_FUEL_TOLERANCE_KG }, `point ${i} block fuel`);
      expectClose(q.range_m, p.range_m, { abs: 1 }, `point ${i} range`);
      expect(q.cautions.map((c) => c.id)).toEqual(p.cautions.map((c) => c.id));
    });
  });
});
