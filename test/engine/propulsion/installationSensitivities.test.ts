import { describe, expect, it } from 'vitest';
import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';
import { expectOk } from '../../../engine/core/result';
import { CURVE_FUEL_FLOW, CURVE_VALUES } from '../../../engine/propulsion/deckAccess';
import { deckForInterpolation } from '../../../engine/propulsion/deckCorrection';
import { lookupDeck } from '../../../engine/propulsion/deckLookup';
import { temperatureFlowFactor } from '../../../engine/propulsion/deckTemperature';
import type { InletDesign } from '../../../engine/propulsion/inletDesign';
import type { InstallationSettings } from '../../../engine/propulsion/installationCorrections';
import { applyDeckSensitivities, SENSITIVITY_FIELDS } from '../../../engine/propulsion/installationSensitivities';
import { describeInstallationMethod } from '../../../engine/propulsion/installationMethod';
import { installedLossBreakdown } from '../../../engine/propulsion/installedLossBreakdown';
import { FOR_THRUST_TOLERANCE, makeInstalledModel } from '../../../engine/propulsion/installedModel';
import { deckAccess, deckCurve, makeInstalledPropulsion } from '../../../engine/propulsion/installedPropulsion';
import { spillageDrag, additiveDrag } from '../../../engine/propulsion/spillageDrag';
import { streamTubeArea } from '../../../engine/propulsion/inletFlow';
import { atmosphere } from '../../../engine/aero/standardAtmosphere';
import { buildParametricDeck } from '../../../engine/propulsion/parametricDeck';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import { expectClose } from '../../support/assertInDelta';
import { TABLE_INLET } from './inletDesigns';
import { syntheticAt, syntheticDeck } from './sensitivityDeck';

// Closed form throughout: the synthetic deck's columns are affine in (altitude, Mach, power), so
// the interpolated deck is exact anywhere in the table, and the installation by sensitivities is
// X_deck + dX/deta (eta - eta_ref) + dX/dbeta beta + dX/dP P (first-order Taylor expansion).

const RECOVERY = 0.965;
/** A recovery-table inlet with a constant recovery, whose capture area is large enough to spill at cruise. */
const INLET: InletDesign = {
  ...TABLE_INLET,
  name: 'constant 0.965',
  source: { kind: 'recoveryTable', mach: [0, 1], recovery: [RECOVERY, RECOVERY], captureArea_m2: 0.9 },
};
const INSTALL: InstallationSettings = { bleed: { kind: 'coreFraction', fraction: 0.02 }, powerExtraction_W: 75e3 };
const COND = { altitude_m: 4321, mach: 0.63, isaDev_K: 0 };
const POWER = 0.77;

describe('applyDeckSensitivities', () => {
  it('applyDeckSensitivities is the first-order expansion in recovery, bleed and extraction (closed form)', () => {
    const d = syntheticAt(COND.altitude_m, COND.mach, POWER);
    const s = d.sensitivities;
    const e = applyDeckSensitivities(d.thrust_N, d.fuelFlow_kg_s, d.airflow_kg_s, s, -0.035, 0.02, 75e3);
    const thrust = d.thrust_N + s.dThrust_dRecovery_N * -0.035 + s.dThrust_dBleed_N * 0.02 + s.dThrust_dExtraction_N_W * 75e3;
    expectClose(e.thrust_N, thrust, { rel: 1e-14 }, 'Taylor expansion');
    expectClose(
      e.fuelFlow_kg_s,
      d.fuelFlow_kg_s + s.dFuelFlow_dRecovery_kg_s * -0.035 + s.dFuelFlow_dBleed_kg_s * 0.02 + s.dFuelFlow_dExtraction_kg_s_W * 75e3,
      { rel: 1e-14 },
      'Taylor expansion',
    );
    expectClose(
      e.airflow_kg_s!,
      d.airflow_kg_s + s.dAirflow_dRecovery_kg_s! * -0.035 + s.dAirflow_dBleed_kg_s! * 0.02 + s.dAirflow_dExtraction_kg_s_W! * 75e3,
      { rel: 1e-14 },
      'Taylor expansion',
    );
    expectClose(e.recoveryLoss_N + e.bleedLoss_N + e.extractionLoss_N, d.thrust_N - e.thrust_N, { rel: 1e-12 }, 'loss parts add up');
    expect(applyDeckSensitivities(1000, 0.1, null, s, 0, 0, 0).airflow_kg_s).toBeNull();
  });
});

