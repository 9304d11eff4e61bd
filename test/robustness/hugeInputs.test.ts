/**
 * Huge and hostile inputs, generated at run time rather than committed:
 * a 110,000-row deck, a deck of 200,000 garbage rows, JSON nested 100,000
 * deep (project, quantity field, embedded deck, deck JSON) and a project
 * with a multi-megabyte text field. Each is either read correctly or refused
 * with a message naming the place; none throws or overflows the stack.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { runCli } from '../../cli/main';
import { buildMissionInput } from '../../engine/project/buildMissionInput';
import { parseProject } from '../../engine/project/parseProject';
import { parseDeckCsv } from '../../engine/propulsion/deckCsv';
import { parseDeckJson } from '../../engine/propulsion/deckJson';
import { lookupDeck } from '../../engine/propulsion/deckLookup';
import { expectClose } from '../support/assertInDelta';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const demoText = readFileSync(`${repoRoot}fixtures/demo/demo.blockwise.json`, 'utf8');
const scratch = mkdtempSync(join(tmpdir(), 'blockwise-huge-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

// NIST SP 811 (2008): 1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N (exact definitions).
const FT = 0.3048;
const LBF = 4.4482216152605;
const DEPTH = 100_000;
const nestedArrays = '['.repeat(DEPTH) + ']'.repeat(DEPTH);

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const code = await runCli(argv, { out: (t) => (out += t), err: (t) => (err += t), cwd: scratch });
  return { code, out, err };
}

/** Invented thrust (lbf) of the generated deck: linear in power, falling with altitude and Mach. */
function hugeThrust(altitude_ft: number, mach: number, power: number): number {
  return 6000 * power * (1 - altitude_ft / 80000) * (1 - 0.3 * mach);
}

function hugeDeck(): string {
  const rows = ['# title: generated huge deck (invented)', 'altitude[ft],mach[-],power[-],thrust[lbf],fuel_flow[lb/h],airflow[lb/s]'];
  for (let a = 0; a <= 50000; a += 5000) {
    for (let m = 0; m < 10; m++) {
      for (let p = 1; p <= 1000; p++) {
        const power = p / 1000;
        rows.push(`${a},${m / 10},${power},${hugeThrust(a, m / 10, power)},${300 + 2500 * power},${90 + 100 * power}`);
      }
    }
  }
  return rows.join('\n');
}

describe('huge decks', () => {
  const text = hugeDeck();

  it('parseDeckCsv reads a 110,000-row deck and interpolates it exactly where the data is linear', () => {
    expect(text.length).toBeGreaterThan(4e6);
    const r = parseDeckCsv(text, 'huge.csv');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // Thrust is linear in power and Mach at fixed altitude, so multilinear interpolation reproduces the generating formula.
    const l = lookupDeck(r.value, { altitude_m: 20000 * FT, mach: 0.45, isaDev_K: 0 }, 0.4567);
    expect(l.ok).toBe(true);
    if (l.ok) expectClose(l.value.thrust_N, hugeThrust(20000, 0.45, 0.4567) * LBF, { rel: 1e-9 }, 'generating formula of this test');
  });

  it('blockwise deck check accepts the 110,000-row deck file', async () => {
    writeFileSync(join(scratch, 'huge.csv'), text);
    const r = await run('deck', 'check', 'huge.csv', '--json');
    expect(r.code).toBe(0);
    expect(JSON.parse(r.out).points).toBe(110000);
  });

  it('parseDeckCsv stops at 100 errors on 200,000 garbage rows, each naming its line, and says where it stopped', () => {
    const lines = ['altitude[ft],mach[-],power[-],thrust[lbf],fuel_flow[lb/h],airflow[lb/s]'];
    for (let i = 0; i < 200_000; i++) lines.push('x,y,z,w,v,u');
    const r = parseDeckCsv(lines.join('\n'), 'garbage.csv');
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.length).toBe(101);
    for (const e of r.error) {
      expect(e.line).toBeGreaterThanOrEqual(2);
      expect(e.message).toMatch(/^garbage\.csv line \d+/);
    }
    // The last entry says the check stopped and which lines it did not read.
    const last = r.error.at(-1)!;
    expect(last.code).toBe('too_many_errors');
    expect(last.message).toContain(`to ${lines.length} were not checked`);
  });

  it('parseDeckJson refuses JSON nested 100,000 deep with a located message', () => {
    const closed = parseDeckJson(nestedArrays, 'deep.json');
    expect(closed.ok).toBe(false);
    if (!closed.ok) expect(closed.error[0]!.message).toContain('deep.json');
    const open = parseDeckJson('['.repeat(DEPTH), 'open.json');
    expect(open.ok).toBe(false);
    if (!open.ok) expect(open.error[0]!.message).toMatch(/^open\.json: not valid JSON: line 1, column \d+/);
  });
});

describe('hostile project files', () => {
  it('parseProject refuses a file of arrays nested 100,000 deep without overflowing the stack', () => {
    const r = parseProject(nestedArrays, 'deep.blockwise.json');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error[0]!.path).toBe('(file)');
      expect(r.error[0]!.message).toContain('expected a JSON object');
    }
  });

  it('parseProject names the field when a quantity holds an object nested 50,000 deep', () => {
    const deepObject = '{"a":'.repeat(50_000) + '1' + '}'.repeat(50_000);
    const r = parseProject(demoText.replace('"wind": "0 kt"', `"wind": ${deepObject}`), 'deep-wind.blockwise.json');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      const issue = r.error.find((i) => i.path === 'mission.wind');
      expect(issue?.message).toContain('is not a number or a quantity string');
    }
  });

  it('buildMissionInput refuses an embedded deck nested 100,000 deep at engine.deck.deck', () => {
    const text = demoText.replace('{ "kind": "file", "path": "demo-engine.deck.csv" }', `{ "kind": "embedded", "deck": { "points": ${nestedArrays} } }`);
    const parsed = parseProject(text, 'deep-deck.blockwise.json');
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const built = buildMissionInput(parsed.value, {});
    expect(built.ok).toBe(false);
    if (!built.ok) expect(built.error[0]!.path).toBe('engine.deck.deck');
  });

  it('blockwise fly exits 1 on a deeply nested file and names it', async () => {
    writeFileSync(join(scratch, 'deep.blockwise.json'), nestedArrays);
    const r = await run('fly', 'deep.blockwise.json');
    expect(r.code).toBe(1);
    expect(r.out).toBe('');
    expect(r.err).toContain('deep.blockwise.json');
    expect(r.err).toContain('expected a JSON object');
  });

  it('parseProject keeps a 5-million-character notes field and refuses it in a number field with a short message', () => {
    const doc = JSON.parse(demoText) as { notes: string; airframe: { mmo: unknown } };
    doc.notes = 'n'.repeat(5e6);
    const ok = parseProject(JSON.stringify(doc), 'long-notes.blockwise.json');
    expect(ok.ok).toBe(true);
    if (ok.ok) expect(ok.value.notes?.length).toBe(5e6);
    doc.airframe.mmo = doc.notes;
    const bad = parseProject(JSON.stringify(doc), 'long-mmo.blockwise.json');
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      const issue = bad.error.find((i) => i.path === 'airframe.mmo');
      expect(issue).toBeDefined();
      expect(issue!.message.length).toBeLessThan(400);
    }
  });
});
