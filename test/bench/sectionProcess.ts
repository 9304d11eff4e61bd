/**
 * Each bench section in a process of its own. Timed in one process after the
 * others, a section's cases ran on code the JIT had specialised for the
 * earlier sections' models (the converged demo mission read 10 to 50 % slower
 * after the analyses than with its section alone, docs/benchmarks.md), so a
 * row depended on which filters the run was given. A child is this same
 * script with `--one-section <file>`: it times that section alone and writes
 * its results as JSON on stdout.
 */
import { spawnSync } from 'node:child_process';
import type { BenchResult } from './benchTypes';

export const ONE_SECTION_FLAG = '--one-section';

/** What one child gave: its results, or why there are none (the child's exit and the end of its error output). */
export type SectionOutcome =
  | { readonly ok: true; readonly results: readonly BenchResult[] }
  | { readonly ok: false; readonly file: string; readonly reason: string };

function isResult(v: unknown): v is BenchResult {
  if (typeof v !== 'object' || v === null) return false;
  const r = v as Record<string, unknown>;
  return typeof r.section === 'string' && typeof r.name === 'string' && typeof r.opsPerSecond === 'number' && typeof r.medianCall_s === 'number' && typeof r.calls === 'number';
}

/** Reads a child's stdout: a JSON array of results, else why not. */
export function parseSectionOutput(file: string, stdout: string): SectionOutcome {
  let value: unknown;
  try {
    value = JSON.parse(stdout);
  } catch {
    return { ok: false, file, reason: `its output is not JSON (${stdout.length} characters)` };
  }
  if (!Array.isArray(value) || !value.every(isResult)) return { ok: false, file, reason: 'its output is not a list of results' };
  return { ok: true, results: value };
}

/** Runs section `file` in a child of this same script (the same runtime flags, so under tsx too) and reads its results. */
export function runSectionApart(file: string): SectionOutcome {
  const script = process.argv[1];
  if (script === undefined) return { ok: false, file, reason: 'the bench script is unknown (process.argv[1])' };
  const child = spawnSync(process.execPath, [...process.execArgv, script, ONE_SECTION_FLAG, file], {
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'inherit'],
    maxBuffer: 64 * 1024 * 1024,
  });
  if (child.error) return { ok: false, file, reason: `could not start: ${child.error.message}` };
  if (child.status !== 0) return { ok: false, file, reason: `exited with ${child.status ?? child.signal}` };
  return parseSectionOutput(file, child.stdout);
}
