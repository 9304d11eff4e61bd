import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { openDemo, showView } from './support/appPage';
import { screenshot } from './support/chromium';
import { sharedChromium } from './support/sharedChromium';

// The deck engineer's bad-deck fixtures carry the exact message each file
// must produce (fixtures/bad-decks/expected.json); the engine view must show
// it, with line and column, after an import through the browser's file picker.

const badDecks = resolve(__dirname, '..', '..', 'fixtures', 'bad-decks');
const expected = JSON.parse(readFileSync(resolve(badDecks, 'expected.json'), 'utf8')) as Record<string, string>;

const app = sharedChromium();

describe('importing a deck', () => {
  it('a deck with a non-numeric cell is refused with its line and column in the message line', async () => {
    const { page } = await app.open();
    await openDemo(page);
    await showView(page, 'engine');
    const chooser = page.waitForEvent('filechooser');
    await page.getByTestId('command-importDeck').click();
    await (await chooser).setFiles(resolve(badDecks, 'non-numeric-cell.csv'));
    // A refused deck changes nothing; the message line says where and what.
    const errors = page.getByTestId('app-message');
    await errors.waitFor({ state: 'visible' });
    const message = expected['non-numeric-cell.csv'];
    expect(message).toMatch(/line 6, column "thrust\[lbf\]"/);
    expect(await errors.textContent()).toContain(message);
    await screenshot(page, 'deck-errors');
    expect(await page.getByTestId('safety-notice').isVisible()).toBe(true);
  });
});
