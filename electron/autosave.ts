import { mkdir, readFile, stat, unlink } from 'node:fs/promises';
import { join } from 'node:path';
import { z } from 'zod';
import { atomicWriteFile } from './atomicWrite';
import type { RecoveryOffer } from './hostApi';

/** How often the page sends unsaved work while the project is dirty (milliseconds). */
export const AUTOSAVE_INTERVAL_MS = 5000;

const recoverySchema = z.strictObject({
  format: z.literal(1),
  name: z.string().max(200),
  savedAt_ms: z.number().int().nonnegative(),
  projectPath: z.string().max(4096).nullable(),
  text: z.string(),
});

/** The recovery file inside the user-data folder. */
export function recoveryFilePath(userDataFolder: string): string {
  return join(userDataFolder, 'recovery', 'unsaved-project.json');
}

/** Writes the page's unsaved work to the recovery file, atomically. */
export async function writeRecovery(
  userDataFolder: string,
  entry: { readonly name: string; readonly text: string; readonly projectPath: string | null },
  now_ms: number,
): Promise<void> {
  const path = recoveryFilePath(userDataFolder);
  await mkdir(join(userDataFolder, 'recovery'), { recursive: true });
  const body = JSON.stringify({ format: 1, name: entry.name, savedAt_ms: now_ms, projectPath: entry.projectPath, text: entry.text });
  await atomicWriteFile(path, body);
}

/** Removes the recovery file (after a save, or when the user discards it). */
export async function discardRecovery(userDataFolder: string): Promise<void> {
  await unlink(recoveryFilePath(userDataFolder)).catch((e: NodeJS.ErrnoException) => {
    if (e.code !== 'ENOENT') throw e;
  });
}

/**
 * Decides whether stored unsaved work should be offered: only when it is
 * newer than the project file it belongs to (or that file is gone, or the
 * work was never saved). `projectModified_ms` is null when there is no file.
 */
export function shouldOfferRecovery(savedAt_ms: number, projectModified_ms: number | null): boolean {
  return projectModified_ms === null || savedAt_ms > projectModified_ms;
}

/**
 * Reads the recovery file and returns the offer, or null when there is
 * nothing newer than the saved project. A damaged recovery file is not
 * offered and is reported in `problem`.
 */
export async function readRecoveryOffer(
  userDataFolder: string,
): Promise<{ readonly offer: RecoveryOffer | null; readonly problem: string | null }> {
  const path = recoveryFilePath(userDataFolder);
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return { offer: null, problem: null };
    return { offer: null, problem: `could not read ${path}: ${(e as Error).message}` };
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    return { offer: null, problem: `${path} is not valid JSON: ${(e as Error).message}` };
  }
  const parsed = recoverySchema.safeParse(json);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    return { offer: null, problem: `${path} at ${first?.path.join('.') || '(top level)'}: ${first?.message ?? 'invalid'}` };
  }
  const r = parsed.data;
  let projectModified_ms: number | null = null;
  if (r.projectPath !== null) {
    try {
      projectModified_ms = (await stat(r.projectPath)).mtimeMs;
    } catch {
      projectModified_ms = null;
    }
  }
  if (!shouldOfferRecovery(r.savedAt_ms, projectModified_ms)) return { offer: null, problem: null };
  return { offer: { name: r.name, text: r.text, savedAt_ms: r.savedAt_ms, projectPath: r.projectPath }, problem: null };
}
