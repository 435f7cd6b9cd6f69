// Drawing through the tool kernels and the canvas controller, no canvas needed.
import { describe, expect, it } from 'vitest';
import { createAppStore } from '../../src/state/store';
import { CanvasController } from '../../src/state/canvasController';
import { emptySketch } from '../../src/state/documentSlice';
import { clickPoint, finish, removeLastPoint, emptyDraft } from '../../src/state/tools/polygonTool';
import { rectangleFromCorners, regularPolygon } from '../../src/state/tools/quickShapes';
import { rectangleTool } from '../../src/state/tools/rectangle';
import { tubeTool } from '../../src/state/tools/tube';
import { restore } from '../../src/document';
import type { Point } from '../../src/state/sketchFile';

const at = (p: Point, shift = false) => ({ at: p, shift, tolerance: 0.05 });

describe('polygon kernel', () => {
  it('adds points, ignores a repeated click and closes on the first point', () => {
    let d = emptyDraft;
    d = clickPoint(d, [0, 0], 0.05).draft;
    d = clickPoint(d, [2, 0], 0.05).draft;
    d = clickPoint(d, [2, 0.01], 0.05).draft; // second click of a double-click
    d = clickPoint(d, [2, 1], 0.05).draft;
    expect(d.points).toEqual([
      [0, 0],
      [2, 0],
      [2, 1],
    ]);
    const closed = clickPoint(d, [0.02, -0.01], 0.05);
    expect(closed.finished).toEqual([
      [0, 0],
      [2, 0],
      [2, 1],
    ]);
    expect(closed.draft.points).toEqual([]);
  });

  it('does not finish with fewer than three points; removeLastPoint steps back', () => {
    const d = {
      points: [
        [0, 0],
        [1, 0],
      ] as Point[],
    };
    expect(finish(d).finished).toBeUndefined();
    expect(removeLastPoint(d).points).toEqual([[0, 0]]);
  });

  it('makes rectangles and regular polygons, refusing zero size', () => {
    expect(rectangleFromCorners([2, 1], [0, 0])).toEqual([
      [0, 0],
      [2, 0],
      [2, 1],
      [0, 1],
    ]);
    expect(rectangleFromCorners([0, 0], [0, 1])).toBeNull();
    const hex = regularPolygon([1, 1], [1.5, 1], 6)!;
    expect(hex).toHaveLength(6);
    for (const [x, y] of hex) expect(Math.hypot(x - 1, y - 1)).toBeCloseTo(0.5, 10);
    expect(regularPolygon([0, 0], [0, 0], 8)).toBeNull();
  });
});

