/**
 * Whole-process timings of the command line as a person runs it
 * (`node bin/blockwise.mjs ...`): start-up for `--help`, flying the demo,
 * and the sweep's throughput on a grid of demo-class cases over all cores.
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
  readonly sweep: { readonly cases: number; readonly workers: number; readonly wall_s: number; readonly casesPerSecond: number; readonly tenThousand_s: number } | { readonly error: string };
}

function wall(args: readonly string[]): number {
  const t0 = performance.now();
  const r = spawnSync(process.execPath, args, { cwd: repo, encoding: 'utf8', timeout: 600_000 });
  const t = (performance.now() - t0) / 1000;
  if (r.status !== 0) throw new Error(`${args.join(' ')} exited with ${r.status}: ${r.stderr.trim().split('\n')[0] ?? ''}`);
  return t;
}

/** Medians of `runs` start-ups, and one sweep of `sweepCases` demo cases (ranges 1,000-3,000 nmi) over every core. */
export function runCliTiming(runs = 9, sweepCases = 400): CliTiming {
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
    const step = 2000 / Math.max(sweepCases - 1, 1);
    const t = wall([bin, 'sweep', demo, '--vary', `mission.solve.range=1000nmi:3000nmi:${step}nmi`, '--out', join(dir, 'sweep.csv'), '--workers', String(workers)]);
    const cases = Math.floor(2000 / step + 1e-9) + 1;
    sweep = { cases, workers, wall_s: t, casesPerSecond: cases / t, tenThousand_s: (10000 * t) / cases };
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
  else lines.push(`  sweep of ${s.cases} demo cases on ${s.workers} workers: ${s.wall_s.toFixed(2)} s (${s.casesPerSecond.toFixed(1)} cases/s; 10,000 cases at this rate: ${s.tenThousand_s.toFixed(0)} s)`);
  return lines.join('\n');
}
