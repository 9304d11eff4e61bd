// For test/scripts/cliCodeCache.test.ts: runs a built blockwise.cjs through
// bin/cliCodeCache.mjs with the cache in a given folder, and writes what was
// done with the cache to a file.
// Usage: node runBundleWith.mjs <blockwise.cjs> <cache folders, first choice first, joined by ','> <status file> <blockwise arguments...>
import { writeFileSync } from 'node:fs';
import process from 'node:process';
import { pathToFileURL } from 'node:url';
import { runBundle } from '../../../bin/cliCodeCache.mjs';

const [bundle, folder, statusFile, ...argv] = process.argv.slice(2);
// The bundle reads its command line from process.argv, as under bin/blockwise.mjs.
process.argv.splice(2, process.argv.length, ...argv);
writeFileSync(statusFile, runBundle(pathToFileURL(bundle), argv, { folders: folder.split(',') }));
