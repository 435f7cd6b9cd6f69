// What a worker offers: the core's view factors on plain payloads, for a whole
// job or for some of its rows (a pool shares one job's rows, see pool.ts).
// Summing edges to surfaces is a cheap stage of its own on the main thread, so
// renaming or grouping surfaces never needs a worker (below the edge-matrix budget).
// Each worker remembers its last rows: while a shape is dragged, the next job
// computes only the pairs the moved shapes may change and copies the rest.
import * as Comlink from 'comlink';
import { buildEdges, type EdgeSet } from '../core/edges';
import { EdgePairs, packRows } from '../core/pairRows';
import { packedRowsAfter } from '../core/reuse/reuseRows';
import { sameEntries } from '../core/sameEntries';
import { RowMemory } from './rowMemory';
import { SurfaceRowSummer } from '../core/surfaceRows';
import { allRows } from '../core/viewFactors';
import { assembleAnswer } from './assemble';
import { isSurfaceAnswer, type RowsAnswer, type ViewFactorAnswer, type ViewFactorApi, type ViewFactorJob } from './job';

function jobEdges(job: ViewFactorJob): EdgeSet {
  return buildEdges(job.polygons, job.circles ?? []);
}

/**
 * The pairs of `rows` (ascending): packed exchange lengths, or their surface sums
 * when the job names surfaces. With a worker's `memory` holding the same rows of an
 * earlier sketch with the same shapes, pairs no moved shape can change are kept
 * from it; the new rows are kept there in turn, and the answer gets a copy.
 */
export function computeRows(job: ViewFactorJob, rows: Int32Array, memory?: RowMemory): RowsAnswer {
  const edges = jobEdges(job);
  const pairs = new EdgePairs(edges);
  const closed = edges.hasEnclosure;
  if (job.surfaces) {
    const sums = new SurfaceRowSummer(pairs, job.surfaces.edgeSurface, job.surfaces.count).sum(rows);
    return { kind: 'surfaces', edgeLength: pairs.length, closed, sums };
  }
  const earlier = memory?.take();
  const same = earlier && sameEntries(earlier.rows, rows) ? earlier : null;
  // One buffer is kept and one handed over per job: a fresh one of this size costs
  // a browser worker more than the pairs themselves, so the kept one is updated in place.
  const { packed: kept, computed } = packedRowsAfter(same, pairs, rows);
  const keeping = memory !== undefined && memory.keep({ pairs, rows: rows.slice(), packed: kept });
  const packed = keeping ? memory.copy(kept) : kept;
  return { kind: 'matrix', edgeLength: pairs.length, closed, rows, packed, computed };
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

/** One worker's API, with its own memory of the last rows it computed and of spare buffers. */
export function createViewFactorApi(): ViewFactorApi {
  const memory = new RowMemory();
  return {
    compute(job: ViewFactorJob) {
      const r = computeEdgeViewFactors(job);
      return Comlink.transfer(r, transferables(r));
    },
    computeRows(job: ViewFactorJob, rows: Int32Array) {
      const t0 = performance.now();
      const r = computeRows(job, rows, memory);
      // What these rows cost this thread: the pool decides from it where the next job like it runs.
      r.elapsedMs = performance.now() - t0;
      return Comlink.transfer(r, transferables(r));
    },
    recycle(buffers: Float64Array[]) {
      memory.recycle(buffers);
    },
  };
}

/** A stateless API for tests and single calls (remembers nothing between jobs). */
export const viewFactorApi: ViewFactorApi = {
  compute: (job) => createViewFactorApi().compute(job),
  computeRows: (job, rows) => createViewFactorApi().computeRows(job, rows),
  recycle: () => {},
};
