import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { deckGridPoints } from '../../../engine/propulsion/deckGrid';
import { deckToJson, parseDeckJson } from '../../../engine/propulsion/deckJson';
import { buildParametricDeck } from '../../../engine/propulsion/parametricDeck';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import { raggedDeck } from './deckTestDecks';
import { syntheticDeck } from './sensitivityDeck';

const SMALL = {
  format: 'blockwise-deck',
  version: 1,
  title: 'json deck',
  referenceRecovery: { kind: 'constant', value: 0.98 },
  ratings: { takeoff: 1, flightIdle: 0 },
  policy: { mach: 'refuse' },
  columns: ['altitude_m', 'mach', 'power', 'thrust_N', 'fuelFlow_kg_s'],
  points: [
    [0, 0, 0, 100, 0.01],
    [0, 0, 1, 200, 0.02],
    [0, 0.5, 0, 90, 0.01],
    [0, 0.5, 1, 180, 0.02],
    [1000, 0, 0, 80, 0.01],
    [1000, 0, 1, 170, 0.02],
    [1000, 0.5, 0, 70, 0.01],
    [1000, 0.5, 1, 160, 0.02],
  ],
};

function errorsOf(doc: unknown): string {
  const r = parseDeckJson(JSON.stringify(doc), 'deck.json');
  expect(r.ok).toBe(false);
  return r.ok ? '' : r.error.map((e) => e.message).join('\n');
}

describe('parseDeckJson', () => {
  it('parseDeckJson reads the JSON form with defaults for the omitted fields', () => {
    const deck = expectOk(parseDeckJson(JSON.stringify(SMALL), 'deck.json'), 'small');
    expect(deck.title).toBe('json deck');
    expect(deck.parametric).toBe(false);
    expect(deck.referenceRecovery).toEqual({ kind: 'constant', value: 0.98 });
    expect(deck.policy).toEqual({ altitude: 'extrapolate', mach: 'refuse', power: 'clamp', isaDev: 'clamp' });
    expect(deck.hasAirflow).toBe(false);
    expect(deckGridPoints(deck.grid)).toHaveLength(8);
  });

  it('parseDeckJson names the JSON path of a schema error', () => {
    expect(errorsOf({ ...SMALL, points: [[0, 0, 0, 'x', 1]] })).toContain('deck.json, points[0][3]');
    expect(errorsOf({ ...SMALL, referenceRecovery: { kind: 'constant', value: 1.5 } })).toContain('deck.json, referenceRecovery.value');
    expect(errorsOf({ ...SMALL, extra: 1 })).toContain('deck.json');
    expect(errorsOf({ ...SMALL, columns: ['altitude_m', 'mach', 'power', 'thrust_N'] })).toContain('missing column "fuelFlow_kg_s"');
  });

  it('parseDeckJson names the point of a value error and a table error', () => {
    const neg = structuredClone(SMALL);
    neg.points[2]![4] = -1;
    expect(errorsOf(neg)).toContain('deck.json, points[2][4]: -1 is negative');
    const flat = structuredClone(SMALL);
    flat.points[1]![3] = 100;
    expect(errorsOf(flat)).toContain('deck.json, points[1][3]: thrust 100 N at power 1 does not rise');
    const ragged = structuredClone(SMALL);
    ragged.points[3] = [0, 0.5, 1];
    expect(errorsOf(ragged)).toContain('deck.json, points[3]: 3 values where "columns" has 5');
  });

  it('parseDeckJson reports bad JSON and an empty file without throwing', () => {
    const bad = parseDeckJson('{"format": ', 'deck.json');
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.error[0]!.code).toBe('bad_json');
    const empty = parseDeckJson('  ', 'deck.json');
    expect(empty.ok).toBe(false);
    if (!empty.ok) expect(empty.error[0]!.code).toBe('empty_file');
  });
});

describe('parseDeckJson on random input', () => {
  it('parseDeckJson never throws and names a path for every schema error (property)', () => {
    fc.assert(
      fc.property(fc.oneof(fc.json(), fc.string({ maxLength: 100 }), fc.jsonValue().map((v) => JSON.stringify({ ...SMALL, points: v }))), (text) => {
        const r = parseDeckJson(text, 'random.json');
        if (!r.ok) {
          expect(r.error.length).toBeGreaterThan(0);
          for (const e of r.error) expect(e.message.startsWith('random.json')).toBe(true);
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe('deckToJson', () => {
  it('deckToJson round-trips the parametric demo deck exactly', () => {
    const deck = buildParametricDeck(DEMO_ENGINE_SPEC);
    const back = expectOk(parseDeckJson(deckToJson(deck), 'demo.json'), 'round trip');
    expect(deckGridPoints(back.grid)).toEqual(deckGridPoints(deck.grid));
    expect(back.ratings).toEqual(deck.ratings);
    expect(back.notes).toEqual(deck.notes);
    expect(back.policy).toEqual(deck.policy);
    expect(back.parametric).toBe(true);
    expect(back.hasAirflow).toBe(true);
  });

  it('deckToJson round-trips a ragged CSV deck', () => {
    const deck = raggedDeck('# outside power: refuse\n');
    const back = expectOk(parseDeckJson(deckToJson(deck), 'ragged.json'), 'round trip');
    expect(deckGridPoints(back.grid)).toEqual(deckGridPoints(deck.grid));
    expect(back.policy.power).toBe('refuse');
  });
});

describe('deckToJson with installation sensitivities', () => {
  it('deckToJson round-trips a deck with sensitivity columns exactly, and parseDeckJson names a missing one', () => {
    const deck = syntheticDeck(true);
    const text = deckToJson(deck);
    const back = expectOk(parseDeckJson(text, 's.json'), 'round trip');
    expect(back.hasSensitivities).toBe(true);
    expect(deckGridPoints(back.grid)).toEqual(deckGridPoints(deck.grid));
    const doc = JSON.parse(text) as { columns: string[]; points: number[][] };
    const j = doc.columns.indexOf('dFuelFlow_dBleed_kg_s');
    doc.columns.splice(j, 1);
    doc.points = doc.points.map((p) => p.filter((_, k) => k !== j));
    const r = parseDeckJson(JSON.stringify(doc), 's.json');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error[0]!.code).toBe('missing_column');
      expect(r.error[0]!.message).toMatch(/s\.json.*columns.*missing column "dFuelFlow_dBleed_kg_s"/);
    }
  });
});
