import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { lookupDeck, powerBounds, ratingPower } from '../../../engine/propulsion/deckLookup';
import type { EngineDeck } from '../../../engine/propulsion/engineDeck';
import type { FlightCondition } from '../../../engine/propulsion/propulsionModel';
import { expectClose } from '../../support/assertInDelta';
import { loadInterpReference, raggedDeck, referenceDeck } from './deckTestDecks';
import { syntheticAt, syntheticDeck } from './sensitivityDeck';

// Expected values below are hand calculations of linear interpolation /
// extrapolation on the tabulated numbers of RAGGED_CSV (deckTestDecks.ts).

function at(altitude_m: number, mach: number, isaDev_K = 0): FlightCondition {
  return { altitude_m, mach, isaDev_K };
}

function thrust(deck: EngineDeck, c: FlightCondition, power: number): number {
  return expectOk(lookupDeck(deck, c, power), 'lookup').thrust_N;
}

describe('lookupDeck', () => {
  it('lookupDeck inside the table reports no axis and no caution', () => {
    const r = expectOk(lookupDeck(raggedDeck(), at(1500, 0.3), 0.5), 'inside');
    expect(r.outside).toEqual([]);
    expect(r.cautions).toEqual([]);
    expect(r.power).toBe(0.5);
  });

  it('lookupDeck interpolates power, then Mach within each altitude, then altitude (hand calculation)', () => {
    // 0 m: M 0.2 lies 0.4 of the way from M 0 to M 0.5; at power 0.2: 0.6*4000 + 0.4*3000 = 3600 N.
    // 3000 m: M 0.2 is tabulated: 3000 N. Halfway in altitude: 3300 N.
    expectClose(thrust(raggedDeck(), at(1500, 0.2), 0.2), 3300, { rel: 1e-12 }, 'hand calculation');
  });

  describe('altitude policy', () => {
    // Above the table at 4000 m, M 0.2, power 0.2: 0 m gives 3600 N, 3000 m gives 3000 N.
    it("extrapolates linearly by default, with a deck_extrapolation caution", () => {
      const r = expectOk(lookupDeck(raggedDeck(), at(4000, 0.2), 0.2), 'extrapolate');
      // 3600 + (4000/3000) * (3000 - 3600) = 2800 N (hand calculation)
      expectClose(r.thrust_N, 2800, { rel: 1e-12 }, 'hand calculation');
      expect(r.outside).toEqual(['altitude']);
      expect(r.cautions.map((c) => c.id)).toEqual(['deck_extrapolation']);
      expect(r.cautions[0]!.message).toContain('altitude 13,123 ft (4,000 m)');
      expect(r.cautions[0]!.threshold).toBe(3000);
    });

    it("clamps to the highest altitude with 'clamp', with a deck_clamped caution", () => {
      const r = expectOk(lookupDeck(raggedDeck('# outside altitude: clamp\n'), at(4000, 0.2), 0.2), 'clamp');
      expect(r.thrust_N).toBe(3000);
      expect(r.outside).toEqual(['altitude']);
      expect(r.cautions.map((c) => c.id)).toEqual(['deck_clamped']);
    });

    it("refuses with outside_deck under 'refuse'", () => {
      const r = lookupDeck(raggedDeck('# outside altitude: refuse\n'), at(-100, 0.2), 0.2);
      expect(r.ok).toBe(false);
      if (r.ok) return;
      expect(r.error).toMatchObject({ code: 'outside_deck', axis: 'altitude', value: -100, min: 0, max: 3000 });
      expect(r.error.message).toContain("'refuse'");
    });
  });

  describe('Mach policy', () => {
    // At 3000 m, power 1: M 0.6 -> 15000 N, M 0.8 -> 14500 N, M 0.2 -> 17000 N.
    it('extrapolates above the altitude\'s Mach range by default', () => {
      const r = expectOk(lookupDeck(raggedDeck(), at(3000, 0.9), 1), 'above');
      // 15000 + 1.5 * (14500 - 15000) = 14250 N (hand calculation)
      expectClose(r.thrust_N, 14250, { rel: 1e-12 }, 'hand calculation');
      expect(r.outside).toEqual(['mach']);
      expect(r.cautions[0]!.message).toContain('Mach 0.900 is above the table (0.200 to 0.800 at the tabulated altitude 9,843 ft (3,000 m)');
    });

    it('extrapolates below the altitude\'s Mach range by default', () => {
      // 17000 - 0.25 * (15000 - 17000) = 17500 N (hand calculation)
      expectClose(thrust(raggedDeck(), at(3000, 0.1), 1), 17500, { rel: 1e-12 }, 'hand calculation');
    });

    it("clamps with 'clamp'", () => {
      const r = expectOk(lookupDeck(raggedDeck('# outside mach: clamp\n'), at(3000, 0.9), 1), 'clamp');
      expect(r.thrust_N).toBe(14500);
      expect(r.cautions[0]!.id).toBe('deck_clamped');
    });

    it("refuses with 'refuse' and names the altitude's own Mach range", () => {
      const r = lookupDeck(raggedDeck('# outside mach: refuse\n'), at(3000, 0.9), 1);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error).toMatchObject({ code: 'outside_deck', axis: 'mach', value: 0.9, min: 0.2, max: 0.8 });
    });
  });

  describe('power policy', () => {
    // At 0 m, M 0: power 0.5 -> 12000 N, power 1 -> 24000 N.
    it('clamps by default, with a deck_clamped caution', () => {
      const r = expectOk(lookupDeck(raggedDeck(), at(0, 0), 1.2), 'clamp');
      expect(r.thrust_N).toBe(24000);
      expect(r.outside).toEqual(['power']);
      expect(r.cautions.map((c) => c.id)).toEqual(['deck_clamped']);
      expect(r.power).toBe(1.2);
      expect(r.cautions[0]!.message).toContain('power 1.2 is above the table (0.2 to 1 at the tabulated node 0 ft (0 m), Mach 0.000)');
      expect(thrust(raggedDeck(), at(0, 0), 0.1)).toBe(4000);
    });

    it("extrapolates with 'extrapolate'", () => {
      // 24000 + 0.2 * (24000 - 12000) / 0.5 = 28800 N (hand calculation)
      expectClose(thrust(raggedDeck('# outside power: extrapolate\n'), at(0, 0), 1.2), 28800, { rel: 1e-12 }, 'hand calculation');
    });

    it("refuses with 'refuse'", () => {
      const r = lookupDeck(raggedDeck('# outside power: refuse\n'), at(0, 0), 1.2);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error).toMatchObject({ code: 'outside_deck', axis: 'power', value: 1.2, min: 0.2, max: 1 });
    });
  });

  describe('ISA deviation', () => {
    const ref = loadInterpReference();
    const row = (isa: number) => ref.regular4.rows.find((r) => r[0] === isa && r[1] === 3048 && r[2] === 0.4 && r[3] === 0.7)!;

    it('interpolates a deck with an isa_dev axis and clamps beyond it by default', () => {
      const deck = referenceDeck(ref.regular4, true);
      const r = expectOk(lookupDeck(deck, at(3048, 0.4, 50), 0.7), 'hot');
      expect(r.thrust_N).toBe(row(35)[4]);
      expect(r.outside).toEqual(['isaDev']);
      expect(r.cautions.map((c) => c.id)).toEqual(['deck_clamped']);
    });

    it("extrapolates the isa_dev axis with 'extrapolate' (linear from the last two levels)", () => {
      const deck = referenceDeck(ref.regular4, true, '# outside isa_dev: extrapolate\n');
      const r = expectOk(lookupDeck(deck, at(3048, 0.4, 50), 0.7), 'hot');
      const expected = row(35)[4]! + ((row(35)[4]! - row(15)[4]!) * 15) / 20;
      expectClose(r.thrust_N, expected, { rel: 1e-12 }, 'hand calculation: linear in ISA deviation');
    });

    it("refuses the isa_dev axis with 'refuse'", () => {
      const deck = referenceDeck(ref.regular4, true, '# outside isa_dev: refuse\n');
      const r = lookupDeck(deck, at(3048, 0.4, -30), 0.7);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error).toMatchObject({ axis: 'isaDev', min: -20, max: 35 });
    });

    it('applies the corrected-parameter approximation on a deck without isa_dev, with its caution', () => {
      const deck = raggedDeck();
      const isa = expectOk(lookupDeck(deck, at(0, 0), 0.5), 'ISA');
      const hot = expectOk(lookupDeck(deck, at(0, 0, 15), 0.5), 'ISA+15');
      // F/delta held: thrust unchanged; Wf/(delta sqrt(theta)) held: x sqrt(303.15/288.15);
      // W sqrt(theta)/delta held: / sqrt(303.15/288.15) (Walsh & Fletcher corrected parameters; ISA 288.15 K at 0 m)
      const f = Math.sqrt(303.15 / 288.15);
      expect(hot.thrust_N).toBe(isa.thrust_N);
      expectClose(hot.fuelFlow_kg_s, 0.2 * f, { rel: 1e-12 }, 'corrected fuel flow');
      expectClose(hot.airflow_kg_s!, 60 / f, { rel: 1e-12 }, 'corrected airflow');
      expect(hot.outside).toEqual([]);
      expect(hot.cautions.map((c) => c.id)).toEqual(['deck_temperature_approximation']);
    });
  });

  it('lookupDeck throws on a non-finite input (a caller bug)', () => {
    expect(() => lookupDeck(raggedDeck(), at(Number.NaN, 0.2), 0.5)).toThrow(RangeError);
    expect(() => lookupDeck(raggedDeck(), at(0, 0.2), Number.POSITIVE_INFINITY)).toThrow(/non-finite/);
  });

  it('lookupDeck returns null airflow for a deck without an airflow column', () => {
    const deck = expectOk(
      parseDeckCsv(
        'altitude[m],mach[-],power[-],thrust[N],fuel_flow[kg/s]\n0,0,0,1,1\n0,0,1,2,2\n0,1,0,1,1\n0,1,1,2,2\n1,0,0,1,1\n1,0,1,2,2\n1,1,0,1,1\n1,1,1,2,2\n',
        'x.csv',
      ),
      'no airflow',
    );
    expect(expectOk(lookupDeck(deck, at(0.5, 0.5), 0.5), 'lookup').airflow_kg_s).toBeNull();
  });
});

