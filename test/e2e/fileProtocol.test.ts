import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { blockFuel, openDemo, readNumber } from './support/appPage';
import { sharedChromium } from './support/sharedChromium';

// The desktop shell loads dist-web/index.html from file:// (electron/main.ts).
// Chromium with --allow-file-access-from-files stands in for Electron's file
// handling here: the page must find its scripts through relative paths
// (vite base './'), render the notice and fly the demo in its module worker
// (worker-src 'self' under the CSP) without errors.

const app = sharedChromium(['--allow-file-access-from-files']);

describe('the built renderer from file://', () => {
  it('renders the notice and flies the demo from dist-web/index.html with relative asset paths', async () => {
    const index = pathToFileURL(resolve(__dirname, '..', '..', 'dist-web', 'index.html')).href;
    const { page, problems } = await app.open(index);
    await page.getByTestId('safety-notice').waitFor({ state: 'visible' });
    const scripts = await page.locator('script[src]').evaluateAll((els) => els.map((e) => e.getAttribute('src') ?? ''));
    expect(scripts.length).toBeGreaterThan(0);
    for (const src of scripts) expect(src.startsWith('./'), src).toBe(true);
    await openDemo(page);
    expect(await readNumber(blockFuel(page))).toBeGreaterThan(0);
    expect(problems).toEqual([]);
  });
});
