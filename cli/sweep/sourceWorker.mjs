// Starts the sweep worker from the TypeScript sources (when the CLI itself
// runs from them, e.g. in the tests): registers tsx in this thread first.
import { register } from 'tsx/esm/api';

register();
await import('./sweepWorker.ts');
