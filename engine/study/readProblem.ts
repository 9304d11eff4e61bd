/**
 * The one wording of "this file cannot be read", for every front door. The
 * doors read the disk themselves (the engine reads no files); they pass the
 * system's error code here and print the sentence. Pure text.
 */

/** Why a read failed, in words, from a system error code (ENOENT, EISDIR, EACCES, ...) or the error's own message. */
export function readFailureReason(code: string | undefined, detail: string): string {
  switch (code) {
    case 'ENOENT':
      return 'no such file';
    case 'EISDIR':
      return 'it is a folder, not a file';
    case 'EACCES':
    case 'EPERM':
      return 'permission denied';
    default:
      return code === undefined || detail.includes(code) ? detail : `${detail} (${code})`;
  }
}

/** `cannot read "<path>": <reason>` - the sentence every door prints for an unreadable file. */
export function cannotReadMessage(path: string, reason: string): string {
  return `cannot read ${JSON.stringify(path)}: ${reason}`;
}
