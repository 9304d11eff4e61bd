import { describe, expect, it } from 'vitest';
import { solveMission } from '../../../engine/mission/solveMission';
import { buildTimeHistory, createFlightLog } from '../../../engine/mission/timeHistoryBuilder';
import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';
import type { Caution } from '../../../engine/cautions/caution';
import type { Leg } from '../../../engine/mission/missionTypes';
import { constantTsfcPropulsion, parabolicAero } from './support/analyticModels';
import { demoLegs, FT, KT, missionInput, TEST_AIRFRAME } from './support/missionFixtures';

const extrapolation: Caution = { id: 'deck_extrapolation', severity: 'caution', message: 'Deck looked up outside its Mach range.' };

function cruiseAt(mach: number, altitude_m: number): Leg[] {
  return [{ kind: 'cruise', name: 'cruise', altitude_m, speed: { kind: 'mach', mach }, profile: { kind: 'constantAltitude' }, distance_m: 500_000 }];
}

describe('timeHistoryBuilder', () => {
  it('passes deck_extrapolation through once per leg with its first time', () => {
    const propulsion = constantTsfcPropulsion({ thrust0_N: 240000, tsfc_kg_N_s: 1.7e-5, lapseExponent: 0.75, cautions: [extrapolation] });
    const r = solveMission(missionInput({ legs: demoLegs(1_000_000), solve: { kind: 'takeoffWeight', takeoffMass_kg: 70000, payload_kg: 10000 }, propulsion }));
    expect(r.status).toBe('ok');
    const deck = r.cautions.filter((c) => c.id === 'deck_extrapolation');
    const legsWithLookups = new Set(deck.map((c) => c.legIndex));
    expect(deck.length).toBe(legsWithLookups.size);
    const climb = deck.find((c) => c.legName === 'climb');
    expect(climb?.time_s).toBe(r.legs[2].startTime_s);
    const silent = solveMission({
      ...missionInput({ legs: demoLegs(1_000_000), solve: { kind: 'takeoffWeight', takeoffMass_kg: 70000, payload_kg: 10000 }, propulsion }),
      cautionSettings: { ...DEFAULT_CAUTION_SETTINGS, cautionOnDeckExtrapolation: false },
    });
    expect(silent.cautions.some((c) => c.id === 'deck_extrapolation')).toBe(false);
  });

  it('raises mmo_exceeded just above MMO and not at it', () => {
    const at = solveMission(missionInput({ legs: cruiseAt(TEST_AIRFRAME.mmo, 11000), solve: { kind: 'takeoffWeight', takeoffMass_kg: 60000, payload_kg: 10000 } }));
    const above = solveMission(missionInput({ legs: cruiseAt(TEST_AIRFRAME.mmo + 1e-6, 11000), solve: { kind: 'takeoffWeight', takeoffMass_kg: 60000, payload_kg: 10000 } }));
    expect(at.cautions.some((c) => c.id === 'mmo_exceeded')).toBe(false);
    expect(above.cautions.find((c) => c.id === 'mmo_exceeded')).toMatchObject({ legIndex: 0, time_s: 0, threshold: TEST_AIRFRAME.mmo });
  });

  it('raises vmo_exceeded when a hold CAS passes VMO', () => {
    const legs: Leg[] = [{ kind: 'hold', name: 'hold', altitude_m: 3000, time_s: 600, speed: { kind: 'cas', cas_m_s: TEST_AIRFRAME.vmo_m_s + 1 } }];
    const r = solveMission(missionInput({ legs, solve: { kind: 'takeoffWeight', takeoffMass_kg: 60000, payload_kg: 10000 } }));
    const c = r.cautions.find((x) => x.id === 'vmo_exceeded');
    expect(c?.value).toBeCloseTo(TEST_AIRFRAME.vmo_m_s + 1, 6);
  });

  it('raises buffet_margin_low and cl_above_clmax from the polar at the flight point', () => {
    // Heavy and slow at altitude: CL above the buffet CL / 1.3 and above CLmax.
    const aero = parabolicAero(0.022, 0.045, { wingArea_m2: 120, clMax: 0.9, buffetCl: 0.95 });
    const r = solveMission(
      missionInput({ legs: cruiseAt(0.5, 41000 * FT), solve: { kind: 'takeoffWeight', takeoffMass_kg: 78000, payload_kg: 10000 }, aero, propulsion: constantTsfcPropulsion({ thrust0_N: 1e6, tsfc_kg_N_s: 1.7e-5, lapseExponent: 0 }) }),
    );
    expect(r.cautions.some((c) => c.id === 'buffet_margin_low')).toBe(true);
    expect(r.cautions.some((c) => c.id === 'cl_above_clmax')).toBe(true);
  });

  it('raises polar_table_clamped once per leg when the polar reports a table it clamped on', () => {
    const aero = parabolicAero(0.022, 0.045, { wingArea_m2: 120, outsideTables: ['compressibility'] });
    const r = solveMission(missionInput({ legs: demoLegs(1_000_000), solve: { kind: 'takeoffWeight', takeoffMass_kg: 70000, payload_kg: 10000 }, aero }));
    const clamped = r.cautions.filter((c) => c.id === 'polar_table_clamped');
    expect(clamped.length).toBe(new Set(clamped.map((c) => c.legIndex)).size);
    expect(clamped.find((c) => c.legName === 'cruise')?.message).toMatch(/compressibility/);
  });

  it('fills every history column with one finite sample per step', () => {
    const r = solveMission(missionInput({ legs: demoLegs(1_500_000), solve: { kind: 'takeoffWeight', takeoffMass_kg: 70000, payload_kg: 10000 } }));
    const n = r.history.time_s.length;
    for (const [name, col] of Object.entries(r.history)) {
      expect(col.length, name).toBe(n);
      for (const v of Array.from(col as ArrayLike<number>)) expect(Number.isFinite(v), name).toBe(true);
    }
    for (let i = 1; i < n; i++) expect(r.history.time_s[i]).toBeGreaterThanOrEqual(r.history.time_s[i - 1]);
    expect(r.history.altitude_m.reduce((a, b) => Math.max(a, b), 0)).toBeCloseTo(35000 * FT, 6);
    expect(r.history.cas_m_s.reduce((a, b) => Math.max(a, b), 0)).toBeLessThanOrEqual(290 * KT + 1e-6);
  });

  it('flags a cruise leg that starts away from the altitude reached (altitude_jump, info)', () => {
    const legs = demoLegs(1_000_000).map((l) => (l.kind === 'cruise' ? { ...l, altitude_m: 37000 * FT } : l));
    const r = solveMission(missionInput({ legs, solve: { kind: 'takeoffWeight', takeoffMass_kg: 70000, payload_kg: 10000 } }));
    expect(r.cautions.find((c) => c.id === 'altitude_jump')).toMatchObject({ legName: 'cruise', severity: 'info' });
    const level = solveMission(missionInput({ legs: demoLegs(1_000_000), solve: { kind: 'takeoffWeight', takeoffMass_kg: 70000, payload_kg: 10000 } }));
    expect(level.cautions.some((c) => c.id === 'altitude_jump')).toBe(false);
  });

  it('buildTimeHistory gives each column the values the log holds, in columns that do not overlap', () => {
    // The reference is the log's own arrays (what appendSample pushed); the columns share one buffer, so writing
    // one column must leave every other as it was.
    const log = createFlightLog(TEST_AIRFRAME, DEFAULT_CAUTION_SETTINGS);
    const names = Object.keys(log.columns) as (keyof typeof log.columns)[];
    for (let i = 0; i < 7; i++) {
      names.forEach((name, j) => log.columns[name].push(i * 100 + j + 0.25));
      log.legIndex.push(i === 0 ? 0 : i - 1);
    }
    const history = buildTimeHistory(log);
    for (const name of names) expect(Array.from(history[name])).toEqual(log.columns[name]);
    expect(Array.from(history.legIndex)).toEqual([0, 0, 1, 2, 3, 4, 5]);
    history.time_s.fill(Number.NaN);
    history.climbRate_m_s.fill(-1);
    for (const name of names.filter((n) => n !== 'time_s' && n !== 'climbRate_m_s')) expect(Array.from(history[name])).toEqual(log.columns[name]);
    expect(Array.from(history.legIndex)).toEqual([0, 0, 1, 2, 3, 4, 5]);
    const empty = buildTimeHistory(createFlightLog(TEST_AIRFRAME, DEFAULT_CAUTION_SETTINGS));
    for (const column of Object.values(empty)) expect(column.length).toBe(0);
  });
});
