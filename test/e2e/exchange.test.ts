// The heat-exchange tab end to end in headless chromium: open it on the demo,
// set a temperature, see the net heat change, colour the canvas, reload and
// find the property kept (autosave).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { dropFile, startApp, type App, type TestWindow, waitReady } from './harness';

let app: App;
let page: Page;
const errors: string[] = [];

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

const results = () => page.getByRole('table', { name: /heat exchange per surface/i });
const netHeat = (surface: string) => page.locator(`.exchange-table tr[data-surface="${surface}"] td:nth-of-type(4)`);
const netHeatValue = async (surface: string) => Number(await netHeat(surface).getAttribute('data-value'));
const docOf = () => page.evaluate(() => (window as unknown as TestWindow).__tautline.store.getState().doc);

async function openTab() {
  await page.getByRole('tab', { name: 'Heat exchange' }).click();
  await results().waitFor();
  await page.waitForFunction(
    () => document.querySelector('[data-exchange-status]')?.getAttribute('data-exchange-status') === 'solved',
  );
}

describe('heat exchange in chromium', () => {
  it('sets the fired floor hotter and sees the tubes take up more heat', async () => {
    await openTab();
    await expect.poll(() => results().locator('tbody tr').count()).toBe(7);
    const floorBefore = await netHeatValue('fired floor');
    const tubeBefore = await netHeatValue('tube 1');
    const shownBefore = await netHeat('tube 1').innerText();
    expect(floorBefore).toBeGreaterThan(0);
    expect(tubeBefore).toBeLessThan(0);

    await page.getByLabel('surface', { exact: true }).selectOption('fired floor');
    const field = page.getByLabel('temperature (K)', { exact: true });
    await expect.poll(() => field.inputValue()).toBe('1250');
    await field.fill('1400');
    await field.press('Enter');

    expect((await docOf()).surfaces!['fired floor'].temperature).toBe(1400);
    await expect.poll(() => netHeat('tube 1').innerText()).not.toBe(shownBefore);
    expect(await netHeatValue('tube 1')).toBeLessThan(tubeBefore);
    expect(await netHeatValue('fired floor')).toBeGreaterThan(floorBefore);
    await expect.poll(() => page.getByRole('note', { name: /caution about these results/i }).isVisible()).toBe(true);
    expect(await page.getByRole('img', { name: /bar chart of net heat/i }).isVisible()).toBe(true);
  });

  it('colours the canvas by net flux with a legend, and fits 1366 x 768 without horizontal scrolling', async () => {
    await page.getByRole('radio', { name: 'net flux' }).check();
    const legend = page.getByLabel('Colour legend');
    await expect.poll(() => legend.innerText()).toMatch(/Net flux, W\/m²/);
    const [scrollW, clientW] = await page.evaluate(() => [
      document.documentElement.scrollWidth,
      document.documentElement.clientWidth,
    ]);
    expect(scrollW).toBeLessThanOrEqual(clientW);
    mkdirSync('test-artifacts', { recursive: true });
    await page.screenshot({ path: 'test-artifacts/exchange.png' });
  });

  it('undoes the edit with Ctrl+Z, and a reload keeps the last property (autosave)', async () => {
    const tubeAt1400 = await netHeatValue('tube 1');
    await page.locator('.canvas-box').click({ position: { x: 5, y: 5 } });
    await page.keyboard.press('Control+z');
    await expect.poll(async () => (await docOf()).surfaces!['fired floor'].temperature).toBe(1250);
    await expect.poll(() => netHeatValue('tube 1')).toBeGreaterThan(tubeAt1400);
    await page.keyboard.press('Control+Shift+z');
    await expect.poll(async () => (await docOf()).surfaces!['fired floor'].temperature).toBe(1400);
    await page.reload();
    await waitReady(page);
    await openTab();
    expect((await docOf()).surfaces!['fired floor'].temperature).toBe(1400);
    expect(await netHeatValue('tube 1')).toBe(tubeAt1400);
    expect(errors).toEqual([]);
  });

  it('solves a sketch of 340 surfaces in the exchange worker, then an edit of it', async () => {
    // A regular 340-gon enclosure, every wall its own surface, one held, the rest reradiating with
    // convection to a gas at the same temperature (so Newton's method, not one linear system):
    // every wall settles at that temperature (equilibrium, common practice).
    const n = 340;
    const points = Array.from({ length: n }, (_, k) => [
      Math.cos((2 * Math.PI * k) / n),
      Math.sin((2 * Math.PI * k) / n),
    ]);
    const sketch = {
      version: 1,
      units: 'm',
      shapes: [{ kind: 'enclosure', points, surface: points.map((_, k) => `wall ${k}`) }],
      surfaces: Object.fromEntries(
        points.map((_, k) => [`wall ${k}`, k === 0 ? { temperature: 800 } : { convectionCoefficient: 5 }]),
      ),
      settings: { gasTemperature: 800 },
    };
    await dropFile(page, 'ring.json', JSON.stringify(sketch));
    const temperatures = () =>
      page.evaluate(() => {
        const ex = (window as unknown as TestWindow).__tautline.store.getState().exchange;
        return ex.kind === 'solved' && !ex.stale && ex.names.length === 340 ? Array.from(ex.result.temperature) : null;
      });
    await expect.poll(temperatures, { timeout: 60_000 }).not.toBeNull();
    for (const T of (await temperatures())!) expect(Math.abs(T - 800)).toBeLessThanOrEqual(1e-9 * 800);
    // The solve ran in the exchange's own worker (its bundle was fetched), not on the page.
    const fetched = await page.evaluate(() => performance.getEntriesByType('resource').map((e) => e.name));
    expect(fetched.some((name) => /exchangeWorker/.test(name))).toBe(true);
    // Two edits of the held wall and the gas: the second is served by the worker's kept network
    // (after its first answer's arrays were handed over).
    for (const held of [900, 1000]) {
      await page.evaluate(
        (t) =>
          (window as unknown as TestWindow).__tautline.store.getState().edit((d) => ({
            ...d,
            surfaces: { ...d.surfaces, 'wall 0': { temperature: t } },
            settings: { ...d.settings, gasTemperature: t },
          })),
        held,
      );
      await expect
        .poll(async () => (await temperatures())?.every((T) => Math.abs(T - held) <= 1e-9 * held) ?? false, {
          timeout: 60_000,
        })
        .toBe(true);
    }
    expect(errors).toEqual([]);
  });
});
