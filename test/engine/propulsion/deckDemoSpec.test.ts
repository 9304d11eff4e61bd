import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { lookupDeck } from '../../../engine/propulsion/deckLookup';
import { demoDeckCsv } from '../../../scripts/writeDemoDeck';
import { expectClose } from '../../support/assertInDelta';

const file = fileURLToPath(new URL('../../../fixtures/parametric/demo-parametric.deck.csv', import.meta.url));

describe('the parametric demo engine deck', () => {
  it('the committed fixtures/parametric/demo-parametric.deck.csv (the first round demo deck) equals what scripts/writeDemoDeck.ts writes now', () => {
    expect(readFileSync(file, 'utf8')).toBe(demoDeckCsv());
  });

  it('the parametric deck parses, is labelled parametric and has the five ratings', () => {
    const deck = expectOk(parseDeckCsv(readFileSync(file, 'utf8'), 'demo-parametric.deck.csv'), 'demo');
    expect(deck.parametric).toBe(true);
    expect(deck.title).toMatch(/parametric/);
    expect(deck.title).toMatch(/invented/);
    expect(Object.keys(deck.ratings).sort()).toEqual(['flightIdle', 'maxClimb', 'maxContinuous', 'maxCruise', 'takeoff']);
    expect(deck.referenceRecovery).toEqual({ kind: 'milE5008b' });
    // about 36 kN sea-level static thrust per engine at takeoff (the invented spec; 7 significant digits in the file)
    const slsto = expectOk(lookupDeck(deck, { altitude_m: 0, mach: 0, isaDev_K: 0 }, 1), 'SLS');
    expectClose(slsto.thrust_N, 36000, { rel: 1e-6 }, 'demo spec');
    // altitudes 0..51000 ft
    expect(deck.grid.altitudes_m[0]).toBe(0);
    expectClose(deck.grid.altitudes_m.at(-1)!, 51000 * 0.3048, { rel: 1e-12 }, 'demo grid');
  });
});
