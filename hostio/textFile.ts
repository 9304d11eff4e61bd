/**
 * The one way the command line and the desktop shell read a text file a user
 * names (project, deck, design file): regular files only (no devices, FIFOs,
 * sockets or folders; a FIFO is opened non-blocking so it cannot hang the
 * read), at most MAX_TEXT_FILE_BYTES (the bytes actually read are counted,
 * since /proc-style files report size 0), valid UTF-8 without NUL bytes (a
 * binary file is not text), the byte-order mark stripped. The real path
 * (symlinks resolved) comes back with the text so callers check containment
 * on it, not on the path as written.
 */
import { closeSync, constants, fstatSync, openSync, readSync, realpathSync, type Stats } from 'node:fs';
import { open, realpath } from 'node:fs/promises';
import { err, ok, type Result } from '../engine/core';

/** Largest text file read (bytes): 32 MiB, far above any deck or project. */
export const MAX_TEXT_FILE_BYTES = 32 * 1024 * 1024;

export type TextFileErrorCode = 'not_found' | 'permission_denied' | 'not_a_file' | 'too_large' | 'not_text' | 'read_failed';

export interface TextFileError {
  readonly code: TextFileErrorCode;
  /** The path as given. */
  readonly path: string;
  /** The reason, without the path: "no such file", "it is a folder, not a file", ... */
  readonly reason: string;
}

export interface TextFile {
  readonly text: string;
  /** The file's real path (every symlink resolved). */
  readonly realPath: string;
}

export interface TextFileOptions {
  readonly maxBytes?: number;
}

// O_NONBLOCK: opening a FIFO for reading would otherwise wait for a writer.
const OPEN_FLAGS = constants.O_RDONLY | (constants.O_NONBLOCK ?? 0);

