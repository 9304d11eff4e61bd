import { readFile } from 'node:fs/promises';
import { basename, join } from 'node:path';
import { z } from 'zod';
import { atomicWriteFile } from './atomicWrite';
import type { RecentFile } from './hostApi';

/** How many recent projects the File menu lists. */
export const RECENT_LIMIT = 10;

const recentFileSchema = z.strictObject({
  path: z.string().min(1).max(4096),
  name: z.string().max(200),
  openedAt_ms: z.number().int().nonnegative(),
});
const recentStoreSchema = z.strictObject({
  format: z.literal(1),
  files: z.array(recentFileSchema).max(100),
});

/**
 * The list after `path` was opened or saved at `now_ms`: it moves to the
 * front, duplicates go, the list keeps at most `limit` entries.
 */
export function withRecentFile(
  list: readonly RecentFile[],
  path: string,
  now_ms: number,
  limit: number = RECENT_LIMIT,
): readonly RecentFile[] {
  const entry: RecentFile = { path, name: basename(path), openedAt_ms: now_ms };
  return [entry, ...list.filter((f) => f.path !== path)].slice(0, limit);
}

/** The list without `path` (e.g. after it failed to open). */
export function withoutRecentFile(list: readonly RecentFile[], path: string): readonly RecentFile[] {
  return list.filter((f) => f.path !== path);
}

/** Where the list lives inside the user-data folder. */
export function recentFilesPath(userDataFolder: string): string {
  return join(userDataFolder, 'recent-projects.json');
}

/**
 * Reads the stored list. A missing file is an empty list; a damaged one is
 * reported in `problem` (and an empty list returned) so the caller can say so.
 */
export async function loadRecentFiles(
  userDataFolder: string,
): Promise<{ readonly files: readonly RecentFile[]; readonly problem: string | null }> {
  const path = recentFilesPath(userDataFolder);
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return { files: [], problem: null };
    return { files: [], problem: `could not read ${path}: ${(e as Error).message}` };
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    return { files: [], problem: `${path} is not valid JSON (${(e as Error).message}); the recent list starts empty` };
  }
  const parsed = recentStoreSchema.safeParse(json);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    const where = first ? first.path.join('.') || '(top level)' : '(top level)';
    return { files: [], problem: `${path} at ${where}: ${first?.message ?? 'invalid'}; the recent list starts empty` };
  }
  return { files: parsed.data.files.slice(0, RECENT_LIMIT), problem: null };
}

/** Stores the list atomically. */
export async function saveRecentFiles(userDataFolder: string, files: readonly RecentFile[]): Promise<void> {
  const body = JSON.stringify({ format: 1, files }, null, 2);
  await atomicWriteFile(recentFilesPath(userDataFolder), `${body}\n`);
}
