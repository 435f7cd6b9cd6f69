// Exact construction from the keyboard: typed first points, edge lengths and
// angles, rectangles and tubes; a drag released off the canvas.
import { describe, expect, it } from 'vitest';
import { createAppStore } from '../../../src/state/store';
import { CanvasController } from '../../../src/state/canvasController';
import { emptySketch } from '../../../src/state/documentSlice';
import { direction, editEntry, nextOutlinePoint, readEntry } from '../../../src/state/tools/typedEntry';
import { readPointColumns, setShapePoints } from '../../../src/state/edits/pointTable';
import { readNumber } from '../../../src/state/edits/numberInput';
import { restore } from '../../../src/document';
import type { Point } from '../../../src/state/sketchFile';

const at = (p: Point) => ({ at: p, shift: false, tolerance: 0.01 });
const type = (c: CanvasController, text: string) => {
  for (const ch of text) expect(c.key(ch)).toBe(true);
  c.key('Enter');
};

describe('typed entry kernel', () => {
  it('takes digits, point, minus, comma and an exponent inside a number; letters are commands', () => {
    expect(editEntry('', '1')).toBe('1');
    expect(editEntry('1', ',')).toBe('1,');
    expect(editEntry('', 'e')).toBeNull(); // the enclosure key
    expect(editEntry('2', 'e')).toBe('2e');
    expect(editEntry('', 'r', 'r')).toBeNull();
    expect(editEntry('0.05', 'r', 'r')).toBe('0.05r');
    expect(editEntry('12', 'Backspace')).toBe('1');
    expect(editEntry('', 'Backspace')).toBeNull();
    expect(readEntry('1.5,90')).toEqual({ numbers: [1.5, 90] });
    expect(readEntry('1,2,3')).toHaveProperty('problem');
    expect(readEntry('1..2')).toHaveProperty('problem');
  });

  it('places the next point at a typed length and angle, exact on the axes', () => {
    expect(direction(90)).toEqual([0, 1]);
    expect(direction(-90)).toEqual([0, -1]);
    expect(nextOutlinePoint('0.3,0.2', [], null)).toEqual([0.3, 0.2]);
    expect(nextOutlinePoint('2.4', [[0.3, 0.2]], [5, 0.21])).toEqual([2.7, 0.2]); // towards the pointer, level
    expect(nextOutlinePoint('1.5,180', [[2, 1]], null)).toEqual([0.5, 1]);
    // 2 at 60 degrees: (cos 60, sin 60) = (1/2, sqrt(3)/2).
    const p = nextOutlinePoint('2,60', [[0, 0]], null) as Point;
    expect(p[0]).toBeCloseTo(1, 11);
    expect(p[1]).toBeCloseTo(Math.sqrt(3), 11);
    expect(nextOutlinePoint('-1', [[0, 0]], null)).toHaveProperty('problem');
  });
});

