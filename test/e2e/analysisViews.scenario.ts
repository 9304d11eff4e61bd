import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openDemo, showView } from './support/appPage';
import { launchChromium, openApp, screenshot } from './support/chromium';

// The crossover view plots thrust available against drag (DESIGN.md §2.5);
// the compare view shows the demo's two inlet designs side by side.

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

describe('analysis views', () => {
  it('the crossover view draws a chart and the compare view names two inlets', async () => {
    const { page, problems } = await openApp(browser, inject('baseUrl'));
    await openDemo(page);

    await showView(page, 'crossover');
    await page.locator('[data-testid="chart-crossover"] svg').first().waitFor({ state: 'visible', timeout: 30_000 });
    expect(await page.getByTestId('safety-notice').isVisible()).toBe(true);
    await screenshot(page, 'crossover-demo');

    await showView(page, 'compare');
    await page.getByTestId('compare-run').click();
    const names = page.locator('[data-testid^="compare-design-name-"]');
    await names.first().waitFor({ state: 'visible', timeout: 60_000 });
    const texts = (await names.allTextContents()).map((t) => t.trim());
    expect(texts.length).toBe(2);
    expect(texts[0]).not.toBe('');
    expect(texts[0]).not.toBe(texts[1]);
    expect(await page.getByTestId('safety-notice').isVisible()).toBe(true);
    await screenshot(page, 'compare-demo');
    expect(problems).toEqual([]);
  });
});
