import type { BlockwiseHost, HostReply } from '../../electron/hostApi';
import { BridgeError, type Bridge } from './bridge';
import { loadDemoFiles } from './demoFiles';

function unwrap<T>(reply: HostReply<T>): T {
  if (reply.ok) return reply.value;
  throw new BridgeError(reply.error.code, reply.error.message);
}

/** The bridge over the desktop shell's preload object (window.blockwiseHost). */
export function createElectronBridge(host: BlockwiseHost): Bridge {
  return {
    kind: 'desktop',
    openProject: async () => unwrap(await host.openProject()),
    openRecent: async (path) => unwrap(await host.openRecent(path)),
    initialDocument: async () => unwrap(await host.initialDocument()),
    saveProject: async (text, name) => unwrap(await host.saveProject(text, name)),
    saveProjectAs: async (text, name) => unwrap(await host.saveProjectAs(text, name)),
    importDeck: async () => unwrap(await host.importDeck()),
    readBesideProject: async (relativePath) => unwrap(await host.readBesideProject(relativePath)),
    exportText: async (text, name) => unwrap(await host.exportResultsCsv(text, name)),
    printReport: async (name) => unwrap(await host.printReportPdf(name)),
    recentFiles: async () => unwrap(await host.recentFiles()),
    loadDemo: loadDemoFiles,
    autosave: async (name, text) => {
      unwrap(await host.autosave(name, text));
    },
    recoveryOffer: async () => unwrap(await host.recoveryOffer()),
    discardRecovery: async () => {
      unwrap(await host.discardRecovery());
    },
    setDocumentState: async (state) => {
      unwrap(await host.setDocumentState(state));
    },
    onMenuCommand: (listener) => host.onMenuCommand(listener),
  };
}
