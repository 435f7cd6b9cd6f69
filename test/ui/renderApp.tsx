// Render the whole app in jsdom with a real store, the real document layer and
// an in-thread stand-in for the worker. The konva canvas is replaced by a stub
// (jsdom has no 2D canvas); drawing is covered by the tool tests and the browser tests.
import { render } from '@testing-library/react';
import { App } from '../../src/ui/App';
import { AppProvider } from '../../src/ui/AppContext';
import { startRuntime } from '../../src/state/runtime';
import { documentApi } from '../../src/state/documentApi';
import { demoSketch } from '../../src/state/demo';
import { viewFactorApi } from '../../src/worker/api';
import type { WorkerHandle } from '../../src/worker/client';
import { MemoryStorage } from '../state/memoryStorage';

export const inThreadWorker = (): WorkerHandle => ({
  compute: async (job) => viewFactorApi.compute(job),
  terminate: () => {},
});

export function renderApp(options: { storage?: MemoryStorage; spawn?: () => WorkerHandle; timeLimitMs?: number } = {}) {
  const storage = options.storage ?? new MemoryStorage();
  const runtime = startRuntime({
    storage,
    api: documentApi,
    spawn: options.spawn ?? inThreadWorker,
    demo: demoSketch,
    timeLimitMs: options.timeLimitMs,
  });
  const view = render(
    <AppProvider store={runtime.store} api={documentApi}>
      <App />
    </AppProvider>,
  );
  return { ...view, runtime, store: runtime.store, storage };
}
