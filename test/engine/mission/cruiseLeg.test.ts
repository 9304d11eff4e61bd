import { describe, expect, it } from 'vitest';
import { solveMission } from '../../../engine/mission/solveMission';
import { specificRangeAt } from '../../../engine/mission/bestSpeeds';
import type { CruiseProfile, CruiseSpeed, Leg } from '../../../engine/mission/missionTypes';
import { expectClose } from '../../support/assertInDelta';
import { constantTsfcPropulsion } from './support/analyticModels';
import { DEMO_AERO, FT, missionInput } from './support/missionFixtures';

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
});
