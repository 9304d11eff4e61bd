#!/usr/bin/env node
// Starts the command line from the bundle that `npm ci` builds into dist-cli/
// (scripts/buildCli.mjs): the overview (no verb, --help, -h, help) from the
// text the build saved (dist-cli/overview.txt, nothing of the command line
// loaded), a verb from the one-script build through V8's code cache
// (bin/cliCodeCache.mjs), anything else from the ES modules split by verb.
// When the bundle is missing, or any source file that went into it (into the
// overview, for the overview) has changed since (see bin/cliBundle.mjs), it
// runs the TypeScript sources through tsx instead and says so on stderr: a
// stale bundle never runs old code.
// BLOCKWISE_FROM_SOURCES=1 runs the sources, silently.
// Node's built-ins come through require (see bin/cliBundle.mjs).
import { createRequire } from 'node:module';
import { bundleProblem } from './cliBundle.mjs';

const require = createRequire(import.meta.url);
const { readFileSync } = require('node:fs');
const process = require('node:process');
const { URL } = require('node:url');

const fromSources = process.env.BLOCKWISE_FROM_SOURCES === '1';
const root = new URL('..', import.meta.url);
const dist = new URL('../dist-cli/', import.meta.url);
const verb = process.argv[2];
const overview = verb === undefined || verb === '--help' || verb === '-h' || verb === 'help';
if (overview && !fromSources && bundleProblem(root, dist, 'overview') === null && printOverview()) {
  process.exitCode = verb === undefined ? 2 : 0; // as cli/main.ts: no verb is a usage error (EXIT_USAGE)
} else {
  const problem = fromSources ? 'bypassed' : bundleProblem(root, dist);
  if (problem === null && (overview || verb.startsWith('-'))) {
    await import('../dist-cli/blockwise.mjs');
  } else if (problem === null) {
    const { runBundle } = await import('./cliCodeCache.mjs');
    runBundle(new URL('blockwise.cjs', dist), process.argv.slice(2));
  } else {
    if (!fromSources) {
      process.stderr.write(`blockwise: the built command line ${problem}; running the TypeScript sources (slower start; "npm run build:cli" rebuilds it)\n`);
    }
    const { register } = await import('tsx/esm/api');
    register();
    await import('../cli/run.ts');
  }
}

/** Prints the overview the build saved; false when there is none to print (a bundle built before it was saved). */
function printOverview() {
  let text;
  try {
    text = readFileSync(new URL('overview.txt', dist));
  } catch {
    return false;
  }
  // A reader that closed the pipe (`blockwise --help | head -1`) is not an error: stop quietly, as cli/run.ts does.
  process.stdout.on('error', (e) => {
    if (e?.code !== 'EPIPE') process.stderr.write(`blockwise: cannot print the overview: ${e?.message ?? e}\n`);
    process.exit(e?.code === 'EPIPE' ? 0 : 70);
  });
  process.stdout.write(text);
  return true;
}
