import { describe, expect, it } from 'vitest';
import { runCyclePoint, type CycleEngine, type CycleThrottle } from '../../../engine/cycle/index';
import { expectClose } from '../../support/assertInDelta';
import { designedCycle, DEMO_CYCLE, ft } from './cycleFixtures';

const engine = designedCycle(DEMO_CYCLE);

function thrustAt(e: CycleEngine, altitude_ft: number, mach: number, throttle: CycleThrottle, recovery: number) {
  const p = runCyclePoint(e, { altitude_m: ft(altitude_ft), mach, isaDeviation_K: 0, throttle, recovery });
  expect(p.status).toBe('converged');
  return p;
}

describe('inlet recovery acts through the cycle', () => {
  it('at a corrected-fan-speed-held rating with both nozzles choked, d(ln F)/d(ln recovery) = 1 + p0 (A9 + A19) / F', () => {
    // Corrected-parameter similarity (Mattingly, engine performance analysis; Walsh & Fletcher,
    // non-dimensional groups): with the corrected speed held and the nozzles choked, every flow and
    // pressure of the engine scales with Pt2 while the jet velocities do not, so
    // F = r (sum m V + A p9 - m0 V0)_ref - p0 sum A, and the logarithmic derivative is 1 + p0 sum A / F.
    const throttle: CycleThrottle = { kind: 'rating', rating: 'maxCruise' };
    const base = thrustAt(engine, 35000, 0.8, throttle, 1);
    expect(base.activeLimit).toBe('fanCorrectedSpeed');
    const s = base.state!;
    expect(s.coreNozzle.choked && s.bypassNozzle.choked).toBe(true);
    const h = 1e-4;
    const up = thrustAt(engine, 35000, 0.8, throttle, 1 - h / 2).thrust_N!;
    const down = thrustAt(engine, 35000, 0.8, throttle, 1 - (3 * h) / 2).thrust_N!;
    const r = 1 - h;
    const atR = thrustAt(engine, 35000, 0.8, throttle, r);
    const logSlope = ((up - down) / h) * (r / atR.thrust_N!);
    const sr = atR.state!;
    const expected = 1 + (sr.free.p0_Pa * (sr.coreNozzle.exitArea_m2 + sr.bypassNozzle.exitArea_m2)) / atR.thrust_N!;
    expectClose(logSlope, expected, { rel: 1e-6 }, 'corrected-flow similarity, choked nozzles');
    // fuel flow scales with Pt2 exactly there (same corrected point)
    expectClose(atR.fuelFlow_kg_s! / base.fuelFlow_kg_s!, r, { rel: 1e-9 }, 'similarity: fuel flow proportional to Pt2');
  });

  it('loses more than 1 % thrust per 1 % recovery at every rating, more than Raymer\'s C_ram 1.35 (from memory) for this class', () => {
    for (const rating of ['takeoff', 'maxClimb', 'maxCruise'] as const) {
      for (const [alt, mach] of [[0, 0], [10000, 0.5], [35000, 0.8]] as const) {
        const a = thrustAt(engine, alt, mach, { kind: 'rating', rating }, 1).thrust_N!;
        const b = thrustAt(engine, alt, mach, { kind: 'rating', rating }, 0.99).thrust_N!;
        const perPercent = (1 - b / a) * 100;
        // A reported figure (docs/cycle.md), bounded only by physics: more than the 1 % of mass flow alone,
        // less than the gross-to-net thrust amplification bound of 3 for this bypass ratio.
        expect(perPercent, `${rating} ${alt} ft M${mach}`).toBeGreaterThan(1);
        expect(perPercent, `${rating} ${alt} ft M${mach}`).toBeLessThan(3);
      }
    }
  });

  it('bleed and power extraction cost thrust at a turbine-temperature-held point and raise TSFC', () => {
    const throttle: CycleThrottle = { kind: 'turbineInletTemperature', value_K: 1500 };
    const clean = runCyclePoint(engine, { altitude_m: ft(30000), mach: 0.75, isaDeviation_K: 0, throttle });
    const bled = runCyclePoint(engine, { altitude_m: ft(30000), mach: 0.75, isaDeviation_K: 0, throttle, bleedFraction: 0.03 });
    const loaded = runCyclePoint(engine, { altitude_m: ft(30000), mach: 0.75, isaDeviation_K: 0, throttle, powerExtraction_W: 100e3 });
    for (const p of [clean, bled, loaded]) expect(p.status).toBe('converged');
    expect(bled.thrust_N!).toBeLessThan(clean.thrust_N!);
    expect(loaded.thrust_N!).toBeLessThan(clean.thrust_N!);
    expect(bled.tsfc_kg_N_s!).toBeGreaterThan(clean.tsfc_kg_N_s!);
    expect(loaded.tsfc_kg_N_s!).toBeGreaterThan(clean.tsfc_kg_N_s!);
    // the extraction loads the HP spool: at the same Tt4 the core runs slower (common practice)
    expect(loaded.coreSpeed!).toBeLessThan(clean.coreSpeed!);
  });
});
