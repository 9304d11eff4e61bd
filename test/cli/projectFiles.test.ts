import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { formatLoadFailure, loadProjectFromDisk, readProjectFile } from '../../cli/projectFiles';
import { deckToJson } from '../../engine/propulsion/deckJson';
import { scratchFolderForSuite } from '../support/scratchFolder';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const demoPath = join(repoRoot, 'fixtures/demo/demo.blockwise.json');
const demoText = readFileSync(demoPath, 'utf8');

describe('loadProjectFromDisk', () => {
  const dir = scratchFolderForSuite('blockwise-project-');

  it('loadProjectFromDisk reads the demo and its deck from the project folder', async () => {
    const r = await loadProjectFromDisk(demoPath);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.deckPath).toBe(join(repoRoot, 'fixtures/demo/demo-engine.deck.csv'));
    // The demo deck is generated from the demo cycle (fixtures/demo/NOTE.md): not parametric, with sensitivity columns.
    expect(r.value.deck?.parametric).toBe(false);
    expect(r.value.deck?.hasSensitivities).toBe(true);
    expect(r.value.input.propulsion.inletName).toBe('long pitot');
  });

  it('loadProjectFromDisk builds the mission for the inlet asked for', async () => {
    const r = await loadProjectFromDisk(demoPath, { inletName: 'short' });
    expect(r.ok && r.value.input.propulsion.inletName).toBe('short');
  });

  it('loadProjectFromDisk reads a deck in the JSON form by its extension', async () => {
    const csv = await loadProjectFromDisk(demoPath);
    if (!csv.ok || csv.value.deck === undefined) throw new Error('demo did not load');
    writeFileSync(join(dir(), 'engine.deck.json'), deckToJson(csv.value.deck));
    const doc = JSON.parse(demoText) as { engine: { deck: unknown } };
    doc.engine.deck = { kind: 'file', path: 'engine.deck.json' };
    writeFileSync(join(dir(), 'json-deck.blockwise.json'), JSON.stringify(doc));
    const r = await loadProjectFromDisk(join(dir(), 'json-deck.blockwise.json'));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const condition = { altitude_m: 8000, mach: 0.6, isaDev_K: 0 };
    expect(r.value.input.propulsion.atRating(condition, 'maxClimb').thrust_N).toBe(csv.value.input.propulsion.atRating(condition, 'maxClimb').thrust_N);
  });

  it('loadProjectFromDisk names the deck file, line and column of a broken deck', async () => {
    writeFileSync(join(dir(), 'broken.deck.csv'), '# title: broken (invented)\naltitude[ft],mach[-],power[-],thrust[lbf],fuel_flow[lb/h]\n0,0,1,12x0,100\n');
    const doc = JSON.parse(demoText) as { engine: { deck: unknown } };
    doc.engine.deck = { kind: 'file', path: 'broken.deck.csv' };
    writeFileSync(join(dir(), 'broken-deck.blockwise.json'), JSON.stringify(doc));
    const r = await loadProjectFromDisk(join(dir(), 'broken-deck.blockwise.json'));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.file).toBe(join(dir(), 'broken.deck.csv'));
    const text = formatLoadFailure(r.error);
    expect(text).toContain('line 3');
    expect(text).toContain('12x0');
  });

  it('loadProjectFromDisk says which deck file is missing and where it looked', async () => {
    const r = await loadProjectFromDisk(join(repoRoot, 'fixtures/bad-projects/missing-deck.blockwise.json'));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.issues[0]!.path).toBe('engine.deck.path');
    expect(r.error.issues[0]!.message).toContain(join(repoRoot, 'fixtures/bad-projects/no-such-engine.deck.csv'));
    expect(r.error.issues[0]!.message).toContain('no such file');
  });

  it('loadProjectFromDisk uses a deck text saved in the project (engine.deck.text) and reads no file beside it', async () => {
    const fromFile = await loadProjectFromDisk(demoPath);
    if (!fromFile.ok || fromFile.value.deck === undefined) throw new Error('demo did not load');
    const doc = JSON.parse(demoText) as { engine: { deck: Record<string, unknown> } };
    doc.engine.deck.path = 'not-beside-the-project.deck.json';
    doc.engine.deck.text = deckToJson(fromFile.value.deck);
    const path = join(dir(), 'with-deck-inside.blockwise.json');
    writeFileSync(path, JSON.stringify(doc));
    const r = await loadProjectFromDisk(path);
    if (!r.ok) throw new Error(formatLoadFailure(r.error));
    // docs/deck-format.md: deckToJson round-trips exactly, so the saved text is the same deck as the file.
    expect(r.value.deck).toEqual(fromFile.value.deck);
    expect(r.value.deckPath).toBe(path);
  });

  it('readProjectFile reports a folder given as a project', async () => {
    const r = await readProjectFile(dir());
    expect(r.ok).toBe(false);
    if (!r.ok) expect(formatLoadFailure(r.error)).toContain('folder');
  });

  it('formatLoadFailure starts with the file and lists one line per issue', () => {
    const text = formatLoadFailure({
      file: '/x/p.blockwise.json',
      issues: [
        { path: 'a', value: '1', expected: 'b', message: 'a: first' },
        { path: 'c', value: '2', expected: 'd', message: 'c: second' },
      ],
    });
    expect(text.split('\n')).toEqual(['/x/p.blockwise.json: cannot use this project (2 problems):', '  a: first', '  c: second', '']);
  });
});
