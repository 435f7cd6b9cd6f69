// The loop every view-factor thread runs, the main thread included: claim the next
// chunk of rows from a shared counter (rows in ascending order, so the costliest
// rows go first and the last chunks are small), compute it, count it done. With a
// shared edge matrix, three more stages follow the same way, each after the last
// unit of the one before: blocks of surfaces are summed from the matrix, their
// reciprocity residuals found, and their rows divided into factors. The numbers do
// not depend on which thread took which unit (core pairRows.ts, core surfaces.ts).
import { buildEdges, type EdgeSet } from '../core/edges';
import { EdgePairs, fillRows, rowPairCount } from '../core/pairRows';
import type { CircleInput, PolygonInput } from '../core/scene';
import { SurfaceRowSummer, type SurfaceRowSums } from '../core/surfaceRows';
import { addEdgeRow, factorRows, reciprocityOfRows } from '../core/surfaces';

/** Stages of a job, in order; with no shared matrix only ROWS. */
export const ROWS = 0;
export const SUMS = 1;
export const RECIPROCITY = 2;
export const FACTORS = 3;

/** Slots of the shared control array: FAILED, then each stage's units claimed and done. */
export const FAILED = 0;
const claimedSlot = (stage: number) => 1 + 2 * stage;
export const doneSlot = (stage: number) => 2 + 2 * stage;
export const CONTROL_SLOTS = doneSlot(FACTORS) + 1;

