// Starts the bundled command line (dist-cli/blockwise.cjs, a classic script)
// with V8's code cache, so a start does not parse and compile again the
// functions the same kind of run compiled before.
//
// The cache of a run is taken when it ends (script.createCachedData() at
// exit), so it holds every function that run compiled lazily, not only the
// top level. One cache file per kind of run (the verb words of the command
// line: "fly", "deck-check"; see runKey), named by the bundle's CRC-32 and
// length with the Node, V8 and CPU it was made on, and checked by a CRC-32 and
// length of its own bytes before V8 sees it (V8 checks its version, flags and
// the source's length too). CRC-32, not SHA-256: loading node:crypto alone
// takes 4 to 12 ms of a start that aims at 250 ms; the checks are against a
// rebuilt bundle and a damaged file, which CRC-32 with the length catches
// but for a chance of one in four thousand million. A cache that is missing, damaged or
// refused by V8 is compiled without; then the run writes a new one if it ends
// with exit code 0 (so a failed run never leaves a thin cache behind).
// Writes go through a temporary file and a rename, so a reader never sees half
// a file; a folder that cannot be written is skipped silently.
//
// Where: dist-cli/v8-cache/ beside the bundle, else (a read-only install) a
// folder of the user's own in the system's temporary folder. A cache is
// compiled code: only a folder owned by this user (or by the bundle's owner)
// and writable by nobody else is read. BLOCKWISE_CODE_CACHE=0 turns it off.
//
// Node's built-ins come through require (see bin/cliBundle.mjs).
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
const { Buffer, isAscii } = require('node:buffer');
const { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } = require('node:fs');
const { tmpdir } = require('node:os');
const { dirname, join } = require('node:path');
const process = require('node:process');
const { fileURLToPath } = require('node:url');
const vm = require('node:vm');
const zlib = require('node:zlib');

/** First bytes of a cache file, then the CRC-32 and the length (two unsigned 32-bit little-endian) of the V8 data that follows. */
const MAGIC = Buffer.from('BWV8CC1\n', 'latin1');
const HEADER_BYTES = MAGIC.length + 8;

/** zlib's CRC-32 (Node 20.15 and later; without it the cache is off). */
const crc32 = zlib.crc32;

/** The CommonJS wrapper Node itself puts around a module, so the bundle sees require, module, __filename. */
const WRAP_HEAD = '(function (exports, require, module, __filename, __dirname) {';
const WRAP_TAIL = '\n})';

/** At most this many caches (kinds of run) per bundle and folder, so odd command lines cannot fill a disk. */
export const MAX_CACHES_PER_BUNDLE = 40;

/**
 * The kind of run a command line is, as the cache file's first name: up to two leading words of lower-case
 * letters and hyphens (the verb and a sub-verb: "fly", "deck-check", "cycle-point"), then "-help" when
 * --help or -h is among the arguments; "help" alone for no verb.
 */
export function runKey(argv) {
  const words = [];
  for (const a of argv.slice(0, 2)) {
    if (!/^[a-z][a-z-]{0,23}$/.test(a)) break;
    words.push(a);
  }
  const help = argv.includes('--help') || argv.includes('-h');
  if (words.length === 0) return help || argv.length === 0 ? 'help' : 'other';
  return help && words[0] !== 'help' ? `${words.join('-')}-help` : words.join('-');
}

/** The bundle's identity in a cache name: CRC-32 and length of its bytes, the Node and V8 versions and the CPU. */
export function bundleKey(sourceBytes) {
  const runtime = crc32(`${process.version}\0${process.versions.v8}\0${process.arch}`);
  return `${hex(crc32(sourceBytes))}${sourceBytes.length.toString(16)}-${hex(runtime)}`;
}

const hex = (n) => n.toString(16).padStart(8, '0');

/** The folders a cache may live in, first choice first. */
export function cacheFolders(bundlePath) {
  const uid = typeof process.getuid === 'function' ? process.getuid() : null;
  return [join(dirname(bundlePath), 'v8-cache'), join(tmpdir(), `blockwise-v8-cache-${uid ?? 'user'}`)];
}

/** True when `folder` may be read: it exists, and it is this user's (or `ownerUid`'s) and no one else may write it. */
function trusted(folder, ownerUid) {
  try {
    const s = statSync(folder);
    if (!s.isDirectory()) return false;
    if (typeof process.getuid !== 'function') return true;
    return (s.uid === process.getuid() || s.uid === ownerUid) && (s.mode & 0o022) === 0;
  } catch {
    return false;
  }
}

