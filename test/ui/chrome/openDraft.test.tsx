// @vitest-environment jsdom
// A file whose drawing breaks a rule opens as a draft: problems marked, no
// results (neither computed nor left over from the sketch that was open).
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, configure, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { renderApp } from '../renderApp';
import { spawner } from '../../worker/fakeWorker';
import { viewFactorApi } from '../../../src/worker/api';
import { documentApi } from '../../../src/state/documentApi';
import { openSketchText } from '../../../src/state/files';

vi.mock('../../../src/ui/canvas/SketchCanvas', () => ({ SketchCanvas: () => <div data-testid="canvas-stub" /> }));

configure({ asyncUtilTimeout: 8000 });
afterEach(() => cleanup());

// An enclosure with a body poking through its wall (bodies must lie inside).
const overlapping = {
  version: 1,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [4, 0],
        [4, 2],
        [0, 2],
      ],
      surface: 'wall',
    },
    {
      kind: 'solid',
      points: [
        [3.5, 0.5],
        [4.5, 0.5],
        [4.5, 1],
        [3.5, 1],
      ],
      surface: 'block',
    },
  ],
};

describe('opening a draft', () => {
  it('shows the sketch with its problems, no results, and says so', async () => {
    const user = userEvent.setup();
    const { store } = renderApp();
    await waitFor(() => expect(document.querySelector('[data-status]')?.getAttribute('data-status')).toBe('ready'));
    const input = screen.getByLabelText<HTMLInputElement>('Sketch file to open');
    await user.upload(input, new File([JSON.stringify(overlapping)], 'half-done.json', { type: 'application/json' }));
    await waitFor(() => expect(store.getState().doc.shapes[1]?.surface).toBe('block'));
    expect(store.getState().doc.shapes[1].points).toEqual(overlapping.shapes[1].points);
    const notice = store.getState().notices.at(-1);
    expect(notice?.level).toBe('warning');
    expect(notice?.text).toMatch(/Opened "half-done.json" as a draft/);
    const vf = store.getState().viewFactors;
    expect(vf.status).toBe('invalid');
    expect(vf.problems.length).toBeGreaterThan(0);
    expect(vf.problems[0].place.shapes.length).toBeGreaterThan(0);
    // The demo's factors are not shown for this drawing.
    expect(vf.edges).toBeNull();
    expect(document.querySelector('[data-status]')?.textContent).toMatch(/invalid: no results/);
    expect(screen.queryByRole('table', { name: /view factor/i })).toBeNull();
  });
});

describe('opening a draft while a calculation runs', () => {
  it('the late answer for the old sketch is not shown for the draft', async () => {
    const { workers, spawn } = spawner();
    const { store } = renderApp({ spawn });
    await waitFor(() => expect(workers[0]?.calls).toHaveLength(1)); // the demo's job, not answered yet
    expect(openSketchText(store, documentApi, JSON.stringify(overlapping), 'half-done.json')).toBe(true);
    expect(store.getState().viewFactors.status).toBe('invalid');
    const call = workers[0].calls[0];
    call.resolve(await viewFactorApi.compute(call.job));
    await new Promise((r) => setTimeout(r, 0));
    expect(store.getState().viewFactors.edges).toBeNull();
    expect(document.querySelector('[data-status]')?.textContent).toMatch(/invalid: no results/);
  });
});
