import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
// @ts-expect-error plain .mjs build script without types
import { buildCli } from '../../scripts/buildCli.mjs';
import { DEMO_PROJECT, repoRoot, run } from '../cli/support/cliRun';

// Task brief (issue 13): bin/blockwise.mjs starts the bundle when it is
// current, prints the overview from the text the build saved, and runs the
// TypeScript sources, saying so on stderr, when the bundle (or the overview's
// part of it) is missing or older than its sources: a stale bundle never runs
// old code. The reference is the command line run in-process from the
// sources. The start runs in a scratch root whose bin/ is a copy and whose
// sources are links to the repository's, so the repository's own bundle is
// never touched; "changed" is a recorded modification time moved in the
// scratch inputs.json (the repository's files are never touched either).

const repo = resolve(__dirname, '..', '..');
const scratch = mkdtempSync(join(tmpdir(), 'blockwise-bin-start-'));
const dist = join(scratch, 'dist-cli');
const FALLBACK = '; running the TypeScript sources (slower start; "npm run build:cli" rebuilds it)\n';
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

type Listed = { inputs: [string, number, number][]; overview: [string, number, number][] };
let listedText = '';

beforeAll(async () => {
  mkdirSync(join(scratch, 'bin'));
  for (const f of ['blockwise.mjs', 'cliBundle.mjs', 'cliCodeCache.mjs']) copyFileSync(join(repo, 'bin', f), join(scratch, 'bin', f));
  for (const f of ['cli', 'engine', 'hostio', 'node_modules', 'fixtures', 'package.json']) symlinkSync(join(repo, f), join(scratch, f));
  await buildCli(dist);
  listedText = readFileSync(join(dist, 'inputs.json'), 'utf8');
}, 120_000);

function start(...argv: string[]) {
  const r = spawnSync(process.execPath, [join(scratch, 'bin', 'blockwise.mjs'), ...argv], { cwd: repoRoot, encoding: 'utf8', timeout: 120_000, env: { ...process.env, BLOCKWISE_CODE_CACHE: '0' } });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

/** Rewrites the scratch inputs.json as if `file` had another modification time at the build. */
function recordedAsChanged(file: string): void {
  const listed = JSON.parse(listedText) as Listed;
  for (const list of [listed.inputs, listed.overview]) for (const entry of list) if (entry[0] === file) entry[1] -= 1000;
  writeFileSync(join(dist, 'inputs.json'), JSON.stringify(listed));
}

describe('bin/blockwise.mjs', () => {
  it('a current bundle: the overview and fly print what the sources print, with nothing on stderr', async () => {
    writeFileSync(join(dist, 'inputs.json'), listedText);
    const help = await run('--help');
    expect(start('--help')).toEqual({ code: 0, out: help.out, err: '' });
    expect(start()).toEqual({ code: 2, out: help.out, err: '' });
    const fly = await run('fly', DEMO_PROJECT, '--json');
    expect(start('fly', DEMO_PROJECT, '--json')).toEqual({ code: fly.code, out: fly.out, err: '' });
  }, 120_000);

  it("a verb's source changed: fly runs the sources and says which file; the overview does not depend on it", async () => {
    recordedAsChanged('engine/propulsion/deckCsv.ts');
    const fly = await run('fly', DEMO_PROJECT, '--json');
    expect(start('fly', DEMO_PROJECT, '--json')).toEqual({ code: fly.code, out: fly.out, err: `blockwise: the built command line is older than the sources (engine/propulsion/deckCsv.ts changed)${FALLBACK}` });
    expect(start('-h')).toEqual({ code: 0, out: (await run('-h')).out, err: '' });
  }, 120_000);

  it("the overview's source changed: the overview runs from the sources too, and says so", async () => {
    recordedAsChanged('cli/verbs/catalogue.ts');
    expect(start('help')).toEqual({ code: 0, out: (await run('help')).out, err: `blockwise: the built command line is older than the sources (cli/verbs/catalogue.ts changed)${FALLBACK}` });
  }, 120_000);

  it('no saved overview text: the overview comes from the bundle; no bundle: the sources, and it says so', async () => {
    writeFileSync(join(dist, 'inputs.json'), listedText);
    const overview = readFileSync(join(dist, 'overview.txt'));
    rmSync(join(dist, 'overview.txt'));
    const help = await run('--help');
    expect(start('--help')).toEqual({ code: 0, out: help.out, err: '' });
    rmSync(join(dist, 'blockwise.cjs'));
    writeFileSync(join(dist, 'overview.txt'), overview);
    expect(start('--help')).toEqual({ code: 0, out: help.out, err: '' }); // the overview needs only its text
    const air = await run('air', '--altitude', '11000 m', '--json');
    expect(start('air', '--altitude', '11000 m', '--json')).toEqual({ code: air.code, out: air.out, err: `blockwise: the built command line is not built${FALLBACK}` });
  }, 120_000);
});
