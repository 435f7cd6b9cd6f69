// What the worker offers: the core's computeViewFactors on plain payloads.
import * as Comlink from 'comlink';
import { computeViewFactors } from '../core/viewFactors';
import type { ViewFactorApi, ViewFactorJob } from './job';

// The edges x edges matrix is scratch for each job: keep one and reuse it, so a drag
// of a large sketch does not allocate (and collect) tens of megabytes per frame.
let edgeMatrix = new Float64Array(0);

export const viewFactorApi: ViewFactorApi = {
  compute(job: ViewFactorJob) {
    const edges = job.edgeSurface.length;
    const need = edges * edges;
    // Grow when short; let go of a much larger one (a big sketch was closed).
    if (edgeMatrix.length < need || edgeMatrix.length > 4 * need + 65536) edgeMatrix = new Float64Array(need);
    const r = computeViewFactors(job, { edgeMatrix });
    // Hand the arrays over instead of copying them.
    return Comlink.transfer(r, [r.edgeLength.buffer, r.surfaceLength.buffer, r.F.buffer, r.rowSumResidual.buffer] as ArrayBuffer[]);
  },
};
