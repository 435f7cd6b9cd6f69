// Browser-test harness: build the app once with Vite, serve the build on a free
// port on 127.0.0.1, and drive Debian's chromium with playwright-core (no browser download).
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createServer } from 'node:net';
import { build, preview, type PreviewServer } from 'vite';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import type { Runtime } from '../../src/state/runtime';

export const CHROMIUM = '/usr/bin/chromium';

/** The page's window as the tests see it: src/main.tsx puts the app's runtime there. Types only (evaluate callbacks run in the page). */
export type TestWindow = Window & { __tautline: Runtime };

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const addr = srv.address();
      const port = typeof addr === 'object' && addr ? addr.port : 0;
      srv.close(() => resolve(port));
    });
  });
}

/** The served app and a browser context with a fresh profile (1366 x 768, the laptop size the layout must fit). */
export interface App {
  url: string;
  context: BrowserContext;
  close: () => Promise<void>;
}

export async function startApp(): Promise<App> {
  const outDir = mkdtempSync(join(tmpdir(), 'tautline-build-'));
  const profile = mkdtempSync(join(tmpdir(), 'tautline-profile-'));
  // vitest sets NODE_ENV=test, which would give a development build of React; test what users get.
  const nodeEnv = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  try {
    await build({ logLevel: 'error', mode: 'production', build: { outDir, emptyOutDir: true } });
  } finally {
    process.env.NODE_ENV = nodeEnv;
  }
  const port = await freePort();
  const server: PreviewServer = await preview({
    logLevel: 'error',
    build: { outDir },
    preview: { host: '127.0.0.1', port, strictPort: true },
  });
  // The fresh profile directory is chromium's --user-data-dir (playwright passes it).
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    viewport: { width: 1366, height: 768 },
    acceptDownloads: true,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
  return {
    url: `http://127.0.0.1:${port}/`,
    context,
    close: async () => {
      await context.close();
      await new Promise<void>((r) => server.httpServer.close(() => r()));
      rmSync(outDir, { recursive: true, force: true });
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Drop a file named `name` holding `content` on the page, as a user drags one from the desktop. */
export async function dropFile(page: Page, name: string, content: string): Promise<void> {
  await page.evaluate(
    ([fileName, text]) => {
      const dt = new DataTransfer();
      dt.items.add(new File([text], fileName, { type: 'application/json' }));
      window.dispatchEvent(new DragEvent('dragover', { dataTransfer: dt, bubbles: true, cancelable: true }));
      window.dispatchEvent(new DragEvent('drop', { dataTransfer: dt, bubbles: true, cancelable: true }));
    },
    [name, content] as const,
  );
}

/** Wait until the app says its results are ready (the status line's `data-status`). */
export async function waitReady(page: Page, timeout?: number): Promise<void> {
  await page.waitForFunction(
    () => document.querySelector('[data-status]')?.getAttribute('data-status') === 'ready',
    undefined,
    timeout === undefined ? undefined : { timeout },
  );
}

/** Screen position (page pixels) of a sketch point, from the app's own camera. */
export async function screenOf(page: Page, x: number, y: number): Promise<[number, number]> {
  const box = (await page.locator('.canvas-box').boundingBox())!;
  const cam = await page.evaluate(() => (window as unknown as TestWindow).__tautline.store.getState().camera);
  return [box.x + cam.originX + cam.scale * x, box.y + cam.originY - cam.scale * y];
}

/** Press at sketch point `from`, move to `to` in `steps` pointer moves, release. */
export async function dragOnCanvas(
  page: Page,
  from: [number, number],
  to: [number, number],
  steps: number,
): Promise<void> {
  const [ax, ay] = await screenOf(page, ...from);
  const [bx, by] = await screenOf(page, ...to);
  await page.mouse.move(ax, ay);
  await page.mouse.down();
  await page.mouse.move(bx, by, { steps });
  await page.mouse.up();
}
