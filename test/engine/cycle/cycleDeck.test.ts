import { describe, expect, it } from 'vitest';
import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';
import { expectOk } from '../../../engine/core/result';
import { cycleDeck, cycleDeckPowers, leverFanSpeed, POWER_LEVER, SENSITIVITY_STEPS } from '../../../engine/cycle/cycleDeck';
import { cycleDeckFromText } from '../../../engine/cycle/cycleDeckCache';
import { runCyclePoint } from '../../../engine/cycle/index';
import { deckGridPoints } from '../../../engine/propulsion/deckGrid';
import { lookupDeck } from '../../../engine/propulsion/deckLookup';
import type { InletDesign } from '../../../engine/propulsion/inletDesign';
import { makeInstalledPropulsion } from '../../../engine/propulsion/installedPropulsion';
import { expectClose } from '../../support/assertInDelta';
import { DEMO_CYCLE, designedCycle, ft } from './cycleFixtures';
import { readFileSync } from 'node:fs';

const engine = designedCycle(DEMO_CYCLE);
const GRID = { altitudes_m: [ft(0), ft(20000), ft(37000)], machs: [0, 0.45, 0.8] };
const made = expectOk(cycleDeck(engine, GRID), 'cycle deck');
const deck = made.deck;
const RATINGS = ['flightIdle', 'maxCruise', 'maxClimb', 'maxContinuous', 'takeoff'] as const;

function ratingN1(altitude_m: number, mach: number): number[] {
  return RATINGS.map((rating) => runCyclePoint(engine, { altitude_m, mach, isaDeviation_K: 0, throttle: { kind: 'rating', rating } }).fanSpeed!);
}

describe('leverFanSpeed', () => {
  it('leverFanSpeed is exact at each rating and linear between adjacent ratings (the power-lever definition)', () => {
    const n = [0.5, 0.9, 0.93, 0.95, 0.97];
    RATINGS.forEach((r, i) => expect(leverFanSpeed(POWER_LEVER[r], n)).toBe(n[i]));
    // Halfway between maxCruise (0.85) and maxClimb (0.9): the mean of their N1 (linear interpolation).
    expectClose(leverFanSpeed(0.875, n), 0.915, { rel: 1e-14 }, 'linear interpolation');
    expectClose(leverFanSpeed(0.5, n), 0.5 + ((0.5 - 0.2) / (0.85 - 0.2)) * 0.4, { rel: 1e-14 }, 'linear interpolation');
  });
});

