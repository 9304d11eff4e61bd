import { readFile, stat } from 'node:fs/promises';
import { cannotReadMessage, readFailureReason } from '../engine/study';
import type { HostReply } from './hostApi';
import { hostError, hostOk } from './ipcValidation';

/** Largest project or deck file the shell reads (bytes). */
export const MAX_FILE_BYTES = 32 * 1024 * 1024;

/**
 * Reads a UTF-8 text file for the page. Refuses files larger than
 * `maxBytes` and files that are not valid UTF-8, naming the file.
 */
export async function readTextFile(path: string, maxBytes: number = MAX_FILE_BYTES): Promise<HostReply<string>> {
  try {
    const info = await stat(path);
    if (!info.isFile()) return hostError('read_failed', `${path} is not a file`);
    if (info.size > maxBytes) {
      return hostError('too_large', `${path} is ${info.size} bytes; files up to ${maxBytes} bytes are accepted`);
    }
    const bytes = await readFile(path);
    const text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    return hostOk(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  } catch (e) {
    if (e instanceof TypeError) return hostError('read_failed', `${path} is not UTF-8 text`);
    return hostError('read_failed', cannotReadMessage(path, readFailureReason((e as NodeJS.ErrnoException).code, (e as Error).message)));
  }
}

/** `name` with `extension` appended unless it already ends with it (case-insensitive). */
export function withExtension(name: string, extension: string): string {
  return name.toLowerCase().endsWith(extension.toLowerCase()) ? name : `${name}${extension}`;
}
