import type { Bridge } from './bridge';

/** How often unsaved work is sent for recovery while the project is dirty (milliseconds). */
export const AUTOSAVE_EVERY_MS = 5000;

/** The state the timer looks at: the project text, its name and whether it has unsaved edits. */
export interface AutosaveSnapshot {
  readonly name: string;
  readonly text: string;
  readonly dirty: boolean;
}

/**
 * Sends the project to `bridge.autosave` every `every_ms` while it is dirty
 * and changed since the last copy. Returns the function that stops it.
 * Failures go to `onError` (e.g. to show a caution); the timer keeps going.
 */
export function startAutosave(
  bridge: Pick<Bridge, 'autosave'>,
  snapshot: () => AutosaveSnapshot | null,
  onError: (error: unknown) => void,
  every_ms: number = AUTOSAVE_EVERY_MS,
): () => void {
  let lastText: string | null = null;
  let busy = false;
  const tick = async (): Promise<void> => {
    const s = snapshot();
    if (busy || s === null || !s.dirty || s.text === lastText) return;
    busy = true;
    try {
      await bridge.autosave(s.name, s.text);
      lastText = s.text;
    } catch (e) {
      onError(e);
    } finally {
      busy = false;
    }
  };
  const id = setInterval(() => void tick(), every_ms);
  return () => clearInterval(id);
}