describe('cycleDeck', () => {
  it('cycleDeck tabulates every grid node at the lever powers with airflow and sensitivity columns', () => {
    expect(made.gaps).toEqual([]);
    expect(deck.hasAirflow).toBe(true);
    expect(deck.hasSensitivities).toBe(true);
    expect(deck.grid.power.length).toBe(9 * cycleDeckPowers().length);
    expect(deck.ratings).toEqual(POWER_LEVER);
    expect(deck.referenceRecovery).toEqual({ kind: 'constant', value: engine.spec.design.inletRecovery });
    expect(deck.notes.join(' ')).toMatch(/power-lever scale/);
  });

  it('cycleDeck reproduces the cycle at each rating and at a part-power lever value (the cycle is the source)', () => {
    const altitude_m = ft(20000);
    const mach = 0.45;
    const n1 = ratingN1(altitude_m, mach);
    for (const rating of RATINGS) {
      const cycle = runCyclePoint(engine, { altitude_m, mach, isaDeviation_K: 0, throttle: { kind: 'rating', rating } });
      const d = expectOk(lookupDeck(deck, { altitude_m, mach, isaDev_K: 0 }, POWER_LEVER[rating]), 'lookup');
      // The deck point is the cycle matched at the rating's N1: equal to the rating's match within the match tolerance.
      expectClose(d.thrust_N, cycle.thrust_N!, { rel: 1e-6 }, `cycle at ${rating}`);
      expectClose(d.fuelFlow_kg_s, cycle.fuelFlow_kg_s!, { rel: 1e-6 }, `cycle at ${rating}`);
      expectClose(d.airflow_kg_s!, cycle.airflow_kg_s!, { rel: 1e-6 }, `cycle at ${rating}`);
    }
    const at = runCyclePoint(engine, { altitude_m, mach, isaDeviation_K: 0, throttle: { kind: 'fanSpeed', fraction: leverFanSpeed(0.6, n1) } });
    expectClose(expectOk(lookupDeck(deck, { altitude_m, mach, isaDev_K: 0 }, 0.6), 'lookup').thrust_N, at.thrust_N!, { rel: 1e-9 }, 'cycle at lever 0.6');
  });

  it('cycleDeck recovery sensitivities follow corrected-flow similarity where both nozzles are choked (Walsh & Fletcher)', () => {
    // At a fixed mechanical N1 and Tt2, a recovery change scales Pt2 only; with both nozzles choked the
    // engine runs at the same referred point, so airflow and fuel flow scale with Pt2: dW/deta = W/eta_ref,
    // dWf/deta = Wf/eta_ref (referred parameter groups, Walsh & Fletcher, Gas Turbine Performance, ch. 4).
    const p = deckGridPoints(deck.grid).find((q) => q.altitude_m === ft(37000) && q.mach === 0.8 && q.power === POWER_LEVER.maxCruise)!;
    const s = p.sensitivities!;
    expectClose(s.dAirflow_dRecovery_kg_s!, p.airflow_kg_s! / engine.spec.design.inletRecovery, { rel: 1e-5 }, 'W proportional to Pt2');
    expectClose(s.dFuelFlow_dRecovery_kg_s, p.fuelFlow_kg_s / engine.spec.design.inletRecovery, { rel: 1e-5 }, 'Wf proportional to Pt2');
    // Thrust falls by more than Raymer's 1.35 % per 1 %: the ram drag W V0 does not scale with Pt2 (a result, not a target).
    expect(s.dThrust_dRecovery_N / p.thrust_N).toBeGreaterThan(1.35);
  });

  it('cycleDeck sensitivities agree with a re-run derivative at half the step (second-order formula, Richardson check)', () => {
    const altitude_m = ft(0);
    const mach = 0.45;
    const p = deckGridPoints(deck.grid).find((q) => q.altitude_m === altitude_m && q.mach === mach && q.power === 0.6)!;
    const n1 = leverFanSpeed(0.6, ratingN1(altitude_m, mach));
    const thrust = (extra: object) => runCyclePoint(engine, { altitude_m, mach, isaDeviation_K: 0, throttle: { kind: 'fanSpeed', fraction: n1 }, ...extra }).thrust_N!;
    const h = SENSITIVITY_STEPS.bleedFraction / 2;
    const f0 = thrust({ bleedFraction: 0 });
    const half = (-3 * f0 + 4 * thrust({ bleedFraction: h }) - thrust({ bleedFraction: 2 * h })) / (2 * h);
    // Both are O(h^2); they agree to a small fraction of the derivative.
    expectClose(p.sensitivities!.dThrust_dBleed_N, half, { rel: 2e-3 }, 'three-point difference at h and h/2');
    const hP = SENSITIVITY_STEPS.powerExtraction_W / 2;
    const fuel = (w: number) => runCyclePoint(engine, { altitude_m, mach, isaDeviation_K: 0, throttle: { kind: 'fanSpeed', fraction: n1 }, powerExtraction_W: w }).fuelFlow_kg_s!;
    const halfP = (-3 * fuel(0) + 4 * fuel(hP) - fuel(2 * hP)) / (2 * hP);
    expectClose(p.sensitivities!.dFuelFlow_dExtraction_kg_s_W, halfP, { rel: 2e-3 }, 'three-point difference at h and h/2');
  });

  it('installing the cycle deck through its sensitivities tracks the cycle re-run at the inlet recovery, bleed and extraction', () => {
    // The first-order expansion against the cycle itself at the same N1: the error is second order in the changes.
    const inlet: InletDesign = {
      name: 'flat 0.97',
      description: 'constant recovery',
      source: { kind: 'recoveryTable', mach: [0, 1], recovery: [0.97, 0.97], captureArea_m2: 5 },
      lipSuctionFactor: 1,
      externalDragArea_m2: 0,
      weight_kg: 0,
    };
    const model = makeInstalledPropulsion({
      deck,
      engineCount: 1,
      inlet,
      installation: { bleed: { kind: 'coreFraction', fraction: 0.015 }, powerExtraction_W: 30e3 },
      cautionSettings: DEFAULT_CAUTION_SETTINGS,
    });
    const altitude_m = ft(37000);
    const mach = 0.8;
    const p = model.atPower({ altitude_m, mach, isaDev_K: 0 }, POWER_LEVER.maxCruise);
    const n1 = ratingN1(altitude_m, mach)[1]!;
    const cycle = runCyclePoint(engine, {
      altitude_m,
      mach,
      isaDeviation_K: 0,
      throttle: { kind: 'fanSpeed', fraction: n1 },
      recovery: 0.97,
      bleedFraction: 0.015,
      powerExtraction_W: 30e3,
    });
    expect(p.perEngine.installationMethod).toBe('deckSensitivities');
    expectClose(p.perEngine.correctedThrust_N, cycle.thrust_N!, { rel: 3e-3 }, 'cycle re-run at the installation');
    expectClose(p.perEngine.fuelFlow_kg_s, cycle.fuelFlow_kg_s!, { rel: 3e-3 }, 'cycle re-run at the installation');
    expectClose(p.perEngine.airflow_kg_s!, cycle.airflow_kg_s!, { rel: 3e-3 }, 'cycle re-run at the installation');
  });

  it('cycleDeck refuses a bad grid with a message, and cycleDeckFromText keeps one deck per text', () => {
    const bad = cycleDeck(engine, { altitudes_m: [0], machs: [0, 0.5] });
    expect(bad.ok).toBe(false);
    expect(bad.ok ? '' : bad.error.message).toMatch(/altitude axis needs at least 2 values/);
    const text = readFileSync(new URL(`../../../${DEMO_CYCLE}`, import.meta.url), 'utf8');
    const a = expectOk(cycleDeckFromText(text, DEMO_CYCLE, GRID), 'from text');
    const b = expectOk(cycleDeckFromText(text, DEMO_CYCLE, GRID), 'from text again');
    expect(b.deck).toBe(a.deck);
    const broken = cycleDeckFromText('{"format": "blockwise-cycle"}', 'broken.cycle.json', GRID);
    expect(broken.ok ? '' : broken.error.code).toBe('cycle_file');
  });
});
