import { describe, expect, it } from 'vitest';
import { evaluateMission } from '../../../engine/mission/fuelIteration';
import { MassTable } from '../../../engine/mission/passMemo';
import { solveMission } from '../../../engine/mission/solveMission';
import { S_MASS } from '../../../engine/mission/missionState';
import { createFlightLog } from '../../../engine/mission/timeHistoryBuilder';
import { demoMissionInput } from './support/demoProject';

describe('passMemo', () => {
  it('MassTable interpolates by the parabola through the three nearest points: exact on a quadratic', () => {
    // Lagrange interpolation reproduces any polynomial of degree <= 2 through three points (any numerical-analysis text,
    // e.g. Burden & Faires, Numerical Analysis, 3.1).
    const f = (m: number) => 3 + 0.2 * m - 1e-4 * m * m;
    const t = new MassTable();
    for (const m of [1000, 1300, 1250, 1700]) t.add(m, f(m));
    for (const m of [1010, 1260, 1299, 1650]) expect(t.at(m, 600, 0)).toBeCloseTo(f(m), 9);
    // Outside the flown masses only within the extrapolation allowed, by the parabola through the three outermost.
    expect(t.at(1705, 600, 0)).toBeNull();
    expect(t.at(1705, 600, 10)).toBeCloseTo(f(1705), 9);
    expect(t.at(995, 600, 10)).toBeCloseTo(f(995), 9);
    // A third point closer than a tenth of the bracket's width to it is not used (its curvature would be the flights'
    // rounding magnified): the line through the bracket instead.
    const close = new MassTable();
    for (const m of [1000, 1001, 1300]) close.add(m, f(m));
    expect(close.at(1150, 600, 0)).toBeCloseTo(f(1001) + ((f(1300) - f(1001)) / 299) * 149, 9);
    expect(close.at(1305, 600, 10)).toBeCloseTo(f(1001) + ((f(1300) - f(1001)) / 299) * 304, 9);
    // A bracket wider than allowed is flown.
    expect(t.at(1500, 300, 0)).toBeNull();
    expect(new MassTable().at(1000, 600, 100)).toBeNull();
  });

  it('the passes sharing the alternate descents and the contingency hold give the same converged flight as flying them every pass', () => {
    // The converged demo pass (memo read) against the same ramp mass and cruise distance flown with every trial
    // descent and hold flown (no memo): the alternate's fuel within 1e-5 kg, the reserve the same.
    const input = demoMissionInput();
    const r = solveMission(input);
    const cruise = r.legs.find((l) => l.kind === 'cruise');
    expect(cruise).toBeDefined();
    const ctx = { input, options: { stepScale: 1, allowNegativeFuel: true }, zeroFuelMass_kg: r.zeroFuelMass_kg, log: createFlightLog(input.airframe, input.cautionSettings) };
    const bare = evaluateMission(ctx, r.rampMass_kg, cruise!.endGroundDistance_m - cruise!.startGroundDistance_m);
    expect(Math.abs(bare.trip.landing[S_MASS] - r.landingMass_kg)).toBeLessThan(1e-6);
    expect(Math.abs(bare.reserves.breakdown.alternate_kg - r.reserves.alternate_kg)).toBeLessThan(1e-5);
    expect(Math.abs(bare.reserves.breakdown.total_kg - r.reserveFuel_kg)).toBeLessThan(1e-5);
  });
});
