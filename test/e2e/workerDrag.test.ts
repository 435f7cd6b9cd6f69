// A drag computed by the worker pool in chromium: jobs too big for the page go to
// the workers (one core left to the page during the drag), answers are paced and
// retired answers' surface matrices reused. After the release, the factors must be
// exactly those of the same sketch opened afresh: the exported CSV, byte for byte.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { screenOf, startApp, type App, type TestWindow, waitReady } from './harness';
import type { SketchFile } from '../../src/state/sketchFile';
import { cliJson, kiln } from '../cli/studyHelpers';

let app: App;
let page: Page;

beforeAll(async () => {
  app = await startApp();
  page = await app.context.newPage();
  await page.goto(app.url);
  await waitReady(page);
}, 180_000);

afterAll(async () => {
  await app?.close();
});

/**
 * A 6 x 3 box of 64 wall edges, each its own surface, holding 8 tubes drawn as
 * 32-gons: 320 edges (51 360 pairs, past what the page computes itself) and 72
 * surfaces (a surface matrix past the size the page reuses).
 */
function section(): SketchFile {
  const corners = [
    [0, 0],
    [6, 0],
    [6, 3],
    [0, 3],
  ];
  const wall: [number, number][] = [];
  for (let c = 0; c < 4; c++) {
    const [x0, y0] = corners[c];
    const [x1, y1] = corners[(c + 1) % 4];
    for (let k = 0; k < 16; k++) wall.push([x0 + ((x1 - x0) * k) / 16, y0 + ((y1 - y0) * k) / 16]);
  }
  const tubes = [1, 2.3, 3.6, 4.9].flatMap((cx) => [1, 2].map((cy) => [cx, cy] as const));
  return {
    version: 2,
    units: 'm',
    shapes: [
      { kind: 'enclosure', points: wall, surface: wall.map((_, k) => `wall ${k + 1}`) },
      ...tubes.map(([cx, cy], t) => ({
        kind: 'solid' as const,
        points: Array.from({ length: 32 }, (_, k): [number, number] => {
          const a = (2 * Math.PI * k) / 32;
          return [cx + 0.3 * Math.cos(a), cy + 0.3 * Math.sin(a)];
        }),
        surface: `tube ${t + 1}`,
      })),
    ],
  };
}

async function open(sketch: SketchFile) {
  await page.evaluate((content) => {
    const w = window as unknown as TestWindow & { __before: unknown };
    w.__before = w.__tautline.store.getState().doc;
    const dt = new DataTransfer();
    dt.items.add(new File([content], 'section.json', { type: 'application/json' }));
    window.dispatchEvent(new DragEvent('dragover', { dataTransfer: dt, bubbles: true, cancelable: true }));
    window.dispatchEvent(new DragEvent('drop', { dataTransfer: dt, bubbles: true, cancelable: true }));
  }, JSON.stringify(sketch));
  await page.waitForFunction(() => {
    const w = window as unknown as TestWindow & { __before: unknown };
    return w.__tautline.store.getState().doc !== w.__before;
  });
  await waitReady(page);
}

/** What the test reads of Konva, the canvas library, which puts itself on `window`. */
interface KonvaGlobal {
  stages: { find(selector: string): { text(): string; getAbsolutePosition(): { x: number; y: number } }[] }[];
}

/** Screen positions of the canvas labels that read `name`. */
function labelOf(name: string) {
  return page.evaluate((n) => {
    const w = window as unknown as { Konva: KonvaGlobal };
    return w.Konva.stages[0]
      .find('Text')
      .filter((t) => t.text() === n)
      .map((t) => t.getAbsolutePosition());
  }, name);
}

async function exportedCsv(): Promise<string> {
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: /CSV/ }).click(),
  ]);
  return readFileSync(await download.path(), 'utf8');
}

