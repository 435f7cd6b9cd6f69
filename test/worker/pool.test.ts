// The worker pool: rows shared over 1-4 workers behind real message channels give
// the one-thread answer bit for bit; a failing part fails the job and the client
// replaces the whole pool (every worker ended), then retries on a fresh one.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as Comlink from 'comlink';
import { MessageChannel } from 'node:worker_threads';
import nodeEndpoint from 'comlink/dist/esm/node-adapter';
import { viewFactorApi, computeEdgeViewFactors } from '../../src/worker/api';
import { ViewFactorClient } from '../../src/worker/client';
import {
  isSurfaceAnswer,
  jobFromPolygons,
  type RowsAnswer,
  type ViewFactorApi,
  type ViewFactorJob,
} from '../../src/worker/job';
import {
  MAX_POOL_SIZE,
  PAGE_BUDGET_MS,
  PAGE_MAX_PAIRS,
  poolHandle,
  poolSize,
  runsOnPage,
  workersForJob,
  type RowWorker,
} from '../../src/worker/pool';
import { aggregateToSurfaces } from '../../src/core/surfaces';
import { mixedSceneArb, edgeCountOf } from '../core/arc/arbitraries';
import { edgeMatrixOf } from './edgeMatrix';

const bytes = (a: Float64Array) => new Uint8Array(a.buffer, a.byteOffset, a.byteLength);
const flush = () => new Promise((r) => setTimeout(r, 0));

/** `count` workers, each the real api behind its own channel. */
function channelPool(count: number) {
  const ports: { close(): void }[] = [];
  const workers: RowWorker[] = Array.from({ length: count }, () => {
    const { port1, port2 } = new MessageChannel();
    ports.push(port1, port2);
    Comlink.expose(viewFactorApi, nodeEndpoint(port1));
    const remote = Comlink.wrap<ViewFactorApi>(nodeEndpoint(port2));
    return { computeRows: (job, rows) => remote.computeRows(job, rows), terminate: () => {} };
  });
  return { handle: poolHandle(workers, 1), close: () => ports.forEach((p) => p.close()) };
}

/** Surfaces numbered per shape (each polygon and each circle one surface). */
function perShape(job: ViewFactorJob) {
  const edgeSurface: number[] = [];
  job.polygons.forEach((p, k) => {
    for (let e = 0; e < p.points.length / 2; e++) edgeSurface.push(k);
  });
  (job.circles ?? []).forEach((c, k) => {
    for (let a = 0; a < c.arcs; a++) edgeSurface.push(job.polygons.length + k);
  });
  return { edgeSurface: Int32Array.from(edgeSurface), count: job.polygons.length + (job.circles ?? []).length };
}

