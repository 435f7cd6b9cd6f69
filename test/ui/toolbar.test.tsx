// @vitest-environment jsdom
// The toolbar, the shortcut keys, the help and the status line, all read from the tool registry.
import { useEffect } from 'react';
import { afterEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { AppProvider, useController } from '../../src/ui/AppContext';
import { Toolbar } from '../../src/ui/chrome/Toolbar';
import { HelpOverlay } from '../../src/ui/chrome/HelpOverlay';
import { useShortcuts } from '../../src/ui/chrome/useShortcuts';
import { CanvasStatus } from '../../src/ui/canvas/CanvasStatus';
import { createAppStore } from '../../src/state/store';
import { emptySketch } from '../../src/state/documentSlice';
import { documentApi } from '../../src/state/documentApi';
import type { CanvasController } from '../../src/state/canvasController';

afterEach(() => cleanup());

/** Installs the app's key handling and hands out the app's canvas controller. */
function Keys({ onController }: { onController: (c: CanvasController) => void }) {
  useShortcuts();
  const controller = useController();
  useEffect(() => onController(controller), [controller, onController]);
  return null;
}

function setup() {
  const store = createAppStore(emptySketch);
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
      <HelpOverlay />
    </AppProvider>,
  );
  if (!c) throw new Error('the controller was not handed out');
  return { store, c: c as CanvasController };
}

const key = (k: string) =>
  act(() => {
    fireEvent.keyDown(window, { key: k });
  });
const at = (x: number, y: number) => ({ at: [x, y] as [number, number], shift: false, tolerance: 0.05 });

describe('tools in the chrome', () => {
  it('shows one button per tool in order, the active one pressed, with its shortcut in the tooltip', () => {
    const { store } = setup();
    const group = screen.getByRole('group', { name: 'Tool' });
    const buttons = within(group).getAllByRole('button');
    expect(buttons.map((b) => b.textContent)).toEqual(['Select', 'Enclosure', 'Body', 'Rectangle', 'Tube']);
    expect(buttons[0].getAttribute('aria-pressed')).toBe('true');
    expect(buttons[4].title).toMatch(/^Tube \(T\): Drag from the centre/);
    fireEvent.click(buttons[2]);
    expect(store.getState().tool).toBe('solid');
  });

  it('tool letters switch tools; the tube shows what it makes, which writes to the store', () => {
    const { store } = setup();
    expect(screen.queryByLabelText('sides')).toBeNull();
    for (const [k, id] of [
      ['e', 'enclosure'],
      ['B', 'solid'],
      ['r', 'rectangle'],
      ['t', 'tube'],
      ['v', 'select'],
    ] as const) {
      key(k);
      expect(store.getState().tool).toBe(id);
    }
    key('t');
    // Tubes are exact circles: no number of sides to set.
    expect(screen.queryByLabelText('sides')).toBeNull();
    fireEvent.change(screen.getByRole('combobox'), { target: { value: 'enclosure' } });
    expect(store.getState().quickKind).toBe('enclosure');
    key('r');
    expect(screen.getByRole('combobox')).toBeTruthy();
  });

  it('Enter, Backspace and Escape reach the outline being drawn; the status line counts its points', () => {
    const { store, c } = setup();
    key('e');
    act(() => {
      for (const [x, y] of [
        [0, 0],
        [2, 0],
        [2, 1],
        [1, 2],
      ])
        c.press(at(x, y));
    });
    expect(document.querySelector('.canvas-status')?.textContent).toMatch(
      /Click the corners of the enclosing wall.* — 4 points so far$/,
    );
    key('Backspace');
    expect(store.getState().draft).toHaveLength(3);
    key('Enter');
    expect(store.getState().doc.shapes[0].points).toEqual([
      [0, 0],
      [2, 0],
      [2, 1],
    ]);
    act(() => {
      c.press(at(0, 0));
    });
    key('Escape');
    expect(store.getState().draft).toEqual([]);
    expect(store.getState().selection).toHaveLength(1);
    key('Escape');
    expect(store.getState().selection).toEqual([]);
  });

  it('the help lists every tool with its key', () => {
    setup();
    key('?');
    const dialog = screen.getByRole('dialog');
    const rows = within(dialog)
      .getAllByRole('row')
      .map((r) => r.textContent);
    expect(rows.slice(0, 5)).toEqual([
      expect.stringMatching(/^VSelect: /),
      expect.stringMatching(/^EEnclosure: /),
      expect.stringMatching(/^BBody: /),
      expect.stringMatching(/^RRectangle: /),
      expect.stringMatching(/^TTube: /),
    ]);
  });
});