describe('a drag computed by the worker pool', () => {
  it('updates the table while the tube moves and ends with the factors of the final sketch, byte for byte', async () => {
    await open(section());
    const before = await exportedCsv();
    await page.evaluate(() => {
      const w = window as unknown as TestWindow & { __changes: number };
      w.__changes = 0;
      new MutationObserver(() => {
        w.__changes++;
      }).observe(document.querySelector('.matrix-scroll')!, { subtree: true, childList: true, characterData: true });
    });
    await page.getByRole('checkbox', { name: 'snap' }).uncheck();
    const label0 = await labelOf('tube 3');
    expect(label0).toHaveLength(1);
    const [sx, sy] = await screenOf(page, 2.3, 1.05); // inside tube 3 (centre 2.3, 1)
    await page.mouse.move(sx, sy);
    await page.mouse.down();
    for (let i = 1; i <= 40; i++) {
      await page.mouse.move(sx + i, sy - i / 4);
      await page.waitForTimeout(15);
    }
    // The table followed the tube while the button was still down.
    await page.waitForFunction(() => (window as unknown as { __changes: number }).__changes > 0, null, {
      timeout: 10000,
    });
    // The tube's name follows it, laid out once and shifted as one group: moved by the tube's shift on screen.
    const { label, shift } = await page.evaluate(() => {
      const w = window as unknown as TestWindow & { Konva: KonvaGlobal };
      const s = w.__tautline.store.getState();
      const now = (s.gesturePreview ?? s.doc).shapes[3].points[0];
      const then = s.gestureBase!.shapes[3].points[0];
      const texts = w.Konva.stages[0].find('Text').filter((t) => t.text() === 'tube 3');
      return {
        label: texts.map((t) => t.getAbsolutePosition()),
        shift: [(now[0] - then[0]) * s.camera.scale, -(now[1] - then[1]) * s.camera.scale],
      };
    });
    expect(label).toHaveLength(1);
    expect(Math.hypot(shift[0], shift[1])).toBeGreaterThan(5);
    expect(label[0].x - label0[0].x).toBeCloseTo(shift[0], 3);
    expect(label[0].y - label0[0].y).toBeCloseTo(shift[1], 3);
    await page.mouse.up();
    await page.getByRole('checkbox', { name: 'snap' }).check();
    await waitReady(page);
    const dragged = await exportedCsv();
    expect(dragged).not.toBe(before);
    // The final sketch opened afresh: no kept rows, no reused matrix, all cores.
    const final = await page.evaluate(() => (window as unknown as TestWindow).__tautline.store.getState().doc);
    await open(section()); // something else first, so the final sketch is a new geometry
    await open(final);
    expect(await exportedCsv()).toBe(dragged);
  }, 120_000);
});

describe('a sweep that moves a shape, shared over workers', () => {
  it('runs its 12 cases in one worker per core but the page (3 of 4), and shows what sweep --json prints', async () => {
    // A page that believes it has 4 cores, and counts the workers it starts.
    const p = await app.context.newPage();
    await p.addInitScript(() => {
      Object.defineProperty(navigator, 'hardwareConcurrency', { get: () => 4 });
      const Base = window.Worker;
      const made: string[] = [];
      (window as unknown as { __made: string[] }).__made = made;
      window.Worker = class extends Base {
        constructor(url: string | URL, options?: WorkerOptions) {
          super(url, options);
          made.push(String(url));
        }
      };
    });
    await p.goto(app.url);
    await waitReady(p);
    await p.evaluate((content) => {
      const dt = new DataTransfer();
      dt.items.add(new File([content], 'kiln.json', { type: 'application/json' }));
      window.dispatchEvent(new DragEvent('drop', { dataTransfer: dt, bubbles: true, cancelable: true }));
    }, JSON.stringify(kiln()));
    await p.getByRole('tab', { name: 'What if' }).click();
    await p.getByRole('combobox', { name: /vary/i }).selectOption("position x of the shape of 'ware stack.2' (m)");
    await p.getByRole('textbox', { name: /^from/i }).fill('1.2');
    await p.getByRole('textbox', { name: /^to/i }).fill('1.8');
    await p.getByRole('textbox', { name: /^steps/i }).fill('12');
    const made = () => p.evaluate(() => (window as unknown as { __made: string[] }).__made.length);
    const before = await made();
    await p.getByRole('button', { name: 'Run' }).click();
    const table = p.getByRole('table', { name: 'Study results per value' });
    await table.waitFor();
    expect((await made()) - before).toBe(3);
    const argv = ['sweep', 'k.json', '--vary', 'ware stack.2.x', '--from', '1.2', '--to', '1.8', '--steps', '12'];
    const cli = cliJson({ 'k.json': kiln() }, ...argv) as { runs: { surfaces: { netHeat: number }[] }[] };
    const rows = await table.locator('tbody tr').all();
    expect(rows).toHaveLength(12);
    for (const [k, row] of rows.entries()) {
      const cells = (await row.locator('td').allInnerTexts()).map(Number);
      // Six figures, as the table shows them (Chromium and Node may differ in the last bits).
      expect(cells).toEqual(cli.runs[k].surfaces.map((s) => Number(s.netHeat.toPrecision(6))));
    }
    await p.close();
  });
});
