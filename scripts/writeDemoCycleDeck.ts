/**
 * Writes fixtures/demo/demo-engine.deck.csv: the deck of the invented demo
 * cycle fixtures/cycle/demo-turbofan.cycle.json on the default cycle-deck grid
 * (0 to 51,000 ft, Mach 0 to 0.9, the power-lever axis with the five ratings),
 * customary units, 7 significant digits, with the installation-sensitivity
 * columns. The same file as
 *   node bin/blockwise.mjs cycle deck fixtures/cycle/demo-turbofan.cycle.json --out fixtures/demo/demo-engine.deck.csv
 * run from the repository root. Run: npx tsx scripts/writeDemoCycleDeck.ts
 * A test (test/engine/cycle/demoCycleDeck.test.ts) checks the committed file against demoCycleDeckCsv().
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { cycleDeckCsvText } from '../cli/verbs/cycle/deck';
import { err, ok, type Result } from '../engine/core';
import { cycleDeck, DEFAULT_CYCLE_DECK_GRID, designEngine, parseCycleFile } from '../engine/cycle';

export const DEMO_CYCLE_PATH = 'fixtures/cycle/demo-turbofan.cycle.json';
export const DEMO_DECK_PATH = 'fixtures/demo/demo-engine.deck.csv';

/** The demo deck's CSV text from the demo cycle (or the first failure's message). */
export function demoCycleDeckCsv(repoRoot: string): Result<string, string> {
  const text = readFileSync(`${repoRoot}/${DEMO_CYCLE_PATH}`, 'utf8');
  const spec = parseCycleFile(text, DEMO_CYCLE_PATH);
  if (!spec.ok) return err(spec.error.map((i) => i.message).join('; '));
  const engine = designEngine(spec.value);
  if (!engine.ok) return err(engine.error.message);
  const made = cycleDeck(engine.value, DEFAULT_CYCLE_DECK_GRID);
  if (!made.ok) return err(made.error.message);
  return ok(cycleDeckCsvText(made.value, DEMO_CYCLE_PATH, 'customary', 7));
}

if (process.argv[1] !== undefined && fileURLToPath(import.meta.url) === process.argv[1]) {
  const root = fileURLToPath(new URL('..', import.meta.url));
  const csv = demoCycleDeckCsv(root);
  if (!csv.ok) {
    process.stderr.write(`writeDemoCycleDeck: ${csv.error}\n`);
    process.exitCode = 1;
  } else {
    writeFileSync(`${root}/${DEMO_DECK_PATH}`, csv.value);
    process.stdout.write(`wrote ${DEMO_DECK_PATH}\n`);
  }
}
