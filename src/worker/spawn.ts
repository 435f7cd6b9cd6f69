// Start the real browser worker (Vite bundles it from this URL form).
import * as Comlink from 'comlink';
import type { WorkerHandle } from './client';
import type { ViewFactorApi } from './job';

export function spawnViewFactorWorker(): WorkerHandle {
  const worker = new Worker(new URL('./viewFactorWorker.ts', import.meta.url), { type: 'module' });
  const api = Comlink.wrap<ViewFactorApi>(worker);
  return {
    compute: (job) => api.compute(job),
    terminate: () => worker.terminate(),
    onCrash: (listener) => {
      worker.addEventListener('error', (e) => listener(e.message || 'the view-factor worker stopped'));
    },
  };
}
