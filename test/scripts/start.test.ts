import { spawnSync } from 'node:child_process';
import { chmodSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

// Task brief: `npm start` builds main and preload, then starts the Electron
// binary with the demo project; where the binary is missing it says so in one
// sentence (with the browser build and how to get the binary) and exits non-zero.

const repo = resolve(__dirname, '..', '..');
const start = join(repo, 'scripts', 'start.mjs');

function runStart(env: NodeJS.ProcessEnv) {
  const clean = { ...process.env };
  delete clean.ELECTRON_OVERRIDE_DIST_PATH;
  return spawnSync(process.execPath, [start], { cwd: repo, env: { ...clean, ...env }, encoding: 'utf8', timeout: 120_000 });
}

describe('scripts/start.mjs', () => {
  it('start.mjs says in one sentence that the Electron binary is missing and exits 1', () => {
    // On this machine node_modules/electron has no binary (ELECTRON_SKIP_BINARY_DOWNLOAD=1), so the
    // real package is used; where a binary is installed, an empty override folder stands for "missing".
    const hasBinary = existsSync(join(repo, 'node_modules', 'electron', 'path.txt'));
    const empty = mkdtempSync(join(tmpdir(), 'blockwise-no-electron-'));
    const r = runStart(hasBinary ? { ELECTRON_OVERRIDE_DIST_PATH: empty } : {});
    rmSync(empty, { recursive: true, force: true });
    expect(r.status).toBe(1);
    expect(r.stdout).toBe('');
    const lines = r.stderr.trim().split('\n');
    expect(lines.length).toBe(1);
    expect(lines[0]).toMatch(/Electron binary is not installed/);
    expect(lines[0]).toContain('npm run web');
    expect(lines[0]).toContain('127.0.0.1');
    expect(lines[0]).toContain('node node_modules/electron/install.js');
    expect(lines[0]?.split('. ').length).toBe(1);
  });

  it('start.mjs builds the shell and starts the binary with the app folder and the demo project', () => {
    const fake = mkdtempSync(join(tmpdir(), 'blockwise-fake-electron-'));
    try {
      const record = join(fake, 'args.txt');
      const binary = join(fake, 'electron');
      writeFileSync(binary, `#!/bin/sh\nprintf '%s\\n' "$@" > "${record}"\nexit 0\n`);
      chmodSync(binary, 0o755);
      const r = runStart({ ELECTRON_OVERRIDE_DIST_PATH: fake });
      expect(r.status, r.stderr).toBe(0);
      const args = readFileSync(record, 'utf8').trim().split('\n');
      expect(args[0]).toBe(repo);
      const demo = join(repo, 'fixtures', 'demo', 'demo.blockwise.json');
      if (existsSync(demo)) expect(args[1]).toBe(demo);
      expect(existsSync(join(repo, 'dist-electron', 'main.cjs'))).toBe(true);
      expect(existsSync(join(repo, 'dist-electron', 'preload.cjs'))).toBe(true);
      expect(existsSync(join(repo, 'dist-web', 'index.html'))).toBe(true);
      // The sandboxed preload may require nothing but 'electron'.
      const preload = readFileSync(join(repo, 'dist-electron', 'preload.cjs'), 'utf8');
      expect([...preload.matchAll(/require\(["']([^"']+)["']\)/g)].map((m) => m[1])).toEqual(['electron']);
    } finally {
      rmSync(fake, { recursive: true, force: true });
    }
  }, 180_000);
});