describe('installation by deck sensitivities', () => {
  const deck = syntheticDeck(true);
  const model = makeInstalledPropulsion({ deck, engineCount: 2, inlet: INLET, installation: INSTALL, cautionSettings: DEFAULT_CAUTION_SETTINGS });

  it('a deck with sensitivities is installed through them, and every point says so', () => {
    expect(model.installationMethod).toBe('deckSensitivities');
    const p = model.atPower(COND, POWER);
    expect(p.perEngine.installationMethod).toBe('deckSensitivities');
    const d = syntheticAt(COND.altitude_m, COND.mach, POWER);
    const s = d.sensitivities;
    const dEta = RECOVERY - 1;
    // Airflow after recovery (corrected flow held) sets the bleed fraction's base; here the bleed is a fraction of core flow.
    const airflow = d.airflow_kg_s + s.dAirflow_dRecovery_kg_s! * dEta + s.dAirflow_dBleed_kg_s! * 0.02 + s.dAirflow_dExtraction_kg_s_W! * 75e3;
    const corrected = d.thrust_N + s.dThrust_dRecovery_N * dEta + s.dThrust_dBleed_N * 0.02 + s.dThrust_dExtraction_N_W * 75e3;
    const fuel = d.fuelFlow_kg_s + s.dFuelFlow_dRecovery_kg_s * dEta + s.dFuelFlow_dBleed_kg_s * 0.02 + s.dFuelFlow_dExtraction_kg_s_W * 75e3;
    expectClose(p.perEngine.uninstalledThrust_N, d.thrust_N, { rel: 1e-12 }, 'affine deck, multilinear interpolation exact');
    expectClose(p.perEngine.airflow_kg_s!, airflow, { rel: 1e-12 }, 'Taylor expansion of airflow');
    expectClose(p.perEngine.correctedThrust_N, corrected, { rel: 1e-12 }, 'Taylor expansion of thrust');
    expectClose(p.fuelFlow_kg_s, 2 * fuel, { rel: 1e-12 }, 'Taylor expansion of fuel flow, two engines');
    // Spillage follows the installed airflow: NACA Report 1187 additive drag at A0/Ac (spillageDrag.ts).
    const amb = expectOk(atmosphere(COND.altitude_m, 0), 'ISA');
    const free = { mach: COND.mach, pressure_Pa: amb.pressure_Pa, temperature_K: amb.temperature_K };
    const mfr = streamTubeArea(airflow, free) / 0.9;
    expect(mfr).toBeLessThan(1);
    const spill = spillageDrag(additiveDrag(COND.mach, amb.pressure_Pa, mfr, 0.9).drag_N, INLET.lipSuctionFactor);
    expectClose(p.perEngine.spillageDrag_N, spill, { rel: 1e-10 }, 'spillage at the installed airflow');
    expectClose(p.thrust_N, 2 * (corrected - spill), { rel: 1e-12 }, 'installed = corrected - spillage');
    const loss = installedLossBreakdown(p.perEngine);
    expectClose(loss.recoveryLoss_N, -s.dThrust_dRecovery_N * dEta, { rel: 1e-12 }, 'recovery part');
    expectClose(loss.bleedLoss_N, -s.dThrust_dBleed_N * 0.02, { rel: 1e-12 }, 'bleed part');
    expectClose(loss.extractionLoss_N, -s.dThrust_dExtraction_N_W * 75e3, { rel: 1e-12 }, 'extraction part');
    expectClose(loss.total_N, p.perEngine.uninstalledThrust_N - p.perEngine.thrust_N, { rel: 1e-12 }, 'bookkeeping identity');
  });

  it('a deck without sensitivities keeps Raymer\'s rule and says so', () => {
    const raymer = makeInstalledPropulsion({
      deck: buildParametricDeck(DEMO_ENGINE_SPEC),
      engineCount: 2,
      inlet: INLET,
      installation: INSTALL,
      cautionSettings: DEFAULT_CAUTION_SETTINGS,
    });
    expect(raymer.installationMethod).toBe('raymerCorrections');
    const p = raymer.atRating(COND, 'maxCruise');
    expect(p.perEngine.installationMethod).toBe('raymerCorrections');
    // Raymer, Aircraft Design: A Conceptual Approach, installed thrust: loss = T C_ram (eta_ref - eta), C_ram 1.35 (from memory).
    expectClose(p.perEngine.recoveryLoss_N, p.perEngine.uninstalledThrust_N * 1.35 * (1 - RECOVERY), { rel: 1e-12 }, 'Raymer C_ram');
    expect(describeInstallationMethod('raymerCorrections')).toMatch(/Raymer/);
    expect(describeInstallationMethod('deckSensitivities')).toMatch(/sensitivities/);
  });

  it('the part-power solve on the deck curve agrees with full lookups through the sensitivities', () => {
    const required = 0.6 * model.atRating(COND, 'maxCruise').thrust_N;
    const fast = model.forThrust(COND, required);
    const access = deckAccess(deck);
    const slow = makeInstalledModel({ ...access, curveAt: undefined }, {
      engineCount: 2,
      inlet: INLET,
      installation: INSTALL,
      cautionSettings: DEFAULT_CAUTION_SETTINGS,
    }).forThrust(COND, required);
    expect(fast.limit).toBe('within');
    expectClose(fast.thrust_N, required, { rel: 1e-7 }, 'forThrust tolerance');
    expectClose(slow.thrust_N, required, { rel: 1e-7 }, 'forThrust tolerance');
    // Both stop within the thrust tolerance 1e-7; dT/dpower ~ T/power here, so the powers agree to a few 1e-7.
    expectClose(fast.power, slow.power, { rel: 5e-7 }, 'curve and lookup paths');
    const again = model.atPower(COND, fast.power);
    expectClose(again.thrust_N, fast.thrust_N, { rel: 1e-12 }, 'the curve path is the lookup path');
  });

  it('a raised recovery moves thrust by dT/deta times the step at the same power (withRecoveryOffset)', () => {
    const up = model.withRecoveryOffset!(0.01);
    const d = syntheticAt(COND.altitude_m, COND.mach, POWER);
    const noSpill = (m: typeof model) => m.atPower(COND, POWER).perEngine.correctedThrust_N;
    expectClose(noSpill(up) - noSpill(model), 0.01 * d.sensitivities.dThrust_dRecovery_N, { rel: 1e-9 }, 'linear in recovery');
    expectClose(up.atPower(COND, POWER).perEngine.recovery, RECOVERY + 0.01, { rel: 1e-15 }, 'recovery offset');
  });

  it('a deck without an ISA-deviation axis scales the sensitivities by the referred groups on a hot day', () => {
    const hot = { ...COND, isaDev_K: 15 };
    const f = temperatureFlowFactor(hot.altitude_m, hot.isaDev_K);
    const cold = expectOk(lookupDeck(deck, COND, POWER), 'ISA').sensitivities!;
    const warm = expectOk(lookupDeck(deck, hot, POWER), 'ISA+15').sensitivities!;
    // Walsh & Fletcher, Gas Turbine Performance, referred parameter groups: F/delta, Wf/(delta sqrt(theta)),
    // W sqrt(theta)/delta and P/(delta sqrt(theta)) held at the same pressure altitude and power setting.
    expectClose(warm.dThrust_dRecovery_N, cold.dThrust_dRecovery_N, { rel: 1e-15 }, 'F/delta');
    expectClose(warm.dFuelFlow_dRecovery_kg_s, cold.dFuelFlow_dRecovery_kg_s * f, { rel: 1e-14 }, 'Wf/(delta sqrt theta)');
    expectClose(warm.dAirflow_dBleed_kg_s!, cold.dAirflow_dBleed_kg_s! / f, { rel: 1e-14 }, 'W sqrt(theta)/delta');
    expectClose(warm.dThrust_dExtraction_N_W, cold.dThrust_dExtraction_N_W / f, { rel: 1e-14 }, 'F/delta per P/(delta sqrt theta)');
    expectClose(warm.dFuelFlow_dExtraction_kg_s_W, cold.dFuelFlow_dExtraction_kg_s_W, { rel: 1e-15 }, 'Wf per P, both delta sqrt(theta)');
    expectClose(warm.dAirflow_dExtraction_kg_s_W!, cold.dAirflow_dExtraction_kg_s_W! / (f * f), { rel: 1e-14 }, 'W per P');
  });

  it('forThrust meets the thrust asked for on a corrected-parameter deck with sensitivities', () => {
    const m = makeInstalledPropulsion({ deck, engineCount: 2, inlet: INLET, installation: { ...INSTALL, deckInterpolation: 'corrected' }, cautionSettings: DEFAULT_CAUTION_SETTINGS });
    for (const condition of [COND, { altitude_m: 9500, mach: 0.8, isaDev_K: 0 }, { altitude_m: 2000, mach: 0.4, isaDev_K: 12 }]) {
      const required = 0.6 * m.atRating(condition, 'maxCruise').thrust_N;
      const p = m.forThrust(condition, required);
      expect(p.limit).toBe('within');
      expectClose(p.thrust_N, required, { rel: FOR_THRUST_TOLERANCE }, 'forThrust tolerance');
      expectClose(m.atPower(condition, p.power).thrust_N, p.thrust_N, { rel: 1e-15 }, 'the point is the atPower point');
    }
  });

  it('in corrected-parameter interpolation the sensitivities stay raw, on the deck curve as in lookupDeck (closed form)', () => {
    // The corrected grid holds F/delta, Wf/(delta sqrt theta), W sqrt(theta)/delta; the sensitivity columns are kept
    // as tabulated, so an affine deck returns its own sensitivities at any point (and, without an ISA axis, the
    // referred-group temperature factors of the test above on a hot day).
    const corrected = deckForInterpolation(deck, 'corrected');
    const curve = deckCurve(corrected);
    const out = new Float64Array(CURVE_VALUES);
    for (const condition of [COND, { ...COND, isaDev_K: 15 }, { altitude_m: 9500, mach: 0.8, isaDev_K: -8 }]) {
      const f = condition.isaDev_K === 0 ? 1 : temperatureFlowFactor(condition.altitude_m, condition.isaDev_K);
      curve.prepare(condition);
      for (const power of [0.2, 0.45, POWER, 1]) {
        const exact = syntheticAt(condition.altitude_m, condition.mach, power).sensitivities;
        const looked = expectOk(lookupDeck(corrected, condition, power), 'corrected lookup');
        expect(curve.evaluate(power, out)).toBe(true);
        expectClose(looked.sensitivities!.dThrust_dRecovery_N, exact.dThrust_dRecovery_N, { rel: 1e-12 }, 'closed form dF/deta');
        expectClose(looked.sensitivities!.dThrust_dExtraction_N_W, exact.dThrust_dExtraction_N_W / f, { rel: 1e-12 }, 'closed form dF/dP');
        expectClose(looked.sensitivities!.dAirflow_dRecovery_kg_s!, exact.dAirflow_dRecovery_kg_s! / f, { rel: 1e-12 }, 'closed form dW/deta');
        // The curve carries lookupDeck's numbers to the bit (the fuel-flow-only part-power query rests on it).
        expect(out[0]).toBe(looked.thrust_N);
        expect(out[1]).toBe(looked.airflow_kg_s);
        expect(out[CURVE_FUEL_FLOW]).toBe(looked.fuelFlow_kg_s);
        SENSITIVITY_FIELDS.forEach((field) => {
          expect(out[2 + field.slot], `${field.key} at power ${power}`).toBe(looked.sensitivities![field.key] ?? 0);
        });
      }
    }
  });

  it('a deck with sensitivities and no airflow installs thrust and fuel flow through them, without spillage', () => {
    const bare = syntheticDeck(false);
    const m = makeInstalledPropulsion({ deck: bare, engineCount: 1, inlet: INLET, installation: INSTALL, cautionSettings: DEFAULT_CAUTION_SETTINGS });
    const p = m.atPower(COND, POWER);
    const d = syntheticAt(COND.altitude_m, COND.mach, POWER);
    const s = d.sensitivities;
    expect(p.perEngine.airflow_kg_s).toBeNull();
    expect(p.perEngine.spillageDrag_N).toBe(0);
    expectClose(p.thrust_N, d.thrust_N + s.dThrust_dRecovery_N * (RECOVERY - 1) + s.dThrust_dBleed_N * 0.02 + s.dThrust_dExtraction_N_W * 75e3, { rel: 1e-12 }, 'Taylor expansion');
  });
});
