/**
 * Every IPC channel between the renderer and the main process, in one place
 * (docs/style.md §4). Invoke channels are renderer -> main and answer with a
 * HostReply; `menuCommand` is main -> renderer.
 */
export const IPC_CHANNELS = {
  openProject: 'blockwise:open-project',
  openRecent: 'blockwise:open-recent',
  initialDocument: 'blockwise:initial-document',
  saveProject: 'blockwise:save-project',
  saveProjectAs: 'blockwise:save-project-as',
  importDeck: 'blockwise:import-deck',
  readBesideProject: 'blockwise:read-beside-project',
  exportResultsCsv: 'blockwise:export-results-csv',
  printReportPdf: 'blockwise:print-report-pdf',
  recentFiles: 'blockwise:recent-files',
  autosave: 'blockwise:autosave',
  recoveryOffer: 'blockwise:recovery-offer',
  discardRecovery: 'blockwise:discard-recovery',
  documentState: 'blockwise:document-state',
  menuCommand: 'blockwise:menu-command',
} as const;

export type IpcChannelKey = keyof typeof IPC_CHANNELS;
export type IpcChannel = (typeof IPC_CHANNELS)[IpcChannelKey];
