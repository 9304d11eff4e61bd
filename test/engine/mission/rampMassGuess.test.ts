import { describe, expect, it } from 'vitest';
import { FUEL_TOLERANCE_KG } from '../../../engine/mission/fuelIteration';
import { afterBurn, rampMassGuess } from '../../../engine/mission/rampMassGuess';
import { solveMission } from '../../../engine/mission/solveMission';
import type { Leg, MissionInput } from '../../../engine/mission/missionTypes';
import { expectClose } from '../../support/assertInDelta';
import { constantLiftToDragAero, constantTsfcPropulsion } from './support/analyticModels';
import { demoMissionInput } from './support/demoProject';
import { missionInput } from './support/missionFixtures';

const G0 = 9.80665;
// ISA above 11 km: T = 216.65 K (U.S. Standard Atmosphere 1976).
const A_11KM = Math.sqrt(1.4 * 287.05287 * 216.65);
const LD = 16;
const TSFC = 1.6e-5;
const NM = 1852;

function cruiseOnly(): Leg[] {
  return [{ kind: 'cruise', name: 'cruise', altitude_m: 11000, speed: { kind: 'mach', mach: 0.8 }, profile: { kind: 'constantAltitude' }, distance_m: null }];
}

describe('rampMassGuess', () => {
  it('afterBurn integrates a power-law burn in closed form: the Breguet exponential at exponent 1, RK4 elsewhere', () => {
    // dm/dx = -r0 (m / m0)^e. At e = 1: m = m_s exp(-r0 x / m0) (Breguet range equation, Anderson, Aircraft
    // Performance and Design, 5.13). Elsewhere the reference is the ODE integrated by classic RK4 in 4,000 steps
    // (Burden & Faires, Numerical Analysis, 5.4), not the closed form.
    const law = (exponent: number) => ({ rate0: 6.5e-4, mass0_kg: 12000, exponent });
    expectClose(afterBurn(law(1), 14000, 3e6), 14000 * Math.exp((-6.5e-4 * 3e6) / 12000), { rel: 1e-12 }, 'Breguet exponential');
    for (const e of [0, 0.35, 0.9, 1.4]) {
      const f = (m: number) => -6.5e-4 * Math.pow(m / 12000, e);
      let m = 14000;
      const n = 4000;
      const h = 3e6 / n;
      for (let i = 0; i < n; i++) {
        const k1 = f(m);
        const k2 = f(m + 0.5 * h * k1);
        const k3 = f(m + 0.5 * h * k2);
        const k4 = f(m + h * k3);
        m += (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
      }
      expectClose(afterBurn(law(e), 14000, 3e6), m, { rel: 1e-10 }, `exponent ${e} against RK4`);
    }
    // More than the mass can burn: NaN, not a negative mass.
    expect(Number.isNaN(afterBurn(law(0), 1000, 3e6))).toBe(true);
    expect(afterBurn(law(0.5), 1000, 0)).toBe(1000);
  });

  it('is the Breguet answer on a constant-L/D, constant-TSFC aircraft', () => {
    // Final reserve hold t_h from landing: ZFW = mL exp(-c g t_h / (L/D)) (Breguet endurance, Anderson 5.14); the
    // cruise: TOW = mL exp(R c g / (V L/D)) (Breguet range). No allowance, climb or descent: the closed forms are exact.
    const hold = 1800;
    const R = 2_500_000;
    const input = missionInput({
      legs: cruiseOnly(),
      solve: { kind: 'payloadRange', payload_kg: 12000, range_m: R },
      aero: constantLiftToDragAero(LD),
      propulsion: constantTsfcPropulsion({ thrust0_N: 400000, tsfc_kg_N_s: TSFC, lapseExponent: 0 }),
      reserves: { preset: 'custom', contingencyFraction: 0, alternate: null, finalReserve_s: hold, extraFuel_kg: 0 },
    });
    const zfw = input.airframe.oew_kg + 12000;
    const mL = zfw * Math.exp((TSFC * G0 * hold) / LD);
    const tow = mL * Math.exp((R * TSFC * G0) / (0.8 * A_11KM * LD));
    const guess = rampMassGuess(input, zfw, R, 1.3 * zfw);
    expect(guess).not.toBeNull();
    expectClose(guess!.rampMass_kg, tow, { rel: 1e-6 }, 'Breguet range and endurance');
    expectClose(guess!.top_kg, mL, { rel: 1e-6 }, 'top of descent = landing (nothing after the cruise)');
    expect(guess!.after_m).toBe(0);
  });

  it('lands the demo within 1 % of the converged ramp mass over its ranges, payloads, air and reserve policies', () => {
    // The guess is where the iteration starts, not an answer: checked against the converged, flown missions.
    const demo = demoMissionInput();
    const variants: MissionInput[] = [];
    for (const nm of [800, 1500, 3000]) variants.push({ ...demo, solve: { ...demo.solve, range_m: nm * NM } as MissionInput['solve'] });
    variants.push({ ...demo, isaDev_K: 20 }, { ...demo, wind_m_s: -25 });
    variants.push({ ...demo, reserves: { preset: 'cfr121_639', alternate: demo.reserves.alternate, finalReserve_s: 2700 } });
    for (const input of variants) {
      const r = solveMission(input);
      expect(r.status).toBe('ok');
      const range_m = input.solve.kind === 'payloadRange' ? input.solve.range_m : 0;
      const guess = rampMassGuess(input, r.zeroFuelMass_kg, range_m, r.rampMass_kg * 0.97);
      expect(guess).not.toBeNull();
      expect(Math.abs(guess!.rampMass_kg - r.rampMass_kg) / r.rampMass_kg).toBeLessThan(0.01);
    }
  });

  it('gives a fresh model its guess to the bit on a model that has estimated other payloads, air and ranges', () => {
    // The climbs' and descents' mass-free node values are kept per model (a pure function of the schedule, the
    // altitudes, the ISA deviation and the rating): they must change no answer. Each case on the warm model after
    // the others, against the same case on a model built afresh (its memo empty).
    const warm = demoMissionInput();
    const cases = (base: MissionInput): MissionInput[] => [
      { ...base, solve: { ...base.solve, payload_kg: base.solve.payload_kg + 70 } as MissionInput['solve'] },
      { ...base, isaDev_K: 15 },
      { ...base, wind_m_s: 30, solve: { ...base.solve, range_m: 1200 * NM } as MissionInput['solve'] },
      base,
    ];
    const zfw = (input: MissionInput) => input.airframe.oew_kg + input.solve.payload_kg;
    for (let round = 0; round < 2; round++) {
      cases(warm).forEach((input, k) => {
        const range_m = input.solve.kind === 'payloadRange' ? input.solve.range_m : 0;
        const again = rampMassGuess(input, zfw(input), range_m, 1.3 * zfw(input));
        const freshInput = cases(demoMissionInput())[k]!;
        const fresh = rampMassGuess(freshInput, zfw(freshInput), range_m, 1.3 * zfw(freshInput));
        expect(again, `case ${k}, round ${round}`).not.toBeNull();
        expect(again, `case ${k}, round ${round}`).toStrictEqual(fresh);
      });
    }
  });
});

describe('fuel iteration from the closed-form guess', () => {
  it('converges the demo class in 3 passes, into the band and within 1e-6 of a 1 g reference', () => {
    // Definition of payloadRange: fuel at landing = reserve + 0 to FUEL_TOLERANCE_KG; the reference is the same solve
    // converged into a 1 g band. Pass counts are a behaviour check (docs/mission.md, Speed), the band and the
    // reference the answer's.
    const demo = demoMissionInput();
    const pr = (nm: number): MissionInput['solve'] => ({ ...demo.solve, range_m: nm * NM }) as MissionInput['solve'];
    const variants: MissionInput[] = [
      { ...demo, solve: pr(1000) },
      { ...demo, solve: pr(2400) },
      { ...demo, solve: pr(3400) },
      { ...demo, isaDev_K: -20 },
      { ...demo, wind_m_s: 25 },
      { ...demo, solve: { ...demo.solve, payload_kg: 0 } as MissionInput['solve'] },
      { ...demo, reserves: { preset: 'custom', contingencyFraction: 0.03, alternate: demo.reserves.alternate, finalReserve_s: 1800, extraFuel_kg: 100 } },
    ];
    for (const input of variants) {
      const r = solveMission(input);
      const ref = solveMission(input, { fuelTolerance_kg: 0.001 });
      expect(r.status).toBe('ok');
      expect(r.iterations).toBeLessThanOrEqual(3);
      expect(r.residual_kg).toBeGreaterThanOrEqual(0);
      expect(r.residual_kg).toBeLessThanOrEqual(FUEL_TOLERANCE_KG);
      expect(r.landingMass_kg - r.zeroFuelMass_kg - r.reserveFuel_kg).toBeCloseTo(r.residual_kg, 9);
      expect(Math.abs(r.groundDistance_m - (input.solve as { range_m: number }).range_m)).toBeLessThanOrEqual(1);
      expect(Math.abs(r.blockFuel_kg - ref.blockFuel_kg) / ref.blockFuel_kg).toBeLessThan(1e-6);
    }
  });
});
