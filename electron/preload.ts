import { contextBridge, ipcRenderer, type IpcRendererEvent } from 'electron';
import { IPC_CHANNELS } from './ipcChannels';
import { MENU_COMMANDS, type BlockwiseHost, type HostReply, type MenuCommand } from './hostApi';

// Sandboxed preload: bundled to one CommonJS file by scripts/buildElectron.mjs.
// It exposes one object and no Electron objects (ipcRenderer stays here).

function invoke<T>(channel: string, ...args: unknown[]): Promise<HostReply<T>> {
  return ipcRenderer.invoke(channel, ...args) as Promise<HostReply<T>>;
}

function isMenuCommand(value: unknown): value is MenuCommand {
  return typeof value === 'string' && (MENU_COMMANDS as readonly string[]).includes(value);
}

const host: BlockwiseHost = {
  openProject: () => invoke(IPC_CHANNELS.openProject),
  openRecent: (path) => invoke(IPC_CHANNELS.openRecent, path),
  initialDocument: () => invoke(IPC_CHANNELS.initialDocument),
  saveProject: (text, suggestedName) => invoke(IPC_CHANNELS.saveProject, text, suggestedName),
  saveProjectAs: (text, suggestedName) => invoke(IPC_CHANNELS.saveProjectAs, text, suggestedName),
  importDeck: () => invoke(IPC_CHANNELS.importDeck),
  readBesideProject: (relativePath) => invoke(IPC_CHANNELS.readBesideProject, relativePath),
  exportResultsCsv: (text, suggestedName) => invoke(IPC_CHANNELS.exportResultsCsv, text, suggestedName),
  printReportPdf: (suggestedName) => invoke(IPC_CHANNELS.printReportPdf, suggestedName),
  recentFiles: () => invoke(IPC_CHANNELS.recentFiles),
  autosave: (name, text) => invoke(IPC_CHANNELS.autosave, name, text),
  recoveryOffer: () => invoke(IPC_CHANNELS.recoveryOffer),
  discardRecovery: () => invoke(IPC_CHANNELS.discardRecovery),
  setDocumentState: (state) => invoke(IPC_CHANNELS.documentState, { name: state.name, dirty: state.dirty }),
  onMenuCommand: (listener) => {
    const wrapped = (_event: IpcRendererEvent, command: unknown, path: unknown): void => {
      if (!isMenuCommand(command)) return;
      if (command === 'openRecent') {
        if (typeof path === 'string') listener(command, path);
      } else {
        listener(command);
      }
    };
    ipcRenderer.on(IPC_CHANNELS.menuCommand, wrapped);
    return () => {
      ipcRenderer.removeListener(IPC_CHANNELS.menuCommand, wrapped);
    };
  },
};

contextBridge.exposeInMainWorld('blockwiseHost', host);
