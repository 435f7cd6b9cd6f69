// What a worker offers: the core's view factors on plain payloads, for a whole
// job or for some of its rows (a pool shares one job's rows, see pool.ts).
// Summing edges to surfaces is a cheap stage of its own on the main thread, so
// renaming or grouping surfaces never needs a worker (below the edge-matrix budget).
import * as Comlink from 'comlink';
import { buildEdges, type EdgeSet } from '../core/edges';
import { EdgePairs, packRows } from '../core/pairRows';
import { SurfaceRowSummer } from '../core/surfaceRows';
import { allRows } from '../core/viewFactors';
import { assembleAnswer } from './assemble';
import { isSurfaceAnswer, type RowsAnswer, type ViewFactorAnswer, type ViewFactorApi, type ViewFactorJob } from './job';

function jobEdges(job: ViewFactorJob): EdgeSet {
  return buildEdges(job.polygons, job.circles ?? []);
}

/** The pairs of `rows` (ascending): packed exchange lengths, or their surface sums when the job names surfaces. */
export function computeRows(job: ViewFactorJob, rows: Int32Array): RowsAnswer {
  const edges = jobEdges(job);
  const pairs = new EdgePairs(edges);
  const closed = edges.hasEnclosure;
  if (job.surfaces) {
    const sums = new SurfaceRowSummer(pairs, job.surfaces.edgeSurface, job.surfaces.count).sum(rows);
    return { kind: 'surfaces', edgeLength: pairs.length, closed, sums };
  }
  return { kind: 'matrix', edgeLength: pairs.length, closed, rows, packed: packRows(pairs, rows) };
}

/** View factors of a job's polygons and circles in this thread (lengths in sketch units; arcs after polygon edges). */
export function computeEdgeViewFactors(job: ViewFactorJob): ViewFactorAnswer {
  if (job.surfaces) {
    const n = job.surfaces.edgeSurface.length;
    return assembleAnswer(job, n, [computeRows(job, allRows(n))]);
  }
  const edges = jobEdges(job);
  const pairs = new EdgePairs(edges);
  const rows = allRows(pairs.count);
  const packed = packRows(pairs, rows);
  return {
    edgeCount: pairs.count,
    edgeLength: pairs.length,
    rows: { sets: [rows], packed: [packed] },
    closed: edges.hasEnclosure,
  };
}

/** The buffers of an answer, handed over instead of copied (the matrix is edges^2 numbers). */
export function transferables(r: ViewFactorAnswer | RowsAnswer): ArrayBuffer[] {
  const list: ArrayBufferLike[] = [r.edgeLength.buffer];
  if ('kind' in r && r.kind === 'matrix') list.push(r.packed.buffer, r.rows.buffer);
  else if ('kind' in r) {
    const s = r.sums;
    list.push(s.rows.buffer, s.self.buffer, s.start.buffer, s.surface.buffer, s.exchange.buffer);
  } else if (isSurfaceAnswer(r)) list.push(r.exchange.buffer, r.edgeSurface.buffer, r.surfaceLength.buffer);
  else r.rows.sets.forEach((set, k) => list.push(set.buffer, r.rows.packed[k].buffer));
  return [...new Set(list)] as ArrayBuffer[];
}

export const viewFactorApi: ViewFactorApi = {
  compute(job: ViewFactorJob) {
    const r = computeEdgeViewFactors(job);
    return Comlink.transfer(r, transferables(r));
  },
  computeRows(job: ViewFactorJob, rows: Int32Array) {
    const r = computeRows(job, rows);
    return Comlink.transfer(r, transferables(r));
  },
};
