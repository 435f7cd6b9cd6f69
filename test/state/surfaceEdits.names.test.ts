// Default names of drawn shapes, splitting a surface into parts, joining
// surfaces, and colours that stay with their surfaces.
import { describe, expect, it } from 'vitest';
import { addShape } from '../../src/state/edits/shapeEdits';
import { joinSurfaces, renameSurface, splitSurfaceParts } from '../../src/state/edits/surfaceEdits';
import { enclosureSideNames, nextNumbered, sidePlace } from '../../src/state/edits/surfaceNames';
import { surfaceColours } from '../../src/state/edits/surfaceColours';
import { edgeNames } from '../../src/state/geometry/polygon';
import { restore } from '../../src/document';
import type { Point, SketchFile } from '../../src/state/sketchFile';

const empty: SketchFile = { version: 2, units: 'm', shapes: [] };
const box: Point[] = [
  [0, 0],
  [4, 0],
  [4, 2],
  [0, 2],
];

describe('names of drawn shapes', () => {
  it('names level and upright sides by place, either winding', () => {
    expect(enclosureSideNames(box, new Set())).toEqual(['floor', 'right wall', 'roof', 'left wall']);
    // The same box walked clockwise from (0,2): top, right side, bottom, left side.
    expect(enclosureSideNames([...box].reverse(), new Set())).toEqual(['roof', 'right wall', 'floor', 'left wall']);
  });

  it('numbers sloping sides by their side number and repeated places in order', () => {
    // A stepped floor and a sloping roof: sides 1 and 3 are level with the inside above.
    const stepped: Point[] = [
      [0, 0],
      [2, 0],
      [2, 1],
      [4, 1],
      [4, 3],
      [0, 4],
    ];
    expect(enclosureSideNames(stepped, new Set())).toEqual([
      'floor 1',
      // From (2,0) up to (2,1) with the inside on the left (-x side): a right wall.
      'right wall 1',
      'floor 2',
      'right wall 2',
      'wall 5',
      'left wall',
    ]);
  });

  it('never reuses a name in use and never renames a typed one', () => {
    const taken = new Set(['floor', 'tube 9', 'tube 2']);
    expect(enclosureSideNames(box, taken)[0]).toBe('floor (2)');
    expect(nextNumbered('tube', new Set(['tube 9', 'tube 2']))).toBe('tube 10');
    expect(nextNumbered('body', new Set(['tube 9']))).toBe('body 1');
    expect(sidePlace([0, 0], [0, 0], true)).toBeNull();
  });

  it('a drawn rectangle enclosure and a body read back as a valid file', () => {
    let doc = addShape(empty, 'enclosure', box);
    doc = addShape(doc, 'solid', [
      [1, 0.5],
      [2, 0.5],
      [2, 1],
      [1, 1],
    ]);
    expect(doc.shapes[1].surface).toBe('body 1');
    const read = restore(doc);
    expect(read.ok).toBe(true);
    if (read.ok) expect(read.sketch.shapes[0].surface).toEqual(['floor', 'right wall', 'roof', 'left wall']);
  });
});

describe('splitting and joining surfaces', () => {
  it('cuts a one-edge surface into n equal parts with new points', () => {
    const doc = addShape(empty, 'enclosure', box);
    const withProps: SketchFile = { ...doc, surfaces: { floor: { emissivity: 0.7 } } };
    const r = splitSurfaceParts(withProps, 'floor', 4)!;
    // The floor runs from (0,0) to (4,0): parts of length 1.
    expect(r.shapes[0].points.slice(0, 5)).toEqual([
      [0, 0],
      [1, 0],
      [2, 0],
      [3, 0],
      [4, 0],
    ]);
    expect(edgeNames(r.shapes[0])).toEqual([
      'floor 1',
      'floor 2',
      'floor 3',
      'floor 4',
      'right wall',
      'roof',
      'left wall',
    ]);
    expect(r.surfaces!['floor 3']).toEqual({ emissivity: 0.7 });
    expect(r.surfaces!.floor).toBeUndefined();
    expect(restore(r).ok).toBe(true);
  });

  it('refuses a part count that is not a whole number from 1 to 1000; 1 gives each edge its own name', () => {
    const doc = addShape(addShape(empty, 'enclosure', box), 'solid', [
      [1, 0.5],
      [2, 0.5],
      [1.5, 1],
    ]);
    expect(splitSurfaceParts(doc, 'body 1', 0)).toBeNull();
    expect(splitSurfaceParts(doc, 'body 1', 2.5)).toBeNull();
    expect(splitSurfaceParts(doc, 'body 1', 1001)).toBeNull();
    expect(edgeNames(splitSurfaceParts(doc, 'body 1', 1)!.shapes[1])).toEqual(['body 1 1', 'body 1 2', 'body 1 3']);
  });

  it('joins surfaces into the first one and keeps every colour in place', () => {
    let doc = addShape(empty, 'enclosure', box);
    doc = addShape(doc, 'solid', [
      [1, 0.5],
      [2, 0.5],
      [1.5, 1],
    ]);
    doc = { ...doc, surfaces: { 'right wall': { emissivity: 0.5 }, 'left wall': { emissivity: 0.9 } } };
    const before = surfaceColours(doc.shapes);
    const joined = joinSurfaces(doc, ['right wall', 'left wall']);
    expect(edgeNames(joined.shapes[0])).toEqual(['floor', 'right wall', 'roof', 'right wall']);
    expect(joined.surfaces).toEqual({ 'right wall': { emissivity: 0.5 } });
    const after = surfaceColours(joined.shapes);
    for (const name of ['floor', 'right wall', 'roof', 'body 1']) expect(after.get(name)).toBe(before.get(name));
    const renamed = renameSurface(joined, 'roof', 'arch');
    expect(surfaceColours(renamed.shapes).get('arch')).toBe(before.get('roof'));
    expect(surfaceColours(renamed.shapes).get('body 1')).toBe(before.get('body 1'));
    // Neighbouring sides of one shape differ.
    expect(new Set([0, 1, 2, 3].map((k) => before.get(edgeNames(doc.shapes[0])[k]))).size).toBe(4);
  });
});
