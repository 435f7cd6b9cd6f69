// Browser benchmark: `npm run bench:browser`. Builds the app, opens the demo in
// Debian's headless chromium and measures, over many pointer moves, the time
// from a drag event to the updated view-factor table (the demo, then the 152-edge
// drag-size sketch of `npm run bench`), and from a property edit to the updated
// net-heat table (which must post no view-factor job).
// Then opens a 1012-edge sketch and drags a tube for a few seconds, the pointer
// moving on every animation frame, counting table updates and canvas frames per second.
// Then a study's start: "Which input matters" on the 1012-edge sketch (browserStudy.ts).
// Then a property edit of a 1012-surface sketch whose balance takes Newton's method,
// solved in the exchange's worker: how long the page is held (browserExchange.ts).
// Last, the view-factor pool: one worker against one per core (browserPool.ts).
// Prints min, median and p90; the targets are reported with a met / NOT met verdict, never asserted.
import type { Page } from 'playwright-core';
import { screenOf, startApp, waitReady, type TestWindow } from '../e2e/harness';
import { bigSketch, dragSizeSketch, followDrag, openSketch } from './browserDrag';
import { deepBankSketch, furnaceSketch } from './bigSketch';
import { furnaceTubeCentre } from './scenes';
import { studyStartTimes } from './browserStudy';
import { exchangeEditFigures } from './browserExchange';
import { poolFigures, poolLine } from './browserPool';

type LatencyWindow = TestWindow & { __lat: { lastEvent: number; samples: number[]; changes: number } };

function stats(samples: number[]): string {
  const s = [...samples].sort((a, b) => a - b);
  const at = (q: number) => s[Math.min(s.length - 1, Math.floor(q * s.length))].toFixed(1);
  return `min ${s[0].toFixed(1)} ms, median ${at(0.5)} ms, p90 ${at(0.9)} ms over ${s.length}`;
}

