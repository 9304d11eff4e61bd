/**
 * Lip suction by mass-flow ratio and Mach, Raymer's supersonic C_ram and the
 * fuel-flow conventions, and the spillage-share caution. Sources: the
 * bookkeeping D_spill = K_add D_add with lip suction = 1 - K_add (Nicolai &
 * Carichner, Fundamentals of Aircraft and Airship Design, inlet drag; from
 * memory); the rounded-pitot default's trend (near-full suction at A0/Ac = 1,
 * less as the inlet spills more and as Mach nears 1: Nicolai & Carichner's
 * curves and Seddon & Goldsmith, Intake Aerodynamics, from memory); bilinear
 * interpolation in closed form; Raymer's C_ram = 1.35 subsonic and 1.35 -
 * 0.15 (M - 1) supersonic (Aircraft Design: A Conceptual Approach, installed
 * thrust; from memory); corrected fuel flow Wf/(delta2 sqrt(theta2)) held at
 * a power setting, so Wf scales with pt2 (Walsh & Fletcher, referred
 * parameters).
 */
import { describe, expect, it } from 'vitest';
import { checkSpillageShare } from '../../../engine/cautions/propulsionCautions';
import { expectOk } from '../../../engine/core/result';
import { applyInstallationCorrections, ramRecoveryCoefficient } from '../../../engine/propulsion/installationCorrections';
import { interp2d, makeTable2d } from '../../../engine/core/table2d';
import { prepareLipSuction, ROUNDED_PITOT_LIP_SUCTION, type LipSuction } from '../../../engine/propulsion/lipSuction';
import { expectClose } from '../../support/assertInDelta';

describe('lip suction', () => {
  const rounded = expectOk(prepareLipSuction(ROUNDED_PITOT_LIP_SUCTION), 'default');

  it('the rounded-pitot default is close to full suction near mass-flow ratio 1 and falls as the inlet spills more', () => {
    for (const m of [0, 0.3, 0.6, 0.78]) {
      expect(rounded.at(m, 1).factor).toBeGreaterThanOrEqual(0.98);
      const byMfr = [0.3, 0.5, 0.7, 0.85, 1].map((r) => rounded.at(m, r).factor);
      for (let i = 1; i < byMfr.length; i++) expect(byMfr[i]!).toBeGreaterThan(byMfr[i - 1]!);
    }
    // ... and as the flight Mach nears 1 at the same spill.
    expect(rounded.at(0.95, 0.7).factor).toBeLessThan(rounded.at(0.6, 0.7).factor);
  });

  it('interpolates bilinearly between table nodes (closed form) and holds its edges, saying so', () => {
    const t = expectOk(prepareLipSuction({ kind: 'table', mach: [0, 1], massFlowRatio: [0.5, 1], factor: [[0.4, 1.0], [0.2, 0.6]] }), 't');
    // At (M 0.25, MFR 0.6): rows 0.4 + 0.2 (0.6) = 0.52 and 0.2 + 0.2 (0.4) = 0.28, then 0.52 + 0.25 (0.28 - 0.52) = 0.46.
    expectClose(t.at(0.25, 0.6).factor, 0.46, { abs: 1e-15 }, 'bilinear closed form');
    expect(t.at(0.25, 0.6).outside).toBe(false);
    expect(t.at(1.4, 0.6)).toEqual({ factor: t.at(1, 0.6).factor, outside: true });
  });

  it('at and atInto give the 2-D table interpolation (interp2d, clamp) to the bit, inside, on the nodes and off the table', () => {
    const lip = expectOk(prepareLipSuction(ROUNDED_PITOT_LIP_SUCTION), 'default');
    const spec = ROUNDED_PITOT_LIP_SUCTION as Extract<LipSuction, { kind: 'table' }>;
    const table = expectOk(makeTable2d(spec.mach, spec.massFlowRatio, spec.factor, 'lip suction'), 'table');
    const out = { factor: -1, outside: true };
    for (const mach of [-0.1, 0, 0.25, 0.6, 0.77, 0.9, 1, 1.3]) {
      for (const ratio of [0.1, 0.3, 0.42, 0.85, 0.999, 1, 1.2]) {
        const want = expectOk(interp2d(table, mach, ratio, 'clamp'), 'interp2d');
        const got = lip.at(mach, ratio);
        lip.atInto(mach, ratio, out);
        expect(got).toEqual({ factor: want.value, outside: want.outsideX !== null || want.outsideY !== null });
        expect(out).toEqual(got);
      }
    }
  });

  it('refuses fractions outside 0..1 with the cell named', () => {
    const r = prepareLipSuction({ kind: 'table', mach: [0, 1], massFlowRatio: [0.5, 1], factor: [[0.4, 1.2], [0.2, 0.6]] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error[0]!.path).toBe('factor[0][1]');
  });
});

describe("Raymer's C_ram and the fuel-flow convention", () => {
  it('C_ram is 1.35 subsonic and 1.35 - 0.15 (M - 1) above Mach 1, unless the supersonic form is off', () => {
    expect(ramRecoveryCoefficient(1.35, 0.8)).toBe(1.35);
    expectClose(ramRecoveryCoefficient(1.35, 2), 1.2, { abs: 1e-15 }, 'Raymer supersonic form');
    expect(ramRecoveryCoefficient(1.35, 2, false)).toBe(1.35);
  });

  it('fuel flow is held at the power setting, or scaled by eta/eta_ref as a corrected-flow engine would', () => {
    const settings = { bleed: { kind: 'coreFraction' as const, fraction: 0 }, powerExtraction_W: 0 };
    const held = applyInstallationCorrections(10000, 0.3, 1, 0.97, 0, settings);
    const scaled = applyInstallationCorrections(10000, 0.3, 1, 0.97, 0, { ...settings, ramFuelFlow: 'scaledWithRecovery' });
    expect(held.fuelFlow_kg_s).toBe(0.3);
    expectClose(scaled.fuelFlow_kg_s, 0.3 * 0.97, { rel: 1e-15 }, 'Wf x eta/eta_ref');
    // Thrust by Raymer's rule either way: 1.35 x 3 % = 4.05 % loss (Raymer's worked number).
    expectClose(held.thrust_N, 10000 * (1 - 0.0405), { rel: 1e-14 }, 'Raymer 4.05 %');
    expect(scaled.thrust_N).toBe(held.thrust_N);
  });
});

describe('spillage-share caution', () => {
  it('fires just above the share of thrust and not at or below it', () => {
    expect(checkSpillageShare(50.01, 1000, 0.05)?.id).toBe('spillage_share_high');
    expect(checkSpillageShare(50, 1000, 0.05)).toBeNull();
    expect(checkSpillageShare(49.9, 1000, 0.05)).toBeNull();
  });
});
