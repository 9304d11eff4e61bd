/**
 * Matching a cycle to a deck (engine/cycle/cycleMatch.ts). The reference of
 * the round trip is self-consistency: a deck generated from a known cycle by
 * the existing generator (cycleDeck) is the closed-form truth, so the fit
 * started from perturbed parameters must give the generating parameters back
 * with near-zero residuals. The parametric-deck case checks properties only
 * (finite residuals, a valid cycle file, unchanged original columns), never
 * demo figures, since the demo data are being regenerated.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { cycleDeck, cycleFileOf, deckWithCycleSensitivities, designEngine, matchCycleToDeck, parseCycleData, type CycleSpec } from '../../../engine/cycle/index';
import { deckGridPoints } from '../../../engine/propulsion/deckGrid';
import { parseDeckText } from '../../../engine/study';
import { expectClose } from '../../support/assertInDelta';
import { cycleSpecFile, DEMO_CYCLE, designedCycle, ft } from './cycleFixtures';

const TRUTH = designedCycle(DEMO_CYCLE);
const GRID = { altitudes_m: [ft(0), ft(15000), ft(35000)], machs: [0.2, 0.5, 0.8] };
const generated = expectOk(cycleDeck(TRUTH, GRID), 'cycle deck').deck;

function perturbed(s: CycleSpec): CycleSpec {
  return {
    ...s,
    design: { ...s.design, bypassRatio: s.design.bypassRatio * 1.08, fanPressureRatio: 1 + (s.design.fanPressureRatio - 1) * 0.93, overallPressureRatio: s.design.overallPressureRatio * 0.92, turbineInletTemperature_K: s.design.turbineInletTemperature_K - 40 },
  };
}

describe('matchCycleToDeck: round trip on a deck generated from a known cycle (self-consistency)', () => {
  const start = perturbed(TRUTH.spec);
  const fit = expectOk(matchCycleToDeck(generated, start), 'match');

  it('converges with near-zero residuals at every rating point (the generating cycle reproduces its own deck exactly)', () => {
    expect(fit.status).toBe('converged');
    expect(fit.unmatched).toHaveLength(0);
    // 9 nodes x 4 ratings (takeoff, maxContinuous, maxClimb, maxCruise): flight idle is left out by default.
    expect(fit.points).toHaveLength(36);
    expect(fit.rms).toBeLessThan(1e-6);
    expect(Math.abs(fit.worst!.residual)).toBeLessThan(1e-5);
  });

  it('recovers the generating parameters to 1e-5 relative (truth: the generating cycle file and its designed airflow)', () => {
    const p = fit.parameters;
    expectClose(p.bypassRatio.fitted, TRUTH.spec.design.bypassRatio, { rel: 1e-5 }, 'bypass ratio');
    expectClose(p.fanPressureRatio.fitted, TRUTH.spec.design.fanPressureRatio, { rel: 1e-5 }, 'fan pressure ratio');
    expectClose(p.overallPressureRatio.fitted, TRUTH.spec.design.overallPressureRatio, { rel: 1e-5 }, 'overall pressure ratio');
    expectClose(p.turbineInletTemperature.fitted, TRUTH.spec.design.turbineInletTemperature_K, { rel: 1e-5 }, 'design Tt4');
    expectClose(p.airflow.fitted, TRUTH.summary.airflow_kg_s, { rel: 1e-5 }, 'design airflow');
    // The start really was away from the truth (the test could fail).
    expect(Math.abs(p.bypassRatio.start / TRUTH.spec.design.bypassRatio - 1)).toBeGreaterThan(0.05);
  });

  it('the fitted spec is sized by airflow and a parameter left fixed keeps its start value', () => {
    expect(fit.spec.design.size.kind).toBe('airflow');
    const fixed = expectOk(matchCycleToDeck(generated, TRUTH.spec, { free: ['airflow'], maxNodes: 3 }), 'airflow only');
    expect(fixed.parameters.bypassRatio.fitted).toBe(TRUTH.spec.design.bypassRatio);
    expect(fixed.parameters.bypassRatio.free).toBe(false);
    expect(fixed.nodesUsed).toBe(3);
    expectClose(fixed.parameters.airflow.fitted, TRUTH.summary.airflow_kg_s, { rel: 1e-5 }, 'airflow alone');
  });

  it('the written cycle document parses back to the fitted spec (cycle file validation)', () => {
    const back = expectOk(parseCycleData(JSON.parse(JSON.stringify(cycleFileOf(fit.spec)))), 'fitted cycle file');
    expect(back).toEqual(fit.spec);
  });

  it('bad options give an error with the reason, never a throw', () => {
    const r1 = matchCycleToDeck(generated, start, { free: [] });
    expect(r1.ok).toBe(false);
    const r2 = matchCycleToDeck(generated, start, { bounds: { bypassRatio: [6, 7] } });
    expect(!r2.ok && r2.error.message).toMatch(/starting bypassRatio .* outside its bounds/);
    const r3 = matchCycleToDeck(generated, start, { nodes: [{ altitude_m: 1234, mach: 0.5 }] });
    expect(!r3.ok && r3.error.message).toMatch(/no deck node at altitude 1234 m/);
    const r4 = matchCycleToDeck(generated, start, { weights: { thrust: 0, fuelFlow: 0 } });
    expect(!r4.ok && r4.error.code).toBe('invalid_options');
    const r5 = matchCycleToDeck(generated, start, { ratings: [] });
    expect(!r5.ok && r5.error.code).toBe('no_points');
    const r6 = matchCycleToDeck(generated, start, { free: ['span' as never] });
    expect(!r6.ok && r6.error.message).toMatch(/"span" is not a parameter that can be fitted/);
  });
});

describe('matchCycleToDeck on the parametric fixture deck (properties, no demo figures)', () => {
  const text = readFileSync(new URL('../../../fixtures/parametric/demo-parametric.deck.csv', import.meta.url), 'utf8');
  const deck = expectOk(parseDeckText(text, 'demo-parametric.deck.csv'), 'parametric deck');
  const fit = expectOk(matchCycleToDeck(deck, cycleSpecFile(DEMO_CYCLE), { maxNodes: 12 }), 'match');

  it('gives finite residuals and a worst point drawn from the points', () => {
    for (const v of [fit.rms, fit.rmsThrust, fit.rmsFuelFlow, fit.worst!.residual]) expect(Number.isFinite(v)).toBe(true);
    for (const p of fit.points) if (p.reason === null) expect(Number.isFinite(p.thrustResidual! + p.fuelFlowResidual!)).toBe(true);
    const all = fit.points.filter((p) => p.reason === null).flatMap((p) => [Math.abs(p.thrustResidual!), Math.abs(p.fuelFlowResidual!)]);
    expect(Math.abs(fit.worst!.residual)).toBe(Math.max(...all));
    // RMS definition: the overall RMS lies between the per-quantity ones.
    expect(fit.rms).toBeGreaterThanOrEqual(Math.min(fit.rmsThrust, fit.rmsFuelFlow) - 1e-15);
    expect(fit.rms).toBeLessThanOrEqual(Math.max(fit.rmsThrust, fit.rmsFuelFlow) + 1e-15);
  });

  it('the fitted cycle passes the cycle file validation and designs', () => {
    const back = expectOk(parseCycleData(JSON.parse(JSON.stringify(cycleFileOf(fit.spec)))), 'fitted cycle file');
    expectOk(designEngine(back), 'design');
  });

  it('the deck copy carries sensitivity columns and the original thrust, fuel flow and airflow unchanged', () => {
    const copy = expectOk(deckWithCycleSensitivities(deck, expectOk(designEngine(fit.spec), 'design')), 'copy').deck;
    expect(copy.hasSensitivities).toBe(true);
    const a = deckGridPoints(deck.grid);
    const b = deckGridPoints(copy.grid);
    expect(b).toHaveLength(a.length);
    a.forEach((p, i) => {
      const q = b[i]!;
      expect([q.altitude_m, q.mach, q.power, q.thrust_N, q.fuelFlow_kg_s, q.airflow_kg_s]).toEqual([p.altitude_m, p.mach, p.power, p.thrust_N, p.fuelFlow_kg_s, p.airflow_kg_s]);
      expect(Number.isFinite(q.sensitivities!.dThrust_dRecovery_N)).toBe(true);
    });
    // Sign check: thrust rises with inlet recovery (common practice): positive at a takeoff point.
    expect(b.find((q) => q.power === 1)!.sensitivities!.dThrust_dRecovery_N).toBeGreaterThan(0);
    expect(copy.ratings).toEqual(deck.ratings);
  });
});
