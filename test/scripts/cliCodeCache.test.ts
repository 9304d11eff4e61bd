import { spawnSync } from 'node:child_process';
import { chmodSync, copyFileSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
// @ts-expect-error plain .mjs build script without types
import { buildCli } from '../../scripts/buildCli.mjs';
// @ts-expect-error plain .mjs start-up code without types
import { bundleKey, readCacheFile, runKey, writeCacheFile } from '../../bin/cliCodeCache.mjs';
import { DEMO_PROJECT, repoRoot, run } from '../cli/support/cliRun';

// Task brief (issue 13): the bundled command line starts from V8's code cache
// (bin/cliCodeCache.mjs). A run prints the same with or without the cache; a
// changed bundle, a damaged or refused cache and a folder that cannot be
// written are never errors, only a start without the cache. The reference is
// the command line run in-process from the TypeScript sources.

const scratch = mkdtempSync(join(tmpdir(), 'blockwise-code-cache-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));
const helper = resolve(__dirname, 'support', 'runBundleWith.mjs');

const keyOf = (bytes: Buffer): string => bundleKey(bytes) as string;

describe('bin/cliCodeCache.mjs files', () => {
  const file = join(scratch, 'files', 'fly-x.v8cache');
  const data = Buffer.from(Array.from({ length: 4096 }, (_, i) => (i * 31) % 256));

  it('a cache file written is read back byte for byte', () => {
    expect(writeCacheFile(file, data)).toBe(true);
    expect(Buffer.compare(readCacheFile(file) as Buffer, data)).toBe(0);
    expect(readdirSync(join(scratch, 'files'))).toEqual(['fly-x.v8cache']); // no temporary file left
  });
  it('a damaged, cut or foreign cache file reads as none', () => {
    writeCacheFile(file, data);
    const bytes = readFileSync(file);
    const flipped = Buffer.from(bytes);
    flipped[bytes.length - 100] ^= 0x01;
    writeFileSync(file, flipped);
    expect(readCacheFile(file)).toBeNull();
    writeFileSync(file, bytes.subarray(0, bytes.length - 1));
    expect(readCacheFile(file)).toBeNull();
    writeFileSync(file, Buffer.concat([Buffer.from('NOTOURS!'), bytes.subarray(8)]));
    expect(readCacheFile(file)).toBeNull();
    writeFileSync(file, '');
    expect(readCacheFile(file)).toBeNull();
    expect(readCacheFile(join(scratch, 'files', 'absent.v8cache'))).toBeNull();
  });
  it('writing into a folder that cannot be made fails quietly and leaves nothing', () => {
    const blocker = join(scratch, 'files', 'a-file');
    writeFileSync(blocker, 'x');
    expect(writeCacheFile(join(blocker, 'sub', 'fly-x.v8cache'), data)).toBe(false);
    expect(readFileSync(blocker, 'utf8')).toBe('x');
  });
  it('runKey names a run by its verb words, and --help apart', () => {
    expect(runKey(['fly', 'fixtures/demo/demo.blockwise.json', '--json'])).toBe('fly');
    expect(runKey(['deck', 'check', 'x.csv'])).toBe('deck-check');
    expect(runKey(['cycle', 'point', 'c.json'])).toBe('cycle-point');
    expect(runKey(['fly', '--help'])).toBe('fly-help');
    expect(runKey(['--help'])).toBe('help');
    expect(runKey([])).toBe('help');
    expect(runKey(['../x', 'fly'])).toBe('other');
  });
  it('bundleKey changes with one byte of the bundle', () => {
    const a = Buffer.from('console.log(1);\n');
    expect(keyOf(a)).toBe(keyOf(Buffer.from(a)));
    expect(keyOf(a)).not.toBe(keyOf(Buffer.from('console.log(2);\n')));
    expect(keyOf(a)).not.toBe(keyOf(Buffer.from('console.log(1);\n\n')));
  });
});

describe('the bundle started through the code cache', () => {
  const dist = join(scratch, 'dist');
  const bundle = join(dist, 'blockwise.cjs');
  let fromSources = { code: 0, out: '' };
  beforeAll(async () => {
    await buildCli(dist);
    const r = await run('fly', DEMO_PROJECT, '--json');
    fromSources = { code: r.code, out: r.out };
  }, 120_000);

  function start(cacheFolder: string, argv: readonly string[], bundlePath = bundle) {
    const statusFile = join(scratch, 'status');
    rmSync(statusFile, { force: true });
    const r = spawnSync(process.execPath, [helper, bundlePath, cacheFolder, statusFile, ...argv], { cwd: repoRoot, encoding: 'utf8', timeout: 60_000 });
    return { code: r.status, out: r.stdout, err: r.stderr, cache: existsSync(statusFile) ? readFileSync(statusFile, 'utf8') : '(none written)' };
  }
  const flyDemo = ['fly', DEMO_PROJECT, '--json'] as const;
  const cacheFiles = (folder: string): string[] => (existsSync(folder) ? readdirSync(folder).sort() : []);

  it('the first run makes the cache, the second uses it, and both print what the sources print', () => {
    const folder = join(scratch, 'c1');
    const first = start(folder, flyDemo);
    expect(first).toMatchObject({ code: fromSources.code, out: fromSources.out, err: '', cache: 'none' });
    const files = cacheFiles(folder);
    expect(files).toEqual([`fly-${keyOf(readFileSync(bundle))}.v8cache`]);
    const second = start(folder, flyDemo);
    expect(second).toMatchObject({ code: fromSources.code, out: fromSources.out, err: '', cache: 'used' });
    expect(cacheFiles(folder)).toEqual(files);
  }, 60_000);

  it('a changed bundle does not take the old cache: it makes its own', () => {
    const folder = join(scratch, 'c2');
    start(folder, flyDemo);
    const changedDir = join(scratch, 'changed');
    mkdirSync(changedDir, { recursive: true });
    const changed = join(changedDir, 'blockwise.cjs');
    copyFileSync(bundle, changed);
    writeFileSync(changed, '\n// changed\n', { flag: 'a' });
    for (const f of readdirSync(dist)) if (f.endsWith('.mjs')) copyFileSync(join(dist, f), join(changedDir, f));
    const r = start(folder, flyDemo, changed);
    expect(r).toMatchObject({ out: fromSources.out, err: '', cache: 'none' });
    expect(cacheFiles(folder)).toHaveLength(2);
    expect(start(folder, flyDemo, changed).cache).toBe('used');
  }, 60_000);

  it('a damaged cache file is passed over and made again; a cache V8 refuses is too', () => {
    const folder = join(scratch, 'c3');
    start(folder, flyDemo);
    const file = join(folder, cacheFiles(folder)[0]!);
    const bytes = readFileSync(file);
    bytes[Math.floor(bytes.length / 2)] ^= 0xff;
    writeFileSync(file, bytes);
    expect(start(folder, flyDemo)).toMatchObject({ out: fromSources.out, err: '', cache: 'none' });
    expect(start(folder, flyDemo).cache).toBe('used');
    // Well-formed for our checks (CRC and length right) but not V8's data: V8 refuses it, the run goes on without.
    writeCacheFile(file, Buffer.alloc(4096, 7));
    expect(start(folder, flyDemo)).toMatchObject({ out: fromSources.out, err: '', cache: 'refused' });
    expect(start(folder, flyDemo).cache).toBe('used');
  }, 60_000);

  it('a cache folder that cannot be written changes nothing but the cache', () => {
    const blocker = join(scratch, 'not-a-folder');
    writeFileSync(blocker, 'x');
    const folder = join(blocker, 'cache');
    expect(start(folder, flyDemo)).toMatchObject({ code: fromSources.code, out: fromSources.out, err: '', cache: 'none' });
    expect(start(folder, flyDemo)).toMatchObject({ out: fromSources.out, err: '', cache: 'none' });
  }, 60_000);

  it('when the first folder cannot be written the cache goes to the next (a read-only install)', () => {
    const blocker = join(scratch, 'read-only-install');
    writeFileSync(blocker, 'x');
    const fallback = join(scratch, 'c6');
    const folders = `${join(blocker, 'v8-cache')},${fallback}`;
    expect(start(folders, flyDemo)).toMatchObject({ out: fromSources.out, err: '', cache: 'none' });
    expect(cacheFiles(fallback)).toHaveLength(1);
    expect(start(folders, flyDemo)).toMatchObject({ out: fromSources.out, err: '', cache: 'used' });
  }, 60_000);

  it('a cache in a folder others may write is not read', () => {
    const folder = join(scratch, 'c7');
    start(folder, flyDemo);
    chmodSync(folder, 0o777);
    expect(start(folder, flyDemo)).toMatchObject({ out: fromSources.out, err: '', cache: 'none' });
    chmodSync(folder, 0o700);
    expect(start(folder, flyDemo).cache).toBe('used');
  }, 60_000);

  it('a run that fails leaves no cache; BLOCKWISE_CODE_CACHE=0 runs without one', () => {
    const folder = join(scratch, 'c4');
    const bad = start(folder, ['fly', 'no-such-project.blockwise.json']);
    expect(bad.code).toBe(1);
    expect(bad.err).toContain('no-such-project.blockwise.json');
    expect(cacheFiles(folder)).toEqual([]);
    const statusFile = join(scratch, 'status-off');
    const off = spawnSync(process.execPath, [helper, bundle, folder, statusFile, ...flyDemo], {
      cwd: repoRoot,
      encoding: 'utf8',
      timeout: 60_000,
      env: { ...process.env, BLOCKWISE_CODE_CACHE: '0' },
    });
    expect(off.stdout).toBe(fromSources.out);
    expect(readFileSync(statusFile, 'utf8')).toBe('off');
    expect(cacheFiles(folder)).toEqual([]);
  }, 60_000);

  it('a sweep started from the cached script still runs its worker threads', () => {
    const folder = join(scratch, 'c5');
    const out = join(scratch, 'sweep.csv');
    const argv = ['sweep', DEMO_PROJECT, '--vary', 'mission.solve.range=1000nmi:1100nmi:100nmi', '--workers', '2', '--out', out];
    for (const expected of ['none', 'used']) {
      rmSync(out, { force: true });
      const r = start(folder, argv);
      expect(r).toMatchObject({ code: 0, cache: expected });
      expect(readFileSync(out, 'utf8').trim().split('\n').filter((l) => !l.startsWith('#'))).toHaveLength(3); // header and 2 cases
    }
  }, 120_000);
});
