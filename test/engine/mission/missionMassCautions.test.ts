import { describe, expect, it } from 'vitest';
import { solveMission } from '../../../engine/mission/solveMission';
import type { Leg } from '../../../engine/mission/missionTypes';
import { missionInput, TEST_AIRFRAME } from './support/missionFixtures';

// Mass and fuel limits are checked by solveMission on the flown numbers; each fires strictly above its limit.
const legs: Leg[] = [
  { kind: 'taxiOut', name: 'taxi out', time_s: 600, fuelFlow_kg_s: 0.2 },
  { kind: 'cruise', name: 'cruise', altitude_m: 11000, speed: { kind: 'mach', mach: 0.78 }, profile: { kind: 'constantAltitude' }, distance_m: 200_000 },
];

function fly(tow: number, payload = 10000, airframe = TEST_AIRFRAME) {
  return solveMission(missionInput({ legs, solve: { kind: 'takeoffWeight', takeoffMass_kg: tow, payload_kg: payload }, airframe }));
}
const has = (r: ReturnType<typeof fly>, id: string) => r.cautions.some((c) => c.id === id);

describe('solveMission mass and fuel cautions', () => {
  it('mtow_exceeded fires just above MTOW and not at it', () => {
    expect(has(fly(TEST_AIRFRAME.mtow_kg), 'mtow_exceeded')).toBe(false);
    const r = fly(TEST_AIRFRAME.mtow_kg + 0.001);
    expect(r.cautions.find((c) => c.id === 'mtow_exceeded')).toMatchObject({ legIndex: 1, legName: 'cruise', threshold: TEST_AIRFRAME.mtow_kg });
  });

  it('mlw_exceeded fires when the landing mass is just above MLW and not at it', () => {
    const probe = fly(70000);
    const burnt = 70000 - probe.landingMass_kg;
    const atLimit = fly(70000, 10000, { ...TEST_AIRFRAME, mlw_kg: 70000 - burnt });
    const below = fly(70000, 10000, { ...TEST_AIRFRAME, mlw_kg: 70000 - burnt - 0.01 });
    expect(has(atLimit, 'mlw_exceeded')).toBe(false);
    expect(has(below, 'mlw_exceeded')).toBe(true);
  });

  it('fuel_capacity_exceeded fires when the fuel at block-out is above the capacity', () => {
    const zfw = TEST_AIRFRAME.oew_kg + 10000;
    const rampFuel = 70000 + 600 * 0.2 - zfw;
    expect(has(fly(70000, 10000, { ...TEST_AIRFRAME, maxFuel_kg: rampFuel }), 'fuel_capacity_exceeded')).toBe(false);
    expect(has(fly(70000, 10000, { ...TEST_AIRFRAME, maxFuel_kg: rampFuel - 0.01 }), 'fuel_capacity_exceeded')).toBe(true);
  });

  it('mzfw_exceeded fires when payload pushes the zero-fuel mass above MZFW', () => {
    const limit = TEST_AIRFRAME.mzfw_kg - TEST_AIRFRAME.oew_kg;
    expect(has(fly(70000, limit), 'mzfw_exceeded')).toBe(false);
    expect(has(fly(70000, limit + 0.01), 'mzfw_exceeded')).toBe(true);
  });

  it('solveMission says infeasible when the take-off mass is below the zero-fuel mass', () => {
    const r = fly(40000);
    expect(r.status).toBe('infeasible');
    expect(r.statusMessage).toMatch(/zero-fuel mass/);
  });
});
