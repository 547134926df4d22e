// Entry of the field-solve worker thread. Loader hooks registered by tsx in the
// main thread do not reach worker threads on Node 20, so the thread registers
// tsx itself before loading the TypeScript worker.
import { register } from 'tsx/esm/api';

register();
await import('./field-solve-worker.ts');
