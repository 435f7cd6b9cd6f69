// Worker-thread entry of the command line: TypeScript is run through tsx (as
// `npm run cli` runs main.ts), registered here because a worker does not inherit
// the main thread's loader; then the thread's own module runs.
import { URL } from 'node:url';
import { register } from 'tsx/esm/api';

register();
await import(new URL('./viewFactorThread.ts', import.meta.url).href);
