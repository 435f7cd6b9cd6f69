// @vitest-environment jsdom
// The tube row form: place a row from the selected wall, change its number of
// tubes in the panel (the tubes follow), split it into single tubes.
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AppProvider } from '../../../src/ui/AppContext';
import { SelectionPanel } from '../../../src/ui/inspector/SelectionPanel';
import { createAppStore } from '../../../src/state/store';
import { documentApi } from '../../../src/state/documentApi';
import { addShape } from '../../../src/state/edits/shapeEdits';

afterEach(cleanup);

function setup() {
  const doc = addShape({ version: 2, units: 'm', shapes: [] }, 'enclosure', [
    [0, 0],
    [2.4, 0],
    [2.4, 1.5],
    [0, 1.5],
  ]);
  const store = createAppStore(doc);
  // The roof (edge 3) chosen as the wall to measure from.
  store.getState().setSelection([{ type: 'edge', shape: 0, index: 2 }]);
  render(
    <AppProvider store={store} api={documentApi}>
      <SelectionPanel />
    </AppProvider>,
  );
  return () => store.getState();
}

describe('tube row form', () => {
  it('places a row from the roof, changes n in the panel, and splits the row into tubes', async () => {
    const user = userEvent.setup();
    const s = setup();
    await user.click(screen.getByRole('button', { name: 'Place tube row' }));
    expect(s().doc.rows?.['row 1']).toEqual({
      count: 4,
      diameter: 0.1143,
      pitch: 0.3,
      from: { wall: 'roof', distance: 0.3 },
    });
    // The tubes are selected: the panel now shows the row itself.
    const form = within(screen.getByRole('heading', { name: 'Tube row row 1' }).parentElement!);
    const tubes = form.getByLabelText('tubes');
    await user.clear(tubes);
    await user.type(tubes, '6{Enter}');
    expect(s().doc.shapes.filter((t) => t.row === 'row 1')).toHaveLength(6);
    expect(s().past).toHaveLength(2);
    const pitch = form.getByLabelText('pitch (m)');
    await user.clear(pitch);
    await user.type(pitch, '0.1{Enter}');
    expect(form.getByRole('alert').textContent).toMatch(/^Not changed: the pitch \(0\.1\) must be greater than/);
    expect(s().doc.rows?.['row 1'].pitch).toBe(0.3);
    await user.click(form.getByRole('button', { name: 'Split row into tubes' }));
    expect(s().doc.rows).toBeUndefined();
    expect(s().doc.shapes).toHaveLength(7);
    expect(screen.getByRole('button', { name: 'Place tube row' })).toBeTruthy();
  });
});
