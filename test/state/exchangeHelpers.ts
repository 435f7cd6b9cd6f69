import { expect } from 'vitest';
import { createAppStore, type AppStore } from '../../src/state/store';
import { startLiveResults, type JobRunner } from '../../src/state/results/live';
import { startLiveExchange } from '../../src/state/exchange/live';
import { documentApi } from '../../src/state/documentApi';
import type { ExchangeSolved } from '../../src/state/exchange/slice';
import type { SketchFile } from '../../src/state/sketchFile';
import type { SurfaceProperties } from '../../src/document/schema';
import { viewFactorApi } from '../../src/worker/api';
import { STEFAN_BOLTZMANN as SIGMA } from '../../src/core/exchange';

// Shared by the store's heat-exchange tests (exchange.test.ts, exchangeEdits.test.ts).
// The chain (exact view factors, dense solve) is exact to rounding, so closed forms are checked to 1e-9.
export const REL = 1e-9;
export const flush = () => new Promise((r) => setTimeout(r, 0));
export const inThread: JobRunner = {
  run: async (job) => ({ kind: 'done', result: await viewFactorApi.compute(job), elapsedMs: 0 }),
};

export function live(doc: SketchFile): AppStore {
  const store = createAppStore(doc);
  startLiveResults(store, inThread, documentApi);
  startLiveExchange(store);
  return store;
}

export function solved(store: AppStore): ExchangeSolved {
  const ex = store.getState().exchange;
  if (ex.kind !== 'solved') throw new Error(`expected a solved exchange, got ${JSON.stringify(ex)}`);
  return ex;
}

export const heatOf = (ex: ExchangeSolved, name: string) => ex.result.netHeat[ex.names.indexOf(name)];
export const close = (actual: number, expected: number, rel = REL) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));

// Two long concentric squares in millimetres: inner 200 mm (a solid, convex, so
// F_12 = 1), outer 600 mm (the enclosure).
export const squares: SketchFile = {
  version: 1,
  units: 'mm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [600, 0],
        [600, 600],
        [0, 600],
      ],
      surface: 'outer',
    },
    {
      kind: 'solid',
      points: [
        [200, 200],
        [400, 200],
        [400, 400],
        [200, 400],
      ],
      surface: 'inner',
    },
  ],
  surfaces: { inner: { emissivity: 0.6, temperature: 1000 }, outer: { emissivity: 0.8, temperature: 500 } },
};

/**
 * Two-surface enclosure, inner convex body (F_12 = 1):
 * q'_1 = sigma (T1^4 - T2^4) A1 / (1/e1 + (A1/A2)(1/e2 - 1)).
 * Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., sec. 13.3 (two-surface enclosure), from memory.
 */
export function twoSurface(T1: number, T2: number, e1: number, e2: number, A1: number, A2: number): number {
  return (SIGMA * (T1 ** 4 - T2 ** 4) * A1) / (1 / e1 + (A1 / A2) * (1 / e2 - 1));
}

/**
 * A regular polygon enclosure of n walls ("wall 0", "wall 1", ...), every edge its own
 * surface, each with the properties `of(k)` gives (none: the default, reradiating).
 */
export function ring(n: number, of: (k: number) => SurfaceProperties | undefined): SketchFile {
  const points = Array.from({ length: n }, (_, k): [number, number] => [
    Math.cos((2 * Math.PI * k) / n),
    Math.sin((2 * Math.PI * k) / n),
  ]);
  const surfaces: Record<string, SurfaceProperties> = {};
  points.forEach((_, k) => {
    const p = of(k);
    if (p) surfaces[`wall ${k}`] = p;
  });
  return {
    version: 1,
    units: 'm',
    shapes: [{ kind: 'enclosure', points, surface: points.map((_, k) => `wall ${k}`) }],
    surfaces,
  };
}
