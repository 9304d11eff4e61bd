/** The window title: "<project name> — Blockwise", with " (unsaved)" while there are unsaved edits. */
export function formatWindowTitle(projectName: string, dirty: boolean): string {
  const name = projectName.trim() === '' ? 'Untitled project' : projectName.trim();
  return `${name}${dirty ? ' (unsaved)' : ''} — Blockwise`;
}
