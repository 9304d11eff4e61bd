import { describe, expect, it } from 'vitest';
import { solveMission } from '../../../engine/mission/solveMission';
import type { Leg } from '../../../engine/mission/missionTypes';
import { expectClose } from '../../support/assertInDelta';
import { constantLiftToDragAero, constantTsfcPropulsion } from './support/analyticModels';
import { FT, missionInput, SCHEDULE } from './support/missionFixtures';

const G0 = 9.80665;

function descent(mode: { kind: 'idle' } | { kind: 'rate'; rate_m_s: number }, from_m: number, to_m: number): Leg[] {
  return [
    { kind: 'cruise', name: 'level', altitude_m: from_m, speed: { kind: 'mach', mach: 0.78 }, profile: { kind: 'constantAltitude' }, distance_m: 0 },
    { kind: 'descent', name: 'descent', toAltitude_m: to_m, schedule: SCHEDULE, mode },
  ];
}

describe('descentLeg', () => {
  it('descentLeg at idle in the stratosphere at constant Mach descends at Ps = (T_idle - D) V / (m g)', () => {
    // Energy method with f = 1 (constant Mach, isothermal layer), zero fuel flow: rate is constant,
    // t = dh / |Ps| (Anderson, Aircraft Performance and Design, section 5.10).
    const LD = 16;
    const m = 60000;
    const idle = 5000;
    const r = solveMission(
      missionInput({
        legs: descent({ kind: 'idle' }, 13000, 11000),
        solve: { kind: 'takeoffWeight', takeoffMass_kg: m, payload_kg: 10000 },
        aero: constantLiftToDragAero(LD),
        propulsion: constantTsfcPropulsion({ thrust0_N: idle / 0.05, tsfc_kg_N_s: 0, lapseExponent: 0, ratings: { maxCruise: 1 } }),
      }),
    );
    expect(r.status).toBe('ok');
    const V = 0.78 * Math.sqrt(1.4 * 287.05287 * 216.65);
    const ps = ((idle - (m * G0) / LD) * V) / (m * G0);
    expectClose(r.tripTime_s, 2000 / -ps, { rel: 1e-9 }, 't = dh / Ps');
  });

  it('descentLeg at a set rate holds the rate and needs less thrust than drag', () => {
    const r = solveMission(
      missionInput({ legs: descent({ kind: 'rate', rate_m_s: 10 }, 35000 * FT, 1500 * FT), solve: { kind: 'takeoffWeight', takeoffMass_kg: 60000, payload_kg: 10000 } }),
    );
    expect(r.status).toBe('ok');
    const h = r.history;
    for (let i = 0; i < h.time_s.length; i++) {
      if (h.legIndex[i] !== 1 || h.climbRate_m_s[i] === 0) continue;
      expect(h.climbRate_m_s[i]).toBeCloseTo(-10, 9);
      expect(h.thrustUsed_N[i]).toBeLessThan(h.drag_N[i]);
    }
    expectClose(r.legs[1].endAltitude_m, 1500 * FT, { abs: 1e-9 }, 'altitude event');
  });

  it('descentLeg at a steep set rate holds it at idle and raises descent_thrust_below_idle', () => {
    const r = solveMission(
      missionInput({ legs: descent({ kind: 'rate', rate_m_s: 40 }, 35000 * FT, 1500 * FT), solve: { kind: 'takeoffWeight', takeoffMass_kg: 60000, payload_kg: 10000 } }),
    );
    expect(r.status).toBe('ok');
    expect(r.cautions.find((c) => c.id === 'descent_thrust_below_idle')).toMatchObject({ legIndex: 1, severity: 'info' });
  });

  it('descentLeg reports infeasible when idle thrust exceeds drag', () => {
    const r = solveMission(
      missionInput({
        legs: descent({ kind: 'idle' }, 13000, 11000),
        solve: { kind: 'takeoffWeight', takeoffMass_kg: 60000, payload_kg: 10000 },
        aero: constantLiftToDragAero(16),
        propulsion: constantTsfcPropulsion({ thrust0_N: 1e6, tsfc_kg_N_s: 0, lapseExponent: 0, ratings: { flightIdle: 0.5 } }),
      }),
    );
    expect(r.status).toBe('infeasible');
    expect(r.statusMessage).toMatch(/Idle thrust exceeds drag/);
  });
});
