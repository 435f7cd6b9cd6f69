import { describe, expect, it } from 'vitest';
import { restore } from '../../src/document';
import { runStudy, type StudyReply, type StudyRequest } from '../../src/state/study';
import { joinShares, startShares, studyWorkerCount } from '../../src/state/study/shares';
import { StandInWorker } from './studyStandIn';
import { kiln } from '../cli/studyHelpers';

// A sweep that moves a shape, shared over several workers, must give what one
// worker's sweep gives: the same numbers, CSV and first failure.

function kilnSketch() {
  const read = restore(kiln());
  if (!read.ok) throw new Error(read.errors[0].message);
  return read.sketch;
}

type Sweep = Extract<StudyRequest, { kind: 'sweep' }>;
const sweep = (from: number, to: number, steps: number): Sweep => ({
  kind: 'sweep',
  sketch: kilnSketch(),
  address: 'ware stack.2.x',
  from,
  to,
  steps,
});

/** Each share run on its own, as the workers would, then put together. */
function shared(request: Sweep, of: number): StudyReply {
  return joinShares(
    request,
    Array.from({ length: of }, (_, part) => runStudy({ ...request, share: { part, of } })),
  );
}

describe('a sweep in shares', () => {
  it('takes one worker per core but the page, four cases each at least, only when every case computes view factors', () => {
    const move = sweep(1.2, 1.8, 20);
    expect(studyWorkerCount(move, 8)).toBe(5);
    expect(studyWorkerCount({ ...move, steps: 40 }, 8)).toBe(7);
    expect(studyWorkerCount({ ...move, steps: 40 }, 64)).toBe(8);
    expect(studyWorkerCount({ ...move, steps: 7 }, 8)).toBe(1);
    expect(studyWorkerCount(move, 2)).toBe(1);
    expect(studyWorkerCount({ ...move, address: 'hearth.temperature' }, 8)).toBe(1);
    expect(studyWorkerCount({ kind: 'effects', sketch: move.sketch }, 8)).toBe(1);
  });

  it('gives the whole sweep exactly: values, net heat, temperature and CSV', () => {
    const request = sweep(1.2, 1.8, 7);
    const whole = runStudy(request);
    if (whole.kind !== 'sweep') throw new Error(whole.kind === 'failed' ? whole.message : whole.kind);
    for (const of of [2, 3, 7]) expect(shared(request, of)).toEqual(whole);
  });

  it('fails with the message of the lowest case that cannot be solved, as the whole sweep does', () => {
    // x = 2.6 and 3.0 push the ware stack through the right wall: cases 5 and 6, in two different shares.
    const request = sweep(1.0, 3.0, 6);
    const whole = runStudy(request);
    expect(whole.kind).toBe('failed');
    expect(shared(request, 3)).toEqual({ kind: 'failed', message: (whole as { message: string }).message });
    expect((whole as { message: string }).message).toMatch(/2\.6/);
  });

  it('counts progress over all shares and replies once; a stopped sweep never replies', async () => {
    const request = sweep(1.2, 1.8, 5);
    const replies: StudyReply[] = [];
    const workers: StandInWorker[] = [];
    startShares(
      request,
      3,
      (r) => replies.push(r),
      () => {
        const w = new StandInWorker();
        workers.push(w);
        return w;
      },
    );
    await new Promise((resolve) => setTimeout(resolve, 50));
    const finals = replies.filter((r) => r.kind !== 'progress');
    expect(finals).toEqual([runStudy(request)]);
    const progress = replies.filter((r) => r.kind === 'progress');
    expect(progress.map((r) => (r as { total: number }).total)).toEqual([5, 5, 5, 5, 5]);
    expect((progress[progress.length - 1] as { done: number }).done).toBe(5);
    expect(workers.every((w) => w.terminated)).toBe(true);

    const stopped: StudyReply[] = [];
    startShares(
      request,
      2,
      (r) => stopped.push(r),
      () => new StandInWorker(),
    ).stop();
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(stopped).toEqual([]);
  });

  it('refuses as soon as no share can still refuse a lower value, without waiting for the slow ones', async () => {
    // x = 2.6 (the first value) pushes the ware stack through the wall: share 0 refuses at once;
    // share 1 (values 2 and 4) is slow and cannot refuse a lower value.
    const request = sweep(2.6, 1.0, 5);
    const whole = runStudy(request);
    expect(whole.kind).toBe('failed');
    const replies: StudyReply[] = [];
    let made = 0;
    startShares(
      request,
      2,
      (r) => replies.push(r),
      () => new StandInWorker(made++ === 0 ? 0 : 2000),
    );
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(replies.filter((r) => r.kind !== 'progress')).toEqual([
      { kind: 'failed', message: (whole as { message: string }).message },
    ]);
  });

  it('says which part went missing when the shares do not come back whole', () => {
    const request = sweep(1.2, 1.8, 4);
    const half = runStudy({ ...request, share: { part: 0, of: 2 } });
    expect(joinShares(request, [half])).toEqual({
      kind: 'failed',
      message: 'the study stopped with an internal error (case 2 of the sweep is missing)',
    });
    expect(joinShares(request, [])).toEqual({
      kind: 'failed',
      message: 'the study stopped with an internal error (no share of the sweep came back)',
    });
    expect(joinShares(request, [{ kind: 'progress', done: 1, total: 4 }])).toMatchObject({
      message: "the study stopped with an internal error (a share of the sweep replied 'progress')",
    });
  });
});
