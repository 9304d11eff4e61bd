import { closeSync, openSync, writeSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { resolve } from 'node:path';
import { gridSize, parseJsonText, parseShard, parseVary, shardRange, type Shard, type SweepAxis, sweepCsvHead, sweepCsvLine, sweepJsonlHead, sweepJsonLine, type SweepRow } from '../../engine/project';
import { printJsonReport, reportText } from '../common/report';
import { readTextFile } from '../common/textFile';
import { checkInletName, projectArgument } from '../common/projectArgs';
import { buildFromProject, formatLoadFailure, readProjectFile } from '../projectFiles';
import { runSweepPool, startSweepCrew, type SweepCrew } from '../sweep/sweepPool';
import { optionalString, UsageError, type CliIo, type Verb } from '../verb';
import { INLET_OPTION, JSON_OPTION } from './analysisArgs';
import { verbSummary } from './catalogue';

/** Exit code when the sweep was interrupted (Ctrl-C): 128 + SIGINT, as shells report it. */
export const EXIT_INTERRUPTED = 130;

function varyAxes(doc: unknown, specs: readonly string[]): SweepAxis[] {
  if (specs.length === 0) throw new UsageError('give at least one --vary <field>=<from>:<to>:<step>');
  const axes: SweepAxis[] = [];
  for (const spec of specs) {
    const axis = parseVary(doc, spec);
    if (!axis.ok) throw new UsageError(`${axis.error.where}: ${axis.error.message}`);
    if (axes.some((a) => a.field === axis.value.field)) throw new UsageError(`--vary ${spec}: ${axis.value.field} is varied twice`);
    axes.push(axis.value);
  }
  return axes;
}

function workerCount(text: string | undefined): number {
  if (text === undefined) return availableParallelism();
  const n = Number(text);
  if (!Number.isInteger(n) || n < 1 || n > 256) throw new UsageError(`--workers ${text}: give a whole number of threads from 1 to 256`);
  return n;
}

/** Where rows go: a file (synchronous writes, so every row received is on disk) or stdout. */
interface RowSink {
  write(text: string): void;
  close(): void;
}

function fileSink(path: string): RowSink {
  const fd = openSync(path, 'w');
  return { write: (t) => void writeSync(fd, t), close: () => closeSync(fd) };
}

function formatOf(out: string | undefined, json: boolean): 'csv' | 'jsonl' {
  if (out === undefined) return json ? 'jsonl' : 'csv';
  if (/\.jsonl$/i.test(out)) return 'jsonl';
  if (/\.csv$/i.test(out)) return 'csv';
  throw new UsageError(`--out ${out}: name a .csv or .jsonl file`);
}

export const sweepVerb: Verb = {
  name: 'sweep',
  summary: verbSummary('sweep'),
  help: `blockwise sweep — fly a grid of variations of a project, over all cores

Usage: blockwise sweep <project.blockwise.json> --vary <field>=<from>:<to>:<step> [--vary ...]
         [--inlet <name>] [--out results.csv|results.jsonl] [--workers N] [--shard i/n] [--json]

Options:
  --vary     a field of the project file by its JSON path and its values: from, from + step, ... up to to,
             in the field's unit or the one written, e.g.
               --vary mission.solve.range=1000nmi:3000nmi:250nmi
               --vary polar.cdIncrement=0:0.002:0.0005
               --vary "mission.legs[Cruise].speed.mach=0.74:0.80:0.02"   (a list entry by its name or [index])
             every combination of the --vary values is one case (the last --vary changes fastest)
  --inlet    fly every case with this inlet design instead of the project's active one
  --out      write the rows to this file, as CSV (.csv, the notice as # lines) or JSON lines (.jsonl);
             without it the rows go to stdout
  --workers  worker threads (default: the machine's cores)
  --shard    fly only the i-th of n equal contiguous blocks of the grid (1 <= i <= n), e.g. the array
             index of a batch-scheduler job: the n shards together fly every case once
  --json     with --out, print the summary as JSON; without --out, write the rows as JSON lines

One row per case: the case number, the values varied, the mission status, block fuel [kg], block
time [s], trip fuel [kg], take-off mass [kg], the cautions and warnings raised, the status message.
Rows are written as they are flown (not in case order; sort on "case"), so Ctrl-C keeps every row
flown so far (exit code 130). A case whose project does not build has status invalid_input.
Each worker flies a contiguous block of the grid, every case's fuel iteration started from its
neighbour's: a case's block fuel is the one it has flown alone, within the fuel iteration's band.

Exit codes: 0 every case flown; 1 the project (or its deck) cannot be read; 2 bad command line;
130 interrupted.
`,
  options: {
    vary: { type: 'string', multiple: true },
    ...INLET_OPTION,
    out: { type: 'string' },
    workers: { type: 'string' },
    shard: { type: 'string' },
    ...JSON_OPTION,
  },
  allowPositionals: true,
  async run(values, positionals, io: CliIo): Promise<number> {
    const args = sweepArgs(values, positionals);
    // The workers start now, while the project is read and checked here (their own start-up, a few tenths of a
    // second, overlaps that); the pool gives them the study. Any not used are ended whatever happens.
    const crew = startSweepCrew(Math.min(args.workers, availableParallelism()));
    try {
      return await flySweep(args, crew, io);
    } finally {
      crew.dispose();
    }
  },
};

/** The command line of a sweep, read (a bad option is a UsageError, before any worker starts). */
interface SweepArgs {
  readonly file: string;
  readonly specs: readonly string[];
  readonly inletName: string | undefined;
  readonly out: string | undefined;
  readonly json: boolean;
  readonly format: 'csv' | 'jsonl';
  readonly workers: number;
  readonly theShard: Shard;
}

function sweepArgs(values: Parameters<Verb['run']>[0], positionals: readonly string[]): SweepArgs {
  const file = projectArgument(positionals, 'sweep');
  const specs = (Array.isArray(values.vary) ? values.vary : []).map(String);
  const inletName = optionalString(values, 'inlet');
  const out = optionalString(values, 'out');
  if (out !== undefined && out.trim() === '') throw new UsageError('--out: give a file name');
  const json = values.json === true;
  const format = formatOf(out, json);
  const workers = workerCount(optionalString(values, 'workers'));
  const shardText = optionalString(values, 'shard');
  const parsedShard = shardText === undefined ? null : parseShard(shardText);
  if (parsedShard !== null && !parsedShard.ok) throw new UsageError(`${parsedShard.error.where}: ${parsedShard.error.message}`);
  const theShard = parsedShard === null ? { index: 1, count: 1 } : parsedShard.value;
  return { file, specs, inletName, out, json, format, workers, theShard };
}

async function flySweep(args: SweepArgs, crew: SweepCrew, io: CliIo): Promise<number> {
  const { file, specs, inletName, out, json, format, workers, theShard } = args;
  // The project as a whole must read (exit 1 with its problems); its raw JSON is what the cases vary.
  const read = await readProjectFile(resolve(io.cwd, file));
  if (!read.ok) {
    io.err(formatLoadFailure(read.error));
    return 1;
  }
  if (inletName !== undefined) checkInletName(read.value.project, inletName, '--inlet', file);
  const text = readTextFile(file, 'sweep', io);
  const doc = text === null ? null : parseJsonText(text);
  if (doc === null || !doc.ok) return 1;
  const axes = varyAxes(doc.value, specs);
  // The base case must build (its deck read and parsed once here; the workers get the parsed deck).
  const loaded = await buildFromProject(read.value.projectPath, read.value.project, inletName === undefined ? {} : { inletName });
  if (!loaded.ok) {
    io.err(formatLoadFailure(loaded.error));
    return 1;
  }
  const fileDeck = read.value.project.engine.deck.kind === 'file' ? loaded.value.deck : undefined;

  const total = gridSize(axes);
  const range = shardRange(total, theShard);
  const count = range.end - range.start;
  let sink: RowSink;
  const target = out === undefined ? 'stdout' : resolve(io.cwd, out);
  try {
    sink = out === undefined ? { write: (t) => io.out(t), close: () => {} } : fileSink(target);
  } catch (e) {
    io.err(`blockwise sweep: cannot write ${target}: ${e instanceof Error ? e.message : String(e)}\n`);
    return 1;
  }
  sink.write(format === 'csv' ? sweepCsvHead(axes) : sweepJsonlHead(axes, total));
  const statuses = new Map<string, number>();
  let written = 0;
  const progressToTty = process.stderr.isTTY === true && out !== undefined;
  let lastProgress = 0;
  const t0 = performance.now();
  const onRows = (rows: readonly SweepRow[]) => {
    let chunk = '';
    for (const row of rows) {
      chunk += format === 'csv' ? sweepCsvLine(row) : sweepJsonLine(axes, row);
      statuses.set(row.status, (statuses.get(row.status) ?? 0) + 1);
    }
    sink.write(chunk);
    written += rows.length;
    const now = performance.now();
    if (progressToTty && (now - lastProgress > 200 || written === count)) {
      lastProgress = now;
      const rate = written / Math.max((now - t0) / 1000, 1e-3);
      const left = rate > 0 ? (count - written) / rate : 0;
      io.err(`\rblockwise sweep: ${written} of ${count} cases (${((100 * written) / Math.max(count, 1)).toFixed(0)} %), ${rate.toFixed(0)} cases/s, about ${left.toFixed(0)} s left   `);
    }
  };
  const pool = runSweepPool({ doc: doc.value, axes, deck: fileDeck, inletName }, range, workers, onRows, crew);
  const onInterrupt = () => pool.stop();
  process.once('SIGINT', onInterrupt);
  const result = await pool.finished;
  process.removeListener('SIGINT', onInterrupt);
  sink.close();
  if (progressToTty) io.err('\n');
  const elapsed_s = (performance.now() - t0) / 1000;
  if (result.error !== null) {
    io.err(`blockwise sweep: a worker failed: ${result.error}; ${written} rows written to ${target}\n`);
    return 1;
  }
  const summary = {
    project: file,
    fields: axes.map((a) => a.field),
    cases: total,
    shard: `${theShard.index}/${theShard.count}`,
    shardCases: count,
    flown: written,
    interrupted: result.stopped,
    statuses: Object.fromEntries([...statuses].sort()),
    workers: Math.max(1, Math.min(workers, count)),
    elapsed_s,
    out: target,
  };
  const statusText = [...statuses].sort().map(([s, n]) => `${s} ${n}`).join(', ') || 'none';
  const line = `${result.stopped ? 'Interrupted: ' : ''}${written} of ${count} cases flown${theShard.count > 1 ? ` (shard ${theShard.index}/${theShard.count} of ${total})` : ''} in ${elapsed_s.toFixed(2)} s on ${summary.workers} threads; status: ${statusText}; rows in ${target}`;
  if (out === undefined) io.err(`blockwise sweep: ${line}\n`);
  else if (json) printJsonReport(io, summary);
  else io.out(reportText([line]));
  return result.stopped ? EXIT_INTERRUPTED : 0;
}