describe('ratingPower', () => {
  it('ratingPower returns the rating on the power axis', () => {
    expect(expectOk(ratingPower(raggedDeck(), 'maxCruise'), 'rating')).toBe(0.9);
  });

  it('ratingPower says unknown_rating and lists the deck\'s ratings', () => {
    const r = ratingPower(raggedDeck(), 'maxClimb');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('unknown_rating');
      expect(r.error.message).toContain('flightIdle');
    }
  });
});

describe('powerBounds', () => {
  it('powerBounds gives flightIdle and the highest common power', () => {
    expect(powerBounds(raggedDeck(), at(1500, 0.3))).toEqual({ idle: 0.2, max: 1 });
  });

  it('powerBounds without a flightIdle rating gives the lowest common tabulated power', () => {
    const deck = referenceDeck(loadInterpReference().regular, false);
    expect(powerBounds(deck, at(5000, 0.5))).toEqual({ idle: 0.05, max: 1 });
  });

  it("powerBounds answers even where the policy is 'refuse'", () => {
    expect(powerBounds(raggedDeck('# outside altitude: refuse\n'), at(9000, 0.3))).toEqual({ idle: 0.2, max: 1 });
  });
});

describe('deckLookup floors', () => {
  // Thrust falls 4,000 N per 0.1 Mach, fuel flow 0.05 kg/s and airflow 10 kg/s per 0.1 Mach: linear extrapolation
  // to Mach 1.2 gives 10,000 - 48,000 = -38,000 N, 0.5 - 0.6 = -0.1 kg/s and 100 - 120 = -20 kg/s (hand calculation).
  const CSV = [
    'altitude[m],mach[-],power[-],thrust[N],fuel_flow[kg/s],airflow[kg/s]',
    '0,0,0.5,5000,0.25,50',
    '0,0,1,10000,0.5,100',
    '0,0.1,0.5,3000,0.225,45',
    '0,0.1,1,6000,0.45,90',
    '1000,0,0.5,5000,0.25,50',
    '1000,0,1,10000,0.5,100',
    '1000,0.1,0.5,3000,0.225,45',
    '1000,0.1,1,6000,0.45,90',
  ].join('\n');
  const deck = expectOk(parseDeckCsv(CSV, 'falling.csv'), 'falling deck');

  it('lookupDeck floors extrapolated thrust, fuel flow and airflow at zero with a warning naming each', () => {
    const v = expectOk(lookupDeck(deck, at(500, 1.2), 1), 'lookup');
    expect(v.thrust_N).toBe(0);
    expect(v.fuelFlow_kg_s).toBe(0);
    expect(v.airflow_kg_s).toBe(0);
    const floored = v.cautions.find((c) => c.id === 'deck_output_floored');
    expect(floored?.severity).toBe('warning');
    expect(floored?.message).toContain('thrust -8,543 lbf (-38.00 kN)');
    expect(floored?.message).toContain('fuel flow -794 lb/h (-360 kg/h)');
    expect(floored?.message).toContain('airflow -44.1 lb/s (-20.00 kg/s)');
  });

  it('lookupDeck keeps a positive extrapolation as it is, with no floor warning', () => {
    const v = expectOk(lookupDeck(deck, at(500, 0.2), 1), 'lookup');
    expectClose(v.thrust_N, 2000, { abs: 1e-9 }, '10,000 - 2 x 4,000 N (hand calculation)');
    expect(v.cautions.map((c) => c.id)).not.toContain('deck_output_floored');
  });
});

describe('lookupDeck with installation sensitivities', () => {
  it('lookupDeck interpolates the sensitivity columns like the rest: exact on an affine deck (closed form)', () => {
    const deck = syntheticDeck(true);
    for (const [h, m, p] of [
      [4321, 0.63, 0.77],
      [0, 0, 0.2],
      [11000, 0.85, 1],
      [8000, 0.1, 0.45],
    ] as const) {
      const got = expectOk(lookupDeck(deck, { altitude_m: h, mach: m, isaDev_K: 0 }, p), 'lookup');
      const want = syntheticAt(h, m, p);
      for (const [k, v] of Object.entries(want.sensitivities)) {
        expectClose((got.sensitivities as unknown as Record<string, number>)[k]!, v as number, { rel: 1e-12, abs: 1e-18 }, `affine ${k}`);
      }
      expectClose(got.thrust_N, want.thrust_N, { rel: 1e-13 }, 'affine thrust');
    }
    const none = expectOk(lookupDeck(syntheticDeck(false), { altitude_m: 100, mach: 0.3, isaDev_K: 0 }, 0.5), 'no airflow');
    expect(none.sensitivities!.dAirflow_dRecovery_kg_s).toBeNull();
  });
});
