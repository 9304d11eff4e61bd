import type { Locator, Page } from 'playwright-core';
import { expect } from 'vitest';

/** The results view's block fuel (the printable report repeats the same test id, hidden on screen). */
export function blockFuel(page: Page): Locator {
  return page.getByTestId('view-results').getByTestId('headline-block-fuel');
}

/**
 * Reads the first number in an element's text ("12,345 lb" -> 12345).
 * Fails with the text when there is none.
 */
export async function readNumber(target: Locator): Promise<number> {
  const text = (await target.textContent()) ?? '';
  const match = /-?\d[\d,\u202f\u00a0 ]*(?:\.\d+)?/.exec(text);
  if (match === null) throw new Error(`no number in ${target.toString()}: "${text}"`);
  return Number(match[0].replace(/[,\u202f\u00a0 ]/g, ''));
}

/** Waits until the element's number differs from `previous` and returns it. */
export async function waitForNumberChange(target: Locator, previous: number, timeout_ms = 30_000): Promise<number> {
  const deadline = Date.now() + timeout_ms;
  for (;;) {
    const value = await readNumber(target).catch(() => previous);
    if (value !== previous) return value;
    if (Date.now() > deadline) throw new Error(`${target.toString()} stayed at ${previous} for ${timeout_ms} ms`);
    await target.page().waitForTimeout(100);
  }
}

/** Switches to a view by its tab (view ids from renderer/state/viewNames.ts). */
export async function showView(page: Page, viewId: string): Promise<void> {
  await page.getByTestId(`view-tab-${viewId}`).click();
  await page.getByTestId(`view-${viewId}`).waitFor({ state: 'attached' });
}

/**
 * Makes sure the demo study is open (the browser build opens it on start;
 * otherwise the toolbar's demo command does), shows the results view and
 * waits for a block fuel figure.
 */
export async function openDemo(page: Page): Promise<void> {
  const headline = blockFuel(page);
  await page.getByTestId('command-openDemo').waitFor({ state: 'visible', timeout: 30_000 });
  await showView(page, 'results');
  try {
    await headline.waitFor({ state: 'visible', timeout: 15_000 });
  } catch {
    await page.getByTestId('command-openDemo').click();
    await headline.waitFor({ state: 'visible', timeout: 30_000 });
  }
  await page.waitForFunction(
    () => /\d/.test(document.querySelector('[data-testid="view-results"] [data-testid="headline-block-fuel"]')?.textContent ?? ''),
    undefined,
    { timeout: 30_000 },
  );
}

/**
 * Runs the compare view on the open study and waits for its result (or its failure, whose text then fails the test);
 * returns the two design names it shows, A first.
 */
export async function runCompare(page: Page): Promise<readonly [string | undefined, string | undefined]> {
  await showView(page, 'compare');
  await page.getByTestId('compare-run').click();
  const first = page.getByTestId('compare-design-name-0');
  const failure = page.getByTestId('compare-failure');
  await first.or(failure).first().waitFor({ state: 'visible', timeout: 120_000 });
  // the failure's text only when it is there (textContent on a missing element waits out the 30 s timeout)
  const failed = await failure.isVisible();
  expect(failed, failed ? ((await failure.textContent()) ?? '') : '').toBe(false);
  return [(await first.textContent())?.trim(), (await page.getByTestId('compare-design-name-1').textContent())?.trim()];
}
