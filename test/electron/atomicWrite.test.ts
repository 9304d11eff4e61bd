import { spawn } from 'node:child_process';
import { chmod, lstat, readFile, readdir, symlink, utimes, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { atomicWriteFile, nodeAtomicWriteOps, removeStaleTemporaries, STALE_TEMPORARY_AGE_MS, tempPathFor, type AtomicWriteOps } from '../../electron/atomicWrite';
import { scratchFolderEachTest } from '../support/scratchFolder';

// Safe-save contract (POSIX rename(2): replacing a name is atomic within one
// file system; write-temp-fsync-rename is common practice): a failure at any
// step leaves the previous file byte-for-byte intact and no temporary file.

const folder = scratchFolderEachTest('blockwise-atomic-');

describe('atomicWriteFile', () => {
  it('atomicWriteFile creates a new file with the given text', async () => {
    const target = join(folder(), 'a.blockwise.json');
    await atomicWriteFile(target, '{"format":1}');
    expect(await readFile(target, 'utf8')).toBe('{"format":1}');
    expect(await readdir(folder())).toEqual(['a.blockwise.json']);
  });

  it('atomicWriteFile replaces an existing file and leaves no temporary file', async () => {
    const target = join(folder(), 'a.blockwise.json');
    await writeFile(target, 'old');
    await atomicWriteFile(target, new TextEncoder().encode('new contents'));
    expect(await readFile(target, 'utf8')).toBe('new contents');
    expect(await readdir(folder())).toEqual(['a.blockwise.json']);
  });

  it('atomicWriteFile keeps the old file when the write fails half way', async () => {
    const target = join(folder(), 'project.blockwise.json');
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
    expect(await readdir(folder())).toEqual(['project.blockwise.json']);
  });

  it('atomicWriteFile keeps the old file when the rename fails', async () => {
    const target = join(folder(), 'p.json');
    await writeFile(target, 'old');
    const failing: AtomicWriteOps = {
      ...nodeAtomicWriteOps,
      rename: async () => {
        throw new Error('EXDEV: cross-device link not permitted');
      },
    };
    await expect(atomicWriteFile(target, 'new', failing)).rejects.toThrow(/EXDEV/);
    expect(await readFile(target, 'utf8')).toBe('old');
    expect(await readdir(folder())).toEqual(['p.json']);
  });

  it('atomicWriteFile fails with the target named when the folder does not exist', async () => {
    const target = join(folder(), 'missing', 'p.json');
    await expect(atomicWriteFile(target, 'x')).rejects.toThrow(/could not save .*missing.*p\.json/);
  });

  it('tempPathFor puts the temporary file in the target folder', () => {
    expect(tempPathFor('/a/b/p.json', 'x1')).toBe('/a/b/.p.json.x1.tmp');
  });

  it('atomicWriteFile keeps the old file when the writing process is killed mid-write', async () => {
    const target = join(folder(), 'killed.blockwise.json');
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
    const tempFiles = (await readdir(folder())).filter((f) => f.endsWith('.tmp'));
    expect(tempFiles.length).toBe(1);
    child.kill('SIGKILL');
    await new Promise((r) => child.once('exit', r));
    expect(await readFile(target, 'utf8')).toBe('survives a crash');
  }, 30_000);
});

describe('atomicWriteFile on links, read-only files and stale temporaries', () => {
  it('atomicWriteFile through a symlink writes the file it points at and keeps the link', async () => {
    const real = join(folder(), 'real.blockwise.json');
    const link = join(folder(), 'link.blockwise.json');
    await writeFile(real, 'old');
    await symlink(real, link);
    await atomicWriteFile(link, 'new');
    expect(await readFile(real, 'utf8')).toBe('new');
    expect((await lstat(link)).isSymbolicLink()).toBe(true);
    expect(await readFile(link, 'utf8')).toBe('new');
    expect((await readdir(folder())).sort()).toEqual(['link.blockwise.json', 'real.blockwise.json']);
  });

  it('atomicWriteFile refuses a read-only file with a message and leaves it as it was', async () => {
    const target = join(folder(), 'locked.blockwise.json');
    await writeFile(target, 'keep me');
    await chmod(target, 0o444);
    await expect(atomicWriteFile(target, 'overwrite')).rejects.toThrow(`could not save ${target}: the file is read-only; make it writable or save under another name (the file is unchanged)`);
    expect(await readFile(target, 'utf8')).toBe('keep me');
    expect(await readdir(folder())).toEqual(['locked.blockwise.json']);
  });

  it('removeStaleTemporaries removes this program\'s temporaries of dead writers and old ones, nothing else', async () => {
    const target = join(folder(), 'jet.blockwise.json');
    await writeFile(target, 'project');
    // A pid that no process has: above the kernel's pid_max (4,194,304 at most on Linux; proc(5)).
    const dead = tempPathFor(target, '4999999-0123abcd');
    const ownLive = tempPathFor(target, `${process.pid}-89abcdef`);
    const otherLiveFresh = tempPathFor(target, '1-00000000');
    const otherLiveOld = tempPathFor(target, '1-11111111');
    const unrelated = join(folder(), '.jet.blockwise.json.backup.tmp');
    for (const p of [dead, ownLive, otherLiveFresh, otherLiveOld, unrelated]) await writeFile(p, 'partial');
    const old = (Date.now() - STALE_TEMPORARY_AGE_MS - 60_000) / 1000;
    await utimes(otherLiveOld, old, old);
    const removed = await removeStaleTemporaries(target);
    expect(removed.sort()).toEqual(['.jet.blockwise.json.1-11111111.tmp', '.jet.blockwise.json.4999999-0123abcd.tmp']);
    expect((await readdir(folder())).sort()).toEqual(['.jet.blockwise.json.1-00000000.tmp', `.jet.blockwise.json.${process.pid}-89abcdef.tmp`, '.jet.blockwise.json.backup.tmp', 'jet.blockwise.json']);
  });
});
