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
  await build({ configFile: resolve(repo, 'vite.config.ts'), logLevel: 'warn' });
  const server = await serveFolder(resolve(repo, 'dist-web'));
  project.provide('baseUrl', server.url);
  return server.close;
}
