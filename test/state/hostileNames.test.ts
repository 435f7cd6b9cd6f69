// The store with surface names that are also properties of every JavaScript
// object: edits find only the sketch's own properties, never Object.prototype's,
// and the edited sketch reads and saves as plain data.
import { describe, expect, it } from 'vitest';
import { createAppStore } from '../../src/state/store';
import { renameSurface, splitSurface } from '../../src/state/edits/surfaceEdits';
import { setCondition, setEmissivity, surfacePropsOf } from '../../src/state/exchange/edits';
import { documentApi } from '../../src/state/documentApi';
import { openSketchText, sketchFileText } from '../../src/state/files';
import type { SketchFile } from '../../src/state/sketchFile';
import { demoSketch } from '../../src/state/demo';

const box: SketchFile = {
  ...demoSketch,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [4, 0],
        [4, 2],
        [0, 2],
      ],
      surface: ['floor', 'right', 'roof', 'left'],
    },
  ],
  surfaces: undefined,
  settings: undefined,
};

describe('object-property names in the store', () => {
  it('rename, set properties, split and save: plain names throughout', () => {
    const store = createAppStore(box);
    const s = () => store.getState();
    // Before any edit, "toString" has no properties of its own.
    s().edit((d) => renameSurface(d, 'floor', 'toString'));
    expect(surfacePropsOf(s().doc, 'toString')).toBeUndefined();
    s().edit((d) => renameSurface(d, 'roof', 'constructor'));
    s().edit((d) => renameSurface(d, 'right', 'hasOwnProperty'));
    s().edit((d) => setEmissivity(d, 'toString', 0.3));
    s().edit((d) => setCondition(d, 'constructor', { kind: 'temperature', temperature: 600 }));
    s().edit((d) => setCondition(d, 'hasOwnProperty', { kind: 'heatFlux', heatFlux: 0 }));
    expect(surfacePropsOf(s().doc, 'toString')).toEqual({ emissivity: 0.3 });
    expect(surfacePropsOf(s().doc, 'constructor')).toEqual({ temperature: 600 });
    expect(surfacePropsOf(s().doc, 'hasOwnProperty')).toEqual({ heatFlux: 0 });

    const read = documentApi.restore(s().doc);
    if (!read.ok) throw new Error(read.errors[0].message);
    expect(read.sketch.shapes[0].surface).toEqual(['toString', 'hasOwnProperty', 'constructor', 'left']);

    // "constructor" has one edge: splitting changes nothing. Renaming carries its properties.
    expect(splitSurface(s().doc, 'constructor')).toBe(s().doc);
    s().edit((d) => renameSurface(d, 'constructor', 'valueOf'));
    expect(surfacePropsOf(s().doc, 'valueOf')).toEqual({ temperature: 600 });
    expect(surfacePropsOf(s().doc, 'constructor')).toBeUndefined();

    const opened = createAppStore(demoSketch);
    expect(openSketchText(opened, documentApi, sketchFileText(store, documentApi), 'odd.json')).toBe(true);
    expect(opened.getState().doc.surfaces).toEqual(s().doc.surfaces);
    expect(opened.getState().doc.shapes[0].surface).toEqual(['toString', 'hasOwnProperty', 'valueOf', 'left']);
  });
});
