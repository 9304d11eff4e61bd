/**
 * React hooks over the engine client: the live study (re-flown on every edit,
 * debounced, latest wins, tagged with a revision) and long jobs with
 * progress and cancel.
 */
import { createContext, useCallback, useContext, useEffect, useRef, useState } from 'react';
import type { EngineClient, EngineRun } from './engineClient';
import type { EngineFailure, EngineReplies, EngineRequest, EngineRequestKind, StudyInputs, StudySnapshot } from './engineProtocol';

export const EngineContext = createContext<EngineClient | null>(null);

/** The engine client of the app (provided by App). */
export function useEngineClient(): EngineClient {
  const client = useContext(EngineContext);
  if (client === null) throw new Error('useEngineClient outside an EngineContext provider');
  return client;
}

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

/** Re-flies the study whenever `inputs` changes (by identity). */
export function useLiveStudy(inputs: StudyInputs | null): LiveStudy {
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
    setState((s) => ({ ...s, running: true }));
    let run: EngineRun<'study'> | null = null;
    const timer = setTimeout(() => {
      run = client.run({ kind: 'study', ...inputs });
      void run.outcome.then((outcome) => {
        if (outcome === 'cancelled' || rev !== revisionRef.current) return;
        setState((s) =>
          outcome.ok
            ? { snapshot: outcome.value, snapshotRevision: rev, failure: null, running: false }
            : { ...s, failure: outcome.failure, running: false },
        );
      });
    }, REFLY_DELAY_MS);
    return () => clearTimeout(timer);
  }, [client, inputs]);

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
  start(request: Extract<EngineRequest, { kind: K }>): void;
  cancel(): void;
}

/** A long engine run (payload-range, trade factors, compare) with progress and cancel; a new start cancels the old. */
export function useEngineJob<K extends EngineRequestKind>(): EngineJob<K> {
  const client = useEngineClient();
  const [state, setState] = useState<JobState<K>>({ status: 'idle' });
  const runRef = useRef<EngineRun<K> | null>(null);

  const cancel = useCallback(() => {
    runRef.current?.cancel();
    runRef.current = null;
  }, []);

  const start = useCallback(
    (request: Extract<EngineRequest, { kind: K }>) => {
      runRef.current?.cancel();
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
        setState(outcome.ok ? { status: 'done', value: outcome.value } : { status: 'failed', failure: outcome.failure });
      });
    },
    [client],
  );

  useEffect(() => () => runRef.current?.cancel(), []);
  return { state, start, cancel };
}
