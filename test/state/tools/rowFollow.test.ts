// A tube row through the app's other edits: the tubes follow their wall when it
// moves, the row follows a renamed wall, tubes moved together move the row,
// a tube moved or deleted on its own splits the row. Through the store, as the
// canvas and the panels commit edits.
import { describe, expect, it } from 'vitest';
import { createAppStore } from '../../../src/state/store';
import { CanvasController } from '../../../src/state/canvasController';
import { tubesOfRow } from '../../../src/state/edits/tubeRow';
import { moveSelection } from '../../../src/state/edits/shapeEdits';
import { renameSurface } from '../../../src/state/edits/surfaceEdits';
import { restore } from '../../../src/document';
import { documentApi } from '../../../src/state/documentApi';
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
  ],
});

function setup(place: 'wall' | 'point') {
  const store = createAppStore(oven());
  const c = new CanvasController(store);
  const s = () => store.getState();
  const spec = { count: 3, diameter: 0.1, pitch: 0.3 };
  const problem =
    place === 'wall'
      ? c.addRow(spec, { from: 'wall', shape: 0, edge: 2, distance: 0.25 })
      : c.addRow(spec, { from: 'point', start: [0.5, 0.5], angle: 0 });
  expect(problem).toBeNull();
  return { c, s };
}
const centres = (doc: SketchFile) => tubesOfRow(doc, 'row 1').map((k) => doc.shapes[k].circle?.center);

describe('a row kept through other edits', () => {
  it('the roof moved up: the tubes follow it, still 0.25 below; one undo step', () => {
    const { s } = setup('wall');
    const before = s().doc;
    s().commit(moveSelection(before, [{ type: 'edge', shape: 0, index: 2 }], 0, 0.5));
    expect(centres(s().doc)).toEqual([
      [1.5, 1.75],
      [1.2, 1.75],
      [0.9, 1.75],
    ]);
    expect(restore(s().doc).ok).toBe(true);
    s().undo();
    expect(s().doc).toBe(before);
  });

  it('the roof renamed: the row is measured from the new name', () => {
    const { s } = setup('wall');
    s().commit(renameSurface(s().doc, 'roof', 'crown'));
    expect(s().doc.rows?.['row 1'].from).toEqual({ wall: 'crown', distance: 0.25 });
    expect(restore(s().doc).ok).toBe(true);
  });

  it('every tube of a row from a point moved together: the start moves with them', () => {
    const { s } = setup('point');
    const picks = tubesOfRow(s().doc, 'row 1').map((shape) => ({ type: 'shape' as const, shape }));
    s().commit(moveSelection(s().doc, picks, 0.1, 0.2));
    expect(s().doc.rows?.['row 1'].from).toEqual({ start: [0.6, 0.7], angle: 0 });
    expect(restore(s().doc).ok).toBe(true);
  });

  it('one tube moved or deleted on its own: the row becomes single tubes; all deleted: the row goes', () => {
    const moved = setup('point');
    const [first] = tubesOfRow(moved.s().doc, 'row 1');
    moved.s().commit(moveSelection(moved.s().doc, [{ type: 'shape', shape: first }], 0, 0.3));
    expect(moved.s().doc.rows).toBeUndefined();
    expect(moved.s().doc.shapes[first].circle?.center).toEqual([0.5, 0.8]);
    expect(restore(moved.s().doc).ok).toBe(true);

    const deleted = setup('wall');
    const tubes = tubesOfRow(deleted.s().doc, 'row 1');
    deleted.s().setSelection([{ type: 'shape', shape: tubes[1] }]);
    deleted.c.deleteSelection();
    expect(deleted.s().doc.rows).toBeUndefined();
    expect(deleted.s().doc.shapes).toHaveLength(3);
    expect(restore(deleted.s().doc).ok).toBe(true);

    const all = setup('wall');
    all.s().setSelection(tubesOfRow(all.s().doc, 'row 1').map((shape) => ({ type: 'shape' as const, shape })));
    all.c.deleteSelection();
    expect(all.s().doc.rows).toBeUndefined();
    expect(all.s().doc.shapes).toHaveLength(1);
  });
});

describe('a draft with a row is saved with its row', () => {
  it('a row out of step with its tubes is written as it stands, rows and tags included', () => {
    const { s } = setup('wall');
    const doc = s().doc;
    // Tubes out of step with the row's numbers: a draft, not a valid sketch.
    const draft: SketchFile = { ...doc, rows: { 'row 1': { ...doc.rows!['row 1'], pitch: 0.35 } } };
    expect(restore(draft).ok).toBe(false);
    const text = documentApi.serialize(draft);
    const back = JSON.parse(text) as SketchFile;
    expect(back.rows).toEqual(draft.rows);
    expect(back.shapes.filter((t) => t.row === 'row 1')).toHaveLength(3);
  });
});

describe('a row already out of step', () => {
  it('is not rebuilt behind the user when something else is edited', () => {
    const { s } = setup('wall');
    const doc = s().doc;
    // As opened from a file whose row says 0.35 while its tubes sit at 0.3.
    const draft: SketchFile = { ...doc, rows: { 'row 1': { ...doc.rows!['row 1'], pitch: 0.35 } } };
    s().commit(draft);
    s().commit(renameSurface(s().doc, 'floor', 'hearth'));
    expect(centres(s().doc)).toEqual(centres(doc));
    expect(s().doc.rows).toBe(draft.rows);
  });
});
