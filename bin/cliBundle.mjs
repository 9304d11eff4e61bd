// The check bin/blockwise.mjs makes before starting the bundled command line.
// Node's built-in modules come through require, not import: an import builds
// an ES-module facade of the whole module on each start (node:fs alone about
// 12 million instructions, 2 to 3 ms; see docs/benchmarks.md, CLI start-up).
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
const { readFileSync, statSync } = require('node:fs');
const { fileURLToPath } = require('node:url');

/**
 * Why the bundle in `distUrl` (a folder URL holding blockwise.cjs, blockwise.mjs,
 * overview.txt and inputs.json, as scripts/buildCli.mjs writes them) cannot
 * run, or null when it is current: every source file listed in inputs.json
 * (paths relative to `rootUrl`, a folder URL) still has the modification time
 * and size it had at the build. About 300 stat calls on plain path strings,
 * 2 to 4 ms of a start (a URL made per file, as before, doubled it).
 *
 * `part` 'overview' checks only what overview.txt was made from (the modules
 * the overview's own code loads, about 50 files; inputs.json `overview`), for
 * printing that text; a build without that list reads as not built for it.
 */
export function bundleProblem(rootUrl, distUrl, part = 'all') {
  const root = folderPath(rootUrl);
  const dist = folderPath(distUrl);
  let inputs;
  try {
    const listed = JSON.parse(readFileSync(`${dist}inputs.json`, 'utf8'));
    inputs = part === 'overview' ? listed.overview : listed.inputs;
    for (const file of part === 'overview' ? ['overview.txt'] : ['blockwise.cjs', 'blockwise.mjs']) statSync(dist + file);
  } catch {
    return 'is not built';
  }
  if (!Array.isArray(inputs) || inputs.length === 0) return `is not built (inputs.json has no ${part === 'overview' ? 'overview' : 'inputs'} list)`;
  for (const [file, mtimeMs, size] of inputs) {
    let s;
    try {
      s = statSync(root + file, { throwIfNoEntry: false });
    } catch {
      s = undefined; // not a file one can reach any more (a folder on its way made a file, no permission)
    }
    if (s === undefined) return `is older than the sources (${file} is gone)`;
    if (s.mtimeMs !== mtimeMs || s.size !== size) return `is older than the sources (${file} changed)`;
  }
  return null;
}

/** The path of a folder URL, ending in the separator (so a relative file name can be appended). */
function folderPath(url) {
  const path = fileURLToPath(url);
  return /[\\/]$/.test(path) ? path : `${path}/`;
}
