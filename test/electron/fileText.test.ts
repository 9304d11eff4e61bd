import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { readTextFile, withExtension } from '../../electron/fileText';

// Reading user files: UTF-8 only (RFC 3629), a leading byte-order mark
// dropped (common practice), size bounded, every refusal naming the file.

let folder: string;
beforeEach(async () => {
  folder = await mkdtemp(join(tmpdir(), 'blockwise-text-'));
});
afterEach(async () => {
  await rm(folder, { recursive: true, force: true });
});

describe('readTextFile', () => {
  it('readTextFile returns UTF-8 text without its byte-order mark', async () => {
    const path = join(folder, 'deck.csv');
    await writeFile(path, '\ufeffaltitude[ft],mach[-]\n0,0.2 — é\n');
    expect(await readTextFile(path)).toEqual({ ok: true, value: 'altitude[ft],mach[-]\n0,0.2 — é\n' });
  });

  it('readTextFile refuses a file larger than the limit and names it', async () => {
    const path = join(folder, 'big.csv');
    await writeFile(path, 'x'.repeat(101));
    const r = await readTextFile(path, 100);
    expect(r).toEqual({ ok: false, error: { code: 'too_large', message: `${path} is 101 bytes; files up to 100 bytes are accepted` } });
  });

  it('readTextFile refuses a folder and a missing file', async () => {
    expect(await readTextFile(folder)).toMatchObject({ ok: false, error: { code: 'read_failed', message: `${folder} is not a file` } });
    const missing = await readTextFile(join(folder, 'nope.json'));
    expect(missing).toMatchObject({ ok: false, error: { code: 'read_failed' } });
    if (!missing.ok) expect(missing.error.message).toMatch(/cannot read ".*nope\.json": no such file/);
  });

  it('readTextFile refuses text in another encoding (Latin-1 é)', async () => {
    const path = join(folder, 'latin1.csv');
    await writeFile(path, Buffer.from([0x63, 0x61, 0x66, 0xe9]));
    expect(await readTextFile(path)).toEqual({ ok: false, error: { code: 'read_failed', message: `${path} is not UTF-8 text` } });
  });
});

describe('withExtension', () => {
  it('withExtension appends a missing extension and keeps a present one in any case', () => {
    expect(withExtension('study', '.csv')).toBe('study.csv');
    expect(withExtension('study.CSV', '.csv')).toBe('study.CSV');
    expect(withExtension('jet.blockwise.json', '.blockwise.json')).toBe('jet.blockwise.json');
  });
});
