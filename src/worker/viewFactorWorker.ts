// The worker: a comlink wrapper over the core, nothing more.
import * as Comlink from 'comlink';
import { computeViewFactors } from '../core/viewFactors';
import type { ViewFactorApi, ViewFactorJob } from './job';

const api: ViewFactorApi = {
  compute(job: ViewFactorJob) {
    const r = computeViewFactors(job);
    // Hand the arrays over instead of copying them.
    return Comlink.transfer(r, [r.edgeLength.buffer, r.surfaceLength.buffer, r.F.buffer, r.rowSumResidual.buffer] as ArrayBuffer[]);
  },
};

Comlink.expose(api);
