// Heat exchange in the app store: derived from the shown view factors and the
// document, live, never saved. The chain (exact view factors, dense solve) is
// exact to rounding, so closed forms are checked to 1e-9.
import { describe, expect, it } from 'vitest';
import { LIVE_SOLVE_LIMIT } from '../../src/state/exchange/live';
import { setVertex } from '../../src/state/edits/shapeEdits';
import { setCondition, setSettings } from '../../src/state/exchange/edits';
import { demoSketch } from '../../src/state/demo';
import type { SketchFile } from '../../src/state/sketchFile';
import { main } from '../../src/cli/main';
import { STEFAN_BOLTZMANN as SIGMA } from '../../src/core/exchange';
import { solvedCsv } from '../../src/state/exchange/export';
import Papa from 'papaparse';
import { flush, live, solved, heatOf, close, squares, twoSurface } from './exchangeHelpers';

describe('exchange results in the store', () => {
  it('match the two-surface closed form for concentric squares drawn in mm (lengths converted to metres)', async () => {
    const store = live(squares);
    expect(store.getState().exchange.kind).toBe('none');
    await flush();
    const ex = solved(store);
    expect(ex.stale).toBe(false);
    expect(ex.units).toBe('mm');
    const q = twoSurface(1000, 500, 0.6, 0.8, 0.8, 2.4);
    close(heatOf(ex, 'inner'), q);
    close(heatOf(ex, 'outer'), -q);
    // Net flux is per m^2 of the surface: q'/A.
    close(ex.result.netFlux[ex.names.indexOf('inner')], q / 0.8);
    // Energy balance of a closed enclosure, summed here rather than read from the solver: rounding only.
    expect(Math.abs(heatOf(ex, 'inner') + heatOf(ex, 'outer'))).toBeLessThanOrEqual(1e-12 * q);
    expect(store.getState().doc).toBe(squares); // results never enter the document
  });

  it('a property edit shows at once on the old view factors, is one undo step, and undo brings the old answer back', async () => {
    const store = live(squares);
    await flush();
    const before = heatOf(solved(store), 'inner');
    store.getState().edit((d) => setCondition(d, 'inner', { kind: 'temperature', temperature: 1200 }));
    // Same geometry, so no wait for the worker.
    let ex = solved(store);
    expect(ex.stale).toBe(false);
    close(heatOf(ex, 'inner'), twoSurface(1200, 500, 0.6, 0.8, 0.8, 2.4));
    expect(store.getState().doc.surfaces?.inner).toEqual({ emissivity: 0.6, temperature: 1200 });
    store.getState().undo();
    ex = solved(store);
    close(heatOf(ex, 'inner'), before);
    store.getState().redo();
    close(heatOf(solved(store), 'inner'), twoSurface(1200, 500, 0.6, 0.8, 0.8, 2.4));
  });

  it('adds totals over the depth (W) and keeps them per metre otherwise', async () => {
    const store = live(squares);
    await flush();
    expect(solved(store).result.netHeatTotal).toBeUndefined();
    store.getState().edit((d) => setSettings(d, { depth: 2.5 }));
    const ex = solved(store);
    close(ex.result.netHeatTotal![ex.names.indexOf('inner')], 2.5 * twoSurface(1000, 500, 0.6, 0.8, 0.8, 2.4));
  });

  it('shows the solver message when the problem has no unique answer, and recovers when it has one', async () => {
    const store = live(squares);
    await flush();
    store
      .getState()
      .edit((d) => setCondition(setCondition(d, 'inner', { kind: 'adiabatic' }), 'outer', { kind: 'adiabatic' }));
    const ex = store.getState().exchange;
    expect(ex.kind).toBe('error');
    if (ex.kind === 'error') expect(ex.message).toMatch(/no unique answer.*give at least one surface a temperature/);
    store.getState().edit((d) => setCondition(d, 'outer', { kind: 'temperature', temperature: 500 }));
    // Inner reradiating in a 500 K enclosure: it settles at 500 K with no net heat.
    const ok = solved(store);
    close(ok.result.temperature[ok.names.indexOf('inner')], 500);
    expect(Math.abs(heatOf(ok, 'inner'))).toBeLessThan(1e-9);
  });

  it('names the surface when an open sketch or an opening needs a surroundings temperature', async () => {
    const plate: SketchFile = {
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
      ],
      surfaces: { plate: { emissivity: 0.5, temperature: 400 } },
    };
    const store = live(plate);
    await flush();
    const ex = store.getState().exchange;
    expect(ex.kind).toBe('error');
    if (ex.kind === 'error') {
      expect(ex.surface).toBe('plate');
      expect(ex.message).toMatch(/'plate' sees the surroundings.*no surroundings temperature/);
    }
    store.getState().edit((d) => setSettings(d, { surroundingsTemperature: 300 }));
    // A convex body in open space sees only the surroundings (F_i,s = 1): q' = e sigma (T^4 - Ts^4) A
    // (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., sec. 12.7, small body in large surroundings, from memory).
    close(heatOf(solved(store), 'plate'), 0.5 * SIGMA * (400 ** 4 - 300 ** 4) * 2.2);
  });

  it('an imposed flux the surface cannot take up gives the solver message naming it', async () => {
    const store = live(squares);
    await flush();
    // Taking up 1e7 W/m^2 from a 500 K enclosure would need a temperature below absolute zero.
    store.getState().edit((d) => setCondition(d, 'inner', { kind: 'heatFlux', heatFlux: -1e7 }));
    const ex = store.getState().exchange;
    expect(ex.kind).toBe('error');
    if (ex.kind === 'error') {
      expect(ex.surface).toBe('inner');
      expect(ex.message).toMatch(/no physical answer.*below absolute zero/);
    }
  });

  it('while geometry is being edited, results are those of the shown view factors, marked stale, with their own properties', async () => {
    const store = live(squares);
    await flush();
    const shown = store.getState().viewFactors.edges;
    store.getState().beginGesture();
    store.getState().updateGesture(setVertex(store.getState().doc, 1, 1, [450, 200]));
    const ex = solved(store);
    expect(store.getState().viewFactors.edges).toBe(shown);
    expect(ex.stale).toBe(true);
    close(heatOf(ex, 'inner'), twoSurface(1000, 500, 0.6, 0.8, 0.8, 2.4));
    store.getState().endGesture();
    await flush();
    const after = solved(store);
    expect(after.stale).toBe(false);
    // The inner body is now the convex quadrilateral (200, 200), (450, 200), (400, 400), (200, 400) mm:
    // still F_12 = 1, so the same closed form with its perimeter 250 + sqrt(50^2 + 200^2) + 200 + 200 mm.
    const A1 = (650 + Math.hypot(50, 200)) / 1000;
    close(heatOf(after, 'inner'), twoSurface(1000, 500, 0.6, 0.8, A1, 2.4));
  });

  it('with more surfaces than a frame can solve, a drag waits for its end (stale meanwhile), then solves', async () => {
    // A regular 320-gon enclosure, every edge its own surface, one of them hot.
    const n = LIVE_SOLVE_LIMIT + 20;
    const points = Array.from({ length: n }, (_, k): [number, number] => [
      Math.cos((2 * Math.PI * k) / n),
      Math.sin((2 * Math.PI * k) / n),
    ]);
    const names = points.map((_, k) => `wall ${k}`);
    const ring: SketchFile = {
      version: 1,
      units: 'm',
      shapes: [{ kind: 'enclosure', points, surface: names }],
      surfaces: { 'wall 0': { temperature: 800 } },
    };
    const store = live(ring);
    await flush();
    const first = solved(store);
    expect(first.names).toHaveLength(n);
    store.getState().beginGesture();
    store.getState().updateGesture(setVertex(store.getState().doc, 0, 5, [0.9, 0.1]));
    await flush(); // the view factors of the dragged shape arrive during the gesture
    expect(store.getState().viewFactors.status).toBe('ready'); // factors for the dragged geometry are in
    const during = solved(store);
    expect(during.stale).toBe(true);
    expect(during.result).toBe(first.result); // not solved again mid-drag
    store.getState().endGesture();
    const after = solved(store);
    expect(after.stale).toBe(false);
    expect(after.result).not.toBe(first.result);
    expect(after.result.temperature).toHaveLength(n);
    // A closed enclosure of reradiating walls around one wall at 800 K settles at 800 K throughout (equilibrium, common practice).
    for (const T of after.result.temperature) expect(Math.abs(T - 800)).toBeLessThanOrEqual(1e-9 * 800);
  });

  it('agree with what the command line prints for the same file (the demo oven)', async () => {
    const store = live(demoSketch);
    await flush();
    const ex = solved(store);
    let out = '';
    const code = main(['exchange', 'demo.json', '--json'], {
      out: (t) => void (out += t),
      err: () => {},
      readFile: () => JSON.stringify(demoSketch),
    });
    expect(code).toBe(0);
    const cli = JSON.parse(out) as {
      surfaces: { name: string; netHeat: number; temperature: number; netFlux: number }[];
    };
    // The two share the solver, so this is an agreement check (the plumbing: names, order, units).
    expect(cli.surfaces.map((s) => s.name)).toEqual(ex.names);
    expect(ex.names).toEqual(['fired floor', 'side walls', 'refractory roof', 'tube 1', 'tube 2', 'tube 3', 'tube 4']);
    cli.surfaces.forEach((s, i) => {
      expect(ex.result.netHeat[i]).toBe(s.netHeat);
      expect(ex.result.temperature[i]).toBe(s.temperature);
      expect(ex.result.netFlux[i]).toBe(s.netFlux);
    });
    // Checks of the content, independent of the solver: the oven is closed, so what the floor gives off
    // the tubes take up (energy conservation); the reradiating walls pass on all they receive (q = 0);
    // the surfaces held at a temperature keep it (the demo's data: floor 1250 K, tubes 900 K).
    const floor = cli.surfaces[0].netHeat;
    expect(floor).toBeGreaterThan(0);
    const sum = cli.surfaces.reduce((a, s) => a + s.netHeat, 0);
    expect(Math.abs(sum)).toBeLessThanOrEqual(1e-9 * floor);
    for (const wall of [1, 2]) expect(Math.abs(cli.surfaces[wall].netHeat)).toBeLessThanOrEqual(1e-9 * floor);
    expect(cli.surfaces.map((s) => s.temperature).filter((_, i) => i !== 1 && i !== 2)).toEqual([
      1250, 900, 900, 900, 900,
    ]);
    // The four tubes sit symmetrically in pairs about the oven's mid-plane x = 1.2 m: tube 1 mirrors tube 4, tube 2 tube 3.
    expect(Math.abs(cli.surfaces[3].netHeat - cli.surfaces[6].netHeat)).toBeLessThanOrEqual(1e-9 * floor);
    expect(Math.abs(cli.surfaces[4].netHeat - cli.surfaces[5].netHeat)).toBeLessThanOrEqual(1e-9 * floor);
  });
});