describe('exact shapes from the keyboard', () => {
  it('draws an enclosure by typed edges and closes it on the first point', () => {
    const store = createAppStore(emptySketch);
    const c = new CanvasController(store);
    store.getState().setTool('enclosure');
    type(c, '0,0');
    type(c, '2.4,0');
    type(c, '1.5,90');
    type(c, '2.4,180');
    type(c, '1.5,270'); // back on the first point: closes
    const shape = store.getState().doc.shapes[0];
    expect(shape.points).toEqual([
      [0, 0],
      [2.4, 0],
      [2.4, 1.5],
      [0, 1.5],
    ]);
    expect(shape.surface).toEqual(['floor', 'right wall', 'roof', 'left wall']);
  });

  it('Escape drops a half-typed value first, then the outline', () => {
    const store = createAppStore(emptySketch);
    const c = new CanvasController(store);
    store.getState().setTool('enclosure');
    type(c, '0,0');
    c.key('3');
    c.cancel();
    expect(store.getState().entry).toBe('');
    expect(store.getState().draft).toHaveLength(1);
    c.cancel();
    expect(store.getState().draft).toHaveLength(0);
  });

  it('a rectangle from a typed corner, width and height; a tube from a typed centre and diameter, not snapped', () => {
    const store = createAppStore(emptySketch);
    const c = new CanvasController(store);
    store.getState().setQuickKind('enclosure');
    store.getState().setTool('rectangle');
    type(c, '0,0');
    type(c, '2.4,1.5');
    store.getState().setQuickKind('solid');
    store.getState().setTool('tube');
    store.getState().setGridStep(0.1);
    type(c, '0.6,1.05');
    type(c, '0.1143');
    const [box, tube] = store.getState().doc.shapes;
    expect(box.points).toEqual([
      [0, 0],
      [2.4, 0],
      [2.4, 1.5],
      [0, 1.5],
    ]);
    expect(tube.surface).toBe('tube 1');
    // The typed centre and half the diameter, exactly: no grid, no polygon.
    expect(tube.points).toEqual([]);
    expect(tube.circle).toEqual({ center: [0.6, 1.05], radius: 0.1143 / 2 });
    expect(restore(store.getState().doc).ok).toBe(true);
    // A radius ending in r.
    type(c, '1.6,0.5');
    type(c, '0.05r');
    const second = store.getState().doc.shapes[2];
    expect(second.circle).toEqual({ center: [1.6, 0.5], radius: 0.05 });
  });

  it('a rectangle dragged off the canvas is placed where the pointer left; a click released off it leaves nothing', () => {
    const store = createAppStore(emptySketch);
    const c = new CanvasController(store);
    store.getState().setTool('rectangle');
    c.press(at([0, 0]));
    c.move(at([1, 1]));
    expect(c.dragging).toBe(true);
    c.releaseOutside(at([1, 1]));
    expect(store.getState().doc.shapes).toHaveLength(1);
    expect(store.getState().draft).toEqual([]);
    c.press(at([2, 2]));
    c.releaseOutside(at([2, 2]));
    expect(store.getState().doc.shapes).toHaveLength(1);
    expect(store.getState().draft).toEqual([]);
    expect(c.dragging).toBe(false);
  });
});

describe('numbers typed into fields', () => {
  it('refuses letters, non-finite and out-of-range values with a reason, never clamps', () => {
    expect(readNumber('12abc')).toEqual({ ok: false, problem: '"12abc" is not a number' });
    expect(readNumber('Infinity')).toHaveProperty('ok', false);
    expect(readNumber('1e400')).toEqual({ ok: false, problem: 'is too large' });
    expect(readNumber('300', { min: 3, max: 256, integer: true })).toEqual({
      ok: false,
      problem: 'must be at most 256',
    });
    expect(readNumber('2.5', { integer: true })).toEqual({ ok: false, problem: 'must be a whole number' });
    expect(readNumber('0', { min: 0, minExclusive: true })).toEqual({ ok: false, problem: 'must be greater than 0' });
    expect(readNumber(' 0,25 ')).toEqual({ ok: true, value: 0.25 });
  });

  it('the store keeps its grid step, sides and digits when given values out of range', () => {
    const store = createAppStore(emptySketch);
    const s = () => store.getState();
    for (const bad of [0, -1, NaN, Infinity, 1e-300, 1e300]) s().setGridStep(bad);
    expect(s().gridStep).toBe(0.1);
    s().setDigits(0);
    s().setDigits(16);
    expect(s().digits).toBe(4);
  });
});

describe('points pasted from a spreadsheet', () => {
  it('reads two columns (tab, comma or semicolon), skips a header, names the bad line', () => {
    expect(readPointColumns('x\ty\n0\t0\n2.4\t0\n2.4\t1.5\n')).toEqual({
      points: [
        [0, 0],
        [2.4, 0],
        [2.4, 1.5],
      ],
    });
    expect(readPointColumns('0;0\n1;0\n1;1\n0;1')).toHaveProperty('points');
    expect(readPointColumns('0,0\n1,x\n1,1')).toEqual({ problem: 'line 2: y "x" is not a number' });
    expect(readPointColumns('0,0\n1,0')).toHaveProperty('problem');
  });

  it('replaces a shape’s points, a one-surface shape staying one surface', () => {
    const doc = {
      ...emptySketch,
      shapes: [
        {
          kind: 'solid' as const,
          points: [
            [0, 0],
            [1, 0],
            [0, 1],
          ] as Point[],
          surface: 'block',
        },
      ],
    };
    const next = setShapePoints(doc, 0, [
      [0, 0],
      [1, 0],
      [1, 1],
      [0, 1],
    ]);
    expect(next.shapes[0].surface).toBe('block');
    expect(next.shapes[0].points).toHaveLength(4);
  });
});
