// Study workers kept from one study to the next (src/state/study/idleWorkers.ts), and
// which workers of a shared sweep are kept when it ends (shares.ts).
import { afterEach, describe, expect, it, vi } from 'vitest';
import { restore } from '../../src/document';
import type { StudyReply } from '../../src/state/study';
import { IdleWorkers } from '../../src/state/study/idleWorkers';
import { startShares, type StudyWorker } from '../../src/state/study/shares';
import { kiln } from '../cli/studyHelpers';
import { StandInWorker } from './studyStandIn';

afterEach(() => {
  vi.useRealTimers();
});

describe('IdleWorkers', () => {
  it('hands back the worker kept last, keeps at most `most`, and ends each after its time', () => {
    vi.useFakeTimers();
    const made: StandInWorker[] = [];
    const pool = new IdleWorkers(
      () => {
        const w = new StandInWorker();
        made.push(w);
        return w;
      },
      2,
      1000,
    );
    const a = pool.take(),
      b = pool.take(),
      c = pool.take();
    expect(made).toHaveLength(3);
    a.onmessage = () => {};
    pool.giveBack(a);
    expect(a.onmessage).toBeNull(); // no study's handler stays on a kept worker
    pool.giveBack(b);
    pool.giveBack(c); // past `most`: the oldest kept (a) is ended
    expect(pool.size).toBe(2);
    expect((a as StandInWorker).terminated).toBe(true);
    expect(pool.take()).toBe(c);
    expect(made).toHaveLength(3); // taken from the kept ones, none made
    vi.advanceTimersByTime(999);
    expect((b as StandInWorker).terminated).toBe(false);
    vi.advanceTimersByTime(1);
    expect((b as StandInWorker).terminated).toBe(true);
    expect(pool.size).toBe(0);
    expect((c as StandInWorker).terminated).toBe(false); // taken before its time ran out
  });
});

describe('a shared sweep gives back the workers that answered', () => {
  const read = restore(kiln());
  if (!read.ok) throw new Error('kiln');
  const sweep = (from: number, to: number, steps: number) =>
    ({ kind: 'sweep', sketch: read.sketch, address: 'ware stack.2.x', from, to, steps }) as const;

  it('every worker of a finished sweep, none ended', async () => {
    const workers: StandInWorker[] = [];
    const given: StudyWorker[] = [];
    const finals: StudyReply[] = [];
    startShares(
      sweep(1.2, 1.8, 6),
      3,
      (r) => r.kind !== 'progress' && finals.push(r),
      () => {
        const w = new StandInWorker();
        workers.push(w);
        return w;
      },
      (w) => given.push(w),
    );
    await new Promise((resolve) => setTimeout(resolve, 100));
    expect(finals).toHaveLength(1);
    expect(given).toEqual(workers);
    expect(workers.some((w) => w.terminated)).toBe(false);
  });

  it('after an early refusal: the share that answered is given back, the slow one still working is ended', async () => {
    // x = 2.6 (the first value) pushes the ware stack through the wall: share 0 refuses at once.
    const workers: StandInWorker[] = [];
    const given: StudyWorker[] = [];
    startShares(
      sweep(2.6, 1.0, 5),
      2,
      () => {},
      () => {
        const w = new StandInWorker(workers.length === 0 ? 0 : 2000);
        workers.push(w);
        return w;
      },
      (w) => given.push(w),
    );
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect(given).toEqual([workers[0]]);
    expect(workers[0].terminated).toBe(false);
    expect(workers[1].terminated).toBe(true);
  });
});
