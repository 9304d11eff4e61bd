// Bundles the command line (cli/run.ts and everything it imports) into
// dist-cli/ with the esbuild that vite already brings, so `node bin/blockwise.mjs`
// starts without compiling TypeScript. Run by the root package's `prepare`
// script, so `npm ci` leaves the bundle ready; `npm run build:cli` rebuilds it.
//
// Two builds of the same sources. A verb runs from one classic script,
// dist-cli/blockwise.cjs (CommonJS, every verb in it, ASCII only), which
// bin/cliCodeCache.mjs compiles with V8's code cache (a module graph cannot use
// one on Node 20). The ES modules split by verb (dist-cli/blockwise.mjs and
// its chunks) run an argument that starts with "-" and is not -h or --help,
// and the sweep's worker thread, dist-cli/sweepWorker.mjs, shares them.
//
// Beside the bundle, dist-cli/inputs.json lists every source file that went
// into it with its modification time and size; bin/blockwise.mjs compares them
// before each start and runs the TypeScript sources instead when any differs,
// so a stale bundle never runs old code. dist-cli/overview.txt is the
// overview as the bundle prints it, which bin/blockwise.mjs prints for
// `blockwise`, `--help`, `-h` and `help` without loading the command line.
// After the build, the code cache of
// `fly` is made by flying the demo (warmCodeCache), so the first fly after
// `npm ci` starts as fast as the later ones.
import { spawnSync } from 'node:child_process';
import { readFileSync, statSync, writeFileSync, rmSync } from 'node:fs';
import { isAscii } from 'node:buffer';
import { dirname, resolve, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import process from 'node:process';

const repo = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const outDir = resolve(repo, 'dist-cli');

/** The bundle's entry points: the command line, and the thread a sweep runs its cases on. */
export const CLI_ENTRIES = { blockwise: 'cli/run.ts', sweepWorker: 'cli/sweep/sweepWorker.ts' };

/** The name blockwise.cjs gives `import.meta.url` (cli/sweep/sweepPool.ts finds the worker beside the bundle by it). */
const IMPORT_META_URL = '__blockwiseBundleUrl';

/** Builds the bundle into `into` (default dist-cli/); returns the folder and the number of source files in it. */
export async function buildCli(into = outDir) {
  const { build } = await import('esbuild');
  rmSync(into, { recursive: true, force: true });
  const common = {
    absWorkingDir: repo,
    outdir: into,
    bundle: true,
    platform: 'node',
    target: 'node20',
    minify: true,
    sourcemap: 'linked',
    metafile: true,
    logLevel: 'warning',
  };
  const [modules, script] = await Promise.all([
    build({
      ...common,
      entryPoints: Object.fromEntries(Object.entries(CLI_ENTRIES).map(([name, file]) => [name, resolve(repo, file)])),
      outExtension: { '.js': '.mjs' },
      splitting: true,
      format: 'esm',
    }),
    build({
      ...common,
      entryPoints: { blockwise: resolve(repo, CLI_ENTRIES.blockwise) },
      outExtension: { '.js': '.cjs' },
      format: 'cjs',
      define: { 'import.meta.url': IMPORT_META_URL },
      banner: { js: `var ${IMPORT_META_URL}=require("node:url").pathToFileURL(__filename).href;` },
    }),
  ]);
  // The start reads an ASCII bundle as Latin-1, several milliseconds faster than decoding UTF-8 (either works).
  if (!isAscii(readFileSync(resolve(into, 'blockwise.cjs')))) {
    process.stderr.write('blockwise: note: dist-cli/blockwise.cjs is not ASCII (a source holds a non-ASCII regular expression?); it still runs\n');
  }
  const files = new Set([...Object.keys(modules.metafile.inputs), ...Object.keys(script.metafile.inputs)]);
  const listed = (names) =>
    [...names].map((file) => {
      const s = statSync(resolve(repo, file));
      return [relative(repo, resolve(repo, file)).split('\\').join('/'), s.mtimeMs, s.size];
    });
  const inputs = listed(files);
  writeOverview(into);
  writeFileSync(resolve(into, 'inputs.json'), `${JSON.stringify({ inputs, overview: listed(overviewInputs(modules.metafile)) })}\n`);
  return { outDir: into, inputs: inputs.length };
}

/**
 * Writes dist-cli/overview.txt, the overview (`blockwise`, `--help`, `-h`, `help`) exactly as the ES-module build
 * prints it, so bin/blockwise.mjs prints it without loading any of the command line. A bundle that cannot print
 * it is no bundle: the build fails.
 */
function writeOverview(into) {
  const r = spawnSync(process.execPath, [resolve(into, 'blockwise.mjs'), '--help'], { cwd: repo, encoding: 'buffer', timeout: 60_000 });
  if (r.status !== 0 || r.stdout.length === 0) throw new Error(`the bundle's --help exited with ${r.status}: ${String(r.stderr).trim().split('\n')[0] ?? ''}`);
  writeFileSync(resolve(into, 'overview.txt'), r.stdout);
}

/**
 * The source files of the ES-module build's entry chunk and the chunks it imports statically: all the code that
 * runs to print the overview (the verbs are imported dynamically, and only when one runs), so overview.txt is
 * current while these are (bin/cliBundle.mjs, part 'overview').
 */
function overviewInputs(metafile) {
  const outputs = metafile.outputs;
  const entry = Object.keys(outputs).find((o) => outputs[o].entryPoint === CLI_ENTRIES.blockwise);
  if (entry === undefined) throw new Error(`no output chunk for ${CLI_ENTRIES.blockwise} in the build's metafile`);
  const chunks = new Set();
  const next = [entry];
  while (next.length > 0) {
    const chunk = next.pop();
    if (chunks.has(chunk)) continue;
    chunks.add(chunk);
    for (const i of outputs[chunk].imports) if (i.kind === 'import-statement' && outputs[i.path] !== undefined) next.push(i.path);
  }
  return new Set([...chunks].flatMap((c) => Object.keys(outputs[c].inputs)));
}

/**
 * Flies the demo once through the bundled command line, so the code cache of `fly` exists before the first real
 * run (bin/cliCodeCache.mjs; the overview is printed from overview.txt and needs none). Output is dropped; a failure
 * only means the first real run makes the cache instead.
 */
export function warmCodeCache() {
  const bin = resolve(repo, 'bin', 'blockwise.mjs');
  spawnSync(process.execPath, [bin, 'fly', resolve(repo, 'fixtures', 'demo', 'demo.blockwise.json')], { cwd: repo, stdio: 'ignore', timeout: 60_000 });
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  try {
    const { outDir: out, inputs } = await buildCli();
    warmCodeCache();
    process.stdout.write(`blockwise: command line bundled into ${relative(repo, out)}/ (${inputs} source files)\n`);
  } catch (e) {
    // An install without the dev dependencies has no esbuild: the CLI then
    // runs from the TypeScript sources (bin/blockwise.mjs says so). Never fail
    // the install for it.
    process.stdout.write(`blockwise: command line not bundled (${e instanceof Error ? e.message.split('\n')[0] : String(e)}); it will run from the TypeScript sources\n`);
  }
}
