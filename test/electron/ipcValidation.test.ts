import { describe, expect, it, vi } from 'vitest';
import { IPC_CHANNELS } from '../../electron/ipcChannels';
import { IPC_PAYLOADS } from '../../electron/ipcSchemas';
import { checkInvoke, hostOk, registerHostHandlers, type HostHandlers, type InvokeEventLike } from '../../electron/ipcValidation';

// Electron security checklist (electronjs.org/docs/latest/tutorial/security,
// "Validate the sender of all IPC messages"): every invoke is refused unless
// it comes from the app page's top frame and its arguments parse.

const APP = 'file:///opt/blockwise/dist-web/index.html';
const fromApp: InvokeEventLike = { senderFrame: { url: `${APP}#results`, parent: null } };

function handlersRecording(calls: string[]): HostHandlers<InvokeEventLike> {
  const keys = Object.keys(IPC_PAYLOADS) as (keyof typeof IPC_PAYLOADS)[];
  return Object.fromEntries(
    keys.map((k) => [
      k,
      async (_e: InvokeEventLike, ...args: unknown[]) => {
        calls.push(`${k}:${JSON.stringify(args)}`);
        return hostOk('done');
      },
    ]),
  ) as unknown as HostHandlers<InvokeEventLike>;
}

describe('checkInvoke', () => {
  it('checkInvoke accepts the app page with a valid payload', () => {
    const r = checkInvoke('saveProject', fromApp, ['{"format":1}', 'Demo jet'], APP);
    expect(r).toEqual({ ok: true, value: ['{"format":1}', 'Demo jet'] });
  });

  it('checkInvoke refuses a foreign page', () => {
    const r = checkInvoke('openProject', { senderFrame: { url: 'https://example.invalid/', parent: null } }, [], APP);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('foreign_sender');
      expect(r.error.message).toContain('https://example.invalid/');
    }
  });

  it('checkInvoke refuses another local file and a sub-frame of the app', () => {
    const other = checkInvoke('openProject', { senderFrame: { url: 'file:///tmp/evil.html', parent: null } }, [], APP);
    const sub = checkInvoke('openProject', { senderFrame: { url: APP, parent: {} } }, [], APP);
    const gone = checkInvoke('openProject', { senderFrame: null }, [], APP);
    for (const r of [other, sub, gone]) expect(r).toMatchObject({ ok: false, error: { code: 'foreign_sender' } });
  });

  it('checkInvoke rejects a wrong type with the argument index and the channel', () => {
    const r = checkInvoke('saveProject', fromApp, [42, 'Demo'], APP);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('bad_payload');
      expect(r.error.message).toMatch(/^blockwise:save-project: argument 0: /);
    }
  });

  it('checkInvoke rejects extra and missing arguments', () => {
    expect(checkInvoke('openProject', fromApp, ['/etc/passwd'], APP)).toMatchObject({ ok: false, error: { code: 'bad_payload' } });
    expect(checkInvoke('exportResultsCsv', fromApp, ['a,b'], APP)).toMatchObject({ ok: false, error: { code: 'bad_payload' } });
  });

  it('checkInvoke rejects a suggested name that names a folder', () => {
    for (const name of ['../escape', 'a/b.csv', 'C:\\x.csv', '..', 'bell\u0007.csv', '']) {
      const r = checkInvoke('exportResultsCsv', fromApp, ['a,b', name], APP);
      expect(r, name).toMatchObject({ ok: false, error: { code: 'bad_payload' } });
    }
  });

  it('checkInvoke rejects a document state with unknown keys or a non-boolean flag', () => {
    expect(checkInvoke('documentState', fromApp, [{ name: 'x', dirty: 'yes' }], APP).ok).toBe(false);
    expect(checkInvoke('documentState', fromApp, [{ name: 'x', dirty: true, extra: 1 }], APP).ok).toBe(false);
    expect(checkInvoke('documentState', fromApp, [{ name: 'x', dirty: true }], APP).ok).toBe(true);
  });

  it('checkInvoke accepts the development server origin only', () => {
    const dev = 'http://127.0.0.1:5173/';
    expect(checkInvoke('recentFiles', { senderFrame: { url: 'http://127.0.0.1:5173/index.html', parent: null } }, [], dev).ok).toBe(true);
    expect(checkInvoke('recentFiles', { senderFrame: { url: 'http://127.0.0.1:5174/', parent: null } }, [], dev).ok).toBe(false);
  });
});

describe('registerHostHandlers', () => {
  it('registerHostHandlers registers every invoke channel and calls the handler only after the checks', async () => {
    const registered = new Map<string, (event: InvokeEventLike, ...args: unknown[]) => unknown>();
    const ipcMain = { handle: vi.fn((channel: string, fn: (event: InvokeEventLike, ...args: unknown[]) => unknown) => registered.set(channel, fn)) };
    const calls: string[] = [];
    registerHostHandlers(ipcMain, () => APP, handlersRecording(calls));

    const invokeChannels = Object.entries(IPC_CHANNELS)
      .filter(([k]) => k !== 'menuCommand')
      .map(([, v]) => v)
      .sort();
    expect([...registered.keys()].sort()).toEqual(invokeChannels);

    const save = registered.get(IPC_CHANNELS.saveProject);
    expect(await save?.(fromApp, '{}', 'Demo')).toEqual({ ok: true, value: 'done' });
    expect(await save?.({ senderFrame: { url: 'https://example.invalid/', parent: null } }, '{}', 'Demo')).toMatchObject({
      ok: false,
      error: { code: 'foreign_sender' },
    });
    expect(await save?.(fromApp, { text: '{}' }, 'Demo')).toMatchObject({ ok: false, error: { code: 'bad_payload' } });
    expect(calls).toEqual(['saveProject:["{}","Demo"]']);
  });
});
