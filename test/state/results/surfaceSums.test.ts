// Sketches past the edge-matrix budget (above 5000 edges) are summed to surfaces
// in the workers. Such a sketch is too slow for a unit test, so the budget test is
// replaced here to send every sketch down that path: a rename that merges surfaces
// then needs a job, a plain rename or a change of units does not, and the factors
// shown equal the edge-matrix path's to rounding.
import { describe, expect, it, vi } from 'vitest';
import { createAppStore, type AppStore } from '../../../src/state/store';
import { startLiveResults, type JobRunner } from '../../../src/state/results/live';
import { shownResult } from '../../../src/state/results/derive';
import { documentApi } from '../../../src/state/documentApi';
import { renameSurface } from '../../../src/state/edits/surfaceEdits';
import { changeUnits } from '../../../src/state/edits/unitEdits';
import { setVertex } from '../../../src/state/edits/shapeEdits';
import type { SketchFile } from '../../../src/state/sketchFile';
import { viewFactorApi } from '../../../src/worker/api';
import type { ViewFactorJob } from '../../../src/worker/job';

vi.mock('../../../src/worker/job', async (importOriginal) => ({
  ...(await importOriginal<typeof import('../../../src/worker/job')>()),
  needsSurfaceJob: () => true,
}));

const flush = () => new Promise((r) => setTimeout(r, 0));

const duct: SketchFile = {
  version: 1,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [4, 0],
        [4, 2],
        [0, 2],
      ],
      surface: ['floor', 'right', 'roof', 'left'],
    },
  ],
};

/**
 * Hottel's crossed strings for two parallel, directly opposed plates of width w a
 * distance h apart: F = (2 sqrt(w^2 + h^2) - 2h) / (2w). Incropera et al.,
 * Fundamentals of Heat and Mass Transfer, 6th ed., Sec. 13.1 (crossed-strings method).
 */
const opposedPlates = (w: number, h: number) => (2 * Math.hypot(w, h) - 2 * h) / (2 * w);

async function started(doc: SketchFile) {
  const store: AppStore = createAppStore(doc);
  const jobs: ViewFactorJob[] = [];
  const runner: JobRunner = {
    run: async (job) => {
      jobs.push(job);
      return { kind: 'done', result: await viewFactorApi.compute(job), elapsedMs: 0 };
    },
  };
  startLiveResults(store, runner, documentApi);
  await flush();
  return { store, jobs };
}

const factor = (store: AppStore, from: string, to: string) => {
  const shown = shownResult(store.getState().viewFactors);
  if (!shown) throw new Error('no results');
  const n = shown.names.length;
  return shown.result.F[shown.names.indexOf(from) * n + shown.names.indexOf(to)];
};

describe('surface sums past the edge-matrix budget', () => {
  it('the job carries the surface index and the answer is surface sums matching crossed strings', async () => {
    const { store, jobs } = await started(duct);
    expect(jobs).toHaveLength(1);
    expect(Array.from(jobs[0].surfaces?.edgeSurface ?? [])).toEqual([0, 1, 2, 3]);
    expect(store.getState().viewFactors.status).toBe('ready');
    expect(Math.abs(factor(store, 'floor', 'roof') - opposedPlates(4, 2))).toBeLessThan(1e-14);
    expect(Math.abs(factor(store, 'left', 'right') - opposedPlates(2, 4))).toBeLessThan(1e-14);
  });

  it('a plain rename or a change of units posts no job; a rename that merges surfaces does', async () => {
    const { store, jobs } = await started(duct);
    const before = factor(store, 'floor', 'roof');
    store.getState().edit((d) => renameSurface(d, 'left', 'west wall'));
    store.getState().edit((d) => changeUnits(d, 'mm', 'convert'));
    await flush();
    expect(jobs).toHaveLength(1);
    expect(shownResult(store.getState().viewFactors)?.stale).toBe(false);
    expect(factor(store, 'floor', 'roof')).toBe(before);
    expect(Math.abs((shownResult(store.getState().viewFactors)?.result.surfaceLength[0] ?? 0) - 4000)).toBeLessThan(
      1e-9,
    );

    store.getState().edit((d) => renameSurface(d, 'roof', 'floor'));
    // Until the new sums arrive, the old ones are shown as stale (another surface index).
    expect(shownResult(store.getState().viewFactors)?.stale).toBe(true);
    await flush();
    expect(jobs).toHaveLength(2);
    const shown = shownResult(store.getState().viewFactors);
    expect(shown?.stale).toBe(false);
    expect(shown?.names).toEqual(['floor', 'right', 'west wall']);
    // Summation rule (common practice): from the left wall, all that misses the right wall reaches floor or roof.
    expect(Math.abs(factor(store, 'west wall', 'floor') - (1 - opposedPlates(2, 4)))).toBeLessThan(1e-14);
  });

  it('moving a vertex posts a job, as for edge factors', async () => {
    const { store, jobs } = await started(duct);
    store.getState().edit((d) => setVertex(d, 0, 2, [4, 2.5]));
    await flush();
    expect(jobs).toHaveLength(2);
    expect(store.getState().viewFactors.status).toBe('ready');
  });
});
