import { describe, expect, it } from 'vitest';
import { SAFETY_NOTICE_LINES } from '../../engine/core/notice';
import { screenshot } from './support/chromium';
import { sharedChromium } from './support/sharedChromium';

// DESIGN.md §7: every screen carries the safety notice. The page must load
// under the strict CSP (electron/windowSecurity.ts) with no console errors.

const app = sharedChromium();

describe('the app in Chromium', () => {
  it('loads under its Content-Security-Policy and shows the safety notice', async () => {
    const { page, problems } = await app.open();
    const notice = page.getByTestId('safety-notice');
    await notice.waitFor({ state: 'visible' });
    for (const line of SAFETY_NOTICE_LINES) expect(await notice.textContent()).toContain(line);
    const csp = await page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content');
    expect(csp).toContain("script-src 'self'");
    expect(await page.evaluate(() => 'blockwiseHost' in window)).toBe(false);
    await screenshot(page, 'start');
    expect(problems).toEqual([]);
  });

  it('shows the safety notice on every view', async () => {
    const { page, problems } = await app.open();
    const tabs = page.locator('[data-testid^="view-tab-"]');
    await tabs.first().waitFor();
    const ids = await tabs.evaluateAll((els) => els.map((e) => e.getAttribute('data-testid')?.replace('view-tab-', '') ?? ''));
    expect(ids.length).toBeGreaterThanOrEqual(2);
    for (const id of ids) {
      await page.getByTestId(`view-tab-${id}`).click();
      await page.getByTestId(`view-${id}`).waitFor({ state: 'attached' });
      expect(await page.getByTestId('safety-notice').isVisible(), `notice on ${id}`).toBe(true);
      await screenshot(page, `view-${id}`);
    }
    expect(problems).toEqual([]);
  });

  it('refuses an inline script under its Content-Security-Policy', async () => {
    const { page, problems } = await app.open();
    await page.getByTestId('safety-notice').waitFor();
    const outcome = await page.evaluate(
      () =>
        new Promise<{ ran: boolean; violated: string }>((resolve) => {
          let violated = '';
          document.addEventListener('securitypolicyviolation', (e) => (violated = e.effectiveDirective));
          const script = document.createElement('script');
          script.textContent = 'window.__inlineRan = true;';
          document.head.append(script);
          setTimeout(() => resolve({ ran: (window as unknown as { __inlineRan?: boolean }).__inlineRan === true, violated }), 200);
        }),
    );
    expect(outcome).toEqual({ ran: false, violated: 'script-src-elem' });
    expect(problems.every((p) => p.includes('Content Security Policy'))).toBe(true);
  });
});
