import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { SAFETY_NOTICE, SAFETY_NOTICE_LINES } from '../../engine/core/notice';
import { expectOk } from '../../engine/core/result';
import { parseDeckCsv } from '../../engine/propulsion/deckCsv';
import { deckToJson } from '../../engine/propulsion/deckJson';
import { lookupDeck } from '../../engine/propulsion/deckLookup';
import { expectClose } from '../support/assertInDelta';
import { repoRoot, run } from './support/cliRun';
import { RAGGED_CSV } from '../engine/propulsion/deckTestDecks';

const DEMO = 'fixtures/demo/demo-engine.deck.csv';
// The first round's parametric demo deck (Mattingly lapse, MIL-E-5008B reference, no sensitivity columns).
const PARAMETRIC = 'fixtures/parametric/demo-parametric.deck.csv';
const expected = JSON.parse(readFileSync(`${repoRoot}fixtures/bad-decks/expected.json`, 'utf8')) as Record<string, string>;
// NIST SP 811 (2008) B.8: 1 ft = 0.3048 m exactly.
const FT = 0.3048;


describe('blockwise deck check', () => {
  it('deck check on the parametric deck exits 0 with a summary and the safety notice', async () => {
    const r = await run('deck', 'check', PARAMETRIC);
    expect(r.code).toBe(0);
    expect(r.err).toBe('');
    expect(r.out).toContain('parametric');
    expect(r.out).toContain('MIL-E-5008B');
    expect(r.out).toContain('0 to 51000 ft');
    expect(r.out).toContain('maxCruise 0.88');
    for (const line of SAFETY_NOTICE_LINES) expect(r.out).toContain(line);
  });

  it('deck check --json gives the axes ranges, points and ratings', async () => {
    const r = await run('deck', 'check', PARAMETRIC, '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.ok).toBe(true);
    expect(j.parametric).toBe(true);
    expect(j.points).toBe(1120);
    expect(j.mach).toEqual({ min: 0, max: 0.9 });
    expectClose(j.altitude_m.max, 51000 * FT, { rel: 1e-12 }, 'NIST SP 811 foot');
    expect(j.ratings.takeoff).toBe(1);
    expect(j.notice).toBe(SAFETY_NOTICE);
  });

  for (const [file, fragment] of Object.entries(expected)) {
    it(`deck check exits 1 on ${file} and prints the line and column`, async () => {
      const r = await run('deck', 'check', `fixtures/bad-decks/${file}`);
      expect(r.code).toBe(1);
      expect(r.out).toBe('');
      // messages name the file as given on the command line
      expect(r.err).toContain(fragment.replace(file, `fixtures/bad-decks/${file}`));
    });
  }

  it('deck check --json on a bad deck lists the errors with line and column', async () => {
    const r = await run('deck', 'check', 'fixtures/bad-decks/non-numeric-cell.csv', '--json');
    expect(r.code).toBe(1);
    const j = JSON.parse(r.out);
    expect(j.ok).toBe(false);
    expect(j.errors[0]).toMatchObject({ code: 'not_a_number', line: 6, column: 'thrust[lbf]', value: '12x0' });
  });

  it('deck check reads the JSON form by its extension', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'blockwise-deck-'));
    try {
      const file = join(dir, 'ragged.json');
      writeFileSync(file, deckToJson(expectOk(parseDeckCsv(RAGGED_CSV, 'ragged.csv'), 'ragged')));
      const r = await run('deck', 'check', file, '--json');
      expect(r.code).toBe(0);
      const j = JSON.parse(r.out);
      expect(j.title).toBe('hand ragged');
      expect(j.points).toBe(15);
      expect(j.mach).toEqual({ min: 0, max: 0.8 });
      writeFileSync(file, '{"format": "blockwise-deck"');
      const bad = await run('deck', 'check', file);
      expect(bad.code).toBe(1);
      expect(bad.err).toContain('not valid JSON');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('deck check on a missing file exits 1 and names it', async () => {
    const r = await run('deck', 'check', 'fixtures/nowhere.csv');
    expect(r.code).toBe(1);
    expect(r.err).toContain('cannot read "fixtures/nowhere.csv"');
  });

  it('deck check without a file is a usage error (exit 2)', async () => {
    const r = await run('deck', 'check');
    expect(r.code).toBe(2);
    expect(r.err).toContain('deck file');
  });
});

describe('blockwise deck at', () => {
  const deck = expectOk(parseDeckCsv(readFileSync(`${repoRoot}${DEMO}`, 'utf8'), DEMO), 'demo');

  it('deck at --json agrees with the engine lookup at 35000 ft, M 0.8, maxCruise', async () => {
    const r = await run('deck', 'at', DEMO, '--altitude', '35000 ft', '--mach', '0.8', '--power', 'maxCruise', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    // The power of the rating is the deck's own ("# rating maxCruise:" line), read from the parsed file.
    const cruise = deck.ratings.maxCruise!;
    const e = expectOk(lookupDeck(deck, { altitude_m: 35000 * FT, mach: 0.8, isaDev_K: 0 }, cruise), 'engine');
    expect(j.power).toBe(cruise);
    expect(j.rating).toBe('maxCruise');
    expectClose(j.thrust_N, e.thrust_N, { rel: 1e-15 }, 'engine lookup');
    expectClose(j.fuelFlow_kg_s, e.fuelFlow_kg_s, { rel: 1e-15 }, 'engine lookup');
    expectClose(j.airflow_kg_s, e.airflow_kg_s!, { rel: 1e-15 }, 'engine lookup');
    expect(j.outsideTable).toEqual([]);
    expect(j.cautions).toEqual([]);
    expect(j.notice).toBe(SAFETY_NOTICE);
  });

  it('deck at --json reports the axes left and the cautions', async () => {
    const r = await run('deck', 'at', DEMO, '--altitude', '55000 ft', '--mach', '0.8', '--power', '1.1', '--isa-dev', '10 K', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.outsideTable).toEqual(['altitude', 'power']);
    expect(j.cautions.map((c: { id: string }) => c.id)).toEqual(['deck_extrapolation', 'deck_clamped', 'deck_temperature_approximation']);
    expect(j.isaDev_K).toBe(10);
  });

  it('deck at prints a text report with the safety notice', async () => {
    const r = await run('deck', 'at', DEMO, '--altitude', '10000 ft', '--mach', '0.5', '--power', '0.5');
    expect(r.code).toBe(0);
    expect(r.out).toContain('per engine, uninstalled');
    expect(r.out).toContain('thrust');
    expect(r.out).toContain('lbf');
    for (const line of SAFETY_NOTICE_LINES) expect(r.out).toContain(line);
  });

  it('deck at rejects a bad --power, --mach and --altitude with exit 2', async () => {
    expect((await run('deck', 'at', DEMO, '--altitude', '1 km', '--mach', '0.5', '--power', 'cruise')).code).toBe(2);
    expect((await run('deck', 'at', DEMO, '--altitude', '1 km', '--mach', '-0.5', '--power', '0.5')).code).toBe(2);
    const bad = await run('deck', 'at', DEMO, '--altitude', '10 kg', '--mach', '0.5', '--power', '0.5');
    expect(bad.code).toBe(2);
    expect(bad.err).toContain('--altitude');
  });

  it('deck at exits 1 and says why when the deck file is invalid', async () => {
    const r = await run('deck', 'at', 'fixtures/bad-decks/bad-rating.csv', '--altitude', '0 ft', '--mach', '0', '--power', '1');
    expect(r.code).toBe(1);
    expect(r.err).toContain('bad-rating.csv line 2');
    expect(r.err).toContain('deck not loaded');
  });

  it("deck at exits 1 with the refusal when the deck's policy is 'refuse'", async () => {
    const dir = mkdtempSync(join(tmpdir(), 'blockwise-deck-'));
    try {
      const file = join(dir, 'refusing.csv');
      writeFileSync(file, `# outside mach: refuse\n${RAGGED_CSV}`);
      const r = await run('deck', 'at', file, '--altitude', '3000 m', '--mach', '0.9', '--power', '1', '--json');
      expect(r.code).toBe(1);
      const j = JSON.parse(r.out);
      expect(j.error).toMatchObject({ code: 'outside_deck', axis: 'mach', value: 0.9, min: 0.2, max: 0.8 });
      const t = await run('deck', 'at', file, '--altitude', '3000 m', '--mach', '0.9', '--power', '1');
      expect(t.code).toBe(1);
      expect(t.err).toContain("Mach 0.900 is outside the table");
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('deck at with a rating the deck lacks exits 1 and lists its ratings', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'blockwise-deck-'));
    try {
      const file = join(dir, 'ragged.csv');
      writeFileSync(file, RAGGED_CSV);
      const r = await run('deck', 'at', file, '--altitude', '0 m', '--mach', '0', '--power', 'maxClimb');
      expect(r.code).toBe(1);
      expect(r.err).toContain('no rating "maxClimb"');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