describe('drawing with the controller', () => {
  it('draws an enclosure by clicks and Enter, its sides named by where they are', () => {
    const store = createAppStore(emptySketch);
    const c = new CanvasController(store);
    store.getState().setTool('enclosure');
    for (const p of [
      [0, 0],
      [3, 0],
      [3, 2],
      [0, 2],
    ] as Point[]) {
      c.press(at(p));
      c.release(at(p));
    }
    expect(store.getState().draft).toHaveLength(4);
    c.finishDraft();
    const shape = store.getState().doc.shapes[0];
    expect(shape.kind).toBe('enclosure');
    expect(shape.points).toEqual([
      [0, 0],
      [3, 0],
      [3, 2],
      [0, 2],
    ]);
    // Drawn anticlockwise from the lower left: bottom, right, top, left.
    expect(shape.surface).toEqual(['floor', 'right wall', 'roof', 'left wall']);
    expect(store.getState().selection).toEqual([{ type: 'shape', shape: 0 }]);
    expect(restore(store.getState().doc).ok).toBe(true);
  });

  it('finishes on a double-click, but not on two quick clicks at different places', () => {
    const store = createAppStore(emptySketch);
    const c = new CanvasController(store);
    store.getState().setTool('enclosure');
    c.press(at([0, 0]));
    c.press(at([1, 0]));
    c.doubleClick(at([1, 0])); // the browser reports a double-click for quick clicks anywhere
    expect(store.getState().doc.shapes).toHaveLength(0);
    c.press(at([1, 1]));
    c.press(at([1, 1]));
    c.doubleClick(at([1, 1]));
    expect(store.getState().doc.shapes[0].points).toEqual([
      [0, 0],
      [1, 0],
      [1, 1],
    ]);
  });

  it('snaps clicks to the grid and closes a body on its first point', () => {
    const store = createAppStore({
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [4, 0],
            [4, 4],
            [0, 4],
          ],
          surface: 'wall',
        },
      ],
    });
    const c = new CanvasController(store);
    store.getState().setGridStep(0.5);
    store.getState().setTool('solid');
    for (const p of [
      [1.1, 1.2],
      [2.9, 0.9],
      [2.1, 2.6],
      [1.04, 1.03],
    ] as Point[])
      c.press(at(p));
    const body = store.getState().doc.shapes[1];
    expect(body.kind).toBe('solid');
    expect(body.points).toEqual([
      [1, 1],
      [3, 1],
      [2, 2.5],
    ]);
    expect(body.surface).toBe('body 1'); // one shape, one surface
  });

  it('drags a rectangle and a tube as bodies', () => {
    const store = createAppStore({
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [4, 0],
            [4, 4],
            [0, 4],
          ],
          surface: 'wall',
        },
      ],
    });
    const c = new CanvasController(store);
    store.getState().setTool('rectangle');
    c.press(at([0.5, 0.5]));
    c.move(at([1.5, 1.0]));
    c.release(at([1.5, 1.0]));
    store.getState().setTool('tube');
    c.press(at([3, 3]));
    c.move(at([3.5, 3]));
    c.release(at([3.5, 3]));
    const shapes = store.getState().doc.shapes;
    expect(shapes[1].points).toEqual([
      [0.5, 0.5],
      [1.5, 0.5],
      [1.5, 1],
      [0.5, 1],
    ]);
    expect(shapes[2].kind).toBe('solid');
    expect(shapes[2].circle).toEqual({ center: [3, 3], radius: 0.5 });
    expect(restore(store.getState().doc).ok).toBe(true);
  });

  it('Backspace while drawing drops the last point, Escape drops the outline, then clears the selection', () => {
    const store = createAppStore(emptySketch);
    const c = new CanvasController(store);
    store.getState().setSelection([{ type: 'shape', shape: 0 }]);
    store.getState().setTool('enclosure');
    for (const p of [
      [0, 0],
      [3, 0],
      [3, 2],
    ] as Point[])
      c.press(at(p));
    expect(c.key('Backspace')).toBe(true);
    expect(store.getState().draft).toEqual([
      [0, 0],
      [3, 0],
    ]);
    c.finishDraft(); // two points: not an outline yet, and the app says so
    expect(store.getState().doc.shapes).toHaveLength(0);
    expect(store.getState().notices.at(-1)?.text).toMatch(/at least three points/);
    c.cancel();
    expect(store.getState().draft).toEqual([]);
    expect(store.getState().selection).toHaveLength(1);
    expect(c.key('Delete')).toBe(false); // nothing drawn: Delete is for the selection
    c.cancel();
    expect(store.getState().selection).toEqual([]);
  });

  it('a rectangle by two clicks, as the enclosure; a tube whose radius is not snapped; Escape drops a quick shape', () => {
    const store = createAppStore(emptySketch);
    const c = new CanvasController(store);
    store.getState().setTool('rectangle');
    const makes = rectangleTool.settings?.find((x) => x.type === 'choice');
    if (makes?.type !== 'choice') throw new Error('the rectangle tool has a makes setting');
    makes.write(store.getState(), 'enclosure');
    expect(store.getState().quickKind).toBe('enclosure');
    c.press(at([0, 0]));
    c.release(at([0, 0])); // a click: waits for the second corner
    c.move(at([4, 3]));
    expect(store.getState().draft).toEqual([
      [0, 0],
      [4, 0],
      [4, 3],
      [0, 3],
    ]);
    c.press(at([4, 3]));
    c.release(at([4, 3]));
    expect(store.getState().doc.shapes[0]).toMatchObject({
      kind: 'enclosure',
      points: [
        [0, 0],
        [4, 0],
        [4, 3],
        [0, 3],
      ],
    });
    makes.write(store.getState(), 'solid');
    store.getState().setTool('tube');
    expect(tubeTool.settings?.map((x) => x.label)).toEqual(['makes']);
    c.press(at([2, 1.5]));
    c.move(at([2.5, 1.5]));
    // The preview is drawn as a fine outline; what is placed is the exact circle.
    expect(store.getState().draft.length).toBeGreaterThan(8);
    c.cancel();
    expect(store.getState().draft).toEqual([]);
    c.release(at([2.5, 1.5])); // the dropped tube is not made on release
    expect(store.getState().doc.shapes).toHaveLength(1);
    c.press(at([2, 1.5]));
    // The centre snaps to the grid, the rim point does not: radius 0.537 exactly.
    c.move(at([2.537, 1.5]));
    c.release(at([2.537, 1.5]));
    const tube = store.getState().doc.shapes[1];
    expect(tube.kind).toBe('solid');
    expect(tube.circle?.center).toEqual([2, 1.5]);
    expect(tube.circle?.radius).toBeCloseTo(0.537, 12);
    expect(restore(store.getState().doc).ok).toBe(true);
  });
});
