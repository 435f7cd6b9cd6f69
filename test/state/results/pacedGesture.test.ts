// A drag paced by the results pipeline (historySlice, results/live.ts): while a
// view-factor job for the document runs, pointer moves only change what the canvas
// draws; the document takes the newest position when the answer is filed.
import { describe, expect, it } from 'vitest';
import { createAppStore } from '../../../src/state/store';
import { startLiveResults, type JobRunner } from '../../../src/state/results/live';
import { documentApi } from '../../../src/state/documentApi';
import { moveSelection } from '../../../src/state/edits/shapeEdits';
import { selectDrawnDoc } from '../../../src/state/selectors';
import { CanvasController } from '../../../src/state/canvasController';
import { viewFactorApi } from '../../../src/worker/api';
import type { JobOutcome } from '../../../src/worker/client';
import type { ViewFactorJob } from '../../../src/worker/job';
import type { SketchFile } from '../../../src/state/sketchFile';
import { box } from '../boxSketch';

const block = [{ type: 'shape' as const, shape: 1 }];
const flush = () => new Promise((r) => setTimeout(r, 0));

/** A runner whose jobs wait until the test answers them, in order. */
function heldRunner() {
  const jobs: { job: ViewFactorJob; answer: () => Promise<void> }[] = [];
  const runner: JobRunner = {
    run: (job) =>
      new Promise<JobOutcome>((resolve) => {
        jobs.push({
          job,
          answer: async () => {
            resolve({ kind: 'done', result: await viewFactorApi.compute(job), elapsedMs: 0 });
            await flush();
          },
        });
      }),
  };
  return { runner, jobs };
}

/** The block's first corner in `doc`. */
const corner = (doc: SketchFile) => doc.shapes[1].points[0];

describe('a drag paced by the view-factor jobs', () => {
  it('moves only the drawing while a job runs, then gives the document the newest position and posts one job', async () => {
    const { runner, jobs } = heldRunner();
    const store = createAppStore(box);
    startLiveResults(store, runner, documentApi, { gestureAnswerGapMs: 0 });
    await jobs[0].answer();
    expect(store.getState().viewFactors.status).toBe('ready');
    const s = store.getState();
    s.beginGesture();
    // Nothing is computing: the first move reaches the document and posts a job.
    s.previewGesture(moveSelection(box, block, 0.1, 0));
    expect(corner(store.getState().doc)).toEqual([1.85, 0.75]);
    expect(jobs).toHaveLength(2);
    expect(store.getState().viewFactors.status).toBe('computing');
    // While it runs, moves change only what the canvas draws.
    for (const dx of [0.2, 0.3, 0.4]) s.previewGesture(moveSelection(box, block, dx, 0));
    expect(corner(store.getState().doc)).toEqual([1.85, 0.75]);
    expect(corner(selectDrawnDoc(store.getState()))).toEqual([2.15, 0.75]);
    expect(jobs).toHaveLength(2);
    // Its answer filed, the document takes the newest position, never the ones in between.
    await jobs[1].answer();
    expect(corner(store.getState().doc)).toEqual([2.15, 0.75]);
    expect(jobs).toHaveLength(3);
    // The job is for the newest position (its corners in any order).
    expect(Math.min(...jobs[2].job.polygons[1].points.filter((_, k) => k % 2 === 0))).toBeCloseTo(2.15, 12);
    expect(store.getState().viewFactors.status).toBe('computing');
    await jobs[2].answer();
    expect(store.getState().viewFactors.status).toBe('ready');
    expect(jobs).toHaveLength(3);
    // Jobs posted while the shape follows the pointer leave a core to the page (worker/pool.ts); the first did not.
    expect(jobs.map((j) => j.job.duringGesture ?? false)).toEqual([false, true, true]);
  });

  it('files an answer no sooner than the gap after its job was posted while a newer position waits', async () => {
    const { runner, jobs } = heldRunner();
    const store = createAppStore(box);
    // A gap far longer than the test's own steps, so a slow machine cannot make it pass by accident.
    const stop = startLiveResults(store, runner, documentApi, { gestureAnswerGapMs: 300 });
    await jobs[0].answer();
    const s = store.getState();
    s.beginGesture();
    s.previewGesture(moveSelection(box, block, 0.1, 0));
    s.previewGesture(moveSelection(box, block, 0.2, 0));
    expect(jobs).toHaveLength(2);
    // Answered at once with a newer position waiting: held back, the document and the status unchanged.
    await jobs[1].answer();
    expect(corner(store.getState().doc)).toEqual([1.85, 0.75]);
    expect(store.getState().viewFactors.status).toBe('computing');
    expect(jobs).toHaveLength(2);
    // Once the gap has passed it is filed and the newest position goes to the document.
    await new Promise((r) => setTimeout(r, 400));
    expect(corner(store.getState().doc)).toEqual([1.95, 0.75]);
    expect(jobs).toHaveLength(3);
    // Nothing newer waits for this answer: filed at once.
    await jobs[2].answer();
    expect(store.getState().viewFactors.status).toBe('ready');
    // Stopped while an answer is held: it is never filed.
    s.previewGesture(moveSelection(box, block, 0.3, 0));
    s.previewGesture(moveSelection(box, block, 0.4, 0));
    await jobs[3].answer();
    stop();
    await new Promise((r) => setTimeout(r, 400));
    expect(corner(store.getState().doc)).toEqual([2.05, 0.75]);
    expect(store.getState().viewFactors.status).toBe('computing');
  });

  it('ends with the newest position as one undo step, even while its job still runs', async () => {
    const { runner, jobs } = heldRunner();
    const store = createAppStore(box);
    startLiveResults(store, runner, documentApi);
    await jobs[0].answer();
    const s = store.getState();
    s.beginGesture();
    s.previewGesture(moveSelection(box, block, 0.1, 0));
    s.previewGesture(moveSelection(box, block, 0.5, 0.25));
    s.endGesture();
    let now = store.getState();
    expect(corner(now.doc)).toEqual([2.25, 1]);
    expect(now.gesturePreview).toBeNull();
    expect(now.gestureBase).toBeNull();
    expect(now.past).toEqual([box]);
    // The released position is computed next; the job for the passing position is not shown for it.
    await jobs[1].answer();
    now = store.getState();
    expect(jobs).toHaveLength(3);
    expect(now.viewFactors.status).toBe('computing');
    await jobs[2].answer();
    expect(store.getState().viewFactors.status).toBe('ready');
    // The released position's job is an ordinary one: all cores again.
    expect(jobs.map((j) => j.job.duringGesture ?? false)).toEqual([false, true, false]);
    store.getState().undo();
    expect(store.getState().doc).toBe(box);
  });

  it('follows at once with no results pipeline, and a cancelled drag leaves the document as it was', () => {
    const store = createAppStore(box);
    const controller = new CanvasController(store);
    store.getState().setSnap(false);
    expect(controller.press({ at: [2, 1], shift: false, tolerance: 0.01 })).toBe('handled');
    controller.move({ at: [2.3, 1.1], shift: false, tolerance: 0.01 });
    const moved = corner(store.getState().doc);
    expect(moved[0]).toBeCloseTo(2.05, 12);
    expect(moved[1]).toBeCloseTo(0.85, 12);
    expect(selectDrawnDoc(store.getState())).toBe(store.getState().doc);
    controller.cancel();
    const s = store.getState();
    expect(s.doc).toBe(box);
    expect(s.gesturePreview).toBeNull();
    expect(s.past).toEqual([]);
  });
});
