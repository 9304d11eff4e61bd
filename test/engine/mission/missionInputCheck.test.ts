import { describe, expect, it } from 'vitest';
import { missionInputProblem } from '../../../engine/mission/missionInputCheck';
import type { Leg, MissionInput } from '../../../engine/mission/missionTypes';
import { demoLegs, missionInput, TEST_AIRFRAME } from './support/missionFixtures';

const good = missionInput({ legs: demoLegs(1_000_000), solve: { kind: 'takeoffWeight', takeoffMass_kg: 70000, payload_kg: 10000 } });
const withLeg = (i: number, patch: object): MissionInput => ({ ...good, legs: good.legs.map((l, k) => (k === i ? ({ ...l, ...patch } as Leg) : l)) });

describe('missionInputCheck', () => {
  it('missionInputProblem accepts the demo-like mission', () => {
    expect(missionInputProblem(good)).toBeNull();
  });

  for (const [what, input, path] of [
    ['a NaN airframe mass', { ...good, airframe: { ...TEST_AIRFRAME, mtow_kg: Number.NaN } }, 'airframe.mtow_kg'],
    ['an infinite wind', { ...good, wind_m_s: Infinity }, 'wind_m_s'],
    ['an ISA deviation beyond 80 K', { ...good, isaDev_K: 120 }, 'isaDev_K'],
    ['a climb above 30 km', withLeg(2, { toAltitude_m: 40000 }), 'legs[2] (climb).toAltitude_m'],
    ['a supersonic schedule Mach', withLeg(2, { schedule: { ...(good.legs[2] as Extract<Leg, { kind: 'climb' }>).schedule, mach: 1.2 } }), 'legs[2] (climb).schedule.mach'],
    ['a negative taxi time', withLeg(0, { time_s: -5 }), 'legs[0] (taxi out).time_s'],
    ['a negative descent rate', withLeg(4, { mode: { kind: 'rate', rate_m_s: -3 } }), 'legs[4] (descent).mode.rate_m_s'],
    ['a per-leg NaN wind', withLeg(3, { wind_m_s: Number.NaN }), 'legs[3] (cruise).wind_m_s'],
    ['a bad alternate Mach', { ...good, reserves: { preset: 'cfr121_639', alternate: { distance_m: 1e5, cruiseAltitude_m: 7000, cruiseMach: 0, elevation_m: 0 }, finalReserve_s: 2700 } }, 'reserves.alternate.cruiseMach'],
    ['two solvable cruise legs', { ...good, legs: [...demoLegs(null), ...demoLegs(null).filter((l) => l.kind === 'cruise')] }, 'At most one cruise leg'],
    ['no legs', { ...good, legs: [] }, 'legs must hold at least one leg'],
  ] as const) {
    it(`missionInputProblem names the field for ${what}`, () => {
      expect(missionInputProblem(input as MissionInput)).toContain(path);
    });
  }
});