/** What every thread gets (structured-cloned into each worker). */
export interface ThreadJob {
  /** Tells this job's messages from a late one of an earlier job. */
  id: number;
  polygons: PolygonInput[];
  circles: CircleInput[];
  /** Chunk c is rows chunkStart[c] .. chunkStart[c+1]-1. */
  chunkStart: Int32Array;
  /** Int32 slots: FAILED, each stage's claimed and done counts. */
  control: SharedArrayBuffer;
  /** The shared edge matrix (at least edges^2 doubles), or null when summing straight to surfaces. */
  matrix: SharedArrayBuffer | null;
  /** With the matrix: the surface exchange G_IJ = L_I F_IJ (surfaces^2 doubles, sketch units, not cleared), summed from it. */
  exchange: SharedArrayBuffer | null;
  /** Block b of the surface stages is surfaces surfaceStart[b] .. surfaceStart[b+1]-1. */
  surfaceStart: Int32Array;
  /** Surface lengths, sketch units. */
  surfaceLength: Float64Array;
  /** With the matrix: each surface block's largest reciprocity residual (doubles). */
  blockWorst: SharedArrayBuffer | null;
  /** With the matrix: 1 - sum_J F_IJ per surface (doubles). */
  rowSumResidual: SharedArrayBuffer | null;
  /** Surface of every edge. */
  edgeSurface: Int32Array;
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
 * Claim and compute the job's units until none is left (or a thread failed). Edge
 * rows go straight into the shared matrix, or as surface sums to `onSums`; with the
 * matrix the surface stages follow. `between` runs after every unit and every 50 ms
 * of waiting (the main thread takes in the workers' sums and failures there).
 * `edges`: the job's edges when the caller has built them already (the main thread).
 */
export function workChunks(
  job: ThreadJob,
  onSums: (sums: SurfaceRowSums) => void,
  between: () => void,
  edges: EdgeSet = buildEdges(job.polygons, job.circles),
): void {
  const control = new Int32Array(job.control);
  const pairs = new EdgePairs(edges);
  const F = job.matrix ? new Float64Array(job.matrix) : null;
  const summer = F ? null : new SurfaceRowSummer(pairs, job.edgeSurface, job.surfaceCount);
  const chunks = job.chunkStart.length - 1;
  const rowsDone = runStage(control, ROWS, chunks, between, (c) => {
    const rows = new Int32Array(job.chunkStart[c + 1] - job.chunkStart[c]);
    for (let k = 0; k < rows.length; k++) rows[k] = job.chunkStart[c] + k;
    if (F) fillRows(pairs, rows, F);
    else if (summer) onSums(summer.sum(rows));
  });
  if (rowsDone && F) surfaceStages(job, pairs.length, F, between);
}

/**
 * The surface stages over the finished edge matrix F. SUMS adds each block's edges'
 * rows into G, each surface's edges in ascending order (core aggregateToSurfaces's
 * order, so the same bits); surfaces are shared out whole, so no two threads add to
 * one row. RECIPROCITY and FACTORS then read G, and FACTORS turns it into F_IJ.
 */
function surfaceStages(job: ThreadJob, length: Float64Array, F: Float64Array, between: () => void): void {
  const control = new Int32Array(job.control);
  const S = job.edgeSurface,
    m = job.surfaceCount,
    n = S.length,
    start = job.surfaceStart;
  const blocks = start.length - 1;
  const G = new Float64Array(job.exchange!);
  // Edges by surface, ascending within each (a counting sort): surface s has order[first[s] .. first[s+1]).
  const first = new Int32Array(m + 1);
  for (let i = 0; i < n; i++) first[S[i] + 1]++;
  for (let s = 0; s < m; s++) first[s + 1] += first[s];
  const order = new Int32Array(n);
  const at = first.slice(0, m);
  for (let i = 0; i < n; i++) order[at[S[i]]++] = i;
  if (!waitForCount(control, doneSlot(ROWS), job.chunkStart.length - 1, between)) return;
  const summed = runStage(control, SUMS, blocks, between, (b) => {
    G.fill(0, start[b] * m, start[b + 1] * m); // the rows of a kept buffer hold an earlier result
    const end = first[start[b + 1]];
    for (let k = first[start[b]]; k < end; k++) addEdgeRow(order[k], n, length, F, S, m, G);
  });
  if (!summed || !waitForCount(control, doneSlot(SUMS), blocks, between)) return;
  const worst = new Float64Array(job.blockWorst!);
  const checked = runStage(control, RECIPROCITY, blocks, between, (b) => {
    worst[b] = reciprocityOfRows(G, m, start[b], start[b + 1]);
  });
  // FACTORS overwrites rows that RECIPROCITY reads in other blocks: it waits for all of them.
  if (!checked || !waitForCount(control, doneSlot(RECIPROCITY), blocks, between)) return;
  const residual = new Float64Array(job.rowSumResidual!);
  runStage(control, FACTORS, blocks, between, (b) =>
    factorRows(G, job.surfaceLength, start[b], start[b + 1], G, residual),
  );
}

/** Claim units 0 .. units-1 of a stage one at a time and do each; false when a thread failed. */
function runStage(control: Int32Array, stage: number, units: number, between: () => void, work: (u: number) => void) {
  for (;;) {
    if (Atomics.load(control, FAILED) !== 0) return false;
    const u = Atomics.add(control, claimedSlot(stage), 1);
    if (u >= units) return true;
    work(u);
    Atomics.add(control, doneSlot(stage), 1);
    Atomics.notify(control, doneSlot(stage));
    between();
  }
}

/**
 * Block until slot `slot` of the control array reaches `count` (true) or a thread
 * fails (false); `between` runs every 50 ms of waiting.
 */
function waitForCount(control: Int32Array, slot: number, count: number, between: () => void): boolean {
  for (;;) {
    if (Atomics.load(control, FAILED) !== 0) return false;
    const seen = Atomics.load(control, slot);
    if (seen >= count) return true;
    Atomics.wait(control, slot, seen, 50);
    between();
  }
}

/** Blocks of consecutive surfaces holding about edges / (threads * 8) edges each (at least one surface). */
export function surfaceBlocks(edgeSurface: ArrayLike<number>, surfaceCount: number, threads: number): Int32Array {
  const edgesOf = new Int32Array(surfaceCount);
  for (let i = 0; i < edgeSurface.length; i++) edgesOf[edgeSurface[i]]++;
  const target = Math.max(1, Math.ceil(edgeSurface.length / (threads * 8)));
  const starts = [0];
  let load = 0;
  for (let s = 0; s < surfaceCount; s++) {
    load += edgesOf[s];
    if (load >= target && s + 1 < surfaceCount) {
      starts.push(s + 1);
      load = 0;
    }
  }
  starts.push(surfaceCount);
  return Int32Array.from(starts);
}
