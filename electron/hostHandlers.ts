import { basename, dirname, join, resolve, sep } from 'node:path';
import { atomicWriteFile, removeStaleTemporaries } from './atomicWrite';
import { discardRecovery, readRecoveryOffer, writeRecovery } from './autosave';
import { isInsideFolder, realFolder } from '../hostio/textFile';
import { readTextFile, readTextFileAt, withExtension } from './fileText';
import type { DocumentState, HostReply, HostSaved, RecentFile } from './hostApi';
import { hostError, hostOk, type HostHandlers, type InvokeEventLike } from './ipcValidation';
import { saveRecentFiles, withRecentFile, withoutRecentFile } from './recentFiles';

export const PROJECT_EXTENSION = '.blockwise.json';

export interface FileFilter {
  readonly name: string;
  readonly extensions: readonly string[];
}

/** What the handlers need from Electron and the machine; main.ts passes the real ones, tests fakes. */
export interface HostDeps<E> {
  readonly userDataFolder: string;
  readonly documentsFolder: string;
  /**
   * Folders whose projects are templates (the bundled demo): they open, but
   * Save asks where instead of writing over them.
   */
  readonly templateFolders: readonly string[];
  readonly now_ms: () => number;
  /** Shows an open dialog; the chosen path or null. */
  readonly chooseFileToOpen: (title: string, filters: readonly FileFilter[]) => Promise<string | null>;
  /** Shows a save dialog; the chosen path or null. */
  readonly chooseFileToSave: (title: string, defaultPath: string, filters: readonly FileFilter[]) => Promise<string | null>;
  /** Renders the sender's page to PDF with its print stylesheet. */
  readonly printToPdf: (event: E) => Promise<Uint8Array>;
  /** Called when the title or unsaved marker changes. */
  readonly showDocumentState: (state: DocumentState) => void;
  /** Called when the recent list changes (to rebuild the menu). */
  readonly recentChanged: (files: readonly RecentFile[]) => void;
  /** Reports a problem that has no page to go to (e.g. the recent list could not be stored). */
  readonly warn: (message: string) => void;
}

/** The shell's view of the open document. */
export interface HostSession {
  projectPath: string | null;
  document: DocumentState;
  recent: readonly RecentFile[];
  initialProjectPath: string | null;
}

const PROJECT_FILTERS: readonly FileFilter[] = [{ name: 'Blockwise project', extensions: ['json'] }];
const DECK_FILTERS: readonly FileFilter[] = [{ name: 'Engine deck (CSV or JSON)', extensions: ['csv', 'json', 'txt'] }];
const CSV_FILTERS: readonly FileFilter[] = [{ name: 'CSV', extensions: ['csv'] }];
const PDF_FILTERS: readonly FileFilter[] = [{ name: 'PDF', extensions: ['pdf'] }];

