// @vitest-environment jsdom
// The heat-exchange views of a large sketch draw what can be read: the
// radiosity table only the rows in view, the net heat chart the surfaces with
// the largest net heat in size. (Redrawing a bar and a row per surface held the
// page 70-230 ms after each edit of a 1012-surface sketch.)
import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/react';
import { CHART_SURFACES, NetHeatChart } from '../../src/ui/exchange/NetHeatChart';
import { RadiosityTable } from '../../src/ui/exchange/RadiosityTable';
import { flush, live, ring, solved } from '../state/exchangeHelpers';
import { stubScrollBox } from './scrollBox';

stubScrollBox();

/** A ring of n walls: every third wall held at its own temperature, the rest reradiating. */
const heldEveryThird = (n: number) => ring(n, (k) => (k % 3 === 0 ? { temperature: 600 + 5 * k } : undefined));

describe('the exchange views of a large sketch', () => {
  it('chart the surfaces with the largest net heat in size, largest first, and say so', async () => {
    const store = live(heldEveryThird(120));
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
    const store = live(heldEveryThird(120));
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
    const store = live(heldEveryThird(12));
    await flush();
    const { container } = render(<NetHeatChart ex={solved(store)} />);
    expect(container.querySelectorAll('g[data-surface]')).toHaveLength(12);
    expect(container.querySelector('figcaption')!.textContent).not.toMatch(/largest/);
  });
});
