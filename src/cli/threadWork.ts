// The loop every view-factor thread runs, the main thread included: claim the next
// chunk of rows from a shared counter (rows in ascending order, so the costliest
// rows go first and the last chunks are small), compute it, count it done. The
// numbers do not depend on which thread took which chunk (core pairRows.ts).
import { buildEdges } from '../core/edges';
import { EdgePairs, fillRows, rowPairCount } from '../core/pairRows';
import type { CircleInput, PolygonInput } from '../core/scene';
import { SurfaceRowSummer, type SurfaceRowSums } from '../core/surfaceRows';

/** Slots of the shared control array. */
export const CLAIMED = 0;
export const DONE = 1;
export const FAILED = 2;
export const CONTROL_SLOTS = 3;

/** What every thread gets (structured-cloned into each worker). */
export interface ThreadJob {
  /** Tells this job's messages from a late one of an earlier job. */
  id: number;
  polygons: PolygonInput[];
  circles: CircleInput[];
  /** Chunk c is rows chunkStart[c] .. chunkStart[c+1]-1. */
  chunkStart: Int32Array;
  /** Int32 slots CLAIMED, DONE, FAILED. */
  control: SharedArrayBuffer;
  /** The shared edge matrix (edges^2 doubles), or null when summing straight to surfaces. */
  matrix: SharedArrayBuffer | null;
  /** Surface of every edge, when summing straight to surfaces. */
  edgeSurface: Int32Array | null;
  surfaceCount: number;
}

/** Most pairs in one chunk: small enough to share the tail evenly, big enough that a chunk costs far more than its claim. */
const MAX_CHUNK_PAIRS = 1 << 17;

/** Row chunks of about total / (threads * 16) pairs each (at most MAX_CHUNK_PAIRS, at least one row). */
export function rowChunks(n: number, threads: number): Int32Array {
  const total = (n * (n + 1)) / 2;
  const target = Math.max(1, Math.min(MAX_CHUNK_PAIRS, Math.ceil(total / (threads * 16))));
  const starts = [0];
  let load = 0;
  for (let i = 0; i < n; i++) {
    load += rowPairCount(n, i);
    if (load >= target && i + 1 < n) {
      starts.push(i + 1);
      load = 0;
    }
  }
  starts.push(n);
  return Int32Array.from(starts);
}

/**
 * Claim and compute chunks until none is left (or a thread failed). Edge rows go
 * straight into the shared matrix; surface sums go to `onSums`. `between` runs
 * after every chunk (the main thread takes in the workers' sums there).
 */
export function workChunks(job: ThreadJob, onSums: (sums: SurfaceRowSums) => void, between: () => void): void {
  const control = new Int32Array(job.control);
  const pairs = new EdgePairs(buildEdges(job.polygons, job.circles));
  const F = job.matrix ? new Float64Array(job.matrix) : null;
  const summer = job.edgeSurface ? new SurfaceRowSummer(pairs, job.edgeSurface, job.surfaceCount) : null;
  const chunks = job.chunkStart.length - 1;
  for (;;) {
    if (Atomics.load(control, FAILED) !== 0) return;
    const c = Atomics.add(control, CLAIMED, 1);
    if (c >= chunks) return;
    const rows = new Int32Array(job.chunkStart[c + 1] - job.chunkStart[c]);
    for (let k = 0; k < rows.length; k++) rows[k] = job.chunkStart[c] + k;
    if (F) fillRows(pairs, rows, F);
    else if (summer) onSums(summer.sum(rows));
    Atomics.add(control, DONE, 1);
    Atomics.notify(control, DONE);
    between();
  }
}