describe('view-factor pool', () => {
  it('1 to 4 workers over real channels: edge matrix and surface sums identical to one thread, bit for bit', async () => {
    const scenes = fc.sample(mixedSceneArb, { numRuns: 8, seed: 1313 }).filter((s) => edgeCountOf(s) >= 8);
    expect(scenes.length).toBeGreaterThan(3);
    for (const scene of scenes) {
      const job = jobFromPolygons(scene.polygons, scene.circles);
      const single = computeEdgeViewFactors(job);
      if (isSurfaceAnswer(single)) throw new Error('expected edge factors');
      const surfaces = perShape(job);
      const summedJob = { ...job, surfaces };
      const sums: Float64Array[] = [];
      for (const count of [1, 2, 3, 4]) {
        const { handle, close } = channelPool(count);
        // Every worker takes part (at least one pair per worker here).
        const r = await handle.compute(job);
        const s = await handle.compute(summedJob);
        close();
        if (isSurfaceAnswer(r) || !isSurfaceAnswer(s)) throw new Error('wrong kind of answer');
        expect(bytes(edgeMatrixOf(r))).toEqual(bytes(edgeMatrixOf(single)));
        expect(bytes(r.edgeLength)).toEqual(bytes(single.edgeLength));
        sums.push(s.exchange);
      }
      for (const s of sums) expect(bytes(s)).toEqual(bytes(sums[0]));
      // Against the edge-matrix path: the same positive terms summed in another order.
      const m = surfaces.count;
      const viaMatrix = aggregateToSurfaces(
        single.edgeCount,
        single.edgeLength,
        edgeMatrixOf(single),
        surfaces.edgeSurface,
        m,
        true,
      );
      const lengths = viaMatrix.surfaceLength;
      for (let k = 0; k < m * m; k++) {
        const a = sums[0][k],
          b = viaMatrix.F[k] * lengths[Math.floor(k / m)];
        expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-13 * Math.max(Math.abs(a), Math.abs(b)));
      }
    }
  });

  it('shares every row when the job is big enough, one worker for a tiny one', () => {
    expect(workersForJob(4, 4)).toBe(1);
    expect(workersForJob(152, 4)).toBe(2); // 11,628 pairs: two parts of at least 4096
    expect(workersForJob(1000, 4)).toBe(4);
    expect(workersForJob(1000, 1)).toBe(1);
    expect(poolSize(undefined)).toBe(1);
    expect(poolSize(0)).toBe(1);
    expect(poolSize(6)).toBe(6);
    expect(poolSize(256)).toBe(MAX_POOL_SIZE);
    // A job posted during a gesture leaves one worker to spare, never the last one.
    expect(workersForJob(1000, 4, undefined, true)).toBe(3);
    expect(workersForJob(1000, 2, undefined, true)).toBe(1);
    expect(workersForJob(1000, 1, undefined, true)).toBe(1);
    // Past what one worker keeps for the next drag step (MAX_KEPT_PAIRS): every worker, as for any job.
    expect(workersForJob(4095, 2, undefined, true)).toBe(1); // 8,386,560 pairs: kept
    expect(workersForJob(4096, 2, undefined, true)).toBe(2); // 8,390,656 pairs: not kept
  });

  it('a job posted during a gesture leaves one worker idle and gives the same bits as one shared by all', async () => {
    const calls: number[] = [];
    const workers: RowWorker[] = [0, 1, 2].map((w) => ({
      computeRows: (job, rows) => {
        calls.push(w);
        return Promise.resolve(viewFactorApi.computeRows(job, rows) as RowsAnswer);
      },
      terminate: () => {},
    }));
    const handle = poolHandle(workers, 1);
    const points = [0, 0, 4, 0, 4, 1, 2, 2, 0, 1];
    const shared = await handle.compute(jobFromPolygons([{ kind: 'enclosure', points }]));
    expect(calls).toEqual([0, 1, 2]);
    calls.length = 0;
    const spared = await handle.compute({ ...jobFromPolygons([{ kind: 'enclosure', points }]), duringGesture: true });
    expect(calls).toEqual([0, 1]);
    if (isSurfaceAnswer(shared) || isSurfaceAnswer(spared)) throw new Error('expected edge factors');
    expect(bytes(edgeMatrixOf(spared))).toEqual(bytes(edgeMatrixOf(shared)));
  });

  it('a part that fails fails the job; the client ends every worker of the pool and retries a crash on a fresh pool', async () => {
    const ended: number[] = [];
    const crashes: ((m: string) => void)[] = [];
    let started = 0;
    const pending: { resolve: (r: RowsAnswer) => void; job: ViewFactorJob; rows: Int32Array; id: number }[] = [];
    const spawnPool = () =>
      poolHandle(
        [0, 1, 2].map(() => {
          const id = started++;
          return {
            computeRows: (job: ViewFactorJob, rows: Int32Array) =>
              new Promise<RowsAnswer>((resolve) => pending.push({ resolve, job, rows, id })),
            terminate: () => ended.push(id),
            onCrash: (l: (m: string) => void) => crashes.push(l),
          };
        }),
        1,
      );
    const client = new ViewFactorClient(spawnPool, { timeLimitMs: 1000 });
    // A 40-edge ring, shared by all three workers (one pair per worker is enough here).
    const ring = Array.from({ length: 80 }, (_, k) =>
      k % 2 === 0 ? Math.cos((Math.PI * k) / 40) : Math.sin((Math.PI * (k - 1)) / 40),
    );
    const job = jobFromPolygons([{ kind: 'enclosure', points: ring }]);
    const outcome = client.run(job);
    await flush();
    expect(pending.map((p) => p.id)).toEqual([0, 1, 2]);
    // Worker 1 of the pool dies mid-job: the whole pool is ended, a fresh one retries the job.
    crashes[1]('worker 1 ran out of memory');
    expect(ended.sort()).toEqual([0, 1, 2]);
    await flush();
    const retry = pending.filter((p) => p.id >= 3);
    expect(retry.map((p) => p.id)).toEqual([3, 4, 5]);
    // The fresh pool answers with the real rows.
    for (const p of retry) p.resolve(viewFactorApi.computeRows(p.job, p.rows) as RowsAnswer);
    const done = await outcome;
    expect(done.kind).toBe('done');
    const single = computeEdgeViewFactors(job);
    if (done.kind !== 'done' || isSurfaceAnswer(done.result) || isSurfaceAnswer(single)) throw new Error('no matrix');
    expect(bytes(edgeMatrixOf(done.result))).toEqual(bytes(edgeMatrixOf(single)));
    client.dispose();
    expect(ended.sort((a, b) => a - b)).toEqual([0, 1, 2, 3, 4, 5]);
  });

  it('hands each part of an answer back to the worker that computed it', async () => {
    const handed: { worker: number; lengths: number[] }[] = [];
    const workers: RowWorker[] = [0, 1, 2].map((w) => ({
      computeRows: (job, rows) => Promise.resolve(viewFactorApi.computeRows(job, rows) as RowsAnswer),
      recycle: (buffers) => handed.push({ worker: w, lengths: buffers.map((b) => b.length) }),
      terminate: () => {},
    }));
    const handle = poolHandle(workers, 1);
    const job = jobFromPolygons([{ kind: 'enclosure', points: [0, 0, 4, 0, 4, 1, 2, 2, 0, 1] }]);
    const answer = await handle.compute(job);
    if (isSurfaceAnswer(answer)) throw new Error('expected edge factors');
    expect(answer.rows.packed).toHaveLength(3);
    handle.recycle?.(answer);
    expect(handed).toEqual(answer.rows.packed.map((p, k) => ({ worker: k, lengths: [p.length] })));
  });

  it('computes a small, cheap job on the page, the same bits as the workers, once a job of its shapes was cheap; its buffers go back to the page', async () => {
    const calls: string[] = [];
    const handed: string[] = [];
    // `cost`: ms each fake part reports, as a worker's API (the page's too) times its rows.
    const worker = (name: string, cost: () => number): RowWorker => ({
      computeRows: (job, rows) => {
        calls.push(name);
        return Promise.resolve({ ...(viewFactorApi.computeRows(job, rows) as RowsAnswer), elapsedMs: cost() });
      },
      recycle: () => handed.push(name),
      terminate: () => {},
    });
    let workerCost = 1;
    let pageCost = 0;
    const page = worker('page', () => pageCost);
    const handle = poolHandle([worker('worker 0', () => workerCost), worker('worker 1', () => workerCost)], 1, page);
    const duct = (y: number) => jobFromPolygons([{ kind: 'enclosure', points: [0, 0, 4, 0, 4, 1, 2, y, 0, 1] }]);
    const single = computeEdgeViewFactors(duct(2.1));
    if (isSurfaceAnswer(single)) throw new Error('expected edge factors');
    expect(runsOnPage(duct(2))).toBe(true);
    // New shapes: the workers first (their cost is not known yet).
    await handle.compute(duct(2));
    expect(calls).toEqual(['worker 0', 'worker 1']);
    // The same shapes moved, after a cheap job: on the page, all rows in one part, the same bits.
    calls.length = 0;
    const answer = await handle.compute(duct(2.1));
    if (isSurfaceAnswer(answer)) throw new Error('expected edge factors');
    expect(calls).toEqual(['page']);
    expect(answer.rows.packed).toHaveLength(1);
    expect(bytes(edgeMatrixOf(answer))).toEqual(bytes(edgeMatrixOf(single)));
    handle.recycle?.(answer);
    expect(handed).toEqual(['page']);
    // A page job over the budget sends the next one back to the workers, and they keep
    // it while their jobs cost more than the budget; a cheap one brings the next back.
    pageCost = PAGE_BUDGET_MS + 2;
    workerCost = PAGE_BUDGET_MS + 1;
    calls.length = 0;
    for (const y of [2.2, 2.3, 2.4]) await handle.compute(duct(y));
    expect(calls).toEqual(['page', 'worker 0', 'worker 1', 'worker 0', 'worker 1']);
    pageCost = 0;
    workerCost = 1;
    calls.length = 0;
    for (const y of [2.5, 2.6]) await handle.compute(duct(y));
    expect(calls).toEqual(['worker 0', 'worker 1', 'page']);
    // Other shapes (a point added): the workers first again.
    calls.length = 0;
    await handle.compute(jobFromPolygons([{ kind: 'enclosure', points: [0, 0, 4, 0, 4, 1, 3, 2, 1, 2, 0, 1] }]));
    expect(calls).toEqual(['worker 0', 'worker 1']);
    // Past PAGE_MAX_PAIRS (a 200-gon: 20 100 pairs) never on the page, however cheap.
    const ring = Array.from({ length: 200 }, (_, k) => [
      Math.cos((2 * Math.PI * k) / 200),
      Math.sin((2 * Math.PI * k) / 200),
    ]);
    const big = jobFromPolygons([{ kind: 'enclosure', points: ring.flat() }]);
    expect(runsOnPage(big)).toBe(false);
    calls.length = 0;
    await handle.compute(big);
    await handle.compute(big);
    expect(calls.filter((c) => c === 'page')).toEqual([]);
  });

  it('runs on the page only edge jobs of at most PAGE_MAX_PAIRS pairs, never surface sums', () => {
    const square = (x: number, y: number) => [x, y, x + 0.1, y, x + 0.1, y + 0.1, x, y + 0.1];
    const box = { kind: 'enclosure' as const, points: [0, 0, 10, 0, 10, 4, 0, 4] };
    // 4 + 4k edges: the largest k whose pairs n(n + 1)/2 fit PAGE_MAX_PAIRS, and one more square.
    let k = 0;
    while (((8 + 4 * k) * (9 + 4 * k)) / 2 <= PAGE_MAX_PAIRS) k++;
    const solids = (m: number) =>
      Array.from({ length: m }, (_, t) => ({
        kind: 'solid' as const,
        points: square(0.2 + 0.3 * (t % 30), 0.2 + 0.3 * Math.floor(t / 30)),
      }));
    expect(runsOnPage(jobFromPolygons([box, ...solids(k)]))).toBe(true);
    expect(runsOnPage(jobFromPolygons([box, ...solids(k + 1)]))).toBe(false);
    const summed = { ...jobFromPolygons([box]), surfaces: { edgeSurface: Int32Array.from([0, 0, 0, 0]), count: 1 } };
    expect(runsOnPage(summed)).toBe(false);
  });
});
