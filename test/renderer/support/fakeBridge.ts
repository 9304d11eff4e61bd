/** A Bridge for component tests: the demo files from fixtures/demo, recorded exports and prints. */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Bridge, DemoFiles, DocumentState, MenuCommand, OpenedDeck, OpenedProject, RecoveryOffer } from '../../../renderer/bridge/bridge';

const root = resolve(import.meta.dirname, '../../..');

export function demoFiles(): DemoFiles {
  return {
    projectName: 'demo.blockwise.json',
    projectText: readFileSync(resolve(root, 'fixtures/demo/demo.blockwise.json'), 'utf8'),
    deckName: 'demo-engine.deck.csv',
    deckText: readFileSync(resolve(root, 'fixtures/demo/demo-engine.deck.csv'), 'utf8'),
  };
}

export function fixtureText(path: string): string {
  return readFileSync(resolve(root, path), 'utf8');
}

export interface FakeBridge extends Bridge {
  readonly exports: { text: string; name: string; mime: string }[];
  readonly saves: { text: string; name: string }[];
  /** Recovery copies sent by the autosave timer. */
  readonly autosaves: { name: string; text: string }[];
  readonly prints: string[];
  /** The printable report's text when printReport was called (null: not mounted). */
  printedReportText: string | null;
  nextDeck: OpenedDeck | null;
  nextProject: OpenedProject | null;
  recovery: RecoveryOffer | null;
  discarded: number;
  /** Sends a menu command as the desktop shell would. */
  menu(command: MenuCommand, path?: string): void;
  documentStates: DocumentState[];
}

export function createFakeBridge(): FakeBridge {
  const listeners = new Set<(command: MenuCommand, path?: string) => void>();
  const bridge: FakeBridge = {
    menu: (command, path) => {
      for (const l of listeners) l(command, path);
    },
    documentStates: [],
    kind: 'browser',
    exports: [],
    saves: [],
    prints: [],
    printedReportText: null,
    nextDeck: null,
    nextProject: null,
    recovery: null,
    discarded: 0,
    openProject: async () => bridge.nextProject,
    openRecent: async () => {
      throw new Error('no recent files in tests');
    },
    initialDocument: async () => null,
    saveProject: async (text, name) => {
      bridge.saves.push({ text, name });
      return { name };
    },
    saveProjectAs: async (text, name) => {
      bridge.saves.push({ text, name });
      return { name };
    },
    importDeck: async () => bridge.nextDeck,
    exportText: async (text, name, mime) => {
      bridge.exports.push({ text, name, mime });
      return { name };
    },
    printReport: async (name) => {
      bridge.prints.push(name);
      // What was on the page when it printed (the report is mounted only to print).
      bridge.printedReportText = document.querySelector('[data-testid="print-report"]')?.textContent ?? null;
      return { name };
    },
    recentFiles: async () => [],
    loadDemo: async () => demoFiles(),
    autosaves: [],
    autosave: async (name, text) => {
      bridge.autosaves.push({ name, text });
    },
    recoveryOffer: async () => bridge.recovery,
    discardRecovery: async () => {
      bridge.discarded += 1;
      bridge.recovery = null;
    },
    setDocumentState: async (state) => {
      bridge.documentStates.push(state);
    },
    onMenuCommand: (listener) => {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
  };
  return bridge;
}