describe('exchange export', () => {
  it("the app's net heat CSV is exactly what the command line prints with exchange --csv", async () => {
    const store = live(demoSketch);
    await flush();
    let out = '';
    const code = main(['exchange', 'demo.json', '--csv'], {
      out: (t) => void (out += t),
      err: () => {},
      readFile: () => JSON.stringify(demoSketch),
    });
    expect(code).toBe(0);
    // The two share a writer, so this is an agreement check; the next test checks the content.
    expect(solvedCsv(solved(store))).toBe(out);
  });

  it("the app's net heat CSV holds the two-surface closed form in the right cells", async () => {
    const store = live(squares);
    await flush();
    const rows = Papa.parse<string[]>(solvedCsv(solved(store)).trim(), { newline: '\r\n' }).data;
    expect(rows[0]).toEqual([
      'surface',
      'length (mm)',
      'emissivity',
      'condition',
      'temperature (K)',
      'net heat (W/m)',
      'net flux (W/m^2)',
      'radiosity (W/m^2)',
      'convection heat (W/m)',
      'supplied heat (W/m)',
    ]);
    const row = (name: string) => rows.find((r) => r[0] === name)!;
    // Outer square: 4 x 600 mm, emissivity 0.8, held at 500 K (the sketch's data).
    expect([Number(row('outer')[1]), Number(row('outer')[2]), row('outer')[3], Number(row('outer')[4])]).toEqual([
      2400,
      0.8,
      'temperature',
      500,
    ]);
    close(Number(row('inner')[5]), twoSurface(1000, 500, 0.6, 0.8, 0.8, 2.4));
    close(Number(row('outer')[5]), -twoSurface(1000, 500, 0.6, 0.8, 0.8, 2.4));
    // Net flux = net heat / length (0.8 m of inner surface per metre of depth).
    close(Number(row('inner')[6]), twoSurface(1000, 500, 0.6, 0.8, 0.8, 2.4) / 0.8);
  });
});
