/** Keyboard shortcuts for undo and redo: Ctrl+Z undo; Ctrl+Shift+Z and Ctrl+Y redo (Cmd on macOS). */
export type UndoKeyCommand = 'undo' | 'redo';

export function undoKeyCommand(event: { readonly key: string; readonly ctrlKey: boolean; readonly metaKey: boolean; readonly shiftKey: boolean; readonly altKey: boolean }): UndoKeyCommand | null {
  if (!(event.ctrlKey || event.metaKey) || event.altKey) return null;
  const key = event.key.toLowerCase();
  if (key === 'z') return event.shiftKey ? 'redo' : 'undo';
  if (key === 'y' && !event.shiftKey) return 'redo';
  return null;
}
