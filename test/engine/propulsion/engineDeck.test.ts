import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { deckForInterpolation } from '../../../engine/propulsion/deckCorrection';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import { DEFAULT_DECK_POLICY } from '../../../engine/propulsion/engineDeck';
import { buildParametricDeck } from '../../../engine/propulsion/parametricDeck';
import { keyOutline } from '../../support/objectShape';

const demoCsv = readFileSync(fileURLToPath(new URL('../../../fixtures/demo/demo-engine.deck.csv', import.meta.url)), 'utf8');

describe('engineDeckOf', () => {
  it('engineDeckOf gives file, parametric and corrected decks one key order, warnings and interpolation always present', () => {
    const file = expectOk(parseDeckCsv(demoCsv, 'demo-engine.deck.csv'), 'demo deck');
    const parametric = buildParametricDeck(DEMO_ENGINE_SPEC);
    const corrected = deckForInterpolation(parametric, 'corrected');
    const keys = ['title', 'parametric', 'referenceRecovery', 'ratings', 'hasAirflow', 'hasIsaDev', 'hasSensitivities', 'notes', 'policy', 'grid', 'warnings', 'interpolation'];
    for (const deck of [file, parametric, corrected, deckForInterpolation(file, 'corrected')]) expect(Object.keys(deck)).toEqual(keys);
    expect(parametric.warnings).toBeUndefined();
    expect(parametric.interpolation).toBeUndefined();
    expect(corrected.interpolation).toBe('corrected');
    for (const deck of [file, parametric, corrected]) expect(Object.keys(deck.policy)).toEqual(Object.keys(DEFAULT_DECK_POLICY));
    // The grids too (buildDeckGrid and the corrected copy both through deckGridOf).
    expect(keyOutline(corrected.grid)).toEqual(keyOutline(file.grid));
    expect(keyOutline(parametric.grid)).toEqual(keyOutline(file.grid));
  });
});
