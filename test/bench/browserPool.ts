// Browser benchmark of the view-factor pool over cores (issue 13, target 3, its
// browser half): the same whole view-factor job in a page that believes it has one
// core (one worker) and in a page with every core (one worker per core), in turn,
// medians. Each job moves every tube of the 1012-edge sketch, each by its own amount,
// so nothing is kept from the job before but the walls' pairs. Part of `npm run bench:browser`; alone:
// `npx tsx test/bench/browserPool.ts`.
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import type { App, TestWindow } from '../e2e/harness';
import { openSketch } from './browserDrag';
import { bigSketch } from './bigSketch';

export interface PoolFigures {
  /** Workers in the page with every core. */
  cores: number;
  /** The machine's ceiling right after, from plain loops in workers (see cpuCeiling). */
  ceiling: { alone: number; together: number; ceiling: number };
  /** Median ms of the pool alone (the page idle), one worker and one per core. */
  poolOne: number;
  poolMany: number;
  /** Median ms from the edit to the new factors filed, one worker. */
  one: number;
  /** The same with one worker per core. */
  many: number;
  /** Did both pages file the same surface factors, bit for bit, every time? */
  identical: boolean;
}

/** A page of the app whose navigator reports `cores` logical cores (null: the machine's own). */
async function pageWith(app: App, cores: number | null): Promise<Page> {
  const page = await app.context.newPage();
  // As text: run under tsx, a function's getter would be wrapped in a naming helper the page lacks, and fail unseen.
  if (cores !== null)
    await page.addInitScript({
      content: `Object.defineProperty(navigator, 'hardwareConcurrency', { get: () => ${cores} });`,
    });
  await page.goto(app.url);
  const seen = await page.evaluate(() => navigator.hardwareConcurrency);
  if (cores !== null && seen !== cores) throw new Error(`the page reports ${seen} cores, not ${cores}`);
  await openSketch(page, bigSketch(false));
  return page;
}

/** Move every tube by `dx` (sketch units); the ms from the edit to the new geometry's factors filed. */
async function moveAll(page: Page, dx: number): Promise<number> {
  return page.evaluate(async (d) => {
    const { store } = (window as unknown as TestWindow).__tautline;
    const before = store.getState().viewFactors.edges;
    const t0 = performance.now();
    store.getState().edit((doc) => ({
      ...doc,
      // Tube k (from 1) by d k / 20: no two tubes move alike, so no pair between them is kept.
      shapes: doc.shapes.map((s, k) =>
        s.kind === 'solid' ? { ...s, points: s.points.map(([x, y]) => [x + (d * k) / 20, y] as [number, number]) } : s,
      ),
    }));
    for (;;) {
      const vf = store.getState().viewFactors;
      if (vf.status === 'ready' && vf.edges !== before && vf.edges?.basis === vf.current) break;
      if (vf.status === 'error' || vf.status === 'invalid') throw new Error(`view factors: ${vf.status}`);
      await new Promise((r) => setTimeout(r, 1));
    }
    return performance.now() - t0;
  }, dx);
}

/**
 * The pool alone, the page idle: the job of the sketch on screen with every tube moved
 * by `dx`, posted straight to the page's view-factor client (not filed); ms from the
 * post to the answer. The page draws nothing meanwhile, so the workers have the cores.
 */
async function poolJob(page: Page, dx: number): Promise<number> {
  return page.evaluate(async (d) => {
    const { store, client } = (window as unknown as TestWindow).__tautline;
    const polygons = store.getState().doc.shapes.map((s, k) => ({
      kind: s.kind === 'enclosure' ? ('enclosure' as const) : ('solid' as const),
      points: Float64Array.from(s.points.flatMap(([x, y]) => (s.kind === 'solid' ? [x + (d * k) / 20, y] : [x, y]))),
    }));
    const t0 = performance.now();
    const outcome = await client.run({ polygons });
    const ms = performance.now() - t0;
    if (outcome.kind !== 'done') throw new Error(`pool job: ${outcome.kind}`);
    // Handed back as the page does with an answer it retires, so the workers' next answers need no fresh memory.
    client.recycle(outcome.result);
    return ms;
  }, dx);
}

/**
 * What the machine gives a page's workers right now (information): a plain loop in one
 * worker alone, then in `threads` workers at once; the ceiling is threads x alone /
 * together, the most any pool could gain over that many workers at this moment.
 */
