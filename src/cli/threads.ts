// View factors over worker threads for the command line. The commands are
// synchronous, so the main thread takes chunks of rows itself and then waits on
// a shared counter (Atomics.wait) while the workers finish; edge rows go into one
// shared matrix, surface sums come back over ports read without an event loop
// (receiveMessageOnPort). With the matrix, the threads then sum it to surfaces,
// each taking whole surfaces. Results are the same bit for bit for any thread count.
import { availableParallelism } from 'node:os';
import { MessageChannel, receiveMessageOnPort, Worker, type MessagePort } from 'node:worker_threads';
import { buildEdges, allEdgeLengths, sceneEdgeCount, totalEdgeCount } from '../core/edges';
import type { SceneInput, ViewFactorResult } from '../core/scene';
import { surfaceLengths } from '../core/surfaces';
import { SurfaceAccumulator, surfaceFactorsFromPairs, type SurfaceRowSums } from '../core/surfaceRows';
import { EdgePairs } from '../core/pairRows';
import { computeViewFactors, edgeMatrixFits } from '../core/viewFactors';
import {
  CONTROL_SLOTS,
  doneSlot,
  FACTORS,
  FAILED,
  rowChunks,
  ROWS,
  surfaceBlocks,
  workChunks,
  type ThreadJob,
} from './threadWork';

/** Most threads accepted by --threads. */
export const MAX_THREADS = 256;

/**
 * Without --threads, sketches with fewer pairs than this (about 4000 edges) run
 * in-process. A new worker thread compiles its modules and runs its first rows
 * unoptimised: its first job cost 0.6-0.8 s more than it saved. Measured one-shot
 * (`factors`, 2 cores, 24 surfaces): 2052 edges 1.65 s on one thread and 1.89 s
 * on two, 3052 edges 1.81 and 1.99 s, 4052 edges 2.41 and 2.15 s. Warm, from the
 * third job of a study on, two threads took half the time at 2052 edges and
 * 4052 edges alike: a long study of a smaller sketch gains from --threads.
 */
export const THREADS_FROM_PAIRS = 8_000_000;

/** How long the main thread waits without any chunk finishing before it gives up on the workers, ms. */
const STALL_MS = 300_000;

export const THREADS_HELP = `  --threads N  worker threads for the view factors (default: one per core,
               ${availableParallelism()} here; 1 computes in-process). Sketches under about 4000
               edges run in-process unless --threads is given (threads take
               about a second to start; a study of many cases gains from them
               sooner). Any N gives the same numbers, bit for bit.`;

/** Read a --threads value: a whole number from 1 to MAX_THREADS, or a problem. */
export function parseThreads(text: string | undefined): number | string {
  if (text === undefined) return '--threads needs a number';
  const n = Number(text);
  if (!/^\d+$/.test(text.trim()) || !Number.isInteger(n) || n < 1 || n > MAX_THREADS)
    return `--threads needs a whole number from 1 to ${MAX_THREADS} (got '${text.slice(0, 40)}')`;
  return n;
}

/**
 * Threads the view factors of `scene` run on: `threads` when given, else one per
 * core from THREADS_FROM_PAIRS pairs on and 1 (in-process) below.
 */
export function threadsFor(scene: SceneInput, threads?: number): number {
  if (threads !== undefined) return threads;
  const n = sceneEdgeCount(scene.polygons, scene.circles);
  return (n * (n + 1)) / 2 >= THREADS_FROM_PAIRS ? availableParallelism() : 1;
}

/**
 * Surface view factors of a scene (as core computeViewFactors), with the pairs
 * shared over `threads` threads (the main thread one of them). `threads` undefined:
 * one per core for sketches of at least THREADS_FROM_PAIRS pairs, else in-process.
 * Past the edge-matrix budget (or with `sumToSurfaces`, for tests) the threads sum
 * straight to surfaces. `workersOnly` (tests): the main thread only waits, so
 * `threads` workers do every chunk. `reuse`: an earlier result the caller is done
 * with; its F is written over when it has this sketch's size (a study's cases).
 */
