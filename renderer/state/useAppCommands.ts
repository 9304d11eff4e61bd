/**
 * The app's commands against the bridge (open, save, import deck, export,
 * print, demo) and the keyboard and menu routes to them. Errors become a
 * message for the status line, never an exception.
 */
import { useCallback, useEffect, useRef, useState } from 'react';
import type { Bridge, MenuCommand } from '../bridge/bridge';
import type { ToolbarCommand } from '../components/Toolbar';
import { fileStem, historyCsv, legsCsv } from '../../engine/study';
import { deckImportAction, openProjectAction } from './documentActions';
import { projectSaveText } from './saveText';
import type { StudyStore } from './studyContext';
import { undoKeyCommand } from './undoKeys';
import type { StudySnapshot } from '../worker/engineProtocol';
import { exportQuestion, type ResultHealth } from './resultHealth';

/** What the commands need to know beyond the store: the figures' health, how to ask, how to mount the report. */
export interface CommandContext {
  readonly health: ResultHealth;
  readonly ask: (text: string, confirmLabel: string) => Promise<boolean>;
  /** Mounts the printable report, resolves once it has rendered; `done` unmounts it. */
  readonly mountReport: () => Promise<void>;
  readonly unmountReport: () => void;
}

/** Two animation frames: the report mounted by a state change has been laid out. */
export function afterLayout(): Promise<void> {
  return new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(() => resolve())));
}

