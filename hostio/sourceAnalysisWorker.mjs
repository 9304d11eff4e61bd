// Starts the analysis pool's worker from the TypeScript sources (tests, the bench under tsx): registers tsx in this thread first.
import { register } from 'tsx/esm/api';

register();
await import('./analysisWorker.ts');
