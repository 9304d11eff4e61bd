import { defineConfig } from 'vitest/config';

// End-to-end tests: the built renderer (dist-web/) served on 127.0.0.1 and
// driven in Debian's Chromium through playwright-core. One file at a time in
// one fork: the machine is shared and each file starts its own browser.
export default defineConfig({
  test: {
    name: 'e2e',
    environment: 'node',
    include: ['test/e2e/**/*.test.ts'],
    globalSetup: ['test/e2e/support/globalSetup.ts'],
    testTimeout: 60_000,
    hookTimeout: 180_000,
    pool: 'forks',
    maxWorkers: 1,
    fileParallelism: false,
  },
});
