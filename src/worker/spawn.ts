// Start the real browser workers (Vite bundles them from this URL form): one per
// logical core (navigator.hardwareConcurrency, capped), sharing each job's rows;
// jobs too small to be worth a round trip run on the page (pool.ts, runsOnPage).
import * as Comlink from 'comlink';
import type { WorkerHandle } from './client';
import type { ViewFactorApi } from './job';
import { MIN_PAIRS_PER_WORKER, poolHandle, poolSize, type RowWorker } from './pool';
import { createViewFactorApi } from './api';

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

/**
 * The page's own row worker for small jobs (pool.ts, runsOnPage): a worker's API
 * run in this thread, with its own memory of the last rows for drags.
 */
function pageRowWorker(): RowWorker {
  const api = createViewFactorApi();
  return {
    computeRows: (job, rows) => Promise.resolve(api.computeRows(job, rows)),
    recycle: (buffers) => void api.recycle(buffers),
    terminate: () => {},
  };
}

/** The view-factor pool as one handle for the client (replaced whole after a failure). */
export function spawnViewFactorWorker(): WorkerHandle {
  const cores = typeof navigator === 'undefined' ? 1 : navigator.hardwareConcurrency;
  return poolHandle(Array.from({ length: poolSize(cores) }, spawnRowWorker), MIN_PAIRS_PER_WORKER, pageRowWorker());
}