function describe(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

function saveName(name: string): string {
  return name.endsWith('.blockwise.json') ? name : `${fileStem(name)}.blockwise.json`;
}

const MENU_TO_TOOLBAR: Partial<Record<MenuCommand, ToolbarCommand>> = {
  openProject: 'open',
  openDemo: 'openDemo',
  saveProject: 'save',
  saveProjectAs: 'saveAs',
  importDeck: 'importDeck',
  printReport: 'print',
  undo: 'undo',
  redo: 'redo',
};

export function useAppCommands(bridge: Bridge, store: StudyStore, snapshot: StudySnapshot | null, context: CommandContext) {
  const { state, dispatch } = store;
  const [message, setMessage] = useState<string | null>(null);
  const latest = useRef({ state, snapshot, context });
  latest.current = { state, snapshot, context };

  /** True when there are no unsaved edits or the user agrees to lose them. */
  const mayDiscard = useCallback(async (what: string) => {
    const { state: s, context: c } = latest.current;
    const dirty = s.doc !== null && s.savedAtStep !== s.doc.past.length;
    return !dirty || c.ask(`${s.documentName} has unsaved edits. ${what} discards them.`, 'Discard the edits');
  }, []);

  /** True when the figures are good and current, or the user agrees to export them as they are. */
  const mayExport = useCallback(async () => {
    const { state: s, snapshot: snap, context: c } = latest.current;
    const question = exportQuestion(c.health, snap?.mission ?? null, s.units);
    return question === null || c.ask(question, 'Export anyway');
  }, []);

  const openDemo = useCallback(async () => {
    const demo = await bridge.loadDemo();
    dispatch(openProjectAction(demo.projectName, demo.projectText, { name: demo.deckName, text: demo.deckText }));
  }, [bridge, dispatch]);

  const run = useCallback(
    async (command: ToolbarCommand) => {
      const { state: s, snapshot: snap } = latest.current;
      const stem = fileStem(s.documentName);
      try {
        switch (command) {
          case 'undo':
          case 'redo':
            dispatch({ type: command });
            return;
          case 'open': {
            if (!(await mayDiscard('Opening another project'))) return;
            const opened = await bridge.openProject();
            if (opened) dispatch(openProjectAction(opened.name, opened.text, s.deckFile));
            return;
          }
          case 'openDemo':
            if (!(await mayDiscard('Opening the demo study'))) return;
            await openDemo();
            return;
          case 'save':
          case 'saveAs': {
            const text = projectSaveText(s, bridge.kind);
            if (text === null) return;
            const saved = command === 'save' ? await bridge.saveProject(text, saveName(s.documentName)) : await bridge.saveProjectAs(text, saveName(s.documentName));
            if (saved) {
              dispatch({ type: 'saved' });
              setMessage(`Saved to ${saved.path ?? saved.name}.`);
            }
            return;
          }
          case 'importDeck': {
            const deck = await bridge.importDeck();
            if (!deck) return;
            const imported = deckImportAction({ name: deck.name, text: deck.text });
            if (imported.ok) {
              dispatch(imported.action);
              setMessage(`Imported deck ${deck.name}.`);
            } else setMessage(imported.message);
            return;
          }
          case 'exportHistory':
          case 'exportLegs': {
            if (snap === null || !(await mayExport())) return;
            const history = command === 'exportHistory';
            const saved = await bridge.exportText(history ? historyCsv(snap.mission.history, { display: state.units }) : legsCsv(snap.mission, { display: state.units }), `${stem}-${history ? 'time-history' : 'legs'}.csv`, 'text/csv');
            if (saved) setMessage(`Exported ${saved.path ?? saved.name}.`);
            return;
          }
          case 'print': {
            if (snap === null || !(await mayExport())) return;
            const c = latest.current.context;
            await c.mountReport();
            try {
              const saved = await bridge.printReport(`${stem}-report.pdf`);
              if (saved) setMessage(`Report written to ${saved.path ?? saved.name}.`);
            } finally {
              c.unmountReport();
            }
            return;
          }
        }
      } catch (e) {
        setMessage(describe(e));
      }
    },
    [bridge, dispatch, openDemo, mayDiscard, mayExport],
  );

  // First document: the one the app was started with, else the demo.
  useEffect(() => {
    let live = true;
    void (async () => {
      try {
        const initial = await bridge.initialDocument();
        if (!live) return;
        if (initial) dispatch(openProjectAction(initial.name, initial.text, null));
        else await openDemo();
      } catch (e) {
        if (live) setMessage(describe(e));
      }
    })();
    return () => {
      live = false;
    };
  }, [bridge, dispatch, openDemo]);

  useEffect(
    () =>
      bridge.onMenuCommand((command, path) => {
        if (command === 'openRecent' && path !== undefined) {
          void bridge.openRecent(path).then(
            (opened) => dispatch(openProjectAction(opened.name, opened.text, latest.current.state.deckFile)),
            (e: unknown) => setMessage(describe(e)),
          );
          return;
        }
        if (command === 'exportResultsCsv') {
          void run('exportHistory').then(() => run('exportLegs'));
          return;
        }
        const mapped = MENU_TO_TOOLBAR[command];
        if (mapped) void run(mapped);
      }),
    [bridge, dispatch, run],
  );

  useEffect(() => {
    const onKey = (event: KeyboardEvent) => {
      const command = undoKeyCommand(event);
      if (command === null) return;
      event.preventDefault();
      dispatch({ type: command });
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [dispatch]);

  const dirty = state.doc !== null && state.savedAtStep !== state.doc.past.length;
  useEffect(() => {
    if (state.doc === null) return;
    bridge.setDocumentState({ name: state.documentName, dirty }).catch(() => undefined);
  }, [bridge, state.documentName, dirty, state.doc === null]);

  /** Exports a view's own CSV text (e.g. a parameter study's cases) through the bridge, the message saying where. */
  const exportText = useCallback(
    async (text: string, name: string) => {
      try {
        const saved = await bridge.exportText(text, name, 'text/csv');
        if (saved) setMessage(`Exported ${saved.path ?? saved.name}.`);
      } catch (e) {
        setMessage(`Could not export ${name}: ${describe(e)}`);
      }
    },
    [bridge],
  );

  return { run, exportText, message, clearMessage: () => setMessage(null) };
}
