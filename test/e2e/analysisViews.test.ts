import { describe, expect, it } from 'vitest';
import { openDemo, showView, runCompare } from './support/appPage';
import { screenshot } from './support/chromium';
import { sharedChromium } from './support/sharedChromium';

// The crossover view plots thrust available against drag and marks the low
// and high crossover Mach (DESIGN.md §2.5: the low crossover lies below the
// high one, with the thrust minimum, where there is one, between). The demo study has two inlet
// designs, which the compare view offers as A and B and compares on block
// fuel. (Both inlets drawn together on the crossover: bothInlets.test.ts.)

const app = sharedChromium();

async function markerMach(page: import('playwright-core').Page, point: string): Promise<number> {
  const row = page.getByTestId('crossover-markers').locator('tr', { hasText: point });
  return Number((await row.locator('td').nth(2).textContent()) ?? 'NaN');
}

async function markerThrust(page: import('playwright-core').Page, point: string): Promise<number> {
  const row = page.getByTestId('crossover-markers').locator('tr', { hasText: point });
  return Number(((await row.locator('td').nth(3).textContent()) ?? 'NaN').replace(/,/g, ''));
}

describe('analysis views', () => {
  it('the crossover view draws thrust and drag with ordered crossover marks', async () => {
    const { page, problems } = await app.open();
    await openDemo(page);
    await showView(page, 'crossover');
    await page.locator('[data-testid="chart-crossover"] svg').first().waitFor({ state: 'visible', timeout: 30_000 });
    // At the first cruise altitude (37,000 ft) the demo's cycle-deck engine has thrust above drag down to buffet
    // onset (no low crossover); at 41,000 ft both crossovers exist (blockwise crossover prints low M 0.569, high M 0.835).
    const altitude = page.getByTestId('field-crossover-altitude');
    await altitude.fill('41000 ft');
    await altitude.press('Enter');
    await page.getByTestId('crossover-markers').locator('tr', { hasText: 'low crossover' }).waitFor({ timeout: 30_000 });
    const low = await markerMach(page, 'low crossover');
    const high = await markerMach(page, 'high crossover');
    expect(low).toBeGreaterThan(0);
    expect(low).toBeLessThan(high);
    // A thrust minimum is marked only where thrust available dips inside the Mach scan; it may lie below the low
    // crossover (the cycle's thrust at a rating bottoms out near M 0.45-0.5 at altitude, docs/cycle.md). Being the
    // least thrust of the curve, when marked its thrust is at most the thrust at either crossover.
    const points = await page.getByTestId('crossover-markers').locator('tbody tr td:nth-child(2)').allTextContents();
    if (points.includes('thrust minimum')) {
      const least = await markerThrust(page, 'thrust minimum');
      expect(least).toBeLessThanOrEqual(await markerThrust(page, 'low crossover'));
      expect(least).toBeLessThanOrEqual(await markerThrust(page, 'high crossover'));
    }
    // Every listed point and limit is drawn: one vertical line per row of the two tables.
    const limits = await page.getByTestId('crossover-limits').locator('tbody tr').count();
    expect(limits).toBeGreaterThanOrEqual(2);
    expect(await page.getByTestId('chart-crossover').locator('.recharts-reference-line').count()).toBe(points.length + limits);
    expect(await page.getByTestId('safety-notice').isVisible()).toBe(true);
    await screenshot(page, 'crossover-demo');
    expect(problems).toEqual([]);
  });

  it('the compare view offers the two inlet designs as A and B', async () => {
    const { page, problems } = await app.open();
    await openDemo(page);
    await showView(page, 'compare');
    const optionsA = await page.getByTestId('compare-inlet-a').locator('option').allTextContents();
    const optionsB = await page.getByTestId('compare-inlet-b').locator('option').allTextContents();
    expect(optionsA.length).toBe(2);
    expect(new Set(optionsA).size).toBe(2);
    expect(optionsB).toEqual(optionsA);
    expect(await page.getByTestId('compare-inlet-a').inputValue()).not.toBe(await page.getByTestId('compare-inlet-b').inputValue());
    expect(await page.getByTestId('safety-notice').isVisible()).toBe(true);
    await screenshot(page, 'compare-demo');
    expect(problems).toEqual([]);
  });

  it('the compare view compares the two inlet designs on block fuel', async () => {
    const { page, problems } = await app.open();
    await openDemo(page);
    const names = await runCompare(page);
    expect(names[0]).toBeTruthy();
    expect(names[1]).toBeTruthy();
    expect(names[0]).not.toBe(names[1]);
    expect(await page.getByTestId('compare-diff-block-fuel').textContent()).toMatch(/\d/);
    expect(await page.getByTestId('safety-notice').isVisible()).toBe(true);
    await screenshot(page, 'compare-demo');
    expect(problems).toEqual([]);
  }, 180_000);
});
