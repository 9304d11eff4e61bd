/**
 * The installed model's bounded memos: the rating memo (engine/propulsion/ratingMemo.ts) and the part-power solve's
 * per-condition memo (engine/propulsion/partPowerSolve.ts over conditionSlots.ts). A memo must change no answer, so
 * the references here are outside it: JavaScript's own Map keyed by the same three numbers and the rating (with
 * Object.is semantics, ECMAScript's SameValue for -0 and 0 is emulated by the key text), a model built fresh for
 * every query or every solve (nothing remembered), and bit-for-bit equality of whole results (toStrictEqual
 * compares numbers with Object.is).
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import type { MissionInput, MissionResult } from '../../../engine/mission/missionTypes';
import { solveMission } from '../../../engine/mission/solveMission';
import { buildMissionInput } from '../../../engine/project/buildMissionInput';
import { parseProject } from '../../../engine/project/parseProject';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import type { EngineDeck } from '../../../engine/propulsion/engineDeck';
import { makeInstalledPropulsion, type InstalledPropulsionOptions } from '../../../engine/propulsion/installedPropulsion';
import { projectInlet } from '../../../engine/project/buildMissionInput';
import { cautionSettingsOf, installationOf } from '../../../engine/project/projectSpecs';
import { RATING_NAMES, type FlightCondition, type InstalledPoint, type RatingName } from '../../../engine/propulsion/propulsionModel';
import { createRatingMemo, RATING_MEMO_ENTRIES } from '../../../engine/propulsion/ratingMemo';

const fixtures = fileURLToPath(new URL('../../../fixtures/', import.meta.url));
const project = expectOk(parseProject(readFileSync(`${fixtures}demo/demo.blockwise.json`, 'utf8'), 'demo.blockwise.json'), 'demo project');
const demoDeck = expectOk(parseDeckCsv(readFileSync(`${fixtures}demo/demo-engine.deck.csv`, 'utf8'), 'demo-engine.deck.csv'), 'demo deck');
const parametricDeck = expectOk(
  parseDeckCsv(readFileSync(`${fixtures}parametric/demo-parametric.deck.csv`, 'utf8'), 'demo-parametric.deck.csv'),
  'parametric deck',
);
const NM = 1852;

/** The installed-model options buildMissionInput passes for the demo project on `deck` (projectSpecs.ts), memo bounds aside. */
function demoOptions(deck: EngineDeck, ratingMemoEntries?: number, partPowerMemoConditions?: number): InstalledPropulsionOptions {
  return {
    deck,
    engineCount: project.engine.count,
    inlet: expectOk(projectInlet(project), 'demo inlet'),
    installation: installationOf(project),
    cautionSettings: cautionSettingsOf(project),
    ...(ratingMemoEntries === undefined ? {} : { ratingMemoEntries }),
    ...(partPowerMemoConditions === undefined ? {} : { partPowerMemoConditions }),
  };
}

/** The demo project's mission on `deck`, its propulsion built by buildMissionInput (a model of its own). */
function inputOn(deck: EngineDeck): MissionInput {
  return expectOk(buildMissionInput(project, { deck }), 'demo input');
}

function keyText(c: FlightCondition, rating: RatingName): string {
  return `${Object.is(c.altitude_m, -0) ? '-0' : c.altitude_m}|${Object.is(c.mach, -0) ? '-0' : c.mach}|${Object.is(c.isaDev_K, -0) ? '-0' : c.isaDev_K}|${rating}`;
}

/** A deterministic sequence in [0, 1) (a linear congruential generator; Numerical Recipes' constants, from memory). */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

