// @vitest-environment jsdom
// The panels and keys of issue-10 drawing: the Surfaces note, join and split;
// fields that refuse bad numbers beside the field; typed values in the status
// line; copy keys; notices that close by themselves, at most three.
import { useEffect } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AppProvider, useController } from '../../../src/ui/AppContext';
import { Toolbar } from '../../../src/ui/chrome/Toolbar';
import { Notices } from '../../../src/ui/chrome/Notices';
import { useShortcuts } from '../../../src/ui/chrome/useShortcuts';
import { NOTICE_SHOW_MS } from '../../../src/ui/chrome/useAutoClose';
import { CanvasStatus } from '../../../src/ui/canvas/CanvasStatus';
import { SurfacesPanel } from '../../../src/ui/inspector/SurfacesPanel';
import { SelectionPanel } from '../../../src/ui/inspector/SelectionPanel';
import { createAppStore } from '../../../src/state/store';
import { documentApi } from '../../../src/state/documentApi';
import { addShape } from '../../../src/state/edits/shapeEdits';
import { edgeNames } from '../../../src/state/geometry/polygon';
import type { CanvasController } from '../../../src/state/canvasController';
import type { SketchFile } from '../../../src/state/sketchFile';

afterEach(() => {
  cleanup();
  vi.useRealTimers();
});

function Keys({ onController }: { onController: (c: CanvasController) => void }) {
  useShortcuts();
  const controller = useController();
  useEffect(() => onController(controller), [controller, onController]);
  return null;
}

function box(): SketchFile {
  const doc = addShape({ version: 2, units: 'm', shapes: [] }, 'enclosure', [
    [0, 0],
    [2.4, 0],
    [2.4, 1.5],
    [0, 1.5],
  ]);
  return addShape(
    doc,
    'solid',
    [
      [0.5, 0.5],
      [0.7, 0.5],
      [0.7, 0.7],
    ],
    'tube',
  );
}

function setup(panel: 'surfaces' | 'selection' | 'none' = 'none') {
  const store = createAppStore(box());
  let c: CanvasController | null = null;
  render(
    <AppProvider store={store} api={documentApi}>
      <Toolbar />
      <Keys
        onController={(x) => {
          c = x;
        }}
      />
      <CanvasStatus />
      {panel === 'surfaces' && <SurfacesPanel />}
      {panel === 'selection' && <SelectionPanel />}
      <Notices />
    </AppProvider>,
  );
  return { store, s: () => store.getState(), c: () => c! };
}

const key = (k: string, extra: Partial<KeyboardEventInit> = {}) => fireEvent.keyDown(window, { key: k, ...extra });

describe('surfaces panel', () => {
  it('says what a surface is, joins chosen surfaces and splits one into equal parts', async () => {
    const user = userEvent.setup();
    const { s } = setup('surfaces');
    expect(screen.getByText(/share one radiosity and one temperature/)).toBeTruthy();
    await user.click(screen.getByRole('checkbox', { name: 'Choose surface left wall' }));
    await user.click(screen.getByRole('checkbox', { name: 'Choose surface right wall' }));
    await user.click(screen.getByRole('button', { name: 'Join' }));
    expect(edgeNames(s().doc.shapes[0])).toEqual(['floor', 'right wall', 'roof', 'right wall']);
    // Undo brings both back, one step.
    act(() => s().undo());
    expect(edgeNames(s().doc.shapes[0])).toEqual(['floor', 'right wall', 'roof', 'left wall']);
    act(() => s().setSelection([]));
    await user.click(screen.getByRole('checkbox', { name: 'Choose surface floor' }));
    const parts = screen.getByLabelText('parts');
    await user.clear(parts);
    await user.type(parts, '1001{Enter}');
    expect(screen.getByRole('alert').textContent).toBe('not applied: parts must be at most 1000');
    await user.clear(parts);
    await user.type(parts, '3{Enter}');
    await user.click(screen.getByRole('button', { name: 'Split into 3 parts' }));
    expect(edgeNames(s().doc.shapes[0]).slice(0, 3)).toEqual(['floor 1', 'floor 2', 'floor 3']);
    expect(s().doc.shapes[0].points[1]).toEqual([0.8, 0]);
  });
});

describe('numeric fields', () => {
  it('the grid step refuses letters, zero and huge values with a message and keeps its value', async () => {
    const user = userEvent.setup();
    const { s } = setup();
    const grid = screen.getByLabelText('grid (m)');
    for (const [typed, says] of [
      ['abc', 'not applied: grid (m) "abc" is not a number'],
      ['0', 'not applied: grid (m) must be at least 0.000001'],
      ['1e9', 'not applied: grid (m) must be at most 10000'],
    ]) {
      await user.clear(grid);
      await user.type(grid, `${typed}{Enter}`);
      expect(screen.getByRole('alert').textContent).toBe(says);
      expect(s().gridStep).toBe(0.1);
      expect((grid as HTMLInputElement).value).toBe('0.1');
    }
    await user.clear(grid);
    await user.type(grid, '0.05{Enter}');
    expect(s().gridStep).toBe(0.05);
    expect(screen.queryByRole('alert')).toBeNull();
  });
});

describe('keys', () => {
  it('typed values show in the status line; Ctrl+D duplicates; N hides the names', () => {
    const { s, c } = setup();
    key('r');
    for (const ch of '0.3,0.2') key(ch);
    expect(document.querySelector('.canvas-entry')?.textContent).toMatch(/typed 0\.3,0\.2/);
    key('Enter');
    expect(s().entry).toBe('');
    act(() => s().setSelection([{ type: 'shape', shape: 1 }]));
    key('d', { ctrlKey: true });
    expect(s().doc.shapes[2].surface).toBe('tube 2');
    expect(s().showNames).toBe(true);
    key('n');
    expect(s().showNames).toBe(false);
    act(() => c().cancel());
  });
});

describe('notices', () => {
  it('information closes by itself, errors stay, at most three show', () => {
    vi.useFakeTimers();
    const { s } = setup();
    act(() => {
      s().notify('error', 'E1');
      s().notify('info', 'I1');
      s().notify('warning', 'W1');
      s().notify('info', 'I2');
    });
    expect(screen.queryByText('E1')).toBeNull(); // the oldest went when the fourth came
    expect(document.querySelectorAll('.notice').length).toBe(3);
    act(() => {
      s().notify('error', 'E2');
    });
    act(() => {
      vi.advanceTimersByTime(NOTICE_SHOW_MS + 1);
    });
    expect(screen.getByText('E2')).toBeTruthy();
    expect(screen.queryByText('I2')).toBeNull();
    expect(screen.queryByText('W1')).toBeNull();
    expect(s().notices.map((n) => n.text)).toEqual(['E2']);
    // A notice that offers a button stays until it is used or closed.
    act(() => {
      s().notify('warning', 'Offer', { kind: 'run', label: 'Do it', run: () => {} });
    });
    act(() => {
      vi.advanceTimersByTime(10 * NOTICE_SHOW_MS);
    });
    expect(screen.getByRole('button', { name: 'Do it' })).toBeTruthy();
  });
});
