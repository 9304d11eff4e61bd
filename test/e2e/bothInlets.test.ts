import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { FACTOR_LABEL } from '../../renderer/charts/compareSeries';
import { openDemo, showView, runCompare } from './support/appPage';
import { screenshot } from './support/chromium';
import { sharedChromium } from './support/sharedChromium';

// The crossover view plots thrust available against drag for every inlet
// design at once (DESIGN.md §2.5); the compare view flies the demo study with
// inlet A and B and breaks the block-fuel difference down by factor
// (recovery, spillage, external drag, weight; DESIGN.md §2.5).

const app = sharedChromium();

/** Tick labels of a chart's x axis as drawn by Chromium. */
async function xTickLabels(page: Page, testId: string): Promise<string[]> {
  return page.getByTestId(testId).locator('text.recharts-cartesian-axis-tick-value[orientation="bottom"]').allTextContents();
}

/** The notice sits below `last` once the window is scrolled to the end (it never covers the last row). */
async function expectNoticeBelow(page: Page, last: import('playwright-core').Locator): Promise<void> {
  await page.evaluate(() => window.scrollTo(0, document.documentElement.scrollHeight));
  const row = await last.boundingBox();
  const notice = await page.getByTestId('safety-notice').boundingBox();
  expect(row).not.toBeNull();
  expect(notice).not.toBeNull();
  expect(row!.y + row!.height).toBeLessThanOrEqual(notice!.y + 0.5);
}

describe('both inlet designs', () => {
  it('the crossover view draws thrust and drag for every inlet design, with round Mach ticks', async () => {
    const { page, problems } = await app.open();
    await openDemo(page);
    await showView(page, 'crossover');
    await page.locator('[data-testid="chart-crossover"] svg').first().waitFor({ state: 'visible', timeout: 30_000 });
    await page.getByTestId('crossover-all-inlets').check();
    const messages = page.getByTestId('crossover-message');
    await expect.poll(() => messages.count(), { timeout: 30_000 }).toBe(2);
    const inletNames = (await messages.allTextContents()).map((t) => t.split(':')[0]?.trim());
    expect(new Set(inletNames).size).toBe(2);
    // Every marker of both inlets is listed and drawn: one vertical line and one dot per row.
    const rows = page.getByTestId('crossover-markers').locator('tbody tr');
    const rowCount = await rows.count();
    const inletsInTable = new Set((await rows.locator('td:first-child').allTextContents()).map((t) => t.trim()));
    expect(inletsInTable).toEqual(new Set(inletNames));
    expect(rowCount).toBeGreaterThanOrEqual(4);
    // one vertical line per marker and per level-flight limit (stall, buffet onset, VMO/MMO) of each inlet
    const limits = await page.getByTestId('crossover-limits').locator('tbody tr').count();
    expect(await page.getByTestId('chart-crossover').locator('.recharts-reference-line').count()).toBe(rowCount + limits);
    expect(await page.getByTestId('chart-crossover').locator('.recharts-reference-dot').count()).toBe(rowCount);
    // Mach ticks at round values: at most 3 decimals (renderer/charts/niceTicks.ts, Heckbert 1990).
    const ticks = await xTickLabels(page, 'chart-crossover');
    expect(ticks.length).toBeGreaterThanOrEqual(3);
    for (const t of ticks) expect(t).toMatch(/^\d+(\.\d{1,3})?$/);
    await expectNoticeBelow(page, rows.last());
    expect(await page.getByTestId('safety-notice').isVisible()).toBe(true);
    await screenshot(page, 'crossover-both-inlets');
    expect(problems).toEqual([]);
  });

  it('the compare view on the demo study shows both inlets and the block-fuel breakdown with every factor labelled', async () => {
    const { page, problems } = await app.open();
    await openDemo(page);
    const names = await runCompare(page);
    const options = (await page.getByTestId('compare-inlet-a').locator('option').allTextContents()).map((t) => t.trim());
    // Design names read "A: <inlet>" and "B: <inlet>": one of each inlet design offered.
    expect(names[0]).toMatch(/^A: /);
    expect(names[1]).toMatch(/^B: /);
    expect(new Set(names.map((n) => n?.replace(/^[AB]: /, '')))).toEqual(new Set(options));
    // The breakdown: one line per factor, and the chart labels every factor and the total.
    const parts = await page.getByTestId('compare-breakdown').locator('li').allTextContents();
    expect(parts.length).toBe(Object.keys(FACTOR_LABEL).length);
    for (const label of Object.values(FACTOR_LABEL)) expect(parts.some((p) => p.startsWith(`${label}:`)), label).toBe(true);
    const labels = await xTickLabels(page, 'chart-breakdown');
    expect(labels).toEqual([...parts.map((p) => p.split(':')[0]!.trim()), 'Total B - A']);
    await expectNoticeBelow(page, page.getByTestId('compare-breakdown'));
    expect(await page.getByTestId('safety-notice').isVisible()).toBe(true);
    await screenshot(page, 'compare-both-inlets');
    expect(problems).toEqual([]);
  }, 180_000);
});
