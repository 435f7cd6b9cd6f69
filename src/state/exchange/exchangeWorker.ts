// The exchange's worker: solves one exchange job off the page's thread
// (background.ts) and posts the view back, its arrays handed over.
import { solveExchangeJob, viewBuffers, type ExchangeJob } from './solveJob';

self.onmessage = (event: MessageEvent<{ id: number; job: ExchangeJob }>) => {
  const view = solveExchangeJob(event.data.job, false);
  self.postMessage({ id: event.data.id, view }, { transfer: viewBuffers(view) });
};
