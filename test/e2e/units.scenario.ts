import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { expectClose } from '../support/assertInDelta';
import { openDemo, readNumber, waitForNumberChange } from './support/appPage';
import { launchChromium, openApp } from './support/chromium';

// 1 lb = 0.45359237 kg exactly (NIST SP 811, appendix B). Switching units
// changes the display only: the block fuel in kg is the figure in lb times
// that factor, to the display rounding.
const KG_PER_LB = 0.45359237;

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

describe('switching units', () => {
  it('block fuel converts between lb and kg and back', async () => {
    const { page, problems } = await openApp(browser, inject('baseUrl'));
    await openDemo(page);
    const headline = page.getByTestId('headline-block-fuel');
    const first = await readNumber(page, 'headline-block-fuel');
    const firstText = (await headline.textContent()) ?? '';
    await page.getByTestId('unit-system-toggle').click();
    const second = await waitForNumberChange(page, 'headline-block-fuel', first);
    const secondText = (await headline.textContent()) ?? '';
    const [lb, kg] = /lb/.test(firstText) ? [first, second] : [second, first];
    expect(/lb/.test(firstText) ? secondText : firstText).toMatch(/kg/);
    expectClose(kg, lb * KG_PER_LB, { rel: 0.002, abs: 1 }, 'NIST SP 811: 1 lb = 0.45359237 kg');
    await page.getByTestId('unit-system-toggle').click();
    expect(await waitForNumberChange(page, 'headline-block-fuel', second)).toBe(first);
    expect(problems).toEqual([]);
  });
});
