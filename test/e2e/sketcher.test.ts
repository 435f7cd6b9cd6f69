// The sketcher end to end in headless chromium: demo, drawing with the mouse,
// dragging, undo, CSV export, reload.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync, readFileSync } from 'node:fs';
import Papa from 'papaparse';
import type { Page } from 'playwright-core';
import { dragOnCanvas, screenOf as screenPoint, startApp, type App, type TestWindow, waitReady } from './harness';
import { runFactors } from '../../src/cli/factorsCommand';
import { documentApi } from '../../src/state/documentApi';

let app: App;
let page: Page;

beforeAll(async () => {
  app = await startApp();
  page = await app.context.newPage();
  page.on('pageerror', (e) => console.error('page error:', e.message));
  await page.goto(app.url);
}, 180_000);

afterAll(async () => {
  await app?.close();
});

const screenOf = (x: number, y: number) => screenPoint(page, x, y);

const table = () => page.getByRole('table', { name: /view factor/i });
const tableText = () => table().locator('tbody').innerText();
const docOf = () => page.evaluate(() => (window as unknown as TestWindow).__tautline.store.getState().doc);

/** The page with a counter of changes to the view-factor table, put there by the drag test. */
type ProbeWindow = TestWindow & { __changes: number };
const status = () => page.locator('[data-status]').getAttribute('data-status');

