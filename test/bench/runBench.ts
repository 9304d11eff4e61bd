/**
 * `npm run bench`: loads every section in test/bench/sections/*.ts, times
 * each case (warm-up, then about 0.5 s) and prints one table. Optional
 * arguments filter sections by a substring of their file name or title.
 * Speed is measured here, never in unit tests.
 */
import { readdirSync } from 'node:fs';
import { cpus } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { formatTable, runCase } from './benchRunner';
import type { BenchResult, BenchSection } from './benchTypes';
import { formatSideBySide, runSideBySide } from './sideBySide';

const here = dirname(fileURLToPath(import.meta.url));
const sectionDir = join(here, 'sections');
const filters = process.argv.slice(2).map((f) => f.toLowerCase());

const files = readdirSync(sectionDir)
  .filter((f) => f.endsWith('.ts'))
  .sort();

const results: BenchResult[] = [];
for (const file of files) {
  const mod = (await import(pathToFileURL(join(sectionDir, file)).href)) as { section?: BenchSection };
  const section = mod.section;
  if (section === undefined) {
    process.stderr.write(`bench: ${file} does not export "section"; skipped\n`);
    continue;
  }
  const matches = filters.length === 0 || filters.some((f) => file.toLowerCase().includes(f) || section.title.toLowerCase().includes(f));
  if (!matches) continue;
  for (const bench of section.cases) {
    results.push(runCase(section.title, bench));
  }
}

process.stdout.write(`Node ${process.version}, ${cpus().length} cores, ${results.length} cases\n\n${formatTable(results)}\n`);

// Printed last: Blockwise against the scripted Python peer (test/bench/sideBySide.ts).
if (filters.length === 0 || filters.some((f) => 'side by side python peer'.includes(f))) {
  process.stdout.write(`\n${formatSideBySide(runSideBySide())}\n`);
}
