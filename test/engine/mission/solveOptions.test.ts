/**
 * SolveOptions.timeHistory false (what a sweep flies with): the same flights, only the time history left out. Every
 * other field of the result must be bit-identical to the full solve's, on the demo in each solve mode, warm-started,
 * and on failing cases; the reference is the full solve itself (an equivalence check), plus closed forms where a
 * figure is checked against one.
 */
import { describe, expect, it } from 'vitest';
import type { MissionInput, MissionResult } from '../../../engine/mission/missionTypes';
import { createPassMemo } from '../../../engine/mission/passMemo';
import { solveMission, type SolveOptions } from '../../../engine/mission/solveMission';
import { sweepRowOf } from '../../../engine/project/sweepCase';
import { constantLiftToDragAero, constantTsfcPropulsion } from './support/analyticModels';
import { demoMissionInput } from './support/demoProject';
import { KT, missionInput } from './support/missionFixtures';
import { expectClose } from '../../support/assertInDelta';

const demo = demoMissionInput();
const NM = 1852;

/** The demo flown with another solve. */
function demoWith(solve: MissionInput['solve'], more: Partial<MissionInput> = {}): MissionInput {
  return { ...demo, ...more, solve };
}

/** Solves `input` with and without the time history and checks that only the history differs, bit for bit. */
function expectSameWithoutHistory(input: MissionInput, options: SolveOptions = {}): MissionResult {
  const full = solveMission(input, options);
  const lean = solveMission(input, { ...options, timeHistory: false });
  const { history: fullHistory, ...fullRest } = full;
  const { history: leanHistory, ...leanRest } = lean;
  // toStrictEqual compares numbers with Object.is: -0 and +0, and every bit of every figure.
  expect(leanRest).toStrictEqual(fullRest);
  expect(sweepRowOf(0, [], lean)).toStrictEqual(sweepRowOf(0, [], full));
  for (const column of Object.values(leanHistory)) expect(column.length).toBe(0);
  if (full.status === 'ok') expect(fullHistory.time_s.length).toBeGreaterThan(1);
  return full;
}

describe('solveMission with timeHistory false', () => {
  it('gives every figure, leg row, caution and status of the full solve in each solve mode on the demo', () => {
    const payload = demo.solve.payload_kg;
    const results = [
      expectSameWithoutHistory(demo),
      expectSameWithoutHistory(demoWith({ kind: 'payloadRange', payload_kg: 0, range_m: 1000 * NM })),
      expectSameWithoutHistory(demoWith({ kind: 'maxRange', payload_kg: payload })),
      expectSameWithoutHistory(demoWith({ kind: 'takeoffWeight', takeoffMass_kg: 14000, payload_kg: payload })),
      // Another atmosphere and wind: other legs hit other cautions.
      expectSameWithoutHistory({ ...demo, isaDev_K: 20, wind_m_s: -25 }),
    ];
    for (const r of results) expect(r.status).toBe('ok');
    expect(results.some((r) => r.cautions.length > 0)).toBe(true);
  }, 60_000);

  it('is the same when warm-started from a neighbour, and with a narrower fuel band', () => {
    const near = solveMission(demoWith({ ...demo.solve, payload_kg: demo.solve.payload_kg + 100 } as MissionInput['solve']));
    expect(near.warmStart).toBeDefined();
    const r = expectSameWithoutHistory(demo, { warmStart: near.warmStart });
    expect(r.iterations).toBeLessThan(4);
    expectSameWithoutHistory(demo, { fuelTolerance_kg: 0.001 });
  }, 60_000);

  it('is the same when the mission fails: too far for the tanks, a cruise Mach the thrust cannot hold', () => {
    const far = expectSameWithoutHistory(demoWith({ kind: 'payloadRange', payload_kg: demo.solve.payload_kg, range_m: 9000 * NM }));
    expect(far.status).not.toBe('ok');
    const legs = demo.legs.map((leg) => (leg.kind === 'cruise' ? { ...leg, speed: { kind: 'mach' as const, mach: 0.95 } } : leg));
    const fast = expectSameWithoutHistory({ ...demo, legs });
    expect(fast.status).not.toBe('ok');
    expect(fast.statusMessage.length).toBeGreaterThan(0);
  }, 60_000);

  it('keeps idle_thrust_above_drag with the figures of the first point that raised it', () => {
    // A hold at constant L/D 17 with idle thrust (0.2 x 400 kN) above the drag from the first point: the caution is
    // drafted once, at t = 0, with the drag m g / (L/D) there (level flight, lift = weight; standard gravity 9.80665).
    const input = missionInput({
      legs: [{ kind: 'hold', name: 'hold', altitude_m: 457.2, time_s: 600, speed: { kind: 'cas', cas_m_s: 200 * KT } }],
      solve: { kind: 'takeoffWeight', takeoffMass_kg: 65000, payload_kg: 10000 },
      aero: constantLiftToDragAero(17),
      propulsion: constantTsfcPropulsion({ thrust0_N: 400000, tsfc_kg_N_s: 1.7e-5, lapseExponent: 0, ratings: { flightIdle: 0.2 } }),
    });
    const r = expectSameWithoutHistory(input);
    const raised = r.cautions.filter((c) => c.id === 'idle_thrust_above_drag');
    expect(raised).toHaveLength(1);
    expect(raised[0]!.time_s).toBe(0);
    expectClose(raised[0]!.value ?? Number.NaN, (65000 * 9.80665) / 17, { rel: 1e-9 }, 'drag = m g / (L/D) at the first point');
    expectClose(raised[0]!.threshold ?? Number.NaN, 0.2 * 400000, { rel: 1e-12 }, 'idle thrust = 0.2 x 400 kN');
  });
});

describe('solveMission with a pass memo shared along missions that differ in solve alone', () => {
  it('gives each mission its own-memo figures to 1e-9 relative (the reserve to 1e-8), reading the flights of the missions before', () => {
    // A row of a sweep: payload and range stepped, aircraft, legs and reserves the same. Converged into a 1e-6 kg band
    // so the fuel band's own scatter (0.02 kg) does not hide the memo's interpolation error (a Lagrange parabola
    // through flown points of a smooth function of the mass, Burden & Faires 3.1).
    const memo = createPassMemo();
    let worst = 0;
    let worstReserve = 0;
    for (let i = 0; i < 12; i++) {
      const input = demoWith({ kind: 'payloadRange', payload_kg: 300 + 9 * (i % 5), range_m: (1500 + 20 * i) * NM });
      const own = solveMission(input, { fuelTolerance_kg: 1e-6 });
      const shared = solveMission(input, { fuelTolerance_kg: 1e-6, passMemo: memo });
      expect(shared.status).toBe('ok');
      for (const figure of ['blockFuel_kg', 'tripFuel_kg', 'blockTime_s'] as const) {
        worst = Math.max(worst, Math.abs(shared[figure] - own[figure]) / own[figure]);
      }
      worstReserve = Math.max(worstReserve, Math.abs(shared.reserveFuel_kg - own.reserveFuel_kg) / own.reserveFuel_kg);
    }
    expect(worst).toBeLessThan(1e-9);
    // The reserve carries the alternate's descent read across the missions' brackets (up to 600 kg wide: about
    // 1e-2 m of descent, 1e-5 kg of alternate fuel); the ramp mass carries it back, so block fuel stays within 1e-9.
    expect(worstReserve).toBeLessThan(1e-8);
    // The memo holds the flights of every mission (each pass adds its alternate descent).
    expect(memo.alternateDescent.size).toBeGreaterThan(12);
  }, 60_000);
});
