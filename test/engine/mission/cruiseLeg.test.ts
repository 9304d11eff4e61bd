import { describe, expect, it } from 'vitest';
import { solveMission } from '../../../engine/mission/solveMission';
import { specificRangeAt } from '../../../engine/mission/bestSpeeds';
import type { CruiseProfile, CruiseSpeed, Leg } from '../../../engine/mission/missionTypes';
import { expectClose } from '../../support/assertInDelta';
import { constantTsfcPropulsion } from './support/analyticModels';
import { DEMO_AERO, FT, missionInput } from './support/missionFixtures';
import { parabolicAero } from './support/analyticModels';
import { demoMissionInput } from './support/demoProject';
import { cruiseClimbStart } from '../../../engine/mission/cruiseLeg';
import { airPoint, ratingPoint } from '../../../engine/mission/flightPoint';

const engines = constantTsfcPropulsion({ thrust0_N: 260000, tsfc_kg_N_s: 1.7e-5, lapseExponent: 0.75 });

function cruise(speed: CruiseSpeed, profile: CruiseProfile, altitude_m = 31000 * FT): Leg[] {
  return [{ kind: 'cruise', name: 'cruise', altitude_m, speed, profile, distance_m: 4_000_000 }];
}

// Payload 13,000 kg: 25,000 kg of fuel, the test airframe's tank capacity (a fuller tank is its own status, above capacity).
function fly(legs: Leg[]) {
  return solveMission(missionInput({ legs, solve: { kind: 'takeoffWeight', takeoffMass_kg: 78000, payload_kg: 13000 }, propulsion: engines }));
}

