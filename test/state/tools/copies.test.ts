// Copy, paste, duplicate, move by an offset, flip, repeat and the tube row,
// through the canvas controller, checked against coordinates worked out by hand.
import { describe, expect, it } from 'vitest';
import { createAppStore } from '../../../src/state/store';
import { CanvasController } from '../../../src/state/canvasController';
import { rowCentres } from '../../../src/state/edits/tubeRow';
import { restore } from '../../../src/document';
import type { SketchFile } from '../../../src/state/sketchFile';

const oven = (): SketchFile => ({
  version: 2,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [2.4, 0],
        [2.4, 1.5],
        [0, 1.5],
      ],
      surface: ['floor', 'right wall', 'roof', 'left wall'],
    },
    {
      kind: 'solid',
      points: [
        [0.5, 0.5],
        [0.7, 0.5],
        [0.7, 0.6],
        [0.5, 0.6],
      ],
      surface: 'tube 1',
    },
  ],
  surfaces: { 'tube 1': { emissivity: 0.7, temperature: 900 } },
});

function setup() {
  const store = createAppStore(oven());
  const c = new CanvasController(store);
  store.getState().setSelection([{ type: 'shape', shape: 1 }]);
  return { store, c, s: () => store.getState() };
}

describe('copies of shapes', () => {
  it('copy and paste make a new surface with the next number and the same properties, one undo step', () => {
    const { c, s } = setup();
    expect(c.copy()).toBe(true);
    expect(c.paste()).toBe(true);
    const doc = s().doc;
    expect(doc.shapes[2].surface).toBe('tube 2');
    // One grid step (0.1) right and down.
    expect(doc.shapes[2].points[0]).toEqual([0.6, 0.4]);
    expect(doc.surfaces!['tube 2']).toEqual({ emissivity: 0.7, temperature: 900 });
    expect(s().selection).toEqual([{ type: 'shape', shape: 2 }]);
    s().undo();
    expect(s().doc.shapes).toHaveLength(2);
  });

  it('a typed name gets a number in brackets; duplicate leaves the clipboard alone', () => {
    const { c, s } = setup();
    s().edit((d) => ({ ...d, shapes: d.shapes.map((sh, i) => (i === 1 ? { ...sh, surface: 'burner' } : sh)) }));
    expect(c.duplicate()).toBe(true);
    expect(s().doc.shapes[2].surface).toBe('burner (2)');
    expect(s().clipboard).toBeNull();
  });

  it('moves by a typed offset and flips about the middle keeping the names on their edges', () => {
    const { c, s } = setup();
    expect(c.moveBy(1, 0.25)).toBe(true);
    expect(s().doc.shapes[1].points[0]).toEqual([1.5, 0.75]);
    s().setSelection([{ type: 'shape', shape: 0 }]);
    const before = s().doc.shapes[0];
    c.flip('left-right');
    const flipped = s().doc.shapes[0];
    // x -> 2.4 - x, order reversed so the winding stays anticlockwise. Names travel with their edges:
    // new edge j is old edge (n - 2 - j) mod n, so the old right wall now stands at x = 0.
    expect(flipped.points).toEqual([
      [2.4, 1.5],
      [0, 1.5],
      [0, 0],
      [2.4, 0],
    ]);
    expect(flipped.surface).toEqual(['roof', 'right wall', 'floor', 'left wall']);
    expect(flipped.points[1][0]).toBe(0);
    expect(before).not.toBe(flipped);
    expect(restore(s().doc).ok).toBe(true);
  });

  it('repeats n copies at a pitch along a direction, refusing a count out of range', () => {
    const { c, s } = setup();
    expect(c.repeat(3, 0.4, [1, 0])).toBe(true);
    const xs = s()
      .doc.shapes.slice(2)
      .map((sh) => sh.points[0][0]);
    expect(xs).toEqual([0.9, 1.3, 1.7]);
    expect(
      s()
        .doc.shapes.slice(1)
        .map((sh) => sh.surface),
    ).toEqual(['tube 1', 'tube 2', 'tube 3', 'tube 4']);
    expect(restore(s().doc).ok).toBe(true);
    expect(c.repeat(0, 0.4, [1, 0])).toBe(false);
    expect(c.repeat(2, 0.4, [0, 0])).toBe(false);
  });
});

describe('tube row', () => {
  const spec = { count: 4, diameter: 0.1143, pitch: 0.3 };

  it('centres the row along a chosen wall at a distance to the centre line', () => {
    // Roof: edge 3 (index 2) from (2.4,1.5) to (0,1.5); inside is below. The row spans 3 pitches = 0.9,
    // centred on the 2.4 m roof: first centre 0.75 from the roof's start, i.e. x = 2.4 - 0.75 = 1.65.
    const r = rowCentres(oven(), spec, { from: 'wall', shape: 0, edge: 2, distance: 0.25 });
    expect(r).toEqual({
      centres: [
        [1.65, 1.25],
        [1.35, 1.25],
        [1.05, 1.25],
        [0.75, 1.25],
      ],
    });
  });

  it('adds the row from a start point as exact circles of diameter D named in turn', () => {
    const { c, s } = setup();
    const problem = c.addRow(spec, { from: 'point', start: [0.9, 0.9], angle: 0 });
    expect(problem).toBeNull();
    const tubes = s().doc.shapes.slice(2);
    expect(tubes.map((t) => t.surface)).toEqual(['tube 2', 'tube 3', 'tube 4', 'tube 5']);
    tubes.forEach((t, k) => {
      const cx = 0.9 + 0.3 * k;
      expect(t.points).toEqual([]);
      expect(t.circle?.radius).toBe(0.1143 / 2);
      expect(t.circle?.center[0]).toBeCloseTo(cx, 12);
      expect(t.circle?.center[1]).toBe(0.9);
    });
    expect(restore(s().doc).ok).toBe(true);
    expect(s().selection).toHaveLength(4);
  });

  it('says why a row cannot be placed', () => {
    const { c } = setup();
    expect(c.addRow({ ...spec, pitch: 0.1 }, { from: 'point', start: [1, 1], angle: 0 })).toMatch(
      /pitch .* greater than the diameter/,
    );
    expect(c.addRow({ ...spec, count: 20 }, { from: 'wall', shape: 0, edge: 2, distance: 0.25 })).toMatch(
      /does not fit/,
    );
    expect(c.addRow(spec, { from: 'wall', shape: 0, edge: 2, distance: 0.05 })).toMatch(/more than the radius/);
  });
});
