// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, configure, fireEvent, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { renderApp } from './renderApp';
import { demoSketch } from '../../src/state/demo';
import { AUTOSAVE_KEY, SET_ASIDE_PREFIX } from '../../src/state/autosave';
import { MemoryStorage } from '../state/memoryStorage';
import { spawner } from '../worker/fakeWorker';
import { viewFactorApi } from '../../src/worker/api';
import type { SketchFile } from '../../src/state/sketchFile';
import { setVertex } from '../../src/state/edits/shapeEdits';

vi.mock('../../src/ui/canvas/SketchCanvas', () => ({ SketchCanvas: () => <div data-testid="canvas-stub" /> }));

// The whole suite shares two cores in CI: give async queries room.
configure({ asyncUtilTimeout: 8000 });
afterEach(() => cleanup());

const matrix = () => screen.getByRole('table', { name: /view factor/i });

describe('the app', () => {
  it('opens the demo with its matrix, a CSV button and the safety caution', async () => {
    renderApp();
    await waitFor(() => expect(within(matrix()).getByRole('rowheader', { name: /fired floor/ })).toBeTruthy());
    expect(within(matrix()).getAllByRole('row')).toHaveLength(1 + 7);
    expect(screen.getByRole('button', { name: /CSV/ })).toBeTruthy();
    expect(screen.getByRole('note', { name: /safety/i }).textContent).toMatch(
      /gray-diffuse radiation.*no absorbing gas.*licensed engineering practice/i,
    );
    await waitFor(() => expect(document.querySelector('[data-status]')?.textContent).toMatch(/Up to date/));
  });

  it('opening a bad file shows what is wrong and leaves the sketch untouched', async () => {
    const user = userEvent.setup();
    const { store } = renderApp();
    const before = store.getState().doc;
    const input = screen.getByLabelText<HTMLInputElement>('Sketch file to open');
    const bad = new File(['{"version": 1, "units": "furlong", "shapes": []}'], 'colleague.json', {
      type: 'application/json',
    });
    await user.upload(input, bad);
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Could not open "colleague.json"');
    expect(alert.textContent).toMatch(/units/);
    expect(store.getState().doc).toBe(before);
    const good = new File(
      [
        JSON.stringify({
          version: 1,
          units: 'mm',
          shapes: [
            {
              kind: 'enclosure',
              points: [
                [0, 0],
                [100, 0],
                [0, 100],
              ],
              surface: 'w',
            },
          ],
        }),
      ],
      'ok.json',
    );
    await user.upload(input, good);
    await waitFor(() => expect(store.getState().doc.units).toBe('mm'));
    // Opening is one undo step.
    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(store.getState().doc).toBe(before);
  });

  it('renders surface names as text, never as HTML', async () => {
    const { store } = renderApp();
    const nasty = '<img src=x onerror="window.__hacked=1">';
    store.getState().edit((d) => ({ ...d, shapes: d.shapes.map((s, i) => (i === 1 ? { ...s, surface: nasty } : s)) }));
    await waitFor(() => expect(within(matrix()).getByRole('rowheader', { name: nasty })).toBeTruthy());
    expect(document.querySelector('img')).toBeNull();
    expect((window as unknown as { __hacked?: number }).__hacked).toBeUndefined();
  });

  it('groups selected edges into a named surface and renames it in the Surfaces tab', async () => {
    const user = userEvent.setup();
    const { store } = renderApp();
    store.getState().setSelection([
      { type: 'edge', shape: 0, index: 0 },
      { type: 'edge', shape: 0, index: 2 },
    ]);
    await user.type(await screen.findByLabelText('surface name'), 'hot faces');
    await user.click(screen.getByRole('button', { name: 'Group' }));
    expect(store.getState().doc.shapes[0].surface).toEqual([
      'hot faces',
      'side walls',
      'hot faces',
      'refractory roof',
      'refractory roof',
      'side walls',
    ]);
    await user.click(screen.getByRole('tab', { name: 'Surfaces' }));
    const name = screen.getByDisplayValue('hot faces');
    await user.clear(name);
    // A name is plain text: even "__proto__" names a surface like any other.
    await user.type(name, '__proto__{Enter}');
    expect(store.getState().doc.shapes[0].surface[0]).toBe('__proto__');
    const again = screen.getByDisplayValue('__proto__');
    await user.clear(again);
    await user.type(again, 'burner row{Enter}');
    expect(store.getState().doc.shapes[0].surface[0]).toBe('burner row');
    await waitFor(() => expect(within(matrix()).getByRole('rowheader', { name: /burner row/ })).toBeTruthy());
    // Ctrl+Z three times (two renames, the grouping) brings the demo back.
    for (let k = 0; k < 3; k++) fireEvent.keyDown(window, { key: 'z', ctrlKey: true });
    expect(store.getState().doc).toBe(demoSketch);
    fireEvent.keyDown(window, { key: 'Z', ctrlKey: true, shiftKey: true });
    expect(store.getState().doc.shapes[0].surface[0]).toBe('hot faces');
  });

  it('edits a vertex numerically from the Edit tab', async () => {
    const user = userEvent.setup();
    const { store } = renderApp();
    store.getState().setSelection([{ type: 'vertex', shape: 0, index: 2 }]);
    const x = await screen.findByLabelText('x (m)');
    await user.clear(x);
    await user.type(x, '2.5{Enter}');
    expect(store.getState().doc.shapes[0].points[2]).toEqual([2.5, 1.2]);
    await user.clear(x);
    await user.type(x, 'abc{Enter}'); // refused: the value goes back
    expect(store.getState().doc.shapes[0].points[2]).toEqual([2.5, 1.2]);
    expect((x as HTMLInputElement).value).toBe('2.5');
  });

  it('a vertex moved elsewhere shows its new x, and typing its y keeps that x', async () => {
    const user = userEvent.setup();
    const { store } = renderApp();
    store.getState().setSelection([{ type: 'vertex', shape: 0, index: 2 }]);
    const x = await screen.findByLabelText('x (m)');
    // Moved by another edit (a drag on the canvas): the row shows it.
    act(() => store.getState().edit((d) => setVertex(d, 0, 2, [2.7, 1.2])));
    await waitFor(() => expect((x as HTMLInputElement).value).toBe('2.7'));
    const y = screen.getByLabelText('y (m)');
    await user.clear(y);
    await user.type(y, '1.3{Enter}');
    expect(store.getState().doc.shapes[0].points[2]).toEqual([2.7, 1.3]);
  });

  it('tells the user when a corrupt autosave was set aside', async () => {
    const storage = new MemoryStorage();
    storage.setItem(AUTOSAVE_KEY, 'not json at all');
    renderApp({ storage });
    const notice = await screen.findByText(/autosaved sketch could not be read/);
    expect(notice.textContent).toContain(SET_ASIDE_PREFIX);
    expect(storage.keys().some((k) => k.startsWith(SET_ASIDE_PREFIX))).toBe(true);
  });

  it('recovers from a worker that throws and one that hangs, keeping the document', async () => {
    const { workers, spawn } = spawner();
    // Time limit: long enough that rendering on a loaded machine does not pass it before the fault is injected.
    const { store } = renderApp({ spawn, timeLimitMs: 300 });
    await waitFor(() => expect(workers[0]?.calls).toHaveLength(1));
    workers[0].calls[0].reject(new Error('simulated fault'));
    expect((await screen.findByRole('alert')).textContent).toMatch(/failed \(simulated fault\).*restarted/);
    expect(document.querySelector('[data-status]')?.getAttribute('data-status')).toBe('error');
    expect(store.getState().doc).toBe(demoSketch);
    // The next job hangs: after the time limit the app says so and is not stuck computing.
    // A change of geometry posts a job (units or names would not).
    const shift =
      (dx: number) =>
      (d: SketchFile): SketchFile => ({
        ...d,
        shapes: d.shapes.map((sh) => ({
          ...sh,
          points: sh.points.map(([x, y]): [number, number] => [x + dx, y]),
          // The demo's tubes are circles: their centres move with the rest.
          ...(sh.circle ? { circle: { ...sh.circle, center: [sh.circle.center[0] + dx, sh.circle.center[1]] } } : {}),
        })),
      });
    store.getState().edit(shift(0.5));
    // (The job reaching the new worker is checked rather than the brief "computing"
    // state, which a loaded machine can pass before the first poll.)
    await waitFor(() => expect(workers[1]?.calls).toHaveLength(1));
    // It is retried once on a fresh worker, which hangs too; then the app says so.
    await waitFor(() =>
      expect(screen.getAllByRole('alert').some((a) => /took too long/.test(a.textContent ?? ''))).toBe(true),
    );
    expect(workers[2].calls).toHaveLength(1);
    expect(document.querySelector('[data-status]')?.getAttribute('data-status')).toBe('error');
    expect(store.getState().doc.shapes[0].points[0][0]).toBe(demoSketch.shapes[0].points[0][0] + 0.5);
    // A fourth, healthy worker answers the next edit.
    store.getState().edit(shift(0.25));
    await waitFor(() => expect(workers[3]?.calls).toHaveLength(1));
    const call = workers[3].calls[0];
    call.resolve(await viewFactorApi.compute(call.job));
    await waitFor(() => expect(document.querySelector('[data-status]')?.getAttribute('data-status')).toBe('ready'));
    expect(within(matrix()).getAllByRole('row')).toHaveLength(8);
  });
});

