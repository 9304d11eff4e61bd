/** What the sweep verb and its worker threads say to each other (structured-cloned). */
import type { SweepAxis, SweepRow } from '../../engine/project';
import type { EngineDeck } from '../../engine/propulsion';

/** What each worker's study is made from, sent as its first message (the worker may be started before it is known). */
export interface SweepWorkerData {
  /** The project file's parsed JSON (before the schema). */
  readonly doc: unknown;
  readonly axes: readonly SweepAxis[];
  /** The deck file, parsed once by the main thread (plain data and typed arrays: it clones), when the project names one. */
  readonly deck: EngineDeck | undefined;
  readonly inletName: string | undefined;
}

/** Main -> worker: fly cases [start, end) of the grid. */
export interface SweepChunk {
  readonly kind: 'chunk';
  readonly start: number;
  readonly end: number;
}

/** Main -> worker: first the study, then chunks. */
export type SweepRequest = { readonly kind: 'study'; readonly data: SweepWorkerData } | SweepChunk;

/** Worker -> main: rows flown (in case order within a chunk); `chunkDone` on the chunk's last batch; `error` when the worker cannot prepare its study. */
export type SweepReply =
  | { readonly kind: 'rows'; readonly rows: readonly SweepRow[]; readonly chunkDone: boolean }
  | { readonly kind: 'error'; readonly message: string };
