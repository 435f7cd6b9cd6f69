// Start the real browser workers (Vite bundles them from this URL form): one per
// logical core (navigator.hardwareConcurrency, capped), sharing each job's rows.
import * as Comlink from 'comlink';
import type { WorkerHandle } from './client';
import type { ViewFactorApi } from './job';
import { poolHandle, poolSize, type RowWorker } from './pool';

function spawnRowWorker(): RowWorker {
  const worker = new Worker(new URL('./viewFactorWorker.ts', import.meta.url), { type: 'module' });
  const api = Comlink.wrap<ViewFactorApi>(worker);
  return {
    computeRows: (job, rows) => api.computeRows(job, rows),
    recycle: (buffers) => {
      void api.recycle(Comlink.transfer(buffers, [...new Set(buffers.map((b) => b.buffer as ArrayBuffer))]));
    },
    terminate: () => worker.terminate(),
    onCrash: (listener) => {
      worker.addEventListener('error', (e) => listener(e.message || 'the view-factor worker stopped'));
    },
  };
}

/** The view-factor pool as one handle for the client (replaced whole after a failure). */
export function spawnViewFactorWorker(): WorkerHandle {
  const cores = typeof navigator === 'undefined' ? 1 : navigator.hardwareConcurrency;
  return poolHandle(Array.from({ length: poolSize(cores) }, spawnRowWorker));
}
