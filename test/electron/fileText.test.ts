import { execFileSync } from 'node:child_process';
import { realpath, symlink, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readTextFile, readTextFileAt, withExtension } from '../../electron/fileText';
import { scratchFolderEachTest } from '../support/scratchFolder';

// Reading user files: UTF-8 only (RFC 3629), a leading byte-order mark
// dropped (common practice), size bounded, regular files only (no devices,
// pipes or folders), no NUL bytes, every refusal naming the file.

const folder = scratchFolderEachTest('blockwise-text-');

describe('readTextFile', () => {
  it('readTextFile returns UTF-8 text without its byte-order mark', async () => {
    const path = join(folder(), 'deck.csv');
    await writeFile(path, '\ufeffaltitude[ft],mach[-]\n0,0.2 — é\n');
    expect(await readTextFile(path)).toEqual({ ok: true, value: 'altitude[ft],mach[-]\n0,0.2 — é\n' });
  });

  it('readTextFile refuses a file larger than the limit and names it', async () => {
    const path = join(folder(), 'big.csv');
    await writeFile(path, 'x'.repeat(101));
    const r = await readTextFile(path, 100);
    expect(r).toEqual({ ok: false, error: { code: 'too_large', message: `cannot read "${path}": it is 101 bytes; text files up to 100 bytes are read` } });
  });

  it('readTextFile refuses a folder and a missing file', async () => {
    expect(await readTextFile(folder())).toEqual({ ok: false, error: { code: 'read_failed', message: `cannot read "${folder()}": it is a folder, not a file` } });
    expect(await readTextFile(join(folder(), 'nope.json'))).toEqual({ ok: false, error: { code: 'read_failed', message: `cannot read "${join(folder(), 'nope.json')}": no such file` } });
  });

  it('readTextFile refuses text in another encoding (Latin-1 é) and binary files with NUL bytes', async () => {
    const path = join(folder(), 'latin1.csv');
    await writeFile(path, Buffer.from([0x63, 0x61, 0x66, 0xe9]));
    expect(await readTextFile(path)).toEqual({ ok: false, error: { code: 'read_failed', message: `cannot read "${path}": it is not UTF-8 text` } });
    const nul = join(folder(), 'nul.json');
    await writeFile(nul, Buffer.from('{"a":1}\u0000PATH=/bin', 'utf8'));
    expect(await readTextFile(nul)).toEqual({ ok: false, error: { code: 'read_failed', message: `cannot read "${nul}": it holds NUL bytes: a binary file, not text` } });
  });

  it('readTextFile refuses devices and pipes at once instead of reading forever', async () => {
    expect(await readTextFile('/dev/zero')).toEqual({ ok: false, error: { code: 'read_failed', message: 'cannot read "/dev/zero": it is a device, not a file' } });
    const fifo = join(folder(), 'pipe.blockwise.json');
    execFileSync('mkfifo', [fifo]);
    expect(await readTextFile(fifo)).toEqual({ ok: false, error: { code: 'read_failed', message: `cannot read "${fifo}": it is a pipe (FIFO), not a file` } });
  });

  it('readTextFileAt gives the real path of a file reached through a symlink', async () => {
    const path = join(folder(), 'real.csv');
    await writeFile(path, 'text');
    await symlink(path, join(folder(), 'link.csv'));
    const r = await readTextFileAt(join(folder(), 'link.csv'));
    expect(r).toEqual({ ok: true, value: { text: 'text', realPath: await realpath(path) } });
  });
});

describe('withExtension', () => {
  it('withExtension appends a missing extension and keeps a present one in any case', () => {
    expect(withExtension('study', '.csv')).toBe('study.csv');
    expect(withExtension('study.CSV', '.csv')).toBe('study.CSV');
    expect(withExtension('jet.blockwise.json', '.blockwise.json')).toBe('jet.blockwise.json');
  });
});
