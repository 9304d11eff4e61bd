/** Renders views with a real study store and the in-thread engine, starting from the demo project. */
import { render } from '@testing-library/react';
import { useReducer, type ReactNode } from 'react';
import { openProjectAction } from '../../../renderer/state/documentActions';
import { StudyContext } from '../../../renderer/state/studyContext';
import { studyReducer } from '../../../renderer/state/studyReducer';
import { emptyStudy, type StudyState } from '../../../renderer/state/studyState';
import { createInThreadClient, type EngineClient } from '../../../renderer/worker/engineClient';
import { EngineContext, type LiveStudy } from '../../../renderer/worker/useEngine';
import { demoFiles } from './fakeBridge';

export const TEST_CHART = { width: 400, height: 200 };

/** A live study with no result yet, for views that run their own analyses and only pass the live study on. */
export const NO_LIVE_STUDY: LiveStudy = { snapshot: null, snapshotRevision: 0, revision: 0, stale: false, running: false, failure: null };

/** SI unit symbols that must not appear on a customary screen (NIST SP 811 symbols). */
export const SI_TEXT = /\b(kg|km|kN|m\/s|hPa|Pa)\b|\d\s?m\b/;

/** The study right after opening the demo project with its deck. */
export function demoState(): StudyState {
  const d = demoFiles();
  const opened = studyReducer(emptyStudy(), openProjectAction(d.projectName, d.projectText, { name: d.deckName, text: d.deckText }));
  if (opened.doc === null) throw new Error(`the demo project did not open: ${JSON.stringify(opened.openIssues)}`);
  return opened;
}

/** Exposes the latest state to the test. */
export interface StateProbe {
  current: StudyState;
}

function Store(props: { readonly initial: StudyState; readonly probe: StateProbe; readonly children: ReactNode }) {
  const [state, dispatch] = useReducer(studyReducer, props.initial);
  props.probe.current = state;
  return <StudyContext.Provider value={{ state, dispatch }}>{props.children}</StudyContext.Provider>;
}

export function renderWithStudy(ui: ReactNode, initial: StudyState = demoState(), engine: EngineClient = createInThreadClient()) {
  const probe: StateProbe = { current: initial };
  const result = render(
    <EngineContext.Provider value={engine}>
      <Store initial={initial} probe={probe}>
        {ui}
      </Store>
    </EngineContext.Provider>,
  );
  return { ...result, probe };
}

/** An engine client that answers every request with `value` (for views whose engine run is tested elsewhere). */
export function cannedClient(value: unknown, requests: string[] = []): EngineClient {
  return {
    run: (request) => {
      requests.push(request.kind);
      return { outcome: Promise.resolve({ ok: true, value } as never), cancel: () => undefined };
    },
    dispose: () => undefined,
  };
}
