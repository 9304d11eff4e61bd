import { describe, expect, it, vi } from 'vitest';
import { CONTENT_SECURITY_POLICY, buildWindowOptions, installNavigationGuards, installSessionGuards, isAppUrl, type GuardedContents, type GuardedSession } from '../../electron/windowSecurity';

// Expected settings from the Electron security checklist
// (electronjs.org/docs/latest/tutorial/security): context isolation, process
// sandbox, no Node integration, a CSP, no navigation, no new windows,
// permission requests denied.

describe('buildWindowOptions', () => {
  it('buildWindowOptions isolates and sandboxes the page without Node', () => {
    const o = buildWindowOptions('/app/dist-electron/preload.cjs');
    expect(o.webPreferences).toMatchObject({
      preload: '/app/dist-electron/preload.cjs',
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      webviewTag: false,
      devTools: false,
    });
  });

  it('buildWindowOptions allows the developer tools only in development (the development server)', () => {
    expect(buildWindowOptions('/p.cjs').webPreferences?.devTools).toBe(false);
    expect(buildWindowOptions('/p.cjs', true).webPreferences?.devTools).toBe(true);
  });
});

describe('CONTENT_SECURITY_POLICY', () => {
  it('CONTENT_SECURITY_POLICY allows scripts from the app only and workers from the app or blob:', () => {
    const directives = new Map(CONTENT_SECURITY_POLICY.split(';').map((d) => {
      const [name, ...values] = d.trim().split(/\s+/);
      return [name, values] as const;
    }));
    expect(directives.get('script-src')).toEqual(["'self'"]);
    expect(directives.get('worker-src')).toEqual(["'self'", 'blob:']);
    expect(directives.get('default-src')).toEqual(["'self'"]);
    expect(directives.get('object-src')).toEqual(["'none'"]);
    expect(CONTENT_SECURITY_POLICY).not.toMatch(/unsafe-eval/);
  });
});

describe('isAppUrl', () => {
  const app = 'file:///opt/blockwise/dist-web/index.html';
  it('isAppUrl accepts the app page with a hash or query', () => {
    expect(isAppUrl('file:///opt/blockwise/dist-web/index.html#compare', app)).toBe(true);
    expect(isAppUrl('file:///opt/blockwise/dist-web/index.html?x=1', app)).toBe(true);
  });
  it('isAppUrl refuses other files, web pages and garbage', () => {
    expect(isAppUrl('file:///opt/blockwise/dist-web/other.html', app)).toBe(false);
    expect(isAppUrl('https://example.invalid/index.html', app)).toBe(false);
    expect(isAppUrl('not a url', app)).toBe(false);
    expect(isAppUrl('devtools://devtools/bundled/inspector.html', app)).toBe(false);
  });
  it('isAppUrl compares origins for a development server', () => {
    expect(isAppUrl('http://127.0.0.1:5173/src/x', 'http://127.0.0.1:5173/')).toBe(true);
    expect(isAppUrl('http://localhost:5173/', 'http://127.0.0.1:5173/')).toBe(false);
  });
});

describe('installNavigationGuards', () => {
  it('installNavigationGuards blocks navigation away from the app and denies new windows', () => {
    const listeners = new Map<string, (event: { preventDefault: () => void }, url: string) => void>();
    let openHandler: ((details: { url: string }) => { action: string }) | undefined;
    const contents = {
      on: (name: string, fn: (event: { preventDefault: () => void }, url: string) => void) => {
        listeners.set(name, fn);
        return contents;
      },
      setWindowOpenHandler: (fn: (details: { url: string }) => { action: string }) => {
        openHandler = fn;
      },
    };
    const app = 'file:///opt/blockwise/dist-web/index.html';
    installNavigationGuards(contents as unknown as GuardedContents, app);

    const away = { preventDefault: vi.fn() };
    listeners.get('will-navigate')?.(away, 'https://example.invalid/');
    expect(away.preventDefault).toHaveBeenCalled();
    const stay = { preventDefault: vi.fn() };
    listeners.get('will-navigate')?.(stay, `${app}#mission`);
    expect(stay.preventDefault).not.toHaveBeenCalled();
    const redirect = { preventDefault: vi.fn() };
    listeners.get('will-redirect')?.(redirect, 'https://example.invalid/');
    expect(redirect.preventDefault).toHaveBeenCalled();
    const webview = { preventDefault: vi.fn() };
    listeners.get('will-attach-webview')?.(webview, '');
    expect(webview.preventDefault).toHaveBeenCalled();
    expect(openHandler?.({ url: 'https://example.invalid/' })).toEqual({ action: 'deny' });
  });
});

describe('installSessionGuards', () => {
  it('installSessionGuards denies every permission and adds the CSP header', () => {
    let request: ((c: unknown, p: string, cb: (granted: boolean) => void) => void) | undefined;
    let check: (() => boolean) | undefined;
    let headers: ((d: { responseHeaders?: Record<string, string[]> }, cb: (r: unknown) => void) => void) | undefined;
    const session = {
      setPermissionRequestHandler: (fn: typeof request) => (request = fn),
      setPermissionCheckHandler: (fn: typeof check) => (check = fn),
      webRequest: { onHeadersReceived: (fn: typeof headers) => (headers = fn) },
    };
    installSessionGuards(session as unknown as GuardedSession, true);
    for (const permission of ['media', 'geolocation', 'notifications', 'clipboard-read']) {
      const cb = vi.fn();
      request?.({}, permission, cb);
      expect(cb).toHaveBeenCalledWith(false);
    }
    expect(check?.()).toBe(false);
    const cb = vi.fn();
    headers?.({ responseHeaders: { 'Content-Type': ['text/html'] } }, cb);
    expect(cb).toHaveBeenCalledWith({
      responseHeaders: { 'Content-Type': ['text/html'], 'Content-Security-Policy': [CONTENT_SECURITY_POLICY] },
    });
  });
});

describe('installSessionGuards for the dev server', () => {
  it('installSessionGuards without the CSP header still denies permissions', () => {
    const onHeadersReceived = vi.fn();
    let request: ((c: unknown, p: string, cb: (granted: boolean) => void) => void) | undefined;
    const session = {
      setPermissionRequestHandler: (fn: typeof request) => (request = fn),
      setPermissionCheckHandler: vi.fn(),
      webRequest: { onHeadersReceived },
    };
    installSessionGuards(session as unknown as GuardedSession, false);
    const cb = vi.fn();
    request?.({}, 'media', cb);
    expect(cb).toHaveBeenCalledWith(false);
    expect(onHeadersReceived).not.toHaveBeenCalled();
  });
});