function median(samples: number[]): number {
  const s = [...samples].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

const verdict = (ok: boolean) => (ok ? 'met' : 'NOT met');

/** Stamp every change below `selector` with the time since the last input event of `kind`. */
async function watch(page: Page, selector: string, kind: 'pointermove' | 'change'): Promise<void> {
  await page.evaluate(
    ([sel, ev]) => {
      const w = window as unknown as LatencyWindow;
      w.__lat = { lastEvent: 0, samples: [], changes: 0 };
      window.addEventListener(
        ev,
        () => {
          w.__lat.lastEvent = performance.now();
        },
        true,
      );
      new MutationObserver(() => {
        if (w.__lat.lastEvent) w.__lat.samples.push(performance.now() - w.__lat.lastEvent);
        w.__lat.lastEvent = 0;
        w.__lat.changes++;
      }).observe(document.querySelector(sel)!, { subtree: true, childList: true, characterData: true });
    },
    [selector, kind] as const,
  );
}

const changes = (page: Page) => page.evaluate(() => (window as unknown as LatencyWindow).__lat.changes);
const samples = (page: Page) => page.evaluate(() => (window as unknown as LatencyWindow).__lat.samples);
const jobs = (page: Page) => page.evaluate(() => (window as unknown as TestWindow).__tautline.client.launched);

/**
 * Drag from sketch point `at`, waiting for the table after every move; `offset(i)`
 * is the i-th move's pointer offset from the start, screen pixels.
 */
async function dragLatency(
  page: Page,
  moves: number,
  at: [number, number],
  offset: (i: number) => [number, number],
): Promise<number[]> {
  await watch(page, '.matrix-scroll', 'pointermove');
  await page.getByRole('checkbox', { name: 'snap' }).uncheck();
  const [sx, sy] = await screenOf(page, ...at);
  for (const warm of [true, false]) {
    await page.evaluate(() => {
      (window as unknown as LatencyWindow).__lat.samples = [];
    });
    await page.mouse.move(sx, sy);
    await page.mouse.down();
    for (let i = 1; i <= (warm ? 20 : moves); i++) {
      const c = await changes(page);
      const [dx, dy] = offset(i);
      await page.mouse.move(sx + dx, sy + dy);
      await page.waitForFunction((n) => (window as unknown as LatencyWindow).__lat.changes > n, c, { timeout: 5000 });
    }
    await page.mouse.up();
    await page.keyboard.press('Control+z');
    await waitReady(page);
  }
  return samples(page);
}

async function propertyLatency(page: Page, edits: number): Promise<{ samples: number[]; jobs: number }> {
  await page.getByRole('tab', { name: /heat exchange/i }).click();
  await watch(page, '.exchange-results', 'change');
  const field = page.getByRole('textbox', { name: /emissivity/i }).first();
  const before = await jobs(page);
  for (let i = 0; i < edits; i++) {
    const c = await changes(page);
    await field.fill(String(0.5 + (i % 40) / 100));
    await field.press('Enter');
    await page.waitForFunction((n) => (window as unknown as LatencyWindow).__lat.changes > n, c, { timeout: 5000 });
  }
  return { samples: await samples(page), jobs: (await jobs(page)) - before };
}

const app = await startApp();
try {
  const page = await app.context.newPage();
  await page.goto(app.url);
  await waitReady(page);
  console.log(`chromium headless, demo oven; ${new Date().toISOString()}`);
  // A roof corner of the demo oven, 2 px right and 1 px up per move (40 moves a round).
  const drag = await dragLatency(page, 80, [2.1, 1.5], (i) => [(i % 40) * 2, -(i % 40)]);
  console.log(`demo oven: drag event -> updated view-factor table: ${stats(drag)} moves`);
  const p = await propertyLatency(page, 40);
  console.log(
    `emissivity typed -> updated net-heat table: ${stats(p.samples)} edits; view-factor jobs posted: ${p.jobs} (target 0)`,
  );
  const mem = await page.evaluate(
    () => (performance as unknown as { memory?: { usedJSHeapSize: number } }).memory?.usedJSHeapSize ?? 0,
  );
  if (mem) console.log(`page JS heap after the runs: ${(mem / 1e6).toFixed(1)} MB`);

  await page.getByRole('tab', { name: 'Edit' }).click();
  // The 152-edge drag-size sketch of `npm run bench`, every edge a surface: one body
  // dragged 1 px to either side of where it was, so it never meets a neighbour.
  const small = dragSizeSketch();
  await openSketch(page, small.sketch);
  const drag152 = await dragLatency(page, 80, small.body, (i) => [i % 2 ? 1 : -1, 0]);
  console.log(
    `${small.edges}-edge drag-size sketch (every edge a surface): drag event -> updated view-factor table: ${stats(drag152)} moves (target median <= 16 ms: ${verdict(median(drag152) <= 16)})`,
  );
  for (const perEdge of [false, true]) {
    const big = bigSketch(perEdge);
    await openSketch(page, big);
    const edges = big.shapes.reduce((n, s) => n + s.points.length, 0);
    const f = await followDrag(page, [5, 1.5], 4);
    const what = perEdge ? 'every edge a surface' : '24 surfaces';
    console.log(
      `${edges}-edge sketch (${what}), a tube dragged ${f.seconds.toFixed(1)} s, pointer moves ${f.movesPerSecond.toFixed(0)}/s: ` +
        `table updates ${f.tablesPerSecond.toFixed(1)}/s (target >= 10: ${verdict(f.tablesPerSecond >= 10)}); ` +
        `frames ${f.framesPerSecond.toFixed(0)}/s, of which showing a new position ${f.followPerSecond.toFixed(0)}/s ` +
        `(target: one per pointer move up to the frame rate: ${verdict(f.followPerSecond >= 0.9 * Math.min(60, f.movesPerSecond) && f.movesPerSecond >= 50)}); ` +
        `longest frame ${f.longestFrameMs.toFixed(0)} ms; per pointer move ${f.handlerMs.toFixed(1)} ms handling (median), ` +
        `${f.drawMs.toFixed(1)} ms drawing per new position`,
    );
  }
  // The furnace section of `npm run bench`, 50 exact tubes in a row: its middle tube
  // dragged ±0.05 along the row (information: the table rate of a drag of exact circles).
  await openSketch(page, furnaceSketch());
  const f = await followDrag(page, furnaceTubeCentre(25), 4, 0.05);
  console.log(
    `furnace section, 50 exact tubes in a row (54 edges), the middle tube dragged ${f.seconds.toFixed(1)} s, pointer moves ${f.movesPerSecond.toFixed(0)}/s: ` +
      `table updates ${f.tablesPerSecond.toFixed(1)}/s; frames ${f.framesPerSecond.toFixed(0)}/s, of which showing a new position ${f.followPerSecond.toFixed(0)}/s`,
  );
  // The slow case of exact circles (information): a tube of the second of four staggered
  // rows dragged along its row, so pairs between rows past dozens of tubes change.
  await openSketch(page, deepBankSketch());
  const b = await followDrag(page, [0.53 + 0.46 * 12, 3.6], 4, 0.05);
  console.log(
    `deep tube bank, four staggered rows of 25 exact tubes (104 edges), a tube of the second row dragged ${b.seconds.toFixed(1)} s, pointer moves ${b.movesPerSecond.toFixed(0)}/s: ` +
      `table updates ${b.tablesPerSecond.toFixed(1)}/s; frames ${b.framesPerSecond.toFixed(0)}/s, of which showing a new position ${b.followPerSecond.toFixed(0)}/s`,
  );
  // A study's start on the 1012-edge sketch: it takes the view factors on screen (information).
  const study = await studyStartTimes(page, 5);
  console.log(
    `1012-edge sketch (24 surfaces), "Which input matters": click -> table ${stats(study)} runs (the view factors taken from the results on screen)`,
  );
  // A property edit of a large Newton balance, solved off the page (information).
  const edits = await exchangeEditFigures(page, 5);
  const list = (k: 'answerMs' | 'longestTaskMs' | 'longestFrameGapMs') => edits.map((e) => e[k].toFixed(0)).join(', ');
  console.log(
    `1012-surface sketch with convection (Newton), a property edit solved in the exchange's worker: answer ${list('answerMs')} ms; ` +
      `longest task on the page ${list('longestTaskMs')} ms (0: none over 50 ms); longest frame gap ${list('longestFrameGapMs')} ms`,
  );
  // The view-factor pool over cores, one worker against one per core, in pages of their own (target 3).
  await page.close();
  console.log(poolLine(await poolFigures(app, 9)));
} finally {
  await app.close();
}
