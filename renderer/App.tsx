/**
 * The application shell: toolbar, tab bar, the current view, the printable
 * report (print only) and the safety notice. Views live in renderer/views/,
 * state in renderer/state/, the engine runs in renderer/worker/.
 *
 * Stable data-testid attributes for end-to-end tests (<n> counts from 0):
 *   shell:     safety-notice, view-tab-<id>, view-<id> (ids in state/viewNames.ts), unit-system-toggle
 *              (values si | customary), command-<open|openDemo|save|saveAs|importDeck|exportHistory|
 *              exportLegs|print|undo|redo>, document-name, app-message, open-issues,
 *              recovery-offer, recovery-restore, recovery-discard, print-report
 *   fields:    every project field is an <input> with an inline message `<field id>-error` when its
 *              text is refused; project-issues lists rules the project breaks on the editor views
 *   results:   headline-<block-fuel|block-time|trip-fuel|reserve-fuel|tow|lw|zfw|distance>,
 *              mission-status, results-stale, results-failure, results-waiting, chart-altitude,
 *              chart-mass, legs-table, legs-row-<n>, caution-list, caution-list-empty, caution-<n>,
 *              highlight-note
 *   airframe:  field-oew, field-mzfw, field-mtow, field-mlw, field-max-fuel, field-wing-area,
 *              field-vmo, field-mmo, induced-kind, field-aspect-ratio, field-oswald, field-cl-min-drag,
 *              field-cd-increment, compressibility-kind, field-sweep, field-thickness,
 *              field-korn-factor, chart-polar; tables cd0 | k | buffet | clmax: <t>-table,
 *              field-<t>-mach-<n>, field-<t>-<n>, <t>-add-row, <t>-remove-<n>
 *   engine:    engine-import-deck, engine-deck-source, engine-embed-deck (save the deck inside the project), deck-errors, deck-error-<n>, engine-failure, deck-summary,
 *              field-engine-count, field-bleed, field-power-extraction, field-c-ram, field-sls-*,
 *              field-throttle-ratio, lapse-rating, chart-thrust-lapse, chart-tsfc
 *   inlets:    active-inlet, inlet-<n>, field-inlet-<n>-<capture|throat|fan-face|diffuser-loss|
 *              lip-suction|external-drag|weight>, inlet-<n>-recovery table, chart-recovery,
 *              chart-spillage, chart-inlet-mach or inlet-mach-none
 *   mission:   solve-mode, field-payload, field-range, field-tow, reserves-preset, field-contingency,
 *              field-min-contingency, field-en-route-fraction, field-final-reserve, field-extra-fuel,
 *              alternate-toggle, field-alternate-<distance|altitude|mach|elevation>,
 *              field-mission-isa, field-mission-wind, leg-<n>, leg-<n>-<kind|name|up|down|duplicate|
 *              remove>, field-leg-<n>-<time|fuel|fuel-flow|to-altitude|altitude|mach|distance|...>,
 *              leg-add-kind, leg-add
 *   cautions:  caution-limit-<key>, field-caution-<key>, caution-limit-<key>-reset, caution-fixed
 *   crossover: field-crossover-altitude, field-crossover-mass, crossover-rating, crossover-all-inlets,
 *              crossover-message, chart-crossover, crossover-markers, crossover-limits, crossover-failure
 *   envelope:  field-envelope-mass, envelope-rating, field-envelope-isa, chart-envelope,
 *              envelope-ceilings, envelope-failure
 *   specific range: field-sr-mass, sr-progress, sr-failure, sr-optimum, chart-specific-range, sr-table
 *   compare:   compare-inlet-a, compare-inlet-b, compare-run, compare-progress(-cancel|-cancelled),
 *              compare-failure, compare-table, compare-design-name-<0|1>, compare-diff-block-fuel,
 *              chart-breakdown, compare-breakdown, payload-range-run, payload-range-progress(...),
 *              payload-range-failure, chart-payload-range, trade-run, trade-progress(...),
 *              trade-failure, trade-table
 *   report:    report-notice, report-headline-<id>, report-chart-<altitude|mass|polar|lapse>,
 *              report-legs-table, report-cautions
 */
import { useCallback, useEffect, useMemo, useState } from 'react';
import { flushSync } from 'react-dom';
import { ConfirmDialog } from './components/ConfirmDialog';
import { SummaryStrip } from './components/SummaryStrip';
import { resultHealth } from './state/resultHealth';
import { useConfirm } from './state/useConfirm';
import { afterLayout } from './state/useAppCommands';
import type { Bridge } from './bridge/bridge';
import { IssueList } from './components/IssueList';
import { RecoveryBanner } from './components/RecoveryBanner';
import type { ChartSize } from './components/LineChartPanel';
import { SafetyNotice } from './components/SafetyNotice';
import { Toolbar } from './components/Toolbar';
import { ViewTabs } from './components/ViewTabs';
import { StudyReport } from './report/StudyReport';
import { selectCanRedo, selectCanUndo, selectDirty, selectUndoLabel } from './state/selectors';
import { StudyContext } from './state/studyContext';
import { useStudyStore } from './state/useStudyStore';
import type { ViewId } from './state/viewNames';
import { useAppCommands } from './state/useAppCommands';
import { useRecovery } from './state/useRecovery';
import { CurrentView } from './views/CurrentView';
import type { EngineClient } from './worker/engineClient';
import type { StudyInputs } from './worker/engineProtocol';
import { EngineContext, useLiveStudy } from './worker/useEngine';
import { JobStoreProvider } from './worker/jobStore';

