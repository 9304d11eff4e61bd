import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { powerForThrust } from '../../../engine/propulsion/deckInversion';
import { lookupDeck, powerBounds } from '../../../engine/propulsion/deckLookup';
import { buildParametricDeck } from '../../../engine/propulsion/parametricDeck';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import { expectClose } from '../../support/assertInDelta';
import { raggedDeck } from './deckTestDecks';

// Hand calculations below use the tabulated numbers of RAGGED_CSV (deckTestDecks.ts).

describe('powerForThrust', () => {
  it('powerForThrust solves a single node exactly on its segment', () => {
    // 0 m, M 0: 4000 N at 0.2, 12000 N at 0.5 -> 8000 N at 0.2 + 0.3 * 4000/8000 = 0.35 (hand calculation)
    const r = expectOk(powerForThrust(raggedDeck(), { altitude_m: 0, mach: 0, isaDev_K: 0 }, 8000), 'single node');
    expect(r.limit).toBe('within');
    expectClose(r.lookup.power, 0.35, { rel: 1e-14 }, 'hand calculation');
    expectClose(r.lookup.thrust_N, 8000, { rel: 1e-14 }, 'round trip');
  });

  it('powerForThrust solves the piecewise-linear interpolant across nodes with different power points', () => {
    // 1500 m, M 0.2: thrust = 0.5 (0.6 T[0,0] + 0.4 T[0,0.5]) + 0.5 T[3000,0.2].
    // p = 0.5 -> 9405 N; p = 0.6 -> 11360 N; 10000 N -> p = 0.5 + 0.1 * 595/1955 (hand calculation)
    const r = expectOk(powerForThrust(raggedDeck(), { altitude_m: 1500, mach: 0.2, isaDev_K: 0 }, 10000), 'ragged');
    expectClose(r.lookup.power, 0.5 + (0.1 * 595) / 1955, { rel: 1e-13 }, 'hand calculation');
    expectClose(r.lookup.thrust_N, 10000, { rel: 1e-13 }, 'round trip');
    expect(r.lookup.outside).toEqual([]);
  });

  it("powerForThrust says 'below_idle' with the point at flight idle", () => {
    const r = expectOk(powerForThrust(raggedDeck(), { altitude_m: 0, mach: 0, isaDev_K: 0 }, 1000), 'below');
    expect(r.limit).toBe('below_idle');
    expect(r.lookup.power).toBe(0.2);
    expect(r.lookup.thrust_N).toBe(4000);
  });

  it("powerForThrust says 'above_rating' with the point at the ceiling power", () => {
    const r = expectOk(powerForThrust(raggedDeck(), { altitude_m: 0, mach: 0, isaDev_K: 0 }, 30000, 0.9), 'above');
    expect(r.limit).toBe('above_rating');
    expect(r.lookup.power).toBe(0.9);
    // 12000 + 0.4/0.5 * 12000 = 21600 N (hand calculation)
    expectClose(r.lookup.thrust_N, 21600, { rel: 1e-14 }, 'hand calculation');
  });

  it('powerForThrust at exactly idle thrust is within, at idle', () => {
    const r = expectOk(powerForThrust(raggedDeck(), { altitude_m: 0, mach: 0, isaDev_K: 0 }, 4000), 'idle');
    expect(r.limit).toBe('within');
    expect(r.lookup.power).toBe(0.2);
  });

  it("powerForThrust returns outside_deck where the condition is refused", () => {
    const r = powerForThrust(raggedDeck('# outside altitude: refuse\n'), { altitude_m: 5000, mach: 0.3, isaDev_K: 0 }, 5000);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.axis).toBe('altitude');
  });

  it('powerForThrust throws for a ceiling below idle or a non-finite thrust (caller bugs)', () => {
    const c = { altitude_m: 0, mach: 0, isaDev_K: 0 };
    expect(() => powerForThrust(raggedDeck(), c, 5000, 0.1)).toThrow(RangeError);
    expect(() => powerForThrust(raggedDeck(), c, Number.NaN)).toThrow(RangeError);
  });

  it('powerForThrust keeps the condition\'s outside axes and cautions at the solution', () => {
    const r = expectOk(powerForThrust(raggedDeck(), { altitude_m: 3500, mach: 0.5, isaDev_K: 0 }, 8000), 'extrapolated');
    expect(r.lookup.outside).toEqual(['altitude']);
    expect(r.lookup.cautions.map((c) => c.id)).toEqual(['deck_extrapolation']);
    expectClose(r.lookup.thrust_N, 8000, { rel: 1e-12 }, 'round trip');
  });

  it('thrust -> power -> thrust round-trips on the ragged deck (property)', () => {
    const deck = raggedDeck();
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 3000, noNaN: true }),
        fc.double({ min: 0.2, max: 0.5, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (altitude_m, mach, f) => {
          const c = { altitude_m, mach, isaDev_K: 0 };
          const b = powerBounds(deck, c);
          const lo = expectOk(lookupDeck(deck, c, b.idle), 'idle').thrust_N;
          const hi = expectOk(lookupDeck(deck, c, b.max), 'max').thrust_N;
          // lo + f (hi - lo) can round one ulp above hi at f = 1 (found by fast-check: 16008.709079145636 against
          // 16008.709079145634 N), which is above the rating, rightly: the thrust asked for stays within [lo, hi].
          const wanted = Math.min(hi, lo + f * (hi - lo));
          const r = expectOk(powerForThrust(deck, c, wanted), 'invert');
          expect(r.limit).toBe('within');
          expectClose(r.lookup.thrust_N, wanted, { rel: 1e-10, abs: 1e-9 }, 'round trip');
          expect(r.lookup.power).toBeGreaterThanOrEqual(b.idle);
          expect(r.lookup.power).toBeLessThanOrEqual(b.max);
        },
      ),
    );
  });

  it('power -> thrust -> power round-trips on the parametric demo deck (property)', () => {
    const deck = buildParametricDeck(DEMO_ENGINE_SPEC);
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 15544.8, noNaN: true }),
        fc.double({ min: 0.4, max: 0.6, noNaN: true }),
        fc.double({ min: 0.06, max: 1, noNaN: true }),
        (altitude_m, mach, power) => {
          const c = { altitude_m, mach, isaDev_K: 0 };
          const t = expectOk(lookupDeck(deck, c, power), 'forward').thrust_N;
          const r = expectOk(powerForThrust(deck, c, t, 1), 'invert');
          expect(r.limit).toBe('within');
          expectClose(r.lookup.power, power, { rel: 1e-9, abs: 1e-12 }, 'round trip');
          expectClose(r.lookup.thrust_N, t, { rel: 1e-10 }, 'round trip');
        },
      ),
    );
  });
});
