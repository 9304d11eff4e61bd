import { describe, expect, it } from 'vitest';
import { FIXED_MASS_FUEL_TOLERANCE_KG, FUEL_TOLERANCE_KG } from '../../../engine/mission/fuelIteration';
import { solveMission } from '../../../engine/mission/solveMission';
import type { MissionInput } from '../../../engine/mission/missionTypes';
import { demoMissionInput } from './support/demoProject';
import { demoLegs, missionInput } from './support/missionFixtures';

const NM = 1852;
/** A tightly converged reference: the same solve with the fuel band at 1 g. */
const TIGHT = { fuelTolerance_kg: 0.001 } as const;

function withRange(input: MissionInput, nm: number): MissionInput {
  if (input.solve.kind !== 'payloadRange') throw new Error('payloadRange input expected');
  return { ...input, solve: { ...input.solve, range_m: nm * NM } };
}

function withPayload(input: MissionInput, delta_kg: number): MissionInput {
  return { ...input, solve: { ...input.solve, payload_kg: input.solve.payload_kg + delta_kg } } as MissionInput;
}

describe('fuel iteration', () => {
  it('lands within the fuel band, never under the reserve, and within 1e-6 of a tightly converged block fuel', () => {
    // Definition of the payloadRange mode: fuel on board at landing = reserve + 0 to FUEL_TOLERANCE_KG. The
    // reference is the same solve converged into a 1 g band: the production band moves block fuel by less than
    // 1e-6 relative from it (the precision the speed work is held to).
    const demo = demoMissionInput();
    for (const nm of [1200, 3000]) {
      const input = withRange(demo, nm);
      const r = solveMission(input);
      const ref = solveMission(input, TIGHT);
      expect(r.status, `${nm} NM`).toBe('ok');
      expect(ref.status, `${nm} NM reference`).toBe('ok');
      expect(r.residual_kg, `${nm} NM`).toBeGreaterThanOrEqual(0);
      expect(r.residual_kg, `${nm} NM`).toBeLessThanOrEqual(FUEL_TOLERANCE_KG);
      expect(ref.residual_kg).toBeLessThanOrEqual(0.001);
      expect(r.landingMass_kg - r.zeroFuelMass_kg).toBeGreaterThanOrEqual(r.reserveFuel_kg);
      expect(Math.abs(r.blockFuel_kg - ref.blockFuel_kg) / ref.blockFuel_kg, `${nm} NM`).toBeLessThan(1e-6);
      expect(r.iterations, `${nm} NM`).toBeLessThanOrEqual(3);
    }
  });

  it('a warm start from a neighbouring converged mission gives the same answer in no more passes, in 2 from a near one', () => {
    // The warm start only moves where the secant iteration (Burden & Faires, Numerical Analysis, 2.3) starts: the
    // converged flight is the same within the fuel band, so block fuel agrees with the cold solve to 1e-6.
    const demo = withRange(demoMissionInput(), 3000);
    const neighbour = solveMission(demo);
    expect(neighbour.warmStart?.rampMass_kg).toBe(neighbour.rampMass_kg);
    expect(neighbour.warmStart?.afterSolvable?.distance_m).toBeGreaterThan(0);
    for (const next of [withPayload(demo, 20), withPayload(demo, 200), withRange(demo, 3050)]) {
      const cold = solveMission(next);
      const warm = solveMission(next, { warmStart: neighbour.warmStart });
      expect(warm.status).toBe('ok');
      expect(warm.iterations).toBeLessThanOrEqual(cold.iterations);
      expect(warm.iterations).toBeLessThanOrEqual(3);
      expect(warm.residual_kg).toBeGreaterThanOrEqual(0);
      expect(warm.residual_kg).toBeLessThanOrEqual(FUEL_TOLERANCE_KG);
      expect(Math.abs(warm.blockFuel_kg - cold.blockFuel_kg) / cold.blockFuel_kg).toBeLessThan(1e-6);
    }
    // Close enough, the second pass lands in the band: 20 kg of payload or 50 NM away (the neighbour's slope carried
    // as its ratio to the power-law slope, fuelIteration.ts).
    expect(solveMission(withPayload(demo, 20), { warmStart: neighbour.warmStart }).iterations).toBe(2);
    expect(solveMission(withRange(demo, 3050), { warmStart: neighbour.warmStart }).iterations).toBe(2);
    // The slope factor is worked out at its first read and is the same through a copy, a structured clone
    // (a worker's message) and JSON: the measured slope within a quarter of the power-law one (plausibleSlopeFactor).
    const factor = neighbour.warmStart?.slopeFactor;
    expect(factor).toBeGreaterThan(0.75);
    expect(factor).toBeLessThan(1.25);
    expect({ ...neighbour.warmStart }.slopeFactor).toBe(factor);
    expect(structuredClone(neighbour.warmStart)?.slopeFactor).toBe(factor);
    expect(JSON.parse(JSON.stringify(neighbour.warmStart)).slopeFactor).toBe(factor);
  });

  it('a warm start that is no use is ignored: same status and answer as the cold start', () => {
    const demo = withRange(demoMissionInput(), 2000);
    const cold = solveMission(demo);
    for (const warmStart of [
      { rampMass_kg: Number.NaN, slope: Number.NaN },
      { rampMass_kg: -5, slope: 0, afterSolvable: { mass_kg: Number.POSITIVE_INFINITY, distance_m: 1, perKg_m: 0 } },
      { rampMass_kg: 1 },
      // A fixed-mass neighbour's slope (kg per metre of distance) or a wrong-signed one is not a ramp-mass slope.
      { slope: -0.9 },
      { slope: -6.7e-4, distance_m: 5e6 },
    ]) {
      const r = solveMission(demo, { warmStart });
      expect(r.status).toBe('ok');
      expect(Math.abs(r.blockFuel_kg - cold.blockFuel_kg) / cold.blockFuel_kg).toBeLessThan(1e-6);
    }
  });

  it('maxRange: a warm start from a neighbouring payload converges to the cold answer in no more passes', () => {
    const base = missionInput({
      legs: demoLegs(null),
      solve: { kind: 'maxRange', payload_kg: 10000 },
      reserves: { preset: 'custom', contingencyFraction: 0.05, alternate: null, finalReserve_s: 1800, extraFuel_kg: 200 },
    });
    const neighbour = solveMission(base);
    expect(neighbour.status).toBe('ok');
    expect(neighbour.warmStart?.distance_m).toBeGreaterThan(0);
    const next = withPayload(base, 100);
    const cold = solveMission(next);
    const warm = solveMission(next, { warmStart: neighbour.warmStart });
    expect(warm.status).toBe('ok');
    expect(warm.iterations).toBeLessThanOrEqual(cold.iterations);
    expect(cold.iterations).toBeLessThanOrEqual(3);
    for (const r of [cold, warm]) {
      expect(r.residual_kg).toBeGreaterThanOrEqual(0);
      expect(r.residual_kg).toBeLessThanOrEqual(FIXED_MASS_FUEL_TOLERANCE_KG);
    }
    expect(Math.abs(warm.airDistance_m - cold.airDistance_m) / cold.airDistance_m).toBeLessThan(1e-6);
    // With a fixed ramp mass the residual is fuel not burned: the range and block fuel of the band against those
    // converged into a 1 g band.
    const ref = solveMission(next, TIGHT);
    expect(Math.abs(cold.airDistance_m - ref.airDistance_m) / ref.airDistance_m).toBeLessThan(1e-6);
    expect(Math.abs(cold.blockFuel_kg - ref.blockFuel_kg) / ref.blockFuel_kg).toBeLessThan(1e-6);
  });
});
