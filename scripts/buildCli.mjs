// Bundles the command line (cli/run.ts and everything it imports) into
// dist-cli/ with the esbuild that vite already brings, so `node bin/blockwise.mjs`
// starts without compiling TypeScript. Run by the root package's `prepare`
// script, so `npm ci` leaves the bundle ready; `npm run build:cli` rebuilds it.
//
// Beside the bundle, dist-cli/inputs.json lists every source file that went
// into it with its modification time and size; bin/blockwise.mjs compares them
// before each start and runs the TypeScript sources instead when any differs,
// so a stale bundle never runs old code.
import { statSync, writeFileSync, rmSync } from 'node:fs';
import { dirname, resolve, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import process from 'node:process';

const repo = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const outDir = resolve(repo, 'dist-cli');

/** The bundle's entry points: the command line, and the thread a sweep runs its cases on. */
export const CLI_ENTRIES = { blockwise: 'cli/run.ts', sweepWorker: 'cli/sweep/sweepWorker.ts' };

/** Builds the bundle into `into` (default dist-cli/); returns the folder and the number of source files in it. */
export async function buildCli(into = outDir) {
  const { build } = await import('esbuild');
  rmSync(into, { recursive: true, force: true });
  const result = await build({
    absWorkingDir: repo,
    entryPoints: Object.fromEntries(Object.entries(CLI_ENTRIES).map(([name, file]) => [name, resolve(repo, file)])),
    outdir: into,
    outExtension: { '.js': '.mjs' },
    bundle: true,
    splitting: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    minify: true,
    sourcemap: 'linked',
    metafile: true,
    logLevel: 'warning',
  });
  const inputs = Object.keys(result.metafile.inputs).map((file) => {
    const s = statSync(resolve(repo, file));
    return [relative(repo, resolve(repo, file)).split('\\').join('/'), s.mtimeMs, s.size];
  });
  writeFileSync(resolve(into, 'inputs.json'), `${JSON.stringify({ inputs })}\n`);
  return { outDir: into, inputs: inputs.length };
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  try {
    const { outDir: out, inputs } = await buildCli();
    process.stdout.write(`blockwise: command line bundled into ${relative(repo, out)}/ (${inputs} source files)\n`);
  } catch (e) {
    // An install without the dev dependencies has no esbuild: the CLI then
    // runs from the TypeScript sources (bin/blockwise.mjs says so). Never fail
    // the install for it.
    process.stdout.write(`blockwise: command line not bundled (${e instanceof Error ? e.message.split('\n')[0] : String(e)}); it will run from the TypeScript sources\n`);
  }
}
