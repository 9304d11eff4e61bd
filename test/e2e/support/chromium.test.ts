import { describe, expect, it } from 'vitest';
import { CHROMIUM_ARGS, requireChromium } from './chromium';

// Task brief: without Debian's Chromium the e2e run fails with the fix
// (apt-get install -y chromium) instead of skipping; no browser download.

describe('requireChromium', () => {
  it('requireChromium fails with the path and the install command when Chromium is missing', () => {
    expect(() => requireChromium('/nonexistent/chromium')).toThrow(
      /Chromium at \/nonexistent\/chromium, which is missing\. Install it with "apt-get install -y chromium"/,
    );
  });

  it('requireChromium passes for an existing binary', () => {
    expect(() => requireChromium(process.execPath)).not.toThrow();
  });

  it('CHROMIUM_ARGS run headless without sandbox, GPU, QUIC or background traffic', () => {
    for (const arg of ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync']) {
      expect(CHROMIUM_ARGS).toContain(arg);
    }
  });
});
