/**
 * The demo project's engine deck is the deck of the invented demo cycle:
 * regenerating it (scripts/writeDemoCycleDeck.ts, or `blockwise cycle deck
 * fixtures/cycle/demo-turbofan.cycle.json --out fixtures/demo/demo-engine.deck.csv`)
 * gives the committed fixture. Comment lines must match exactly; numbers
 * within 2e-6 relative (7 significant digits in the file, so a last-digit
 * difference from a different floating-point library is allowed) or 1e-9 absolute.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { demoCycleDeckCsv, DEMO_DECK_PATH } from '../../../scripts/writeDemoCycleDeck';

const root = fileURLToPath(new URL('../../../', import.meta.url));
const committed = readFileSync(`${root}/${DEMO_DECK_PATH}`, 'utf8');

describe('the demo deck from the demo cycle', () => {
  const fresh = expectOk(demoCycleDeckCsv(root), 'demo cycle deck');

  it('regenerating it gives the committed fixtures/demo/demo-engine.deck.csv (comment lines exact, numbers within 2e-6)', () => {
    const a = committed.trimEnd().split('\n');
    const b = fresh.trimEnd().split('\n');
    expect(a.length).toBe(b.length);
    let compared = 0;
    for (let i = 0; i < a.length; i++) {
      const ca = a[i]!.split(',');
      const cb = b[i]!.split(',');
      if (a[i]!.startsWith('#') || ca.some((c) => Number.isNaN(Number(c)))) {
        expect(a[i], `line ${i + 1}`).toBe(b[i]);
        continue;
      }
      expect(ca.length, `line ${i + 1}`).toBe(cb.length);
      for (let j = 0; j < ca.length; j++) {
        const x = Number(ca[j]);
        const y = Number(cb[j]);
        expect(Math.abs(x - y), `line ${i + 1} column ${j + 1}: committed ${x}, regenerated ${y}`).toBeLessThanOrEqual(Math.max(2e-6 * Math.abs(y), 1e-9));
        compared++;
      }
    }
    expect(compared).toBeGreaterThan(1000);
  });

  it('the committed deck is the cycle deck: not parametric, carries the sensitivity columns and the five ratings in lever order', () => {
    const deck = expectOk(parseDeckCsv(committed, 'demo-engine.deck.csv'), 'demo deck');
    expect(deck.parametric).toBe(false);
    expect(deck.title).toMatch(/invented/);
    expect(deck.hasSensitivities).toBe(true);
    expect(deck.hasAirflow).toBe(true);
    const r = deck.ratings;
    expect(Object.keys(r).sort()).toEqual(['flightIdle', 'maxClimb', 'maxContinuous', 'maxCruise', 'takeoff']);
    expect(r.flightIdle! < r.maxCruise! && r.maxCruise! < r.maxClimb! && r.maxClimb! < r.maxContinuous! && r.maxContinuous! < r.takeoff!).toBe(true);
  });
});
