import { describe, expect, it } from 'vitest';
import {
  DEFAULT_C_BLEED,
  DEFAULT_C_RAM,
  DEFAULT_POWER_EXTRACTION_FUEL_kg_s_W,
  applyInstallationCorrections,
  bleedFraction,
  bleedThrustLoss,
  ramRecoveryThrustLoss,
  validateInstallation,
  type InstallationSettings,
} from '../../../engine/propulsion/installationCorrections';
import { expectClose } from '../../support/assertInDelta';

const NONE: InstallationSettings = { bleed: { kind: 'coreFraction', fraction: 0 }, powerExtraction_W: 0 };

describe('ramRecoveryThrustLoss', () => {
  it("ramRecoveryThrustLoss gives Raymer's worked number: eta_ref 1.0, eta 0.97, C_ram 1.35 -> 4.05 %", () => {
    // Raymer, Aircraft Design: A Conceptual Approach, installed thrust:
    // % loss = C_ram (eta_ref - eta_actual) x 100 = 1.35 x 0.03 x 100 = 4.05 % (C_ram 1.35 from memory).
    expectClose(ramRecoveryThrustLoss(1, 0.97, 1.35) * 100, 4.05, { abs: 1e-12 }, 'Raymer worked number');
    expect(DEFAULT_C_RAM).toBe(1.35);
    expectClose(ramRecoveryThrustLoss(1, 0.97), 0.0405, { abs: 1e-15 }, 'default C_ram');
  });

  it('ramRecoveryThrustLoss is a gain when the inlet beats the reference', () => {
    expect(ramRecoveryThrustLoss(0.95, 0.97)).toBeLessThan(0);
    expect(ramRecoveryThrustLoss(0.97, 0.97)).toBe(0);
  });
});

describe('bleedThrustLoss', () => {
  it('bleedThrustLoss is C_bleed x bleed mass ratio (Raymer, C_bleed 2.0 from memory)', () => {
    // 2 % of core flow bled, C_bleed 2.0: 4 % thrust loss.
    expectClose(bleedThrustLoss(0.02) * 100, 4, { abs: 1e-12 }, 'Raymer bleed correction');
    expect(DEFAULT_C_BLEED).toBe(2);
  });

  it('bleedFraction converts a bleed mass flow with the core share of airflow', () => {
    // 1 kg/s bled, core = 1/6 of 120 kg/s = 20 kg/s -> 5 %.
    expectClose(bleedFraction({ kind: 'massFlow', bleed_kg_s: 1, coreFlowFraction: 1 / 6 }, 120), 0.05, { rel: 1e-14 }, 'by hand');
    expect(bleedFraction({ kind: 'coreFraction', fraction: 0.03 }, null)).toBe(0.03);
  });
});

describe('applyInstallationCorrections', () => {
  it('applyInstallationCorrections with nothing to correct returns the deck point', () => {
    const c = applyInstallationCorrections(50000, 0.6, 0.98, 0.98, 0, NONE);
    expect(c.thrust_N).toBe(50000);
    expect(c.fuelFlow_kg_s).toBe(0.6);
  });

  it('applyInstallationCorrections adds the ram and bleed percentages and keeps deck fuel flow', () => {
    // 1.35 x (1 - 0.97) + 2.0 x 0.02 = 0.0405 + 0.04 = 8.05 % of 50 kN = 4025 N lost (Raymer adds the losses).
    const c = applyInstallationCorrections(50000, 0.6, 1, 0.97, 0.02, { ...NONE, bleed: { kind: 'coreFraction', fraction: 0.02 } });
    expectClose(c.thrust_N, 50000 - 4025, { abs: 1e-9 }, 'Raymer ram + bleed');
    expect(c.fuelFlow_kg_s).toBe(0.6);
    // So TSFC rises by 1 / (1 - 0.0805).
    expectClose(c.fuelFlow_kg_s / c.thrust_N / (0.6 / 50000), 1 / (1 - 0.0805), { rel: 1e-12 }, 'TSFC at fixed power');
  });

  it('applyInstallationCorrections charges shaft power as fuel at the stated coefficients', () => {
    // Default: 100 kW / (0.35 x 43 MJ/kg) = 6.645e-3 kg/s (common practice, stated in the module).
    const c = applyInstallationCorrections(50000, 0.6, 1, 1, 0, { ...NONE, powerExtraction_W: 100e3 });
    expectClose(c.extractionFuel_kg_s, 100e3 / (0.35 * 43e6), { rel: 1e-14 }, 'energy balance, common practice');
    expectClose(c.fuelFlow_kg_s, 0.6 + 100e3 * DEFAULT_POWER_EXTRACTION_FUEL_kg_s_W, { rel: 1e-14 }, 'stated coefficient');
    expect(c.thrust_N).toBe(50000);
    const t = applyInstallationCorrections(50000, 0.6, 1, 1, 0, { ...NONE, powerExtraction_W: 100e3, powerExtractionThrust_N_W: 0.002, powerExtractionFuel_kg_s_W: 0 });
    expect(t.thrust_N).toBeCloseTo(49800, 9);
    expect(t.fuelFlow_kg_s).toBe(0.6);
  });
});

describe('validateInstallation', () => {
  it('validateInstallation names the field of each bad setting', () => {
    const issues = validateInstallation(
      { bleed: { kind: 'coreFraction', fraction: 0.8 }, powerExtraction_W: -5, cRam: Number.NaN },
      true,
    );
    expect(issues.map((i) => i.path)).toEqual(['bleed.fraction', 'powerExtraction_W', 'cRam']);
    expect(issues[2]!.message).toContain('NaN');
  });

  it('validateInstallation refuses a mass-flow bleed on a deck without airflow', () => {
    const issues = validateInstallation({ bleed: { kind: 'massFlow', bleed_kg_s: 0.5, coreFlowFraction: 0.2 }, powerExtraction_W: 0 }, false);
    expect(issues.map((i) => i.path)).toEqual(['bleed']);
    expect(validateInstallation(NONE, false)).toEqual([]);
  });
});
