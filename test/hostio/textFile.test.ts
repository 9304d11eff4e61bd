import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { isInsideFolder, readTextFile, readTextFileSync } from '../../hostio/textFile';

// The one safe reader: regular files only, a size cap, UTF-8 (RFC 3629) without NUL, the BOM dropped (common practice).
const dir = mkdtempSync(join(tmpdir(), 'blockwise-hostio-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('hostio textFile', () => {
  it('readTextFile and readTextFileSync agree: text without the BOM, and the real path', async () => {
    const path = join(dir, 'bom.blockwise.json');
    writeFileSync(path, '\ufeff{"format":"blockwise-project"}');
    symlinkSync(path, join(dir, 'via-link.json'));
    const viaLink = join(dir, 'via-link.json');
    const a = await readTextFile(viaLink);
    const b = readTextFileSync(viaLink);
    expect(a).toEqual(b);
    expect(a.ok && a.value.text).toBe('{"format":"blockwise-project"}');
    expect(a.ok && a.value.realPath.endsWith('bom.blockwise.json')).toBe(true);
  });

  it('refuses /proc/self/environ (size 0 on stat, NUL-separated inside) without returning a byte of it', async () => {
    const r = readTextFileSync('/proc/self/environ');
    expect(r).toEqual({ ok: false, error: { code: 'not_text', path: '/proc/self/environ', reason: 'it holds NUL bytes: a binary file, not text' } });
  });

  it('refuses /dev/zero, /dev/urandom and a FIFO at once (no read that never ends)', async () => {
    const fifo = join(dir, 'fifo');
    execFileSync('mkfifo', [fifo]);
    for (const path of ['/dev/zero', '/dev/urandom']) {
      expect(readTextFileSync(path)).toEqual({ ok: false, error: { code: 'not_a_file', path, reason: 'it is a device, not a file' } });
    }
    expect(await readTextFile(fifo)).toEqual({ ok: false, error: { code: 'not_a_file', path: fifo, reason: 'it is a pipe (FIFO), not a file' } });
  });

  it('counts the bytes it reads against the cap, and says how large the file is', async () => {
    const path = join(dir, 'big.csv');
    writeFileSync(path, 'y'.repeat(2000));
    expect(readTextFileSync(path, { maxBytes: 1024 })).toEqual({ ok: false, error: { code: 'too_large', path, reason: 'it is 2000 bytes; text files up to 1024 bytes are read' } });
    expect(readTextFileSync(path, { maxBytes: 2000 }).ok).toBe(true);
  });

  it('isInsideFolder compares whole path components', () => {
    expect(isInsideFolder('/a/b', '/a/b/c.csv', '/')).toBe(true);
    expect(isInsideFolder('/a/b', '/a/bc/c.csv', '/')).toBe(false);
    expect(isInsideFolder('/a/b/', '/a/b/c.csv', '/')).toBe(true);
  });
});
