// The large-sketch drags of the browser benchmark (test/bench/browser.ts) on the
// 1012-edge sketch of bigSketch.ts: one tube is dragged for a few seconds, the
// pointer moving on every animation frame, not waiting for anything, as a hand does.
import type { Page } from 'playwright-core';
import type { SketchFile } from '../../src/state/sketchFile';
import { dropFile, screenOf, waitReady, type TestWindow } from '../e2e/harness';
import { tubeScene } from './scenes';

export { bigSketch } from './bigSketch';

/**
 * The drag-size scene of `npm run bench` (scenes.ts: 6 bodies of 22 sides in a box of
 * 18 wall edges, seed 42) as a sketch file, every edge a surface; `body` is the
 * centre of its first body (sketch units).
 */
export function dragSizeSketch(): { sketch: SketchFile; body: [number, number]; edges: number } {
  const scene = tubeScene(42, 6, 22, 18);
  let edges = 0;
  const shapes = scene.polygons.map((p, s) => {
    const points: [number, number][] = [];
    for (let k = 0; k < p.points.length; k += 2) points.push([p.points[k], p.points[k + 1]]);
    edges += points.length;
    return { kind: p.kind, points, surface: points.map((_, k) => `s${s + 1}.${k + 1}`) };
  });
  const first = shapes[1].points;
  const body: [number, number] = [
    first.reduce((x, q) => x + q[0], 0) / first.length,
    first.reduce((y, q) => y + q[1], 0) / first.length,
  ];
  return { sketch: { version: 2, units: 'm', shapes }, body, edges };
}

type DragWindow = TestWindow & {
  __drag: {
    moves: number;
    tables: number;
    frames: number[];
    shown: number[];
    lastDoc: unknown;
    on: boolean;
    at: number;
    handler: number[];
    drawMs: number;
  };
  Konva?: { Layer: { prototype: { drawScene: (...a: unknown[]) => unknown } } };
};

/** Open `sketch` as a dropped file and wait for its first results. */
export async function openSketch(page: Page, sketch: SketchFile): Promise<void> {
  await dropFile(page, 'bench.json', JSON.stringify(sketch));
  await page.waitForFunction(
    (names) =>
      JSON.stringify((window as unknown as TestWindow).__tautline.store.getState().doc.shapes[0]?.surface) === names,
    JSON.stringify(sketch.shapes[0].surface),
    { timeout: 120_000 },
  );
  await waitReady(page, 120_000);
}

export interface FollowFigures {
  seconds: number;
  /** Pointer moves the page received, per second. */
  movesPerSecond: number;
  /** Matrix-table updates per second (one per React commit that touched the table). */
  tablesPerSecond: number;
  /** Animation frames per second while dragging. */
  framesPerSecond: number;
  /** Frames per second in which the canvas showed a newer drag position than the frame before. */
  followPerSecond: number;
  /** Longest gap between two animation frames, ms. */
  longestFrameMs: number;
  /** Median time the page spends handling one pointer move (tool, store, results stage, React render), ms. */
  handlerMs: number;
  /** Time konva spends drawing layers, per frame that showed a new position, ms. */
  drawMs: number;
}

/**
 * Drag the tube at sketch point `at` for `seconds`, one pointer move per animation
 * frame back and forth along x (±0.3 sketch units), then undo the drag.
 */