describe('createRatingMemo', () => {
  it('returns what was stored for the same three numbers and rating, as a Map keyed by them does, and never holds more than its limit', () => {
    const limit = 5;
    const memo = createRatingMemo(limit);
    const reference = new Map<string, InstalledPoint>();
    const next = lcg(7);
    // Few distinct keys (3 altitudes x 2 Machs x 2 ISA x 5 ratings = 60), so keys recur before and after emptying.
    for (let k = 0; k < 2000; k++) {
      const c: FlightCondition = { altitude_m: [0, -0, 3048][Math.floor(next() * 3)]!, mach: [0.3, 0.78][Math.floor(next() * 2)]!, isaDev_K: [0, 15][Math.floor(next() * 2)]! };
      const rating = RATING_NAMES[Math.floor(next() * RATING_NAMES.length)]!;
      const key = keyText(c, rating);
      const found = memo.get(c, rating);
      // A found entry is always the one stored for exactly this key (it may have been evicted: then undefined).
      if (found !== undefined) expect(found).toBe(reference.get(key));
      if (found === undefined) {
        const point = { key } as unknown as InstalledPoint;
        memo.setEntry(c, rating, point);
        reference.set(key, point);
        expect(memo.get(c, rating)).toBe(point);
      }
      expect(memo.size).toBeLessThanOrEqual(limit);
      expect(memo.size).toBeGreaterThanOrEqual(1);
    }
  });

  it('keeps -0 and 0 apart and keys each rating on its own (Object.is, as sameFlightCondition)', () => {
    const memo = createRatingMemo(8);
    const a = { a: 1 } as unknown as InstalledPoint;
    const b = { b: 1 } as unknown as InstalledPoint;
    memo.setEntry({ altitude_m: 0, mach: 0.5, isaDev_K: 0 }, 'maxClimb', a);
    expect(memo.get({ altitude_m: -0, mach: 0.5, isaDev_K: 0 }, 'maxClimb')).toBeUndefined();
    expect(memo.get({ altitude_m: 0, mach: 0.5, isaDev_K: 0 }, 'flightIdle')).toBeUndefined();
    memo.setEntry({ altitude_m: 0, mach: 0.5, isaDev_K: 0 }, 'flightIdle', b);
    expect(memo.get({ altitude_m: 0, mach: 0.5, isaDev_K: 0 }, 'maxClimb')).toBe(a);
    expect(memo.get({ altitude_m: 0, mach: 0.5, isaDev_K: 0 }, 'flightIdle')).toBe(b);
    expect(memo.size).toBe(2);
  });

  it('empties itself when an entry would pass the limit, and refuses a limit that is not a whole number >= 1', () => {
    const memo = createRatingMemo(2);
    const p = {} as InstalledPoint;
    memo.setEntry({ altitude_m: 1, mach: 0.5, isaDev_K: 0 }, 'maxClimb', p);
    memo.setEntry({ altitude_m: 2, mach: 0.5, isaDev_K: 0 }, 'maxClimb', p);
    memo.setEntry({ altitude_m: 2, mach: 0.5, isaDev_K: 0 }, 'maxClimb', p); // the same key again: no new entry
    expect(memo.size).toBe(2);
    memo.setEntry({ altitude_m: 3, mach: 0.5, isaDev_K: 0 }, 'maxClimb', p);
    expect(memo.size).toBe(1);
    expect(memo.get({ altitude_m: 1, mach: 0.5, isaDev_K: 0 }, 'maxClimb')).toBeUndefined();
    expect(memo.get({ altitude_m: 3, mach: 0.5, isaDev_K: 0 }, 'maxClimb')).toBe(p);
    expect(() => createRatingMemo(0)).toThrow(/whole number >= 1/);
    expect(() => createRatingMemo(2.5)).toThrow(/whole number >= 1/);
    expect(RATING_MEMO_ENTRIES).toBeGreaterThan(250); // 15 varied demo missions ask about 250 distinct points
  });
});

describe('the installed model with its rating memo', () => {
  const options = demoOptions;

  it.each([
    ['demo deck', demoDeck],
    ['parametric deck', parametricDeck],
  ])('gives at every rating the point of a model built fresh for the query (%s), with and without evictions', (_name, deck) => {
    const reused = makeInstalledPropulsion(options(deck));
    const tiny = makeInstalledPropulsion(options(deck, 3));
    const next = lcg(11);
    const altitudes = [0, 1524, 3048.5, 7620, 10668, 11000, 12496.8];
    const machs = [0, 0.25, 0.5, 0.62, 0.78];
    for (let k = 0; k < 120; k++) {
      const c: FlightCondition = {
        altitude_m: altitudes[Math.floor(next() * altitudes.length)]!,
        mach: machs[Math.floor(next() * machs.length)]!,
        isaDev_K: [0, -0, 20][Math.floor(next() * 3)]!,
      };
      const rating = RATING_NAMES[Math.floor(next() * RATING_NAMES.length)]!;
      const reference = makeInstalledPropulsion(options(deck)).atRating(c, rating);
      expect(reused.atRating(c, rating)).toStrictEqual(reference);
      expect(tiny.atRating(c, rating)).toStrictEqual(reference);
    }
  });
});

