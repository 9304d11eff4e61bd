import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { IPC_CHANNELS } from '../../electron/ipcChannels';

// Wiring of electron/main.ts with the electron module mocked (the binary
// cannot run here): one window with the checklist options, every channel
// registered behind the checks, title and close guard driven by the page.

const h = vi.hoisted(() => {
  const state = {
    windows: [] as { options: Record<string, unknown>; title: string; loaded: string; listeners: Map<string, (e: { preventDefault: () => void }) => void> }[],
    handlers: new Map<string, (event: unknown, ...args: unknown[]) => Promise<unknown>>(),
    appListeners: new Map<string, (...args: unknown[]) => void>(),
    permissionHandlerSet: false,
    menuTemplates: [] as unknown[],
    boxAnswers: [] as number[],
    sandboxEnabled: false,
    userData: '',
  };
  return state;
});

vi.mock('electron', () => {
  class BrowserWindow {
    private readonly record;
    readonly webContents = { send: () => undefined };
    constructor(options: Record<string, unknown>) {
      this.record = { options, title: '', loaded: '', listeners: new Map() };
      h.windows.push(this.record);
    }
    on(name: string, fn: (e: { preventDefault: () => void }) => void) {
      this.record.listeners.set(name, fn);
      return this;
    }
    once(name: string, fn: (e: { preventDefault: () => void }) => void) {
      return this.on(name, fn);
    }
    setTitle(t: string) {
      this.record.title = t;
    }
    setDocumentEdited() {}
    show() {}
    async loadURL(url: string) {
      this.record.loaded = url;
    }
  }
  return {
    BrowserWindow,
    Menu: { buildFromTemplate: (t: unknown) => t, setApplicationMenu: (t: unknown) => h.menuTemplates.push(t) },
    dialog: {
      showMessageBoxSync: () => h.boxAnswers.shift() ?? 0,
      showMessageBox: async () => ({ response: 0 }),
      showErrorBox: () => undefined,
      showOpenDialog: async () => ({ canceled: true, filePaths: [] }),
      showSaveDialog: async () => ({ canceled: true }),
    },
    ipcMain: { handle: (channel: string, fn: (event: unknown, ...args: unknown[]) => Promise<unknown>) => h.handlers.set(channel, fn) },
    session: {
      defaultSession: {
        setPermissionRequestHandler: () => {
          h.permissionHandlerSet = true;
        },
        setPermissionCheckHandler: () => undefined,
        webRequest: { onHeadersReceived: () => undefined },
      },
    },
    app: {
      isPackaged: false,
      enableSandbox: () => {
        h.sandboxEnabled = true;
      },
      whenReady: () => Promise.resolve(),
      on: (name: string, fn: (...args: unknown[]) => void) => {
        h.appListeners.set(name, fn);
      },
      getPath: (name: string) => (name === 'userData' ? h.userData : tmpdir()),
      getVersion: () => '0.0.0-test',
      exit: () => undefined,
      quit: () => undefined,
    },
  };
});

const DEV = 'http://127.0.0.1:5999/';
let folder: string;
let project: string;
const savedArgv = process.argv;

beforeAll(async () => {
  folder = await mkdtemp(join(tmpdir(), 'blockwise-main-'));
  h.userData = folder;
  project = join(folder, 'demo.blockwise.json');
  await writeFile(project, '{"format":1}');
  process.env.BLOCKWISE_DEV_URL = DEV;
  process.argv = ['electron', '.', project];
  await import('../../electron/main');
  await vi.waitFor(() => expect(h.windows[0]?.loaded).toBe(DEV));
});
afterAll(async () => {
  process.argv = savedArgv;
  delete process.env.BLOCKWISE_DEV_URL;
  await rm(folder, { recursive: true, force: true });
});

const fromApp = { senderFrame: { url: `${DEV}index.html`, parent: null }, sender: {} };

describe('electron/main', () => {
  it('main opens one sandboxed, isolated window on the app page with the preload', () => {
    expect(h.sandboxEnabled).toBe(true);
    expect(h.windows.length).toBe(1);
    const prefs = h.windows[0]?.options.webPreferences as Record<string, unknown>;
    expect(prefs).toMatchObject({ contextIsolation: true, sandbox: true, nodeIntegration: false });
    expect(String(prefs.preload)).toMatch(/preload\.cjs$/);
    expect(h.windows[0]?.title).toBe('Untitled project — Blockwise');
    expect(h.permissionHandlerSet).toBe(true);
    expect(h.appListeners.has('web-contents-created')).toBe(true);
    expect(h.menuTemplates.length).toBeGreaterThan(0);
  });

  it('main registers every invoke channel behind the sender check', async () => {
    const invokeChannels = Object.entries(IPC_CHANNELS).filter(([k]) => k !== 'menuCommand').map(([, v]) => v);
    expect([...h.handlers.keys()].sort()).toEqual([...invokeChannels].sort());
    const foreign = await h.handlers.get(IPC_CHANNELS.recentFiles)?.({ senderFrame: { url: 'https://example.invalid/', parent: null } });
    expect(foreign).toMatchObject({ ok: false, error: { code: 'foreign_sender' } });
  });

  it('main hands the command-line project to the page once', async () => {
    const first = await h.handlers.get(IPC_CHANNELS.initialDocument)?.(fromApp);
    expect(first).toEqual({ ok: true, value: { name: 'demo.blockwise.json', path: project, text: '{"format":1}' } });
    expect(await h.handlers.get(IPC_CHANNELS.initialDocument)?.(fromApp)).toEqual({ ok: true, value: null });
  });

  it('main shows the unsaved marker and asks before closing unsaved work', async () => {
    await h.handlers.get(IPC_CHANNELS.documentState)?.(fromApp, { name: 'Demo jet', dirty: true });
    expect(h.windows[0]?.title).toBe('Demo jet (unsaved) — Blockwise');
    const close = h.windows[0]?.listeners.get('close');
    const kept = { preventDefault: vi.fn() };
    h.boxAnswers.push(0);
    close?.(kept);
    expect(kept.preventDefault).toHaveBeenCalled();
    const discarded = { preventDefault: vi.fn() };
    h.boxAnswers.push(1);
    close?.(discarded);
    expect(discarded.preventDefault).not.toHaveBeenCalled();

    await h.handlers.get(IPC_CHANNELS.documentState)?.(fromApp, { name: 'Demo jet', dirty: false });
    const clean = { preventDefault: vi.fn() };
    close?.(clean);
    expect(clean.preventDefault).not.toHaveBeenCalled();
    expect(h.windows[0]?.title).toBe('Demo jet — Blockwise');
  });
});
