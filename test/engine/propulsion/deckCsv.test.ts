import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { CUSTOMARY_DECK_UNITS, deckToCsv, parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { parseDeckJson } from '../../../engine/propulsion/deckJson';
import { deckGridPoints } from '../../../engine/propulsion/deckGrid';
import { buildParametricDeck } from '../../../engine/propulsion/parametricDeck';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import { expectClose } from '../../support/assertInDelta';
import { raggedDeck, RAGGED_CSV } from './deckTestDecks';

const badDir = fileURLToPath(new URL('../../../fixtures/bad-decks/', import.meta.url));
const expected = JSON.parse(readFileSync(`${badDir}expected.json`, 'utf8')) as Record<string, string>;

// Exact conversion factors, NIST SP 811 (2008) Appendix B.8.
const LBF_N = 4.4482216152605;
const LB_KG = 0.45359237;
const FT_M = 0.3048;

const CUSTOMARY = `## a free comment
# title: small customary deck
# parametric: no
# reference recovery: MIL-E-5008B
# rating takeoff: 100
# rating flightIdle: 20
# note: invented numbers
# note: second note
# outside altitude: refuse
altitude[ft], mach[-], power[%], thrust[lbf], fuel_flow[lb/h], airflow[lb/s], isa_dev[degC]
0,0,20,1000,500,50,0
0,0,100,5000,2000,100,0
0,0.5,20,800,450,55,0
0,0.5,100,4000,1800,110,0
10000,0,20,700,400,40,0
10000,0,100,4000,1500,80,0
10000,0.5,20,600,380,45,0
10000,0.5,100,3500,1400,85,0
0,0,20,900,520,48,20
0,0,100,4600,2100,96,20
0,0.5,20,700,470,53,20
0,0.5,100,3700,1900,105,20
10000,0,20,600,420,38,20
10000,0,100,3700,1600,76,20
10000,0.5,20,500,400,43,20
10000,0.5,100,3200,1500,80,20
`;

describe('parseDeckCsv', () => {
  it('parseDeckCsv reads customary units into SI with the exact NIST SP 811 factors', () => {
    const deck = expectOk(parseDeckCsv(CUSTOMARY, 'small.csv'), 'customary');
    const p = deckGridPoints(deck.grid);
    const hot = p.find((q) => q.isaDev_K === 20 && q.altitude_m === 10000 * FT_M && q.mach === 0.5 && q.power === 1)!;
    expectClose(hot.thrust_N, 3200 * LBF_N, { rel: 1e-15 }, 'NIST SP 811 lbf');
    expectClose(hot.fuelFlow_kg_s, (1500 * LB_KG) / 3600, { rel: 1e-15 }, 'NIST SP 811 lb/h');
    expectClose(hot.airflow_kg_s!, 80 * LB_KG, { rel: 1e-15 }, 'NIST SP 811 lb/s');
    // degC in an isa_dev column is a temperature difference: 20 degC -> 20 K (no 273.15 offset)
    expect(hot.isaDev_K).toBe(20);
  });

  it('parseDeckCsv reads the metadata lines', () => {
    const deck = expectOk(parseDeckCsv(CUSTOMARY, 'small.csv'), 'customary');
    expect(deck.title).toBe('small customary deck');
    expect(deck.parametric).toBe(false);
    expect(deck.referenceRecovery).toEqual({ kind: 'milE5008b' });
    // ratings are in the power column's unit: 100 % -> 1, 20 % -> 0.2
    expect(deck.ratings).toEqual({ takeoff: 1, flightIdle: 0.2 });
    expect(deck.notes).toEqual(['invented numbers', 'second note']);
    expect(deck.policy).toEqual({ altitude: 'refuse', mach: 'extrapolate', power: 'clamp', isaDev: 'clamp' });
    expect(deck.hasAirflow).toBe(true);
    expect(deck.hasIsaDev).toBe(true);
  });

  it('parseDeckCsv defaults: title from the file name, reference recovery constant 1, default policies', () => {
    const deck = raggedDeck();
    expect(deck.title).toBe('hand ragged');
    const bare = expectOk(parseDeckCsv(RAGGED_CSV.replace('# title: hand ragged\n', ''), 'bare.csv'), 'bare');
    expect(bare.title).toBe('bare.csv');
    expect(bare.referenceRecovery).toEqual({ kind: 'constant', value: 1 });
    expect(bare.policy).toEqual({ altitude: 'extrapolate', mach: 'extrapolate', power: 'clamp', isaDev: 'clamp' });
  });

  it('parseDeckCsv accepts CRLF line endings and a constant reference recovery', () => {
    const text = `# reference recovery: 0.97\r\n${RAGGED_CSV.replace(/\n/g, '\r\n')}`;
    const deck = expectOk(parseDeckCsv(text, 'crlf.csv'), 'crlf');
    expect(deck.referenceRecovery).toEqual({ kind: 'constant', value: 0.97 });
    expect(deckGridPoints(deck.grid)).toEqual(deckGridPoints(raggedDeck().grid));
  });

  it('parseDeckCsv reads rows in any order (descending altitude, Mach and power) into the same grid', () => {
    const lines = RAGGED_CSV.trimEnd().split('\n');
    const header = lines.findIndex((l) => l.startsWith('altitude'));
    const reversed = [...lines.slice(0, header + 1), ...lines.slice(header + 1).reverse()].join('\n');
    const deck = expectOk(parseDeckCsv(reversed, 'reversed.csv'), 'reversed');
    expect(deckGridPoints(deck.grid)).toEqual(deckGridPoints(raggedDeck().grid));
  });

  it('parseDeckCsv rejects an unknown metadata key with its line', () => {
    const r = parseDeckCsv(`# ratings takeoff: 1\n${RAGGED_CSV}`, 'meta.csv');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error[0]).toMatchObject({ code: 'unknown_metadata', line: 1 });
      expect(r.error[0]!.message).toContain('free comments start with ##');
    }
  });

  describe('metadata errors name their line', () => {
    const cases: readonly (readonly [string, string, string])[] = [
      ['# parametric: maybe', 'bad_metadata', 'parametric must be yes or no'],
      ['# title: again', 'duplicate_metadata', 'the title is given twice'],
      ['# rating cruise: 0.5', 'bad_metadata', 'unknown rating "cruise"'],
      ['# rating maxCruise: fast', 'bad_metadata', '"fast" is not a number'],
      ['# outside altitude: wrap', 'bad_metadata', 'must be refuse, clamp or extrapolate'],
      ['# outside speed: clamp', 'bad_metadata', 'unknown axis'],
      ['# reference recovery: 0', 'bad_metadata', 'reference recovery must be MIL-E-5008B'],
      ['# just a comment', 'bad_metadata', 'free comments start with ##'],
    ];
    for (const [line, code, fragment] of cases) {
      it(`parseDeckCsv rejects "${line}"`, () => {
        const r = parseDeckCsv(`# title: t\n${line}\n${RAGGED_CSV.replace('# title: hand ragged\n', '')}`, 'meta.csv');
        expect(r.ok).toBe(false);
        if (r.ok) return;
        expect(r.error[0]).toMatchObject({ code, line: 2 });
        expect(r.error[0]!.message).toContain(`meta.csv line 2: `);
        expect(r.error[0]!.message).toContain(fragment);
      });
    }

    it('parseDeckCsv rejects a duplicate column and a flight idle above another rating', () => {
      const dup = parseDeckCsv('altitude[ft],mach[-],power[-],thrust[lbf],fuel_flow[lb/h],thrust[N]\n', 'dup.csv');
      expect(dup.ok).toBe(false);
      if (!dup.ok) expect(dup.error[0]).toMatchObject({ code: 'duplicate_column', line: 1, column: 'thrust[N]' });
      const idle = parseDeckCsv(`# rating maxClimb: 0.3\n${RAGGED_CSV.replace('# rating flightIdle: 0.2', '# rating flightIdle: 0.5')}`, 'idle.csv');
      expect(idle.ok).toBe(false);
      if (!idle.ok) expect(idle.error.map((e) => e.message).join('\n')).toContain('idle.csv line 1: rating maxClimb = 0.3 is not above flightIdle = 0.5');
    });

    it('parseDeckCsv needs a header and data rows', () => {
      const noHeader = parseDeckCsv('# title: t\n## nothing else\n', 'nh.csv');
      expect(noHeader.ok).toBe(false);
      if (!noHeader.ok) expect(noHeader.error[0]!.code).toBe('no_header');
      const noData = parseDeckCsv('altitude[ft],mach[-],power[-],thrust[lbf],fuel_flow[lb/h]\n\n', 'nd.csv');
      expect(noData.ok).toBe(false);
      if (!noData.ok) expect(noData.error[0]).toMatchObject({ code: 'no_data', line: 1 });
    });
  });

  describe('bad decks (fixtures/bad-decks/expected.json)', () => {
    for (const [file, fragment] of Object.entries(expected)) {
      it(`parseDeckCsv rejects ${file} naming the line and column`, () => {
        const r = parseDeckCsv(readFileSync(`${badDir}${file}`, 'utf8'), file);
        expect(r.ok).toBe(false);
        if (r.ok) return;
        expect(r.error.map((e) => e.message).join('\n')).toContain(fragment);
        expect(r.error.every((e) => e.line !== null && e.line >= 1)).toBe(true);
      });
    }
  });

  it('parseDeckCsv never throws and every error has a line (property, random input)', () => {
    const token = fc.constantFrom(
      'altitude[ft]', 'mach[-]', 'power[-]', 'thrust[lbf]', 'fuel_flow[lb/h]', 'airflow[lb/s]', 'isa_dev[K]', 'thrust[kg]',
      '0', '1', '0.5', '-3', '1e400', 'NaN', 'Infinity', 'x', '', ' ', '# title: t', '# rating takeoff: 1', '#', '##', '[', ']', ':',
    );
    const line = fc.array(token, { maxLength: 8 }).map((cells) => cells.join(','));
    const text = fc.oneof(fc.string({ maxLength: 200 }), fc.array(line, { maxLength: 12 }).map((ls) => ls.join('\n')));
    fc.assert(
      fc.property(text, (t) => {
        const r = parseDeckCsv(t, 'random.csv');
        if (!r.ok) {
          expect(r.error.length).toBeGreaterThan(0);
          for (const e of r.error) {
            expect(Number.isInteger(e.line)).toBe(true);
            expect(e.line!).toBeGreaterThanOrEqual(1);
            expect(e.message.startsWith('random.csv line ')).toBe(true);
          }
        }
      }),
      { numRuns: 500 },
    );
  });
});

