import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { SAFETY_NOTICE_LINES } from '../../engine/core/notice';
import { expectOk } from '../../engine/core/result';
import { cycleDeck } from '../../engine/cycle/cycleDeck';
import { parseCycleFile } from '../../engine/cycle/cycleFile';
import { designEngine } from '../../engine/cycle/index';
import { parseDeckCsv } from '../../engine/propulsion/deckCsv';
import { deckGridPoints } from '../../engine/propulsion/deckGrid';
import { parseDeckJson } from '../../engine/propulsion/deckJson';
import { expectClose } from '../support/assertInDelta';
import { DEMO_PROJECT, repoRoot, run, type Json } from './support/cliRun';

const CYCLE = 'fixtures/cycle/demo-turbofan.cycle.json';
const FT = 0.3048; // NIST SP 811: the international foot
const dir = mkdtempSync(join(tmpdir(), 'blockwise-cycle-deck-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const SMALL = ['--altitudes', '0, 35000 ft', '--machs', '0, 0.5, 0.8'];

describe('blockwise cycle deck', () => {
  it('cycle deck writes a valid CSV deck with sensitivity columns equal to the engine call, and the notice', async () => {
    const out = join(dir, 'demo.deck.csv');
    const r = await run('cycle', 'deck', CYCLE, '--out', out, ...SMALL);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(r.out).toContain('every point matched');
    for (const line of SAFETY_NOTICE_LINES) expect(r.out).toContain(line);
    const text = readFileSync(out, 'utf8');
    for (const line of SAFETY_NOTICE_LINES) expect(text).toContain(`## ${line}`);
    const deck = expectOk(parseDeckCsv(text, 'demo.deck.csv'), 'written deck');
    expect(deck.hasSensitivities).toBe(true);
    const spec = expectOk(parseCycleFile(readFileSync(join(repoRoot, CYCLE), 'utf8'), CYCLE), 'cycle');
    const direct = expectOk(cycleDeck(expectOk(designEngine(spec), 'design'), { altitudes_m: [0, 35000 * FT], machs: [0, 0.5, 0.8] }), 'deck');
    const a = deckGridPoints(deck.grid);
    const b = deckGridPoints(direct.deck.grid);
    expect(a.length).toBe(b.length);
    // 7 significant digits in customary units (the default).
    a.forEach((p, i) => {
      expectClose(p.thrust_N, b[i]!.thrust_N, { rel: 1e-6 }, 'same engine call, 7 digits');
      expectClose(p.sensitivities!.dThrust_dRecovery_N, b[i]!.sensitivities!.dThrust_dRecovery_N, { rel: 1e-6 }, 'same engine call, 7 digits');
    });
  });

  it('cycle deck --json summarizes, and a .json name writes the exact JSON deck form', async () => {
    const out = join(dir, 'demo.deck.json');
    const r = await run('cycle', 'deck', CYCLE, '--out', out, ...SMALL, '--json');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as Json;
    expect(doc.points).toBe(2 * 3 * 11);
    expect(doc.gaps).toEqual([]);
    const deck = expectOk(parseDeckJson(readFileSync(out, 'utf8'), 'demo.deck.json'), 'JSON deck');
    expect(deck.hasSensitivities).toBe(true);
  });

  it('a project whose engine is a cycle file flies on the generated deck through its sensitivities', async () => {
    const project = JSON.parse(readFileSync(join(repoRoot, DEMO_PROJECT), 'utf8')) as { engine: { deck: unknown } };
    project.engine.deck = { kind: 'cycle', path: join(repoRoot, CYCLE) };
    const file = join(dir, 'cycle.blockwise.json');
    writeFileSync(file, JSON.stringify(project));
    const r = await run('fly', file, '--json');
    expect(r.err).toBe('');
    const doc = JSON.parse(r.out) as Json;
    expect(doc.status).toBe('ok');
    expect(doc.installationMethod).toBe('deckSensitivities');
    expect((doc.deck as Json).title).toMatch(/deck from its cycle/);
    const broken = join(dir, 'broken.blockwise.json');
    project.engine.deck = { kind: 'cycle', path: 'no-such.cycle.json' };
    writeFileSync(broken, JSON.stringify(project));
    const bad = await run('fly', broken);
    expect(bad.code).not.toBe(0);
    expect(bad.err).toMatch(/engine\.deck\.path: cycle file "no-such\.cycle\.json": cannot read/);
  });
});
