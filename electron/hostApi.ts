/**
 * The one object the preload exposes to the page as `window.blockwiseHost`.
 * The renderer imports these types only (eslint enforces it); everything the
 * page may ask of the desktop shell is listed here.
 */
import type { Result } from '../engine/core';

/** Commands the application menu sends to the page. */
export const MENU_COMMANDS = [
  'openProject',
  'openRecent',
  'openDemo',
  'saveProject',
  'saveProjectAs',
  'importDeck',
  'exportResultsCsv',
  'printReport',
  'undo',
  'redo',
] as const;
export type MenuCommand = (typeof MENU_COMMANDS)[number];

/** A file the user picked and the shell read. */
export interface HostFile {
  readonly name: string;
  readonly path: string;
  readonly text: string;
}

/** Where a save or export landed. */
export interface HostSaved {
  readonly name: string;
  readonly path: string;
}

export interface RecentFile {
  readonly path: string;
  readonly name: string;
  /** Milliseconds since the Unix epoch when the file was last opened or saved. */
  readonly openedAt_ms: number;
}

/** Unsaved work found on start that is newer than the project it belongs to. */
export interface RecoveryOffer {
  readonly name: string;
  readonly text: string;
  readonly savedAt_ms: number;
  readonly projectPath: string | null;
}

/** Literal failure codes a host call can answer with. */
export type HostErrorCode =
  | 'foreign_sender'
  | 'bad_payload'
  | 'read_failed'
  | 'write_failed'
  | 'too_large'
  | 'not_recent'
  | 'outside_project'
  | 'no_window';

export interface HostError {
  readonly code: HostErrorCode;
  readonly message: string;
}

/** Every invoke answers with a value or an error; `null` values mean the user cancelled. */
export type HostReply<T> = Result<T, HostError>;

export interface DocumentState {
  readonly name: string;
  readonly dirty: boolean;
}

export interface BlockwiseHost {
  /** Shows an open dialog for a project file; null when cancelled. */
  openProject(): Promise<HostReply<HostFile | null>>;
  /** Opens a file from the recent list (only paths the shell itself listed). */
  openRecent(path: string): Promise<HostReply<HostFile>>;
  /** The project named on the command line, if any. */
  initialDocument(): Promise<HostReply<HostFile | null>>;
  /** Saves over the current project file, or asks where when there is none. */
  saveProject(text: string, suggestedName: string): Promise<HostReply<HostSaved | null>>;
  saveProjectAs(text: string, suggestedName: string): Promise<HostReply<HostSaved | null>>;
  importDeck(): Promise<HostReply<{ readonly name: string; readonly text: string } | null>>;
  /**
   * Reads a file the open project names by a relative path (its deck), from
   * the project's folder or below; null when no project file is open.
   */
  readBesideProject(relativePath: string): Promise<HostReply<{ readonly name: string; readonly text: string } | null>>;
  exportResultsCsv(text: string, suggestedName: string): Promise<HostReply<HostSaved | null>>;
  /** Prints the current page (with its print stylesheet) to a PDF the user places. */
  printReportPdf(suggestedName: string): Promise<HostReply<HostSaved | null>>;
  recentFiles(): Promise<HostReply<readonly RecentFile[]>>;
  /** Stores unsaved work in the recovery file (atomically). */
  autosave(name: string, text: string): Promise<HostReply<null>>;
  recoveryOffer(): Promise<HostReply<RecoveryOffer | null>>;
  discardRecovery(): Promise<HostReply<null>>;
  /** Sets the window title and the unsaved-work guard. */
  setDocumentState(state: DocumentState): Promise<HostReply<null>>;
  /**
   * Subscribes to menu commands; returns the unsubscribe function. `path` is
   * set for 'openRecent' (pass it to openRecent).
   */
  onMenuCommand(listener: (command: MenuCommand, path?: string) => void): () => void;
}
