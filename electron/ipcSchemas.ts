import { z } from 'zod';
import type { IpcChannelKey } from './ipcChannels';

/** Largest project, deck or CSV text the shell accepts across IPC (bytes of UTF-16 text). */
export const MAX_TEXT_CHARS = 32 * 1024 * 1024;

/** A file name suggested by the page: no folders, no control characters. */
const suggestedName = z
  .string()
  .min(1, 'a file name is required')
  .max(200, 'a file name has at most 200 characters')
  .regex(/^[^/\\:*?"<>|]+$/, 'a file name must not contain folders or reserved characters')
  .refine((s) => ![...s].some((c) => c.charCodeAt(0) < 0x20), 'a file name must not contain control characters')
  .refine((s) => s !== '.' && s !== '..', 'a file name must not be "." or ".."');

const documentText = z.string().max(MAX_TEXT_CHARS, `text longer than ${MAX_TEXT_CHARS} characters`);
const filePath = z.string().min(1).max(4096);

/** A path relative to the open project's folder, as a project file names its deck. */
const relativePath = z
  .string()
  .min(1, 'a relative path is required')
  .max(1024)
  .refine((s) => !s.startsWith('/') && !s.startsWith('\\') && !/^[A-Za-z]:/.test(s), 'the path must be relative to the project folder')
  .refine((s) => !s.includes('\u0000'), 'the path must not contain NUL');

/**
 * The argument list each invoke channel accepts, parsed in the main process
 * before anything is done with it (docs/style.md §9). `strict` tuples: extra
 * arguments are rejected.
 */
export const IPC_PAYLOADS = {
  openProject: z.tuple([]),
  openRecent: z.tuple([filePath]),
  initialDocument: z.tuple([]),
  saveProject: z.tuple([documentText, suggestedName]),
  saveProjectAs: z.tuple([documentText, suggestedName]),
  importDeck: z.tuple([]),
  readBesideProject: z.tuple([relativePath]),
  exportResultsCsv: z.tuple([documentText, suggestedName]),
  printReportPdf: z.tuple([suggestedName]),
  recentFiles: z.tuple([]),
  autosave: z.tuple([z.string().min(1).max(200), documentText]),
  recoveryOffer: z.tuple([]),
  discardRecovery: z.tuple([]),
  documentState: z.tuple([z.strictObject({ name: z.string().max(200), dirty: z.boolean() })]),
} as const satisfies Partial<Record<IpcChannelKey, z.ZodType<readonly unknown[]>>>;

export type InvokeChannelKey = keyof typeof IPC_PAYLOADS;
export type IpcPayload<K extends InvokeChannelKey> = z.infer<(typeof IPC_PAYLOADS)[K]>;

/** One readable line from a zod failure: where (argument index and path) and what. */
export function describePayloadIssues(error: z.ZodError): string {
  return error.issues
    .map((issue) => {
      const where = issue.path.length === 0 ? 'arguments' : `argument ${issue.path.join('.')}`;
      return `${where}: ${issue.message}`;
    })
    .join('; ');
}
