// `npm run bench`: bundles the bench (test/bench/runBench.ts and the engine
// code it times) with the esbuild that vite already brings, the way the CLI
// ships (scripts/buildCli.mjs), and runs the bundle with the arguments given.
// So the figures are those of the code users run, not of tsx's per-module
// CommonJS compilation (its getters on every imported binding cost a fifth
// to a half of a mission's time). `--from-source` runs the TypeScript
// sources under tsx instead. The bundle goes to node_modules/.cache/.
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import process from 'node:process';
import { fileURLToPath, pathToFileURL } from 'node:url';

const repo = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const args = process.argv.slice(2);
const fromSource = args.includes('--from-source');
const rest = args.filter((a) => a !== '--from-source');

/** Each bundled module keeps its own import.meta.url, so the bench finds its fixtures as it does from source. */
const keepModuleUrls = {
  name: 'keep-module-urls',
  setup(build) {
    build.onLoad({ filter: /\.ts$/ }, (file) => {
      const text = readFileSync(file.path, 'utf8');
      return { contents: text.replaceAll('import.meta.url', JSON.stringify(pathToFileURL(file.path).href)), loader: 'ts' };
    });
  },
};

function run(command, commandArgs, env) {
  const child = spawnSync(command, commandArgs, { cwd: repo, stdio: 'inherit', env: { ...process.env, ...env } });
  if (child.error) {
    process.stderr.write(`bench: could not start ${command}: ${child.error.message}\n`);
    return 1;
  }
  return child.status ?? 1;
}

let code;
if (fromSource) {
  code = run(process.execPath, ['--import', 'tsx', 'test/bench/runBench.ts', ...rest], { BLOCKWISE_BENCH_BUILD: 'source' });
} else {
  const { build } = await import('esbuild');
  const outfile = resolve(repo, 'node_modules/.cache/blockwise-bench/runBench.mjs');
  await build({
    absWorkingDir: repo,
    entryPoints: [resolve(repo, 'test/bench/runBench.ts')],
    outfile,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    packages: 'external',
    plugins: [keepModuleUrls],
    logLevel: 'warning',
  });
  code = run(process.execPath, [outfile, ...rest], { BLOCKWISE_BENCH_BUILD: 'bundle' });
}
process.exit(code);
