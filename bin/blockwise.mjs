#!/usr/bin/env node
// Starts the command line from the bundle that `npm ci` builds into dist-cli/
// (scripts/buildCli.mjs). When the bundle is missing, or any source file that
// went into it has changed since (see bin/cliBundle.mjs), it runs the
// TypeScript sources through tsx instead and says so on stderr: a stale bundle
// never runs old code. BLOCKWISE_FROM_SOURCES=1 runs the sources, silently.
import process from 'node:process';
import { URL } from 'node:url';
import { bundleProblem } from './cliBundle.mjs';

const fromSources = process.env.BLOCKWISE_FROM_SOURCES === '1';
const problem = fromSources ? 'bypassed' : bundleProblem(new URL('..', import.meta.url), new URL('../dist-cli/', import.meta.url));
if (problem === null) {
  await import('../dist-cli/blockwise.mjs');
} else {
  if (!fromSources) {
    process.stderr.write(`blockwise: the built command line ${problem}; running the TypeScript sources (slower start; "npm run build:cli" rebuilds it)\n`);
  }
  const { register } = await import('tsx/esm/api');
  register();
  await import('../cli/run.ts');
}
