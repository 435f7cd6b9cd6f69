import { afterEach, describe, expect, it, vi } from 'vitest';
import {
  CANCEL_RUNNING_FROM_EDGES,
  ViewFactorClient,
  type JobOutcome,
  type RestartEvent,
} from '../../src/worker/client';
import type { ViewFactorJob } from '../../src/worker/job';
import { fakeResult, spawner } from './fakeWorker';

const job = (tag: number): ViewFactorJob => ({
  polygons: [{ kind: 'enclosure', points: Float64Array.from([tag, 0, 1, 0, 1, 1]) }],
});
const flush = () => new Promise((r) => setTimeout(r, 0));

afterEach(() => vi.useRealTimers());

describe('view-factor client', () => {
  it('runs one job at a time and keeps only the newest waiting job', async () => {
    const { workers, spawn } = spawner();
    const client = new ViewFactorClient(spawn, { timeLimitMs: 1000 });
    const w = workers[0];
    const outcomes: (JobOutcome | undefined)[] = [];
    [1, 2, 3, 4].forEach(
      (t, i) =>
        void client.run(job(t)).then((o) => {
          outcomes[i] = o;
        }),
    );
    await flush();
    expect(w.calls).toHaveLength(1); // job 1 runs; 2 and 3 were replaced by 4
    expect(outcomes[1]).toEqual({ kind: 'dropped' });
    expect(outcomes[2]).toEqual({ kind: 'dropped' });
    w.calls[0].resolve(fakeResult(w.calls[0].job));
    await flush();
    expect(outcomes[0]?.kind).toBe('done'); // one job behind is still delivered
    expect(w.calls).toHaveLength(2);
    expect(w.calls[1].job.polygons[0].points[0]).toBe(4); // the newest geometry runs next
    w.calls[1].resolve(fakeResult(w.calls[1].job));
    await flush();
    expect(outcomes[3]?.kind).toBe('done');
    expect(client.busy).toBe(false);
    client.dispose();
  });

  it('recovers from a job that throws: reports it, replaces the worker, runs the next job', async () => {
    const { workers, spawn } = spawner();
    const client = new ViewFactorClient(spawn, { timeLimitMs: 1000 });
    const first = client.run(job(1));
    const second = client.run(job(2));
    await flush();
    workers[0].calls[0].reject(new Error('index out of range'));
    expect(await first).toEqual({ kind: 'failed', reason: 'threw', message: 'index out of range' });
    expect(workers[0].terminated).toBe(true);
    expect(workers).toHaveLength(2);
    expect(client.restarts).toBe(1);
    await flush();
    expect(workers[1].calls).toHaveLength(1);
    workers[1].calls[0].resolve(fakeResult(workers[1].calls[0].job));
    expect((await second).kind).toBe('done');
    client.dispose();
  });

  it('a hung job: the worker is replaced at the time limit and the job tried once more; late answers are ignored', async () => {
    vi.useFakeTimers();
    const { workers, spawn } = spawner();
    const events: RestartEvent[] = [];
    const client = new ViewFactorClient(spawn, { timeLimitMs: 500, onRestart: (e) => events.push(e) });
    let outcome: JobOutcome | undefined;
    void client.run(job(1)).then((o) => {
      outcome = o;
    });
    await vi.advanceTimersByTimeAsync(499);
    expect(workers).toHaveLength(1);
    await vi.advanceTimersByTimeAsync(2);
    // Replaced and retried on the fresh worker; the caller has no answer yet.
    expect(workers[0].terminated).toBe(true);
    expect(workers).toHaveLength(2);
    expect(workers[1].calls).toHaveLength(1);
    expect(workers[1].calls[0].job).toBe(workers[0].calls[0].job);
    expect(outcome).toBeUndefined();
    expect(events).toEqual([expect.objectContaining({ reason: 'timeout', retrying: true })]);
    // The retry hangs too: now the job fails, and a third worker waits for the next job.
    await vi.advanceTimersByTimeAsync(501);
    expect(outcome).toMatchObject({ kind: 'failed', reason: 'timeout' });
    expect(outcome?.kind === 'failed' && outcome.message).toMatch(/failed again on a fresh worker/);
    expect(workers).toHaveLength(3);
    expect(client.restarts).toBe(2);
    expect(client.busy).toBe(false);
    // Late answers from the dead workers change nothing.
    workers[0].calls[0].resolve(fakeResult(workers[0].calls[0].job));
    workers[1].calls[0].resolve(fakeResult(workers[1].calls[0].job));
    await vi.advanceTimersByTimeAsync(1);
    expect(outcome).toMatchObject({ kind: 'failed' });
    // The new worker serves the next job.
    const next = client.run(job(5));
    await vi.advanceTimersByTimeAsync(1);
    workers[2].calls[0].resolve(fakeResult(workers[2].calls[0].job));
    expect((await next).kind).toBe('done');
    client.dispose();
  });

  it('a crashed worker is replaced and its job answered by the new one', async () => {
    const { workers, spawn } = spawner();
    const events: RestartEvent[] = [];
    const client = new ViewFactorClient(spawn, { timeLimitMs: 1000, onRestart: (e) => events.push(e) });
    const p = client.run(job(1));
    await flush();
    workers[0].die('out of memory');
    expect(workers).toHaveLength(2);
    expect(workers[0].terminated).toBe(true);
    expect(events).toEqual([{ reason: 'crashed', message: 'out of memory', retrying: true }]);
    await flush();
    expect(workers[1].calls).toHaveLength(1);
    workers[1].calls[0].resolve(fakeResult(workers[1].calls[0].job));
    const outcome = await p;
    expect(outcome.kind).toBe('done');
    expect(outcome.kind === 'done' && outcome.result.edgeLength[0]).toBe(1);
    client.dispose();
  });

  it('a job whose retry crashes too fails with a message', async () => {
    const { workers, spawn } = spawner();
    const client = new ViewFactorClient(spawn, { timeLimitMs: 1000 });
    const p = client.run(job(1));
    await flush();
    workers[0].die('out of memory');
    await flush();
    workers[1].die('out of memory');
    expect(await p).toEqual({
      kind: 'failed',
      reason: 'crashed',
      message: 'out of memory; it failed again on a fresh worker',
    });
    expect(workers).toHaveLength(3);
    client.dispose();
  });

  it('a crash while a newer job waits: the newer job runs on the new worker, the old one is dropped', async () => {
    const { workers, spawn } = spawner();
    const client = new ViewFactorClient(spawn, { timeLimitMs: 1000 });
    const old = client.run(job(1));
    const newer = client.run(job(2));
    await flush();
    workers[0].die('killed');
    expect(await old).toEqual({ kind: 'dropped' });
    await flush();
    expect(workers[1].calls.map((c) => c.job.polygons[0].points[0])).toEqual([2]);
    workers[1].calls[0].resolve(fakeResult(workers[1].calls[0].job));
    expect((await newer).kind).toBe('done');
    client.dispose();
  });

  it('a worker that dies while idle is replaced before it is given a job', async () => {
    const { workers, spawn } = spawner();
    const events: RestartEvent[] = [];
    const client = new ViewFactorClient(spawn, { timeLimitMs: 1000, onRestart: (e) => events.push(e) });
    workers[0].die('renderer process gone');
    expect(workers).toHaveLength(2);
    expect(events).toEqual([{ reason: 'crashed', message: 'renderer process gone', retrying: false }]);
    const p = client.run(job(3));
    await flush();
    expect(workers[0].calls).toHaveLength(0);
    workers[1].calls[0].resolve(fakeResult(workers[1].calls[0].job));
    expect((await p).kind).toBe('done');
    client.dispose();
  });

  it('a compute that throws synchronously fails the job instead of the caller', async () => {
    const client = new ViewFactorClient(
      () => ({
        compute: () => {
          throw new Error('boom');
        },
        terminate: () => {},
      }),
      { timeLimitMs: 1000 },
    );
    expect(await client.run(job(1))).toMatchObject({ kind: 'failed', reason: 'threw', message: 'boom' });
    client.dispose();
  });

  it('a big running job is cancelled on every worker when a newer one arrives; the newer one runs on fresh workers', async () => {
    const { workers, spawn } = spawner();
    const events: RestartEvent[] = [];
    const client = new ViewFactorClient(spawn, { timeLimitMs: 1000, onRestart: (e) => events.push(e) });
    const n = CANCEL_RUNNING_FROM_EDGES;
    const big = (tag: number): ViewFactorJob => ({
      polygons: [{ kind: 'enclosure', points: Float64Array.from({ length: 2 * n }, (_, k) => (k === 0 ? tag : k)) }],
    });
    const first = client.run(big(1));
    await flush();
    expect(workers[0].calls).toHaveLength(1);
    const second = client.run(big(2));
    expect(await first).toEqual({ kind: 'dropped' });
    expect(workers[0].terminated).toBe(true);
    await flush();
    expect(workers[1].calls.map((c) => c.job.polygons[0].points[0])).toEqual([2]);
    // A late answer from the ended workers changes nothing; a cancel is no failure.
    workers[0].calls[0].resolve(fakeResult(workers[0].calls[0].job));
    workers[1].calls[0].resolve(fakeResult(workers[1].calls[0].job));
    const outcome = await second;
    expect(outcome.kind === 'done' && outcome.result.edgeLength[0]).toBe(2);
    expect(client.restarts).toBe(0);
    expect(events).toEqual([]);
    client.dispose();
  });
});
