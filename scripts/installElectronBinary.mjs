// Install step of the project's own (package.json "postinstall"): fetch the
// Electron binary that `npm start` needs, and never fail the install when it
// cannot be had. package.json's allowScripts denies electron's own install
// script, whose failed download would stop `npm ci` as a whole; this step
// runs that same script and, when it fails (no route to the download host,
// a proxy, a time-out), says so in one line and lets the install finish.
// Everything but `npm start` works without the binary; `npm start` then
// says so and points to `npm run web`.
//
// ELECTRON_SKIP_BINARY_DOWNLOAD=1 skips the attempt (Electron's own switch).
// BLOCKWISE_ELECTRON_TIMEOUT_S bounds it (default 300 s).
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import process from 'node:process';

const say = (text) => process.stderr.write(`blockwise install: ${text}\n`);

/** Folder of the installed electron package, or null. */
function electronFolder() {
  try {
    return dirname(createRequire(import.meta.url).resolve('electron/package.json'));
  } catch {
    return null;
  }
}

/** The last non-empty line of a child's output, cut to one readable line. */
function lastLine(text) {
  const lines = String(text ?? '').split(/\r?\n/).map((l) => l.trim()).filter((l) => l !== '');
  const line = lines.find((l) => /error|ENOTFOUND|EAI_AGAIN|ECONN|ETIMEDOUT|getaddrinfo/i.test(l)) ?? lines.at(-1) ?? '';
  return line.length > 160 ? `${line.slice(0, 157)}...` : line;
}

function main() {
  if (process.env.ELECTRON_SKIP_BINARY_DOWNLOAD) {
    say('ELECTRON_SKIP_BINARY_DOWNLOAD is set, so the Electron binary was not fetched; `npm start` needs it, `npm run web` does not.');
    return;
  }
  const folder = electronFolder();
  if (folder === null || !existsSync(join(folder, 'install.js'))) return; // a production install without devDependencies
  const timeout_s = Number(process.env.BLOCKWISE_ELECTRON_TIMEOUT_S ?? '300');
  const run = spawnSync(process.execPath, [join(folder, 'install.js')], {
    cwd: folder,
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'pipe'],
    timeout: Number.isFinite(timeout_s) && timeout_s > 0 ? timeout_s * 1000 : 300_000,
  });
  if (run.status === 0) return;
  const why = run.error ? run.error.message : lastLine(`${run.stderr}\n${run.stdout}`) || `exit code ${run.status}`;
  say(`the Electron binary could not be downloaded (${why}); everything but \`npm start\` works, and \`npm start\` will point to \`npm run web\`.`);
}

main();
