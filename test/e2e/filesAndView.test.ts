// Files and view in chromium: save and open, drop a file, a bad file leaves the
// sketch alone, zoom around the pointer and pan, the quick shapes.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import {
  dragOnCanvas,
  dropFile,
  screenOf as screenPoint,
  startApp,
  type App,
  type TestWindow,
  waitReady,
} from './harness';
import type { SketchFile } from '../../src/state/sketchFile';

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

const state = () =>
  page.evaluate(() => {
    const s = (window as unknown as TestWindow).__tautline.store.getState();
    return { doc: s.doc, camera: s.camera };
  });

const screenOf = (x: number, y: number) => screenPoint(page, x, y);

describe('files and view', () => {
  it('saves the sketch file and opens it again; a bad file changes nothing and says why', async () => {
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Save' }).click(),
    ]);
    const text = readFileSync(await download.path(), 'utf8');
    const saved = JSON.parse(text) as SketchFile;
    expect(saved.version).toBe(2); // the app writes the current file version
    expect(saved.shapes).toHaveLength(5);
    const before = (await state()).doc;
    await page.locator('input[type=file]').setInputFiles({
      name: 'broken.json',
      mimeType: 'application/json',
      buffer: Buffer.from('{"version": 7, "units": "m", "shapes": []}'),
    });
    await expect
      .poll(() => page.getByRole('alert').first().innerText())
      .toMatch(/Could not open "broken\.json".*version/s);
    expect((await state()).doc).toEqual(before);
    await page.getByRole('button', { name: 'New' }).click();
    await page
      .locator('input[type=file]')
      .setInputFiles({ name: 'oven.json', mimeType: 'application/json', buffer: Buffer.from(text) });
    await expect.poll(async () => (await state()).doc.shapes.length).toBe(5);
    expect((await state()).doc.shapes[0].points).toEqual(before.shapes[0].points);
  });

  it('opens a sketch file dropped on the page', async () => {
    const dropped = JSON.stringify({
      version: 1,
      units: 'mm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [300, 0],
            [300, 100],
            [0, 100],
          ],
          surface: 'duct',
        },
      ],
    });
    await dropFile(page, 'duct.json', dropped);
    await expect.poll(async () => (await state()).doc.units).toBe('mm');
    await waitReady(page);
    expect(
      await page
        .getByRole('table', { name: /view factor/i })
        .getByRole('rowheader')
        .count(),
    ).toBe(1);
  });

  it('zooms around the pointer with the wheel and pans by dragging empty space', async () => {
    const box = (await page.locator('.canvas-box').boundingBox())!;
    // Whole pixels: wheel events carry integer client coordinates.
    const px = Math.round(box.x + box.width * 0.6);
    const py = Math.round(box.y + box.height * 0.4);
    const c0 = (await state()).camera;
    const under = [(px - box.x - c0.originX) / c0.scale, (c0.originY - (py - box.y)) / c0.scale];
    await page.mouse.move(px, py);
    await page.mouse.wheel(0, -300);
    await expect.poll(async () => (await state()).camera.scale).toBeGreaterThan(c0.scale * 1.2);
    const c1 = (await state()).camera;
    expect((px - box.x - c1.originX) / c1.scale).toBeCloseTo(under[0], 6);
    expect((c1.originY - (py - box.y)) / c1.scale).toBeCloseTo(under[1], 6);
    // Pan: empty space outside the duct, near the canvas corner.
    await page.mouse.move(box.x + 8, box.y + 8);
    await page.mouse.down();
    await page.mouse.move(box.x + 68, box.y + 48, { steps: 3 });
    await page.mouse.up();
    const c2 = (await state()).camera;
    expect(c2.originX - c1.originX).toBeCloseTo(60, 6);
    expect(c2.originY - c1.originY).toBeCloseTo(40, 6);
    await page.keyboard.press('f');
    await expect.poll(async () => (await state()).camera.scale).not.toBe(c2.scale);
  });

  it('draws a tube with the Tube tool (an exact circle) and a rectangle with two clicks', async () => {
    await page.getByRole('button', { name: /^Tube/ }).click();
    await dragOnCanvas(page, [80, 50], [100, 50], 4);
    await expect.poll(async () => (await state()).doc.shapes.length).toBe(2);
    const tube = (await state()).doc.shapes[1];
    expect(tube.kind).toBe('solid');
    // Centre where the drag began (snapped to the grid), radius as dragged: 20 units within a
    // pixel of pointer rounding (the radius is not snapped).
    expect(tube.circle?.center).toEqual([80, 50]);
    expect(Math.abs((tube.circle?.radius ?? 0) - 20)).toBeLessThan(1e-6 * 20 + 1);
    expect(tube.surface).toBe('tube 1');
    await page.getByRole('button', { name: /^Rectangle/ }).click();
    const [ax, ay] = await screenOf(180, 30);
    const [bx, by] = await screenOf(220, 70);
    await page.mouse.click(ax, ay);
    await page.mouse.move(bx, by, { steps: 2 });
    await page.mouse.click(bx, by);
    await expect.poll(async () => (await state()).doc.shapes.length).toBe(3);
    await waitReady(page);
    // The tube and the rectangle are one surface each; a circle's arcs come after every polygon edge (README).
    const rows = await page
      .getByRole('table', { name: /view factor/i })
      .getByRole('rowheader')
      .allInnerTexts();
    expect(rows.map((r) => r.replace(/^\d+\s*/, '')).slice(-2)).toEqual(['body 1', 'tube 1']);
  });
});
