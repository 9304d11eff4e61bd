import { describe, expect, it } from 'vitest';
import { formatWindowTitle } from '../../electron/windowTitle';

// Title format from the task brief: "<project name> — Blockwise" with an unsaved marker.
describe('formatWindowTitle', () => {
  it('formatWindowTitle names the project and the app', () => {
    expect(formatWindowTitle('Demo jet', false)).toBe('Demo jet — Blockwise');
  });
  it('formatWindowTitle marks unsaved edits', () => {
    expect(formatWindowTitle('Demo jet', true)).toBe('Demo jet (unsaved) — Blockwise');
  });
  it('formatWindowTitle names an unnamed project', () => {
    expect(formatWindowTitle('  ', false)).toBe('Untitled project — Blockwise');
  });
});
