import type { BlockwiseHost, DocumentState, MenuCommand, RecoveryOffer } from '../../electron/hostApi';

export type { DocumentState, MenuCommand, RecoveryOffer };

/** A project the user opened. `path` is known only on the desktop. */
export interface OpenedProject {
  readonly name: string;
  readonly text: string;
  readonly path?: string;
}

/** An engine deck file the user picked. */
export interface OpenedDeck {
  readonly name: string;
  readonly text: string;
}

/** Where a save or export went: a file path on the desktop, a download name in the browser. */
export interface SavedTo {
  readonly name: string;
  readonly path?: string;
}

export interface RecentEntry {
  readonly name: string;
  /** Present on the desktop only, where a recent project can be reopened. */
  readonly path?: string;
  readonly openedAt_ms: number;
}

/** The demo project and the deck it uses, as bundled with the app. */
export interface DemoFiles {
  readonly projectName: string;
  readonly projectText: string;
  readonly deckName: string;
  readonly deckText: string;
}

/** Failure codes of bridge calls (desktop codes pass through from the host). */
export type BridgeErrorCode =
  | 'foreign_sender'
  | 'bad_payload'
  | 'read_failed'
  | 'write_failed'
  | 'too_large'
  | 'not_recent'
  | 'outside_project'
  | 'no_window'
  | 'not_available'
  | 'demo_missing'
  | 'storage_failed';

/** A bridge call that failed; `message` says which file and what went wrong. Cancelling is not an error (null). */
export class BridgeError extends Error {
  readonly code: BridgeErrorCode;
  constructor(code: BridgeErrorCode, message: string) {
    super(message);
    this.name = 'BridgeError';
    this.code = code;
  }
}

/**
 * Everything the renderer asks of its host. The desktop shell implements it
 * over IPC (electronBridge.ts), a plain browser with file pickers, downloads
 * and localStorage (browserBridge.ts). Methods resolve to null when the user
 * cancels and reject with a BridgeError when something fails.
 */
export interface Bridge {
  readonly kind: 'desktop' | 'browser';
  openProject(): Promise<OpenedProject | null>;
  /** Reopens a recent project by path (desktop only). */
  openRecent(path: string): Promise<OpenedProject>;
  /** The project the app was started with (desktop: command-line argument), if any. */
  initialDocument(): Promise<OpenedProject | null>;
  saveProject(text: string, suggestedName: string): Promise<SavedTo | null>;
  saveProjectAs(text: string, suggestedName: string): Promise<SavedTo | null>;
  importDeck(): Promise<OpenedDeck | null>;
  /**
   * Reads the file an opened project names by a relative path (its deck file),
   * from the project's folder (desktop only: the browser rejects with
   * not_available; ask the user to import the deck). Null when no project
   * file is open. Optional only so that existing test fakes stay valid.
   */
  readBesideProject?(relativePath: string): Promise<OpenedDeck | null>;
  /** Exports text (results CSV) under a suggested file name. */
  exportText(text: string, suggestedName: string, mime: string): Promise<SavedTo | null>;
  /** Prints the current page with its print stylesheet (desktop: to a PDF file). */
  printReport(suggestedName: string): Promise<SavedTo | null>;
  recentFiles(): Promise<readonly RecentEntry[]>;
  loadDemo(): Promise<DemoFiles>;
  /** Stores unsaved work for recovery after a crash. */
  autosave(name: string, text: string): Promise<void>;
  /** Unsaved work from an earlier session that is newer than its saved project, if any. */
  recoveryOffer(): Promise<RecoveryOffer | null>;
  discardRecovery(): Promise<void>;
  /** Tells the host the project name and whether there are unsaved edits (title, close prompt). */
  setDocumentState(state: DocumentState): Promise<void>;
  /** Subscribes to host menu commands (desktop only; the browser never calls back). */
  onMenuCommand(listener: (command: MenuCommand, path?: string) => void): () => void;
}

declare global {
  interface Window {
    /** Set by the desktop shell's preload; absent in a plain browser. */
    readonly blockwiseHost?: BlockwiseHost;
  }
}
