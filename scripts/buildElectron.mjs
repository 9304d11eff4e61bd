// Builds the desktop shell's main process and preload (electron/*.ts) into
// dist-electron/main.cjs and dist-electron/preload.cjs with Vite's library
// mode. The preload runs sandboxed, so it must be one CommonJS file that
// requires nothing but 'electron'.
import { builtinModules } from 'node:module';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import process from 'node:process';
import { build } from 'vite';

const repo = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const outDir = resolve(repo, 'dist-electron');
const nodeExternals = ['electron', ...builtinModules, ...builtinModules.map((m) => `node:${m}`)];

/** Bundles one electron/ entry to dist-electron/<name>.cjs. */
async function bundle(entry, name, external) {
  await build({
    configFile: false,
    root: repo,
    logLevel: 'warn',
    build: {
      outDir,
      emptyOutDir: false,
      target: 'node20',
      minify: false,
      sourcemap: true,
      lib: { entry: resolve(repo, 'electron', entry), formats: ['cjs'], fileName: () => `${name}.cjs` },
      rollupOptions: { external },
    },
  });
}

export async function buildElectron() {
  await bundle('main.ts', 'main', nodeExternals);
  await bundle('preload.ts', 'preload', ['electron']);
  return outDir;
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const out = await buildElectron();
  process.stdout.write(`blockwise: desktop shell built into ${out}\n`);
}