export function threadedViewFactors(
  scene: SceneInput,
  threads?: number,
  options: { sumToSurfaces?: boolean; workersOnly?: boolean; reuse?: ViewFactorResult } = {},
): ViewFactorResult {
  const edges = buildEdges(scene.polygons, scene.circles);
  const n = totalEdgeCount(edges);
  const count = threadsFor(scene, threads);
  if (scene.edgeSurface.length !== n)
    throw new Error(`edgeSurface has ${scene.edgeSurface.length} entries for ${n} edges`);
  const summed = options.sumToSurfaces === true || !edgeMatrixFits(n);
  if (count <= 1 || n < 2) {
    // edgeViewFactors clears the part of the kept matrix it uses.
    if (!summed)
      return computeViewFactors(scene, {
        edgeMatrix: new Float64Array(keptMatrix(n), 0, n * n),
        surfaceMatrix: options.reuse?.F,
      });
    return surfaceFactorsFromPairs(new EdgePairs(edges), scene.edgeSurface, scene.surfaceCount, edges.hasEnclosure);
  }
  const length = allEdgeLengths(edges);
  // Checks every edge's surface before any thread adds to a surface row.
  const surfaceLength = surfaceLengths(length, scene.edgeSurface, scene.surfaceCount);
  const chunkStart = rowChunks(n, count);
  const m = scene.surfaceCount;
  const surfaceStart = surfaceBlocks(scene.edgeSurface, m, count);
  const job: ThreadJob = {
    id: nextJobId++,
    polygons: scene.polygons.map((p) => ({ kind: p.kind, points: Float64Array.from(p.points) })),
    circles: (scene.circles ?? []).map((c) => ({ ...c })),
    chunkStart,
    control: new SharedArrayBuffer(4 * CONTROL_SLOTS),
    matrix: summed ? null : clearedMatrix(n),
    exchange: summed ? null : sharedSurfaceMatrix(m, options.reuse),
    surfaceStart,
    surfaceLength,
    blockWorst: summed ? null : new SharedArrayBuffer(8 * (surfaceStart.length - 1)),
    rowSumResidual: summed ? null : new SharedArrayBuffer(8 * m),
    edgeSurface: Int32Array.from(scene.edgeSurface),
    surfaceCount: m,
  };
  const acc = summed ? new SurfaceAccumulator(length, scene.edgeSurface, m) : null;
  const workers = helpers(Math.min(count, chunkStart.length - 1) - (options.workersOnly ? 0 : 1));
  for (const w of workers) w.port.postMessage({ job });
  try {
    const takeIn = () => {
      for (const w of workers) drain(w.port, job.id, acc);
    };
    if (!options.workersOnly) workChunks(job, (sums) => acc?.add(sums), takeIn, edges);
    waitForChunks(job, doneSlot(ROWS), chunkStart.length - 1, takeIn);
    if (!summed) waitForChunks(job, doneSlot(FACTORS), surfaceStart.length - 1, takeIn);
    takeIn();
  } catch (error) {
    // A thread that failed or stalled may hold broken state: start afresh next time.
    endThreads();
    throw error;
  }
  if (acc) return acc.result(edges.hasEnclosure);
  // The threads turned G into F in place (core surfaceResult's steps, by blocks): the
  // result's arrays are the shared memory they wrote, not copies of surfaces^2 doubles.
  let reciprocityResidual = 0;
  for (const w of new Float64Array(job.blockWorst!)) reciprocityResidual = Math.max(reciprocityResidual, w);
  return {
    edgeCount: n,
    surfaceCount: m,
    edgeLength: length,
    surfaceLength,
    F: new Float64Array(job.exchange!),
    rowSumResidual: new Float64Array(job.rowSumResidual!),
    reciprocityResidual,
    closed: edges.hasEnclosure,
  };
}

/** The edge matrix kept between jobs, one thread's or many (see keptMatrix); dropped by endThreads. */
let kept: SharedArrayBuffer | null = null;

/**
 * A shared buffer for an n x n edge matrix (at least n^2 doubles, not cleared),
 * the last one again when it is big enough: each job reads its matrix to the end
 * before the next begins. Measured at 1600 edges on 2 cores: a fresh 20 MB buffer
 * per job took up to 50 ms to fault in, and each one freed set off a full
 * collection whose background threads took a core from the rows, so that two
 * threads ran no faster than one.
 */
