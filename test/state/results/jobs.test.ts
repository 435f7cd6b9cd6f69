// The results pipeline posts a view-factor job only when the geometry changes:
// names, properties and units are applied to the edge factors already there.
import { describe, expect, it } from 'vitest';
import { createAppStore, type AppStore } from '../../../src/state/store';
import { startLiveResults, type JobRunner } from '../../../src/state/results/live';
import { shownResult } from '../../../src/state/results/derive';
import { startLiveExchange } from '../../../src/state/exchange/live';
import { documentApi } from '../../../src/state/documentApi';
import { setVertex } from '../../../src/state/edits/shapeEdits';
import { renameSurface } from '../../../src/state/edits/surfaceEdits';
import { changeUnits } from '../../../src/state/edits/unitEdits';
import { setCondition, setEmissivity } from '../../../src/state/exchange/edits';
import type { SketchFile } from '../../../src/state/sketchFile';
import { viewFactorApi } from '../../../src/worker/api';
import type { ViewFactorJob } from '../../../src/worker/job';

const flush = () => new Promise((r) => setTimeout(r, 0));

/** The real core in this thread, counting the jobs it is given. */
function countingRunner(): JobRunner & { jobs: ViewFactorJob[] } {
  const jobs: ViewFactorJob[] = [];
  return {
    jobs,
    run: async (job) => {
      jobs.push(job);
      return { kind: 'done', result: await viewFactorApi.compute(job), elapsedMs: 0 };
    },
  };
}

// A 4 x 2 rectangle in metres, every side its own surface.
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
  surfaces: { floor: { emissivity: 0.8, temperature: 1000 } },
};

/**
 * Hottel's crossed strings for two parallel, directly opposed plates of width w
 * a distance h apart: F = (2 sqrt(w^2 + h^2) - 2h) / (2w). Incropera et al.,
 * Fundamentals of Heat and Mass Transfer, 6th ed., Sec. 13.1 (crossed-strings method).
 */
const opposedPlates = (w: number, h: number) => (2 * Math.hypot(w, h) - 2 * h) / (2 * w);

async function started(doc: SketchFile) {
  const store: AppStore = createAppStore(doc);
  const runner = countingRunner();
  startLiveResults(store, runner, documentApi);
  startLiveExchange(store);
  await flush();
  return { store, runner };
}

const factor = (store: AppStore, from: string, to: string) => {
  const shown = shownResult(store.getState().viewFactors);
  if (!shown) throw new Error('no results');
  const n = shown.names.length;
  return shown.result.F[shown.names.indexOf(from) * n + shown.names.indexOf(to)];
};

describe('view-factor jobs follow the geometry only', () => {
  it('an emissivity, a temperature, a rename or a change of units posts no job; moving a vertex does', async () => {
    const { store, runner } = await started(duct);
    expect(runner.jobs).toHaveLength(1);
    const edit = (fn: (d: SketchFile) => SketchFile) => store.getState().edit(fn);

    edit((d) => setEmissivity(d, 'floor', 0.5));
    edit((d) => setCondition(d, 'roof', { kind: 'temperature', temperature: 400 }));
    edit((d) => renameSurface(d, 'left', 'west wall'));
    edit((d) => changeUnits(d, 'ft', 'relabel'));
    edit((d) => changeUnits(d, 'in', 'convert'));
    await flush();
    expect(runner.jobs).toHaveLength(1);
    expect(store.getState().viewFactors.status).toBe('ready');
    expect(shownResult(store.getState().viewFactors)?.stale).toBe(false);
    // The exchange followed the property edits without new factors.
    expect(store.getState().exchange.kind).toBe('solved');

    edit((d) => setVertex(d, 0, 2, [4, 2.5]));
    await flush();
    expect(runner.jobs).toHaveLength(2);
  });

  it('a rename that merges two surfaces re-sums the edge factors it has', async () => {
    const { store, runner } = await started(duct);
    expect(factor(store, 'left', 'right')).toBeCloseTo(opposedPlates(2, 4), 14);
    store.getState().edit((d) => renameSurface(d, 'roof', 'floor'));
    await flush();
    expect(runner.jobs).toHaveLength(1);
    const shown = shownResult(store.getState().viewFactors);
    expect(shown?.names).toEqual(['floor', 'right', 'left']);
    // Summation rule (common practice): from the left wall, all that misses the right wall reaches floor or roof.
    expect(Math.abs(factor(store, 'left', 'floor') - (1 - opposedPlates(2, 4)))).toBeLessThan(1e-14);
    expect(shown?.result.surfaceLength[0]).toBe(8);
  });

  it('a converted sketch keeps its factors and reports lengths in the new unit', async () => {
    const { store, runner } = await started(duct);
    const before = factor(store, 'floor', 'roof');
    expect(before).toBeCloseTo(opposedPlates(4, 2), 14);
    store.getState().edit((d) => changeUnits(d, 'mm', 'convert'));
    await flush();
    expect(runner.jobs).toHaveLength(1);
    const shown = shownResult(store.getState().viewFactors);
    expect(shown?.units).toBe('mm');
    expect(factor(store, 'floor', 'roof')).toBe(before);
    expect(Math.abs((shown?.result.surfaceLength[0] ?? 0) - 4000)).toBeLessThan(1e-9);
  });

  it('a drag that comes back keeps the factors that fit it (a late answer for the detour must not replace them)', async () => {
    const { store, runner } = await started(duct);
    store.getState().edit((d) => setVertex(d, 0, 2, [4, 2.5]));
    store.getState().edit((d) => setVertex(d, 0, 2, [4, 2]));
    await flush();
    // The first move's job ran; the move back matches the factors already held.
    expect(runner.jobs.length).toBeLessThanOrEqual(2);
    expect(store.getState().viewFactors.status).toBe('ready');
    expect(factor(store, 'floor', 'roof')).toBeCloseTo(opposedPlates(4, 2), 14);
  });
});
