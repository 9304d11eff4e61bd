import { spawn } from 'node:child_process';
import { mkdtemp, readFile, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { atomicWriteFile, nodeAtomicWriteOps, tempPathFor, type AtomicWriteOps } from '../../electron/atomicWrite';

// Safe-save contract (POSIX rename(2): replacing a name is atomic within one
// file system; write-temp-fsync-rename is common practice): a failure at any
// step leaves the previous file byte-for-byte intact and no temporary file.

let folder: string;
beforeEach(async () => {
  folder = await mkdtemp(join(tmpdir(), 'blockwise-atomic-'));
});
afterEach(async () => {
  await rm(folder, { recursive: true, force: true });
});

describe('atomicWriteFile', () => {
  it('atomicWriteFile creates a new file with the given text', async () => {
    const target = join(folder, 'a.blockwise.json');
    await atomicWriteFile(target, '{"format":1}');
    expect(await readFile(target, 'utf8')).toBe('{"format":1}');
    expect(await readdir(folder)).toEqual(['a.blockwise.json']);
  });

  it('atomicWriteFile replaces an existing file and leaves no temporary file', async () => {
    const target = join(folder, 'a.blockwise.json');
    await writeFile(target, 'old');
    await atomicWriteFile(target, new TextEncoder().encode('new contents'));
    expect(await readFile(target, 'utf8')).toBe('new contents');
    expect(await readdir(folder)).toEqual(['a.blockwise.json']);
  });

  it('atomicWriteFile keeps the old file when the write fails half way', async () => {
    const target = join(folder, 'project.blockwise.json');
    await writeFile(target, 'the previous project');
    const failing: AtomicWriteOps = {
      ...nodeAtomicWriteOps,
      open: async (path, flags, mode) => {
        const real = await nodeAtomicWriteOps.open(path, flags, mode);
        return {
          writeFile: async (data) => {
            // Half the bytes reach the disk, then the device fails.
            const half = typeof data === 'string' ? data.slice(0, data.length / 2) : data.slice(0, data.length / 2);
            await real.writeFile(half);
            throw Object.assign(new Error('ENOSPC: no space left on device'), { code: 'ENOSPC' });
          },
          sync: () => real.sync(),
          close: () => real.close(),
        };
      },
    };
    await expect(atomicWriteFile(target, 'x'.repeat(10_000), failing)).rejects.toThrow(
      /could not save .*project\.blockwise\.json: ENOSPC.*previous file.*unchanged/,
    );
    expect(await readFile(target, 'utf8')).toBe('the previous project');
    expect(await readdir(folder)).toEqual(['project.blockwise.json']);
  });

  it('atomicWriteFile keeps the old file when the rename fails', async () => {
    const target = join(folder, 'p.json');
    await writeFile(target, 'old');
    const failing: AtomicWriteOps = {
      ...nodeAtomicWriteOps,
      rename: async () => {
        throw new Error('EXDEV: cross-device link not permitted');
      },
    };
    await expect(atomicWriteFile(target, 'new', failing)).rejects.toThrow(/EXDEV/);
    expect(await readFile(target, 'utf8')).toBe('old');
    expect(await readdir(folder)).toEqual(['p.json']);
  });

  it('atomicWriteFile fails with the target named when the folder does not exist', async () => {
    const target = join(folder, 'missing', 'p.json');
    await expect(atomicWriteFile(target, 'x')).rejects.toThrow(/could not save .*missing.*p\.json/);
  });

  it('tempPathFor puts the temporary file in the target folder', () => {
    expect(tempPathFor('/a/b/p.json', 'x1')).toBe('/a/b/.p.json.x1.tmp');
  });

  it('atomicWriteFile keeps the old file when the writing process is killed mid-write', async () => {
    const target = join(folder, 'killed.blockwise.json');
    await writeFile(target, 'survives a crash');
    const child = spawn(process.execPath, ['--import', 'tsx', resolve(__dirname, 'support/slowAtomicWriter.ts'), target], {
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let stderr = '';
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    // The child prints "writing" once half the new text is in its temporary file, then stalls.
    await new Promise<void>((resolvePromise, reject) => {
      child.stdout.on('data', (d: Buffer) => {
        if (d.toString().includes('writing')) resolvePromise();
      });
      child.on('exit', (code) => reject(new Error(`writer exited early (${code}): ${stderr}`)));
    });
    const tempFiles = (await readdir(folder)).filter((f) => f.endsWith('.tmp'));
    expect(tempFiles.length).toBe(1);
    child.kill('SIGKILL');
    await new Promise((r) => child.once('exit', r));
    expect(await readFile(target, 'utf8')).toBe('survives a crash');
  }, 30_000);
});
