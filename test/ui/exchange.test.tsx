// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, configure, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { renderApp } from './renderApp';
import { STEFAN_BOLTZMANN as SIGMA } from '../../src/core/exchange';
import type { SketchFile } from '../../src/state/sketchFile';

vi.mock('../../src/ui/canvas/SketchCanvas', () => ({ SketchCanvas: () => <div data-testid="canvas-stub" /> }));

configure({ asyncUtilTimeout: 8000 });
afterEach(() => cleanup());

const results = () => screen.getByRole('table', { name: /heat exchange per surface/i });
const rowOf = (name: string) =>
  within(results()).getByRole('row', { name: new RegExp(`^${name.replace(/[()]/g, '\\$&')}(\\s|$)`) });
/** Cells of a surface's row: condition, emissivity, T, net heat, net flux[, total]. */
const cellsOf = (name: string) => within(rowOf(name)).getAllByRole('cell');
const netHeatCell = (name: string) => cellsOf(name)[3];

async function openTab() {
  const user = userEvent.setup();
  const app = renderApp();
  await user.click(screen.getByRole('tab', { name: 'Heat exchange' }));
  await waitFor(() => expect(results()).toBeTruthy());
  return { user, ...app };
}

/** Replace the shown value of a field and press Enter. */
async function type(user: ReturnType<typeof userEvent.setup>, field: HTMLElement, text: string) {
  await user.clear(field);
  await user.type(field, `${text}{Enter}`);
}

// Two long concentric squares, inner 0.2 m (solid, convex: F_12 = 1) in outer 0.6 m.
const squares: SketchFile = {
  version: 1,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [0.6, 0],
        [0.6, 0.6],
        [0, 0.6],
      ],
      surface: 'outer',
    },
    {
      kind: 'solid',
      points: [
        [0.2, 0.2],
        [0.4, 0.2],
        [0.4, 0.4],
        [0.2, 0.4],
      ],
      surface: 'inner',
    },
  ],
  surfaces: { inner: { emissivity: 0.6, temperature: 1000 }, outer: { emissivity: 0.8, temperature: 500 } },
};

/**
 * Two-surface enclosure, inner convex body: q'_1 = sigma (T1^4 - T2^4) A1 / (1/e1 + (A1/A2)(1/e2 - 1)), W/m.
 * Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., sec. 13.3 (two-surface enclosure), from memory.
 */
const twoSurface = (T1: number, T2: number, e1: number, e2: number, A1: number, A2: number) =>
  (SIGMA * (T1 ** 4 - T2 ** 4) * A1) / (1 / e1 + (A1 / A2) * (1 / e2 - 1));

/** The table shows five significant digits: the shown number is the exact one rounded, so within half a unit of the fifth digit. */
function shownMatches(text: string, exact: number) {
  const unit = 10 ** (Math.floor(Math.log10(Math.abs(exact))) - 4);
  expect(Math.abs(Number(text) - exact)).toBeLessThanOrEqual(0.5 * unit * (1 + 1e-12));
}