describe('cruiseLeg', () => {
  it('cruiseLeg at best-range Mach burns no more than any fixed Mach at the same level', () => {
    const best = fly(cruise({ kind: 'bestRange' }, { kind: 'constantAltitude' }));
    expect(best.status).toBe('ok');
    for (const mach of [0.6, 0.7, 0.78]) {
      const fixed = fly(cruise({ kind: 'mach', mach }, { kind: 'constantAltitude' }));
      expect(best.tripFuel_kg).toBeLessThanOrEqual(fixed.tripFuel_kg + 1e-6);
    }
  });

  it('cruiseLeg at long-range Mach is faster than best range for at most about 1 % more fuel', () => {
    const best = fly(cruise({ kind: 'bestRange' }, { kind: 'constantAltitude' }));
    const lrc = fly(cruise({ kind: 'longRange' }, { kind: 'constantAltitude' }));
    expect(lrc.tripTime_s).toBeLessThan(best.tripTime_s);
    // 99 % of best specific range everywhere -> fuel within about 1/0.99 of best (common practice).
    expect(lrc.tripFuel_kg / best.tripFuel_kg).toBeLessThan(1.0102);
    expect(lrc.tripFuel_kg).toBeGreaterThan(best.tripFuel_kg);
  });

  it('cruiseLeg with step climbs steps up only when the higher level has the better specific range', () => {
    const steps = fly(cruise({ kind: 'mach', mach: 0.78 }, { kind: 'stepClimb', step_m: 2000 * FT, maxAltitude_m: 41000 * FT }, 29000 * FT));
    const level = fly(cruise({ kind: 'mach', mach: 0.78 }, { kind: 'constantAltitude' }, 29000 * FT));
    expect(steps.status).toBe('ok');
    const h = steps.history.altitude_m;
    const m = steps.history.mass_kg;
    expect(Math.max(...h)).toBeGreaterThan(29000 * FT + 1);
    expect(steps.tripFuel_kg).toBeLessThan(level.tripFuel_kg);
    // At each step start, specific range one step up is at least that of the current level (the step rule).
    for (let i = 1; i < h.length; i++) {
      if (h[i] > h[i - 1] + 1 && h[i - 1] === h[Math.max(i - 2, 0)]) {
        const input = missionInput({ legs: [], solve: { kind: 'takeoffWeight', takeoffMass_kg: 1, payload_kg: 0 }, propulsion: engines });
        const here = specificRangeAt(input, h[i - 1], 0.78, m[i - 1], 0);
        const up = specificRangeAt(input, h[i - 1] + 2000 * FT, 0.78, m[i - 1], 0);
        expect(up).toBeGreaterThanOrEqual(here * (1 - 1e-9));
      }
    }
  });

  it('cruiseLeg cruise-climb rises as fuel burns and beats the constant-altitude cruise', () => {
    const climbing = fly(cruise({ kind: 'mach', mach: 0.78 }, { kind: 'cruiseClimb', maxAltitude_m: 43000 * FT }, 29000 * FT));
    const level = fly(cruise({ kind: 'mach', mach: 0.78 }, { kind: 'constantAltitude' }, 29000 * FT));
    expect(climbing.status).toBe('ok');
    const h = climbing.history.altitude_m;
    for (let i = 1; i < h.length; i++) expect(h[i]).toBeGreaterThanOrEqual(h[i - 1] - 1);
    expect(h[h.length - 1]).toBeGreaterThan(h[0] + 100);
    expect(climbing.tripFuel_kg).toBeLessThan(level.tripFuel_kg);
    expectClose(climbing.airDistance_m, 4_000_000, { abs: 1e-3 }, 'distance event');
  });

  it('cruiseLeg reports thrust_below_drag where the maxCruise rating cannot hold the Mach', () => {
    const weak = constantTsfcPropulsion({ thrust0_N: 90000, tsfc_kg_N_s: 1.7e-5, lapseExponent: 1 });
    const r = solveMission(
      missionInput({ legs: cruise({ kind: 'mach', mach: 0.8 }, { kind: 'constantAltitude' }, 41000 * FT), solve: { kind: 'takeoffWeight', takeoffMass_kg: 78000, payload_kg: 10000 }, propulsion: weak, aero: DEMO_AERO }),
    );
    expect(r.status).toBe('thrust_below_drag');
    // A failed mission names the leg, the time and the cause.
    expect(r.statusMessage).toMatch(/Thrust below drag/);
    expect(r.statusMessage).toMatch(/leg 1 "cruise", .* after block-out/);
    const c = r.cautions.find((x) => x.id === 'thrust_below_drag');
    expect(c).toMatchObject({ legIndex: 0, legName: 'cruise' });
    expect(c!.value!).toBeLessThanOrEqual(c!.threshold!);
  });

  it('cruiseLeg does not step up when the climb rate at the higher level would be below the residual climb rate', () => {
    // Same aircraft, but maxClimb thrust barely above cruise drag: the step rule's climb-rate condition fails.
    const weakClimb = constantTsfcPropulsion({ thrust0_N: 260000, tsfc_kg_N_s: 1.7e-5, lapseExponent: 0.75, ratings: { maxClimb: 0.2, maxCruise: 0.9 } });
    const r = solveMission(
      missionInput({
        legs: cruise({ kind: 'mach', mach: 0.78 }, { kind: 'stepClimb', step_m: 2000 * FT, maxAltitude_m: 41000 * FT }, 29000 * FT),
        solve: { kind: 'takeoffWeight', takeoffMass_kg: 78000, payload_kg: 13000 },
        propulsion: weakClimb,
      }),
    );
    expect(r.status).toBe('ok');
    expect(Math.max(...r.history.altitude_m)).toBeCloseTo(29000 * FT, 6);
  });

  it('cruiseLeg cruise-climb at constant CL and Mach burns what the Breguet range equation gives', () => {
    // Above 11 km (ISA isothermal, U.S. Standard Atmosphere 1976) a constant Mach is a constant TAS, and p = p0 m / m0
    // keeps CL and, for a parabolic polar with constant TSFC, L/D constant: R = (V / (c g)) (L/D) ln(m0/m1)
    // exactly (Breguet range; Anderson, Aircraft Performance and Design, section 5.13, the cruise-climb case).
    const cd0 = 0.02;
    const k = 0.08;
    const c = 1.6e-5;
    const S = 120;
    const M = 0.8;
    const h0 = 11500;
    const R = 3_000_000;
    const m0 = 70000;
    const g = 9.80665;
    const r = solveMission(
      missionInput({
        legs: [{ kind: 'cruise', name: 'cruise-climb', altitude_m: h0, speed: { kind: 'mach', mach: M }, profile: { kind: 'cruiseClimb', maxAltitude_m: 19000 }, distance_m: R }],
        solve: { kind: 'takeoffWeight', takeoffMass_kg: m0, payload_kg: 10000 },
        aero: parabolicAero(cd0, k, { wingArea_m2: S, buffetCl: 0.9 }),
        propulsion: constantTsfcPropulsion({ thrust0_N: 400000, tsfc_kg_N_s: c, lapseExponent: 0 }),
      }),
    );
    expect(r.status).toBe('ok');
    // The optimum (CL = sqrt(CD0/K) = 0.5) lies below 11,500 m at 70 t, so the leg starts at its own altitude
    // (to the 1 m of the start search: the closed form takes the level actually flown first).
    const hStart = r.history.altitude_m[0];
    expectClose(hStart, h0, { abs: 1 }, 'starts at the leg altitude');
    const p = 22632.06 * Math.exp((-g * (hStart - 11000)) / (287.05287 * 216.65)); // ISA above 11 km
    const cl = (m0 * g) / (0.7 * p * M * M * S);
    const ld = cl / (cd0 + k * cl * cl);
    const V = M * Math.sqrt(1.4 * 287.05287 * 216.65);
    const m1 = m0 * Math.exp((-R * c * g) / (V * ld));
    expectClose(r.tripFuel_kg, m0 - m1, { rel: 1e-6 }, 'Breguet range at constant CL and Mach');
    const n = r.history.cl.length;
    expectClose(r.history.cl[n - 1], cl, { rel: 1e-6 }, 'CL held');
    expect(r.history.altitude_m[n - 1]).toBeGreaterThan(h0 + 1000);
  });

  it('cruiseLeg cruise-climb flies the climb to its start level from the leg altitude, never jumps', () => {
    const r = fly(cruise({ kind: 'mach', mach: 0.78 }, { kind: 'cruiseClimb', maxAltitude_m: 43000 * FT }, 29000 * FT));
    expect(r.status).toBe('ok');
    const alt = r.history.altitude_m;
    const rate = r.history.climbRate_m_s;
    const t = r.history.time_s;
    // Consecutive samples never jump: every altitude change is flown at the climb rates recorded at its ends
    // (plus 0.1 m/s for the cruise-climb's slow algebraic rise, whose rate is not recorded).
    for (let i = 1; i < alt.length; i++) {
      const dt = t[i] - t[i - 1];
      expect(Math.abs(alt[i] - alt[i - 1])).toBeLessThanOrEqual(1.1 * Math.max(Math.abs(rate[i]), Math.abs(rate[i - 1])) * dt + 0.1 * dt + 1e-6);
    }
    expectClose(alt[0], 29000 * FT, { abs: 1e-6 }, 'the leg starts at its altitude');
    const climbing = Array.from(r.history.climbRate_m_s).some((v) => v > 1);
    expect(climbing).toBe(true);
  });

  it('cruiseClimbStart keeps the start level within the cruise limits: the residual climb rate binds on the demo', () => {
    // Limits (common practice): climb rate at maxClimb at least 300 ft/min, buffet load factor at least 1.3 g.
    const demo = demoMissionInput();
    const m = 16000;
    const speed = { kind: 'mach', mach: 0.78 } as const;
    const start = cruiseClimbStart(demo, speed, 37000 * FT, 45000 * FT, m, 0);
    const rate = (h: number) => {
      const at = airPoint(demo, h, 0.78, m, 0);
      return ratingPoint(demo, at, 0, 'maxClimb').thrust_N - at.drag.drag_N;
    };
    expect(start.altitude_m).toBeGreaterThan(37000 * FT);
    expect(start.altitude_m).toBeLessThan(45000 * FT);
    if (start.limitedBy === 'climb-rate limit') {
      // Just above the start the excess thrust no longer gives the residual rate; the start still has thrust to spare.
      expect(rate(start.altitude_m)).toBeGreaterThan(0);
      const above = cruiseClimbStart(demo, speed, 37000 * FT, start.altitude_m + 5, m, 0);
      expect(above.altitude_m).toBeLessThanOrEqual(start.altitude_m + 5);
    }
    expect(start.limitedBy).not.toBeNull();
    expect(airPoint(demo, start.altitude_m, 0.78, m, 0).drag.buffetLoadFactor).toBeGreaterThanOrEqual(demo.cautionSettings.minBuffetLoadFactor);
  });

  it('cruiseLeg cruise-climb on the demo with its cap at 45,000 ft converges (was did_not_converge)', () => {
    // Demo figures change with the demo engine; only the convergence and the limits are pinned.
    const demo = demoMissionInput();
    const legs = demo.legs.map((l) => (l.kind === 'cruise' ? { ...l, profile: { kind: 'cruiseClimb' as const, maxAltitude_m: 45000 * FT } } : l));
    const r = solveMission({ ...demo, legs });
    expect(r.status).toBe('ok');
    expect(r.cautions.some((c) => c.id === 'thrust_below_drag')).toBe(false);
    const cruiseRow = r.legs.find((l) => l.kind === 'cruise')!;
    expectClose(cruiseRow.startAltitude_m, 37000 * FT, { abs: 1e-6 }, 'starts at the leg altitude and climbs from there');
    expect(cruiseRow.endAltitude_m).toBeLessThanOrEqual(45000 * FT + 1e-6);
  });
});
