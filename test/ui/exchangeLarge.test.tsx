// @vitest-environment jsdom
// The heat-exchange views of a large sketch draw what can be read: the
// radiosity table only the rows in view, the net heat chart the surfaces with
// the largest net heat in size. (Redrawing a bar and a row per surface held the
// page 70-230 ms after each edit of a 1012-surface sketch.)
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, render, screen } from '@testing-library/react';
import { CHART_SURFACES, NetHeatChart } from '../../src/ui/exchange/NetHeatChart';
import { RadiosityTable } from '../../src/ui/exchange/RadiosityTable';
import type { SketchFile } from '../../src/state/sketchFile';
import { flush, live, solved } from '../state/exchangeHelpers';

beforeEach(() => {
  // jsdom has no layout: the scrolled box reports a fixed size, as the virtualizer reads it.
  vi.spyOn(HTMLElement.prototype, 'clientWidth', 'get').mockReturnValue(800);
  vi.spyOn(HTMLElement.prototype, 'clientHeight', 'get').mockReturnValue(400);
});

afterEach(() => {
  cleanup();
  vi.restoreAllMocks();
});

/** A 120-wall ring: every third wall held at its own temperature, the rest reradiating. */
function ring(n: number): SketchFile {
  const points = Array.from({ length: n }, (_, k): [number, number] => [
    Math.cos((2 * Math.PI * k) / n),
    Math.sin((2 * Math.PI * k) / n),
  ]);
  return {
    version: 1,
    units: 'm',
    shapes: [{ kind: 'enclosure', points, surface: points.map((_, k) => `wall ${k}`) }],
    surfaces: Object.fromEntries(
      points.flatMap((_, k) => (k % 3 === 0 ? [[`wall ${k}`, { temperature: 600 + 5 * k }]] : [])),
    ),
  };
}

describe('the exchange views of a large sketch', () => {
  it('chart the surfaces with the largest net heat in size, largest first, and say so', async () => {
    const store = live(ring(120));
    await flush();
    const ex = solved(store);
    const { container } = render(<NetHeatChart ex={ex} />);
    const bars = [...container.querySelectorAll('g[data-surface]')];
    expect(bars).toHaveLength(CHART_SURFACES);
    const shown = bars.map((g) => Math.abs(Number(g.querySelector('rect')!.getAttribute('data-value'))));
    for (let k = 1; k < shown.length; k++) expect(shown[k]).toBeLessThanOrEqual(shown[k - 1]);
    const all = Array.from(ex.result.netHeat, Math.abs).sort((a, b) => b - a);
    expect(shown[0]).toBe(all[0]);
    expect(shown[CHART_SURFACES - 1]).toBe(all[CHART_SURFACES - 1]);
    expect(container.querySelector('figcaption')!.textContent).toMatch(/the 40 largest in size of 120, largest first/);
  });

  it('draw only the radiosity rows in view, with their place in the whole table', async () => {
    const store = live(ring(120));
    await flush();
    render(<RadiosityTable ex={solved(store)} labelledBy="none" />);
    const table = screen.getByRole('table');
    expect(table.getAttribute('aria-rowcount')).toBe('121');
    const drawn = table.querySelectorAll('tbody tr[data-surface]');
    expect(drawn.length).toBeGreaterThan(0);
    expect(drawn.length).toBeLessThan(60);
    expect(drawn[0].getAttribute('aria-rowindex')).toBe('2');
    // Each drawn row holds its own surface's numbers.
    const ex = solved(store);
    for (const row of drawn) {
      const i = ex.names.indexOf(row.getAttribute('data-surface')!);
      expect(Number(row.querySelector('td')!.getAttribute('data-value'))).toBe(ex.result.radiosity[i]);
    }
  });

  it('chart every surface of a small sketch', async () => {
    const store = live(ring(12));
    await flush();
    const { container } = render(<NetHeatChart ex={solved(store)} />);
    expect(container.querySelectorAll('g[data-surface]')).toHaveLength(12);
    expect(container.querySelector('figcaption')!.textContent).not.toMatch(/largest/);
  });
});
