import { describe, expect, it } from 'vitest';
import { schedulePhases } from '../../../engine/mission/speedSchedule';
import { transitionAltitude } from '../../../engine/mission/missionAtmosphere';
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

  it('schedulePhases answers a repeated pair from its memo as a fresh schedule object would, beyond the memo bound and after a change in place', () => {
    const pairs: [number, number][] = [
      [0, 35000 * FT],
      [35000 * FT, 1500 * FT],
      [420 * FT, 37000 * FT],
      [1500 * FT, 25000 * FT],
      [10000, 12000],
      [37000 * FT, 0],
    ];
    const kept = { ...SCHEDULE };
    for (let round = 0; round < 3; round++) {
      for (const [from, to] of pairs) expect(schedulePhases(kept, from, to)).toEqual(schedulePhases({ ...SCHEDULE }, from, to));
    }
    // Changed in place (inputs are read-only by contract; the memo still checks the numbers): the new Mach's phases,
    // whose Mach phase starts at the new CAS/Mach transition altitude (closed form, missionAtmosphere.transitionAltitude).
    const before = schedulePhases(kept, 0, 35000 * FT);
    (kept as { mach: number }).mach = 0.74;
    const after = schedulePhases(kept, 0, 35000 * FT);
    expect(after).toEqual(schedulePhases({ ...SCHEDULE, mach: 0.74 }, 0, 35000 * FT));
    expect(after).not.toEqual(before);
    expect(after.at(-1)).toMatchObject({ held: 'mach', value: 0.74, from_m: transitionAltitude(290 * KT, 0.74) });
  });
});
