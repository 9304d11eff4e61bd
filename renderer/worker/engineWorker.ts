/// <reference lib="webworker" />
/**
 * The engine's Web Worker: runs each request with engineRunner and posts
 * progress and the outcome back. A long run is cancelled by terminating the
 * worker (the engine loops are synchronous, so a cancel message could not be
 * read until they end).
 */
import { createDeckCache, runEngineRequest } from './engineRunner';
import type { WorkerReplyMessage, WorkerRequestMessage } from './engineProtocol';

const scope = self as unknown as DedicatedWorkerGlobalScope;
const cache = createDeckCache();

scope.onmessage = (event: MessageEvent<WorkerRequestMessage>) => {
  const { id, request } = event.data;
  const outcome = runEngineRequest(request, cache, {
    onProgress: (done, total) => scope.postMessage({ id, type: 'progress', done, total } satisfies WorkerReplyMessage),
  });
  scope.postMessage({ id, type: 'done', outcome } satisfies WorkerReplyMessage);
};
