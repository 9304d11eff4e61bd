import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, inject } from 'vitest';
import { launchChromium, openApp } from './chromium';

/**
 * One Chromium for the tests of the file that calls this (at its top level): launched before them, with
 * `extraArgs`, and closed after. `open(url)` loads the app in a fresh context and page, by default from the
 * e2e server (globalSetup's baseUrl). Kept apart from chromium.ts, which also runs outside vitest (bench:ui).
 */
export function sharedChromium(extraArgs: readonly string[] = []): { open(url?: string): ReturnType<typeof openApp> } {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await launchChromium(extraArgs);
  });
  afterAll(async () => {
    await browser?.close();
  });
  return {
    open(url = inject('baseUrl')) {
      if (browser === undefined) throw new Error('sharedChromium: open() is for inside a test, after Chromium has started');
      return openApp(browser, url);
    },
  };
}
