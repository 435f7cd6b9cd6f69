// Results handed on, in chromium: the exchange matrix and radiosity tables with
// their copy buttons, the report from the Report tab (the same tables and
// numbers as the command line's report of the same file), printed by chromium
// to PDF on one page, and the picture as SVG (parses) and PNG (at the chosen scale).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { startApp, type App, waitReady } from './harness';
import { runReport, type ReportIO } from '../../src/cli/reportCommand';

let app: App;
let page: Page;
const errors: string[] = [];

// Eight surfaces: a furnace section with a fired floor, a roof in three parts, and two loads.
const sketch = {
  version: 1,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [4, 0],
        [4, 2],
        [3, 2],
        [1, 2],
        [0, 2],
      ],
      surface: ['fired floor', 'right wall', 'roof 1', 'roof 2', 'roof 3', 'left wall'],
    },
    {
      kind: 'solid',
      points: [
        [0.8, 0.7],
        [1.4, 0.7],
        [1.4, 1.2],
        [0.8, 1.2],
      ],
      surface: 'load <a>',
    },
    {
      kind: 'solid',
      points: [
        [2.6, 0.7],
        [3.2, 0.7],
        [3.2, 1.2],
        [2.6, 1.2],
      ],
      surface: 'load & b',
    },
  ],
  surfaces: {
    'fired floor': { emissivity: 0.85, temperature: 1400 },
    'load <a>': { emissivity: 0.7, temperature: 600 },
    'load & b': { emissivity: 0.7, temperature: 650 },
    'roof 2': { emissivity: 0.5 },
  },
  settings: { depth: 3 },
};
const text = `${JSON.stringify(sketch, null, 2)}\n`;

beforeAll(async () => {
  app = await startApp();
  await app.context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: app.url });
  page = await app.context.newPage();
  page.on('pageerror', (e) => errors.push(e.message));
  await page.goto(app.url);
  await waitReady(page);
  await page
    .locator('input[type=file]')
    .setInputFiles({ name: 'furnace.json', mimeType: 'application/json', buffer: Buffer.from(text) });
  await waitReady(page);
}, 180_000);

afterAll(async () => {
  await app?.close();
});

/** Text of every cell of a report table, row by row, read in the browser. */
function reportTables(p: Page): Promise<Record<string, string[][]>> {
  return p.evaluate(() => {
    const out: Record<string, string[][]> = {};
    for (const t of document.querySelectorAll('table[data-table]'))
      out[t.getAttribute('data-table')!] = [...t.querySelectorAll('tr')].map((tr) =>
        [...tr.children].map((c) => c.textContent ?? ''),
      );
    return out;
  });
}

async function download(button: string): Promise<string> {
  const [file] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: button }).click()]);
  return file.path();
}

