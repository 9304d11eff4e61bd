import { utimes, writeFile, mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { discardRecovery, readRecoveryOffer, recoveryFilePath, shouldOfferRecovery, writeRecovery } from '../../electron/autosave';
import { scratchFolderEachTest } from '../support/scratchFolder';

// Recovery rule (common practice for editors with autosave): offer stored
// unsaved work only when it is newer than the saved project, or the project
// was never saved or has gone.

const folder = scratchFolderEachTest('blockwise-autosave-');

describe('shouldOfferRecovery', () => {
  it('shouldOfferRecovery offers work that was never saved', () => {
    expect(shouldOfferRecovery(1000, null)).toBe(true);
  });
  it('shouldOfferRecovery offers work newer than the project and not older or equal', () => {
    expect(shouldOfferRecovery(2000, 1000)).toBe(true);
    expect(shouldOfferRecovery(1000, 2000)).toBe(false);
    expect(shouldOfferRecovery(1000, 1000)).toBe(false);
  });
});

describe('writeRecovery and readRecoveryOffer', () => {
  it('readRecoveryOffer finds nothing when nothing was autosaved', async () => {
    expect(await readRecoveryOffer(folder())).toEqual({ offer: null, problem: null });
  });

  it('readRecoveryOffer offers unsaved work of a never-saved project', async () => {
    await writeRecovery(folder(), { name: 'Demo jet', text: '{"format":1}', projectPath: null }, 1_700_000_000_000);
    expect(await readRecoveryOffer(folder())).toEqual({
      offer: { name: 'Demo jet', text: '{"format":1}', savedAt_ms: 1_700_000_000_000, projectPath: null },
      problem: null,
    });
  });

  it('readRecoveryOffer offers work newer than the project file', async () => {
    const project = join(folder(), 'p.blockwise.json');
    await writeFile(project, 'saved');
    await utimes(project, new Date(1_000_000_000_000), new Date(1_000_000_000_000));
    await writeRecovery(folder(), { name: 'p', text: 'edited', projectPath: project }, 1_000_000_060_000);
    expect((await readRecoveryOffer(folder())).offer?.text).toBe('edited');
  });

  it('readRecoveryOffer does not offer work older than the project file', async () => {
    const project = join(folder(), 'p.blockwise.json');
    await writeFile(project, 'saved later');
    await utimes(project, new Date(1_000_000_060_000), new Date(1_000_000_060_000));
    await writeRecovery(folder(), { name: 'p', text: 'older edit', projectPath: project }, 1_000_000_000_000);
    expect(await readRecoveryOffer(folder())).toEqual({ offer: null, problem: null });
  });

  it('readRecoveryOffer offers work whose project file has gone', async () => {
    await writeRecovery(folder(), { name: 'p', text: 'orphan', projectPath: join(folder(), 'deleted.json') }, 5);
    expect((await readRecoveryOffer(folder())).offer?.text).toBe('orphan');
  });

  it('readRecoveryOffer reports a damaged recovery file and offers nothing', async () => {
    await mkdir(join(folder(), 'recovery'), { recursive: true });
    await writeFile(recoveryFilePath(folder()), JSON.stringify({ format: 1, name: 'p', savedAt_ms: 'soon', projectPath: null, text: '' }));
    const r = await readRecoveryOffer(folder());
    expect(r.offer).toBeNull();
    expect(r.problem).toMatch(/unsaved-project\.json at savedAt_ms/);
  });

  it('discardRecovery removes the file and tolerates its absence', async () => {
    await writeRecovery(folder(), { name: 'p', text: 't', projectPath: null }, 5);
    await discardRecovery(folder());
    expect(await readRecoveryOffer(folder())).toEqual({ offer: null, problem: null });
    await expect(discardRecovery(folder())).resolves.toBeUndefined();
  });

  it('writeRecovery replaces the previous recovery copy', async () => {
    await writeRecovery(folder(), { name: 'p', text: 'first', projectPath: null }, 5);
    await writeRecovery(folder(), { name: 'p', text: 'second', projectPath: null }, 6);
    expect((await readRecoveryOffer(folder())).offer).toMatchObject({ text: 'second', savedAt_ms: 6 });
  });
});
