import type { Page } from 'playwright-core';

/**
 * Reads the first number in an element's text ("12,345 lb" -> 12345).
 * Fails with the text when there is none.
 */
export async function readNumber(page: Page, testId: string): Promise<number> {
  const text = (await page.getByTestId(testId).textContent()) ?? '';
  const match = /-?\d[\d,\u202f\u00a0 ]*(?:\.\d+)?/.exec(text);
  if (match === null) throw new Error(`no number in [data-testid=${testId}]: "${text}"`);
  return Number(match[0].replace(/[,\u202f\u00a0 ]/g, ''));
}

/** Waits until the element's number differs from `previous` and returns it. */
export async function waitForNumberChange(page: Page, testId: string, previous: number, timeout_ms = 30_000): Promise<number> {
  const deadline = Date.now() + timeout_ms;
  for (;;) {
    const value = await readNumber(page, testId).catch(() => previous);
    if (value !== previous) return value;
    if (Date.now() > deadline) throw new Error(`[data-testid=${testId}] stayed at ${previous} for ${timeout_ms} ms`);
    await page.waitForTimeout(100);
  }
}

/** Switches to a view by its tab (view ids from renderer/state/viewNames.ts). */
export async function showView(page: Page, viewId: string): Promise<void> {
  await page.getByTestId(`view-tab-${viewId}`).click();
  await page.getByTestId(`view-${viewId}`).waitFor({ state: 'attached' });
}

/** Opens the bundled demo project (button `open-demo`) unless a project is already shown, and waits for the block fuel. */
export async function openDemo(page: Page): Promise<void> {
  const headline = page.getByTestId('headline-block-fuel');
  const demoButton = page.getByTestId('open-demo');
  await headline.or(demoButton).first().waitFor({ state: 'visible', timeout: 30_000 });
  if (!(await headline.isVisible())) await demoButton.click();
  await showView(page, 'results');
  await headline.waitFor({ state: 'visible', timeout: 30_000 });
  await page.waitForFunction(
    () => /\d/.test(document.querySelector('[data-testid="headline-block-fuel"]')?.textContent ?? ''),
    undefined,
    { timeout: 30_000 },
  );
}
