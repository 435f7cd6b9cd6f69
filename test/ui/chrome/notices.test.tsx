// @vitest-environment jsdom
// The page side of autosave under pressure: a second tab shows the offer to
// take over and the button does it; storage full shows the offer to save to a
// file and the button downloads the sketch.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, configure, render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { App } from '../../../src/ui/App';
import { AppProvider } from '../../../src/ui/AppContext';
import { startRuntime } from '../../../src/state/runtime';
import { documentApi } from '../../../src/state/documentApi';
import { demoSketch } from '../../../src/state/demo';
import { AUTOSAVE_KEY, FULL_TEXT } from '../../../src/state/autosave';
import { LEASE_KEY, type TabChannel } from '../../../src/state/tabs/lease';
import { setVertex } from '../../../src/state/edits/shapeEdits';
import { MemoryStorage } from '../../state/memoryStorage';
import { FakeBus } from '../../state/tabs/fakeChannel';
import { inThreadWorker } from '../renderApp';

vi.mock('../../../src/ui/canvas/SketchCanvas', () => ({ SketchCanvas: () => <div data-testid="canvas-stub" /> }));

configure({ asyncUtilTimeout: 8000 });
afterEach(() => cleanup());

function tab(storage: MemoryStorage, channel: TabChannel | null) {
  const runtime = startRuntime({ storage, api: documentApi, spawn: inThreadWorker, demo: demoSketch, channel });
  return runtime;
}

describe('notices that offer an action', () => {
  it('a second tab offers to take over; the button makes it the one that saves', async () => {
    const user = userEvent.setup();
    const storage = new MemoryStorage();
    const bus = new FakeBus();
    const first = tab(storage, bus.channel());
    const second = tab(storage, bus.channel());
    render(
      <AppProvider store={second.store} api={documentApi}>
        <App />
      </AppProvider>,
    );
    const button = await screen.findByRole('button', { name: 'Take over here' });
    expect(screen.getByText(/open in another tab/)).toBeTruthy();
    const firstId = storage.getItem(LEASE_KEY);
    expect(firstId).not.toBeNull();
    await user.click(button);
    expect(storage.getItem(LEASE_KEY)).not.toBe(firstId);
    expect(storage.getItem(LEASE_KEY)).not.toBeNull();
    await waitFor(() =>
      expect(first.store.getState().notices.some((n) => n.action?.label === 'Take over here')).toBe(true),
    );
    expect(screen.queryByRole('button', { name: 'Take over here' })).toBeNull();
    // The first tab's edits are no longer written; the second tab's are.
    const before = storage.getItem(AUTOSAVE_KEY);
    first.store.getState().edit((d) => setVertex(d, 0, 0, [0.01, 0]));
    expect(storage.getItem(AUTOSAVE_KEY)).toBe(before);
    second.store.getState().edit((d) => setVertex(d, 0, 0, [0.02, 0]));
    expect(storage.getItem(AUTOSAVE_KEY)).not.toBe(before);
    first.dispose();
    second.dispose();
  });

  it('storage full: the notice offers to save to a file, and the button downloads the sketch', async () => {
    const user = userEvent.setup();
    const storage = new MemoryStorage();
    const runtime = tab(storage, null);
    const made: Blob[] = [];
    URL.createObjectURL = (blob: Blob) => {
      made.push(blob);
      return 'blob:sketch';
    };
    URL.revokeObjectURL = () => {};
    const clicked = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => {});
    render(
      <AppProvider store={runtime.store} api={documentApi}>
        <App />
      </AppProvider>,
    );
    storage.refuseWrites = true;
    runtime.store.getState().edit((d) => setVertex(d, 0, 0, [0.01, 0]));
    expect(await screen.findByText(FULL_TEXT)).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Save to a file' }));
    expect(clicked).toHaveBeenCalledTimes(1);
    expect(made).toHaveLength(1);
    const saved = documentApi.restore(await made[0].text());
    expect(saved.ok && saved.sketch.shapes[0].points[0]).toEqual([0.01, 0]);
    expect(screen.queryByText(FULL_TEXT)).toBeNull();
    clicked.mockRestore();
    runtime.dispose();
  });
});
