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

/**
 * Writes `data` to `target` so that a reader (or a crash) sees either the
 * whole old file or the whole new one: write a temporary file in the same
 * folder, fsync it, then rename it over the target (POSIX rename(2) is
 * atomic within one file system; common practice for safe saves). The old
 * file is never opened for writing. On failure the temporary file is removed
 * and the error is rethrown with the target named.
 */
export async function atomicWriteFile(
  target: string,
  data: string | Uint8Array,
  ops: AtomicWriteOps = nodeAtomicWriteOps,
): Promise<void> {
  const temp = tempPathFor(target, `${process.pid}-${randomBytes(4).toString('hex')}`);
  const mode = (await ops.modeOf(target)) ?? 0o644;
  let handle: WritableHandle | undefined;
  try {
    handle = await ops.open(temp, 'wx', mode);
    await handle.writeFile(data);
    await handle.sync();
    await handle.close();
    handle = undefined;
    await ops.rename(temp, target);
  } catch (e) {
    await handle?.close().catch(() => undefined);
    await ops.unlink(temp).catch(() => undefined);
    const reason = e instanceof Error ? e.message : String(e);
    throw new Error(`could not save ${target}: ${reason} (the previous file, if any, is unchanged)`, { cause: e });
  }
  await ops.syncFolder(dirname(target));
}
