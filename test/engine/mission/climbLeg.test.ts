import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { solveMission } from '../../../engine/mission/solveMission';
import type { Leg, SpeedSchedule } from '../../../engine/mission/missionTypes';
import { expectClose } from '../../support/assertInDelta';
import { constantLiftToDragAero, constantTsfcPropulsion } from './support/analyticModels';
import { KT, missionInput, TEST_AIRFRAME } from './support/missionFixtures';

const G0 = 9.80665;
const R_AIR = 287.05287;
const LD = 16;
const MASS = 60000;
const DRAG = (MASS * G0) / LD;
const reference = JSON.parse(readFileSync(new URL('../../reference/missionReference.json', import.meta.url), 'utf8')) as {
  climbConstantMachTroposphere: { time_s: number };
  climbConstantCasTroposphere: { time_s: number };
};

/** Climb with constant excess thrust and no fuel burn (TSFC 0): an energy-method textbook case. */
function climbMission(from_m: number, to_m: number, schedule: SpeedSchedule, excess_N: number) {
  const legs: Leg[] = [
    { kind: 'cruise', name: 'level', altitude_m: from_m, speed: { kind: 'mach', mach: schedule.mach }, profile: { kind: 'constantAltitude' }, distance_m: 0 },
    { kind: 'climb', name: 'climb', toAltitude_m: to_m, schedule, rating: 'maxClimb' },
  ];
  return solveMission(
    missionInput({
      legs,
      solve: { kind: 'takeoffWeight', takeoffMass_kg: MASS, payload_kg: MASS - TEST_AIRFRAME.oew_kg - 1 },
      aero: constantLiftToDragAero(LD),
      propulsion: constantTsfcPropulsion({ thrust0_N: DRAG + excess_N, tsfc_kg_N_s: 0, lapseExponent: 0, ratings: { maxCruise: 1 } }),
      airframe: { ...TEST_AIRFRAME, mzfw_kg: 1e6, mmo: 0.95, vmo_m_s: 600 * KT },
    }),
  );
}

describe('climbLeg', () => {
  it('climbLeg at constant Mach in the stratosphere takes t = dh / Ps', () => {
    // Specific excess power Ps = (T - D) V / (m g); at constant Mach above 11 km V is constant and the
    // acceleration factor is 1, so t = dh / Ps (Anderson, Aircraft Performance and Design, section 5.10).
    const schedule: SpeedSchedule = { lowCas_m_s: 320 * KT, lowAltitudeLimit_m: 0, cas_m_s: 320 * KT, mach: 0.8 };
    const r = climbMission(11000, 15000, schedule, 60000);
    expect(r.status).toBe('ok');
    const V = 0.8 * Math.sqrt(1.4 * R_AIR * 216.65);
    const ps = (60000 * V) / (MASS * G0);
    expectClose(r.tripTime_s, 4000 / ps, { rel: 1e-9 }, 't = dh / Ps');
  });

  it('climbLeg at constant Mach in the troposphere matches the analytic energy-method integral', () => {
    // t = integral dh / (Ps f), f = [1 + (kappa R beta / 2 g) M^2]^-1, V = M sqrt(kappa R T(h)), T = T0 + beta h:
    // closed form (2 / beta) [sqrt(T1) - sqrt(T0)] m g / ((T - D) M sqrt(kappa R) f).
    const schedule: SpeedSchedule = { lowCas_m_s: 450 * KT, lowAltitudeLimit_m: 0, cas_m_s: 450 * KT, mach: 0.6 };
    const r = climbMission(1000, 9000, schedule, 60000);
    expect(r.status).toBe('ok');
    const beta = -0.0065;
    const f = 1 / (1 + ((1.4 * R_AIR * beta) / (2 * G0)) * 0.36);
    const integral = (2 / beta) * (Math.sqrt(288.15 + beta * 9000) - Math.sqrt(288.15 + beta * 1000));
    const analytic = (integral * MASS * G0) / (60000 * 0.6 * Math.sqrt(1.4 * R_AIR) * f);
    expectClose(r.tripTime_s, analytic, { rel: 1e-7 }, 'closed-form energy-method integral');
    expectClose(r.tripTime_s, reference.climbConstantMachTroposphere.time_s, { rel: 1e-7 }, 'missionReference.py closed form');
  });

  it('climbLeg at constant CAS in the troposphere matches the quadrature with finite-difference dV/dh', () => {
    // Reference: scipy quad of dt/dh = (T/T_isa + (V/g) dV/dHp) / Ps with dV/dHp by finite differences
    // (test/reference/missionReference.py), independent of the closed-form factor used by the solver.
    const schedule: SpeedSchedule = { lowCas_m_s: 280 * KT, lowAltitudeLimit_m: 0, cas_m_s: 280 * KT, mach: 0.9 };
    const r = climbMission(1000, 9000, schedule, 60000);
    expect(r.status).toBe('ok');
    expectClose(r.tripTime_s, reference.climbConstantCasTroposphere.time_s, { rel: 1e-6 }, 'missionReference.py quad');
  });

  it('climbLeg stops and reports climb_not_reached when the climb rate falls below 100 ft/min', () => {
    // Thrust lapse (rho/rho0)^1 with thrust = drag at about 8 km: the climb must stall below 12 km.
    const rho8 = 0.5258; // ISA density at 8 km, kg/m^3 (U.S. Standard Atmosphere 1976)
    const thrust0 = DRAG / (rho8 / 1.225);
    const r = solveMission(
      missionInput({
        legs: [{ kind: 'climb', name: 'climb', toAltitude_m: 12000, schedule: { lowCas_m_s: 250 * KT, lowAltitudeLimit_m: 3048, cas_m_s: 280 * KT, mach: 0.78 }, rating: 'maxClimb' }],
        solve: { kind: 'takeoffWeight', takeoffMass_kg: MASS, payload_kg: 10000 },
        aero: constantLiftToDragAero(LD),
        propulsion: constantTsfcPropulsion({ thrust0_N: thrust0, tsfc_kg_N_s: 0, lapseExponent: 1 }),
      }),
    );
    expect(r.status).toBe('climb_not_reached');
    const caution = r.cautions.find((c) => c.id === 'climb_not_reached');
    expect(caution?.legName).toBe('climb');
    expect(r.history.altitude_m[r.history.altitude_m.length - 1]).toBeLessThan(8000);
    expect(r.history.climbRate_m_s[r.history.climbRate_m_s.length - 1]).toBeCloseTo((100 * 0.3048) / 60, 6);
  });

  it('climbLeg raises residual_climb_low at top of climb just below the threshold and not just above', () => {
    // Constant Mach in the stratosphere: the top-of-climb rate is Ps exactly.
    const schedule: SpeedSchedule = { lowCas_m_s: 320 * KT, lowAltitudeLimit_m: 0, cas_m_s: 320 * KT, mach: 0.8 };
    const V = 0.8 * Math.sqrt(1.4 * R_AIR * 216.65);
    const minRate = (300 * 0.3048) / 60;
    const excessAt = (rate: number) => (rate * MASS * G0) / V;
    const below = climbMission(11000, 12000, schedule, excessAt(minRate * 0.999));
    const above = climbMission(11000, 12000, schedule, excessAt(minRate * 1.001));
    expect(below.status).toBe('ok');
    expect(above.status).toBe('ok');
    expect(below.cautions.some((c) => c.id === 'residual_climb_low')).toBe(true);
    expect(above.cautions.some((c) => c.id === 'residual_climb_low')).toBe(false);
  });
});
