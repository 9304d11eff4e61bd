import type { MenuItemConstructorOptions } from 'electron';
import type { MenuCommand, RecentFile } from './hostApi';

/** What the menu's items call; main.ts wires them to the window. */
export interface MenuActions {
  readonly send: (command: MenuCommand) => void;
  readonly openRecent: (path: string) => void;
  readonly showAbout: () => void;
}

/**
 * The application menu: File, Edit, View, Help. Document commands go to the
 * page as MenuCommands (the page owns the project); text editing, zoom and
 * window commands use Electron's built-in roles.
 */
export function buildMenuTemplate(
  actions: MenuActions,
  recent: readonly RecentFile[],
  platform: NodeJS.Platform,
  isDevelopment: boolean,
): MenuItemConstructorOptions[] {
  const item = (label: string, command: MenuCommand, accelerator?: string): MenuItemConstructorOptions => ({
    label,
    accelerator,
    click: () => actions.send(command),
  });
  const recentItems: MenuItemConstructorOptions[] =
    recent.length === 0
      ? [{ label: 'No recent projects', enabled: false }]
      : recent.map((f) => ({ label: f.name, toolTip: f.path, click: () => actions.openRecent(f.path) }));

  const template: MenuItemConstructorOptions[] = [
    {
      label: 'File',
      submenu: [
        item('Open Project…', 'openProject', 'CmdOrCtrl+O'),
        { label: 'Recent Projects', submenu: recentItems },
        item('Open Demo Project', 'openDemo'),
        { type: 'separator' },
        item('Save Project', 'saveProject', 'CmdOrCtrl+S'),
        item('Save Project As…', 'saveProjectAs', 'CmdOrCtrl+Shift+S'),
        { type: 'separator' },
        item('Import Engine Deck…', 'importDeck', 'CmdOrCtrl+I'),
        item('Export Results as CSV…', 'exportResultsCsv', 'CmdOrCtrl+E'),
        item('Print Report to PDF…', 'printReport', 'CmdOrCtrl+P'),
        { type: 'separator' },
        platform === 'darwin' ? { role: 'close' } : { role: 'quit', label: 'Exit' },
      ],
    },
    {
      label: 'Edit',
      // The page handles Ctrl/Cmd+Z and Ctrl+Y itself (renderer/state/undoKeys.ts); the
      // menu shows the keys without registering them, so one key press is one undo.
      submenu: [
        { ...item('Undo Edit', 'undo', 'CmdOrCtrl+Z'), registerAccelerator: false },
        { ...item('Redo Edit', 'redo', platform === 'darwin' ? 'Cmd+Shift+Z' : 'Ctrl+Y'), registerAccelerator: false },
        { type: 'separator' },
        { role: 'cut' },
        { role: 'copy' },
        { role: 'paste' },
        { role: 'selectAll' },
      ],
    },
    {
      label: 'View',
      submenu: [
        { role: 'resetZoom' },
        { role: 'zoomIn' },
        { role: 'zoomOut' },
        { type: 'separator' },
        { role: 'togglefullscreen' },
        ...(isDevelopment ? ([{ type: 'separator' }, { role: 'reload' }, { role: 'toggleDevTools' }] as const) : []),
      ],
    },
    {
      label: 'Help',
      submenu: [
        { label: 'About Blockwise', click: () => actions.showAbout() },
      ],
    },
  ];
  if (platform === 'darwin') {
    template.unshift({ label: 'Blockwise', submenu: [{ role: 'about' }, { type: 'separator' }, { role: 'hide' }, { role: 'quit' }] });
  }
  return template;
}
