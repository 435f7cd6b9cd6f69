// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, configure, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { renderApp } from './renderApp';
import type { SketchFile } from '../../src/state/sketchFile';
import { heatScale } from '../../src/ui/exchange/heatScale';
import { solveBalance } from '../../src/core/balance';
import type { ExchangeSolved } from '../../src/state/exchange/slice';

// The condition picker's wall, tube and linked plate; convection and the gas;
// the heat table split into radiation, convection and back; the burn warning.

vi.mock('../../src/ui/canvas/SketchCanvas', () => ({ SketchCanvas: () => <div data-testid="canvas-stub" /> }));

configure({ asyncUtilTimeout: 8000 });
afterEach(() => cleanup());

const SIGMA = 5.670374419e-8;
const results = () => screen.getByRole('table', { name: /heat exchange per surface/i });
const rowOf = (name: string) =>
  within(results()).getByRole('row', { name: new RegExp(`^${name.replace(/[()]/g, '\\$&')}(\\s|$)`) });
/** Cells: condition, emissivity, T, radiation, convection, back, net flux[, cold face / inner][, total]. */
const cellsOf = (name: string) => within(rowOf(name)).getAllByRole('cell');
const value = (cell: HTMLElement) => Number(cell.getAttribute('data-value'));

async function openTab(doc: SketchFile) {
  const user = userEvent.setup();
  const app = renderApp();
  await user.click(screen.getByRole('tab', { name: 'Heat exchange' }));
  app.store.getState().edit(() => doc);
  await waitFor(() => expect(within(results()).getAllByRole('row').length).toBeGreaterThan(2));
  return { user, ...app };
}

async function type(user: ReturnType<typeof userEvent.setup>, field: HTMLElement, text: string) {
  await user.clear(field);
  await user.type(field, `${text}{Enter}`);
}

const square = (x0: number, y0: number, side: number): [number, number][] => [
  [x0, y0],
  [x0 + side, y0],
  [x0 + side, y0 + side],
  [x0, y0 + side],
];

// A 0.2 m square body (convex: F12 = 1) in a 0.6 m square duct: A1 = 0.8, A2 = 2.4 m per metre.
const squares: SketchFile = {
  version: 2,
  units: 'm',
  shapes: [
    { kind: 'enclosure', points: square(0, 0, 0.6), surface: 'outer' },
    { kind: 'solid', points: square(0.2, 0.2, 0.2), surface: 'inner' },
  ],
  surfaces: { inner: { emissivity: 0.6, temperature: 1000 }, outer: { emissivity: 0.8, temperature: 500 } },
};

