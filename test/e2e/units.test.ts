import { describe, expect, it } from 'vitest';
import { expectClose } from '../support/assertInDelta';
import { blockFuel, openDemo, readNumber, waitForNumberChange } from './support/appPage';
import { sharedChromium } from './support/sharedChromium';

// 1 lb = 0.45359237 kg exactly (NIST SP 811, appendix B). Switching units
// changes the display only: the block fuel in kg is the figure in lb times
// that factor, to the display rounding.
const KG_PER_LB = 0.45359237;

const app = sharedChromium();

describe('switching units', () => {
  it('block fuel converts between lb and kg and back', async () => {
    const { page, problems } = await app.open();
    await openDemo(page);
    const headline = blockFuel(page);
    const first = await readNumber(blockFuel(page));
    const firstText = (await headline.textContent()) ?? '';
    const toggle = page.getByTestId('unit-system-toggle');
    const startUnits = await toggle.inputValue();
    await toggle.selectOption(startUnits === 'si' ? 'customary' : 'si');
    const second = await waitForNumberChange(blockFuel(page), first);
    const secondText = (await headline.textContent()) ?? '';
    const [lb, kg] = /lb/.test(firstText) ? [first, second] : [second, first];
    expect(/lb/.test(firstText) ? secondText : firstText).toMatch(/kg/);
    expectClose(kg, lb * KG_PER_LB, { rel: 0.002, abs: 1 }, 'NIST SP 811: 1 lb = 0.45359237 kg');
    await toggle.selectOption(startUnits);
    expect(await waitForNumberChange(blockFuel(page), second)).toBe(first);
    expect(problems).toEqual([]);
  });
});