describe('the installed model with its part-power memo', () => {
  it.each([
    ['demo deck', demoDeck],
    ['parametric deck', parametricDeck],
  ])('gives for every thrust the point of a model built fresh for the query (%s), with a memo that evicts all the time', (_name, deck) => {
    const reused = makeInstalledPropulsion(demoOptions(deck));
    const one = makeInstalledPropulsion(demoOptions(deck, undefined, 1));
    const two = makeInstalledPropulsion(demoOptions(deck, undefined, 2));
    const next = lcg(23);
    // Few conditions, so each recurs often, interleaved (the memo switches slot on nearly every query).
    const conditions: FlightCondition[] = [
      { altitude_m: 12496.8, mach: 0.78, isaDev_K: 0 },
      { altitude_m: 7620, mach: 0.7, isaDev_K: 0 },
      { altitude_m: 11277.6, mach: 0.78, isaDev_K: 20 },
      { altitude_m: 536.4, mach: 0.2491, isaDev_K: 0 },
      { altitude_m: 536.4, mach: 0.2491, isaDev_K: -0 },
      { altitude_m: 0, mach: 0, isaDev_K: 0 },
    ];
    const ceilings: RatingName[] = ['maxCruise', 'maxClimb', 'maxContinuous'];
    const limits = new Set<string>();
    for (let k = 0; k < 150; k++) {
      const c = conditions[Math.floor(next() * conditions.length)]!;
      const ceiling = ceilings[Math.floor(next() * ceilings.length)]!;
      const fresh = makeInstalledPropulsion(demoOptions(deck));
      const top = fresh.atRating(c, ceiling).thrust_N;
      // From below idle to above the ceiling, most of it in between.
      const thrust_N = top * (1.05 * next() - 0.02);
      const reference = makeInstalledPropulsion(demoOptions(deck)).forThrust(c, thrust_N, ceiling);
      limits.add(reference.limit);
      expect(reused.forThrust(c, thrust_N, ceiling)).toStrictEqual(reference);
      expect(one.forThrust(c, thrust_N, ceiling)).toStrictEqual(reference);
      expect(two.forThrust(c, thrust_N, ceiling)).toStrictEqual(reference);
      // The fuel flow alone (the RK4 stages' query) is the point's, to the bit, however much the memo forgets.
      for (const m of [reused, one, two, makeInstalledPropulsion(demoOptions(deck))]) expect(m.fuelFlowForThrust!(c, thrust_N, ceiling)).toBe(reference.fuelFlow_kg_s);
      // The root's point is the full lookup's at its power on a model that has evaluated nothing before (so no memo
      // of the spillage step, engineEvaluation.ts, can answer for it): the memos change no figure of it.
      const { limit: _limit, thrustRequired_N: _asked, ...point } = reference;
      expect(point).toStrictEqual(makeInstalledPropulsion(demoOptions(deck)).atPower(c, reference.power));
    }
    // The cases ran through every branch of the solve: the ceiling, idle and a root in between.
    expect([...limits].sort()).toStrictEqual(['above_rating', 'below_idle', 'within']);
  });
});

/** Bit-identical results (every figure, leg row, caution, time-history column). */
function expectSameResult(a: MissionResult, b: MissionResult): void {
  expect(a).toStrictEqual(b);
  expect(a.history.time_s.length).toBeGreaterThan(1);
}

describe('solveMission with a model kept across solves', () => {
  it('gives the result of a model built fresh for each solve, over demo variations, the parametric deck and with evictions', () => {
    const demo = inputOn(demoDeck);
    const variations = (base: MissionInput): MissionInput[] => [
      base,
      { ...base, solve: { kind: 'payloadRange', payload_kg: 0, range_m: 1000 * NM } },
      { ...base, isaDev_K: 20, wind_m_s: -25 },
      { ...base, solve: { kind: 'maxRange', payload_kg: base.solve.payload_kg } },
      { ...base, solve: { kind: 'takeoffWeight', takeoffMass_kg: 14000, payload_kg: base.solve.payload_kg } },
      base, // the first again, now with a warm memo
    ];
    for (const deck of [demoDeck, parametricDeck]) {
      const kept = inputOn(deck);
      // Nothing remembered at all: every rated point from a model built for that one query.
      const unmemoised = {
        ...kept,
        propulsion: {
          ...kept.propulsion,
          atRating: (c: FlightCondition, r: RatingName) => makeInstalledPropulsion(demoOptions(deck)).atRating(c, r),
          forThrust: (c: FlightCondition, t: number, r?: RatingName) => makeInstalledPropulsion(demoOptions(deck)).forThrust(c, t, r),
          fuelFlowForThrust: (c: FlightCondition, t: number, r?: RatingName) => makeInstalledPropulsion(demoOptions(deck)).forThrust(c, t, r).fuelFlow_kg_s,
        },
      };
      expectSameResult(solveMission(kept), solveMission(unmemoised));
      const small = { ...kept, propulsion: makeInstalledPropulsion(demoOptions(deck, 16, 2)) };
      const cases = variations(kept);
      cases.forEach((c, i) => {
        const freshInput = { ...c, propulsion: inputOn(deck).propulsion };
        const fresh = solveMission(freshInput);
        expectSameResult(solveMission(c), fresh);
        expectSameResult(solveMission({ ...c, propulsion: small.propulsion }), fresh);
        if (i === 0) expect(fresh.status).toBe('ok');
      });
    }
    // The demo's converged block fuel (docs/mission.md, Speed, the part-power first guess of 4 December 2026: the
    // roots moved within FOR_THRUST_TOLERANCE, block fuel by -2.5e-12 relative) is what the kept model gives too.
    expect(solveMission(demo).blockFuel_kg).toBe(4434.70020836961);
  }, 120_000);
});