describe('number fields', () => {
  it('leaving an untouched coordinate field keeps the exact stored value', async () => {
    const user = userEvent.setup();
    const { store } = renderApp();
    store.getState().setSelection([{ type: 'shape', shape: 1 }]);
    const exact = store.getState().doc.shapes[1].points[1];
    const fields = await screen.findAllByLabelText('x (m)');
    await user.click(fields[1]);
    await user.tab();
    expect(store.getState().doc.shapes[1].points[1]).toBe(exact);
    expect(store.getState().past).toHaveLength(0);
  });

  it('a long point list (a tube as a 24-gon) stays folded until asked for, then edits as before', async () => {
    const user = userEvent.setup();
    const { store } = renderApp();
    const ring = Array.from({ length: 24 }, (_, k): [number, number] => [
      1.2 + 0.1 * Math.cos((2 * Math.PI * k) / 24),
      0.6 + 0.1 * Math.sin((2 * Math.PI * k) / 24),
    ]);
    act(() =>
      store
        .getState()
        .edit((d) => ({ ...d, shapes: [...d.shapes, { kind: 'solid', points: ring, surface: 'probe' }] })),
    );
    store.getState().setSelection([{ type: 'shape', shape: store.getState().doc.shapes.length - 1 }]);
    const show = await screen.findByRole('button', { name: 'Show the 24 points' });
    expect(screen.queryAllByLabelText('x (m)')).toHaveLength(0);
    await user.click(show);
    const fields = screen.getAllByLabelText('x (m)');
    expect(fields).toHaveLength(24);
    await user.clear(fields[3]);
    await user.type(fields[3], '1.25{Enter}');
    const last = store.getState().doc.shapes.length - 1;
    expect(store.getState().doc.shapes[last].points[3]).toEqual([1.25, ring[3][1]]);
    expect(screen.getByRole('button', { name: 'Hide the points' }).getAttribute('aria-expanded')).toBe('true');
  });
});