export async function followDrag(
  page: Page,
  at: [number, number],
  seconds: number,
  sweep = 0.3,
): Promise<FollowFigures> {
  await page.evaluate(() => {
    const w = window as unknown as DragWindow;
    const d: DragWindow['__drag'] = (w.__drag = {
      moves: 0,
      tables: 0,
      frames: [],
      shown: [],
      lastDoc: null,
      on: true,
      at: 0,
      handler: [],
      drawMs: 0,
    });
    // Capture on the way down, bubble on the way up: between them run the canvas's own handlers.
    window.addEventListener(
      'pointermove',
      () => {
        d.moves++;
        d.at = performance.now();
      },
      true,
    );
    window.addEventListener('pointermove', () => d.handler.push(performance.now() - d.at));
    const layer = w.Konva?.Layer.prototype;
    if (layer) {
      const draw = layer.drawScene;
      layer.drawScene = function (this: unknown, ...a: unknown[]) {
        const t = performance.now();
        const r = draw.apply(this, a);
        d.drawMs += performance.now() - t;
        return r;
      };
    }
    new MutationObserver(() => d.tables++).observe(document.querySelector('.matrix-scroll')!, {
      subtree: true,
      childList: true,
      characterData: true,
    });
    // Assigned into an array, not to a name: the bench's loader would wrap a named function in a helper the page lacks.
    const frame: ((t: number) => void)[] = [];
    frame[0] = (t: number) => {
      if (!d.on) return;
      d.frames.push(t);
      // What the canvas draws in this frame (React commits before paint): the drag's
      // newest position, which the document takes once the pipeline is free.
      const st = w.__tautline.store.getState();
      const doc = st.gesturePreview ?? st.doc;
      if (doc !== d.lastDoc) d.shown.push(t);
      d.lastDoc = doc;
      requestAnimationFrame(frame[0]);
    };
    requestAnimationFrame(frame[0]);
  });
  // Snapping off, so every pointer move moves the tube.
  await page.getByRole('checkbox', { name: 'snap' }).uncheck();
  const [sx, sy] = await screenOf(page, ...at);
  const px = (await screenOf(page, at[0] + sweep, at[1]))[0] - sx;
  await page.mouse.move(sx, sy);
  await page.mouse.down();
  const start = await page.evaluate(() => {
    const d = (window as unknown as DragWindow).__drag;
    d.moves = 0;
    d.tables = 0;
    d.frames = [];
    d.shown = [];
    d.handler = [];
    d.drawMs = 0;
    return performance.now();
  });
  // The page moves the pointer once per animation frame to where a hand would be
  // by then, as the browser delivers a held mouse's moves (coalesced, one per
  // frame): a busy page gets fewer moves, never a queue of stale ones. Driving
  // every move from here instead would wait a round trip per move and cap the rate.
  await page.evaluate(
    ([x0, y0, span, ms]) => {
      const w = window as unknown as DragWindow;
      const target = document.querySelector('.konvajs-content')!;
      const began = performance.now();
      const step: ((t: number) => void)[] = [];
      step[0] = () => {
        const t = performance.now() - began;
        if (t > ms) return;
        // A triangle wave, 2 s per period: the tube sweeps ±sweep around its place.
        const phase = (t % 2000) / 2000;
        const x = phase < 0.5 ? -1 + 4 * phase : 3 - 4 * phase;
        const init = { clientX: x0 + x * span, clientY: y0, buttons: 1, pointerId: 1, pointerType: 'mouse' };
        target.dispatchEvent(new PointerEvent('pointermove', { ...init, bubbles: true, cancelable: true }));
        if (w.__drag.on) requestAnimationFrame(step[0]);
      };
      requestAnimationFrame(step[0]);
    },
    [sx, sy, px, seconds * 1000] as const,
  );
  await new Promise((r) => setTimeout(r, seconds * 1000 + 50));
  const d = await page.evaluate((from) => {
    const w = (window as unknown as DragWindow).__drag;
    w.on = false;
    const now = performance.now();
    let longest = 0;
    for (let k = 1; k < w.frames.length; k++) longest = Math.max(longest, w.frames[k] - w.frames[k - 1]);
    const h = [...w.handler].sort((a, b) => a - b);
    return {
      s: (now - from) / 1000,
      moves: w.moves,
      tables: w.tables,
      frames: w.frames.length,
      shown: w.shown.length,
      longest,
      handler: h[Math.floor(h.length / 2)] ?? 0,
      draw: w.drawMs / Math.max(1, w.shown.length),
    };
  }, start);
  await page.mouse.up();
  await page.keyboard.press('Control+z');
  await page.getByRole('checkbox', { name: 'snap' }).check();
  return {
    seconds: d.s,
    movesPerSecond: d.moves / d.s,
    tablesPerSecond: d.tables / d.s,
    framesPerSecond: d.frames / d.s,
    followPerSecond: d.shown / d.s,
    longestFrameMs: d.longest,
    handlerMs: d.handler,
    drawMs: d.draw,
  };
}