export interface AppProps {
  readonly bridge: Bridge;
  readonly engine: EngineClient;
  /** Fixed chart size (component tests); the app's default otherwise. */
  readonly chartSize?: ChartSize;
  readonly initialView?: ViewId;
}

export function App(props: AppProps) {
  return (
    <EngineContext.Provider value={props.engine}>
      <Shell {...props} />
    </EngineContext.Provider>
  );
}

function Shell(props: AppProps) {
  const store = useStudyStore();
  const { state, dispatch } = store;
  const [view, setView] = useState<ViewId>(props.initialView ?? 'results');
  const project = state.doc?.present ?? null;
  const inputs = useMemo<StudyInputs | null>(() => (project === null ? null : { project, deckFile: state.deckFile }), [project, state.deckFile]);
  const live = useLiveStudy(inputs, state.issues, state.documentKey);
  const confirm = useConfirm();
  // The printable report (four charts) is mounted only while printing, so edits never re-render it.
  const [printing, setPrinting] = useState(false);
  const mountReport = useCallback(async () => {
    setPrinting(true);
    await afterLayout();
  }, []);
  const unmountReport = useCallback(() => setPrinting(false), []);
  // Printing from the browser's or the desktop's own menu mounts the report too, before the page is laid out for print.
  useEffect(() => {
    const before = () => flushSync(() => setPrinting(true));
    const after = () => setPrinting(false);
    window.addEventListener('beforeprint', before);
    window.addEventListener('afterprint', after);
    return () => {
      window.removeEventListener('beforeprint', before);
      window.removeEventListener('afterprint', after);
    };
  }, []);
  const health = resultHealth(live);
  const commands = useAppCommands(props.bridge, store, live.snapshot, { health, ask: confirm.ask, mountReport, unmountReport });
  const recovery = useRecovery(props.bridge, store);
  return (
    <StudyContext.Provider value={store}>
      <JobStoreProvider documentKey={state.documentKey}>
      <div className="app">
        <div className="app-screen">
          <a className="skip-link" href="#view-panel" data-testid="skip-link">
            Skip to the view
          </a>
          <header className="app-header">
            <h1>Blockwise</h1>
            <span className="document-name" data-testid="document-name">
              {state.documentName}
              {selectDirty(state) ? ' (edited)' : ''}
            </span>
            <Toolbar
              units={state.units}
              canUndo={selectCanUndo(state)}
              canRedo={selectCanRedo(state)}
              undoLabel={selectUndoLabel(state)}
              hasResult={live.snapshot !== null}
              onCommand={(c) => void commands.run(c)}
              onUnits={(units) => dispatch({ type: 'unitsChosen', units })}
            />
            <SummaryStrip live={live} units={state.units} />
            <ViewTabs current={view} onSelect={setView} />
          </header>
          {commands.message ? (
            <p className="app-message" data-testid="app-message" role="status">
              {commands.message}{' '}
              <button type="button" onClick={commands.clearMessage}>
                Dismiss
              </button>
            </p>
          ) : null}
          <RecoveryBanner offer={recovery.offer} onRestore={recovery.restore} onDiscard={recovery.discard} />
          {recovery.problem ? <p className="app-message">{recovery.problem}</p> : null}
          <IssueList issues={state.openIssues} testId="open-issues" title="That project could not be opened" showFilePath />
          <main className="view" data-testid={`view-${view}`} id="view-panel" role="tabpanel" aria-labelledby={`tab-${view}`} tabIndex={-1}>
            {project === null ? <p>Opening…</p> : <CurrentView view={view} live={live} hostKind={props.bridge.kind} onCommand={(c) => void commands.run(c)} onExportText={(text, name) => void commands.exportText(text, name)} {...(props.chartSize ? { chartSize: props.chartSize } : {})} />}
          </main>
        </div>
        {printing && project !== null && live.snapshot !== null ? <StudyReport project={project} snapshot={live.snapshot} units={state.units} stale={live.stale} documentName={state.documentName} printedAt={new Date()} /> : null}
        <ConfirmDialog question={confirm.pending} onAnswer={confirm.answer} />
        <SafetyNotice />
      </div>
      </JobStoreProvider>
    </StudyContext.Provider>
  );
}
