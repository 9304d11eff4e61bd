import type { Bridge } from './bridge';
import { createBrowserBridge } from './browserBridge';
import { createElectronBridge } from './electronBridge';

/** The bridge for where the page runs: the desktop shell when its preload is present, else the browser. */
export function createBridge(): Bridge {
  const host = window.blockwiseHost;
  return host === undefined ? createBrowserBridge() : createElectronBridge(host);
}
