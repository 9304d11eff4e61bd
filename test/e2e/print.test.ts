import { describe, expect, it } from 'vitest';
import { SAFETY_NOTICE_LINES } from '../../engine/core/notice';
import { openDemo } from './support/appPage';
import { sharedChromium } from './support/sharedChromium';

// The report prints through a print stylesheet (DESIGN.md §2.7: export a
// report as PDF; §7: every report carries the safety notice). On screen the
// report is hidden; in print only the report shows.

const app = sharedChromium();

describe('printing', () => {
  it('the page has print rules: the printed page is the report with the safety notice, without the screen', async () => {
    const { page } = await app.open();
    await openDemo(page);
    const printRules = await page.evaluate(() => {
      let count = 0;
      for (const sheet of Array.from(document.styleSheets)) {
        const sheetIsPrint = sheet.media.mediaText.includes('print');
        for (const rule of Array.from(sheet.cssRules)) {
          if (sheetIsPrint || (rule instanceof CSSMediaRule && rule.media.mediaText.includes('print'))) count += 1;
        }
      }
      return count;
    });
    expect(printRules).toBeGreaterThan(0);
    const report = page.getByTestId('print-report');
    // The report is mounted only to print: absent on screen, present while the print command prints.
    expect(await report.count()).toBe(0);
    await page.evaluate(() => {
      const w = window as unknown as { printedWithReport: boolean[] };
      w.printedWithReport = [];
      window.print = () => void w.printedWithReport.push(document.querySelector('[data-testid="print-report"]') !== null);
    });
    await page.getByTestId('command-print').click();
    await page.waitForFunction(() => (window as unknown as { printedWithReport: boolean[] }).printedWithReport.length === 1);
    expect(await page.evaluate(() => (window as unknown as { printedWithReport: boolean[] }).printedWithReport)).toEqual([true]);
    await report.waitFor({ state: 'detached' });
    // Printing from the browser's own menu (beforeprint) mounts it too.
    await page.evaluate(() => window.dispatchEvent(new Event('beforeprint')));
    await page.emulateMedia({ media: 'print' });
    expect(await report.isVisible()).toBe(true);
    const notice = report.getByTestId('report-notice');
    expect(await notice.isVisible()).toBe(true);
    for (const line of SAFETY_NOTICE_LINES) expect(await notice.textContent()).toContain(line);
    expect(await page.locator('[role="tablist"]').isVisible()).toBe(false);
    const pdf = await page.pdf({ format: 'A4' });
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
  });

  it('the printed report is dated and names its file, no table cell wraps at A4 width, and it fits a few A4 pages with the closing notice kept with the content', async () => {
    const { page } = await app.open();
    await openDemo(page);
    await page.evaluate(() => window.dispatchEvent(new Event('beforeprint')));
    await page.emulateMedia({ media: 'print' });
    // A4 less the 15 mm side margins of print.css at 96 px per inch: 180 mm = 680 px
    await page.setViewportSize({ width: 680, height: 1000 });
    const report = page.getByTestId('print-report');
    await report.waitFor({ state: 'visible' });
    const meta = (await page.getByTestId('report-meta').textContent()) ?? '';
    expect(meta).toContain('demo.blockwise.json');
    expect(meta).toMatch(/printed \d{4}-\d{2}-\d{2} \d{2}:\d{2}/);
    const layout = await page.evaluate(() => {
      // The inputs' description column wraps by design; every other cell holds one line of text.
      const cells = [...document.querySelectorAll('[data-testid="print-report"] td, [data-testid="print-report"] th')].filter((c) => !c.closest('.report-inputs') || c !== c.parentElement?.lastElementChild);
      const wrapped = cells
        .filter((c) => {
          const range = document.createRange();
          range.selectNodeContents(c);
          return new Set([...range.getClientRects()].map((r) => Math.round(r.bottom))).size > 1;
        })
        .map((c) => c.textContent);
      const end = document.querySelector('.report-notice-end')!;
      return { cells: cells.length, wrapped, endBreak: getComputedStyle(end).breakBefore };
    });
    expect(layout.cells).toBeGreaterThan(10);
    expect(layout.wrapped).toEqual([]);
    expect(layout.endBreak).toBe('avoid');
    const pdf = (await page.pdf({ format: 'A4' })).toString('latin1');
    const pages = pdf.match(/\/Type\s*\/Page(?!s)/g)?.length ?? 0;
    expect(pages).toBeGreaterThanOrEqual(1);
    expect(pages).toBeLessThanOrEqual(4);
  });
});
