/**
 * Running the command line in-process for the CLI tests, and the light copy
 * of the demo project the slower analyses use.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll } from 'vitest';
import { runCli } from '../../../cli/main';
import { scratchFolderForSuite } from '../../support/scratchFolder';

/** The repository root (the tests run the CLI with it as working folder). */
export const repoRoot = fileURLToPath(new URL('../../..', import.meta.url));
/** The demo project, relative to repoRoot. */
export const DEMO_PROJECT = 'fixtures/demo/demo.blockwise.json';
/** The demo deck, relative to repoRoot. */
export const DEMO_DECK = 'fixtures/demo/demo-engine.deck.csv';

export type Json = Record<string, unknown>;

export interface Run {
  readonly code: number;
  readonly out: string;
  readonly err: string;
}

/** Runs `blockwise <argv>` in-process from repoRoot, collecting stdout, stderr and the exit code. */
export async function run(...argv: string[]): Promise<Run> {
  let out = '';
  let err = '';
  const code = await runCli(argv, { out: (t) => (out += t), err: (t) => (err += t), cwd: repoRoot });
  return { code, out, err };
}

/**
 * Writes into `dir` a lighter copy of the demo mission (`range` at constant
 * cruise altitude, deck path made absolute) and returns its path, so that
 * 16-mission comparisons and trade factors stay light and block fuel is
 * smooth in perturbations (no step-climb decisions).
 */
export function writeShortDemo(dir: string, range = '800 nmi'): string {
  const demo = JSON.parse(readFileSync(join(repoRoot, DEMO_PROJECT), 'utf8')) as Json & { engine: { deck: Json }; mission: { solve: Json; legs: Json[] } };
  if (demo.engine.deck.kind === 'file') demo.engine.deck.path = join(repoRoot, 'fixtures/demo', String(demo.engine.deck.path));
  demo.mission.solve = { ...demo.mission.solve, range };
  for (const leg of demo.mission.legs) if (leg.kind === 'cruise') leg.profile = { kind: 'constantAltitude' };
  const path = join(dir, 'short.blockwise.json');
  writeFileSync(path, JSON.stringify(demo, null, 2));
  return path;
}

/**
 * A scratch folder for the suite this is called in (a describe block, or the file at its top level) holding a short
 * demo project (writeShortDemo, flown to `range`): `dir()` is the folder, `project()` the project file.
 */
export function shortDemoForSuite(prefix: string, range?: string): { readonly dir: () => string; readonly project: () => string } {
  const dir = scratchFolderForSuite(prefix);
  let project: string | undefined;
  beforeAll(() => {
    project = writeShortDemo(dir(), range);
  });
  return {
    dir,
    project: () => {
      if (project === undefined) throw new Error('shortDemoForSuite: the project exists only while its tests run');
      return project;
    },
  };
}
