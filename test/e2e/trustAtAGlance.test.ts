import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { blockFuel, openDemo, readNumber, showView, waitForNumberChange } from './support/appPage';
import { screenshot } from './support/chromium';
import { sharedChromium } from './support/sharedChromium';
import { VIEWS } from '../../renderer/state/viewNames';

// The app an engineer trusts at a glance: the display units everywhere, honest
// states (stale, failed), keyboard use and an automated accessibility check
// (axe-core, the open-source WCAG rules engine, injected into the page).

const require = createRequire(import.meta.url);
const AXE_SOURCE = readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

const app = sharedChromium();

/** Sets a field's text and commits it (blur), as a person typing would. */
async function typeInto(page: Page, testId: string, text: string): Promise<void> {
  const field = page.getByTestId(testId);
  await field.fill(text);
  await field.blur();
}

/** axe-core violations of impact serious or critical on the page as it stands. */
async function seriousViolations(page: Page): Promise<string[]> {
  await page.evaluate(AXE_SOURCE);
  return page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: { id: string; impact: string; nodes: { target: string[] }[] }[] }> } }).axe;
    const r = await axe.run(document, { resultTypes: ['violations'] });
    return r.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join(', ')}`);
  });
}

const SI_UNIT_AFTER_NUMBER = /\d\s?(m|km|kg|N|kN|m\/s|Pa|hPa|kg\/h|kg\/s)(?![\w/])/;

describe('trust at a glance', () => {
  it('every view in customary units shows no SI unit after a number, carries the summary strip and the notice, and has no serious axe violation; screenshots at 1440x900 and 1280x720', async () => {
    const { page, problems } = await app.open();
    await openDemo(page);
    await page.getByTestId('unit-system-toggle').selectOption('customary');
    for (const size of [
      { width: 1440, height: 900 },
      { width: 1280, height: 720 },
    ]) {
      await page.setViewportSize(size);
      for (const v of VIEWS) {
        await showView(page, v.id);
        await page.waitForTimeout(300);
        // A view that computes on showing (crossover, envelope, specific range) finishes, so its figures are checked and shown.
        await expect.poll(() => page.getByTestId(`view-${v.id}`).getByText(/^Computing…/).count(), { timeout: 30_000 }).toBe(0);
        // Names the user wrote (inlet and deck titles, marked data-user-text) may hold any unit ("a 36 kN class deck").
        const text = await page.getByTestId(`view-${v.id}`).evaluate((el) => {
          const names = [...el.querySelectorAll('[data-user-text]')];
          const saved = names.map((n) => n.textContent);
          for (const n of names) n.textContent = '(name)';
          const shown = (el as HTMLElement).innerText;
          names.forEach((n, i) => (n.textContent = saved[i] ?? ''));
          return shown;
        });
        // The engine view lists the deck file's own header units as written; every other view is in display units.
        if (v.id !== 'engine') expect(text, `${v.id}: ${text.match(SI_UNIT_AFTER_NUMBER)?.[0]}`).not.toMatch(SI_UNIT_AFTER_NUMBER);
        expect(await page.getByTestId('summary-strip').textContent()).toMatch(/Block fuel [\d,]+ lb/);
        expect(await page.getByTestId('safety-notice').isVisible()).toBe(true);
        if (size.width === 1440) expect(await seriousViolations(page), v.id).toEqual([]);
        await screenshot(page, `${v.id}-${size.width}x${size.height}`);
      }
    }
    expect(problems).toEqual([]);
  }, 240_000);

  it('tabs take arrow keys, the skip link reaches the view, and charts are not Tab stops', async () => {
    const { page } = await app.open();
    await openDemo(page);
    await page.getByTestId('view-tab-results').focus();
    await page.keyboard.press('ArrowRight');
    expect(await page.getByTestId('view-tab-crossover').getAttribute('aria-selected')).toBe('true');
    await page.getByTestId('view-crossover').waitFor();
    await page.keyboard.press('Home');
    expect(await page.getByTestId('view-tab-airframe').getAttribute('aria-selected')).toBe('true');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('data-testid'))).toBe('view-tab-airframe');
    // One Tab stop for the whole tab list.
    expect(await page.locator('[role="tab"][tabindex="0"]').count()).toBe(1);
    // The skip link is the first Tab stop in the page (document order) and moves focus to the view.
    const firstStop = await page.evaluate(
      () => document.querySelector<HTMLElement>('a[href], button:not([disabled]), input, select, textarea, [tabindex]:not([tabindex="-1"])')?.getAttribute('data-testid') ?? null,
    );
    expect(firstStop).toBe('skip-link');
    await page.getByTestId('skip-link').focus();
    expect(await page.getByTestId('skip-link').isVisible()).toBe(true);
    await page.keyboard.press('Enter');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('view-panel');
    await showView(page, 'results');
    expect(await page.locator('svg[tabindex="0"], .recharts-wrapper[tabindex="0"]').count()).toBe(0);
    // The focus ring is drawn (3 px outline), not the browser's 1 px default.
    await page.getByTestId('view-tab-results').focus();
    await page.keyboard.press('ArrowLeft');
    const outline = await page.evaluate(() => getComputedStyle(document.activeElement!).outlineWidth);
    expect(outline).toBe('3px');
  });

  it('a failed mission reads "not valid" in the headline and the strip; stale figures are marked; export asks first', async () => {
    const { page } = await app.open();
    await openDemo(page);
    await page.getByTestId('unit-system-toggle').selectOption('customary');
    const before = await readNumber(blockFuel(page));
    // Fuel capacity far below the fuel needed: the mission cannot be flown as asked.
    await showView(page, 'airframe');
    await typeInto(page, 'field-max-fuel', '500 lb');
    await showView(page, 'results');
    await page.waitForFunction(() => document.querySelector('[data-testid="summary-status"]')?.className.includes('status-bad'), undefined, { timeout: 30_000 });
    const status = await page.getByTestId('mission-status').textContent();
    expect(status).not.toMatch(/_/);
    expect(status).toMatch(/lb/);
    const shown = await blockFuel(page).textContent();
    if (shown === 'not valid') expect(await page.getByTestId('summary-block-fuel').textContent()).toBe('not valid');
    else expect(await page.getByTestId('headline-limit-badge').isVisible()).toBe(true);
    await screenshot(page, 'results-failed-1440');
    // Export of a result that is not good asks first; Cancel exports nothing.
    await page.getByTestId('command-exportLegs').click();
    await page.getByTestId('confirm-dialog').waitFor();
    expect(await page.getByTestId('confirm-dialog').textContent()).toMatch(/not a valid current result/);
    await page.getByTestId('confirm-cancel').click();
    await page.getByTestId('confirm-dialog').waitFor({ state: 'detached' });
    // Undo: good again, the figure comes back.
    await page.getByTestId('command-undo').click();
    expect(await waitForNumberChange(blockFuel(page), Number.NaN)).toBe(before);
    await page.waitForFunction(() => document.querySelector('[data-testid="summary-status"]')?.className.includes('status-ok'), undefined, { timeout: 30_000 });
  });

  it('opening another project with unsaved edits asks first, and the previous figures are gone at once', async () => {
    const { page } = await app.open();
    await openDemo(page);
    await showView(page, 'airframe');
    await typeInto(page, 'field-oew', '21000 lb');
    await page.getByTestId('command-openDemo').click();
    await page.getByTestId('confirm-dialog').waitFor();
    expect(await page.getByTestId('confirm-dialog').textContent()).toMatch(/unsaved edits/);
    await page.getByTestId('confirm-cancel').click();
    expect(await page.getByTestId('document-name').textContent()).toMatch(/\(edited\)/);
    await page.getByTestId('command-openDemo').click();
    await page.getByTestId('confirm-yes').click();
    await page.waitForFunction(() => !/edited/.test(document.querySelector('[data-testid="document-name"]')?.textContent ?? ''));
    await openDemo(page);
  });
});
