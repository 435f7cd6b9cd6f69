import { describe, expect, it } from 'vitest';
import { groupEdges, renameSurface, splitSurface } from '../../src/state/edits/surfaceEdits';
import { addShape } from '../../src/state/edits/shapeEdits';
import { changeUnits } from '../../src/state/edits/unitEdits';
import { edgeNames } from '../../src/state/geometry/polygon';
import { restore } from '../../src/document';
import type { SketchFile } from '../../src/state/sketchFile';

const base: SketchFile = addShape({ version: 1, units: 'm', shapes: [] }, 'enclosure', [
  [0, 0],
  [4, 0],
  [4, 2],
  [0, 2],
]);

describe('named surfaces', () => {
  it('groups chosen edges into one surface, also across shapes', () => {
    let doc = addShape(base, 'solid', [
      [1, 0.5],
      [2, 0.5],
      [2, 1],
      [1, 1],
    ]);
    doc = groupEdges(
      doc,
      [
        { shape: 0, index: 1 },
        { shape: 0, index: 3 },
      ],
      'side walls',
    );
    expect(edgeNames(doc.shapes[0])).toEqual(['floor', 'side walls', 'roof', 'side walls']);
    doc = groupEdges(
      doc,
      [0, 1, 2, 3].map((index) => ({ shape: 1, index })),
      'block',
    );
    expect(doc.shapes[1].surface).toBe('block'); // one name for the whole shape
    doc = groupEdges(doc, [{ shape: 0, index: 0 }], 'block'); // an existing name merges
    expect(edgeNames(doc.shapes[0])[0]).toBe('block');
    expect(restore(doc).ok).toBe(true);
  });

  it('renames everywhere and carries the properties with the name', () => {
    const doc: SketchFile = {
      ...base,
      shapes: [{ ...base.shapes[0], surface: ['floor', 'wall', 'roof', 'wall'] }],
      surfaces: { wall: { emissivity: 0.8 } },
    };
    const r = renameSurface(doc, 'wall', 'sides');
    expect(edgeNames(r.shapes[0])).toEqual(['floor', 'sides', 'roof', 'sides']);
    expect(r.surfaces).toEqual({ sides: { emissivity: 0.8 } });
    expect(renameSurface(doc, 'wall', '   ')).toBe(doc);
  });

  it('splits a surface into one name per edge, copying its properties', () => {
    const doc: SketchFile = {
      ...base,
      shapes: [{ ...base.shapes[0], surface: 'box' }],
      surfaces: { box: { emissivity: 0.5, adiabatic: true } },
    };
    const r = splitSurface(doc, 'box');
    expect(edgeNames(r.shapes[0])).toEqual(['box 1', 'box 2', 'box 3', 'box 4']);
    expect(Object.keys(r.surfaces!)).toEqual(['box 1', 'box 2', 'box 3', 'box 4']);
    expect(r.surfaces!['box 3']).toEqual({ emissivity: 0.5, adiabatic: true });
    expect(splitSurface(r, 'box 1')).toBe(r); // one edge: nothing to split
  });

  it('gives new shapes unique automatic names', () => {
    let doc = addShape(base, 'solid', [
      [1, 0.5],
      [2, 0.5],
      [1.5, 1],
    ]);
    doc = addShape(doc, 'solid', [
      [2.5, 0.5],
      [3, 0.5],
      [2.75, 1],
    ]);
    expect(doc.shapes[1].surface).toBe('body 1');
    expect(doc.shapes[2].surface).toBe('body 2');
    // A name in use is never given again: with "body 7" typed by the user, the next body is "body 8".
    const typed = renameSurface(doc, 'body 1', 'body 7');
    const next = addShape(typed, 'solid', [
      [0.2, 0.2],
      [0.6, 0.2],
      [0.4, 0.4],
    ]);
    expect(next.shapes[3].surface).toBe('body 8');
    expect(next.shapes[1].surface).toBe('body 7'); // the typed name is left as typed
    // Deleting body 2 and adding a tube: tubes count on their own.
    const tube = addShape(
      next,
      'solid',
      [
        [3.2, 1.2],
        [3.6, 1.2],
        [3.4, 1.6],
      ],
      'tube',
    );
    expect(tube.shapes[4].surface).toBe('tube 1');
  });
});

describe('units', () => {
  it('converts coordinates (1 in = 25.4 mm exactly) or only relabels', () => {
    const doc: SketchFile = {
      version: 1,
      units: 'in',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [10, 0],
            [10, 1],
            [0, 1],
          ],
          surface: 'w',
        },
      ],
    };
    const mm = changeUnits(doc, 'mm', 'convert');
    expect(mm.units).toBe('mm');
    expect(mm.shapes[0].points[1]).toEqual([254, 0]);
    expect(changeUnits(mm, 'in', 'convert').shapes[0].points).toEqual(doc.shapes[0].points);
    const re = changeUnits(doc, 'ft', 'relabel');
    expect(re.units).toBe('ft');
    expect(re.shapes).toBe(doc.shapes);
  });
});

describe('awkward names', () => {
  it('treats names like "toString" and "__proto__" as plain names', () => {
    const doc: SketchFile = { ...base, surfaces: { floor: { emissivity: 0.3 } } };
    const a = renameSurface(doc, 'right wall', 'toString');
    expect(edgeNames(a.shapes[0])[1]).toBe('toString');
    expect(a.surfaces).toEqual({ floor: { emissivity: 0.3 } });
    // The floor's properties follow its edge to the new name, kept as an own key.
    const b = groupEdges(doc, [{ shape: 0, index: 0 }], '__proto__');
    expect(Object.getPrototypeOf(b.surfaces ?? {})).toBe(Object.prototype);
    expect(edgeNames(b.shapes[0])[0]).toBe('__proto__');
    const read = restore(JSON.parse(JSON.stringify(b)));
    expect(read.ok).toBe(true);
    if (read.ok)
      expect(Object.getOwnPropertyDescriptor(read.sketch.surfaces, '__proto__')?.value).toEqual({ emissivity: 0.3 });
  });
});
