import { existsSync } from 'node:fs';
import { mkdir } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';

/** Debian's Chromium; the e2e tests never download a browser. */
export const CHROMIUM_PATH = process.env.BLOCKWISE_CHROMIUM ?? '/usr/bin/chromium';

export const CHROMIUM_ARGS: readonly string[] = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

// import.meta.url, not __dirname: this module also runs as plain ESM under tsx (npm run bench:ui).
export const SCREENSHOT_FOLDER = resolve(fileURLToPath(new URL('.', import.meta.url)), '..', '..', '..', 'artifacts', 'screenshots');

/** Fails with the fix when Chromium is not installed (never skips silently). */
export function requireChromium(path: string = CHROMIUM_PATH): void {
  if (!existsSync(path)) {
    throw new Error(
      `End-to-end tests need Chromium at ${path}, which is missing. Install it with "apt-get install -y chromium" (Debian/Ubuntu), or set BLOCKWISE_CHROMIUM to a Chromium binary.`,
    );
  }
}

/**
 * Starts Chromium headless. playwright-core's launch() gives every browser a
 * fresh temporary --user-data-dir and removes it on close.
 */
export async function launchChromium(extraArgs: readonly string[] = []): Promise<Browser> {
  requireChromium();
  return chromium.launch({ executablePath: CHROMIUM_PATH, headless: true, args: [...CHROMIUM_ARGS, ...extraArgs] });
}

/** A page of the app at `baseUrl` that records console errors, page errors and failed requests. */
export async function openApp(browser: Browser, baseUrl: string): Promise<{ readonly page: Page; readonly problems: string[] }> {
  const context = await browser.newContext({ viewport: { width: 1360, height: 880 }, acceptDownloads: true });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') problems.push(`console: ${m.text()}`);
  });
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  page.on('response', (r) => {
    if (r.status() >= 400) problems.push(`HTTP ${r.status()}: ${r.url()}`);
  });
  page.on('requestfailed', (r) => problems.push(`request failed: ${r.url()} ${r.failure()?.errorText ?? ''}`));
  await page.goto(baseUrl);
  return { page, problems };
}

/**
 * Saves a full-page screenshot to artifacts/screenshots/<name>.png. The window
 * is made as tall as the page for the shot, so the notice sticky at the
 * window's bottom is drawn where it really ends up, below the content.
 */
export async function screenshot(page: Page, name: string): Promise<void> {
  await mkdir(SCREENSHOT_FOLDER, { recursive: true });
  const viewport = page.viewportSize();
  const height = await page.evaluate(() => document.documentElement.scrollHeight);
  if (viewport !== null && height > viewport.height) await page.setViewportSize({ width: viewport.width, height });
  try {
    await page.screenshot({ path: join(SCREENSHOT_FOLDER, `${name}.png`), fullPage: true });
  } finally {
    if (viewport !== null && height > viewport.height) await page.setViewportSize(viewport);
  }
}