describe('heat-exchange tab', () => {
  it('opens on the demo with properties, a results row per surface, the chart and the caution', async () => {
    await openTab();
    expect(within(results()).getAllByRole('row')).toHaveLength(1 + 7);
    expect(screen.getByRole('img', { name: /bar chart of net heat/i })).toBeTruthy();
    expect(screen.getByRole('note', { name: /caution about these results/i }).textContent).toMatch(
      /gray-diffuse radiation.*convection.*no absorbing gas.*local codes and licensed engineering practice/i,
    );
    await waitFor(() =>
      expect(document.querySelector('[data-exchange-status]')?.getAttribute('data-exchange-status')).toBe('solved'),
    );
    // The fired floor (1250 K) gives heat off; the 900 K tubes take it up; the roof is reradiating (net 0).
    expect(Number(netHeatCell('fired floor').getAttribute('data-value'))).toBeGreaterThan(0);
    expect(Number(netHeatCell('tube 1').getAttribute('data-value'))).toBeLessThan(0);
    expect(netHeatCell('refractory roof').textContent).toBe('0');
    expect(cellsOf('refractory roof')[0].textContent).toBe('adiabatic (T solved)');
    // The oven is closed: the shown net heats, summed here, balance to rounding (energy conservation),
    // and the tubes, in mirror-image pairs about the oven's mid-plane, take up the same heat pairwise.
    const heat = ['fired floor', 'side walls', 'refractory roof', 'tube 1', 'tube 2', 'tube 3', 'tube 4'].map((name) =>
      Number(netHeatCell(name).getAttribute('data-value')),
    );
    const floor = heat[0];
    expect(Math.abs(heat.reduce((a, q) => a + q, 0))).toBeLessThanOrEqual(1e-9 * floor);
    expect(Math.abs(heat[3] - heat[6])).toBeLessThanOrEqual(1e-9 * floor);
    expect(Math.abs(heat[4] - heat[5])).toBeLessThanOrEqual(1e-9 * floor);
  });

  it('edits a temperature in degrees C, stores kelvin, updates the table, and undo restores it', async () => {
    const { user, store } = await openTab();
    await user.selectOptions(screen.getByLabelText('surface'), 'tube 1');
    const before = Number(netHeatCell('tube 1').getAttribute('data-value'));
    await user.click(screen.getByRole('radio', { name: '°C' }));
    const field = screen.getByLabelText<HTMLInputElement>('temperature (°C)');
    expect(field.value).toBe('626.85'); // 900 K
    await type(user, field, '700');
    expect(store.getState().doc.surfaces!['tube 1'].temperature).toBeCloseTo(973.15, 9);
    expect(cellsOf('tube 1')[2].textContent).toBe('700.00');
    const after = Number(netHeatCell('tube 1').getAttribute('data-value'));
    expect(after).toBeGreaterThan(before); // a hotter tube takes up less heat (its net heat is negative)
    expect(after).toBeLessThan(0);
    expect(within(results()).getByRole('columnheader', { name: 'T (°C)' })).toBeTruthy();
    await user.click(screen.getByRole('button', { name: /^undo/i }));
    expect(store.getState().doc.surfaces!['tube 1'].temperature).toBe(900);
    await waitFor(() => expect(screen.getByLabelText<HTMLInputElement>('temperature (°C)').value).toBe('626.85'));
    expect(Number(netHeatCell('tube 1').getAttribute('data-value'))).toBe(before);
    await user.click(screen.getByRole('radio', { name: 'K' }));
    expect(screen.getByLabelText<HTMLInputElement>('temperature (K)').value).toBe('900');
  });

  it('follows the canvas selection: picking a shape edits its surface', async () => {
    const { store } = await openTab();
    // The demo's tubes are exact circles, picked whole.
    act(() => store.getState().setSelection([{ type: 'shape', shape: 2 }]));
    await waitFor(() => expect(screen.getByLabelText<HTMLSelectElement>('surface').value).toBe('tube 2'));
    expect(rowOf('tube 2').className).toBe('on');
  });

  it('refuses out-of-range values with a message and leaves the document alone', async () => {
    const { user, store } = await openTab();
    const doc = store.getState().doc;
    await user.selectOptions(screen.getByLabelText('surface'), 'fired floor');
    await type(user, screen.getByLabelText('emissivity'), '1.5');
    expect(screen.getByText(/not applied: emissivity must be at most 1/)).toBeTruthy();
    // The file's own range (README, limits): an emissivity the reader would refuse is refused here too.
    await type(user, screen.getByLabelText('emissivity'), '0.0001');
    expect(screen.getByText(/not applied: emissivity must be at least 0.001/)).toBeTruthy();
    await user.click(screen.getByRole('radio', { name: '°C' }));
    await type(user, screen.getByLabelText('temperature (°C)'), '-300');
    expect(screen.getByText(/must be above absolute zero/)).toBeTruthy();
    expect(store.getState().doc).toBe(doc);
  });

  it('shows the documented defaults for a surface with no properties', async () => {
    const { user, store } = await openTab();
    await user.selectOptions(screen.getByLabelText('surface'), 'side walls');
    await user.click(screen.getByRole('button', { name: 'Use defaults' }));
    expect(Object.hasOwn(store.getState().doc.surfaces!, 'side walls')).toBe(false);
    expect(
      screen.getByText(/No properties in the file: the defaults apply \(emissivity 0\.9, adiabatic\)/),
    ).toBeTruthy();
    expect(screen.getByLabelText<HTMLInputElement>('emissivity').placeholder).toBe('0.9 (default)');
    expect(screen.getByLabelText<HTMLSelectElement>('condition').selectedOptions[0].textContent).toBe(
      'adiabatic (reradiating) (default)',
    );
    expect(cellsOf('side walls')[1].textContent).toBe('0.9');
  });

  it('shows net heat matching the closed form for long concentric squares, and totals over a depth', async () => {
    const { user, store } = await openTab();
    store.getState().edit(() => squares);
    const q = twoSurface(1000, 500, 0.6, 0.8, 0.8, 2.4);
    await waitFor(() => expect(within(results()).getAllByRole('row')).toHaveLength(3));
    await waitFor(() =>
      expect(document.querySelector('[data-exchange-status]')?.getAttribute('data-exchange-status')).toBe('solved'),
    );
    const cell = netHeatCell('inner');
    expect(Math.abs(Number(cell.getAttribute('data-value')) - q)).toBeLessThanOrEqual(1e-9 * q);
    shownMatches(cell.textContent, q);
    shownMatches(cellsOf('inner')[6].textContent, q / 0.8); // net flux, W/m^2 (after radiation, convection and back)
    shownMatches(netHeatCell('outer').textContent, -q);
    expect(screen.getByText(/energy balance residual:/).textContent).not.toMatch(/above rounding/);
    // A depth of 3 m adds totals in W.
    await type(user, screen.getByLabelText('depth (m)'), '3');
    expect(store.getState().doc.settings).toEqual({ depth: 3 });
    expect(within(results()).getByRole('columnheader', { name: 'total (W)' })).toBeTruthy();
    shownMatches(cellsOf('inner')[7].textContent, 3 * q);
  });

  it('shows the solver message for a problem with no unique answer and stays usable', async () => {
    const { user, store } = await openTab();
    store.getState().edit(() => squares);
    await waitFor(() => expect(within(results()).getAllByRole('row')).toHaveLength(3));
    for (const name of ['inner', 'outer']) {
      await user.selectOptions(screen.getByLabelText('surface'), name);
      await user.selectOptions(screen.getByLabelText('condition'), 'adiabatic');
    }
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toMatch(/no unique answer.*give at least one surface a temperature/);
    expect(screen.queryByRole('table', { name: /heat exchange per surface/i })).toBeNull();
    // Still editable: give the outer wall a temperature again.
    await user.selectOptions(screen.getByLabelText('condition'), 'temperature');
    await waitFor(() => expect(screen.queryByRole('alert')).toBeNull());
    expect(store.getState().doc.surfaces!.outer.temperature).toBeGreaterThan(0);
    expect(results()).toBeTruthy();
  });

  it('names the surface that needs a surroundings temperature and sets one in degrees C', async () => {
    const { user, store } = await openTab();
    store.getState().edit(() => ({
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'solid',
          points: [
            [0, 0],
            [1, 0],
            [1, 0.1],
            [0, 0.1],
          ],
          surface: 'plate',
        },
        {
          kind: 'solid',
          points: [
            [0, 1],
            [1, 1],
            [1, 1.1],
            [0, 1.1],
          ],
          surface: 'cover',
        },
      ],
      surfaces: { plate: { temperature: 400 } },
    }));
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toMatch(/'plate' sees the surroundings.*no surroundings temperature/);
    await user.click(within(alert).getByRole('button', { name: 'Edit “plate”' }));
    expect(screen.getByLabelText<HTMLSelectElement>('surface').value).toBe('plate');
    await user.click(screen.getByRole('radio', { name: '°C' }));
    await type(user, screen.getByLabelText('surroundings temperature (°C)'), '20');
    expect(store.getState().doc.settings?.surroundingsTemperature).toBeCloseTo(293.15, 9);
    await waitFor(() => expect(rowOf('(surroundings)')).toBeTruthy());
    expect(within(rowOf('(surroundings)')).getAllByRole('cell')[2].textContent).toBe('20.00');
  });
});
