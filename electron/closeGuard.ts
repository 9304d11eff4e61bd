/** The buttons of the unsaved-work prompt, in order; the first is the default and the cancel action. */
export const CLOSE_PROMPT_BUTTONS = ['Keep Editing', 'Close Without Saving'] as const;

/** The text of the prompt shown before a window with unsaved edits closes. */
export function closePromptMessage(projectName: string): { readonly message: string; readonly detail: string } {
  return {
    message: `"${projectName}" has unsaved changes.`,
    detail: 'Close anyway and the changes are lost, except the last autosaved copy, which is offered again on the next start.',
  };
}

/**
 * Whether the window may close: yes when nothing is unsaved; otherwise only
 * when the user picked "Close Without Saving" (button index 1).
 */
export function mayClose(dirty: boolean, promptAnswer: () => number): boolean {
  if (!dirty) return true;
  return promptAnswer() === 1;
}
