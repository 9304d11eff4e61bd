/**
 * `blockwise cycle match` end to end on a small case: a deck written by
 * `cycle deck` from the demo cycle (the truth) is fitted from a perturbed
 * copy of that cycle; the written cycle file must load and reproduce the
 * generating parameters (self-consistency), the deck copy must carry the
 * sensitivity columns with the deck's own columns unchanged, and bad input
 * gets a located message.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { EXIT_FILE, EXIT_OK, EXIT_USAGE } from '../../cli/exitCodes';
import { expectOk } from '../../engine/core/result';
import { designEngine, parseCycleFile } from '../../engine/cycle/index';
import { deckGridPoints } from '../../engine/propulsion/deckGrid';
import { parseDeckText } from '../../engine/study';
import { SAFETY_NOTICE } from '../../engine/core';
import { expectClose } from '../support/assertInDelta';
import { repoRoot, run, type Json } from './support/cliRun';

const CYCLE = 'fixtures/cycle/demo-turbofan.cycle.json';
const dir = mkdtempSync(join(tmpdir(), 'blockwise-cycle-match-'));
const deckFile = join(dir, 'truth.deck.csv');
const startFile = join(dir, 'start.cycle.json');
afterAll(() => rmSync(dir, { recursive: true, force: true }));

beforeAll(async () => {
  const made = await run('cycle', 'deck', CYCLE, '--out', deckFile, '--altitudes', '0, 20000, 35000 ft', '--machs', '0.3, 0.8', '--units', 'si', '--digits', '15');
  expect(made.code).toBe(EXIT_OK);
  const doc = JSON.parse(readFileSync(join(repoRoot, CYCLE), 'utf8')) as { design: Record<string, unknown> };
  doc.design.bypassRatio = 4.2;
  doc.design.overallPressureRatio = 27;
  writeFileSync(startFile, JSON.stringify(doc));
}, 60_000);

describe('blockwise cycle match', () => {
  it('fits the perturbed start back to the generating cycle, writes a loadable cycle file and a deck copy (self-consistency)', async () => {
    const out = join(dir, 'fit.cycle.json');
    const deckOut = join(dir, 'copy.deck.csv');
    const r = await run('cycle', 'match', deckFile, '--start', startFile, '--out', out, '--deck-out', deckOut, '--free', 'bypassRatio,overallPressureRatio,airflow', '--json');
    expect(r.err).toBe('');
    expect(r.code).toBe(EXIT_OK);
    const j = JSON.parse(r.out) as Json & { parameters: Record<string, { fitted: number }>; worst: { residual: number; quantity: string } };
    expect(j.status).toBe('converged');
    expect(j.rms as number).toBeLessThan(1e-5);
    expect(['thrust', 'fuelFlow']).toContain(j.worst.quantity);
    expect(j.notice).toBe(SAFETY_NOTICE);
    // Every deck point of a cycle's own deck lies within its idle-to-takeoff thrust (idle and takeoff are tabulated), so no end sensitivities.
    expect(j.deckOutCautions).toEqual([]);
    // Truth: the generating cycle file (bypass ratio 4.5, overall pressure ratio 25); the start is sized by thrust, so its
    // airflow differs from the truth's and is freed too.
    const truth = expectOk(parseCycleFile(readFileSync(join(repoRoot, CYCLE), 'utf8'), CYCLE), 'truth');
    expectClose(j.parameters.bypassRatio!.fitted, truth.design.bypassRatio, { rel: 1e-4 }, 'BPR');
    expectClose(j.parameters.overallPressureRatio!.fitted, truth.design.overallPressureRatio, { rel: 1e-4 }, 'OPR');
    const fitted = expectOk(parseCycleFile(readFileSync(out, 'utf8'), out), 'written cycle');
    expectOk(designEngine(fitted), 'designs');
    expectClose(fitted.design.bypassRatio, truth.design.bypassRatio, { rel: 1e-4 }, 'written BPR');
    const a = deckGridPoints(expectOk(parseDeckText(readFileSync(deckFile, 'utf8'), deckFile), 'deck').grid);
    const copy = expectOk(parseDeckText(readFileSync(deckOut, 'utf8'), deckOut), 'copy');
    expect(copy.hasSensitivities).toBe(true);
    const b = deckGridPoints(copy.grid);
    expect(b).toHaveLength(a.length);
    // Customary CSV at 7 digits: the deck's own columns agree to the written precision.
    a.forEach((p, i) => {
      expectClose(b[i]!.thrust_N, p.thrust_N, { rel: 1e-6 }, 'thrust unchanged');
      expectClose(b[i]!.fuelFlow_kg_s, p.fuelFlow_kg_s, { rel: 1e-6 }, 'fuel flow unchanged');
    });
  }, 60_000);

  it('prints the residuals and the notice as text', async () => {
    const r = await run('cycle', 'match', deckFile, '--start', startFile, '--out', join(dir, 'fit2.cycle.json'), '--free', 'airflow', '--nodes', '2');
    expect(r.code).toBe(EXIT_OK);
    expect(r.out).toMatch(/residuals {3}RMS .* %/);
    expect(r.out).toMatch(/worst {7}(thrust|fuel flow) .* at .* ft, Mach/);
    expect(r.out).toContain(SAFETY_NOTICE.split('\n')[0]!.slice(0, 40));
  }, 60_000);

  it('refuses to write over the deck, and a broken deck is reported with its line', async () => {
    const same = await run('cycle', 'match', deckFile, '--start', startFile, '--out', deckFile);
    expect(same.code).toBe(EXIT_USAGE);
    expect(same.err).toMatch(/--out: .* is the deck file itself/);
    const broken = join(dir, 'broken.deck.csv');
    writeFileSync(broken, readFileSync(deckFile, 'utf8').replace(/\n(\d[^\n]*)\n/, (_m, row: string) => `\n${row.replace(/^[^,]+/, 'abc')}\n`));
    const r = await run('cycle', 'match', broken, '--start', startFile, '--out', join(dir, 'x.cycle.json'));
    expect(r.code).toBe(EXIT_FILE);
    expect(r.err).toMatch(/line \d+/);
    expect(r.err).toContain('deck not loaded');
  }, 60_000);
});
