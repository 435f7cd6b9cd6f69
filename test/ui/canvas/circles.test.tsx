// @vitest-environment jsdom
// Exact circles in the UI: the screen polylines the canvas layers draw for each
// arc (checked against the circle's centre and radius mapped by the camera), and
// the Edit tab's centre and diameter fields.
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AppProvider } from '../../../src/ui/AppContext';
import { SelectionPanel } from '../../../src/ui/inspector/SelectionPanel';
import { arcScreenPoints } from '../../../src/ui/canvas/circleDrawing';
import { createAppStore } from '../../../src/state/store';
import { documentApi } from '../../../src/state/documentApi';
import type { CircleShape } from '../../../src/state/edits/circleShapes';
import type { SketchFile } from '../../../src/state/sketchFile';

afterEach(cleanup);

const tube = (kind: 'solid' | 'enclosure'): CircleShape => ({
  kind,
  points: [],
  circle: { center: [1, 2], radius: 0.5 },
  surface: ['a', 'b', 'c'],
});
const camera = { scale: 100, originX: 10, originY: 400 };

function pairs(flat: number[]): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i < flat.length; i += 2) out.push([flat[i], flat[i + 1]]);
  return out;
}

describe('circle drawing', () => {
  it('each arc lies on the rim, from its start angle anticlockwise (screen y down)', () => {
    // Centre (1, 2) on screen: (10 + 100, 400 - 200) = (110, 200); radius 50 px.
    const pts = pairs(arcScreenPoints(camera, tube('solid'), 1));
    for (const [x, y] of pts) expect(Math.hypot(x - 110, y - 200)).toBeCloseTo(50, 9);
    // Arc 2 of 3 runs from 120° to 240°.
    const a0 = (2 * Math.PI) / 3;
    expect(pts[0][0]).toBeCloseTo(110 + 50 * Math.cos(a0), 9);
    expect(pts[0][1]).toBeCloseTo(200 - 50 * Math.sin(a0), 9);
    expect(pts[pts.length - 1][1]).toBeCloseTo(200 - 50 * Math.sin(2 * a0), 9);
  });

  it('the radiating-side shading lies outside a tube and inside a shell', () => {
    const out = pairs(arcScreenPoints(camera, tube('solid'), 0, 4));
    const inn = pairs(arcScreenPoints(camera, tube('enclosure'), 0, 4));
    for (const [x, y] of out) expect(Math.hypot(x - 110, y - 200)).toBeCloseTo(54, 9);
    for (const [x, y] of inn) expect(Math.hypot(x - 110, y - 200)).toBeCloseTo(46, 9);
  });
});

describe('the Edit tab for a circle', () => {
  it('shows centre and diameter and a typed diameter sets the radius', async () => {
    const doc: SketchFile = { version: 2, units: 'm', shapes: [tube('solid')] };
    const store = createAppStore(doc);
    store.getState().setSelection([{ type: 'shape', shape: 0 }]);
    render(
      <AppProvider store={store} api={documentApi}>
        <SelectionPanel />
      </AppProvider>,
    );
    const item = within(screen.getByText(/circle, 3 arcs/).closest('.item') as HTMLElement);
    const d = item.getByLabelText<HTMLInputElement>('diameter (m)');
    expect(d.value).toBe('1');
    expect(item.getByLabelText<HTMLInputElement>('y (m)').value).toBe('2');
    await userEvent.clear(d);
    await userEvent.type(d, '0.3{Enter}');
    expect(store.getState().doc.shapes[0].circle).toEqual({ center: [1, 2], radius: 0.15 });
    await userEvent.clear(d);
    await userEvent.type(d, '-1{Enter}');
    expect(store.getState().doc.shapes[0].circle?.radius).toBe(0.15);
  });
});
