import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, beforeEach } from 'vitest';

/**
 * A new empty folder under the system's temporary folder, named `<prefix>XXXXXX`, made before and removed with its
 * contents after each test (scratchFolderEachTest) or the suite it is called in (scratchFolderForSuite: a describe
 * block, or the file at its top level). The returned function gives the folder.
 */
function scratchFolder(prefix: string, before: typeof beforeAll, after: typeof afterAll): () => string {
  let folder: string | undefined;
  before(async () => {
    folder = await mkdtemp(join(tmpdir(), prefix));
  });
  after(async () => {
    if (folder !== undefined) await rm(folder, { recursive: true, force: true });
    folder = undefined;
  });
  return () => {
    if (folder === undefined) throw new Error(`scratch folder ${prefix}: it exists only while its tests run`);
    return folder;
  };
}

export function scratchFolderEachTest(prefix: string): () => string {
  return scratchFolder(prefix, beforeEach, afterEach);
}

export function scratchFolderForSuite(prefix: string): () => string {
  return scratchFolder(prefix, beforeAll, afterAll);
}
