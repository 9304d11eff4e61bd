#!/usr/bin/env node
// Starts the command line from the bundle that `npm ci` builds into dist-cli/
// (scripts/buildCli.mjs): a verb from the one-script build through V8's code
// cache (bin/cliCodeCache.mjs), the overview (no verb, --help) from the ES
// modules split by verb, which load only the little it needs. When
// the bundle is missing, or any source file that went into it has changed
// since (see bin/cliBundle.mjs), it runs the TypeScript sources through tsx
// instead and says so on stderr: a stale bundle never runs old code.
// BLOCKWISE_FROM_SOURCES=1 runs the sources, silently.
import process from 'node:process';
import { URL } from 'node:url';
import { bundleProblem } from './cliBundle.mjs';

const fromSources = process.env.BLOCKWISE_FROM_SOURCES === '1';
const problem = fromSources ? 'bypassed' : bundleProblem(new URL('..', import.meta.url), new URL('../dist-cli/', import.meta.url));
const verb = process.argv[2];
if (problem === null && (verb === undefined || verb.startsWith('-') || verb === 'help')) {
  await import('../dist-cli/blockwise.mjs');
} else if (problem === null) {
  const { runBundle } = await import('./cliCodeCache.mjs');
  runBundle(new URL('../dist-cli/blockwise.cjs', import.meta.url), process.argv.slice(2));
} else {
  if (!fromSources) {
    process.stderr.write(`blockwise: the built command line ${problem}; running the TypeScript sources (slower start; "npm run build:cli" rebuilds it)\n`);
  }
  const { register } = await import('tsx/esm/api');
  register();
  await import('../cli/run.ts');
}
