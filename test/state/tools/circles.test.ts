// Exact circles in the app: picking, dragging, deleting, copying, flipping and
// the numbers the Edit tab sets, through the canvas controller. Expected values
// are worked out by hand from the circle's centre and radius.
import { describe, expect, it } from 'vitest';
import { createAppStore } from '../../../src/state/store';
import { CanvasController } from '../../../src/state/canvasController';
import { hitTest } from '../../../src/state/tools/hitTest';
import { setCircle } from '../../../src/state/edits/shapeEdits';
import { joinSurfaces, renameSurface, splitSurfaceParts } from '../../../src/state/edits/surfaceEdits';
import { arcAngles, nearestArc, rimPoint, type CircleShape } from '../../../src/state/edits/circleShapes';
import { edgeNames } from '../../../src/state/geometry/polygon';
import { facingAngle } from '../../../src/state/exchange/profile';
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
        [2, 0],
        [2, 1],
        [0, 1],
      ],
      surface: ['floor', 'right wall', 'roof', 'left wall'],
    },
    { kind: 'solid', points: [], circle: { center: [0.5, 0.5], radius: 0.1 }, surface: ['t a', 't b', 't c', 't d'] },
  ],
  surfaces: { 't a': { emissivity: 0.8, temperature: 600 } },
});

function setup() {
  const store = createAppStore(oven());
  const c = new CanvasController(store);
  return { store, c, s: () => store.getState() };
}

const circleOf = (doc: SketchFile, i: number) => doc.shapes[i] as CircleShape;

