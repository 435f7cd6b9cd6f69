// Issue 10 end to end in headless chromium: a furnace section built from an
// empty sketch with the keyboard and pointer as a user would (a box with a
// fired floor, an adiabatic roof, an opening, and a row of four 114.3 mm tubes
// at 0.3 m pitch, their centre line 0.25 m below the roof), counting actions
// (one click, one key press of a command, or one value typed and confirmed).
// The saved file is then run through the command line, and the app's net heat
// table must show the same numbers.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync, readFileSync } from 'node:fs';
import type { Locator, Page } from 'playwright-core';
import { startApp, type App, type TestWindow, waitReady } from './harness';
import { main } from '../../src/cli/main';
import type { CliIO } from '../../src/cli/io';

let app: App;
let page: Page;
const errors: string[] = [];
let actions = 0;

beforeAll(async () => {
  app = await startApp();
  page = await app.context.newPage();
  page.on('pageerror', (e) => errors.push(e.message));
  await page.goto(app.url);
  await waitReady(page);
}, 180_000);

afterAll(async () => {
  await app?.close();
});

/** One click. */
async function click(target: Locator) {
  actions++;
  await target.click();
}
/** One key press of a command. */
async function press(key: string) {
  actions++;
  await page.keyboard.press(key);
}
/** One value typed at the canvas and confirmed with Enter. */
async function typeValue(text: string) {
  actions++;
  await page.keyboard.type(text);
  await page.keyboard.press('Enter');
}
/** One value typed into a field and confirmed with Enter. */
async function fill(field: Locator, text: string) {
  actions++;
  await field.fill(text);
  await field.press('Enter');
}
/** One choice in a list. */
async function choose(select: Locator, value: string) {
  actions++;
  await select.selectOption(value);
}

const docOf = () => page.evaluate(() => (window as unknown as TestWindow).__tautline.store.getState().doc);
const solved = () =>
  page.waitForFunction(
    () => document.querySelector('[data-exchange-status]')?.getAttribute('data-exchange-status') === 'solved',
  );

