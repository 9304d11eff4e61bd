/**
 * React hooks over the engine client: the live study (re-flown on every
 * committed edit, latest wins, tagged with a revision) and long jobs with
 * progress and cancel.
 */
import { createContext, useCallback, useContext, useEffect, useRef, useState } from 'react';
import type { ProjectIssue } from '../../engine/project';
import type { EngineClient, EngineRun } from './engineClient';
import { useJobStore, type JobStore } from './jobStore';
import type { EngineFailure, EngineReplies, EngineRequest, EngineRequestKind, StudyInputs, StudySnapshot } from './engineProtocol';

/** The point analyses a view runs with a query of its own (its fields) over the open study. */
type QueryKind = 'crossover' | 'envelope' | 'specificRange';

export const EngineContext = createContext<EngineClient | null>(null);

/** The engine client of the app (provided by App): run(request, onProgress) -> { outcome, cancel }. */
export function useEngineClient(): EngineClient {
  const client = useContext(EngineContext);
  if (client === null) throw new Error('useEngineClient outside an EngineContext provider');
  return client;
}

const NO_ISSUES: readonly ProjectIssue[] = [];

export interface LiveStudy {
  /** The last good snapshot of the open document and the revision it was computed for. */
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

interface LiveState {
  readonly snapshot: StudySnapshot | null;
  readonly snapshotRevision: number;
  readonly failure: EngineFailure | null;
  readonly running: boolean;
  readonly documentKey: number;
}

/**
 * Re-flies the study whenever `inputs` changes (by identity), at once: edits
 * are committed (a field on blur or Enter), and the client runs only the
 * newest study request. With `blockingIssues` (rules the project breaks),
 * nothing is flown: the issues become the failure and the last result stays,
 * marked stale. A new `documentKey` (another project opened) drops the last
 * result, so no figure of the previous project is shown.
 */
export function useLiveStudy(inputs: StudyInputs | null, givenIssues: readonly ProjectIssue[] = NO_ISSUES, documentKey = 0): LiveStudy {
  const client = useEngineClient();
  // An empty list is one identity whoever built it, so a caller's fresh `[]` per render does not re-fly forever.
  const blockingIssues = givenIssues.length === 0 ? NO_ISSUES : givenIssues;
  const revisionRef = useRef(0);
  const [revision, setRevision] = useState(0);
  const [state, setState] = useState<LiveState>({ snapshot: null, snapshotRevision: -1, failure: null, running: false, documentKey });
  // Another document: its predecessor's figures go at once (render-time reset, no stale frame).
  const current = state.documentKey === documentKey ? state : { snapshot: null, snapshotRevision: -1, failure: null, running: inputs !== null, documentKey };
  if (current !== state) setState(current);

  useEffect(() => {
    if (inputs === null) return undefined;
    const rev = ++revisionRef.current;
    setRevision(rev);
    if (blockingIssues.length > 0) {
      setState((s) => ({ ...s, failure: { kind: 'project', issues: blockingIssues }, running: false }));
      return undefined;
    }
    setState((s) => ({ ...s, running: true }));
    const run: EngineRun<'study'> = client.run({ kind: 'study', ...inputs });
    void run.outcome.then((outcome) => {
      if (outcome === 'cancelled' || rev !== revisionRef.current) return;
      setState((s) =>
        s.documentKey !== documentKey
          ? s
          : outcome.ok
            ? { ...s, snapshot: outcome.value, snapshotRevision: rev, failure: null, running: false }
            : { ...s, failure: outcome.error, running: false },
      );
    });
    return undefined;
  }, [client, inputs, blockingIssues, documentKey]);

  return {
    snapshot: current.snapshot,
    snapshotRevision: current.snapshotRevision,
    failure: current.failure,
    running: current.running,
    revision,
    stale: current.snapshot !== null && current.snapshotRevision !== revision,
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
  /** The request of the last start (kept in the job store; null for a view-local job). */
  readonly request: Extract<EngineRequest, { kind: K }> | null;
  start(request: Extract<EngineRequest, { kind: K }>): void;
  cancel(): void;
}

/**
 * An engine run with progress and cancel (payload-range, trade factors,
 * compare, crossover). A new start cancels the run before it, or with
 * `cancelOnRestart: false` leaves it to the client to drop (live kinds).
 */
export function useEngineJob<K extends EngineRequestKind>(options: { readonly cancelOnRestart?: boolean; readonly persistKey?: string } = {}): EngineJob<K> {
  const store = useJobStore();
  const local = useLocalEngineJob<K>(options);
  const persisted = useStoredEngineJob<K>(options, store, options.persistKey);
  return persisted ?? local;
}

/**
 * The job kept in the app's job store under `key`: it survives the view's
 * unmounting (a tab switch) and is not cancelled by it.
 */
function useStoredEngineJob<K extends EngineRequestKind>(options: { readonly cancelOnRestart?: boolean }, store: JobStore | null, key: string | undefined): EngineJob<K> | null {
  const cancelOnRestart = options.cancelOnRestart ?? true;
  const client = useEngineClient();
  // The store object changes on every store change; its slot and changed functions do not. The callbacks
  // depend on those only, so a view effect that depends on `start` does not re-run (and re-start) on each change.
  const slot = store?.slot ?? null;
  const changed = store?.changed ?? null;
  const cancel = useCallback(() => {
    if (slot === null || changed === null || key === undefined) return;
    const s = slot(key);
    s.run?.cancel();
    s.run = null;
  }, [slot, changed, key]);
  const start = useCallback(
    (request: Extract<EngineRequest, { kind: K }>) => {
      if (slot === null || changed === null || key === undefined) return;
      const s = slot(key);
      if (cancelOnRestart) s.run?.cancel();
      s.state = { status: 'running', done: 0, total: 0 };
      s.request = request;
      const run = client.run<K>(request, (done, total) => {
        if (s.run === run) {
          s.state = { status: 'running', done, total };
          changed();
        }
      });
      s.run = run as EngineRun<EngineRequestKind>;
      changed();
      void run.outcome.then((outcome) => {
        if (outcome === 'cancelled') {
          if (s.run === null || s.run === run) {
            s.state = { status: 'cancelled' };
            changed();
          }
          return;
        }
        if (s.run !== run) return;
        s.run = null;
        if (outcome.ok) s.lastValue = outcome.value;
        s.state = outcome.ok ? { status: 'done', value: outcome.value } : { status: 'failed', failure: outcome.error };
        changed();
      });
    },
    [client, cancelOnRestart, slot, changed, key],
  );
  if (store === null || key === undefined) return null;
  const s = store.slot(key);
  return { state: s.state as JobState<K>, lastValue: s.lastValue as EngineReplies[K] | null, request: s.request as Extract<EngineRequest, { kind: K }> | null, start, cancel };
}

function useLocalEngineJob<K extends EngineRequestKind>(options: { readonly cancelOnRestart?: boolean }): EngineJob<K> {
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
  return { state, lastValue, request: null, start, cancel };
}

/**
 * Keeps an analysis live: once it has been run, every edit of the project (or
 * deck) re-runs it with the newest inputs, with its progress shown; until the
 * new result arrives the last one is shown marked out of date. Returns true
 * while the shown value belongs to older inputs.
 */
export function useLiveRerun<K extends EngineRequestKind>(job: EngineJob<K>, request: Extract<EngineRequest, { kind: K }>): boolean {
  const previous = job.request;
  const outdated = previous !== null && (previous.project !== request.project || previous.deckFile !== request.deckFile);
  const { start } = job;
  useEffect(() => {
    if (outdated) start(request);
    // Only a changed project or deck starts a run (the request object itself is rebuilt every render).
  }, [outdated, request.project, request.deckFile, start]);
  return outdated || (job.state.status === 'running' && job.lastValue !== null);
}

/**
 * A view's point analysis kept live: run at once, and again whenever the project, the deck or the view's query
 * changes (latest wins: a newer run replaces the one waiting, none is cancelled), its job kept in the job store under
 * the kind, so the last result survives a tab switch.
 */
export function useLiveAnalysis<K extends QueryKind>(kind: K, inputs: StudyInputs, query: Extract<EngineRequest, { kind: K }>['query']): EngineJob<K> {
  const job = useEngineJob<K>({ cancelOnRestart: false, persistKey: kind });
  const { start } = job;
  const { project, deckFile } = inputs;
  useEffect(() => {
    // The request of kind K (TypeScript does not narrow the request union by a generic kind).
    start({ kind, project, deckFile, query } as Extract<EngineRequest, { kind: K }>);
  }, [start, kind, project, deckFile, query]);
  return job;
}
