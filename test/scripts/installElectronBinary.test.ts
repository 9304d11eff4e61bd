import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';

// The README's `npm ci` must finish whether or not Electron's binary can be
// downloaded (DEVELOPERS.md, "Installing Electron"). The script is run from a
// scratch folder with a stand-in electron package, so no test downloads anything.

const script = resolve(__dirname, '..', '..', 'scripts', 'installElectronBinary.mjs');
const folders: string[] = [];

function scratch(installJs: string | null): string {
  const dir = mkdtempSync(join(tmpdir(), 'blockwise-install-'));
  folders.push(dir);
  mkdirSync(join(dir, 'scripts'));
  copyFileSync(script, join(dir, 'scripts', 'installElectronBinary.mjs'));
  if (installJs !== null) {
    const electron = join(dir, 'node_modules', 'electron');
    mkdirSync(electron, { recursive: true });
    writeFileSync(join(electron, 'package.json'), '{"name":"electron","version":"0.0.0"}');
    writeFileSync(join(electron, 'install.js'), installJs);
  }
  return dir;
}

function run(dir: string, env: Record<string, string | undefined> = {}) {
  const clean: NodeJS.ProcessEnv = { ...process.env, ...env };
  delete clean.ELECTRON_SKIP_BINARY_DOWNLOAD;
  if (env.ELECTRON_SKIP_BINARY_DOWNLOAD !== undefined) clean.ELECTRON_SKIP_BINARY_DOWNLOAD = env.ELECTRON_SKIP_BINARY_DOWNLOAD;
  return spawnSync(process.execPath, [join(dir, 'scripts', 'installElectronBinary.mjs')], { cwd: dir, env: clean, encoding: 'utf8' });
}

afterEach(() => {
  for (const dir of folders.splice(0)) rmSync(dir, { recursive: true, force: true });
});

describe('scripts/installElectronBinary.mjs', () => {
  it('installElectronBinary finishes the install with one line when the download fails', () => {
    const dir = scratch("console.error('RequestError: getaddrinfo ENOTFOUND downloads.invalid'); process.exit(1);");
    const r = run(dir);
    expect(r.status).toBe(0);
    const lines = r.stderr.trim().split('\n');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/Electron binary could not be downloaded \(RequestError: getaddrinfo ENOTFOUND downloads\.invalid\)/);
    expect(lines[0]).toContain('npm run web');
  });

  it('installElectronBinary is silent when electron’s install script succeeds', () => {
    const dir = scratch("require('fs').writeFileSync(require('path').join(__dirname, 'ran'), 'yes');");
    const r = run(dir);
    expect(r.status).toBe(0);
    expect(r.stderr).toBe('');
    expect(spawnSync('cat', [join(dir, 'node_modules', 'electron', 'ran')], { encoding: 'utf8' }).stdout).toBe('yes');
  });

  it('installElectronBinary skips the download under ELECTRON_SKIP_BINARY_DOWNLOAD and says so', () => {
    const dir = scratch("require('fs').writeFileSync(require('path').join(__dirname, 'ran'), 'yes'); process.exit(1);");
    const r = run(dir, { ELECTRON_SKIP_BINARY_DOWNLOAD: '1' });
    expect(r.status).toBe(0);
    expect(r.stderr).toMatch(/ELECTRON_SKIP_BINARY_DOWNLOAD is set/);
    expect(spawnSync('test', ['-e', join(dir, 'node_modules', 'electron', 'ran')]).status).toBe(1);
  });

  it('installElectronBinary bounds a download that hangs by BLOCKWISE_ELECTRON_TIMEOUT_S', () => {
    const dir = scratch('setTimeout(() => {}, 60_000);');
    const r = run(dir, { BLOCKWISE_ELECTRON_TIMEOUT_S: '1' });
    expect(r.status).toBe(0);
    expect(r.stderr).toMatch(/could not be downloaded \(.*ETIMEDOUT.*\)/);
  });

  it('installElectronBinary does nothing where electron is not installed (a production install)', () => {
    const dir = scratch(null);
    const r = run(dir);
    expect(r.status).toBe(0);
    expect(r.stderr).toBe('');
  });

  it('package.json denies electron’s own install script and runs this one after the install', () => {
    const pkg = JSON.parse(readFileSync(resolve(__dirname, '..', '..', 'package.json'), 'utf8')) as {
      scripts: Record<string, string>;
      allowScripts: Record<string, boolean>;
    };
    expect(pkg.allowScripts.electron).toBe(false);
    expect(pkg.scripts.postinstall).toContain('scripts/installElectronBinary.mjs');
  });
});