describe('exact circles on the canvas', () => {
  it('arcs run anticlockwise from +x and the nearest arc follows the angle', () => {
    const c = circleOf(oven(), 1);
    expect(arcAngles(c, 1)).toEqual([Math.PI / 2, Math.PI]);
    // 100° lies in the second quarter; 350° in the fourth.
    expect(nearestArc(c, [0.5 + Math.cos(1.745), 0.5 + Math.sin(1.745)]).arc).toBe(1);
    expect(nearestArc(c, [0.6, 0.49]).arc).toBe(3);
    const p = rimPoint(c, Math.PI / 2);
    expect(p[0]).toBeCloseTo(0.5, 12);
    expect(p[1]).toBeCloseTo(0.6, 12);
    expect(edgeNames(c)).toEqual(['t a', 't b', 't c', 't d']);
  });

  it('the rim and the inside pick the whole circle; outside picks the enclosure', () => {
    const doc = oven();
    expect(hitTest(doc, [0.5, 0.605], 0.01)).toEqual({ type: 'shape', shape: 1 });
    expect(hitTest(doc, [0.52, 0.5], 0.001)).toEqual({ type: 'shape', shape: 1 });
    // 0.2 from the centre: outside the rim (0.1) and beyond the tolerance.
    expect(hitTest(doc, [0.7, 0.5], 0.01)).toEqual({ type: 'shape', shape: 0 });
  });

  it('dragging a circle moves its centre onto the grid, one undo step', () => {
    const { c, s } = setup();
    s().setGridStep(0.1);
    c.press({ at: [0.53, 0.52], shift: false, tolerance: 0.01 });
    expect(s().selection).toEqual([{ type: 'shape', shape: 1 }]);
    // Pointer moves by (0.31, 0.2): the centre (0.5, 0.5) goes to (0.81, 0.7), snapped to (0.8, 0.7).
    c.move({ at: [0.84, 0.72], shift: false, tolerance: 0.01 });
    c.release({ at: [0.84, 0.72], shift: false, tolerance: 0.01 });
    const moved = circleOf(s().doc, 1).circle;
    expect(moved.center[0]).toBeCloseTo(0.8, 12);
    expect(moved.center[1]).toBeCloseTo(0.7, 12);
    expect(moved.radius).toBe(0.1);
    s().undo();
    expect(circleOf(s().doc, 1).circle.center).toEqual([0.5, 0.5]);
  });

  it('copy, paste, delete and repeat keep circles exact with new names', () => {
    const { c, s } = setup();
    s().setSelection([{ type: 'shape', shape: 1 }]);
    expect(c.copy()).toBe(true);
    expect(c.paste()).toBe(true);
    const pasted = circleOf(s().doc, 2);
    expect(pasted.points).toEqual([]);
    expect(pasted.circle.radius).toBe(0.1);
    expect(pasted.surface).toHaveLength(4);
    expect(pasted.surface).not.toContain('t a');
    // The copy keeps the properties of the arc it copies.
    const first = (pasted.surface as string[])[0];
    expect(s().doc.surfaces![first]).toEqual({ emissivity: 0.8, temperature: 600 });
    c.deleteSelection();
    expect(s().doc.shapes).toHaveLength(2);
    s().setSelection([{ type: 'shape', shape: 1 }]);
    expect(c.repeat(2, 0.3, [1, 0])).toBe(true);
    expect(s().doc.shapes.map((sh) => sh.circle?.center[0])).toEqual([undefined, 0.5, 0.8, 1.1]);
    // The document still reads back: circles stay circles through the file.
    expect(restore(JSON.stringify(s().doc)).ok).toBe(true);
  });

  it('flipping mirrors the centre and keeps each name on the mirrored arc', () => {
    const { c, s } = setup();
    s().setSelection([{ type: 'shape', shape: 1 }]);
    expect(c.flip('upside-down')).toBe(true);
    // y -> -y: the first quarter (0..90°) becomes the fourth; centre stays (it is the middle of the bounds).
    expect(circleOf(s().doc, 1).surface).toEqual(['t d', 't c', 't b', 't a']);
    expect(c.flip('left-right')).toBe(true);
    // Both flips together turn the circle by 180°: each name moves two quarters on.
    expect(circleOf(s().doc, 1).surface).toEqual(['t c', 't d', 't a', 't b']);
    expect(circleOf(s().doc, 1).circle.center).toEqual([0.5, 0.5]);
  });

  it('the Edit tab sets centre and diameter; a diameter not above 0 is refused', () => {
    const doc = oven();
    const next = setCircle(doc, 1, [1, 0.4], 0.05);
    expect(circleOf(next, 1).circle).toEqual({ center: [1, 0.4], radius: 0.05 });
    expect(setCircle(doc, 1, [1, 0.4], 0)).toBe(doc);
    expect(setCircle(doc, 0, [1, 0.4], 0.05)).toBe(doc);
  });

  it('splitting a tube gives equal arcs named in turn from +x; joining them keeps the arcs', () => {
    const doc: SketchFile = {
      version: 2,
      units: 'm',
      shapes: [{ kind: 'solid', points: [], circle: { center: [0, 0], radius: 1 }, surface: 'tube 3' }],
      surfaces: { 'tube 3': { emissivity: 0.7, temperature: 900 } },
    };
    const split = splitSurfaceParts(doc, 'tube 3', 6)!;
    expect(split.shapes[0].surface).toEqual(['tube 3 1', 'tube 3 2', 'tube 3 3', 'tube 3 4', 'tube 3 5', 'tube 3 6']);
    expect(split.surfaces!['tube 3 4']).toEqual({ emissivity: 0.7, temperature: 900 });
    // Arc 4 of 6 runs from 180° to 240°.
    expect(arcAngles(split.shapes[0] as CircleShape, 3)).toEqual([Math.PI, (4 * Math.PI) / 3]);
    const joined = joinSurfaces(split, ['tube 3 1', 'tube 3 2', 'tube 3 3', 'tube 3 4', 'tube 3 5', 'tube 3 6']);
    expect(joined.shapes[0].surface).toEqual(new Array(6).fill('tube 3 1'));
    expect(renameSurface(joined, 'tube 3 1', 'tube 3').shapes[0].surface).toHaveLength(6);
    expect(restore(JSON.stringify(split)).ok).toBe(true);
  });
});

describe('the side of a tube facing a surface', () => {
  it('points from the centre to the middle of the surface, anticlockwise from +x', () => {
    const doc = oven();
    // Floor middle (1, 0) from (0.5, 0.5): down and right, 315°.
    expect(facingAngle(doc.shapes, 1, 'floor')).toBeCloseTo(315, 12);
    // Left wall middle (0, 0.5): 180°. The enclosure is not a circle: no angle from it.
    expect(facingAngle(doc.shapes, 1, 'left wall')).toBeCloseTo(180, 12);
    expect(facingAngle(doc.shapes, 0, 'floor')).toBeNull();
    // Arcs of another circle count at their middles: a two-arc tube at (1.5, 0.5), its upper arc's middle (1.5, 0.6).
    const two: SketchFile = {
      ...doc,
      shapes: [
        ...doc.shapes,
        { kind: 'solid', points: [], circle: { center: [1.5, 0.5], radius: 0.1 }, surface: ['u', 'v'] },
      ],
    };
    expect(facingAngle(two.shapes, 1, 'u')).toBeCloseTo((Math.atan2(0.1, 1) * 180) / Math.PI, 12);
  });
});
