// What the worker offers: the core's edge-level view factors on plain payloads.
// Summing edges to surfaces is a cheap stage of its own on the main thread, so
// renaming or grouping surfaces never needs the worker.
import * as Comlink from 'comlink';
import { allEdgeLengths, buildEdges, totalEdgeCount } from '../core/edges';
import { edgeViewFactors } from '../core/viewFactors';
import type { EdgeViewFactors, ViewFactorApi, ViewFactorJob } from './job';

/** Edge view factors of a job's polygons and circles (lengths in sketch units; arcs after polygon edges). */
export function computeEdgeViewFactors(job: ViewFactorJob): EdgeViewFactors {
  const edges = buildEdges(job.polygons, job.circles ?? []);
  const F = edgeViewFactors(edges);
  return { edgeCount: totalEdgeCount(edges), edgeLength: allEdgeLengths(edges), F, closed: edges.hasEnclosure };
}

export const viewFactorApi: ViewFactorApi = {
  compute(job: ViewFactorJob) {
    const r = computeEdgeViewFactors(job);
    // Hand the arrays over instead of copying them: the matrix is edges^2 numbers.
    return Comlink.transfer(r, [r.edgeLength.buffer, r.F.buffer] as ArrayBuffer[]);
  },
};
