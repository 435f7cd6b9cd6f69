// Wires the app together: store, autosave, live results over a worker client.
import type { DocumentApi } from './documentApi';
import type { SketchFile } from './sketchFile';
import { createAppStore, type AppStore } from './store';
import { loadAutosave, startAutosave } from './autosave';
import { startLiveResults } from './results/live';
import { startLiveExchange } from './exchange/live';
import type { ExchangeWorker } from './exchange/background';
import { ViewFactorClient, type WorkerHandle } from '../worker/client';
import type { TabChannel } from './tabs/lease';
import { restartNotice } from './workerRestart';

/** Seconds a job may run before the worker counts as hung (the benchmark's largest sketch takes ~2 s). */
export const WORKER_TIME_LIMIT_MS = 15000;

export interface Runtime {
  store: AppStore;
  client: ViewFactorClient;
  dispose: () => void;
}

export function startRuntime(options: {
  storage: Storage;
  api: DocumentApi;
  spawn: () => WorkerHandle;
  demo: SketchFile;
  timeLimitMs?: number;
  /** Channel to other tabs, so only one autosaves the sketch (none in tests unless given). */
  channel?: TabChannel | null;
  /** The exchange's worker for large sketches (exchange/background.ts); none: every solve on the page. */
  exchangeWorker?: () => ExchangeWorker | null;
}): Runtime {
  const start = loadAutosave(options.storage, options.api, options.demo);
  const store = createAppStore(start.doc);
  if (start.notice) store.getState().notify(start.notice.level, start.notice.text);
  const client = new ViewFactorClient(options.spawn, {
    timeLimitMs: options.timeLimitMs ?? WORKER_TIME_LIMIT_MS,
    onRestart: (event) => {
      const notice = restartNotice(event);
      if (notice) store.getState().notify(notice.level, notice.text);
    },
  });
  const stopSave = startAutosave(store, options.storage, options.api, { channel: options.channel ?? null });
  const stopLive = startLiveResults(store, client, options.api);
  const stopExchange = startLiveExchange(store, options.exchangeWorker);
  return {
    store,
    client,
    dispose: () => {
      stopExchange();
      stopLive();
      stopSave();
      client.dispose();
    },
  };
}