describe('deckToCsv', () => {
  it('deckToCsv in SI round-trips every value exactly', () => {
    const deck = buildParametricDeck(DEMO_ENGINE_SPEC);
    const back = expectOk(parseDeckCsv(deckToCsv(deck), 'si.csv'), 'round trip');
    expect(deckGridPoints(back.grid)).toEqual(deckGridPoints(deck.grid));
    expect(back.ratings).toEqual(deck.ratings);
    expect(back.title).toBe(deck.title);
    expect(back.parametric).toBe(true);
    expect(back.referenceRecovery).toEqual(deck.referenceRecovery);
    expect(back.notes).toEqual(deck.notes);
  });

  it('deckToCsv in customary units round-trips to 1e-12', () => {
    const deck = expectOk(parseDeckCsv(CUSTOMARY, 'small.csv'), 'customary');
    const back = expectOk(parseDeckCsv(deckToCsv(deck, CUSTOMARY_DECK_UNITS), 'back.csv'), 'back');
    const a = deckGridPoints(deck.grid);
    const b = deckGridPoints(back.grid);
    expect(b).toHaveLength(a.length);
    a.forEach((p, i) => {
      expectClose(b[i]!.thrust_N, p.thrust_N, { rel: 1e-12 }, 'lbf round trip');
      expectClose(b[i]!.altitude_m, p.altitude_m, { rel: 1e-12, abs: 1e-12 }, 'ft round trip');
    });
    expect(back.policy).toEqual(deck.policy);
    expect(back.hasIsaDev).toBe(true);
  });
});

