import { describe, expect, it, vi } from 'vitest';
import { CLOSE_PROMPT_BUTTONS, closePromptMessage, mayClose } from '../../electron/closeGuard';

// Unsaved-work guard (common practice): a clean window closes without a
// question; a dirty one closes only on an explicit "close without saving".
describe('mayClose', () => {
  it('mayClose closes a clean window without asking', () => {
    const ask = vi.fn(() => 0);
    expect(mayClose(false, ask)).toBe(true);
    expect(ask).not.toHaveBeenCalled();
  });
  it('mayClose keeps a dirty window open unless the user chose to discard', () => {
    expect(mayClose(true, () => 0)).toBe(false);
    expect(mayClose(true, () => 1)).toBe(true);
    expect(mayClose(true, () => -1)).toBe(false);
  });
  it('closePromptMessage names the project and the buttons name the choices', () => {
    expect(closePromptMessage('Demo jet').message).toContain('"Demo jet"');
    expect(CLOSE_PROMPT_BUTTONS[1]).toMatch(/without saving/i);
  });
});
