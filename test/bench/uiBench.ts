/**
 * The edit-to-figure bench of the app (not a test; `npm run bench:ui`): builds
 * the production browser renderer, drives it in Chromium and reports how long
 * a committed edit (a payload typed and the field left) takes to show a new
 * block fuel in the results view. Timed inside the page with
 * performance.now(): from the blur that commits the edit to the mutation that
 * writes the new headline figure. Target (issue 14): at most 50 ms.
 */
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';
import { launchChromium, openApp } from '../e2e/support/chromium';
import { serveFolder } from '../e2e/support/staticServer';

const EDITS = Number(process.env.BENCH_UI_EDITS ?? 30);
const repo = resolve(fileURLToPath(new URL('.', import.meta.url)), '..', '..');

function quantile(sorted: readonly number[], p: number): number {
  const i = (sorted.length - 1) * p;
  const lo = Math.floor(i);
  const hi = Math.ceil(i);
  return sorted[lo]! + (sorted[hi]! - sorted[lo]!) * (i - lo);
}

async function main(): Promise<void> {
  await build({ configFile: resolve(repo, 'vite.config.ts'), logLevel: 'warn' });
  const server = await serveFolder(resolve(repo, 'dist-web'));
  const browser = await launchChromium();
  try {
    const { page } = await openApp(browser, server.url);
    await page.getByTestId('view-tab-results').click();
    await page.waitForFunction(() => /\d/.test(document.querySelector('[data-testid="headline-block-fuel"]')?.textContent ?? ''), undefined, { timeout: 60_000 });
    await page.getByTestId('unit-system-toggle').selectOption('customary');
    const times: number[] = [];
    for (let k = 0; k < EDITS; k++) {
      // Alternate two payloads so every edit changes the figure; the field is on the mission view, the figure in the strip.
      const payload = k % 2 === 0 ? '1700 lb' : '1600 lb';
      await page.getByTestId('view-tab-mission').click();
      const ms = await page.evaluate(async (text) => {
        const field = document.querySelector<HTMLInputElement>('[data-testid="field-payload"]')!;
        const figure = document.querySelector('[data-testid="summary-block-fuel"]')!;
        const before = figure.textContent;
        const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value')!.set!;
        field.focus();
        setter.call(field, text);
        field.dispatchEvent(new Event('input', { bubbles: true }));
        const changed = new Promise<number>((resolveTime) => {
          const observer = new MutationObserver(() => {
            if (figure.textContent !== before) {
              observer.disconnect();
              resolveTime(performance.now());
            }
          });
          observer.observe(figure, { characterData: true, childList: true, subtree: true });
        });
        const t0 = performance.now();
        field.blur();
        return (await changed) - t0;
      }, payload);
      times.push(ms);
    }
    times.sort((a, b) => a - b);
    const line = (name: string, v: number) => `  ${name.padEnd(8)} ${v.toFixed(1)} ms`;
    process.stdout.write(
      [
        `Edit to new block fuel on screen (production build, Chromium, ${EDITS} edits of the demo's payload):`,
        line('median', quantile(times, 0.5)),
        line('p90', quantile(times, 0.9)),
        line('min', times[0]!),
        line('max', times[times.length - 1]!),
        `  target   <= 50 ms (median): ${quantile(times, 0.5) <= 50 ? 'met' : 'not met'}`,
        '',
      ].join('\n'),
    );
  } finally {
    await browser.close();
    await server.close();
  }
}

void main();
