import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { BridgeError } from '../../../renderer/bridge/bridge';
import { STORAGE_KEYS, createBrowserBridge, type BrowserEnvironment } from '../../../renderer/bridge/browserBridge';

// Browser build behaviour from the task brief: file pickers, downloads
// (Blob + a.download), window.print(), localStorage for recent files and autosave.

let env: BrowserEnvironment & { printed: number };
let clock: number;

beforeEach(() => {
  localStorage.clear();
  document.body.innerHTML = '';
  clock = 1_700_000_000_000;
  const state = { printed: 0 };
  env = Object.assign(state, {
    document,
    storage: localStorage,
    now_ms: () => clock,
    print: () => {
      state.printed += 1;
    },
  });
});
afterEach(() => {
  vi.restoreAllMocks();
});

/** Answers the next file picker the bridge opens with `file` (or cancels with null). */
function answerPicker(file: File | null): void {
  const observer = new MutationObserver(() => {
    const input = document.querySelector<HTMLInputElement>('input[type=file]');
    if (!input) return;
    observer.disconnect();
    if (file === null) {
      input.dispatchEvent(new Event('cancel'));
    } else {
      Object.defineProperty(input, 'files', { value: [file] });
      input.dispatchEvent(new Event('change'));
    }
  });
  observer.observe(document.body, { childList: true });
}

describe('createBrowserBridge', () => {
  it('openProject reads the picked file, strips a BOM and remembers its name', async () => {
    const bridge = createBrowserBridge(env);
    answerPicker(new File(['\ufeff{"format":1}'], 'jet.blockwise.json', { type: 'application/json' }));
    expect(await bridge.openProject()).toEqual({ name: 'jet.blockwise.json', text: '{"format":1}' });
    expect(await bridge.recentFiles()).toEqual([{ name: 'jet.blockwise.json', openedAt_ms: clock }]);
    expect(document.querySelector('input[type=file]')).toBeNull();
  });

  it('openProject resolves null when the picker is cancelled', async () => {
    const bridge = createBrowserBridge(env);
    answerPicker(null);
    expect(await bridge.openProject()).toBeNull();
  });

  it('importDeck refuses a file that is not UTF-8 and names it', async () => {
    const bridge = createBrowserBridge(env);
    answerPicker(new File([new Uint8Array([0xff, 0xfe, 0xc3])], 'engine.deck.csv'));
    const failure = await bridge.importDeck().catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(BridgeError);
    expect((failure as BridgeError).code).toBe('read_failed');
    expect((failure as BridgeError).message).toBe('engine.deck.csv is not UTF-8 text');
  });

  it('exportText offers a download with the name and the text', async () => {
    const blobs: Blob[] = [];
    vi.spyOn(URL, 'createObjectURL').mockImplementation((b) => {
      blobs.push(b as Blob);
      return 'blob:results';
    });
    vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
    const clicks: { download: string; href: string }[] = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      clicks.push({ download: this.download, href: this.href });
    });
    const bridge = createBrowserBridge(env);
    expect(await bridge.exportText('leg,fuel[kg]\n', 'results.csv', 'text/csv')).toEqual({ name: 'results.csv' });
    expect(clicks).toEqual([{ download: 'results.csv', href: 'blob:results' }]);
    expect(blobs[0]?.type).toBe('text/csv');
    expect(await blobs[0]?.text()).toBe('leg,fuel[kg]\n');
  });

  it('saveProject downloads with the project extension and clears the autosaved copy', async () => {
    vi.spyOn(URL, 'createObjectURL').mockReturnValue('blob:p');
    vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
    const names: string[] = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      names.push(this.download);
    });
    const bridge = createBrowserBridge(env);
    await bridge.autosave('Demo jet', '{"unsaved":true}');
    expect(await bridge.saveProject('{}', 'Demo jet')).toEqual({ name: 'Demo jet.blockwise.json' });
    expect(names).toEqual(['Demo jet.blockwise.json']);
    expect(await bridge.recoveryOffer()).toBeNull();
  });

  it('autosave stores unsaved work that recoveryOffer returns and discardRecovery removes', async () => {
    const bridge = createBrowserBridge(env);
    await bridge.autosave('Demo jet', '{"edited":true}');
    expect(await bridge.recoveryOffer()).toEqual({ name: 'Demo jet', text: '{"edited":true}', savedAt_ms: clock, projectPath: null });
    await bridge.discardRecovery();
    expect(await bridge.recoveryOffer()).toBeNull();
  });

  it('recoveryOffer ignores a damaged stored copy', async () => {
    localStorage.setItem(STORAGE_KEYS.recovery, '{"name":"x","text":');
    expect(await createBrowserBridge(env).recoveryOffer()).toBeNull();
    localStorage.setItem(STORAGE_KEYS.recovery, JSON.stringify({ name: 'x', text: 'y', savedAt_ms: 'later' }));
    expect(await createBrowserBridge(env).recoveryOffer()).toBeNull();
  });

  it('autosave reports a full storage as a BridgeError', async () => {
    const full = { ...env, storage: { ...localStorage, getItem: () => null, removeItem: () => undefined, setItem: () => { throw new DOMException('quota exceeded', 'QuotaExceededError'); } } as unknown as Storage };
    await expect(createBrowserBridge(full).autosave('p', 'x')).rejects.toMatchObject({ code: 'storage_failed', message: expect.stringMatching(/autosaved copy.*quota exceeded/) });
  });

  it('recentFiles keeps the newest ten names without duplicates', async () => {
    const bridge = createBrowserBridge(env);
    for (let i = 0; i < 12; i++) {
      clock += 1;
      answerPicker(new File(['{}'], `p${i % 11}.json`));
      await bridge.openProject();
    }
    const recent = await bridge.recentFiles();
    expect(recent.length).toBe(10);
    expect(recent[0]?.name).toBe('p0.json');
    expect(new Set(recent.map((r) => r.name)).size).toBe(10);
  });

  it('readBesideProject is not available in the browser and says to import the deck', async () => {
    await expect(createBrowserBridge(env).readBesideProject?.('demo-engine.deck.csv')).rejects.toMatchObject({
      code: 'not_available',
      message: expect.stringContaining('import the deck file'),
    });
  });

  it('openRecent is not available in the browser', async () => {
    await expect(createBrowserBridge(env).openRecent('/p/jet.json')).rejects.toMatchObject({ code: 'not_available' });
  });

  it('printReport calls the page print dialog', async () => {
    const bridge = createBrowserBridge(env);
    expect(await bridge.printReport('report')).toBeNull();
    expect(env.printed).toBe(1);
  });

  it('setDocumentState puts the name and the unsaved marker in the page title', async () => {
    await createBrowserBridge(env).setDocumentState({ name: 'Demo jet', dirty: true });
    expect(document.title).toBe('Demo jet (unsaved) — Blockwise');
  });

  it('loadDemo returns the bundled demo project and deck', async () => {
    const demo = await createBrowserBridge(env).loadDemo();
    const fixtures = resolve(__dirname, '..', '..', '..', 'fixtures', 'demo');
    expect(demo.projectName).toBe('demo.blockwise.json');
    expect(demo.projectText).toBe(readFileSync(resolve(fixtures, 'demo.blockwise.json'), 'utf8'));
    expect(demo.deckName).toBe('demo-engine.deck.csv');
    expect(demo.deckText).toBe(readFileSync(resolve(fixtures, 'demo-engine.deck.csv'), 'utf8'));
  });
});