describe('sketcher in chromium', () => {
  it('opens the demo with its matrix, fits 1366 x 768 without horizontal scrolling, and saves a screenshot', async () => {
    await waitReady(page);
    await expect.poll(() => table().getByRole('rowheader').count()).toBe(7);
    expect(await tableText()).toContain('fired floor');
    const [scrollW, clientW] = await page.evaluate(() => [
      document.documentElement.scrollWidth,
      document.documentElement.clientWidth,
    ]);
    expect(scrollW).toBeLessThanOrEqual(clientW);
    const tableBox = (await page.locator('.matrix-scroll').boundingBox())!;
    expect(tableBox.x + tableBox.width).toBeLessThanOrEqual(1366);
    mkdirSync('test-artifacts', { recursive: true });
    await page.screenshot({ path: 'test-artifacts/demo.png' });
  });

  it('a drag updates the table as the shape moves, and the whole drag is one undo step', async () => {
    // Latency is measured by `npm run bench:browser`, not asserted here.
    await page.evaluate(() => {
      const w = window as unknown as ProbeWindow;
      w.__changes = 0;
      new MutationObserver(() => {
        w.__changes++;
      }).observe(document.querySelector('.matrix-scroll')!, { subtree: true, childList: true, characterData: true });
    });
    const before = await tableText();
    // Snapping off, so every pointer move changes the geometry.
    await page.getByRole('checkbox', { name: 'snap' }).uncheck();
    const [sx, sy] = await screenOf(2.1, 1.5); // a roof corner of the oven
    await page.mouse.move(sx, sy);
    await page.mouse.down();
    for (let i = 1; i <= 10; i++) {
      const changes = await page.evaluate(() => (window as unknown as ProbeWindow).__changes);
      await page.mouse.move(sx + i * 2, sy - i);
      // The table follows each move while the button is still down.
      await page.waitForFunction((c) => (window as unknown as ProbeWindow).__changes > c, changes, { timeout: 10000 });
    }
    await page.mouse.up();
    await page.getByRole('checkbox', { name: 'snap' }).check();
    await waitReady(page);
    expect(await tableText()).not.toBe(before);
    await page.keyboard.press('Control+z');
    await waitReady(page);
    expect(await tableText()).toBe(before);
  });

  it('draws an enclosure with the mouse, drags a vertex, undoes, exports CSV and restores after reload', async () => {
    await page.getByRole('button', { name: 'New' }).click();
    await expect.poll(status).toBe('empty');
    await page.getByRole('button', { name: /^Enclosure/ }).click();
    // A 2 m x 1 m rectangle, clicked corner by corner (snapped to the 0.1 m grid), closed on the first point.
    for (const [x, y] of [
      [0, 0],
      [2, 0],
      [2, 1],
      [0, 1],
      [0, 0],
    ]) {
      const [px, py] = await screenOf(x + 0.01, y - 0.01);
      await page.mouse.click(px, py);
    }
    await waitReady(page);
    const heads = await table().getByRole('rowheader').allInnerTexts();
    // A drawn shape is one surface per side, named by where it is.
    expect(heads.map((h) => h.replace(/^\d+\s*/, ''))).toEqual(['floor', 'right wall', 'roof', 'left wall']);
    const drawn = await tableText();

    // Drag the corner (2, 1) to (2, 1.5) with the select tool.
    await page.getByRole('button', { name: /^Select/ }).click();
    const [ax, ay] = await screenOf(2, 1);
    const [bx, by] = await screenOf(2, 1.5);
    await page.mouse.move(ax, ay);
    await page.mouse.down();
    await page.mouse.move((ax + bx) / 2, (ay + by) / 2);
    await page.mouse.move(bx, by);
    await page.mouse.up();
    await waitReady(page);
    expect((await docOf()).shapes[0].points[2]).toEqual([2, 1.5]);
    expect(await tableText()).not.toBe(drawn);
    await page.getByRole('button', { name: 'Undo' }).click();
    await waitReady(page);
    expect(await tableText()).toBe(drawn);

    // CSV: floor to roof of a 2 x 1 rectangle by crossed strings,
    // (sqrt(w^2 + h^2) - h) / w with w = 2, h = 1 (Hottel's crossed-strings method;
    // Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., sec. 13.1.4).
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: /CSV/ }).click(),
    ]);
    const csv = readFileSync(await download.path(), 'utf8');
    const rows = Papa.parse<string[]>(csv.trim(), { newline: '\r\n' }).data;
    expect(rows[0]).toEqual(['from \\ to', 'floor', 'right wall', 'roof', 'left wall']);
    const F = rows.slice(1).map((r) => r.slice(1).map(Number));
    expect(Math.abs(F[0][2] - (Math.sqrt(5) - 1) / 2)).toBeLessThan(1e-12);
    // Floor to a side wall: (w + h - sqrt(w^2 + h^2)) / (2 w), same source.
    expect(Math.abs(F[0][1] - (3 - Math.sqrt(5)) / 4)).toBeLessThan(1e-12);
    for (const row of F) expect(Math.abs(row.reduce((a, b) => a + b, 0) - 1)).toBeLessThan(1e-12);
    // The same text as the command line's --csv for the same sketch.
    const doc = await docOf();
    let cli = '';
    runFactors(['s.json', '--csv'], {
      out: (t) => {
        cli += t;
      },
      err: () => {},
      readFile: () => documentApi.serialize(doc),
    });
    expect(csv).toBe(cli);

    // Reload: the autosave brings the drawn sketch back, not the demo.
    await page.reload();
    await waitReady(page);
    expect(await tableText()).toBe(drawn);
    expect((await docOf()).shapes[0].points).toEqual([
      [0, 0],
      [2, 0],
      [2, 1],
      [0, 1],
    ]);
  });

  it('marks a body dragged through the wall as invalid and keeps the drawing', async () => {
    await page.getByRole('button', { name: /^Rectangle/ }).click();
    await dragOnCanvas(page, [0.8, 0.3], [1.2, 0.7], 4);
    await waitReady(page);
    // The enclosure's four sides and the new body, one surface ("body 1").
    expect(await table().getByRole('rowheader').allInnerTexts()).toHaveLength(5);
    expect((await table().getByRole('rowheader').allInnerTexts()).at(-1)).toMatch(/body 1$/);
    await page.getByRole('button', { name: /^Select/ }).click();
    await dragOnCanvas(page, [1.0, 0.5], [1.0, 1.0], 3);
    await expect.poll(status).toBe('invalid');
    expect(await page.locator('.canvas-status').innerText()).toMatch(/Geometry problem: 'body 1' \(body, shape 2\)/);
    expect(await page.locator('[data-status]').innerText()).toMatch(/last valid sketch/);
    expect((await docOf()).shapes).toHaveLength(2);
    await page.keyboard.press('Control+z');
    await waitReady(page);
  });
});