describe('docs/deck-format.md examples', () => {
  const doc = readFileSync(fileURLToPath(new URL('../../../docs/deck-format.md', import.meta.url)), 'utf8');
  const block = (start: string): string => {
    const from = doc.indexOf(start) + start.length;
    return doc.slice(doc.indexOf('\n', from) + 1, doc.indexOf('```', from));
  };

  it('parseDeckCsv reads the documented CSV example', () => {
    const deck = expectOk(parseDeckCsv(block('## CSV form\n\n```'), 'doc.csv'), 'doc example');
    expect(deck.ratings.maxCruise).toBe(0.88);
    expect(deck.referenceRecovery).toEqual({ kind: 'milE5008b' });
  });

  it('parseDeckJson reads the documented JSON example', () => {
    const deck = expectOk(parseDeckJson(block('```json'), 'doc.json'), 'doc example');
    expect(deck.hasAirflow).toBe(true);
    expect(deck.notes).toEqual(['invented numbers']);
  });
});

describe('parseDeckCsv with installation-sensitivity columns', () => {
  const HP_W = 550 * FT_M * LBF_N; // mechanical horsepower, 550 ft lbf/s (NIST SP 811 B.8)
  const small = (header: string, cells: (r: number) => string): string =>
    [
      '# title: small sensitivity deck',
      `altitude[ft],mach[-],power[-],thrust[lbf],fuel_flow[lb/h],airflow[lb/s],${header}`,
      ...[0, 1, 2, 3, 4, 5, 6, 7].map((i) => {
        const h = i < 4 ? 0 : 10000;
        const m = i % 4 < 2 ? 0 : 0.5;
        const p = i % 2 === 0 ? 0.5 : 1;
        return `${h},${m},${p},${1000 * (1 + p)},${500 * p},${50 + 10 * p},${cells(i)}`;
      }),
      '',
    ].join('\n');
  const ALL =
    'dthrust_drecovery[lbf],dfuel_flow_drecovery[lb/h],dairflow_drecovery[lb/s],' +
    'dthrust_dbleed[lbf],dfuel_flow_dbleed[lb/h],dairflow_dbleed[lb/s],' +
    'dthrust_dextraction[lbf/hp],dfuel_flow_dextraction[lb/h/hp],dairflow_dextraction[lb/s/hp]';

  it('parseDeckCsv reads the nine sensitivity columns in customary units to SI (NIST SP 811 factors)', () => {
    const deck = expectOk(parseDeckCsv(small(ALL, () => '1500,400,55,-2000,30,-3,-0.8,0.45,0.002'), 'sens.csv'), 'deck');
    expect(deck.hasSensitivities).toBe(true);
    const s = deckGridPoints(deck.grid)[0]!.sensitivities!;
    expectClose(s.dThrust_dRecovery_N, 1500 * LBF_N, { rel: 1e-15 }, 'lbf');
    expectClose(s.dFuelFlow_dRecovery_kg_s, (400 * LB_KG) / 3600, { rel: 1e-15 }, 'lb/h');
    expectClose(s.dAirflow_dRecovery_kg_s!, 55 * LB_KG, { rel: 1e-15 }, 'lb/s');
    expectClose(s.dThrust_dBleed_N, -2000 * LBF_N, { rel: 1e-15 }, 'lbf');
    expectClose(s.dThrust_dExtraction_N_W, (-0.8 * LBF_N) / HP_W, { rel: 1e-15 }, 'lbf/hp');
    expectClose(s.dFuelFlow_dExtraction_kg_s_W, (0.45 * LB_KG) / 3600 / HP_W, { rel: 1e-15 }, 'lb/h/hp');
    expectClose(s.dAirflow_dExtraction_kg_s_W!, (0.002 * LB_KG) / HP_W, { rel: 1e-15 }, 'lb/s/hp');
  });

  it('parseDeckCsv names a missing sensitivity column and a per-watt column without a power unit', () => {
    const missing = parseDeckCsv(small(ALL.split(',').slice(0, 8).join(','), () => '1500,400,55,-2000,30,-3,-0.8,0.45'), 'sens.csv');
    expect(missing.ok).toBe(false);
    if (!missing.ok) {
      expect(missing.error.map((e) => e.code)).toEqual(['missing_column']);
      expect(missing.error[0]!.message).toMatch(/sens\.csv line 2, column "dairflow_dextraction": missing column "dairflow_dextraction"/);
    }
    const wrong = parseDeckCsv(small(ALL.replace('dthrust_dextraction[lbf/hp]', 'dthrust_dextraction[lbf]'), () => '1,1,1,1,1,1,1,1,1'), 'sens.csv');
    expect(wrong.ok).toBe(false);
    if (!wrong.ok) {
      expect(wrong.error[0]!.code).toBe('wrong_unit_dimension');
      expect(wrong.error[0]!.message).toMatch(/column "dthrust_dextraction\[lbf\]": unit "lbf" is not right .* force per power unit/);
    }
    const kgPerHp = parseDeckCsv(small(ALL.replace('dthrust_dextraction[lbf/hp]', 'dthrust_dextraction[kg/hp]'), () => '1,1,1,1,1,1,1,1,1'), 'sens.csv');
    expect(kgPerHp.ok ? '' : kgPerHp.error[0]!.code).toBe('wrong_unit_dimension');
  });

  it('parseDeckCsv refuses airflow sensitivities on a deck without airflow, and checks their values', () => {
    const text = small(ALL, () => '1500,400,55,-2000,30,-3,-0.8,0.45,0.002').replace(',airflow[lb/s]', '').replace(/^(\d+,[\d.]+,[\d.]+,[\d.]+,[\d.]+),[\d.]+,/gm, '$1,');
    const r = parseDeckCsv(text, 'sens.csv');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.map((e) => e.code)).toEqual(['unknown_column', 'unknown_column', 'unknown_column']);
      expect(r.error[0]!.message).toMatch(/column "dairflow_drecovery\[lb\/s\]": .*needs an airflow column/);
    }
    const bad = parseDeckCsv(small(ALL, (i) => (i === 3 ? 'nan,1,1,1,1,1,1,1,1' : '1,1,1,1,1,1,1,1,1e9')), 'sens.csv');
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.error.some((e) => e.code === 'not_finite' && e.line === 6 && e.column === 'dthrust_drecovery[lbf]')).toBe(true);
      expect(bad.error.some((e) => e.code === 'out_of_range' && e.column === 'dairflow_dextraction[lb/s/hp]')).toBe(true);
    }
  });

  it('deckToCsv writes the sensitivity columns and reads back exactly in SI and to 15 digits in customary units', () => {
    const deck = expectOk(parseDeckCsv(small(ALL, (i) => `${1500 + i},400,55,-2000,30,-3,-0.8,0.45,0.002`), 'sens.csv'), 'deck');
    const si = expectOk(parseDeckCsv(deckToCsv(deck), 'si.csv'), 'SI round trip');
    expect(deckGridPoints(si.grid)).toEqual(deckGridPoints(deck.grid));
    const text = deckToCsv(deck, CUSTOMARY_DECK_UNITS);
    expect(text).toMatch(/dthrust_dextraction\[lbf\/hp\],dfuel_flow_dextraction\[lb\/h\/hp\],dairflow_dextraction\[lb\/s\/hp\]/);
    const back = deckGridPoints(expectOk(parseDeckCsv(text, 'c.csv'), 'customary round trip').grid);
    deckGridPoints(deck.grid).forEach((p, i) => {
      for (const [k, v] of Object.entries(p.sensitivities!)) {
        expectClose((back[i]!.sensitivities as unknown as Record<string, number>)[k]!, v as number, { rel: 1e-15 }, `round trip ${k}`);
      }
    });
  });
});

