import { randomBytes } from 'node:crypto';
import * as fsp from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';

/** The file handle operations atomicWriteFile needs (node:fs/promises FileHandle fits). */
export interface WritableHandle {
  writeFile(data: string | Uint8Array): Promise<void>;
  sync(): Promise<void>;
  close(): Promise<void>;
}

/** File-system operations, injectable so tests can fail a write half way. */
export interface AtomicWriteOps {
  open(path: string, flags: string, mode?: number): Promise<WritableHandle>;
  rename(from: string, to: string): Promise<void>;
  unlink(path: string): Promise<void>;
  /** Existing file's permission bits, or null when there is no file. */
  modeOf(path: string): Promise<number | null>;
  /** The path with every symlink resolved; the path itself when it does not exist yet. */
  realPath(path: string): Promise<string>;
  /** Flushes the folder entry after the rename (POSIX); may be a no-op. */
  syncFolder(folder: string): Promise<void>;
}

export const nodeAtomicWriteOps: AtomicWriteOps = {
  open: (path, flags, mode) => fsp.open(path, flags, mode),
  rename: (from, to) => fsp.rename(from, to),
  unlink: (path) => fsp.unlink(path),
  modeOf: async (path) => {
    try {
      return (await fsp.stat(path)).mode & 0o777;
    } catch {
      return null;
    }
  },
  realPath: async (path) => {
    try {
      return await fsp.realpath(path);
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code !== 'ENOENT') throw e;
      // A new file: resolve its folder (it may be a link), keep the name.
      try {
        return join(await fsp.realpath(dirname(path)), basename(path));
      } catch {
        return path;
      }
    }
  },
  syncFolder: async (folder) => {
    let handle: fsp.FileHandle | undefined;
    try {
      handle = await fsp.open(folder, 'r');
      await handle.sync();
    } catch {
      // Folders cannot be opened or synced on every platform (Windows); the rename already happened.
    } finally {
      await handle?.close().catch(() => undefined);
    }
  },
};

/** The temporary file name used while writing `target` (same folder, so the rename is atomic). */
export function tempPathFor(target: string, tag: string): string {
  return join(dirname(target), `.${basename(target)}.${tag}.tmp`);
}

/** The tag atomicWriteFile gives its temporary files: the writing process and a random part. */
function writerTag(): string {
  return `${process.pid}-${randomBytes(4).toString('hex')}`;
}

/** A temporary file this program writes beside `name`: `.<name>.<pid>-<8 hex>.tmp`, with the writer's pid. */
function temporaryOf(name: string, candidate: string): { readonly pid: number } | null {
  const prefix = `.${name}.`;
  if (!candidate.startsWith(prefix) || !candidate.endsWith('.tmp')) return null;
  const m = /^(\d+)-[0-9a-f]{8}$/.exec(candidate.slice(prefix.length, -'.tmp'.length));
  return m === null ? null : { pid: Number(m[1]) };
}

function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Age (ms) past which another live process's temporary file counts as stale too (a pid may have been reused). */
export const STALE_TEMPORARY_AGE_MS = 10 * 60 * 1000;

/**
 * Removes the temporary files atomicWriteFile left beside `target` when a save was killed (its name pattern
 * only): those of a process that no longer runs, or older than STALE_TEMPORARY_AGE_MS and not this process's
 * (this process may be saving right now). Returns the names removed. Other files are never touched.
 */
export async function removeStaleTemporaries(target: string, now_ms: number = Date.now()): Promise<string[]> {
  const folder = dirname(target);
  const name = basename(target);
  const removed: string[] = [];
  let entries: string[];
  try {
    entries = await fsp.readdir(folder);
  } catch {
    return removed;
  }
  for (const entry of entries) {
    const temp = temporaryOf(name, entry);
    if (temp === null || temp.pid === process.pid) continue;
    const path = join(folder, entry);
    try {
      const info = await fsp.lstat(path);
      if (!info.isFile()) continue;
      if (processAlive(temp.pid) && now_ms - info.mtimeMs < STALE_TEMPORARY_AGE_MS) continue;
      await fsp.unlink(path);
      removed.push(entry);
    } catch {
      // Gone already, or not ours to remove: leave it.
    }
  }
  return removed;
}

/**
 * Writes `data` to `target` so that a reader (or a crash) sees either the
 * whole old file or the whole new one: write a temporary file in the same
 * folder, fsync it, then rename it over the target (POSIX rename(2) is
 * atomic within one file system; common practice for safe saves), then fsync
 * the folder. The target's real path is written (a symlink keeps pointing at
 * the saved file); a read-only target (no write permission bit) is refused,
 * not replaced. The old file is never opened for writing. On failure the
 * temporary file is removed and the error is rethrown with the target named.
 */
export async function atomicWriteFile(
  target: string,
  data: string | Uint8Array,
  ops: AtomicWriteOps = nodeAtomicWriteOps,
): Promise<void> {
  let real: string;
  try {
    real = await ops.realPath(target);
  } catch (e) {
    const reason = e instanceof Error ? e.message : String(e);
    throw new Error(`could not save ${target}: ${reason} (the previous file, if any, is unchanged)`, { cause: e });
  }
  const existingMode = await ops.modeOf(real);
  if (existingMode !== null && (existingMode & 0o222) === 0) {
    const through = real === target ? '' : ` (the link leads to ${real})`;
    throw new Error(`could not save ${target}${through}: the file is read-only; make it writable or save under another name (the file is unchanged)`);
  }
  const temp = tempPathFor(real, writerTag());
  const mode = existingMode ?? 0o644;
  let handle: WritableHandle | undefined;
  try {
    handle = await ops.open(temp, 'wx', mode);
    await handle.writeFile(data);
    await handle.sync();
    await handle.close();
    handle = undefined;
    await ops.rename(temp, real);
  } catch (e) {
    await handle?.close().catch(() => undefined);
    await ops.unlink(temp).catch(() => undefined);
    const reason = e instanceof Error ? e.message : String(e);
    throw new Error(`could not save ${target}: ${reason} (the previous file, if any, is unchanged)`, { cause: e });
  }
  await ops.syncFolder(dirname(real));
}