/** The handlers behind window.blockwiseHost; every path they write was chosen by the user in a dialog. */
export function createHostHandlers<E extends InvokeEventLike>(deps: HostDeps<E>, session: HostSession): HostHandlers<E> {
  async function remember(path: string): Promise<void> {
    session.recent = withRecentFile(session.recent, path, deps.now_ms());
    deps.recentChanged(session.recent);
    await saveRecentFiles(deps.userDataFolder, session.recent).catch((e: Error) => deps.warn(e.message));
  }

  async function openPath(path: string): Promise<HostReply<{ name: string; path: string; text: string }>> {
    const read = await readTextFileAt(path);
    if (!read.ok) return read;
    // Real paths on both sides: a link to a template is a template.
    const templates = await Promise.all(deps.templateFolders.map((folder) => realFolder(resolve(folder))));
    const isTemplate = templates.some((folder) => isInsideFolder(folder, read.value.realPath, sep));
    session.projectPath = isTemplate ? null : path;
    await remember(path);
    if (!isTemplate) await removeStaleTemporaries(read.value.realPath).catch((e: Error) => deps.warn(e.message));
    return hostOk({ name: basename(path), path, text: read.value.text });
  }

  async function writeChosen(path: string, data: string | Uint8Array): Promise<HostReply<HostSaved>> {
    try {
      await atomicWriteFile(path, data);
    } catch (e) {
      return hostError('write_failed', (e as Error).message);
    }
    return hostOk({ name: basename(path), path });
  }

  async function saveProjectTo(path: string, text: string): Promise<HostReply<HostSaved>> {
    const saved = await writeChosen(path, text);
    if (!saved.ok) return saved;
    await removeStaleTemporaries(path).catch((e: Error) => deps.warn(e.message));
    session.projectPath = path;
    await remember(path);
    await discardRecovery(deps.userDataFolder).catch((e: Error) => deps.warn(e.message));
    return saved;
  }

  async function saveProjectAs(text: string, suggestedName: string): Promise<HostReply<HostSaved | null>> {
    const defaultPath = join(deps.documentsFolder, withExtension(suggestedName, PROJECT_EXTENSION));
    const path = await deps.chooseFileToSave('Save project', defaultPath, PROJECT_FILTERS);
    if (path === null) return hostOk(null);
    return saveProjectTo(path, text);
  }

  return {
    openProject: async () => {
      const path = await deps.chooseFileToOpen('Open project', PROJECT_FILTERS);
      return path === null ? hostOk(null) : openPath(path);
    },
    openRecent: async (_event, path) => {
      if (!session.recent.some((f) => f.path === path)) {
        return hostError('not_recent', `${path} is not in the recent projects list`);
      }
      const opened = await openPath(path);
      if (!opened.ok) {
        session.recent = withoutRecentFile(session.recent, path);
        deps.recentChanged(session.recent);
        await saveRecentFiles(deps.userDataFolder, session.recent).catch((e: Error) => deps.warn(e.message));
      }
      return opened;
    },
    initialDocument: async () => {
      const path = session.initialProjectPath;
      session.initialProjectPath = null;
      return path === null ? hostOk(null) : openPath(path);
    },
    saveProject: async (_event, text, suggestedName) =>
      session.projectPath === null ? saveProjectAs(text, suggestedName) : saveProjectTo(session.projectPath, text),
    saveProjectAs: async (_event, text, suggestedName) => saveProjectAs(text, suggestedName),
    importDeck: async () => {
      const path = await deps.chooseFileToOpen('Import engine deck', DECK_FILTERS);
      if (path === null) return hostOk(null);
      const read = await readTextFile(path);
      return read.ok ? hostOk({ name: basename(path), text: read.value }) : read;
    },
    readBesideProject: async (_event, relativePath) => {
      if (session.projectPath === null) return hostOk(null);
      // Containment is checked on real paths: a symlink inside the folder that leads out is outside.
      const folder = await realFolder(dirname(session.projectPath));
      const path = resolve(folder, relativePath);
      if (!isInsideFolder(folder, path, sep) || path === folder) {
        return hostError('outside_project', `"${relativePath}" leads outside the project folder ${folder}`);
      }
      const read = await readTextFileAt(path);
      if (!read.ok) return read;
      if (!isInsideFolder(folder, read.value.realPath, sep)) {
        return hostError('outside_project', `"${relativePath}" is a link to ${read.value.realPath}, outside the project folder ${folder}`);
      }
      return hostOk({ name: basename(path), text: read.value.text });
    },
    exportResultsCsv: async (_event, text, suggestedName) => {
      const defaultPath = join(deps.documentsFolder, withExtension(suggestedName, '.csv'));
      const path = await deps.chooseFileToSave('Export results as CSV', defaultPath, CSV_FILTERS);
      return path === null ? hostOk(null) : writeChosen(path, text);
    },
    printReportPdf: async (event, suggestedName) => {
      const defaultPath = join(deps.documentsFolder, withExtension(suggestedName, '.pdf'));
      const path = await deps.chooseFileToSave('Save report as PDF', defaultPath, PDF_FILTERS);
      if (path === null) return hostOk(null);
      let pdf: Uint8Array;
      try {
        pdf = await deps.printToPdf(event);
      } catch (e) {
        return hostError('write_failed', `could not render the report: ${(e as Error).message}`);
      }
      return writeChosen(path, pdf);
    },
    recentFiles: async () => hostOk(session.recent),
    autosave: async (_event, name, text) => {
      try {
        await writeRecovery(deps.userDataFolder, { name, text, projectPath: session.projectPath }, deps.now_ms());
      } catch (e) {
        return hostError('write_failed', `autosave failed: ${(e as Error).message}`);
      }
      return hostOk(null);
    },
    recoveryOffer: async () => {
      const { offer, problem } = await readRecoveryOffer(deps.userDataFolder);
      if (problem !== null) deps.warn(problem);
      return hostOk(offer);
    },
    discardRecovery: async () => {
      try {
        await discardRecovery(deps.userDataFolder);
      } catch (e) {
        return hostError('write_failed', `could not remove the recovery file: ${(e as Error).message}`);
      }
      return hostOk(null);
    },
    documentState: async (_event, state) => {
      session.document = state;
      deps.showDocumentState(state);
      return hostOk(null);
    },
  };
}
