import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
// @ts-expect-error plain .mjs build script without types
import { buildCli } from '../../scripts/buildCli.mjs';
// @ts-expect-error plain .mjs start-up check without types
import { bundleProblem } from '../../bin/cliBundle.mjs';
import { DEMO_PROJECT, repoRoot, run } from '../cli/support/cliRun';

// Task brief (issue 13): the command line is bundled at install; the bundle
// gives the same output as the TypeScript sources, and a bundle older than
// its sources is never run.

const repo = resolve(__dirname, '..', '..');
const scratch = mkdtempSync(join(tmpdir(), 'blockwise-cli-bundle-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe('scripts/buildCli.mjs', () => {
  it('buildCli bundles the CLI, whose both builds print the same fly JSON and overview as the sources', async () => {
    const out = join(scratch, 'dist');
    const built = (await buildCli(out)) as { inputs: number };
    expect(built.inputs).toBeGreaterThan(50);
    expect(bundleProblem(pathToFileURL(`${repo}/`), pathToFileURL(`${out}/`))).toBeNull();

    const bundled = spawnSync(process.execPath, [join(out, 'blockwise.mjs'), 'fly', DEMO_PROJECT, '--json'], { cwd: repoRoot, encoding: 'utf8', timeout: 60_000 });
    expect(bundled.stderr).toBe('');
    const sources = await run('fly', DEMO_PROJECT, '--json');
    expect(bundled.status).toBe(sources.code);
    expect(bundled.stdout).toBe(sources.out);

    const script = spawnSync(process.execPath, [join(out, 'blockwise.cjs'), 'fly', DEMO_PROJECT, '--json'], { cwd: repoRoot, encoding: 'utf8', timeout: 60_000 });
    expect(script.stderr).toBe('');
    expect(script.status).toBe(sources.code);
    expect(script.stdout).toBe(sources.out);

    const overview = (await run('--help')).out;
    expect(readFileSync(join(out, 'overview.txt'), 'utf8')).toBe(overview);
    // The overview's own inputs: the modules it loads (the catalogue), not those of a verb (the deck reader).
    expect(bundleProblem(pathToFileURL(`${repo}/`), pathToFileURL(`${out}/`), 'overview')).toBeNull();
    const listed = JSON.parse(readFileSync(join(out, 'inputs.json'), 'utf8')) as { inputs: [string][]; overview: [string][] };
    const overviewFiles = listed.overview.map(([f]) => f);
    expect(overviewFiles).toContain('cli/verbs/catalogue.ts');
    expect(overviewFiles).toContain('cli/main.ts');
    expect(overviewFiles).not.toContain('engine/propulsion/deckCsv.ts');
    expect(listed.inputs.map(([f]) => f)).toEqual(expect.arrayContaining(overviewFiles));
    for (const file of ['blockwise.mjs', 'blockwise.cjs']) {
      const help = spawnSync(process.execPath, [join(out, file), '--help'], { cwd: repoRoot, encoding: 'utf8', timeout: 60_000 });
      expect(help.status).toBe(0);
      expect(help.stdout).toBe(overview);
    }
  }, 120_000);
});

describe('bin/cliBundle.mjs', () => {
  const root = join(scratch, 'root');
  const dist = join(scratch, 'root', 'dist');
  const source = join(root, 'a.ts');
  /** The one source of the overview (inputs.json `overview`); a.ts is only in the verbs. */
  const other = join(root, 'b.ts');
  function writeBundle(mtime_s: number): void {
    spawnSync('mkdir', ['-p', dist]);
    writeFileSync(source, 'export const a = 1;\n');
    utimesSync(source, mtime_s, mtime_s);
    writeFileSync(join(dist, 'blockwise.mjs'), '');
    writeFileSync(join(dist, 'blockwise.cjs'), '');
    writeFileSync(join(dist, 'overview.txt'), 'overview\n');
    writeFileSync(join(dist, 'inputs.json'), JSON.stringify({ inputs: [['a.ts', mtime_s * 1000, 20], ['b.ts', mtime_s * 1000, 20]], overview: [['b.ts', mtime_s * 1000, 20]] }));
    writeFileSync(other, 'export const b = 1;\n');
    utimesSync(other, mtime_s, mtime_s);
  }
  const check = () => bundleProblem(pathToFileURL(`${root}/`), pathToFileURL(`${dist}/`)) as string | null;
  const checkOverview = () => bundleProblem(pathToFileURL(`${root}/`), pathToFileURL(`${dist}/`), 'overview') as string | null;

  it('bundleProblem is null while every source keeps its recorded time and size', () => {
    writeBundle(1_700_000_000);
    expect(check()).toBeNull();
  });
  it('bundleProblem names the source that changed after the build', () => {
    writeBundle(1_700_000_000);
    utimesSync(source, 1_700_000_001, 1_700_000_001);
    expect(check()).toBe('is older than the sources (a.ts changed)');
    writeBundle(1_700_000_000);
    writeFileSync(source, 'export const a = 12;\n');
    utimesSync(source, 1_700_000_000, 1_700_000_000);
    expect(check()).toBe('is older than the sources (a.ts changed)');
  });
  it('bundleProblem says the bundle is not built when inputs.json or the bundle is missing', () => {
    writeBundle(1_700_000_000);
    rmSync(join(dist, 'blockwise.mjs'));
    expect(check()).toBe('is not built');
    writeBundle(1_700_000_000);
    rmSync(join(dist, 'blockwise.cjs'));
    expect(check()).toBe('is not built');
    rmSync(dist, { recursive: true });
    expect(check()).toBe('is not built');
  });
  it("bundleProblem 'overview' checks only the overview's sources and its text", () => {
    writeBundle(1_700_000_000);
    expect(checkOverview()).toBeNull();
    utimesSync(source, 1_700_000_001, 1_700_000_001);
    expect(check()).toBe('is older than the sources (a.ts changed)');
    expect(checkOverview()).toBeNull(); // a.ts is not in the overview
    writeBundle(1_700_000_000);
    writeFileSync(other, 'export const b = 12;\n');
    utimesSync(other, 1_700_000_000, 1_700_000_000);
    expect(checkOverview()).toBe('is older than the sources (b.ts changed)');
    expect(check()).toBe('is older than the sources (b.ts changed)');
    writeBundle(1_700_000_000);
    rmSync(join(dist, 'overview.txt'));
    expect(checkOverview()).toBe('is not built');
    writeFileSync(join(dist, 'inputs.json'), JSON.stringify({ inputs: [['a.ts', 1_700_000_000_000, 20]] }));
    writeFileSync(join(dist, 'overview.txt'), 'overview\n');
    expect(checkOverview()).toBe('is not built (inputs.json has no overview list)');
  });
  it('bundleProblem says which source is gone', () => {
    writeBundle(1_700_000_000);
    rmSync(source);
    expect(check()).toBe('is older than the sources (a.ts is gone)');
  });
});
