import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach } from 'vitest';

/**
 * A new empty folder under the system's temporary folder for each test of the file that calls this (at its top
 * level), named `<prefix>XXXXXX` and removed with its contents after the test. The returned function gives the
 * current test's folder.
 */
export function scratchFolderEachTest(prefix: string): () => string {
  let folder: string | undefined;
  beforeEach(async () => {
    folder = await mkdtemp(join(tmpdir(), prefix));
  });
  afterEach(async () => {
    if (folder !== undefined) await rm(folder, { recursive: true, force: true });
    folder = undefined;
  });
  return () => {
    if (folder === undefined) throw new Error('scratchFolderEachTest: the folder exists only while a test runs');
    return folder;
  };
}
