import { describe, expect, it } from 'vitest';
import { createAppStore } from '../../src/state/store';
import { CanvasController } from '../../src/state/canvasController';
import { HISTORY_LIMIT } from '../../src/state/historySlice';
import { setVertex } from '../../src/state/edits/shapeEdits';
import type { Point, SketchFile } from '../../src/state/sketchFile';
import { box } from './boxSketch';

const at = (p: Point, shift = false) => ({ at: p, shift, tolerance: 0.05 });

describe('undo and redo', () => {
  it('undoes and redoes every edit, and a new edit clears the redo list', () => {
    const store = createAppStore(box);
    const s = () => store.getState();
    s().edit((d) => setVertex(d, 0, 2, [4, 3]));
    s().edit((d) => setVertex(d, 0, 3, [0, 3]));
    expect(s().doc.shapes[0].points[3]).toEqual([0, 3]);
    s().undo();
    expect(s().doc.shapes[0].points[3]).toEqual([0, 2]);
    expect(s().doc.shapes[0].points[2]).toEqual([4, 3]);
    s().undo();
    expect(s().doc).toBe(box);
    s().undo(); // nothing left: no change
    expect(s().doc).toBe(box);
    s().redo();
    expect(s().doc.shapes[0].points[2]).toEqual([4, 3]);
    s().edit((d) => setVertex(d, 1, 0, [1.5, 0.75]));
    expect(s().future).toHaveLength(0);
    s().redo();
    expect(s().doc.shapes[1].points[0]).toEqual([1.5, 0.75]);
  });

  it('an edit that changes nothing adds no step; history is capped', () => {
    const store = createAppStore(box);
    store.getState().edit((d) => d);
    expect(store.getState().past).toHaveLength(0);
    for (let i = 0; i < HISTORY_LIMIT + 20; i++)
      store.getState().edit((d) => setVertex(d, 0, 2, [4, 2 + i * 0.01 + 0.01]));
    expect(store.getState().past).toHaveLength(HISTORY_LIMIT);
  });

  it('squashes a whole vertex drag into one undo step', () => {
    const store = createAppStore(box);
    const c = new CanvasController(store);
    store.getState().setSnap(false);
    expect(c.press(at([4, 2]))).toBe('handled'); // the enclosure's corner
    for (let i = 1; i <= 25; i++) c.move(at([4 + i * 0.02, 2 + i * 0.01]));
    expect(store.getState().past).toHaveLength(0); // nothing recorded mid-drag
    c.release(at([4.5, 2.25]));
    const moved = store.getState().doc.shapes[0].points[2];
    expect(moved[0]).toBeCloseTo(4.5, 12);
    expect(moved[1]).toBeCloseTo(2.25, 12);
    expect(store.getState().past).toHaveLength(1);
    store.getState().undo();
    expect(store.getState().doc).toBe(box);
    store.getState().redo();
    expect(store.getState().doc.shapes[0].points[2][0]).toBeCloseTo(4.5, 12);
  });

  it('drags an edge and a whole shape with snapping, and Escape cancels a drag', () => {
    const store = createAppStore(box);
    const c = new CanvasController(store);
    store.getState().setGridStep(0.25);
    c.press(at([2, 0.76])); // bottom edge of the block
    c.move(at([2, 0.62]));
    c.release(at([2, 0.62]));
    expect(store.getState().doc.shapes[1].points.slice(0, 2)).toEqual([
      [1.75, 0.5],
      [2.25, 0.5],
    ]);
    c.press(at([2, 1])); // inside the block: the whole shape
    c.move(at([2.6, 1.1]));
    c.release(at([2.6, 1.1]));
    expect(store.getState().doc.shapes[1].points[0]).toEqual([2.25, 0.5]);
    expect(store.getState().past).toHaveLength(2);
    c.press(at([2.5, 1]));
    c.move(at([3.5, 1]));
    c.cancel();
    expect(store.getState().doc.shapes[1].points[0]).toEqual([2.25, 0.5]);
    expect(store.getState().past).toHaveLength(2);
  });

  it('shift-click builds a multiple selection that drags together', () => {
    const store = createAppStore(box);
    const c = new CanvasController(store);
    store.getState().setSnap(false);
    c.press(at([1.75, 0.75]));
    c.release(at([1.75, 0.75]));
    c.press(at([2.25, 1.25], true));
    c.release(at([2.25, 1.25], true));
    expect(store.getState().selection).toHaveLength(2);
    c.press(at([2.25, 1.25]));
    c.move(at([2.35, 1.25]));
    c.release(at([2.35, 1.25]));
    const pts = store.getState().doc.shapes[1].points;
    expect(pts[0][0]).toBeCloseTo(1.85, 12);
    expect(pts[0][1]).toBe(0.75);
    expect(pts[2][0]).toBeCloseTo(2.35, 12);
    expect(pts[1]).toEqual([2.25, 0.75]);
  });

  it('double-click inserts a vertex on an edge; Delete removes vertices and shapes', () => {
    const store = createAppStore(box);
    const c = new CanvasController(store);
    c.press(at([1.02, 0]));
    c.release(at([1.02, 0]));
    c.press(at([1.02, 0]));
    c.release(at([1.02, 0]));
    c.doubleClick(at([1.02, 0]));
    expect(store.getState().doc.shapes[0].points).toEqual([
      [0, 0],
      [1, 0],
      [4, 0],
      [4, 2],
      [0, 2],
    ]);
    expect(store.getState().doc.shapes[0].surface).toEqual(['floor', 'floor', 'right', 'roof', 'left']);
    expect(store.getState().selection).toEqual([{ type: 'vertex', shape: 0, index: 1 }]);
    c.deleteSelection();
    expect(store.getState().doc.shapes[0].points).toEqual(box.shapes[0].points);
    c.press(at([2, 1]));
    c.release(at([2, 1]));
    c.deleteSelection();
    expect(store.getState().doc.shapes).toHaveLength(1);
    store.getState().undo();
    expect(store.getState().doc.shapes).toHaveLength(2);
  });

  it('refuses to take a shape below three points and says so', () => {
    const tri: SketchFile = {
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [1, 0],
            [0, 1],
          ],
          surface: 'w',
        },
      ],
    };
    const store = createAppStore(tri);
    const c = new CanvasController(store);
    c.press(at([1, 0]));
    c.release(at([1, 0]));
    c.deleteSelection();
    expect(store.getState().doc.shapes[0].points).toHaveLength(3);
    expect(store.getState().notices.at(-1)?.text).toMatch(/at least three points/);
  });
});
