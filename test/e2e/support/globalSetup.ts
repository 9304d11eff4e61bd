import { resolve } from 'node:path';
import { build } from 'vite';
import type { TestProject } from 'vitest/node';
import { requireChromium } from './chromium';
import { serveFolder } from './staticServer';

declare module 'vitest' {
  export interface ProvidedContext {
    /** The served renderer, e.g. http://127.0.0.1:41234/ */
    readonly baseUrl: string;
  }
}

const repo = resolve(__dirname, '..', '..', '..');

/** Builds the renderer (vite build -> dist-web/) and serves it on 127.0.0.1 for the e2e tests. */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  requireChromium();
  try {
    await build({ configFile: resolve(repo, 'vite.config.ts'), logLevel: 'warn' });
  } catch (e) {
    throw new Error(`e2e setup: the renderer does not build ("npm run build:web" fails), so nothing can be tested in the browser: ${(e as Error).message}`, { cause: e });
  }
  const server = await serveFolder(resolve(repo, 'dist-web'));
  project.provide('baseUrl', server.url);
  return server.close;
}
