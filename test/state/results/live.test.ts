import { describe, expect, it, vi } from 'vitest';
import { createAppStore } from '../../../src/state/store';
import { startLiveResults, type JobRunner } from '../../../src/state/results/live';
import { shownResult } from '../../../src/state/results/derive';
import { documentApi } from '../../../src/state/documentApi';
import { setVertex } from '../../../src/state/edits/shapeEdits';
import { emptySketch } from '../../../src/state/documentSlice';
import { ViewFactorClient } from '../../../src/worker/client';
import { viewFactorApi } from '../../../src/worker/api';
import { spawner } from '../../worker/fakeWorker';
import { box } from '../boxSketch';

const flush = () => new Promise((r) => setTimeout(r, 0));
/** The real core, run in-thread. */
const inThread: JobRunner = {
  run: async (job) => ({ kind: 'done', result: await viewFactorApi.compute(job), elapsedMs: 0 }),
};

describe('live results', () => {
  it('computes for the current document and files the result with it', async () => {
    const store = createAppStore(box);
    startLiveResults(store, inThread, documentApi);
    expect(store.getState().viewFactors.status).toBe('computing');
    await flush();
    const vf = store.getState().viewFactors;
    expect(vf.status).toBe('ready');
    expect(shownResult(vf)?.stale).toBe(false);
    expect(shownResult(vf)?.names).toEqual(['floor', 'right', 'roof', 'left', 'block']);
  });

  it('marks invalid geometry, keeps the last valid result and the drawing', async () => {
    const store = createAppStore(box);
    startLiveResults(store, inThread, documentApi);
    await flush();
    const shown = shownResult(store.getState().viewFactors);
    // Drag a block corner through the wall.
    store.getState().edit((d) => setVertex(d, 1, 1, [4.5, 0.75]));
    await flush();
    const vf = store.getState().viewFactors;
    expect(vf.status).toBe('invalid');
    expect(vf.problems.map((p) => p.message).join(' ')).toMatch(/shape 2.*(enclosure|outside)/);
    expect(shownResult(vf)?.result).toBe(shown?.result);
    expect(shownResult(vf)?.stale).toBe(true);
    expect(store.getState().doc.shapes[1].points[1]).toEqual([4.5, 0.75]);
  });

  it('shows nothing to compute for an empty sketch', async () => {
    const store = createAppStore(emptySketch);
    startLiveResults(store, inThread, documentApi);
    await flush();
    expect(store.getState().viewFactors.status).toBe('empty');
  });

  it('after a worker that throws or hangs: shows the error, restarts, keeps the document, never stuck computing', async () => {
    const { workers, spawn } = spawner();
    const client = new ViewFactorClient(spawn, { timeLimitMs: 40 });
    const store = createAppStore(box);
    startLiveResults(store, client, documentApi);
    await flush();
    workers[0].calls[0].reject(new Error('simulated fault'));
    await flush();
    let s = store.getState();
    expect(s.viewFactors.status).toBe('error');
    expect(s.viewFactors.error).toContain('simulated fault');
    expect(s.notices.at(-1)?.level).toBe('error');
    expect(s.notices.at(-1)?.text).toMatch(/restarted; your sketch is unchanged/);
    expect(s.doc).toBe(box);
    expect(workers).toHaveLength(2);
    // The next edit runs on the new worker; this one hangs past the time limit, and so does its one retry.
    s.edit((d) => setVertex(d, 0, 2, [4, 2.5]));
    await vi.waitFor(() => expect(store.getState().viewFactors.status).toBe('error'), { timeout: 5000 });
    s = store.getState();
    expect(s.viewFactors.error).toMatch(/took too long/);
    expect(workers).toHaveLength(4);
    expect(workers[2].calls).toHaveLength(1);
    expect(s.doc.shapes[0].points[2]).toEqual([4, 2.5]);
    // A healthy worker answers the next edit.
    s.edit((d) => setVertex(d, 0, 2, [4, 2.4]));
    await flush();
    const call = workers[3].calls[0];
    call.resolve(await viewFactorApi.compute(call.job));
    await flush();
    expect(store.getState().viewFactors.status).toBe('ready');
    client.dispose();
  });

  it('hands an answer back to the workers one answer after it left the store, never the one shown', async () => {
    const recycled: unknown[] = [];
    const runner: JobRunner = { ...inThread, recycle: (answer) => recycled.push(answer) };
    const store = createAppStore(box);
    startLiveResults(store, runner, documentApi);
    const shown: unknown[] = [];
    for (let k = 0; k < 3; k++) {
      await flush();
      shown.push(store.getState().viewFactors.edges?.result);
      store.getState().edit((d) => setVertex(d, 1, 0, [1.75 + 0.01 * (k + 1), 0.75]));
    }
    await flush();
    shown.push(store.getState().viewFactors.edges?.result);
    expect(new Set(shown).size).toBe(4);
    // The first two were replaced two answers ago or more; the third only just; the fourth is shown.
    expect(recycled).toHaveLength(2);
    expect(recycled[0]).toBe(shown[0]);
    expect(recycled[1]).toBe(shown[1]);
  });
});
