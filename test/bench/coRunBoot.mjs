// Worker-thread entry of the co-run check (coRun.ts): registers tsx, which a worker
// does not inherit from the main thread, then runs the check's worker module.
import { URL } from 'node:url';
import { register } from 'tsx/esm/api';

register();
await import(new URL('./coRunWorker.ts', import.meta.url).href);
