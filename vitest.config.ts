import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

// Unit and component tests. End-to-end browser tests have their own config
// (vitest.e2e.config.ts) because they need a built renderer and Chromium.
export default defineConfig({
  plugins: [react()],
  test: {
    globals: true,
    projects: [
      {
        extends: true,
        test: {
          name: 'node',
          environment: 'node',
          include: ['test/**/*.test.ts'],
          exclude: ['test/renderer/**', 'test/e2e/**', 'node_modules/**'],
        },
      },
      {
        extends: true,
        test: {
          name: 'dom',
          environment: 'happy-dom',
          include: ['test/renderer/**/*.test.ts', 'test/renderer/**/*.test.tsx'],
          setupFiles: ['test/support/domSetup.ts'],
        },
      },
    ],
  },
});