// readRow takes a short way for a number inside its column's plausible range and names every other cell's problem
// as before. Reference: the format's rules (docs/deck-format.md: a decimal number, e.g. 12, -0.5, 1.5e3; no hex,
// no words; thrust within +/-1e7 N) and the NIST SP 811 lbf factor.
describe('parseDeckCsv on one changed thrust cell', () => {
  const lines = CUSTOMARY.split('\n');
  const row = lines.findIndex((l) => l.startsWith('10000,0.5,100,3200'));
  const withThrust = (cell: string): string => {
    const changed = [...lines];
    const cells = changed[row]!.split(',');
    cells[3] = cell;
    changed[row] = cells.join(',');
    return changed.join('\n');
  };
  const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

  it('a decimal within range is read as Number(cell) lbf, anything else is refused naming the thrust column', () => {
    const cell = fc.oneof(
      fc.double({ min: 501, max: 3e6, noNaN: true }).map(String),
      fc.constantFrom('', '0x10', '0b1', 'Infinity', '-inf', 'nan', '1e', '.', '+.6e4', '5000.', ' 7e3 ', '1_000', '1e9', '-1e9', '3e400', '١٢'),
      fc.string({ maxLength: 6 }).filter((t) => !/[,\r\n]/.test(t)), // a comma or a line break would change the row's shape, not the cell
    );
    fc.assert(
      fc.property(cell, (c) => {
        const r = parseDeckCsv(withThrust(c), 'x.csv');
        const trimmed = c.trim();
        const inRange = DECIMAL.test(trimmed) && Math.abs(Number(trimmed) * LBF_N) <= 1e7;
        // (a thrust at or below the 20 % row's 500 lbf is refused by the deck's own rising-thrust check instead)
        fc.pre(!inRange || Number(trimmed) > 500);
        if (inRange) {
          const deck = expectOk(r, c);
          const p = deckGridPoints(deck.grid).find((q) => q.isaDev_K === 20 && q.altitude_m === 10000 * FT_M && q.mach === 0.5 && q.power === 1)!;
          expect(p.thrust_N).toBe(Number(trimmed) * LBF_N);
        } else {
          expect(r.ok).toBe(false);
          if (!r.ok) expect(r.error.some((e) => e.line === row + 1 && e.column === 'thrust[lbf]')).toBe(true);
        }
      }),
      { numRuns: 300 },
    );
  });
});
