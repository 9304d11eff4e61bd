import { describe, expect, it } from 'vitest';
import { solveMission } from '../../../engine/mission/solveMission';
import { expectClose } from '../../support/assertInDelta';
import { constantTsfcPropulsion, constantLiftToDragAero, parabolicAero } from './support/analyticModels';
import { KT, missionInput } from './support/missionFixtures';

const G0 = 9.80665;

describe('holdLeg', () => {
  it('holdLeg burns what the Breguet endurance equation predicts at constant L/D and TSFC', () => {
    // Jet endurance E = (1/(c g)) (L/D) ln(W0/W1) (Anderson, Aircraft Performance and Design, section 5.14).
    const LD = 17;
    const c = 1.7e-5;
    const E = 7200;
    const r = solveMission(
      missionInput({
        legs: [{ kind: 'hold', name: 'hold', altitude_m: 1500 * 0.3048, time_s: E, speed: { kind: 'cas', cas_m_s: 220 * KT } }],
        solve: { kind: 'takeoffWeight', takeoffMass_kg: 65000, payload_kg: 10000 },
        aero: constantLiftToDragAero(LD),
        propulsion: constantTsfcPropulsion({ thrust0_N: 300000, tsfc_kg_N_s: c, lapseExponent: 0 }),
      }),
    );
    expect(r.status).toBe('ok');
    const w1 = 65000 * Math.exp((-c * G0 * E) / LD);
    expectClose(r.tripFuel_kg, 65000 - w1, { rel: 0.001 }, 'Breguet endurance, within 0.1 %');
    expectClose(r.tripFuel_kg, 65000 - w1, { rel: 1e-7 }, 'Breguet endurance (RK4 far tighter)');
    expectClose(r.tripTime_s, E, { abs: 1e-9 }, 'time event ends the hold exactly');
  });

  it('holdLeg at best endurance flies the minimum-drag lift coefficient sqrt(CD0/K) of a parabolic polar', () => {
    // Minimum drag of CD = CD0 + K CL^2 at CL = sqrt(CD0/K), so L/D max = 1/(2 sqrt(CD0 K)) (Anderson, section 5.4).
    const cd0 = 0.02;
    const k = 0.05;
    const r = solveMission(
      missionInput({
        legs: [{ kind: 'hold', name: 'hold', altitude_m: 3000, time_s: 1800, speed: { kind: 'bestEndurance' } }],
        solve: { kind: 'takeoffWeight', takeoffMass_kg: 65000, payload_kg: 10000 },
        aero: parabolicAero(cd0, k, { wingArea_m2: 120 }),
      }),
    );
    expect(r.status).toBe('ok');
    const n = r.history.cl.length;
    for (let i = 0; i < n; i++) {
      if (r.history.tas_m_s[i] === 0) continue;
      expectClose(r.history.cl[i], Math.sqrt(cd0 / k), { rel: 1e-4 }, 'CL_md = sqrt(CD0/K)');
      expectClose(r.history.liftToDrag[i], 1 / (2 * Math.sqrt(cd0 * k)), { rel: 1e-6 }, '(L/D)max = 1/(2 sqrt(CD0 K))');
    }
  });

  it('holdLeg raises idle_thrust_above_drag when idle thrust exceeds the drag to balance', () => {
    const r = solveMission(
      missionInput({
        legs: [{ kind: 'hold', name: 'hold', altitude_m: 457.2, time_s: 600, speed: { kind: 'cas', cas_m_s: 200 * KT } }],
        solve: { kind: 'takeoffWeight', takeoffMass_kg: 65000, payload_kg: 10000 },
        aero: constantLiftToDragAero(17),
        propulsion: constantTsfcPropulsion({ thrust0_N: 400000, tsfc_kg_N_s: 1.7e-5, lapseExponent: 0, ratings: { flightIdle: 0.2 } }),
      }),
    );
    expect(r.status).toBe('ok');
    const c = r.cautions.find((x) => x.id === 'idle_thrust_above_drag');
    expect(c).toMatchObject({ legIndex: 0, severity: 'info' });
    // Idle fuel flow is used: c x idle thrust for the whole hold.
    expectClose(r.tripFuel_kg, 1.7e-5 * 0.2 * 400000 * 600, { rel: 1e-9 }, 'idle fuel flow x time');
  });

  it('holdLeg at a set CAS burns what the constant-speed endurance closed form of a parabolic polar gives', () => {
    // Level flight at constant speed with D = qS CD0 + K (m g)^2 / (q S) = A + B m^2 and dm/dt = -c D gives
    // t = [atan(m0 sqrt(B/A)) - atan(m1 sqrt(B/A))] / (c sqrt(A B)) (integral of dm / (A + B m^2); the
    // constant-velocity endurance of a parabolic polar, cf. Anderson, Aircraft Performance and Design, section 5.14).
    const cd0 = 0.022;
    const k = 0.045;
    const area = 120;
    const c = 1.7e-5;
    const altitude_m = 1500 * 0.3048;
    const cas = 200 * KT;
    const E = 1800;
    const w0 = 60000;
    const hold = (speed: { kind: 'cas'; cas_m_s: number } | { kind: 'bestEndurance'; minCas_m_s?: number; speedFactor?: number }) =>
      solveMission(
        missionInput({
          legs: [{ kind: 'hold', name: 'hold', altitude_m, time_s: E, speed }],
          solve: { kind: 'takeoffWeight', takeoffMass_kg: w0, payload_kg: 10000 },
          aero: parabolicAero(cd0, k, { wingArea_m2: area }),
          propulsion: constantTsfcPropulsion({ thrust0_N: 300000, tsfc_kg_N_s: c, lapseExponent: 0 }),
        }),
      );
    const r = hold({ kind: 'cas', cas_m_s: cas });
    expect(r.status).toBe('ok');
    // The test models take q = 0.7 p M^2 with the ISA pressure (analyticModels.ts); M from the flown CAS.
    const i = r.history.mach.findIndex((m) => m > 0);
    const mach = r.history.mach[i];
    const p = 101325 * Math.pow(1 - 2.25577e-5 * altitude_m, 5.25588); // ISA troposphere (U.S. Standard Atmosphere 1976)
    const q = 0.7 * p * mach * mach;
    const A = q * area * cd0;
    const B = (k * G0 * G0) / (q * area);
    const s = Math.sqrt(B / A);
    const w1 = Math.tan(Math.atan(w0 * s) - c * Math.sqrt(A * B) * E) / s;
    expectClose(r.tripFuel_kg, w0 - w1, { rel: 1e-6 }, 'constant-speed endurance closed form (atan)');
    // A minimum CAS above the minimum-drag speed (about 208 KEAS here: CL_md = sqrt(CD0/K)) makes best endurance fly
    // that CAS: the same hold as the set CAS.
    const fast = 260 * KT;
    const floored = hold({ kind: 'bestEndurance', minCas_m_s: fast });
    expectClose(floored.tripFuel_kg, hold({ kind: 'cas', cas_m_s: fast }).tripFuel_kg, { rel: 1e-9 }, 'best endurance floored at the set CAS');
    // Faster than minimum drag costs fuel: 1.1 x V_md burns more than V_md (drag minimum of a parabolic polar).
    expect(hold({ kind: 'bestEndurance', speedFactor: 1.1 }).tripFuel_kg).toBeGreaterThan(hold({ kind: 'bestEndurance' }).tripFuel_kg);
  });
});