describe('results handed on, in chromium', () => {
  it('shows the exchange matrix and the radiosities beside the net heat, and copies them as tab-separated text', async () => {
    await page.getByRole('tab', { name: 'Heat exchange' }).click();
    await page.waitForFunction(
      () => document.querySelector('[data-exchange-status]')?.getAttribute('data-exchange-status') === 'solved',
    );
    const matrix = page.locator('table.exchange-matrix');
    await expect.poll(() => matrix.locator('tbody tr').count()).toBe(8);
    // q'_ij = -q'_ji (reciprocal view factors): the floor gives to the load what the load takes from it.
    const column: Record<string, number> = { 'fired floor': 0, 'load <a>': 6 };
    const q = (i: string, j: string) => matrix.locator(`tr[data-surface="${i}"] td`).nth(column[j]);
    const floorToLoad = Number(await q('fired floor', 'load <a>').getAttribute('data-value'));
    const loadToFloor = Number(await q('load <a>', 'fired floor').getAttribute('data-value'));
    expect(floorToLoad).toBeGreaterThan(0);
    expect(Math.abs(floorToLoad + loadToFloor)).toBeLessThanOrEqual(1e-9 * floorToLoad);
    expect(await page.locator('table.radiosity-table tbody tr').count()).toBe(8);

    await page.getByRole('button', { name: 'Copy matrix', exact: true }).click();
    const copied = await page.evaluate(() => navigator.clipboard.readText());
    const lines = copied.trimEnd().split('\n');
    expect(lines.length).toBe(9);
    expect(lines[0].split('\t')).toHaveLength(9);
    expect(lines[1].split('\t')[0]).toBe('fired floor');
  });

  it('makes the same report as the command line, which chromium prints on one page', async () => {
    await page.getByRole('tab', { name: 'Report' }).click();
    const html = readFileSync(await download('Download report'), 'utf8');
    let cliHtml = '';
    const io: ReportIO = {
      out: () => undefined,
      err: (t) => errors.push(t),
      readFile: () => text,
      writeFile: (_path, t) => void (cliHtml = t),
    };
    expect(runReport(['furnace.json', '--out', 'x.html'], io)).toBe(0);

    const appPage = await app.context.newPage();
    await appPage.setContent(html);
    const fromApp = await reportTables(appPage);
    await appPage.setContent(cliHtml);
    const fromCli = await reportTables(appPage);
    expect(Object.keys(fromApp).sort()).toEqual(
      ['exchange', 'inputs', 'net-heat', 'profile:roof', 'view-factors'].sort(),
    );
    expect(fromApp).toEqual(fromCli);
    await appPage.setContent(html);
    const names = await appPage.evaluate(() =>
      [...document.querySelectorAll('svg text[data-surface]')].map((t) => t.textContent).sort(),
    );
    expect(names).toEqual(
      ['fired floor', 'left wall', 'load & b', 'load <a>', 'right wall', 'roof 1', 'roof 2', 'roof 3'].sort(),
    );

    for (const format of ['A4', 'Letter'] as const) {
      const pdf = await appPage.pdf({ format, printBackground: true });
      // Page objects, not the /Pages tree node.
      const pages = pdf.toString('latin1').match(/\/Type\s*\/Page(?![a-zA-Z])/g) ?? [];
      expect(pages.length, `${format} pages`).toBe(1);
      if (format === 'A4') {
        mkdirSync('test-artifacts', { recursive: true });
        writeFileSync('test-artifacts/report.pdf', pdf);
      }
    }
    await appPage.close();
  });

  it('opens the report in a new tab to print', async () => {
    const [tab] = await Promise.all([
      app.context.waitForEvent('page'),
      page.getByRole('button', { name: 'Open report' }).click(),
    ]);
    await tab.waitForLoadState();
    await expect.poll(() => tab.title()).toBe('Radiation report: sketch');
    await tab.close();
  });

  it('exports the picture as SVG that parses, and as PNG at the chosen scale', async () => {
    await page.getByLabel('dimensions').check();
    const svg = readFileSync(await download('Download SVG'), 'utf8');
    const check = await page.evaluate((s) => {
      const doc = new DOMParser().parseFromString(s, 'image/svg+xml');
      return {
        errors: doc.getElementsByTagName('parsererror').length,
        width: Number(doc.documentElement.getAttribute('width')),
        labels: doc.querySelectorAll('text[data-surface]').length,
        legend: doc.querySelectorAll('linearGradient').length,
      };
    }, svg);
    expect(check.errors).toBe(0);
    expect(check.labels).toBe(8);
    expect(check.legend).toBe(1);
    await page.getByLabel('PNG scale').selectOption('3');
    const png = readFileSync(await download('Download PNG'));
    expect(png.subarray(1, 4).toString('latin1')).toBe('PNG');
    // IHDR: width and height, big-endian, at bytes 16 and 20.
    expect(png.readUInt32BE(16)).toBe(3 * check.width);
    mkdirSync('test-artifacts', { recursive: true });
    writeFileSync('test-artifacts/sketch.png', png);
    expect(errors).toEqual([]);
  });
});
