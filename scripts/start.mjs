// `npm start`: build the renderer and the desktop shell, then open the demo
// project in Electron. Where the Electron binary is missing (installed with
// ELECTRON_SKIP_BINARY_DOWNLOAD=1), say so in one sentence and exit 1.
import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, resolve } from 'node:path';
import process from 'node:process';
import { fileURLToPath } from 'node:url';

const repo = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const require = createRequire(import.meta.url);

/** The Electron binary's path, or null when the npm package has no binary. */
function electronBinary() {
  try {
    const path = require('electron');
    return typeof path === 'string' && existsSync(path) ? path : null;
  } catch {
    return null;
  }
}

const binary = electronBinary();
if (binary === null) {
  process.stderr.write(
    'blockwise: the Electron binary is not installed here, so the desktop app cannot start; ' +
      'open the browser build instead with "npm run web" (it serves on 127.0.0.1 only), ' +
      'or get the binary with "node node_modules/electron/install.js" on a machine with internet.\n',
  );
  process.exit(1);
}

const { build } = await import('vite');
const { buildElectron } = await import('./buildElectron.mjs');
await build({ configFile: resolve(repo, 'vite.config.ts'), logLevel: 'warn' });
await buildElectron();

const demo = resolve(repo, 'fixtures', 'demo', 'demo.blockwise.json');
const args = [repo, ...(existsSync(demo) ? [demo] : []), ...process.argv.slice(2)];
if (!existsSync(demo)) process.stderr.write(`blockwise: ${demo} is missing; starting with no project\n`);

const child = spawn(binary, args, { stdio: 'inherit', cwd: repo });
child.on('error', (e) => {
  process.stderr.write(`blockwise: could not start Electron at ${binary}: ${e.message}\n`);
  process.exit(1);
});
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
