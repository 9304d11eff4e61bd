import type { RecoveryOffer } from '../../electron/hostApi';
import { BridgeError, type Bridge, type RecentEntry } from './bridge';
import { loadDemoFiles } from './demoFiles';

/** localStorage keys used by the browser build. */
export const STORAGE_KEYS = { recent: 'blockwise.recentProjects', recovery: 'blockwise.unsavedProject' } as const;

const RECENT_LIMIT = 10;
const MAX_FILE_BYTES = 32 * 1024 * 1024;

/** What the browser bridge uses of the page; tests pass their own. */
export interface BrowserEnvironment {
  readonly document: Document;
  readonly storage: Storage;
  readonly now_ms: () => number;
  readonly print: () => void;
}

function defaultEnvironment(): BrowserEnvironment {
  return { document: window.document, storage: window.localStorage, now_ms: () => Date.now(), print: () => window.print() };
}

/** Shows the browser's file picker; resolves with the chosen file or null when cancelled. */
function pickFile(doc: Document, accept: string, testId: string): Promise<File | null> {
  return new Promise((resolve) => {
    const input = doc.createElement('input');
    input.type = 'file';
    input.accept = accept;
    input.hidden = true;
    input.dataset.testid = testId;
    const finish = (file: File | null): void => {
      input.remove();
      resolve(file);
    };
    input.addEventListener('change', () => finish(input.files?.[0] ?? null), { once: true });
    input.addEventListener('cancel', () => finish(null), { once: true });
    doc.body.append(input);
    input.click();
  });
}

async function readPicked(file: File): Promise<string> {
  if (file.size > MAX_FILE_BYTES) {
    throw new BridgeError('too_large', `${file.name} is ${file.size} bytes; files up to ${MAX_FILE_BYTES} bytes are accepted`);
  }
  const bytes = new Uint8Array(await file.arrayBuffer());
  try {
    const text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  } catch {
    throw new BridgeError('read_failed', `${file.name} is not UTF-8 text`);
  }
}

/** Offers `text` as a download named `fileName`. */
function download(doc: Document, text: string, fileName: string, mime: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: mime }));
  const a = doc.createElement('a');
  a.href = url;
  a.download = fileName;
  a.hidden = true;
  doc.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

function withExtension(name: string, extension: string): string {
  return name.toLowerCase().endsWith(extension) ? name : `${name}${extension}`;
}

function readJson(storage: Storage, key: string): unknown {
  const raw = storage.getItem(key);
  if (raw === null) return null;
  try {
    return JSON.parse(raw) as unknown;
  } catch {
    return null;
  }
}

function writeJson(storage: Storage, key: string, value: unknown, what: string): void {
  try {
    storage.setItem(key, JSON.stringify(value));
  } catch (e) {
    throw new BridgeError('storage_failed', `could not store the ${what} in this browser: ${(e as Error).message}`);
  }
}

function isRecentEntry(v: unknown): v is RecentEntry {
  if (typeof v !== 'object' || v === null) return false;
  const r = v as Record<string, unknown>;
  return typeof r.name === 'string' && typeof r.openedAt_ms === 'number' && Number.isFinite(r.openedAt_ms);
}

function isRecoveryOffer(v: unknown): v is RecoveryOffer {
  if (typeof v !== 'object' || v === null) return false;
  const r = v as Record<string, unknown>;
  return typeof r.name === 'string' && typeof r.text === 'string' && typeof r.savedAt_ms === 'number' && Number.isFinite(r.savedAt_ms);
}

/**
 * The bridge for a plain browser: file pickers, downloads, window.print()
 * and localStorage for the recent list (names only) and unsaved work.
 */
export function createBrowserBridge(env: BrowserEnvironment = defaultEnvironment()): Bridge {
  const recent = (): readonly RecentEntry[] => {
    const stored = readJson(env.storage, STORAGE_KEYS.recent);
    return Array.isArray(stored) ? stored.filter(isRecentEntry).map((r) => ({ name: r.name, openedAt_ms: r.openedAt_ms })) : [];
  };
  const remember = (name: string): void => {
    const next = [{ name, openedAt_ms: env.now_ms() }, ...recent().filter((r) => r.name !== name)].slice(0, RECENT_LIMIT);
    try {
      writeJson(env.storage, STORAGE_KEYS.recent, next, 'recent projects list');
    } catch {
      // The recent list is a convenience; a full storage must not fail an open or save.
    }
  };
  const saveDownload = async (text: string, suggestedName: string) => {
    const name = withExtension(suggestedName, '.blockwise.json');
    download(env.document, text, name, 'application/json');
    remember(name);
    env.storage.removeItem(STORAGE_KEYS.recovery);
    return { name };
  };

  return {
    kind: 'browser',
    openProject: async () => {
      const file = await pickFile(env.document, '.json,application/json', 'bridge-open-project');
      if (file === null) return null;
      const text = await readPicked(file);
      remember(file.name);
      return { name: file.name, text };
    },
    openRecent: async (path) => {
      throw new BridgeError('not_available', `the browser cannot reopen "${path}" by itself; use Open project`);
    },
    initialDocument: async () => null,
    saveProject: saveDownload,
    saveProjectAs: saveDownload,
    importDeck: async () => {
      const file = await pickFile(env.document, '.csv,.json,.txt,text/csv,application/json', 'bridge-import-deck');
      if (file === null) return null;
      return { name: file.name, text: await readPicked(file) };
    },
    readBesideProject: async (relativePath) => {
      throw new BridgeError('not_available', `a browser cannot read "${relativePath}" next to the project by itself; import the deck file`);
    },
    exportText: async (text, suggestedName, mime) => {
      download(env.document, text, suggestedName, mime);
      return { name: suggestedName };
    },
    printReport: async () => {
      env.print();
      return null;
    },
    recentFiles: async () => recent(),
    loadDemo: loadDemoFiles,
    autosave: async (name, text) => {
      const offer: RecoveryOffer = { name, text, savedAt_ms: env.now_ms(), projectPath: null };
      writeJson(env.storage, STORAGE_KEYS.recovery, offer, 'autosaved copy');
    },
    recoveryOffer: async () => {
      const stored = readJson(env.storage, STORAGE_KEYS.recovery);
      return isRecoveryOffer(stored) ? { name: stored.name, text: stored.text, savedAt_ms: stored.savedAt_ms, projectPath: null } : null;
    },
    discardRecovery: async () => {
      env.storage.removeItem(STORAGE_KEYS.recovery);
    },
    setDocumentState: async (state) => {
      env.document.title = `${state.name.trim() || 'Untitled project'}${state.dirty ? ' (unsaved)' : ''} — Blockwise`;
    },
    onMenuCommand: () => () => undefined,
  };
}
