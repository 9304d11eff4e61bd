import { readFile, writeFile } from 'node:fs/promises';
import { describe, expect, it } from 'vitest';
import { RECENT_LIMIT, loadRecentFiles, recentFilesPath, saveRecentFiles, withRecentFile, withoutRecentFile } from '../../electron/recentFiles';
import { scratchFolderEachTest } from '../support/scratchFolder';

// Most-recently-used list behaviour (common practice): newest first, no
// duplicates, bounded length, a damaged store reported and not trusted.

const folder = scratchFolderEachTest('blockwise-recent-');

describe('withRecentFile', () => {
  it('withRecentFile puts the file first with its base name and time', () => {
    const list = withRecentFile([], '/p/a.blockwise.json', 1000);
    expect(list).toEqual([{ path: '/p/a.blockwise.json', name: 'a.blockwise.json', openedAt_ms: 1000 }]);
  });

  it('withRecentFile moves a reopened file to the front without duplicating it', () => {
    let list = withRecentFile([], '/p/a.json', 1);
    list = withRecentFile(list, '/p/b.json', 2);
    list = withRecentFile(list, '/p/a.json', 3);
    expect(list.map((f) => f.path)).toEqual(['/p/a.json', '/p/b.json']);
    expect(list[0]?.openedAt_ms).toBe(3);
  });

  it('withRecentFile keeps at most RECENT_LIMIT entries, dropping the oldest', () => {
    let list = withRecentFile([], '/p/0.json', 0);
    for (let i = 1; i <= RECENT_LIMIT + 3; i++) list = withRecentFile(list, `/p/${i}.json`, i);
    expect(list.length).toBe(RECENT_LIMIT);
    expect(list[0]?.path).toBe(`/p/${RECENT_LIMIT + 3}.json`);
    expect(list.some((f) => f.path === '/p/0.json')).toBe(false);
  });

  it('withoutRecentFile removes only the given path', () => {
    const list = withRecentFile(withRecentFile([], '/a', 1), '/b', 2);
    expect(withoutRecentFile(list, '/a').map((f) => f.path)).toEqual(['/b']);
  });
});

describe('loadRecentFiles and saveRecentFiles', () => {
  it('saveRecentFiles then loadRecentFiles round-trips the list', async () => {
    const list = withRecentFile(withRecentFile([], '/p/a.json', 10), '/p/b.json', 20);
    await saveRecentFiles(folder(), list);
    expect(await loadRecentFiles(folder())).toEqual({ files: list, problem: null });
  });

  it('loadRecentFiles returns an empty list without a problem when there is no file', async () => {
    expect(await loadRecentFiles(folder())).toEqual({ files: [], problem: null });
  });

  it('loadRecentFiles reports a damaged file with its path and starts empty', async () => {
    await writeFile(recentFilesPath(folder()), '{"format":1,"files":[{"path":"/a"');
    const r = await loadRecentFiles(folder());
    expect(r.files).toEqual([]);
    expect(r.problem).toMatch(/recent-projects\.json is not valid JSON/);
  });

  it('loadRecentFiles reports a wrong field with its JSON path', async () => {
    await writeFile(recentFilesPath(folder()), JSON.stringify({ format: 1, files: [{ path: '/a', name: 'a', openedAt_ms: -5 }] }));
    const r = await loadRecentFiles(folder());
    expect(r.files).toEqual([]);
    expect(r.problem).toMatch(/at files\.0\.openedAt_ms/);
  });

  it('saveRecentFiles writes the documented format', async () => {
    await saveRecentFiles(folder(), withRecentFile([], '/p/a.json', 5));
    expect(JSON.parse(await readFile(recentFilesPath(folder()), 'utf8'))).toEqual({
      format: 1,
      files: [{ path: '/p/a.json', name: 'a.json', openedAt_ms: 5 }],
    });
  });
});