function sizeText(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${(bytes / (1024 * 1024)).toFixed(1)} MiB` : `${bytes} bytes`;
}

function kindOf(stat: { isDirectory(): boolean; isFIFO(): boolean; isCharacterDevice(): boolean; isBlockDevice(): boolean; isSocket(): boolean }): string {
  if (stat.isDirectory()) return 'it is a folder, not a file';
  if (stat.isFIFO()) return 'it is a pipe (FIFO), not a file';
  if (stat.isCharacterDevice() || stat.isBlockDevice()) return 'it is a device, not a file';
  if (stat.isSocket()) return 'it is a socket, not a file';
  return 'it is not a regular file';
}

/** A system error as a TextFileError. */
function fromSystemError(path: string, e: unknown): TextFileError {
  const code = (e as NodeJS.ErrnoException | null)?.code;
  if (code === 'ENOENT' || code === 'ENOTDIR') return { code: 'not_found', path, reason: 'no such file' };
  if (code === 'EACCES' || code === 'EPERM') return { code: 'permission_denied', path, reason: 'permission denied' };
  if (code === 'EISDIR') return { code: 'not_a_file', path, reason: 'it is a folder, not a file' };
  if (code === 'ELOOP') return { code: 'read_failed', path, reason: 'too many symbolic links' };
  if (code === 'EAGAIN' || code === 'ENXIO') return { code: 'not_a_file', path, reason: 'it is not a regular file' };
  return { code: 'read_failed', path, reason: code ?? (e instanceof Error ? e.message : String(e)) };
}

/** The text of `bytes` (length `n`), or why it is not text. */
function decode(path: string, bytes: Uint8Array): Result<string, TextFileError> {
  if (bytes.includes(0)) return err({ code: 'not_text', path, reason: 'it holds NUL bytes: a binary file, not text' });
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return err({ code: 'not_text', path, reason: 'it is not UTF-8 text' });
  }
  return ok(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
}

/** `size` is the file's size when known (stat), else null (more than maxBytes were read). */
function tooLarge(path: string, size: number | null, maxBytes: number): TextFileError {
  return { code: 'too_large', path, reason: `it is ${size !== null ? sizeText(size) : `more than ${sizeText(maxBytes)}`}; text files up to ${sizeText(maxBytes)} are read` };
}

/** Why a file with this stat is refused before it is read (not a regular file, or too large), or null. */
function refusalOf(path: string, stat: Stats, maxBytes: number): TextFileError | null {
  if (!stat.isFile()) return { code: 'not_a_file', path, reason: kindOf(stat) };
  if (stat.size > maxBytes) return tooLarge(path, stat.size, maxBytes);
  return null;
}

/** The first read buffer: the stated size, at least 64 KiB, at most maxBytes + 1 (a file that grows, or reports 0). */
function firstBuffer(size: number, maxBytes: number): Uint8Array {
  return new Uint8Array(Math.min(Math.max(size, 64 * 1024), maxBytes + 1));
}

/** `chunk` when `length` bytes leave room in it; else a copy twice as long (at most maxBytes + 1); null when more than maxBytes are read. */
function withRoom(chunk: Uint8Array, length: number, maxBytes: number): Uint8Array | null {
  if (length < chunk.length) return chunk;
  if (chunk.length > maxBytes) return null;
  const grown = new Uint8Array(Math.min(chunk.length * 2, maxBytes + 1));
  grown.set(chunk);
  return grown;
}

/** The text of the `length` bytes read into `chunk`, or why it is not a text file. */
function textRead(path: string, realPath: string, chunk: Uint8Array, length: number, maxBytes: number): Result<TextFile, TextFileError> {
  if (length > maxBytes) return err(tooLarge(path, null, maxBytes));
  const text = decode(path, chunk.subarray(0, length));
  return text.ok ? ok({ text: text.value, realPath }) : text;
}

/** Reads a text file (see the file comment). Never throws. */
export async function readTextFile(path: string, options: TextFileOptions = {}): Promise<Result<TextFile, TextFileError>> {
  const maxBytes = options.maxBytes ?? MAX_TEXT_FILE_BYTES;
  let handle: Awaited<ReturnType<typeof open>> | undefined;
  try {
    const realPath = await realpath(path);
    handle = await open(realPath, OPEN_FLAGS);
    const stat = await handle.stat();
    const refused = refusalOf(path, stat, maxBytes);
    if (refused !== null) return err(refused);
    let chunk = firstBuffer(stat.size, maxBytes);
    let length = 0;
    for (;;) {
      const room = withRoom(chunk, length, maxBytes);
      if (room === null) return err(tooLarge(path, null, maxBytes));
      chunk = room;
      const { bytesRead } = await handle.read(chunk, length, chunk.length - length, null);
      if (bytesRead === 0) break;
      length += bytesRead;
    }
    return textRead(path, realPath, chunk, length, maxBytes);
  } catch (e) {
    return err(fromSystemError(path, e));
  } finally {
    await handle?.close().catch(() => undefined);
  }
}

/** readTextFile for callers that read synchronously (the command line's deck and design files). Never throws. */
export function readTextFileSync(path: string, options: TextFileOptions = {}): Result<TextFile, TextFileError> {
  const maxBytes = options.maxBytes ?? MAX_TEXT_FILE_BYTES;
  let fd: number | undefined;
  try {
    const realPath = realpathSync(path);
    fd = openSync(realPath, OPEN_FLAGS);
    const stat = fstatSync(fd);
    const refused = refusalOf(path, stat, maxBytes);
    if (refused !== null) return err(refused);
    let chunk = firstBuffer(stat.size, maxBytes);
    let length = 0;
    for (;;) {
      const room = withRoom(chunk, length, maxBytes);
      if (room === null) return err(tooLarge(path, null, maxBytes));
      chunk = room;
      const bytesRead = readSync(fd, chunk, length, chunk.length - length, null);
      if (bytesRead === 0) break;
      length += bytesRead;
    }
    return textRead(path, realPath, chunk, length, maxBytes);
  } catch (e) {
    return err(fromSystemError(path, e));
  } finally {
    if (fd !== undefined) {
      try {
        closeSync(fd);
      } catch {
        // Closing a read-only descriptor cannot lose data.
      }
    }
  }
}

/** "cannot read <path>: <reason>" for messages. */
export function textFileErrorText(e: TextFileError): string {
  return `cannot read ${JSON.stringify(e.path)}: ${e.reason}`;
}

/** True when `path` (already a real path) is `folder` (a real path) or inside it. */
export function isInsideFolder(folder: string, path: string, separator: string): boolean {
  const base = folder.endsWith(separator) ? folder : folder + separator;
  return path === folder || path.startsWith(base);
}

/** The real path of a folder (symlinks resolved), or the folder as given when it cannot be resolved. */
export async function realFolder(folder: string): Promise<string> {
  try {
    return await realpath(folder);
  } catch {
    return folder;
  }
}
