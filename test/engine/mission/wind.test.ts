/**
 * Wind over the ground: the range, set cruise distances and the alternate's distance are ground distances;
 * the air distance, the fuel and the time follow the wind. A still-air basis stays for design-range studies.
 */
import { describe, expect, it } from 'vitest';
import { solveMission } from '../../../engine/mission/solveMission';
import type { MissionInput, MissionResult } from '../../../engine/mission/missionTypes';
import { expectClose } from '../../support/assertInDelta';
import { demoMissionInput } from './support/demoProject';
import { demoLegs, KT, missionInput } from './support/missionFixtures';

const withRange = (input: MissionInput, range_m: number): MissionInput =>
  input.solve.kind === 'payloadRange' ? { ...input, solve: { ...input.solve, range_m } } : input;
// The demo's 3,000 NM with a 100 kt headwind needs more than MTOW (status above_mtow), so the wind checks fly 2,500 NM.
const RANGE_M = 2500 * 1852;
const demo = withRange(demoMissionInput(), RANGE_M);

/** Mean TAS (m/s) over the legs that move (climb, cruise, descent) of a still-air flight: air distance / their time. */
function meanTas(r: MissionResult): number {
  const moving = r.legs.filter((l) => l.kind !== 'reserve' && l.endDistance_m > l.startDistance_m);
  return r.airDistance_m / moving.reduce((t, l) => t + l.endTime_s - l.startTime_s, 0);
}

describe('wind over the ground', () => {
  it('solveMission with no wind flies the same mission bit for bit whichever the distance basis', () => {
    // Definition: in still air the ground distance is the air distance, so the two bases must agree exactly.
    const ground = solveMission({ ...demo, wind_m_s: 0, distanceBasis: 'ground' });
    const still = solveMission({ ...demo, wind_m_s: 0, distanceBasis: 'stillAir' });
    expect(ground.status).toBe('ok');
    expect(ground.blockFuel_kg).toBe(still.blockFuel_kg);
    expect(ground.blockTime_s).toBe(still.blockTime_s);
    expect(ground.reserveFuel_kg).toBe(still.reserveFuel_kg);
    expect(ground.airDistance_m).toBe(still.airDistance_m);
    expect(ground.groundDistance_m).toBe(ground.airDistance_m);
    expect(ground.iterations).toBe(still.iterations);
  });

  it('solveMission on the demo: a headwind raises block fuel and a tailwind lowers it, the range staying a ground distance', () => {
    const calm = solveMission(demo);
    const head = solveMission({ ...demo, wind_m_s: -100 * KT });
    const tail = solveMission({ ...demo, wind_m_s: 100 * KT });
    for (const r of [calm, head, tail]) {
      expect(r.status).toBe('ok');
      expect(r.distanceBasis).toBe('ground');
      expectClose(r.groundDistance_m, RANGE_M, { abs: 1 }, 'payloadRange meets its range over the ground (1 m tolerance)');
      expect(r.cautions.some((c) => c.id === 'still_air_distances')).toBe(false);
    }
    expect(head.blockFuel_kg).toBeGreaterThan(calm.blockFuel_kg);
    expect(tail.blockFuel_kg).toBeLessThan(calm.blockFuel_kg);
    expect(head.blockTime_s).toBeGreaterThan(calm.blockTime_s);
    expect(head.airDistance_m).toBeGreaterThan(head.groundDistance_m);
    expect(tail.airDistance_m).toBeLessThan(tail.groundDistance_m);
  });

  it('solveMission on the demo in a 100 kt head- or tailwind burns what the still-air mission burns at the equivalent still-air distance', () => {
    // Equivalent still-air distance ESAD = G V / (V + w) with V the mean TAS (flight-planning common practice; for
    // a constant TAS it is exact, since dx_ground/dx_air = (V + w) / V). The alternate is flown in calm air here so
    // that only the trip sees the wind; the contingency follows the trip fuel in both.
    const calm = solveMission(demo);
    const v = meanTas(calm);
    const reserves = demo.reserves.alternate === null ? demo.reserves : { ...demo.reserves, alternate: { ...demo.reserves.alternate, wind_m_s: 0 } };
    const ground_m = RANGE_M;
    for (const wind_kt of [-100, 100]) {
      const w = wind_kt * KT;
      const windy = solveMission({ ...demo, wind_m_s: w, reserves });
      const esad = (ground_m * v) / (v + w);
      const equivalent = solveMission(withRange(demo, esad));
      expect(windy.status).toBe('ok');
      expect(equivalent.status).toBe('ok');
      expectClose(windy.airDistance_m, esad, { rel: 0.002 }, `ESAD closed form at ${wind_kt} kt: air distance flown`);
      expectClose(windy.blockFuel_kg, equivalent.blockFuel_kg, { rel: 0.002 }, `block fuel at the ESAD (${wind_kt} kt), within 0.2 %`);
      expectClose(
        windy.blockFuel_kg - calm.blockFuel_kg,
        equivalent.blockFuel_kg - calm.blockFuel_kg,
        { rel: 0.02 },
        `block-fuel change at ${wind_kt} kt against the ESAD estimate, within 2 % of the change`,
      );
    }
  });

  it('solveMission flies the alternate over the ground in its own wind', () => {
    const alternate = demo.reserves.alternate!;
    const own = (wind_m_s: number) =>
      solveMission({ ...demo, reserves: { ...demo.reserves, alternate: { ...alternate, wind_m_s } } as MissionInput['reserves'] });
    const calm = own(0);
    const head = own(-60 * KT);
    expect(head.reserves.alternate_kg).toBeGreaterThan(calm.reserves.alternate_kg);
    // The trip does not see the alternate's wind; it burns more only because it carries the larger reserve.
    expect(head.tripFuel_kg - calm.tripFuel_kg).toBeLessThan(head.reserves.alternate_kg - calm.reserves.alternate_kg);
    const row = head.legs.find((l) => l.name.includes('alternate') && l.kind === 'reserve' && l.endGroundDistance_m > 0)!;
    expectClose(row.endGroundDistance_m - row.startGroundDistance_m, alternate.distance_m, { rel: 2e-3 }, 'the alternate distance is over the ground');
  });

  it('solveMission says a mission with a headwind above its TAS cannot reach its destination', () => {
    const r = solveMission(
      missionInput({
        legs: demoLegs(500_000),
        solve: { kind: 'takeoffWeight', takeoffMass_kg: 70000, payload_kg: 10000 },
        wind_m_s: -300,
      }),
    );
    // The status is the robustness plumbing's (engine/mission/missionStatus.ts); over the ground it must not be ok.
    expect(r.status).toBe('no_ground_progress');
    expect(Number.isFinite(r.blockFuel_kg)).toBe(true);
  });

  it('solveMission in a still-air study says so in the result', () => {
    const r = solveMission({ ...demo, wind_m_s: -100 * KT, distanceBasis: 'stillAir' });
    expect(r.distanceBasis).toBe('stillAir');
    const note = r.cautions.find((c) => c.id === 'still_air_distances');
    expect(note?.message).toMatch(/design-range study/);
    expectClose(r.airDistance_m, RANGE_M, { abs: 1 }, 'the range is matched in still air');
    expect(r.groundDistance_m).toBeLessThan(r.airDistance_m);
  });
});