describe('a furnace section in minutes', () => {
  it('builds the section from an empty sketch in at most 30 actions, every dimension exact', async () => {
    await click(page.getByRole('button', { name: 'New' }));
    expect((await docOf()).shapes).toEqual([]);

    // The box: first corner, then each side by length and angle; Enter finishes.
    await press('e');
    await typeValue('0,0');
    await typeValue('2.4,0');
    await typeValue('1.5,90');
    await typeValue('2.4,180');
    await press('Enter');

    // The first tube: centre 0.25 m below the roof, diameter 114.3 mm, not snapped to the grid.
    await press('t');
    await typeValue('0.75,1.25');
    await typeValue('0.1143');

    // It is held at 900 K; the properties panel follows the selected tube.
    await click(page.getByRole('tab', { name: 'Heat exchange' }));
    const surface = page.getByLabel('surface', { exact: true });
    await expect.poll(() => surface.inputValue()).toBe('tube 1');
    await choose(page.getByLabel('condition', { exact: true }), 'temperature');
    await fill(page.getByLabel('temperature (K)', { exact: true }), '900');

    // Three more at 0.3 m pitch to the right (the copies keep the tube's properties).
    await click(page.getByRole('tab', { name: 'Edit' }));
    await click(page.getByRole('button', { name: 'Repeat' }));

    // The fired floor at 1250 K, the left wall an opening to surroundings at 300 K.
    await click(page.getByRole('tab', { name: 'Heat exchange' }));
    await choose(surface, 'floor');
    await choose(page.getByLabel('condition', { exact: true }), 'temperature');
    await fill(page.getByLabel('temperature (K)', { exact: true }), '1250');
    await choose(surface, 'left wall');
    await choose(page.getByLabel('condition', { exact: true }), 'opening');
    await fill(page.getByLabel('surroundings temperature (K)', { exact: true }), '300');

    const doc = await docOf();
    expect(doc.shapes[0].points).toEqual([
      [0, 0],
      [2.4, 0],
      [2.4, 1.5],
      [0, 1.5],
    ]);
    expect(doc.shapes[0].surface).toEqual(['floor', 'right wall', 'roof', 'left wall']);
    expect(doc.shapes.slice(1).map((s) => s.surface)).toEqual(['tube 1', 'tube 2', 'tube 3', 'tube 4']);
    doc.shapes.slice(1).forEach((tube, k) => {
      const cx = [0.75, 1.05, 1.35, 1.65][k];
      for (const [x, y] of tube.points) expect(Math.hypot(x - cx, y - 1.25)).toBeCloseTo(0.1143 / 2, 9);
    });
    expect(doc.surfaces!['tube 4'].temperature).toBe(900);
    expect(actions).toBeLessThanOrEqual(30);
  }, 120_000);

  it("saves the file, and the app's net heat table equals the command line's on that file", async () => {
    await solved();
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      click(page.getByRole('button', { name: 'Save' })),
    ]);
    expect(actions).toBeLessThanOrEqual(30);
    const text = readFileSync(await download.path(), 'utf8');
    let out = '';
    const io: CliIO = {
      out: (t) => void (out += t),
      err: (t) => void (out += t),
      readFile: () => text,
    };
    expect(main(['exchange', '--json', 'section.json'], io)).toBe(0);
    const cli = JSON.parse(out) as { surfaces: { name: string; netHeat: number }[] };
    expect(cli.surfaces.map((s) => s.name)).toEqual([
      'floor',
      'right wall',
      'roof',
      'left wall',
      'tube 1',
      'tube 2',
      'tube 3',
      'tube 4',
    ]);
    for (const s of cli.surfaces) {
      const cell = page.locator(`.exchange-table tr[data-surface="${s.name}"] td:nth-of-type(4)`);
      const shown = Number(await cell.getAttribute('data-value'));
      // The same exact view factors and the same solver: equal to rounding.
      expect(Math.abs(shown - s.netHeat)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(s.netHeat)));
    }
    // The tubes take up heat and the floor gives it (signs: positive leaves the surface).
    expect(cli.surfaces[0].netHeat).toBeGreaterThan(0);
    for (const s of cli.surfaces.slice(4)) expect(s.netHeat).toBeLessThan(0);
    expect(errors).toEqual([]);
  }, 120_000);

  it('fits 1366 x 768: the toolbar on one row, the drawing steady as panels change, table and chart without page scroll', async () => {
    const tops = await page
      .locator('.toolbar > *')
      .evaluateAll((els) => els.map((e) => Math.round(e.getBoundingClientRect().top)));
    const toolbar = (await page.locator('.toolbar').boundingBox())!;
    // One row: every item starts within a few pixels of the first, and the bar is one control high.
    for (const t of tops) expect(Math.abs(t - tops[0])).toBeLessThanOrEqual(6);
    expect(toolbar.height).toBeLessThan(48);
    // Nothing hidden past its right end (the tube tool, active here, has the most settings).
    const [scrollW, clientW] = await page.locator('.toolbar').evaluate((e) => [e.scrollWidth, e.clientWidth]);
    expect(scrollW).toBeLessThanOrEqual(clientW);
    const canvas = async () => page.locator('.canvas-box').boundingBox();
    const first = await canvas();
    for (const tab of ['Edit', 'Surfaces', 'Sketch', 'Heat exchange']) {
      await page.getByRole('tab', { name: tab }).click();
      expect(await canvas()).toEqual(first);
    }
    await page.getByRole('img', { name: /bar chart of net heat/i }).scrollIntoViewIfNeeded();
    await page.locator('.exchange-table').scrollIntoViewIfNeeded();
    const scroll = await page.evaluate(() => [window.scrollY, document.documentElement.scrollHeight, innerHeight]);
    expect(scroll[0]).toBe(0);
    expect(scroll[1]).toBeLessThanOrEqual(scroll[2]);
    // The caution's sentence about codes and licensed practice stands once on screen.
    const said = await page
      .getByText(/licensed engineering practice/i)
      .evaluateAll((els) => els.filter((e) => (e as HTMLElement).offsetParent !== null).length);
    mkdirSync('test-artifacts', { recursive: true });
    await page.screenshot({ path: 'test-artifacts/section.png' });
    expect(said).toBe(1);
  });
});
