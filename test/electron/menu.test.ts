import type { MenuItemConstructorOptions } from 'electron';
import { describe, expect, it, vi } from 'vitest';
import { buildMenuTemplate, type MenuActions } from '../../electron/menu';

// Menu layout from the task brief: File, Edit, View, Help with accelerators;
// document commands go to the page.

function submenu(item: MenuItemConstructorOptions | undefined): MenuItemConstructorOptions[] {
  return (item?.submenu ?? []) as MenuItemConstructorOptions[];
}
function find(template: MenuItemConstructorOptions[], label: string): MenuItemConstructorOptions | undefined {
  for (const top of template) {
    const hit = submenu(top).find((i) => i.label === label);
    if (hit) return hit;
  }
  return undefined;
}
function actions(): MenuActions & { sent: string[] } {
  const sent: string[] = [];
  return { sent, send: (c) => sent.push(c), openRecent: vi.fn(), showAbout: vi.fn() };
}

describe('buildMenuTemplate', () => {
  it('buildMenuTemplate has File, Edit, View and Help in that order on Linux and Windows', () => {
    const t = buildMenuTemplate(actions(), [], 'linux', false);
    expect(t.map((m) => m.label)).toEqual(['File', 'Edit', 'View', 'Help']);
  });

  it('buildMenuTemplate adds the application menu first on macOS', () => {
    const t = buildMenuTemplate(actions(), [], 'darwin', false);
    expect(t.map((m) => m.label)).toEqual(['Blockwise', 'File', 'Edit', 'View', 'Help']);
  });

  it('buildMenuTemplate sends document commands to the page with their accelerators', () => {
    const a = actions();
    const t = buildMenuTemplate(a, [], 'linux', false);
    const expected: [string, string, string | undefined][] = [
      ['Open Project…', 'openProject', 'CmdOrCtrl+O'],
      ['Save Project', 'saveProject', 'CmdOrCtrl+S'],
      ['Save Project As…', 'saveProjectAs', 'CmdOrCtrl+Shift+S'],
      ['Import Engine Deck…', 'importDeck', 'CmdOrCtrl+I'],
      ['Export Results as CSV…', 'exportResultsCsv', 'CmdOrCtrl+E'],
      ['Print Report to PDF…', 'printReport', 'CmdOrCtrl+P'],
      ['Undo Edit', 'undo', 'CmdOrCtrl+Z'],
      ['Redo Edit', 'redo', 'Ctrl+Y'],
      ['Open Demo Project', 'openDemo', undefined],
    ];
    for (const [label, command, accelerator] of expected) {
      const item = find(t, label);
      expect(item?.accelerator, label).toBe(accelerator);
      (item?.click as () => void)();
      expect(a.sent.at(-1)).toBe(command);
    }
  });

  it('buildMenuTemplate shows the undo keys without registering them (the page handles them)', () => {
    const t = buildMenuTemplate(actions(), [], 'linux', false);
    expect(find(t, 'Undo Edit')?.registerAccelerator).toBe(false);
    expect(find(t, 'Redo Edit')?.registerAccelerator).toBe(false);
    expect(find(t, 'Save Project')?.registerAccelerator).toBeUndefined();
  });

  it('buildMenuTemplate lists recent projects and opens them by path', () => {
    const a = actions();
    const t = buildMenuTemplate(a, [{ path: '/p/jet.blockwise.json', name: 'jet.blockwise.json', openedAt_ms: 1 }], 'linux', false);
    const recent = submenu(find(t, 'Recent Projects'));
    expect(recent.map((r) => r.label)).toEqual(['jet.blockwise.json']);
    (recent[0]?.click as () => void)();
    expect(a.openRecent).toHaveBeenCalledWith('/p/jet.blockwise.json');
    const empty = submenu(find(buildMenuTemplate(a, [], 'linux', false), 'Recent Projects'));
    expect(empty).toEqual([{ label: 'No recent projects', enabled: false }]);
  });

  it('buildMenuTemplate offers developer tools only in development', () => {
    const roles = (dev: boolean) => submenu(buildMenuTemplate(actions(), [], 'linux', dev)[2]).map((i) => i.role);
    expect(roles(false)).not.toContain('toggleDevTools');
    expect(roles(true)).toContain('toggleDevTools');
  });
});
