#!/usr/bin/env node
// Runs the TypeScript command line directly through tsx, so that
// `npx blockwise` works right after `npm ci` with no build step.
import { register } from 'tsx/esm/api';

register();
await import('../cli/run.ts');
