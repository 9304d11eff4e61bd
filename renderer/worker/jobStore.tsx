/**
 * Where analysis jobs and their inputs live while the app runs, above the
 * views: a tab switch unmounts a view but not its comparison, trade table,
 * payload-range diagram or crossover inputs. Opening another document (a new
 * `documentKey`) empties the store, so no figure of the previous project stays.
 */
import { createContext, useCallback, useContext, useMemo, useReducer, useRef, type ReactNode } from 'react';
import type { EngineRun } from './engineClient';
import type { EngineReplies, EngineRequest, EngineRequestKind } from './engineProtocol';
import type { JobState } from './useEngine';

interface Slot {
  state: JobState<EngineRequestKind>;
  lastValue: EngineReplies[EngineRequestKind] | null;
  /** The request the last value (or the running job) was computed for. */
  request: EngineRequest | null;
  run: EngineRun<EngineRequestKind> | null;
}

export interface JobStore {
  readonly version: number;
  slot(key: string): Slot;
  changed(): void;
  value<T>(key: string, initial: T): T;
  setValue(key: string, value: unknown): void;
}

const JobStoreContext = createContext<JobStore | null>(null);

export function JobStoreProvider(props: { readonly documentKey: number; readonly children: ReactNode }) {
  const slots = useRef(new Map<string, Slot>());
  const values = useRef(new Map<string, unknown>());
  const keyRef = useRef(props.documentKey);
  const [version, bump] = useReducer((n: number) => n + 1, 0);
  if (keyRef.current !== props.documentKey) {
    keyRef.current = props.documentKey;
    for (const s of slots.current.values()) s.run?.cancel();
    slots.current.clear();
    values.current.clear();
  }
  const slot = useCallback((key: string): Slot => {
    let s = slots.current.get(key);
    if (s === undefined) {
      s = { state: { status: 'idle' }, lastValue: null, request: null, run: null };
      slots.current.set(key, s);
    }
    return s;
  }, []);
  const value = useCallback(<T,>(key: string, initial: T): T => (values.current.has(key) ? (values.current.get(key) as T) : initial), []);
  const setValue = useCallback((key: string, v: unknown) => {
    values.current.set(key, v);
    bump();
  }, []);
  const store = useMemo<JobStore>(() => ({ version, slot, changed: bump, value, setValue }), [version, slot, value, setValue]);
  return <JobStoreContext.Provider value={store}>{props.children}</JobStoreContext.Provider>;
}

/** The store of the app, or null outside a provider (component tests of one view). */
export function useJobStore(): JobStore | null {
  return useContext(JobStoreContext);
}

/** A view input (crossover altitude, compared designs...) kept in the store under `key`, like useState. */
export function usePersistentValue<T>(key: string, initial: T): [T, (value: T) => void] {
  const store = useJobStore();
  const [local, setLocal] = useReducer((_: T, v: T) => v, initial);
  if (store === null) return [local, setLocal];
  return [store.value(key, initial), (v: T) => store.setValue(key, v)];
}
