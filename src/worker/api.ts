// What the worker offers: the core's edge-level view factors on plain payloads.
// Summing edges to surfaces is a cheap stage of its own on the main thread, so
// renaming or grouping surfaces never needs the worker.
import * as Comlink from 'comlink';
import { buildEdges } from '../core/edges';
import { edgeViewFactors } from '../core/viewFactors';
import type { EdgeViewFactors, ViewFactorApi, ViewFactorJob } from './job';

/** Edge view factors of a job's polygons (lengths in sketch units). */
export function computeEdgeViewFactors(job: ViewFactorJob): EdgeViewFactors {
  const edges = buildEdges(job.polygons);
  const F = edgeViewFactors(edges);
  return { edgeCount: edges.count, edgeLength: edges.length, F, closed: edges.hasEnclosure };
}

export const viewFactorApi: ViewFactorApi = {
  compute(job: ViewFactorJob) {
    const r = computeEdgeViewFactors(job);
    // Hand the arrays over instead of copying them: the matrix is edges^2 numbers.
    return Comlink.transfer(r, [r.edgeLength.buffer, r.F.buffer] as ArrayBuffer[]);
  },
};
