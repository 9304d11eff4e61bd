/**
 * The statuses a mission ends with when it cannot reach its destination or
 * breaks a hard limit (none of them 'ok'), and their classes.
 */
import { describe, expect, it } from 'vitest';
import { MISSION_STATUSES, missionStatusClass, missionStatusTitle } from '../../../engine/mission/missionStatus';
import type { Leg, MissionResult } from '../../../engine/mission/missionTypes';
import { solveMission } from '../../../engine/mission/solveMission';
import { expectClose } from '../../support/assertInDelta';
import { constantTsfcPropulsion } from './support/analyticModels';
import { missionInput, NO_RESERVES, TEST_AIRFRAME } from './support/missionFixtures';

const TSFC = 1.7e-5;
const engines = constantTsfcPropulsion({ thrust0_N: 260000, tsfc_kg_N_s: TSFC, lapseExponent: 0.75 });

function cruiseAt(altitude_m: number, mach: number, distance_m: number): Leg[] {
  return [{ kind: 'cruise', name: 'cruise', altitude_m, speed: { kind: 'mach', mach }, profile: { kind: 'constantAltitude' }, distance_m }];
}

function fly(legs: readonly Leg[], takeoffMass_kg: number, extra: { wind_m_s?: number; airframe?: typeof TEST_AIRFRAME } = {}): MissionResult {
  return solveMission(missionInput({ legs, solve: { kind: 'takeoffWeight', takeoffMass_kg, payload_kg: 10000 }, propulsion: engines, reserves: NO_RESERVES, ...extra }));
}

function expectNoNegativeFuel(r: MissionResult): void {
  if (r.legs.length === 0) return; // refused before flying: no masses to check
  for (const row of r.legs) expect(row.endMass_kg).toBeGreaterThanOrEqual(r.zeroFuelMass_kg - 1e-6);
  expect(r.landingMass_kg).toBeGreaterThanOrEqual(r.zeroFuelMass_kg - 1e-6);
}

describe('missionStatus', () => {
  it('missionStatusClass puts every status in one class and only ok in solved', () => {
    expect(MISSION_STATUSES.filter((s) => missionStatusClass(s) === 'solved')).toEqual(['ok']);
    for (const s of MISSION_STATUSES) expect(missionStatusTitle(s)).toMatch(/\w/);
    expect(missionStatusClass('no_ground_progress')).toBe('cannot_reach');
    expect(missionStatusClass('above_mtow')).toBe('hard_limit');
  });

  it('a headwind at least the true airspeed is no_ground_progress, not ok with a negative ground distance', () => {
    // Mach 0.3 at 3,000 m: TAS = 0.3 x 328.6 m/s = 98.6 m/s (ISA speed of sound, U.S. Standard Atmosphere 1976).
    const r = fly(cruiseAt(3000, 0.3, 200_000), 70000, { wind_m_s: -120 });
    expect(r.status).toBe('no_ground_progress');
    expect(r.statusMessage).toMatch(/headwind [\d,]+ kt \(120\.0 m\/s\)/);
    expect(r.groundDistance_m).toBeLessThanOrEqual(0);
    expect(missionStatusClass(r.status)).toBe('cannot_reach');
    // A lighter headwind flies: ground = air + wind x time (definition of an along-track wind).
    const light = fly(cruiseAt(3000, 0.3, 200_000), 70000, { wind_m_s: -30, airframe: { ...TEST_AIRFRAME, mlw_kg: 80000 } });
    expect(light.status).toBe('ok');
    expectClose(light.groundDistance_m, light.airDistance_m - 30 * light.tripTime_s, { rel: 1e-9 }, 'ground = air + wind t');
  });

  it('a take-off above MTOW is above_mtow with both masses in the sentence', () => {
    const r = fly(cruiseAt(11000, 0.78, 500_000), 82000, { airframe: { ...TEST_AIRFRAME, maxFuel_kg: 40000 } });
    expect(r.status).toBe('above_mtow');
    expect(r.statusMessage).toContain('82,000 kg');
    expect(r.statusMessage).toContain('80,000 kg');
    expect(r.cautions.map((c) => c.id)).toContain('mtow_exceeded');
  });

  it('fuel above the tanks is fuel_above_capacity; a landing above MLW is landing_above_mlw', () => {
    const tank = fly(cruiseAt(11000, 0.78, 500_000), 78000);
    expect(tank.status).toBe('fuel_above_capacity');
    expect(tank.statusMessage).toContain('28,000 kg');
    const landing = fly(cruiseAt(11000, 0.78, 100_000), 74000, { airframe: { ...TEST_AIRFRAME, maxFuel_kg: 30000 } });
    expect(landing.status).toBe('landing_above_mlw');
    expect(landing.landingMass_kg).toBeGreaterThan(TEST_AIRFRAME.mlw_kg);
    expect(landing.cautions.map((c) => c.id)).toContain('mlw_exceeded');
  });

  it('a take-off allowance longer than the fuel lasts stops where the fuel runs out, at zero-fuel mass', () => {
    const legs: Leg[] = [{ kind: 'takeoff', name: 'take-off', fuel_kg: null, time_s: 36000 }, ...cruiseAt(11000, 0.78, 100_000)];
    const r = fly(legs, 70000);
    expect(r.status).toBe('fuel_exhausted');
    expect(r.statusMessage).toMatch(/during take-off after/);
    expectNoNegativeFuel(r);
    // Static take-off rating at sea level: fuel flow = TSFC x 1.2 x 260 kN (the analytic engines' take-off power 1.2); t = fuel / flow.
    const flow = TSFC * 1.2 * 260000;
    expectClose(r.legs[0].endTime_s, (70000 - 50000) / flow, { rel: 1e-9 }, 'time to burn 20 t at a constant flow');
  });

  it('a hold longer than the fuel lasts ends fuel_exhausted, never with negative fuel, in every solve mode', () => {
    const legs: Leg[] = [...cruiseAt(11000, 0.78, null as unknown as number), { kind: 'hold', name: 'hold', altitude_m: 11000, time_s: 20 * 3600, speed: { kind: 'bestEndurance' } }];
    const solvable = legs.map((l) => (l.kind === 'cruise' ? { ...l, distance_m: null } : l));
    for (const solve of [
      { kind: 'payloadRange', payload_kg: 10000, range_m: 1_000_000 },
      { kind: 'maxRange', payload_kg: 10000 },
      { kind: 'takeoffWeight', takeoffMass_kg: 74000, payload_kg: 10000 },
    ] as const) {
      const r = solveMission(missionInput({ legs: solvable, solve, propulsion: engines, reserves: NO_RESERVES }));
      expect(r.status, solve.kind).not.toBe('ok');
      expect(['fuel_exhausted', 'did_not_converge', 'infeasible']).toContain(r.status);
      expectNoNegativeFuel(r);
    }
  });
});