function bisect(f: (x: number) => number, lo: number, hi: number): number {
  const s = Math.sign(f(lo));
  for (let k = 0; k < 200; k++) {
    const mid = 0.5 * (lo + hi);
    if (Math.sign(f(mid)) === s) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

describe('surface balance in the heat-exchange tab', () => {
  it('a wall: the picker writes a layer list, each field commits, and the table shows the cold face with a burn warning', async () => {
    const { user, store } = await openTab(squares);
    await user.selectOptions(screen.getByLabelText('surface'), 'outer');
    await user.selectOptions(screen.getByLabelText('condition'), 'wall');
    const wall = () => store.getState().doc.surfaces!.outer.wall!;
    expect(wall().layers).toHaveLength(1);
    expect(store.getState().doc.surfaces!.outer.temperature).toBeUndefined(); // one condition at a time
    await type(user, screen.getByLabelText('layer 1 thickness (m)'), '0.05');
    await type(user, screen.getByLabelText('conductivity (W/(m·K))'), '0.4');
    await type(user, screen.getByLabelText('outside temperature (K)'), '300');
    await type(user, screen.getByLabelText('outside coefficient (W/(m²·K))'), '12');
    expect(wall()).toEqual({
      layers: [{ thickness: 0.05, conductivity: 0.4 }],
      outsideTemperature: 300,
      outsideCoefficient: 12,
    });
    // Closed form (Incropera et al., 6th ed., sec. 13.3.3 two-surface enclosure in series with the plane wall of sec. 3.1):
    const R = 0.05 / 0.4 + 1 / 12;
    const rad = (T2: number) => (SIGMA * (1000 ** 4 - T2 ** 4)) / (0.4 / (0.6 * 0.8) + 1 / 0.8 + 0.2 / (0.8 * 2.4));
    const T2 = bisect((t) => rad(t) - (2.4 * (t - 300)) / R, 300, 1000);
    const cold = 300 + (T2 - 300) / R / 12;
    await waitFor(() => expect(Math.abs(value(cellsOf('outer')[2]) - T2)).toBeLessThanOrEqual(1e-9 * T2));
    expect(within(results()).getByRole('columnheader', { name: 'cold face / inner (K)' })).toBeTruthy();
    expect(Math.abs(value(cellsOf('outer')[7]) - cold)).toBeLessThanOrEqual(1e-9 * cold);
    // Radiation, convection and back: the back is the wall's loss, equal to what the lining takes up.
    expect(Math.abs(value(cellsOf('outer')[5]) + (2.4 * (T2 - 300)) / R)).toBeLessThanOrEqual(1e-9 * rad(T2));
    expect(value(cellsOf('outer')[4])).toBe(0);
    expect(cold).toBeGreaterThan(333.15);
    const burns = screen.getByRole('alert', { name: 'Burn hazards' });
    expect(burns.textContent).toMatch(/casing of 'outer' is at \d+ °C, above 60 °C.*ASTM C1055/);
    expect(screen.getByRole('note', { name: 'Caution about walls and tubes' }).textContent).toMatch(
      /constant conductivities/,
    );
    await user.click(screen.getByRole('button', { name: 'Add layer' }));
    expect(wall().layers).toHaveLength(2);
    await user.click(screen.getByRole('button', { name: 'Remove layer 2' }));
    expect(wall().layers).toHaveLength(1);
  });

  it('a tube: fields with units, the fluid temperature typed in °C and kept in kelvin', async () => {
    const { user, store } = await openTab(squares);
    await user.selectOptions(screen.getByLabelText('surface'), 'inner');
    await user.selectOptions(screen.getByLabelText('condition'), 'tube');
    await user.click(screen.getByRole('radio', { name: '°C' }));
    await type(user, screen.getByLabelText('fluid temperature (°C)'), '350');
    expect(store.getState().doc.surfaces!.inner.tube!.fluidTemperature).toBeCloseTo(623.15, 9);
    await type(user, screen.getByLabelText('inner diameter (m)'), '0.2');
    expect(screen.getByText(/not applied: inner diameter \(m\) must be below the outer diameter/)).toBeTruthy();
    for (const label of ['inside coefficient (W/(m²·K))', 'outer diameter (m)', 'wall conductivity (W/(m·K))']) {
      expect(screen.getByLabelText(label)).toBeTruthy();
    }
    await waitFor(() => expect(cellsOf('inner')[0].textContent).toBe('tube (T solved)'));
  });

  it('a linked plate, convection and the gas: one temperature for both faces, the gas row and its caution', async () => {
    const plate: SketchFile = {
      version: 2,
      units: 'm',
      shapes: [
        { kind: 'enclosure', points: square(0, 0, 1), surface: ['floor', 'side', 'roof', 'side'] },
        {
          kind: 'solid',
          points: [
            [0.2, 0.45],
            [0.8, 0.45],
            [0.8, 0.55],
            [0.2, 0.55],
          ],
          surface: ['bottom', 'end', 'top', 'end'],
        },
      ],
      surfaces: { floor: { temperature: 1200 }, roof: { temperature: 400 } },
    };
    const { user, store } = await openTab(plate);
    await user.selectOptions(screen.getByLabelText('surface'), 'top');
    await user.selectOptions(screen.getByLabelText('condition'), 'linked');
    await user.selectOptions(screen.getByLabelText('other face'), 'bottom');
    expect(store.getState().doc.surfaces!.top).toEqual({ linked: 'bottom' });
    await waitFor(() => expect(value(cellsOf('top')[2])).toBe(value(cellsOf('bottom')[2])));
    // The two faces take up and give off the same heat.
    const back = value(cellsOf('top')[5]) + value(cellsOf('bottom')[5]);
    expect(Math.abs(back)).toBeLessThanOrEqual(1e-9 * Math.abs(value(cellsOf('floor')[3])));
    await type(user, screen.getByLabelText('convection coefficient (W/(m²·K))'), '15');
    expect(screen.getByText('Set a gas temperature below.')).toBeTruthy();
    await type(user, screen.getByLabelText('gas temperature (K)'), '1300');
    expect(store.getState().doc.settings).toEqual({ gasTemperature: 1300 });
    await waitFor(() => expect(rowOf('(gas)')).toBeTruthy());
    const T = value(cellsOf('top')[2]);
    expect(Math.abs(value(cellsOf('top')[4]) - 15 * 0.6 * (T - 1300))).toBeLessThanOrEqual(1e-9 * 15 * 0.6 * 1300);
    expect(Math.abs(value(cellsOf('(gas)')[4]) + value(cellsOf('top')[4]))).toBeLessThanOrEqual(1e-9 * 15 * 0.6 * 1300);
    expect(screen.getByRole('note', { name: 'Caution about the gas' }).textContent).toMatch(/transparent.*no gas flow/);
  });
});

describe('heat colours by cold face and tube inner wall', () => {
  it('colours walls by their casing and tubes by their inner wall, and leaves other surfaces uncoloured', () => {
    const out = solveBalance({
      viewFactors: [0, 0.5, 0.5, 0.5, 0, 0.5, 0.5, 0.5, 0],
      area: [1, 1, 1],
      emissivity: [0.9, 0.8, 0.7],
      conditions: [
        { kind: 'temperature', temperature: 1400 },
        {
          kind: 'wall',
          layers: [{ thickness: 0.2, conductivity: 1 }],
          outsideTemperature: 300,
          outsideCoefficient: 10,
        },
        {
          kind: 'tube',
          fluidTemperature: 600,
          insideCoefficient: 900,
          outerDiameter: 0.1,
          innerDiameter: 0.08,
          wallConductivity: 40,
        },
      ],
    });
    if (!out.ok) throw new Error(out.code);
    const view: ExchangeSolved = {
      kind: 'solved',
      names: ['hot', 'roof', 'tube'],
      lengths: Float64Array.from([1, 1, 1]),
      units: 'm',
      conditions: [],
      result: out.result,
      stale: false,
    };
    const scale = heatScale('inside', view, 'K');
    expect(scale && [...scale.colours.keys()]).toEqual(['roof', 'tube']);
    // The legend spans the cold face (lowest here) to the tube's inner wall.
    expect(scale?.low).toBe(Math.min(out.result.coldFaceTemperature[1], out.result.innerTemperature[2]));
    expect(scale?.high).toBe(Math.max(out.result.coldFaceTemperature[1], out.result.innerTemperature[2]));
  });
});
