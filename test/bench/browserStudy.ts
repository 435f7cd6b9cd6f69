// Browser benchmark of a study's start: "Which input matters" on a large sketch,
// from the click to the table, after the results pipeline has shown the sketch's
// view factors (which the study takes instead of computing them again). Part of
// `npm run bench:browser`; alone: `npx tsx test/bench/browserStudy.ts`.
import type { Page } from 'playwright-core';
import { startApp } from '../e2e/harness';
import { openSketch } from './browserDrag';
import { studySketch } from './bigSketch';

type StudyWindow = Window & { __study: { clicked: number; shown: number[] } };

/** Milliseconds from the click on "Work it out" to the sensitivity table shown, `runs` times (the first starts the worker). */
export async function studyStartTimes(page: Page, runs: number): Promise<number[]> {
  await openSketch(page, studySketch());
  await page.getByRole('tab', { name: 'What if' }).click();
  // Stamped in the page: the click, and every time the table is put in (a run clears it first).
  await page.evaluate(() => {
    const w = window as unknown as StudyWindow;
    w.__study = { clicked: 0, shown: [] };
    window.addEventListener('click', () => (w.__study.clicked = performance.now()), true);
    new MutationObserver((records) => {
      for (const r of records)
        for (const n of r.addedNodes)
          if (n instanceof Element && n.querySelector('table[aria-label="Change of net heat per input"]'))
            w.__study.shown.push(performance.now() - w.__study.clicked);
    }).observe(document.querySelector('.tab-panel')!, { subtree: true, childList: true });
  });
  for (let r = 0; r < runs; r++) {
    await page.getByRole('button', { name: 'Work it out' }).click();
    await page.waitForFunction((n) => (window as unknown as StudyWindow).__study.shown.length > n, r, {
      timeout: 120_000,
    });
  }
  return page.evaluate(() => (window as unknown as StudyWindow).__study.shown);
}

if (process.argv[1]?.endsWith('browserStudy.ts')) {
  const app = await startApp();
  try {
    const page = await app.context.newPage();
    await page.goto(app.url);
    const t = await studyStartTimes(page, 5);
    console.log(`1012-edge sketch, "Which input matters": click -> table ${t.map((x) => x.toFixed(0)).join(', ')} ms`);
  } finally {
    await app.close();
  }
}
