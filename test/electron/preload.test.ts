import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { BlockwiseHost } from '../../electron/hostApi';
import { IPC_CHANNELS } from '../../electron/ipcChannels';

// Electron security checklist (electronjs.org/docs/latest/tutorial/security):
// the preload exposes one object of intent-named functions through
// contextBridge and never hands the page ipcRenderer itself.

const exposed = new Map<string, unknown>();
const invoke = vi.fn(async (..._args: unknown[]) => ({ ok: true, value: null }));
const listeners = new Map<string, (event: unknown, ...args: unknown[]) => void>();

vi.mock('electron', () => ({
  contextBridge: { exposeInMainWorld: (key: string, api: unknown) => exposed.set(key, api) },
  ipcRenderer: {
    invoke: (...args: unknown[]) => invoke(...args),
    on: (channel: string, fn: (event: unknown, ...args: unknown[]) => void) => listeners.set(channel, fn),
    removeListener: (channel: string) => listeners.delete(channel),
  },
}));

beforeEach(() => {
  invoke.mockClear();
});

describe('preload', () => {
  it('preload exposes exactly one object, blockwiseHost, made of functions', async () => {
    await import('../../electron/preload');
    expect([...exposed.keys()]).toEqual(['blockwiseHost']);
    const host = exposed.get('blockwiseHost') as Record<string, unknown>;
    for (const [name, value] of Object.entries(host)) expect(typeof value, name).toBe('function');
    expect(Object.keys(host)).not.toContain('ipcRenderer');
  });

  it('preload maps each method to its channel with the arguments in order', async () => {
    await import('../../electron/preload');
    const host = exposed.get('blockwiseHost') as BlockwiseHost;
    await host.saveProject('{"format":1}', 'Demo jet');
    await host.exportResultsCsv('a,b', 'results');
    await host.readBesideProject('demo-engine.deck.csv');
    await host.setDocumentState({ name: 'Demo jet', dirty: true, extra: 'dropped' } as never);
    expect(invoke.mock.calls).toEqual([
      [IPC_CHANNELS.saveProject, '{"format":1}', 'Demo jet'],
      [IPC_CHANNELS.exportResultsCsv, 'a,b', 'results'],
      [IPC_CHANNELS.readBesideProject, 'demo-engine.deck.csv'],
      [IPC_CHANNELS.documentState, { name: 'Demo jet', dirty: true }],
    ]);
  });

  it('preload passes only known menu commands to the page and unsubscribes', async () => {
    await import('../../electron/preload');
    const host = exposed.get('blockwiseHost') as BlockwiseHost;
    const got: unknown[][] = [];
    const stop = host.onMenuCommand((...args) => got.push(args));
    const deliver = listeners.get(IPC_CHANNELS.menuCommand);
    deliver?.({ sender: 'secret' }, 'saveProject');
    deliver?.({}, 'rm -rf');
    deliver?.({}, 'openRecent', '/p/jet.json');
    deliver?.({}, 'openRecent', 42);
    expect(got).toEqual([['saveProject'], ['openRecent', '/p/jet.json']]);
    stop();
    expect(listeners.has(IPC_CHANNELS.menuCommand)).toBe(false);
  });
});
