import { cannotReadMessage } from '../engine/study';
import { MAX_TEXT_FILE_BYTES, readTextFile as readSafely } from '../hostio/textFile';
import type { HostReply } from './hostApi';
import { hostError, hostOk } from './ipcValidation';

/** Largest project or deck file the shell reads (bytes): the one safe reader's cap (hostio/textFile.ts). */
export const MAX_FILE_BYTES = MAX_TEXT_FILE_BYTES;

/**
 * Reads a text file for the page through the one safe reader shared with the
 * command line (hostio/textFile.ts): regular files only, at most `maxBytes`,
 * valid UTF-8 without NUL bytes, the byte-order mark dropped. Every refusal
 * names the file; `realPath` is the file with its symlinks resolved.
 */
export async function readTextFileAt(path: string, maxBytes: number = MAX_FILE_BYTES): Promise<HostReply<{ readonly text: string; readonly realPath: string }>> {
  const read = await readSafely(path, { maxBytes });
  if (read.ok) return hostOk(read.value);
  return hostError(read.error.code === 'too_large' ? 'too_large' : 'read_failed', cannotReadMessage(path, read.error.reason));
}

/** readTextFileAt's text only. */
export async function readTextFile(path: string, maxBytes: number = MAX_FILE_BYTES): Promise<HostReply<string>> {
  const read = await readTextFileAt(path, maxBytes);
  return read.ok ? hostOk(read.value.text) : read;
}

/** `name` with `extension` appended unless it already ends with it (case-insensitive). */
export function withExtension(name: string, extension: string): string {
  return name.toLowerCase().endsWith(extension.toLowerCase()) ? name : `${name}${extension}`;
}
