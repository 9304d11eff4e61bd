import { describe, expect, it, vi } from 'vitest';
import type { BlockwiseHost, HostReply, MenuCommand } from '../../../electron/hostApi';
import { BridgeError } from '../../../renderer/bridge/bridge';
import { createBridge } from '../../../renderer/bridge/createBridge';
import { createElectronBridge } from '../../../renderer/bridge/electronBridge';

// The desktop bridge unwraps the host's replies: values pass through, null
// means cancelled, an error reply becomes a BridgeError with the same code and message.

function ok<T>(value: T): Promise<HostReply<T>> {
  return Promise.resolve({ ok: true, value });
}

function fakeHost(overrides: Partial<BlockwiseHost> = {}): BlockwiseHost {
  return {
    openProject: () => ok({ name: 'jet.blockwise.json', path: '/p/jet.blockwise.json', text: '{}' }),
    openRecent: () => ok({ name: 'a', path: '/a', text: '' }),
    initialDocument: () => ok(null),
    saveProject: vi.fn(() => ok({ name: 'jet.blockwise.json', path: '/p/jet.blockwise.json' })),
    saveProjectAs: () => ok(null),
    importDeck: () => ok({ name: 'd.csv', text: 'x' }),
    readBesideProject: vi.fn(() => ok({ name: 'demo-engine.deck.csv', text: 'altitude[ft]' })),
    exportResultsCsv: vi.fn(() => ok({ name: 'r.csv', path: '/p/r.csv' })),
    printReportPdf: () => ok({ name: 'r.pdf', path: '/p/r.pdf' }),
    recentFiles: () => ok([]),
    autosave: () => ok(null),
    recoveryOffer: () => ok(null),
    discardRecovery: () => ok(null),
    setDocumentState: () => ok(null),
    onMenuCommand: () => () => undefined,
    ...overrides,
  };
}

describe('createElectronBridge', () => {
  it('createElectronBridge passes values through', async () => {
    const host = fakeHost();
    const bridge = createElectronBridge(host);
    expect(bridge.kind).toBe('desktop');
    expect(await bridge.openProject()).toEqual({ name: 'jet.blockwise.json', path: '/p/jet.blockwise.json', text: '{}' });
    expect(await bridge.saveProject('{"a":1}', 'jet')).toEqual({ name: 'jet.blockwise.json', path: '/p/jet.blockwise.json' });
    expect(host.saveProject).toHaveBeenCalledWith('{"a":1}', 'jet');
    expect(await bridge.saveProjectAs('{}', 'jet')).toBeNull();
  });

  it('createElectronBridge reads the file a project names beside it', async () => {
    const host = fakeHost();
    expect(await createElectronBridge(host).readBesideProject?.('demo-engine.deck.csv')).toEqual({ name: 'demo-engine.deck.csv', text: 'altitude[ft]' });
    expect(host.readBesideProject).toHaveBeenCalledWith('demo-engine.deck.csv');
  });

  it('createElectronBridge sends exported text through the CSV export channel', async () => {
    const host = fakeHost();
    await createElectronBridge(host).exportText('a,b\n', 'results', 'text/csv');
    expect(host.exportResultsCsv).toHaveBeenCalledWith('a,b\n', 'results');
  });

  it('createElectronBridge turns an error reply into a BridgeError with its code and message', async () => {
    const bridge = createElectronBridge(
      fakeHost({ saveProject: () => Promise.resolve({ ok: false, error: { code: 'write_failed', message: 'could not save /p/x: EACCES' } }) }),
    );
    const failure = await bridge.saveProject('{}', 'x').catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(BridgeError);
    expect(failure).toMatchObject({ code: 'write_failed', message: 'could not save /p/x: EACCES' });
  });

  it('createElectronBridge forwards menu commands and their unsubscribe', () => {
    const stop = vi.fn();
    const listeners: ((c: MenuCommand, p?: string) => void)[] = [];
    const bridge = createElectronBridge(
      fakeHost({
        onMenuCommand: (l) => {
          listeners.push(l);
          return stop;
        },
      }),
    );
    const got: unknown[] = [];
    const unsubscribe = bridge.onMenuCommand((c, p) => got.push([c, p]));
    listeners[0]?.('openRecent', '/p/jet.json');
    unsubscribe();
    expect(got).toEqual([['openRecent', '/p/jet.json']]);
    expect(stop).toHaveBeenCalled();
  });
});

describe('createBridge', () => {
  it('createBridge picks the browser bridge without a host and the desktop bridge with one', () => {
    expect(createBridge().kind).toBe('browser');
    Object.defineProperty(window, 'blockwiseHost', { value: fakeHost(), configurable: true });
    try {
      expect(createBridge().kind).toBe('desktop');
    } finally {
      Reflect.deleteProperty(window, 'blockwiseHost');
    }
  });
});
