/**
 * The bench (`npm run bench` runs it bundled, scripts/bench.mjs): every section of test/bench/sections/index.ts, times
 * each case (warm-up, then about 0.5 s) and prints one table; then the side
 * by side with the Python peer (sideBySide.ts), the peer at equal accuracy
 * (equalAccuracy.ts) and the command line's start-up and sweep throughput
 * (cliTiming.ts). Each section runs in a process of its own (sectionProcess.ts),
 * so a row does not depend on which sections ran before it; `--same-process`
 * runs them all in this one, in order, as before. Arguments: substrings of
 * section file names or titles to run only those (the comparisons then run
 * only if named: "peer", "cli"); `--json` prints every figure as one JSON
 * document instead of the text. Speed is measured here, never in unit tests.
 */
import { cpus } from 'node:os';
import { DEFAULT_TIMING, formatTable, runCase } from './benchRunner';
import type { BenchResult } from './benchTypes';
import { formatCliTiming, runCliTiming, type CliTiming } from './cliTiming';
import { formatEqualAccuracy, runEqualAccuracy, type EqualAccuracy } from './equalAccuracy';
import { ONE_SECTION_FLAG, runSectionApart } from './sectionProcess';
import { BENCH_SECTIONS } from './sections/index';
import { formatSideBySide, runSideBySide, type SideBySide } from './sideBySide';

const args = process.argv.slice(2);

// A child run by sectionProcess.ts: one section, its results as JSON on stdout, nothing else.
const oneAt = args.indexOf(ONE_SECTION_FLAG);
if (oneAt >= 0) {
  const file = args[oneAt + 1];
  const entry = BENCH_SECTIONS.find((s) => s.file === file);
  if (entry === undefined) {
    process.stderr.write(`bench: no section file '${file ?? ''}' (sections: ${BENCH_SECTIONS.map((s) => s.file).join(', ')})\n`);
    process.exit(2);
  }
  const timing = entry.section.timing === undefined ? DEFAULT_TIMING : { ...DEFAULT_TIMING, ...entry.section.timing };
  const own = entry.section.cases.map((bench) => runCase(entry.section.title, bench, timing));
  process.stdout.write(`${JSON.stringify(own)}\n`);
  process.exit(0);
}

const json = args.includes('--json');
const sameProcess = args.includes('--same-process');
const filters = args.filter((a) => a !== '--json' && a !== '--same-process').map((f) => f.toLowerCase());
const wanted = (name: string) => filters.length === 0 || filters.some((f) => name.includes(f));
const say = (text: string) => {
  if (!json) process.stdout.write(text);
};

// How the engine code runs: bundled by esbuild as the CLI ships it (scripts/bench.mjs), or from the TypeScript sources under tsx.
const build = process.env.BLOCKWISE_BENCH_BUILD === 'bundle' ? 'bundled (esbuild, ES modules, as the CLI ships)' : 'TypeScript sources under tsx';

const results: BenchResult[] = [];
const failed: string[] = [];
for (const { file, section } of BENCH_SECTIONS) {
  const matches = filters.length === 0 || filters.some((f) => file.includes(f) || section.title.toLowerCase().includes(f));
  if (!matches) continue;
  if (sameProcess) {
    const timing = section.timing === undefined ? DEFAULT_TIMING : { ...DEFAULT_TIMING, ...section.timing };
    for (const bench of section.cases) results.push(runCase(section.title, bench, timing));
    continue;
  }
  const outcome = runSectionApart(file);
  if (outcome.ok) results.push(...outcome.results);
  else {
    failed.push(file);
    process.stderr.write(`bench: section '${file}' gave no figures: ${outcome.reason}\n`);
  }
}

const cores = cpus().length;
const processes = sameProcess ? 'all sections in one process' : 'each section in a process of its own';
say(`Node ${process.version}, ${cores} cores, ${new Date().toISOString()}, ${results.length} cases, ${build}, ${processes}\n\n${formatTable(results)}\n`);

// Blockwise against the scripted Python peer: agreement at the peer's default tolerance, then both at equal accuracy.
let sideBySide: SideBySide | null = null;
let equal: EqualAccuracy | null = null;
if (wanted('side by side python peer equal accuracy')) {
  sideBySide = runSideBySide(15, 1);
  say(`\n${formatSideBySide(sideBySide)}\n`);
  equal = runEqualAccuracy();
  say(`\n${formatEqualAccuracy(equal)}\n`);
}
let cli: CliTiming | null = null;
if (wanted('cli command line start-up sweep')) {
  cli = runCliTiming();
  say(`\n${formatCliTiming(cli)}\n`);
}

if (json) {
  const doc = {
    node: process.version,
    cores,
    build,
    sectionsApart: !sameProcess,
    failedSections: failed,
    date: new Date().toISOString(),
    cases: results.map((r) => ({ section: r.section, name: r.name, medianCall_s: r.medianCall_s, callsPerSecond: r.opsPerSecond, calls: r.calls })),
    sideBySide,
    equalAccuracy: equal,
    cli,
  };
  process.stdout.write(`${JSON.stringify(doc, null, 2)}\n`);
}
if (failed.length > 0) process.exitCode = 1;
