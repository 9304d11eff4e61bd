import type { BrowserWindowConstructorOptions, Session, WebContents } from 'electron';

/**
 * The Content-Security-Policy of the app page. Scripts and workers come only
 * from the app itself (workers also from blob: URLs, which Vite may use);
 * inline styles are allowed because chart libraries set style attributes.
 * The same text is put in index.html's meta tag by vite.config.ts.
 */
export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "worker-src 'self' blob:",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
].join('; ');

/**
 * The options of the one application window: the page is sandboxed, isolated
 * from the preload's world and has no Node (Electron security checklist).
 */
export function buildWindowOptions(preloadPath: string, development = false): BrowserWindowConstructorOptions {
  return {
    width: 1360,
    height: 880,
    minWidth: 900,
    minHeight: 600,
    show: false,
    title: 'Blockwise',
    backgroundColor: '#ffffff',
    webPreferences: {
      preload: preloadPath,
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      webviewTag: false,
      spellcheck: false,
      // The developer tools open a console with the page's full power: only against the development server.
      devTools: development,
    },
  };
}

/**
 * True when `frameUrl` is the app page: the same file:// document as
 * `appUrl` (query and hash ignored), or, for an http(s) development server,
 * the same origin. Anything else is a foreign sender.
 */
export function isAppUrl(frameUrl: string, appUrl: string): boolean {
  let frame: URL;
  let app: URL;
  try {
    frame = new URL(frameUrl);
    app = new URL(appUrl);
  } catch {
    return false;
  }
  if (app.protocol === 'file:') {
    return frame.protocol === 'file:' && frame.host === app.host && frame.pathname === app.pathname;
  }
  if (app.protocol === 'http:' || app.protocol === 'https:') {
    return frame.origin === app.origin;
  }
  return false;
}

/** The small part of WebContents the guards use (mockable in tests). */
export type GuardedContents = Pick<WebContents, 'on' | 'setWindowOpenHandler'>;

/**
 * Blocks navigation away from the app page and every new window. Links to
 * the web are not followed; the app has no need for them.
 */
export function installNavigationGuards(contents: GuardedContents, appUrl: string): void {
  contents.on('will-navigate', (event, url) => {
    if (!isAppUrl(url, appUrl)) event.preventDefault();
  });
  contents.on('will-redirect', (event, url) => {
    if (!isAppUrl(url, appUrl)) event.preventDefault();
  });
  contents.on('will-attach-webview', (event) => {
    event.preventDefault();
  });
  contents.setWindowOpenHandler(() => ({ action: 'deny' }));
}

/** The small part of Session the guards use (mockable in tests). */
export type GuardedSession = Pick<Session, 'setPermissionRequestHandler' | 'setPermissionCheckHandler'> & {
  readonly webRequest: Pick<Session['webRequest'], 'onHeadersReceived'>;
};

/**
 * Denies every permission request (camera, notifications, ...) and, unless
 * `cspHeader` is false (the dev server's hot reload needs an inline script),
 * adds the CSP header to responses.
 */
export function installSessionGuards(session: GuardedSession, cspHeader = true): void {
  session.setPermissionRequestHandler((_contents, _permission, callback) => callback(false));
  session.setPermissionCheckHandler(() => false);
  if (!cspHeader) return;
  session.webRequest.onHeadersReceived((details, callback) => {
    callback({
      responseHeaders: {
        ...details.responseHeaders,
        'Content-Security-Policy': [CONTENT_SECURITY_POLICY],
      },
    });
  });
}
