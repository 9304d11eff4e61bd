import { defineConfig, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';
import { fileURLToPath } from 'node:url';
import { CONTENT_SECURITY_POLICY } from './electron/windowSecurity';

const here = fileURLToPath(new URL('.', import.meta.url));

/**
 * Puts the app's Content-Security-Policy in the built index.html (the page is
 * loaded from file:// by Electron, where no server sends headers). Only at
 * build time: the dev server's hot reload needs an inline script.
 */
function contentSecurityPolicy(): Plugin {
  return {
    name: 'blockwise-csp',
    apply: 'build',
    transformIndexHtml: {
      order: 'post',
      handler: () => [
        { tag: 'meta', attrs: { 'http-equiv': 'Content-Security-Policy', content: CONTENT_SECURITY_POLICY }, injectTo: 'head-prepend' },
      ],
    },
  };
}

// One renderer build for the desktop shell (file://, hence relative base) and
// the browser (`npm run web`, `npm run build:web`, end-to-end tests).
export default defineConfig({
  root: `${here}renderer`,
  base: './',
  plugins: [react(), contentSecurityPolicy()],
  build: {
    outDir: `${here}dist-web`,
    emptyOutDir: true,
    sourcemap: true,
    chunkSizeWarningLimit: 2048,
  },
  worker: { format: 'es' },
  server: { host: '127.0.0.1', strictPort: false, fs: { allow: [here] } },
  preview: { host: '127.0.0.1' },
});
