import { describe, expect, it } from 'vitest';
import { scheduleMach, schedulePhases } from '../../../engine/mission/speedSchedule';
import { machOfCas, missionAir, transitionAltitude } from '../../../engine/mission/missionAtmosphere';
import { FT, KT, SCHEDULE } from './support/missionFixtures';

describe('speedSchedule', () => {
  it('schedulePhases climbs at the low CAS, accelerates at the limit, holds CAS, then Mach above the transition', () => {
    const phases = schedulePhases(SCHEDULE, 0, 35000 * FT);
    expect(phases.map((p) => (p.kind === 'hold' ? p.held : 'speedChange'))).toEqual(['cas', 'speedChange', 'cas', 'mach']);
    const [low, change, mid, top] = phases;
    expect(low).toMatchObject({ kind: 'hold', held: 'cas', value: 250 * KT, from_m: 0, to_m: 10000 * FT });
    expect(change.kind === 'speedChange' && change.toMach > change.fromMach).toBe(true);
    const trans = transitionAltitude(290 * KT, 0.78);
    expect(mid).toMatchObject({ held: 'cas', value: 290 * KT, from_m: 10000 * FT, to_m: trans });
    expect(top).toMatchObject({ held: 'mach', value: 0.78, from_m: trans, to_m: 35000 * FT });
  });

  it('schedulePhases for a descent runs the same phases in reverse with a deceleration at the limit', () => {
    const phases = schedulePhases(SCHEDULE, 35000 * FT, 1500 * FT);
    expect(phases.map((p) => (p.kind === 'hold' ? p.held : 'speedChange'))).toEqual(['mach', 'cas', 'speedChange', 'cas']);
    const change = phases[2];
    expect(change.kind === 'speedChange' && change.toMach < change.fromMach).toBe(true);
  });

  it('schedulePhases splits at the tropopause so the energy share factor is smooth in each phase', () => {
    const phases = schedulePhases({ ...SCHEDULE, mach: 0.8 }, 10000, 12000);
    expect(phases.map((p) => (p.kind === 'hold' ? [p.from_m, p.to_m] : null))).toEqual([
      [10000, 11000],
      [11000, 12000],
    ]);
  });

  it('schedulePhases returns nothing when already at the altitude', () => {
    expect(schedulePhases(SCHEDULE, 5000, 5000)).toEqual([]);
  });

  it('schedulePhases answers a repeated query from its memo by the numbers, not the object: a schedule with another Mach gets its own transition', () => {
    const first = schedulePhases(SCHEDULE, 0, 35000 * FT);
    expect(schedulePhases({ ...SCHEDULE }, 0, 35000 * FT)).toBe(first);
    // The CAS/Mach transition of 290 kt at Mach 0.74 instead of 0.78 (NACA Report 1135 via transitionAltitude).
    const slower = schedulePhases({ ...SCHEDULE, mach: 0.74 }, 0, 35000 * FT);
    const top = slower[slower.length - 1];
    expect(top).toMatchObject({ kind: 'hold', held: 'mach', value: 0.74, from_m: transitionAltitude(290 * KT, 0.74) });
    expect(transitionAltitude(290 * KT, 0.74)).toBeLessThan(transitionAltitude(290 * KT, 0.78));
    // More distinct queries than the memo holds: each still gets its own phases.
    for (let i = 0; i < 40; i++) {
      const phases = schedulePhases(SCHEDULE, 1000 + i, 35000 * FT);
      expect(phases[0]).toMatchObject({ kind: 'hold', held: 'cas', value: 250 * KT, from_m: 1000 + i });
    }
    expect(schedulePhases(SCHEDULE, 0, 35000 * FT)).toEqual(first);
  });

  it('scheduleMach is the zone CAS as a Mach at the pressure altitude, capped by the Mach (NACA Report 1135 via machOfCas)', () => {
    const p = (h: number) => missionAir(h, 0).pressure_Pa;
    expect(scheduleMach(SCHEDULE, 5000 * FT)).toBe(machOfCas(250 * KT, p(5000 * FT)));
    expect(scheduleMach(SCHEDULE, 20000 * FT)).toBe(machOfCas(290 * KT, p(20000 * FT)));
    // At the limit altitude the zone is the one asked for.
    expect(scheduleMach(SCHEDULE, 10000 * FT, 9000 * FT)).toBe(machOfCas(250 * KT, p(10000 * FT)));
    expect(scheduleMach(SCHEDULE, 40000 * FT)).toBe(0.78);
  });
});
