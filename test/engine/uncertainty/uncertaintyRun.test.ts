/**
 * The seeded Monte Carlo: reproducible bit for bit; with every spread zero the
 * band collapses exactly to the deterministic answer; a known linear response
 * gives the analytical mean and variance (closed forms for the uniform and
 * the truncated normal, e.g. Johnson, Kotz & Balakrishnan, Continuous
 * Univariate Distributions vol. 1, truncated normal moments); common random
 * numbers give the demo's difference B - A a smaller spread than independent
 * samples.
 */
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import type { MissionInput, MissionResult } from '../../../engine/mission/missionTypes';
import type { Project } from '../../../engine/project/projectSchema';
import { normalCdf } from '../../../engine/uncertainty/normalDistribution';
import { runUncertainty, uncertaintySteps } from '../../../engine/uncertainty/uncertaintyRun';
import { expectClose } from '../../support/assertInDelta';
import { demoProject } from './demoStudy';

const { project: demo, deck } = demoProject();
const designs = [demo.inlets[0]!.name, demo.inlets[1]!.name];

function withInputs(project: Project, inputs: NonNullable<Project['uncertainty']>['inputs']): Project {
  return { ...project, uncertainty: { samples: 10, seed: 1, inputs } };
}

describe('uncertainty Monte Carlo on the demo', () => {
  it('gives the same numbers bit for bit for the same seed, and others for another seed', () => {
    const run = (seed: number) => expectOk(runUncertainty({ project: demo, resources: { deck }, designs, samples: 5, seed }), 'run');
    const a = run(17);
    const b = run(17);
    expect(b).toStrictEqual(a);
    expect(run(18).values.difference_kg).not.toEqual(a.values.difference_kg);
  }, 120_000);

  it('collapses exactly to the deterministic answer when every spread is zero', () => {
    const zero = withInputs(demo, [
      { input: 'cd0', distribution: { kind: 'normal', mean: 0, sd: 0 }, reason: '' },
      { input: 'tsfc', distribution: { kind: 'uniform', min: 0, max: 0 }, reason: '' },
      { input: 'recovery', inlet: 'short', distribution: { kind: 'normal', mean: 0, sd: 0 }, reason: '' },
      { input: 'lipSuction', distribution: { kind: 'uniform', min: 0, max: 0 }, reason: '' },
      { input: 'oew', distribution: { kind: 'normal', mean: 0, sd: 0 }, reason: '' },
    ]);
    const r = expectOk(runUncertainty({ project: zero, resources: { deck }, designs, samples: 4, seed: 3 }), 'run');
    r.designs.forEach((d, k) => {
      const det = r.deterministic.blockFuel_kg[k]!;
      for (const v of [d.blockFuel_kg.mean, d.blockFuel_kg.p05, d.blockFuel_kg.p50, d.blockFuel_kg.p95, d.blockFuel_kg.min, d.blockFuel_kg.max]) expect(v).toBe(det);
      expect(d.blockFuel_kg.sd).toBe(0);
    });
    const diff = r.deterministic.difference_kg!;
    expect([r.difference_kg!.mean, r.difference_kg!.p05, r.difference_kg!.p95]).toEqual([diff, diff, diff]);
    expect(r.probabilityBBetter).toBe(diff < 0 ? 1 : 0);
    expect(r.drivers.every((d) => d.rhoDifference === null && d.share === null)).toBe(true);
  }, 60_000);

  it('common random numbers give B - A a smaller spread than independent samples (16 samples each)', () => {
    const common = expectOk(runUncertainty({ project: demo, resources: { deck }, designs, samples: 16, seed: 5, pairing: 'common' }), 'common');
    const independent = expectOk(runUncertainty({ project: demo, resources: { deck }, designs, samples: 16, seed: 5, pairing: 'independent' }), 'independent');
    expect(common.difference_kg!.sd).toBeLessThan(0.6 * independent.difference_kg!.sd);
    // Each design's own band is about as wide either way: the saving is in the pairing, not the sampling.
    expectClose(common.designs[0]!.blockFuel_kg.sd, independent.designs[0]!.blockFuel_kg.sd, { rel: 0.5 }, 'same marginal spread');
  }, 120_000);

  it('reports progress after every mission and can be cancelled', () => {
    const steps = uncertaintySteps({ project: demo, resources: { deck }, designs, samples: 3, seed: 1 });
    const first = steps.next();
    expect(first.done).toBe(false);
    expect(first.value).toEqual({ done: 1, total: 8 });
    let calls = 0;
    const r = runUncertainty({ project: demo, resources: { deck }, designs, samples: 3, seed: 1 }, { onProgress: () => calls++, shouldCancel: () => calls >= 3 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.code).toBe('cancelled');
    expect(calls).toBe(3);
  }, 60_000);

  it('refuses bad settings with a message instead of throwing', () => {
    const r = runUncertainty({ project: demo, resources: { deck }, designs: ['nope'], samples: 3, seed: 1 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toContain('"nope" is not an inlet design');
  });
});

describe('the recovery method as a discrete alternative', () => {
  it('flies each alternative in the share of samples its weight gives (exactly, by the Latin hypercube strata) and applies it', () => {
    const project = withInputs(demo, [{ input: 'recoveryMethod', alternatives: [{ method: 'raymerHeld', weight: 3 }, { method: 'raymerScaled', weight: 1 }], reason: '' }]);
    const seen: string[] = [];
    const solve = (m: MissionInput) => {
      // Raymer's rule with fuel scaled with recovery burns less at the same power than with fuel held (recovery below the reference).
      seen.push(m.propulsion.atPower({ altitude_m: 11000, mach: 0.78, isaDev_K: 0 }, 0.8).fuelFlow_kg_s.toFixed(6));
      return { status: 'ok', statusMessage: '', blockFuel_kg: 1 } as unknown as MissionResult;
    };
    const r = expectOk(runUncertainty({ project, resources: { deck }, designs: [designs[0]!], samples: 8, seed: 4, solve }), 'discrete');
    const draws = r.values.inputs.map((row) => row[0]);
    expect(draws.filter((d) => d === 0)).toHaveLength(6);
    expect(draws.filter((d) => d === 1)).toHaveLength(2);
    // Two different fuel flows among the samples (the deterministic mission first), matching the draws.
    const bySample = seen.slice(1);
    draws.forEach((d, i) => expect(bySample[i]).toBe(bySample[draws.indexOf(d)]));
    expect(new Set(bySample).size).toBe(2);
    expect(r.inputs[0]!.distribution).toBe("one of Raymer's rule, fuel held (75 %), Raymer's rule, fuel scaled with recovery (25 %)");
  });
});

describe('a known linear response', () => {
  // A stand-in solver whose block fuel is linear in two inputs it can read back from the mission input:
  // y = 5000 + 2 (OEW - OEW0) + 10000 (fuel-flow scale - 1). OEW ~ normal(0, 100 kg) truncated at +/-3 sd, TSFC ~ uniform(-2 %, +2 %).
  const base = { ...demo, uncertainty: undefined };
  let oew0 = 0;
  let ff0 = 0;
  const condition = { altitude_m: 11000, mach: 0.78, isaDev_K: 0 };
  function fake(m: MissionInput, offset: number): MissionResult {
    const ff = m.propulsion.atPower(condition, 0.8).fuelFlow_kg_s;
    if (oew0 === 0) {
      oew0 = m.airframe.oew_kg;
      ff0 = ff;
    }
    return { status: 'ok', statusMessage: '', blockFuel_kg: offset + 5000 + 2 * (m.airframe.oew_kg - oew0) + 10000 * (ff / ff0 - 1) } as unknown as MissionResult;
  }

  it('gives the analytical mean and variance to within 3 plain Monte-Carlo standard errors (n = 400)', () => {
    const project = withInputs(base, [
      { input: 'oew', distribution: { kind: 'normal', mean: 0, sd: 100 }, reason: '' },
      { input: 'tsfc', distribution: { kind: 'uniform', min: -0.02, max: 0.02 }, reason: '' },
    ]);
    const n = 400;
    // The first mission flown is the deterministic one: it fixes OEW0 and the nominal fuel flow.
    const r = expectOk(runUncertainty({ project, resources: { deck }, designs: [designs[0]!], samples: n, seed: 99, solve: (m) => fake(m, 0) }), 'linear');
    expect(r.deterministic.blockFuel_kg[0]).toBe(5000);
    // Truncated normal at +/-a sd: variance sd^2 (1 - 2 a phi(a) / (2 Phi(a) - 1)) (closed form).
    const a = 3;
    const phi = Math.exp(-0.5 * a * a) / Math.sqrt(2 * Math.PI);
    const varOew = 100 * 100 * (1 - (2 * a * phi) / (2 * normalCdf(a) - 1));
    const varTsfc = (0.04 * 0.04) / 12; // uniform of width 0.04
    const variance = 4 * varOew + 1e8 * varTsfc;
    const s = r.designs[0]!.blockFuel_kg;
    expectClose(s.mean, 5000, { abs: 3 * Math.sqrt(variance / n) }, 'mean 5000 (linear in zero-mean inputs)');
    // Standard error of a sample variance ~ sigma^2 sqrt(2/(n-1)) (normal-like response).
    expectClose(s.sd * s.sd, variance, { abs: 3 * variance * Math.sqrt(2 / (n - 1)) }, 'variance 4 Var(OEW) + 1e8 Var(TSFC)');
    // Both inputs drive it, OEW (78 % of the variance) more than TSFC (22 %).
    expect(r.drivers.map((d) => d.input)).toEqual(['oew', 'tsfc']);
    expectClose(r.drivers[0]!.share!, (4 * varOew) / variance, { abs: 0.05 }, 'rank-correlation share near the variance share');
  });
});
