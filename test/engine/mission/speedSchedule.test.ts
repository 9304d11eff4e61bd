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
});
