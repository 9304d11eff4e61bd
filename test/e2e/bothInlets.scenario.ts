import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openDemo, showView } from './support/appPage';
import { launchChromium, openApp, screenshot } from './support/chromium';

// The crossover view plots thrust available against drag (DESIGN.md §2.5);
// the demo study has two inlet designs, which the crossover view can draw
// together and the compare view sets side by side.

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

  it('the compare view names the two inlet designs side by side', async () => {
    const { page, problems } = await openApp(browser, inject('baseUrl'));
    await openDemo(page);
    await showView(page, 'compare');
    await page.getByTestId('compare-run').click();
    const first = page.getByTestId('compare-design-name-0');
    const failure = page.getByTestId('compare-failure');
    await first.or(failure).first().waitFor({ state: 'visible', timeout: 120_000 });
    expect(await failure.isVisible(), (await failure.textContent().catch(() => '')) ?? '').toBe(false);
    const names = [(await first.textContent())?.trim(), (await page.getByTestId('compare-design-name-1').textContent())?.trim()];
    expect(names[0]).toBeTruthy();
    expect(names[1]).toBeTruthy();
    expect(names[0]).not.toBe(names[1]);
    expect(await page.getByTestId('compare-diff-block-fuel').textContent()).toMatch(/\d/);
    expect(await page.getByTestId('safety-notice').isVisible()).toBe(true);
    await screenshot(page, 'compare-demo');
    expect(problems).toEqual([]);
  }, 180_000);
});
