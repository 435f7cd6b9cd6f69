// What the worker offers: the core's computeViewFactors on plain payloads.
import * as Comlink from 'comlink';
import { computeViewFactors } from '../core/viewFactors';
import type { ViewFactorApi, ViewFactorJob } from './job';

export const viewFactorApi: ViewFactorApi = {
  compute(job: ViewFactorJob) {
    const r = computeViewFactors(job);
    // Hand the arrays over instead of copying them.
    return Comlink.transfer(r, [r.edgeLength.buffer, r.surfaceLength.buffer, r.F.buffer, r.rowSumResidual.buffer] as ArrayBuffer[]);
  },
};
