/**
 * The application shell: toolbar, tab bar, the current view, the printable
 * report (print only) and the safety notice. Views live in renderer/views/,
 * state in renderer/state/, the engine runs in renderer/worker/.
 *
 * Stable data-testid attributes for end-to-end tests:
 *   shell:    safety-notice, view-tab-<id>, view-<id>, unit-system-toggle,
 *             command-<open|openDemo|save|saveAs|importDeck|exportHistory|exportLegs|print|undo|redo>,
 *             app-message, open-issues, document-name, print-report,
 *             recovery-offer, recovery-restore, recovery-discard
 *   results:  headline-<block-fuel|block-time|trip-fuel|reserve-fuel|tow|lw|zfw|distance>,
 *             mission-status, results-stale, results-failure, results-waiting,
 *             chart-altitude, chart-mass, legs-table, legs-row-<n>, caution-list,
 *             caution-list-empty, caution-<n>, highlight-note
 *   airframe: field-oew, field-mzfw, field-mtow, field-mlw, field-max-fuel, field-wing-area,
 *             field-vmo, field-mmo, field-cd0-mach-<n>, field-cd0-<n>, cd0-add-row, cd0-remove-<n>,
 *             induced-kind, field-aspect-ratio, field-oswald, field-k-mach-<n>, field-k-<n>,
 *             field-cl-min-drag, field-cd-increment, compressibility-kind, field-sweep,
 *             field-thickness, field-korn-factor, chart-polar, project-issues
 *   engine:   command-importDeck, engine-import-deck, deck-errors, deck-error-<n>, deck-summary,
 *             lapse-rating, field-engine-count, field-bleed, field-power-extraction, field-c-ram,
 *             chart-thrust-lapse, chart-tsfc
 *   inlets:   active-inlet, inlet-<n>, field-inlet-<n>-capture ..., chart-recovery,
 *             chart-spillage, chart-inlet-mach
 *   mission:  leg-<n>, leg-<n>-kind, leg-<n>-up, leg-<n>-down, leg-<n>-duplicate, leg-<n>-remove,
 *             leg-add-kind, leg-add, field-leg-<n>-<field>, reserves-preset, solve-mode,
 *             field-payload, field-range, field-tow
 *   cautions: caution-limit-<key>, caution-limit-<key>-reset, field-caution-<key>
 *   crossover: field-crossover-altitude, field-crossover-mass, crossover-rating,
 *             crossover-all-inlets, chart-crossover, crossover-markers, crossover-message
 *   compare:  compare-inlet-a, compare-inlet-b, compare-run, compare-progress(-cancel),
 *             compare-design-name-<0|1>, compare-table, chart-breakdown,
 *             payload-range-run, payload-range-progress(-cancel), chart-payload-range,
 *             trade-run, trade-progress(-cancel), trade-table
 */
import { useMemo, useState } from 'react';
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
  const live = useLiveStudy(inputs, state.issues);
  const commands = useAppCommands(props.bridge, store, live.snapshot);
  const recovery = useRecovery(props.bridge, store);
  return (
    <StudyContext.Provider value={store}>
      <div className="app">
        <div className="app-screen">
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
          <IssueList issues={state.openIssues} testId="open-issues" title="That project could not be opened" />
          <main className="view" data-testid={`view-${view}`}>
            {project === null ? <p>Opening…</p> : <CurrentView view={view} live={live} onCommand={(c) => void commands.run(c)} {...(props.chartSize ? { chartSize: props.chartSize } : {})} />}
          </main>
        </div>
        {project !== null && live.snapshot !== null ? <StudyReport project={project} snapshot={live.snapshot} units={state.units} stale={live.stale} /> : null}
        <SafetyNotice />
      </div>
    </StudyContext.Provider>
  );
}
