import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openDemo, showView } from './support/appPage';
import { launchChromium, openApp, screenshot } from './support/chromium';

// The crossover view plots thrust available against drag (DESIGN.md §2.5);
// the demo study has two inlet designs, which it can draw together.

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

describe('analysis views', () => {
  it('the crossover view draws thrust and drag for both inlets', async () => {
    const { page, problems } = await openApp(browser, inject('baseUrl'));
    await openDemo(page);
    await showView(page, 'crossover');
    await page.locator('[data-testid="chart-crossover"] svg').first().waitFor({ state: 'visible', timeout: 30_000 });
    await page.getByTestId('crossover-all-inlets').check();
    const messages = page.getByTestId('crossover-message');
    await expect.poll(() => messages.count(), { timeout: 30_000 }).toBe(2);
    const inletNames = (await messages.allTextContents()).map((t) => t.split(':')[0]?.trim());
    expect(new Set(inletNames).size).toBe(2);
    expect(await page.getByTestId('safety-notice').isVisible()).toBe(true);
    await screenshot(page, 'crossover-demo');
    expect(problems).toEqual([]);
  });

});
