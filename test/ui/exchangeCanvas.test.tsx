// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AppProvider } from '../../src/ui/AppContext';
import { HeatLegend } from '../../src/ui/exchange/HeatLegend';
import { divergingColour, heatScale } from '../../src/ui/exchange/heatScale';
import { createAppStore } from '../../src/state/store';
import { startLiveResults, type JobRunner } from '../../src/state/results/live';
import { startLiveExchange } from '../../src/state/exchange/live';
import { documentApi } from '../../src/state/documentApi';
import { viewFactorApi } from '../../src/worker/api';
import { demoSketch } from '../../src/state/demo';

afterEach(() => cleanup());

const inThread: JobRunner = {
  run: async (job) => ({ kind: 'done', result: await viewFactorApi.compute(job), elapsedMs: 0 }),
};

function liveDemo() {
  const store = createAppStore(demoSketch);
  startLiveResults(store, inThread, documentApi);
  startLiveExchange(store);
  return store;
}

/** WCAG relative luminance of #rrggbb (common practice: sRGB to linear, Rec. 709 weights). */
function luminance(hex: string): number {
  const lin = [1, 3, 5].map((k) => {
    const c = parseInt(hex.slice(k, k + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * lin[0] + 0.7152 * lin[1] + 0.0722 * lin[2];
}

describe('heat colour scale', () => {
  it('is diverging: lightness rises from both ends to the middle, so it reads without hue', () => {
    const ts = Array.from({ length: 21 }, (_, k) => k / 20);
    const L = ts.map((t) => luminance(divergingColour(t)));
    for (let k = 0; k < 10; k++) expect(L[k + 1]).toBeGreaterThan(L[k]);
    for (let k = 10; k < 20; k++) expect(L[k + 1]).toBeLessThan(L[k]);
    // The two ends differ in hue (blue against orange), not only in lightness.
    const [lo, hi] = [divergingColour(0), divergingColour(1)];
    expect(parseInt(lo.slice(5, 7), 16)).toBeGreaterThan(parseInt(lo.slice(1, 3), 16));
    expect(parseInt(hi.slice(1, 3), 16)).toBeGreaterThan(parseInt(hi.slice(5, 7), 16));
  });

  it('centres net flux on zero and spans temperatures in the shown unit', async () => {
    const store = liveDemo();
    await waitFor(() => expect(store.getState().exchange.kind).toBe('solved'));
    const ex = store.getState().exchange;
    if (ex.kind !== 'solved') throw new Error('not solved');
    const flux = heatScale('netFlux', ex, 'K')!;
    const q = ex.result.netFlux;
    const largest = Math.max(...Array.from(q, Math.abs));
    expect(flux.high).toBe(largest);
    expect(flux.low).toBe(-largest);
    // The surface with the largest |q| sits at one end; a reradiating wall (q = 0) at the middle.
    const k = Array.from(q, Math.abs).indexOf(largest);
    expect(flux.colours.get(ex.names[k])).toBe(divergingColour(q[k] > 0 ? 1 : 0));
    expect(flux.colours.get('refractory roof')).toBe(divergingColour(0.5));
    const temp = heatScale('temperature', ex, 'C')!;
    // The fired floor (1250 K) is the hottest surface.
    expect(temp.high).toBeCloseTo(1250 - 273.15, 9);
    expect(temp.colours.get('fired floor')).toBe(divergingColour(1));
    expect(heatScale('off', ex, 'K')).toBeNull();
  });
});

describe('heat legend over the canvas', () => {
  it('toggles off / net flux / temperature and shows the scale with its unit', async () => {
    const user = userEvent.setup();
    const store = liveDemo();
    render(
      <AppProvider store={store} api={documentApi}>
        <HeatLegend />
      </AppProvider>,
    );
    await waitFor(() => expect(store.getState().exchange.kind).toBe('solved'));
    expect(screen.queryByLabelText('Colour legend')).toBeNull();
    await user.click(screen.getByRole('radio', { name: 'net flux' }));
    expect(store.getState().heatColouring).toBe('netFlux');
    expect(screen.getByLabelText('Colour legend').textContent).toMatch(/Net flux, W\/m² \(> 0 gives heat off\)/);
    await user.click(screen.getByRole('radio', { name: 'temperature' }));
    store.getState().setTemperatureUnit('C');
    await waitFor(() => expect(screen.getByLabelText('Colour legend').textContent).toMatch(/Temperature, °C.*976\.85/));
    await user.click(screen.getByRole('radio', { name: 'off' }));
    expect(screen.queryByLabelText('Colour legend')).toBeNull();
    // Colouring is view state: the document is untouched.
    expect(store.getState().doc).toBe(demoSketch);
  });
});
