/**
 * One suite over both front doors: the CLI (cli/projectFiles.ts, `fly
 * --csv`) and the app's worker (renderer/worker/engineRunner.ts) load the
 * same decks - CSV or JSON whatever the file is called - fly the same
 * figures and write the same results CSV, because both go through
 * engine/study. Reference values: the demo deck file's own rows converted
 * with the NIST SP 811 factors (lbf = 4.4482216152605 N, lb = 0.45359237 kg).
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadProjectFromDisk } from '../../../cli/projectFiles';
import { expectOk } from '../../../engine/core/result';
import { parseProject } from '../../../engine/project/parseProject';
import type { Project } from '../../../engine/project/projectSchema';
import { deckToJson } from '../../../engine/propulsion/deckJson';
import { lookupDeck } from '../../../engine/propulsion/deckLookup';
import { deckTextFormat, historyCsv, parseDeckText, prepareStudy } from '../../../engine/study';
import type { EngineReplies } from '../../../renderer/worker/engineProtocol';
import { createDeckCache, runEngineRequest } from '../../../renderer/worker/engineRunner';
import { expectClose } from '../../support/assertInDelta';
import { DEMO_DECK, DEMO_PROJECT, repoRoot, run } from '../../cli/support/cliRun';
import { scratchFolderForSuite } from '../../support/scratchFolder';

const LBF_N = 4.4482216152605; // NIST SP 811
const LB_KG = 0.45359237; // NIST SP 811
const deckCsvText = readFileSync(join(repoRoot, DEMO_DECK), 'utf8');
const projectText = readFileSync(join(repoRoot, DEMO_PROJECT), 'utf8');

function demoProject(deckPath: string): Project {
  const doc = JSON.parse(projectText) as { engine: { deck: unknown } };
  doc.engine.deck = { kind: 'file', path: deckPath };
  return expectOk(parseProject(JSON.stringify(doc), 'demo'), 'demo project');
}

function workerStudy(project: Project, deckFile: { name: string; text: string }): EngineReplies['study'] {
  const r = runEngineRequest({ kind: 'study', project, deckFile }, createDeckCache());
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  return r.value as EngineReplies['study'];
}

describe('parseDeckText chooses the form by content', () => {
  const deckJsonText = deckToJson(expectOk(parseDeckText(deckCsvText, 'demo.csv'), 'demo deck'));
  it.each([
    ['the CSV named .csv', deckCsvText, 'engine.deck.csv', 'csv'],
    ['the CSV named .json', deckCsvText, 'engine.deck.json', 'csv'],
    ['the JSON form named .json', deckJsonText, 'engine.json', 'json'],
    ['the JSON form named .csv', deckJsonText, 'engine.csv', 'json'],
    ['the JSON form after a byte-order mark', `\uFEFF  ${deckJsonText}`, 'engine.txt', 'json'],
  ] as const)('%s', (_what, text, name, form) => {
    expect(deckTextFormat(text, name)).toBe(form);
    const deck = expectOk(parseDeckText(text, name), name);
    // The deck file's row "0,0,0.3,2106.743,794.9112,118.6171,..." (ft, -, -, lbf, lb/h, lb/s; the cycle-generated demo deck), NIST SP 811 factors.
    const p = expectOk(lookupDeck(deck, { altitude_m: 0, mach: 0, isaDev_K: 0 }, 0.3), 'node');
    expectClose(p.thrust_N, 2106.743 * LBF_N, { rel: 1e-12 }, 'deck row, lbf to N');
    expectClose(p.fuelFlow_kg_s, (794.9112 * LB_KG) / 3600, { rel: 1e-12 }, 'deck row, lb/h to kg/s');
    expectClose(p.airflow_kg_s!, 118.6171 * LB_KG, { rel: 1e-12 }, 'deck row, lb/s to kg/s');
  });

  it('a blank file takes its form from the extension and says what is missing', () => {
    expect(deckTextFormat('  \n', 'x.json')).toBe('json');
    expect(deckTextFormat('', 'x.csv')).toBe('csv');
    const r = parseDeckText('', 'x.csv');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error[0]!.code).toBe('empty_file');
  });
});

describe('the CLI and the worker through engine/study', () => {
  const dir = scratchFolderForSuite('blockwise-doors-');

  it('a JSON deck under a .csv name loads in both doors and flies the same block fuel as the CSV deck', async () => {
    const deck = expectOk(parseDeckText(deckCsvText, DEMO_DECK), 'demo deck');
    writeFileSync(join(dir(), 'engine.csv'), deckToJson(deck));
    const doc = JSON.parse(projectText) as { engine: { deck: unknown } };
    doc.engine.deck = { kind: 'file', path: 'engine.csv' };
    writeFileSync(join(dir(), 'json-as-csv.blockwise.json'), JSON.stringify(doc));
    const cli = await loadProjectFromDisk(join(dir(), 'json-as-csv.blockwise.json'));
    if (!cli.ok) throw new Error(JSON.stringify(cli.error));
    const app = workerStudy(demoProject('engine.csv'), { name: 'engine.csv', text: deckToJson(deck) });
    const fromCsv = workerStudy(demoProject('demo.csv'), { name: 'demo.csv', text: deckCsvText });
    const csvInput = expectOk(expectOk(prepareStudy(demoProject('demo.csv'), { name: 'demo.csv', text: deckCsvText }), 'study').inputFor(), 'input');
    const condition = { altitude_m: 8000, mach: 0.6, isaDev_K: 0 };
    expect(cli.value.input.propulsion.atRating(condition, 'maxClimb').thrust_N).toBe(csvInput.propulsion.atRating(condition, 'maxClimb').thrust_N);
    expect(app.mission.status).toBe('ok');
    // The JSON form carries the same SI numbers, so every figure is the same to the bit.
    expect(app.mission.blockFuel_kg).toBe(fromCsv.mission.blockFuel_kg);
  });

  it('fly --csv writes, byte for byte, the CSV the app exports for the same study', async () => {
    const file = join(dir(), 'history.csv');
    const r = await run('fly', DEMO_PROJECT, '--csv', file, '--json');
    expect(r.code).toBe(0);
    const cliCsv = readFileSync(file, 'utf8');
    const app = workerStudy(demoProject('demo-engine.deck.csv'), { name: 'demo-engine.deck.csv', text: deckCsvText });
    // The export command writes historyCsv(snapshot.mission.history) (renderer/state/useAppCommands.ts).
    expect(historyCsv(app.mission.history)).toBe(cliCsv);
    expect(JSON.parse(r.out).blockFuel_kg).toBe(app.mission.blockFuel_kg);
    // In display units (the app exports in the units the user chose): the same file from both doors.
    const customaryFile = join(dir(), 'history-customary.csv');
    expect((await run('fly', DEMO_PROJECT, '--csv', customaryFile, '--csv-units', 'customary')).code).toBe(0);
    expect(readFileSync(customaryFile, 'utf8')).toBe(historyCsv(app.mission.history, { display: 'customary' }));
  });

  it('a broken deck is refused by both doors with the same located messages', async () => {
    const name = 'fixtures/bad-decks/missing-column.csv';
    const text = readFileSync(join(repoRoot, name), 'utf8');
    const doc = JSON.parse(projectText) as { engine: { deck: unknown } };
    doc.engine.deck = { kind: 'file', path: join(repoRoot, name) };
    writeFileSync(join(dir(), 'bad.blockwise.json'), JSON.stringify(doc));
    const cli = await loadProjectFromDisk(join(dir(), 'bad.blockwise.json'));
    const app = runEngineRequest({ kind: 'study', project: demoProject(name), deckFile: { name: join(repoRoot, name), text } }, createDeckCache());
    if (cli.ok || app.ok || app.error.kind !== 'deck') throw new Error('expected both doors to refuse the deck');
    // The CLI lists each deck error under the project field that names the deck.
    expect(cli.error.issues.map((i) => i.message)).toEqual(app.error.errors.map((e) => `engine.deck.path: ${e.message}`));
    expect(app.error.errors[0]!.line).not.toBeNull();
  });
});
