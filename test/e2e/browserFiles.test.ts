import { readFile } from 'node:fs/promises';
import type { Download } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { STORAGE_KEYS } from '../../renderer/bridge/browserBridge';
import { openDemo, showView } from './support/appPage';
import { sharedChromium } from './support/sharedChromium';

// The browser bridge end to end (docs/desktop.md): saving and exporting
// become downloads, unsaved work is kept in localStorage and offered back
// after a reload (the browser's stand-in for a crash).

const app = sharedChromium();

async function downloadedText(download: Download): Promise<string> {
  const path = await download.path();
  return readFile(path, 'utf8');
}

describe('files in the browser build', () => {
  it('saving downloads the project as JSON and exporting downloads the legs as CSV', async () => {
    const { page, problems } = await app.open();
    await openDemo(page);

    const saving = page.waitForEvent('download');
    await page.getByTestId('command-save').click();
    const saved = await saving;
    expect(saved.suggestedFilename()).toMatch(/\.blockwise\.json$/);
    const project = JSON.parse(await downloadedText(saved)) as { format?: unknown; airframe?: unknown };
    expect(project.format).toBe('blockwise-project');
    expect(project.airframe).toBeTypeOf('object');

    const exporting = page.waitForEvent('download');
    await page.getByTestId('command-exportLegs').click();
    const csv = await exporting;
    expect(csv.suggestedFilename()).toMatch(/\.csv$/);
    const all = (await downloadedText(csv)).trim().split('\n');
    // The safety notice heads every export as # comment lines (DESIGN.md §7).
    expect(all[0]).toMatch(/^# Conceptual planning figures only/);
    const lines = all.filter((l) => !l.startsWith('#'));
    expect(lines.length).toBeGreaterThan(2);
    const width = lines[0]?.split(',').length ?? 0;
    expect(width).toBeGreaterThan(2);
    expect(problems).toEqual([]);
  });

  it('unsaved work is autosaved and offered back after a reload', async () => {
    const { page, problems } = await app.open();
    await openDemo(page);
    await showView(page, 'airframe');
    const cd0 = page.getByTestId('field-cd0-0');
    const edited = String(Math.round((Number(await cd0.inputValue()) + 0.003) * 1e5) / 1e5);
    await cd0.fill(edited);
    await cd0.press('Enter');

    // The renderer sends a copy every few seconds while dirty (renderer/bridge/autosaveTimer.ts).
    const key = STORAGE_KEYS.recovery;
    await page.waitForFunction((k) => window.localStorage.getItem(k) !== null, key, { timeout: 30_000 });
    const stored = await page.evaluate((k) => JSON.parse(window.localStorage.getItem(k) ?? '{}') as { text?: string }, key);
    expect(stored.text).toContain(edited);

    await page.reload();
    await page.getByTestId('recovery-offer').waitFor({ state: 'visible', timeout: 30_000 });
    await page.getByTestId('recovery-restore').click();
    await showView(page, 'airframe');
    await expect.poll(() => page.getByTestId('field-cd0-0').inputValue(), { timeout: 30_000 }).toBe(edited);
    expect(problems).toEqual([]);
  });
});