async function cpuCeiling(page: Page, threads: number): Promise<{ alone: number; together: number; ceiling: number }> {
  return page.evaluate(async (count) => {
    const code = `onmessage = (e) => { const t0 = performance.now(); let s = 0; for (let i = 0; i < e.data; i++) s += Math.sqrt(i); postMessage([performance.now() - t0, s]); };`;
    const url = URL.createObjectURL(new Blob([code], { type: 'text/javascript' }));
    const workers = Array.from({ length: count }, () => new Worker(url));
    // Assigned to members, not named consts or object literals: the bundler would wrap a
    // named function in a helper the page lacks.
    const f = {} as { run: (w: Worker, n: number) => Promise<number>; mid: (a: number[]) => number };
    f.run = (w, n) =>
      new Promise<number>((resolve) => {
        w.onmessage = (e: MessageEvent<[number, number]>) => resolve(e.data[0]);
        w.postMessage(n);
      });
    f.mid = (a) => [...a].sort((x, y) => x - y)[a.length >> 1];
    const n = 4e6; // about 100-150 ms of one core here
    await Promise.all(workers.map((w) => f.run(w, n))); // warm
    const alone: number[] = [],
      together: number[] = [];
    for (let r = 0; r < 5; r++) {
      alone.push(await f.run(workers[0], n));
      together.push(Math.max(...(await Promise.all(workers.map((w) => f.run(w, n))))));
    }
    for (const w of workers) w.terminate();
    URL.revokeObjectURL(url);
    return { alone: f.mid(alone), together: f.mid(together), ceiling: (count * f.mid(alone)) / f.mid(together) };
  }, threads);
}

/** The view-factor table as the CSV button writes it (every factor in full: equal text, equal bits). */
async function tableCsv(page: Page): Promise<string> {
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: /CSV/ }).click(),
  ]);
  return readFileSync(await download.path(), 'utf8');
}

const median = (a: number[]) => [...a].sort((x, y) => x - y)[a.length >> 1];

/** One worker against one per core, `runs` jobs each in turn after untimed ones. */
export async function poolFigures(app: App, runs: number): Promise<PoolFigures> {
  // Opened first, the page with every core holds the sketch's autosave (one tab writes
  // at a time), so the saving on each edit counts against the speed-up, not for it.
  const many = await pageWith(app, null);
  const one = await pageWith(app, 1);
  const cores = await many.evaluate(() => navigator.hardwareConcurrency);
  const t1: number[] = [],
    tN: number[] = [],
    p1: number[] = [],
    pN: number[] = [];
  let identical = true;
  try {
    for (let r = 0; r < runs + 3; r++) {
      // Back and forth by 0.2: never into a wall or a neighbour (tubes 1.5 apart sideways, radius 0.25).
      const dx = r % 2 === 0 ? 0.2 : -0.2;
      const a = await moveAll(one, dx);
      const b = await moveAll(many, dx);
      if (r < 3) continue; // the first jobs start the workers and compile their code
      t1.push(a);
      tN.push(b);
      // Half way back: a geometry no job before had (the page's jobs go back and forth,
      // so each of them differs from this one too), and the workers' kept rows serve only the walls.
      p1.push(await poolJob(one, -dx / 2));
      pN.push(await poolJob(many, -dx / 2));
      if (r === 3 || r === runs + 2) identical &&= (await tableCsv(one)) === (await tableCsv(many));
    }
  } finally {
    await one.close();
  }
  let ceiling;
  try {
    ceiling = await cpuCeiling(many, cores);
  } finally {
    await many.close();
  }
  return {
    ceiling,
    cores,
    poolOne: median(p1),
    poolMany: median(pN),
    one: median(t1),
    many: median(tN),
    identical,
  };
}

if (process.argv[1]?.endsWith('browserPool.ts')) {
  const { startApp } = await import('../e2e/harness');
  const app = await startApp();
  try {
    const f = await poolFigures(app, 9);
    console.log(poolLine(f));
  } finally {
    await app.close();
  }
}

/** The bench's lines for these figures, with the verdict on target 3 (the pool alone). */
export function poolLine(f: PoolFigures): string {
  const target = 0.7 * f.cores;
  const s = f.poolOne / f.poolMany;
  const c = f.ceiling;
  return (
    `view-factor pool, 1012-edge sketch, every tube moved, the page idle: one worker median ${f.poolOne.toFixed(0)} ms, ${f.cores} workers ${f.poolMany.toFixed(0)} ms: ` +
    `speed-up ${s.toFixed(3)}x (target >= 0.7 x ${f.cores} cores = ${target.toFixed(1)}x on an idle machine): ${s >= target ? 'met' : 'NOT met'}; ` +
    `surface factors identical: ${f.identical ? 'yes' : 'NO'}\n` +
    `view-factor pool, from an edit to the factors filed (the page drawing and saving the edit meanwhile): ${f.one.toFixed(0)} and ${f.many.toFixed(0)} ms, ${(f.one / f.many).toFixed(3)}x (information)\n` +
    `view-factor pool, the machine now: a plain loop in one worker ${c.alone.toFixed(0)} ms, in ${f.cores} at once ${c.together.toFixed(0)} ms: ` +
    `no pool could gain more than ${c.ceiling.toFixed(2)}x over ${f.cores} workers now (information)`
  );
}
