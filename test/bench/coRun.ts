// How much two threads can gain on this machine right now, whatever our code does:
// one thread computes an edge matrix alone, then every core computes its own copy at
// the same moment (one thread each, nothing shared). On a machine whose cores run
// independently each copy takes as long as the lone one; measured here, two copies
// side by side took 1.0-1.5 times as long, by the minute (memory-bound code on cores
// that share caches on the host). The ceiling of the speed-up is cores x alone / together.
import { Worker } from 'node:worker_threads';
import { buildEdges, totalEdgeCount } from '../../src/core/edges';
import type { SceneInput } from '../../src/core/scene';
import { edgeViewFactors } from '../../src/core/viewFactors';

/** What each thread of the check gets: the scene, its rounds, and the shared signals and times. */
export interface CoRunJob {
  scene: SceneInput;
  rounds: number;
  /** Int32 slots: threads ready, start (0 or 1), threads done. */
  control: SharedArrayBuffer;
  /** Times in ms, `rounds` per thread, thread k from k * rounds. */
  times: SharedArrayBuffer;
  /** This thread's index (0 is the main thread). */
  index: number;
}

const READY = 0,
  START = 1,
  DONE = 2;

/**
 * Warm up (untimed runs), then `whenWarm` (a worker says ready and waits for the
 * start; the main thread waits for the workers and gives it), then time `rounds`
 * edge matrices into the job's slots.
 */
export function coRunLoop(job: CoRunJob, whenWarm: (control: Int32Array) => void = workerReady): void {
  const control = new Int32Array(job.control);
  const times = new Float64Array(job.times);
  const edges = buildEdges(job.scene.polygons, job.scene.circles);
  const n = totalEdgeCount(edges);
  const matrix = new Float64Array(n * n);
  for (let w = 0; w < 5; w++) edgeViewFactors(edges, { edgeMatrix: matrix });
  whenWarm(control);
  for (let r = 0; r < job.rounds; r++) {
    const t0 = performance.now();
    edgeViewFactors(edges, { edgeMatrix: matrix });
    times[job.index * job.rounds + r] = performance.now() - t0;
  }
  Atomics.add(control, DONE, 1);
  Atomics.notify(control, DONE);
}

function workerReady(control: Int32Array): void {
  Atomics.add(control, READY, 1);
  Atomics.notify(control, READY);
  while (Atomics.load(control, START) === 0) Atomics.wait(control, START, 0, 1000);
}

const median = (a: ArrayLike<number>) => Array.from(a).sort((x, y) => x - y)[a.length >> 1];

/** Block until slot `slot` counts `count`; throws after `ms` without progress. */
function waitFor(control: Int32Array, slot: number, count: number, ms: number): void {
  const until = Date.now() + ms;
  for (let seen = Atomics.load(control, slot); seen < count; seen = Atomics.load(control, slot)) {
    if (Date.now() > until) throw new Error('co-run check: a thread did not answer');
    Atomics.wait(control, slot, seen, 1000);
  }
}

/**
 * The lone median (ms), each thread's median when all `threads` run at once, and the
 * ceiling threads x alone / mean(together) of any speed-up over `threads` threads now.
 */
export function coRunCeiling(
  scene: SceneInput,
  threads: number,
  rounds: number,
): { alone: number; together: number[]; ceiling: number } {
  const lone: number[] = [];
  const edges = buildEdges(scene.polygons, scene.circles);
  const n = totalEdgeCount(edges);
  const matrix = new Float64Array(n * n);
  for (let w = 0; w < 3; w++) edgeViewFactors(edges, { edgeMatrix: matrix });
  for (let r = 0; r < rounds; r++) {
    const t0 = performance.now();
    edgeViewFactors(edges, { edgeMatrix: matrix });
    lone.push(performance.now() - t0);
  }
  const control = new SharedArrayBuffer(4 * 3),
    times = new SharedArrayBuffer(8 * rounds * threads);
  const job = (index: number): CoRunJob => ({ scene, rounds, control, times, index });
  const workers = Array.from(
    { length: threads - 1 },
    (_, k) => new Worker(new URL('./coRunBoot.mjs', import.meta.url), { workerData: job(k + 1), execArgv: [] }),
  );
  try {
    coRunLoop(job(0), (signals) => {
      waitFor(signals, READY, threads - 1, 120_000);
      Atomics.store(signals, START, 1);
      Atomics.notify(signals, START);
    });
    waitFor(new Int32Array(control), DONE, threads, 120_000);
  } finally {
    for (const w of workers) void w.terminate();
  }
  const all = new Float64Array(times);
  const together = Array.from({ length: threads }, (_, k) => median(all.subarray(k * rounds, (k + 1) * rounds)));
  const alone = median(lone);
  const mean = together.reduce((s, t) => s + t, 0) / threads;
  return { alone, together, ceiling: (threads * alone) / mean };
}
