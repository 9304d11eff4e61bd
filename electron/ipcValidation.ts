import { IPC_CHANNELS } from './ipcChannels';
import { IPC_PAYLOADS, describePayloadIssues, type InvokeChannelKey, type IpcPayload } from './ipcSchemas';
import { type Err, ok, type Result } from '../engine/core';
import type { HostError, HostErrorCode, HostReply } from './hostApi';
import { isAppUrl } from './windowSecurity';

/** What the validation needs from an IPC invoke event (Electron's IpcMainInvokeEvent fits). */
export interface InvokeEventLike {
  readonly senderFrame: { readonly url: string; readonly parent: unknown } | null;
}

/** The registering half of ipcMain (mockable in tests). */
export interface IpcMainLike<E extends InvokeEventLike> {
  handle(channel: string, listener: (event: E, ...args: unknown[]) => unknown): void;
}

/** One handler per invoke channel, called only with a trusted sender and a parsed payload. */
export type HostHandlers<E> = {
  readonly [K in InvokeChannelKey]: (event: E, ...args: IpcPayload<K>) => Promise<HostReply<unknown>>;
};

export function hostError(code: HostErrorCode, message: string): Err<HostError> {
  return { ok: false, error: { code, message } };
}

export function hostOk<T>(value: T): HostReply<T> {
  return { ok: true, value };
}

/**
 * Checks one invoke before its handler runs: the sender must be the top
 * frame of the app page, and the arguments must parse with the channel's
 * zod schema. Returns the parsed arguments or the error (in the engine's
 * Result shape, which HostReply shares).
 */
export function checkInvoke<K extends InvokeChannelKey>(
  key: K,
  event: InvokeEventLike,
  args: readonly unknown[],
  appUrl: string,
): Result<IpcPayload<K>, HostError> {
  const frame = event.senderFrame;
  if (frame === null || frame.parent !== null || !isAppUrl(frame.url, appUrl)) {
    return hostError(
      'foreign_sender',
      `${IPC_CHANNELS[key]}: refused a call from ${frame === null ? 'a destroyed frame' : `"${frame.url}"`}, which is not the Blockwise page`,
    );
  }
  const parsed = IPC_PAYLOADS[key].safeParse(args);
  if (!parsed.success) {
    return hostError('bad_payload', `${IPC_CHANNELS[key]}: ${describePayloadIssues(parsed.error)}`);
  }
  return ok(parsed.data as IpcPayload<K>);
}

/** Registers every invoke channel with sender and payload checks in front of its handler. */
export function registerHostHandlers<E extends InvokeEventLike>(
  ipcMain: IpcMainLike<E>,
  appUrl: () => string,
  handlers: HostHandlers<E>,
): void {
  for (const key of Object.keys(IPC_PAYLOADS) as InvokeChannelKey[]) {
    ipcMain.handle(IPC_CHANNELS[key], async (event: E, ...args: unknown[]) => {
      const checked = checkInvoke(key, event, args, appUrl());
      if (!checked.ok) return checked;
      const handler = handlers[key] as (event: E, ...a: readonly unknown[]) => Promise<HostReply<unknown>>;
      return handler(event, ...checked.value);
    });
  }
}
