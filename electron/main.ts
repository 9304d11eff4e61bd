import { BrowserWindow, Menu, app, dialog, ipcMain, session as electronSession, type IpcMainInvokeEvent } from 'electron';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { SAFETY_NOTICE } from '../engine/core';
import { CLOSE_PROMPT_BUTTONS, closePromptMessage, mayClose } from './closeGuard';
import { createHostHandlers, type HostSession } from './hostHandlers';
import { IPC_CHANNELS } from './ipcChannels';
import { registerHostHandlers } from './ipcValidation';
import { buildMenuTemplate } from './menu';
import type { MenuCommand, RecentFile } from './hostApi';
import { loadRecentFiles } from './recentFiles';
import { formatWindowTitle } from './windowTitle';
import { buildWindowOptions, installNavigationGuards, installSessionGuards } from './windowSecurity';

// The thin main process: one window, a menu, dialogs and file I/O behind a
// validated IPC surface. No computation lives here (docs/style.md §4).

const devServerUrl = process.env.BLOCKWISE_DEV_URL;
const webIndex = resolve(__dirname, '..', 'dist-web', 'index.html');
const appUrl = devServerUrl ?? pathToFileURL(webIndex).href;

/** The project named on the command line (`npm start` passes the demo project). */
function projectArgument(argv: readonly string[]): string | null {
  const args = argv.slice(app.isPackaged ? 1 : 2).filter((a) => !a.startsWith('-'));
  const candidate = args.find((a) => a.toLowerCase().endsWith('.json'));
  return candidate === undefined ? null : resolve(candidate);
}

let mainWindow: BrowserWindow | null = null;

function sendMenuCommand(command: MenuCommand): void {
  mainWindow?.webContents.send(IPC_CHANNELS.menuCommand, command);
}

function showAbout(): void {
  void dialog.showMessageBox({
    type: 'info',
    title: 'About Blockwise',
    message: `Blockwise ${app.getVersion()}`,
    detail: `Mission performance on installed engine thrust.\n\n${SAFETY_NOTICE}`,
  });
}

function installMenu(recent: readonly RecentFile[]): void {
  const template = buildMenuTemplate(
    {
      send: sendMenuCommand,
      openRecent: (path) => mainWindow?.webContents.send(IPC_CHANNELS.menuCommand, 'openRecent', path),
      showAbout,
    },
    recent,
    process.platform,
    devServerUrl !== undefined,
  );
  Menu.setApplicationMenu(Menu.buildFromTemplate(template));
}

async function start(): Promise<void> {
  if (devServerUrl === undefined && !existsSync(webIndex)) {
    dialog.showErrorBox('Blockwise', `The renderer is not built: ${webIndex} is missing. Run "npm run build:web" first.`);
    app.exit(1);
    return;
  }
  const userDataFolder = app.getPath('userData');
  const { files, problem } = await loadRecentFiles(userDataFolder);
  if (problem !== null) console.warn(`blockwise: ${problem}`);

  const session: HostSession = {
    projectPath: null,
    document: { name: 'Untitled project', dirty: false },
    recent: files,
    initialProjectPath: projectArgument(process.argv),
  };

  installSessionGuards(electronSession.defaultSession, devServerUrl === undefined);
  app.on('web-contents-created', (_event, contents) => installNavigationGuards(contents, appUrl));

  const handlers = createHostHandlers<IpcMainInvokeEvent>(
    {
      userDataFolder,
      documentsFolder: app.getPath('documents'),
      templateFolders: [resolve(__dirname, '..', 'fixtures')],
      now_ms: () => Date.now(),
      chooseFileToOpen: async (title, filters) => {
        const options = { title, filters: filters.map((f) => ({ name: f.name, extensions: [...f.extensions] })), properties: ['openFile' as const] };
        const r = mainWindow ? await dialog.showOpenDialog(mainWindow, options) : await dialog.showOpenDialog(options);
        return r.canceled || r.filePaths[0] === undefined ? null : r.filePaths[0];
      },
      chooseFileToSave: async (title, defaultPath, filters) => {
        const options = { title, defaultPath, filters: filters.map((f) => ({ name: f.name, extensions: [...f.extensions] })) };
        const r = mainWindow ? await dialog.showSaveDialog(mainWindow, options) : await dialog.showSaveDialog(options);
        return r.canceled || r.filePath === undefined || r.filePath === '' ? null : r.filePath;
      },
      printToPdf: async (event) => event.sender.printToPDF({ printBackground: true, pageSize: 'A4' }),
      showDocumentState: (state) => {
        mainWindow?.setTitle(formatWindowTitle(state.name, state.dirty));
        mainWindow?.setDocumentEdited(state.dirty);
      },
      recentChanged: installMenu,
      warn: (message) => console.warn(`blockwise: ${message}`),
    },
    session,
  );
  registerHostHandlers(ipcMain, () => appUrl, handlers);
  installMenu(session.recent);

  const win = new BrowserWindow(buildWindowOptions(join(__dirname, 'preload.cjs'), devServerUrl !== undefined));
  mainWindow = win;
  win.on('page-title-updated', (event) => event.preventDefault());
  win.setTitle(formatWindowTitle(session.document.name, false));
  win.once('ready-to-show', () => win.show());
  win.on('close', (event) => {
    const ok = mayClose(session.document.dirty, () =>
      dialog.showMessageBoxSync(win, {
        type: 'warning',
        buttons: [...CLOSE_PROMPT_BUTTONS],
        defaultId: 0,
        cancelId: 0,
        ...closePromptMessage(session.document.name),
      }),
    );
    if (!ok) event.preventDefault();
  });
  win.on('closed', () => {
    mainWindow = null;
  });
  await win.loadURL(appUrl);
}

app.enableSandbox();
app.whenReady().then(start, (e: unknown) => {
  console.error('blockwise: could not start', e);
  app.exit(1);
});
app.on('window-all-closed', () => app.quit());
