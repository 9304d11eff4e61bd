/**
 * React hooks over the engine client: the live study (re-flown on every edit,
 * debounced, latest wins, tagged with a revision) and long jobs with
 * progress and cancel.
 */
import { createContext, useCallback, useContext, useEffect, useRef, useState } from 'react';
import type { ProjectIssue } from '../../engine/project/projectIssue';
import type { EngineClient, EngineRun } from './engineClient';
import type { EngineFailure, EngineReplies, EngineRequest, EngineRequestKind, StudyInputs, StudySnapshot } from './engineProtocol';

export const EngineContext = createContext<EngineClient | null>(null);

/** The engine client of the app (provided by App): run(request, onProgress) -> { outcome, cancel }. */
export function useEngineClient(): EngineClient {
  const client = useContext(EngineContext);
  if (client === null) throw new Error('useEngineClient outside an EngineContext provider');
  return client;
}

const NO_ISSUES: readonly ProjectIssue[] = [];

/** Wait after an edit before re-flying (ms). */
export const REFLY_DELAY_MS = 120;

export interface LiveStudy {
  /** The last good snapshot and the revision it was computed for. */
  readonly snapshot: StudySnapshot | null;
  readonly snapshotRevision: number;
  /** Revision of the inputs on screen now. */
  readonly revision: number;
  /** The snapshot is for older inputs (an edit is pending or the newest inputs failed). */
  readonly stale: boolean;
  readonly running: boolean;
  /** Why the newest inputs gave no result. */
  readonly failure: EngineFailure | null;
}

/**
 * Re-flies the study whenever `inputs` changes (by identity). With
 * `blockingIssues` (rules the project breaks), nothing is flown: the issues
 * become the failure and the last result stays, marked stale.
 */
export function useLiveStudy(inputs: StudyInputs | null, blockingIssues: readonly ProjectIssue[] = NO_ISSUES): LiveStudy {
  const client = useEngineClient();
  const revisionRef = useRef(0);
  const [revision, setRevision] = useState(0);
  const [state, setState] = useState<{ snapshot: StudySnapshot | null; snapshotRevision: number; failure: EngineFailure | null; running: boolean }>({
    snapshot: null,
    snapshotRevision: -1,
    failure: null,
    running: false,
  });

  useEffect(() => {
    if (inputs === null) return undefined;
    const rev = ++revisionRef.current;
    setRevision(rev);
    if (blockingIssues.length > 0) {
      setState((s) => ({ ...s, failure: { kind: 'project', issues: blockingIssues }, running: false }));
      return undefined;
    }
    setState((s) => ({ ...s, running: true }));
    let run: EngineRun<'study'> | null = null;
    const timer = setTimeout(() => {
      run = client.run({ kind: 'study', ...inputs });
      void run.outcome.then((outcome) => {
        if (outcome === 'cancelled' || rev !== revisionRef.current) return;
        setState((s) =>
          outcome.ok
            ? { snapshot: outcome.value, snapshotRevision: rev, failure: null, running: false }
            : { ...s, failure: outcome.error, running: false },
        );
      });
    }, REFLY_DELAY_MS);
    return () => clearTimeout(timer);
  }, [client, inputs, blockingIssues]);

  return {
    ...state,
    revision,
    stale: state.snapshot !== null && state.snapshotRevision !== revision,
  };
}

export type JobState<K extends EngineRequestKind> =
  | { readonly status: 'idle' }
  | { readonly status: 'running'; readonly done: number; readonly total: number }
  | { readonly status: 'done'; readonly value: EngineReplies[K] }
  | { readonly status: 'failed'; readonly failure: EngineFailure }
  | { readonly status: 'cancelled' };

export interface EngineJob<K extends EngineRequestKind> {
  readonly state: JobState<K>;
  /** The value of the last run that finished, kept while a newer one runs. */
  readonly lastValue: EngineReplies[K] | null;
  start(request: Extract<EngineRequest, { kind: K }>): void;
  cancel(): void;
}

/**
 * An engine run with progress and cancel (payload-range, trade factors,
 * compare, crossover). A new start cancels the run before it, or with
 * `cancelOnRestart: false` leaves it to the client to drop (live kinds).
 */
export function useEngineJob<K extends EngineRequestKind>(options: { readonly cancelOnRestart?: boolean } = {}): EngineJob<K> {
  const cancelOnRestart = options.cancelOnRestart ?? true;
  const client = useEngineClient();
  const [state, setState] = useState<JobState<K>>({ status: 'idle' });
  const [lastValue, setLastValue] = useState<EngineReplies[K] | null>(null);
  const runRef = useRef<EngineRun<K> | null>(null);

  const cancel = useCallback(() => {
    runRef.current?.cancel();
    runRef.current = null;
  }, []);

  const start = useCallback(
    (request: Extract<EngineRequest, { kind: K }>) => {
      if (cancelOnRestart) runRef.current?.cancel();
      setState({ status: 'running', done: 0, total: 0 });
      const run = client.run<K>(request, (done, total) => {
        if (runRef.current === run) setState({ status: 'running', done, total });
      });
      runRef.current = run;
      void run.outcome.then((outcome) => {
        if (outcome === 'cancelled') {
          if (runRef.current === null || runRef.current === run) setState({ status: 'cancelled' });
          return;
        }
        if (runRef.current !== run) return;
        runRef.current = null;
        if (outcome.ok) setLastValue(outcome.value);
        setState(outcome.ok ? { status: 'done', value: outcome.value } : { status: 'failed', failure: outcome.error });
      });
    },
    [client, cancelOnRestart],
  );

  useEffect(() => () => runRef.current?.cancel(), []);
  return { state, lastValue, start, cancel };
}
