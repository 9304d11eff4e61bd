/**
 * Whole-process timings of the command line as a person runs it
 * (`node bin/blockwise.mjs ...`): start-up for `--help`, flying the demo,
 * and the sweep over all cores on a 10,000-case grid of demo-class cases
 * (100 payloads x 100 ranges): its start-up (one case), a tenth of the grid
 * (--shard 1/10, 1,000 cases) and the whole grid projected from it (an upper
 * bound: the tenth carries the start-up and the workers' JIT warm-up, about
 * 1 s of CPU each, that the whole grid pays once), and the whole grid itself
 * when that projection is within WHOLE_SWEEP_MAX_S.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { performance } from 'node:perf_hooks';
// @ts-expect-error plain .mjs start-up check without types
import { bundleProblem } from '../../bin/cliBundle.mjs';
import { median } from './sideBySide';

const repo = fileURLToPath(new URL('../../', import.meta.url));
const bin = join(repo, 'bin', 'blockwise.mjs');
const demo = join(repo, 'fixtures', 'demo', 'demo.blockwise.json');

export interface CliTiming {
  /** Why the bundle is not used (the figures are then the TypeScript path's), or null. */
  readonly bundle: string | null;
  readonly runs: number;
  readonly help_s: number;
  readonly fly_s: number;
  readonly nodeBare_s: number;
  readonly sweep: SweepTiming | { readonly error: string };
}

export interface SweepTiming {
  /** The grid's --vary options, and its number of cases (10,000). */
  readonly grid: readonly string[];
  readonly cases: number;
  readonly workers: number;
  /** A one-case shard: the process, the workers' start and one cold case. */
  readonly start_s: number;
  /** The tenth of the grid flown (--shard 1/10): its cases and wall time. */
  readonly sampleCases: number;
  readonly sample_s: number;
  /** The whole grid at the sample's pace (ten samples: an upper bound). */
  readonly projected_s: number;
  /** The whole grid flown, when the projection is within WHOLE_SWEEP_MAX_S; else null. */
  readonly whole_s: number | null;
}

/** The demo-class grid of 10,000 cases the sweep's target is stated on (issue #13: 10,000 cases in 10 s). */
export const SWEEP_GRID = ['--vary', 'mission.solve.payload=0lb:1980lb:20lb', '--vary', 'mission.solve.range=1000nmi:2980nmi:20nmi'] as const;
const SWEEP_GRID_CASES = 10_000;

/** The whole grid is flown when projected to take at most this long (s), so a slow sweep does not hold the bench up. */
export const WHOLE_SWEEP_MAX_S = 60;

function wall(args: readonly string[]): number {
  const t0 = performance.now();
  const r = spawnSync(process.execPath, args, { cwd: repo, encoding: 'utf8', timeout: 600_000 });
  const t = (performance.now() - t0) / 1000;
  if (r.status !== 0) throw new Error(`${args.join(' ')} exited with ${r.status}: ${r.stderr.trim().split('\n')[0] ?? ''}`);
  return t;
}

/** Medians of `runs` start-ups, and the sweep of the 10,000-case grid (SWEEP_GRID) over every core. */
export function runCliTiming(runs = 9): CliTiming {
  const problem = bundleProblem(pathToFileURL(repo), pathToFileURL(join(repo, 'dist-cli') + '/')) as string | null;
  const bare: number[] = [];
  const help: number[] = [];
  const fly: number[] = [];
  for (let i = 0; i < runs; i++) {
    bare.push(wall(['-e', '0']));
    help.push(wall([bin, '--help']));
    fly.push(wall([bin, 'fly', demo]));
  }
  const workers = availableParallelism();
  let sweep: CliTiming['sweep'];
  const dir = mkdtempSync(join(tmpdir(), 'blockwise-bench-'));
  try {
    const sweepOf = (shard: string | null) =>
      wall([bin, 'sweep', demo, ...SWEEP_GRID, ...(shard === null ? [] : ['--shard', shard]), '--out', join(dir, 'sweep.csv'), '--workers', String(workers)]);
    const start_s = sweepOf(`1/${SWEEP_GRID_CASES}`);
    const sampleCases = SWEEP_GRID_CASES / 10;
    const sample_s = sweepOf('1/10');
    const projected_s = (SWEEP_GRID_CASES / sampleCases) * sample_s;
    const whole_s = projected_s <= WHOLE_SWEEP_MAX_S ? sweepOf(null) : null;
    sweep = { grid: SWEEP_GRID.filter((a) => a !== '--vary'), cases: SWEEP_GRID_CASES, workers, start_s, sampleCases, sample_s, projected_s, whole_s };
  } catch (e) {
    sweep = { error: e instanceof Error ? e.message : String(e) };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  return { bundle: problem, runs, help_s: median(help), fly_s: median(fly), nodeBare_s: median(bare), sweep };
}

/** The timings as text lines. */
export function formatCliTiming(t: CliTiming): string {
  const ms = (x: number) => `${(x * 1000).toFixed(0)} ms`;
  const lines = [
    `Command line (whole process, median of ${t.runs}${t.bundle === null ? ', bundled' : `; NOT bundled: the bundle ${t.bundle}`}):`,
    `  node -e 0 (Node's own start) ${ms(t.nodeBare_s)}; blockwise --help ${ms(t.help_s)}; blockwise fly <demo> ${ms(t.fly_s)}`,
  ];
  const s = t.sweep;
  if ('error' in s) lines.push(`  sweep: not run (${s.error})`);
  else {
    const whole =
      s.whole_s === null
        ? `not flown whole (projected above ${WHOLE_SWEEP_MAX_S} s)`
        : `flown whole: ${s.whole_s.toFixed(2)} s (${(s.cases / s.whole_s).toFixed(0)} cases/s)`;
    lines.push(
      `  sweep of ${s.cases.toLocaleString('en-US')} demo cases (${s.grid.join(' x ')}) on ${s.workers} workers: start-up ${ms(s.start_s)}; ` +
        `${s.sampleCases.toLocaleString('en-US')} cases (--shard 1/10) ${s.sample_s.toFixed(2)} s, so at most ${s.projected_s.toFixed(1)} s for all; ${whole}`,
    );
  }
  return lines.join('\n');
}
