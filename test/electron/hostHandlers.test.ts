import { mkdtemp, readFile, readdir, rm, symlink, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { readRecoveryOffer } from '../../electron/autosave';
import { createHostHandlers, type HostDeps, type HostSession } from '../../electron/hostHandlers';
import type { InvokeEventLike } from '../../electron/ipcValidation';
import { loadRecentFiles } from '../../electron/recentFiles';

// Shell behaviour from the task brief: the page never names a path to write;
// every path written was chosen in a dialog or is the open project; saving
// clears the recovery copy; a file that fails to open leaves the recent list.

const event: InvokeEventLike = { senderFrame: { url: 'file:///app/index.html', parent: null } };
let folder: string;
let userData: string;
let deps: HostDeps<InvokeEventLike> & { openAnswers: (string | null)[]; saveAnswers: (string | null)[]; warnings: string[] };
let session: HostSession;

beforeEach(async () => {
  folder = await mkdtemp(join(tmpdir(), 'blockwise-host-'));
  userData = join(folder, 'userData');
  await import('node:fs/promises').then((f) => f.mkdir(userData));
  const openAnswers: (string | null)[] = [];
  const saveAnswers: (string | null)[] = [];
  const warnings: string[] = [];
  let clock = 1_000_000;
  deps = {
    openAnswers,
    saveAnswers,
    warnings,
    userDataFolder: userData,
    documentsFolder: join(folder, 'docs'),
    templateFolders: [join(folder, 'templates')],
    now_ms: () => (clock += 1000),
    chooseFileToOpen: vi.fn(async () => openAnswers.shift() ?? null),
    chooseFileToSave: vi.fn(async () => saveAnswers.shift() ?? null),
    printToPdf: vi.fn(async () => new TextEncoder().encode('%PDF-1.7 fake')),
    showDocumentState: vi.fn(),
    recentChanged: vi.fn(),
    warn: (m) => warnings.push(m),
  };
  session = { projectPath: null, document: { name: 'Untitled project', dirty: false }, recent: [], initialProjectPath: null };
});
afterEach(async () => {
  await rm(folder, { recursive: true, force: true });
});

describe('createHostHandlers', () => {
  it('openProject returns null when the dialog is cancelled', async () => {
    const h = createHostHandlers(deps, session);
    expect(await h.openProject(event)).toEqual({ ok: true, value: null });
  });

  it('openProject reads the chosen file, remembers it and makes it the save target', async () => {
    const path = join(folder, 'jet.blockwise.json');
    await writeFile(path, '\ufeff{"format":1}');
    deps.openAnswers.push(path);
    const h = createHostHandlers(deps, session);
    expect(await h.openProject(event)).toEqual({ ok: true, value: { name: 'jet.blockwise.json', path, text: '{"format":1}' } });
    expect(session.projectPath).toBe(path);
    expect((await loadRecentFiles(userData)).files.map((f) => f.path)).toEqual([path]);
    expect(deps.recentChanged).toHaveBeenCalled();

    const saved = await h.saveProject(event, '{"format":1,"edited":true}', 'ignored name');
    expect(saved).toEqual({ ok: true, value: { name: 'jet.blockwise.json', path } });
    expect(deps.chooseFileToSave).not.toHaveBeenCalled();
    expect(await readFile(path, 'utf8')).toBe('{"format":1,"edited":true}');
  });

  it('openProject refuses a file that is not UTF-8 and names it', async () => {
    const path = join(folder, 'binary.json');
    await writeFile(path, Buffer.from([0xff, 0xfe, 0x00, 0xc3]));
    deps.openAnswers.push(path);
    const r = await createHostHandlers(deps, session).openProject(event);
    expect(r).toMatchObject({ ok: false, error: { code: 'read_failed' } });
    if (!r.ok) expect(r.error.message).toMatch(/binary\.json": it (is not UTF-8 text|holds NUL bytes)/);
  });

  it('saveProject asks where for a new project, adds the extension and clears the recovery copy', async () => {
    const h = createHostHandlers(deps, session);
    await h.autosave(event, 'Demo jet', '{"unsaved":true}');
    expect((await readRecoveryOffer(userData)).offer?.text).toBe('{"unsaved":true}');

    const target = join(folder, 'chosen.blockwise.json');
    deps.saveAnswers.push(target);
    expect(await h.saveProject(event, '{"saved":true}', 'Demo jet')).toEqual({ ok: true, value: { name: 'chosen.blockwise.json', path: target } });
    expect(deps.chooseFileToSave).toHaveBeenCalledWith('Save project', join(folder, 'docs', 'Demo jet.blockwise.json'), expect.anything());
    expect(await readFile(target, 'utf8')).toBe('{"saved":true}');
    expect((await readRecoveryOffer(userData)).offer).toBeNull();
  });

  it('saveProjectAs with a cancelled dialog writes nothing', async () => {
    session.projectPath = join(folder, 'existing.json');
    const r = await createHostHandlers(deps, session).saveProjectAs(event, 'x', 'Demo');
    expect(r).toEqual({ ok: true, value: null });
    expect(await readdir(folder)).toEqual(['userData']);
  });

  it('saveProject reports a failed write and keeps the previous file', async () => {
    const h = createHostHandlers(deps, session);
    const blocked = join(folder, 'no-such-folder', 'p.blockwise.json');
    deps.saveAnswers.push(blocked);
    const r = await h.saveProject(event, 'x', 'p');
    expect(r).toMatchObject({ ok: false, error: { code: 'write_failed' } });
    expect(session.projectPath).toBeNull();
  });

  it('openRecent refuses a path that is not in the recent list', async () => {
    const r = await createHostHandlers(deps, session).openRecent(event, '/etc/passwd');
    expect(r).toMatchObject({ ok: false, error: { code: 'not_recent' } });
  });

  it('openRecent drops a recent file that can no longer be read', async () => {
    const gone = join(folder, 'gone.json');
    session.recent = [{ path: gone, name: 'gone.json', openedAt_ms: 1 }];
    const r = await createHostHandlers(deps, session).openRecent(event, gone);
    expect(r).toMatchObject({ ok: false, error: { code: 'read_failed' } });
    expect(session.recent).toEqual([]);
  });

  it('a project opened from a template folder is never saved over', async () => {
    const templates = join(folder, 'templates');
    await import('node:fs/promises').then((f) => f.mkdir(templates));
    const demo = join(templates, 'demo.blockwise.json');
    await writeFile(demo, '{"demo":true}');
    session.initialProjectPath = demo;
    const h = createHostHandlers(deps, session);
    expect(await h.initialDocument(event)).toMatchObject({ ok: true, value: { path: demo, text: '{"demo":true}' } });
    const copy = join(folder, 'my-study.blockwise.json');
    deps.saveAnswers.push(copy);
    expect(await h.saveProject(event, '{"demo":"edited"}', 'demo')).toEqual({ ok: true, value: { name: 'my-study.blockwise.json', path: copy } });
    expect(deps.chooseFileToSave).toHaveBeenCalled();
    expect(await readFile(demo, 'utf8')).toBe('{"demo":true}');
    expect(await readFile(copy, 'utf8')).toBe('{"demo":"edited"}');
  });

  it('initialDocument opens the command-line project once', async () => {
    const path = join(folder, 'demo.blockwise.json');
    await writeFile(path, '{}');
    session.initialProjectPath = path;
    const h = createHostHandlers(deps, session);
    expect(await h.initialDocument(event)).toMatchObject({ ok: true, value: { path, text: '{}' } });
    expect(await h.initialDocument(event)).toEqual({ ok: true, value: null });
  });

  it('importDeck returns the chosen deck text without making it the project', async () => {
    const deck = join(folder, 'engine.deck.csv');
    await writeFile(deck, 'altitude[ft],mach[-]\n0,0\n');
    deps.openAnswers.push(deck);
    const r = await createHostHandlers(deps, session).importDeck(event);
    expect(r).toEqual({ ok: true, value: { name: 'engine.deck.csv', text: 'altitude[ft],mach[-]\n0,0\n' } });
    expect(session.projectPath).toBeNull();
  });

  it('readBesideProject reads the deck named relative to the open project', async () => {
    const h = createHostHandlers(deps, session);
    expect(await h.readBesideProject(event, 'demo-engine.deck.csv')).toEqual({ ok: true, value: null });
    await import('node:fs/promises').then((f) => f.mkdir(join(folder, 'decks')));
    await writeFile(join(folder, 'decks', 'engine.deck.csv'), 'altitude[ft],mach[-]\n');
    session.projectPath = join(folder, 'jet.blockwise.json');
    expect(await h.readBesideProject(event, 'decks/engine.deck.csv')).toEqual({
      ok: true,
      value: { name: 'engine.deck.csv', text: 'altitude[ft],mach[-]\n' },
    });
    expect(await h.readBesideProject(event, 'missing.csv')).toMatchObject({ ok: false, error: { code: 'read_failed' } });
  });

  it('readBesideProject refuses a path that leads outside the project folder', async () => {
    session.projectPath = join(folder, 'docs', 'jet.blockwise.json');
    await writeFile(join(folder, 'secret.txt'), 'not for the page');
    const r = await createHostHandlers(deps, session).readBesideProject(event, '../secret.txt');
    expect(r).toMatchObject({ ok: false, error: { code: 'outside_project' } });
    if (!r.ok) expect(r.error.message).toContain('"../secret.txt" leads outside the project folder');
  });

  it('readBesideProject refuses a symlink inside the project folder that leads outside it', async () => {
    await import('node:fs/promises').then((f) => f.mkdir(join(folder, 'docs')));
    session.projectPath = join(folder, 'docs', 'jet.blockwise.json');
    await writeFile(join(folder, 'secret.txt'), 'not for the page');
    await symlink(join(folder, 'secret.txt'), join(folder, 'docs', 'engine.deck.csv'));
    const r = await createHostHandlers(deps, session).readBesideProject(event, 'engine.deck.csv');
    expect(r).toMatchObject({ ok: false, error: { code: 'outside_project' } });
    if (!r.ok) expect(r.error.message).toMatch(/"engine\.deck\.csv" is a link to .*secret\.txt, outside the project folder/);
  });

  it('openProject and saveProject remove a killed save\'s temporary file beside the project', async () => {
    const path = join(folder, 'jet.blockwise.json');
    await writeFile(path, '{"format":1}');
    await writeFile(join(folder, '.jet.blockwise.json.4999999-deadbeef.tmp'), 'half a save');
    deps.openAnswers.push(path);
    const h = createHostHandlers(deps, session);
    expect(await h.openProject(event)).toMatchObject({ ok: true });
    expect(await readdir(folder)).not.toContain('.jet.blockwise.json.4999999-deadbeef.tmp');
    await writeFile(join(folder, '.jet.blockwise.json.4999998-deadbeef.tmp'), 'another');
    expect(await h.saveProject(event, '{"format":1,"edited":true}', 'jet')).toMatchObject({ ok: true });
    expect((await readdir(folder)).filter((f) => f.endsWith('.tmp'))).toEqual([]);
  });

  it('exportResultsCsv writes the text where the user chose', async () => {
    const target = join(folder, 'results.csv');
    deps.saveAnswers.push(target);
    const r = await createHostHandlers(deps, session).exportResultsCsv(event, 'leg,fuel[kg]\nclimb,1200\n', 'results');
    expect(r).toEqual({ ok: true, value: { name: 'results.csv', path: target } });
    expect(await readFile(target, 'utf8')).toBe('leg,fuel[kg]\nclimb,1200\n');
  });

  it('printReportPdf renders the page and writes the PDF where the user chose', async () => {
    const target = join(folder, 'report.pdf');
    deps.saveAnswers.push(target);
    const r = await createHostHandlers(deps, session).printReportPdf(event, 'report');
    expect(r).toEqual({ ok: true, value: { name: 'report.pdf', path: target } });
    expect(deps.printToPdf).toHaveBeenCalledWith(event);
    expect(await readFile(target, 'utf8')).toBe('%PDF-1.7 fake');
  });

  it('documentState records the unsaved flag for the close guard and shows it', async () => {
    await createHostHandlers(deps, session).documentState(event, { name: 'Demo jet', dirty: true });
    expect(session.document).toEqual({ name: 'Demo jet', dirty: true });
    expect(deps.showDocumentState).toHaveBeenCalledWith({ name: 'Demo jet', dirty: true });
  });

  it('recoveryOffer reports a damaged recovery file through warn and offers nothing', async () => {
    await import('node:fs/promises').then(async (f) => {
      await f.mkdir(join(userData, 'recovery'));
      await f.writeFile(join(userData, 'recovery', 'unsaved-project.json'), 'not json');
    });
    expect(await createHostHandlers(deps, session).recoveryOffer(event)).toEqual({ ok: true, value: null });
    expect(deps.warnings[0]).toMatch(/not valid JSON/);
  });
});