/** The V8 data of a cache file, or null when the file is missing, too short, of another layout or damaged. */
export function readCacheFile(file) {
  let bytes;
  try {
    bytes = readFileSync(file);
  } catch {
    return null;
  }
  if (bytes.length <= HEADER_BYTES || !bytes.subarray(0, MAGIC.length).equals(MAGIC)) return null;
  const data = bytes.subarray(HEADER_BYTES);
  const good = bytes.readUInt32LE(MAGIC.length) === crc32(data) && bytes.readUInt32LE(MAGIC.length + 4) === data.length;
  return good ? data : null;
}

/** Writes a cache file through a temporary file and a rename; false (nothing left behind) when it cannot. */
export function writeCacheFile(file, data) {
  const temporary = `${file}.${process.pid}.tmp`;
  try {
    mkdirSync(dirname(file), { recursive: true, mode: 0o700 });
    const header = Buffer.alloc(HEADER_BYTES);
    MAGIC.copy(header);
    header.writeUInt32LE(crc32(data), MAGIC.length);
    header.writeUInt32LE(data.length, MAGIC.length + 4);
    writeFileSync(temporary, Buffer.concat([header, data]), { mode: 0o600 });
    renameSync(temporary, file);
    return true;
  } catch {
    try {
      rmSync(temporary, { force: true });
    } catch {
      // no folder, so no temporary file either
    }
    return false;
  }
}

/** True when `folder` may take the cache file `name` of bundle `key`: it has it already, or fewer than MAX_CACHES_PER_BUNDLE. */
function roomFor(folder, name, key) {
  try {
    if (existsSync(join(folder, name))) return true;
    return readdirSync(folder).filter((n) => n.endsWith(`-${key}.v8cache`)).length < MAX_CACHES_PER_BUNDLE;
  } catch {
    return true; // no folder yet
  }
}

/**
 * Compiles and runs the bundle at `bundleUrl` (a file URL of blockwise.cjs) for the command line `argv`,
 * from its code cache when there is a good one. Returns what was done with the cache (for the tests):
 * 'used', 'none' (none found), 'refused' (V8 refused it) or 'off'.
 */
export function runBundle(bundleUrl, argv, options = {}) {
  const bundlePath = fileURLToPath(bundleUrl);
  const bytes = readFileSync(bundlePath);
  const source = `${WRAP_HEAD}${isAscii(bytes) ? bytes.latin1Slice(0, bytes.length) : bytes.toString('utf8')}${WRAP_TAIL}`;
  const enabled = (options.enabled ?? process.env.BLOCKWISE_CODE_CACHE !== '0') === true && typeof crc32 === 'function';
  const folders = options.folders ?? cacheFolders(bundlePath);
  const key = enabled ? bundleKey(bytes) : '';
  const name = `${runKey(argv)}-${key}.v8cache`;
  let ownerUid = null;
  try {
    ownerUid = statSync(bundlePath).uid;
  } catch {
    // the bundle was just read: a stat failure here only means no owner check by it
  }
  let cachedData;
  if (enabled) {
    for (const folder of folders) {
      if (!trusted(folder, ownerUid)) continue;
      const data = readCacheFile(join(folder, name));
      if (data !== null) {
        cachedData = data;
        break;
      }
    }
  }
  const script = new vm.Script(source, {
    filename: bundlePath,
    cachedData,
    importModuleDynamically: vm.constants.USE_MAIN_CONTEXT_DEFAULT_LOADER,
  });
  const status = !enabled ? 'off' : cachedData === undefined ? 'none' : script.cachedDataRejected === true ? 'refused' : 'used';
  if (status === 'none' || status === 'refused') {
    process.once('exit', (code) => {
      if (code !== 0) return;
      try {
        const data = script.createCachedData();
        for (const folder of folders) {
          if (!roomFor(folder, name, key)) continue;
          if (writeCacheFile(join(folder, name), data) && trusted(folder, ownerUid)) break;
        }
      } catch {
        // A cache is only ever a help: never a reason for a run to fail.
      }
    });
  }
  const module = { exports: {} };
  const run = script.runInThisContext();
  run.call(module.exports, module.exports, createRequire(bundlePath), module, bundlePath, dirname(bundlePath));
  return status;
}
