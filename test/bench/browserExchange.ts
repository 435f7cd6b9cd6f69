// Browser benchmark of a property edit on a large sketch whose balance takes
// Newton's method: the 1012-edge sketch with every edge its own surface, one
// wall held, the rest reradiating with convection to a hot gas, the heat
// exchange tab in view. From the edit to the new answer shown, and the longest
// the page's thread was held meanwhile (long tasks, and the longest gap between
// animation frames). Part of
// `npm run bench:browser`; alone: `npx tsx test/bench/browserExchange.ts`.
import type { Page } from 'playwright-core';
import { startApp, type TestWindow } from '../e2e/harness';
import type { SketchFile } from '../../src/state/sketchFile';
import { openSketch } from './browserDrag';
import { bigSketch } from './bigSketch';

type EditWindow = Window & {
  __edit: { tasks: [number, number][]; frames: number[]; on: boolean; frame: (t: number) => void };
};

/** The 1012-surface sketch: wall 1 held at 1400 K, every surface with convection to gas at 1200 K. */
export function convectionSketch(): SketchFile {
  const sketch = bigSketch(true);
  const names = sketch.shapes.flatMap((s) => (typeof s.surface === 'string' ? [s.surface] : s.surface));
  const surfaces = Object.fromEntries(names.map((n) => [n, { emissivity: 0.8, convectionCoefficient: 10 }]));
  surfaces['wall 1'] = { ...surfaces['wall 1'], temperature: 1400 } as (typeof surfaces)['wall 1'];
  return { ...sketch, surfaces, settings: { gasTemperature: 1200 } };
}

export interface EditFigures {
  /** From the edit to the new answer shown, ms. */
  answerMs: number;
  /** Longest task on the page's thread meanwhile, ms (0: none over 50 ms). */
  longestTaskMs: number;
  /** Longest gap between two animation frames meanwhile, ms. */
  longestFrameGapMs: number;
}

/** Edit wall 1's temperature `runs` times, each to a new value, and time each answer. */
export async function exchangeEditFigures(page: Page, runs: number): Promise<EditFigures[]> {
  await openSketch(page, convectionSketch());
  const solvedFor = (T: number) =>
    page.waitForFunction(
      (t) => {
        const s = (window as unknown as TestWindow).__tautline.store.getState();
        const ex = s.exchange;
        return ex.kind === 'solved' && !ex.stale && ex.result.temperature[ex.names.indexOf('wall 1')] === t;
      },
      T,
      { timeout: 120_000, polling: 'raf' },
    );
  await solvedFor(1400);
  // Edited as a user edits properties: with the heat exchange tab in view, its tables and chart redrawn.
  await page.getByRole('tab', { name: 'Heat exchange' }).click();
  await page.evaluate(() => {
    const w = window as unknown as EditWindow;
    w.__edit = { tasks: [], frames: [], on: false } as unknown as EditWindow['__edit'];
    new PerformanceObserver((list) => {
      for (const e of list.getEntries()) w.__edit.tasks.push([e.startTime, e.duration]);
    }).observe({ type: 'longtask' });
    // A property, not a named const: the bundler would wrap a named function in a helper the page lacks.
    w.__edit.frame = (t: number) => {
      if (w.__edit.on) w.__edit.frames.push(t);
      requestAnimationFrame(w.__edit.frame);
    };
    requestAnimationFrame(w.__edit.frame);
  });
  const out: EditFigures[] = [];
  for (let r = 0; r < runs; r++) {
    const T = 1410 + 10 * r;
    const t0 = await page.evaluate((t) => {
      const w = window as unknown as EditWindow & TestWindow;
      w.__edit.tasks = [];
      w.__edit.frames = [];
      w.__edit.on = true;
      const start = performance.now();
      w.__tautline.store
        .getState()
        .edit((d) => ({ ...d, surfaces: { ...d.surfaces, 'wall 1': { ...d.surfaces!['wall 1'], temperature: t } } }));
      return start;
    }, T);
    await solvedFor(T);
    out.push(
      await page.evaluate((start) => {
        const w = window as unknown as EditWindow;
        w.__edit.on = false;
        const f = w.__edit.frames;
        let gap = 0;
        for (let k = 1; k < f.length; k++) gap = Math.max(gap, f[k] - f[k - 1]);
        if (f.length > 0) gap = Math.max(gap, f[0] - start);
        return {
          answerMs: performance.now() - start,
          longestTaskMs: Math.max(0, ...w.__edit.tasks.filter(([s]) => s >= start - 1).map(([, d]) => d)),
          longestFrameGapMs: gap,
        };
      }, t0),
    );
  }
  return out;
}

if (process.argv[1]?.endsWith('browserExchange.ts')) {
  const app = await startApp();
  try {
    const page = await app.context.newPage();
    await page.goto(app.url);
    const figures = await exchangeEditFigures(page, 5);
    const list = (k: keyof EditFigures) => figures.map((f) => f[k].toFixed(0)).join(', ');
    console.log(
      `1012-surface sketch with convection (Newton), one edit: answer ${list('answerMs')} ms; longest task ${list('longestTaskMs')} ms; longest frame gap ${list('longestFrameGapMs')} ms`,
    );
  } finally {
    await app.close();
  }
}