function keptMatrix(n: number): SharedArrayBuffer {
  const bytes = 8 * n * n;
  if (kept === null || kept.byteLength < bytes) kept = new SharedArrayBuffer(bytes);
  return kept;
}

/** keptMatrix with its first n^2 doubles cleared (the rows write only pairs that exchange). */
function clearedMatrix(n: number): SharedArrayBuffer {
  const buffer = keptMatrix(n);
  new Float64Array(buffer, 0, n * n).fill(0);
  return buffer;
}

/**
 * Shared memory for the m x m surface factors (the threads clear what they use): the
 * buffer of `reuse`'s F when it is exactly that, else fresh. Measured at 1600
 * surfaces on 2 cores: two threads faulting in a fresh 20 MB took 35 ms each, as
 * long as the whole surface stage took one thread.
 */
function sharedSurfaceMatrix(m: number, reuse: ViewFactorResult | undefined): SharedArrayBuffer {
  const F = reuse?.F;
  if (F && F.buffer instanceof SharedArrayBuffer && F.byteOffset === 0 && F.buffer.byteLength === 8 * m * m)
    return F.buffer;
  return new SharedArrayBuffer(8 * m * m);
}

/**
 * Worker threads kept between jobs in this process (a command that computes
 * several sketches, or the tests, pays the start-up once); unreferenced, so
 * they never keep the process alive.
 */
const threads: { worker: Worker; port: MessagePort }[] = [];
let nextJobId = 1;

function helpers(count: number): { worker: Worker; port: MessagePort }[] {
  while (threads.length < count) {
    const { port1, port2 } = new MessageChannel();
    // execArgv []: the boot file registers tsx itself; inheriting the parent's loader flags would register it twice.
    const worker = new Worker(new URL('./threadBoot.mjs', import.meta.url), {
      workerData: { port: port2 },
      transferList: [port2],
      execArgv: [],
    });
    worker.unref();
    port1.unref();
    threads.push({ worker, port: port1 });
  }
  return threads.slice(0, Math.max(0, count));
}

/** End every kept worker thread. */
export function endThreads(): void {
  kept = null;
  for (const t of threads.splice(0)) {
    t.port.close();
    void t.worker.terminate();
  }
}

/** Take in every message waiting on a worker's port for this job: surface sums, or a failure (thrown here). */
function drain(port: MessagePort, id: number, acc: SurfaceAccumulator | null): void {
  for (let m = receiveMessageOnPort(port); m; m = receiveMessageOnPort(port)) {
    const message = m.message as { id: number; sums?: SurfaceRowSums; error?: string };
    if (message.id !== id) continue; // a late word about an earlier job
    if (message.error !== undefined) throw new Error(`a view-factor thread failed: ${message.error}`);
    if (message.sums && acc) acc.add(message.sums);
  }
}

/** Block until slot `slot` of the job's control counts `count` (chunks or surface blocks), taking in sums as they come; fail on a failed or stalled thread. */
function waitForChunks(job: ThreadJob, slot: number, count: number, takeIn: () => void): void {
  const control = new Int32Array(job.control);
  let seen = Atomics.load(control, slot);
  let since = Date.now();
  while (seen < count) {
    if (Atomics.load(control, FAILED) !== 0) {
      takeIn(); // throws with the thread's message
      throw new Error('a view-factor thread failed');
    }
    Atomics.wait(control, slot, seen, 500);
    takeIn();
    const now = Atomics.load(control, slot);
    if (now !== seen) {
      seen = now;
      since = Date.now();
    } else if (Date.now() - since > STALL_MS) {
      throw new Error(`no view-factor thread finished any work for ${STALL_MS / 1000} s`);
    }
  }
}

/** The --threads option for a command's own-option reader (args.ts OwnOption): sets `into.threads`. */
export function threadsOption(
  arg: string,
  takeNext: () => string | undefined,
  into: { threads?: number },
): string | null | undefined {
  if (arg !== '--threads' && !arg.startsWith('--threads=')) return undefined;
  const value = parseThreads(arg === '--threads' ? takeNext() : arg.slice('--threads='.length));
  if (typeof value === 'string') return value;
  into.threads = value;
  return null;
}
