// Open reads everything Save writes: random edit sequences through the store
// (moves large enough to cross outlines, inserted and deleted points, new
// shapes, renames to names such as "constructor", properties, units, undo and
// redo), then Save's text is opened in a fresh store. The opened document is the
// one the reader makes of the edited document (drafts included), its problems
// are the same, and saving it again gives the same text.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { createAppStore } from '../../src/state/store';
import { addShape, deleteVertices, insertVertex, moveSelection } from '../../src/state/edits/shapeEdits';
import { renameSurface } from '../../src/state/edits/surfaceEdits';
import { setEmissivity, setSettings } from '../../src/state/exchange/edits';
import { changeUnits } from '../../src/state/edits/unitEdits';
import { documentApi } from '../../src/state/documentApi';
import { openSketchText, sketchFileText } from '../../src/state/files';
import { edgeNames } from '../../src/state/geometry/polygon';
import type { SketchFile } from '../../src/state/sketchFile';
import { demoSketch } from '../../src/state/demo';
import { box } from './boxSketch';

const start: SketchFile = {
  ...demoSketch,
  units: 'm',
  shapes: box.shapes,
  surfaces: undefined,
  settings: undefined,
};

// Names that are also properties of every JavaScript object, and plain ones.
const names = ['constructor', 'toString', 'hasOwnProperty', 'valueOf', 'wall é', 'x'.repeat(200), 'roof'];

const edit = fc.oneof(
  fc.record({
    op: fc.constant('move' as const),
    shape: fc.nat(3),
    index: fc.nat(20),
    dx: fc.double({ min: -3, max: 3, noNaN: true }),
    dy: fc.double({ min: -3, max: 3, noNaN: true }),
  }),
  fc.record({
    op: fc.constant('insert' as const),
    shape: fc.nat(3),
    index: fc.nat(20),
    t: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
  }),
  fc.record({ op: fc.constant('delete' as const), shape: fc.nat(3), index: fc.nat(20) }),
  fc.record({
    op: fc.constant('add' as const),
    x: fc.double({ min: -1, max: 4, noNaN: true }),
    y: fc.double({ min: -1, max: 2, noNaN: true }),
    size: fc.double({ min: 0.05, max: 1, noNaN: true }),
  }),
  fc.record({ op: fc.constant('rename' as const), shape: fc.nat(3), index: fc.nat(20), to: fc.constantFrom(...names) }),
  fc.record({
    op: fc.constant('emissivity' as const),
    shape: fc.nat(3),
    value: fc.option(fc.double({ min: 0.01, max: 1, noNaN: true }), { nil: undefined }),
  }),
  fc.record({
    op: fc.constant('settings' as const),
    depth: fc.option(fc.double({ min: 0.1, max: 100, noNaN: true }), { nil: undefined }),
  }),
  fc.record({ op: fc.constant('units' as const), to: fc.constantFrom('m', 'cm', 'mm', 'in', 'ft' as const) }),
  fc.constant({ op: 'undo' as const }),
  fc.constant({ op: 'redo' as const }),
);
type Edit = typeof edit extends fc.Arbitrary<infer T> ? T : never;

function apply(store: ReturnType<typeof createAppStore>, e: Edit): void {
  const s = store.getState();
  if (e.op === 'undo') return s.undo();
  if (e.op === 'redo') return s.redo();
  if (e.op === 'add') {
    const { x, y, size } = e;
    return s.edit((d) =>
      addShape(d, 'solid', [
        [x, y],
        [x + size, y],
        [x + size, y + size],
        [x, y + size],
      ]),
    );
  }
  if (e.op === 'settings') return s.edit((d) => setSettings(d, { depth: e.depth }));
  if (e.op === 'units') return s.edit((d) => changeUnits(d, e.to, 'convert'));
  const shape = s.doc.shapes[e.shape];
  if (!shape) return;
  const k = 'index' in e ? e.index % shape.points.length : 0;
  const name = edgeNames(shape)[k];
  if (e.op === 'move') s.edit((d) => moveSelection(d, [{ type: 'vertex', shape: e.shape, index: k }], e.dx, e.dy));
  if (e.op === 'delete') s.edit((d) => deleteVertices(d, [{ shape: e.shape, index: k }]));
  if (e.op === 'insert') {
    const a = shape.points[k];
    const b = shape.points[(k + 1) % shape.points.length];
    s.edit((d) => insertVertex(d, e.shape, k, [a[0] + e.t * (b[0] - a[0]), a[1] + e.t * (b[1] - a[1])]));
  }
  if (e.op === 'rename') s.edit((d) => renameSurface(d, name, e.to));
  if (e.op === 'emissivity') s.edit((d) => setEmissivity(d, name, e.value));
}

/** -0 is written as 0 and an undefined field is not written: compare documents as JSON reads them. */
const asJson = (v: unknown): unknown => JSON.parse(JSON.stringify(v));

describe('save then open', () => {
  it('gives back the same document, drafts included, with the same problems', () => {
    let drafts = 0;
    let valid = 0;
    fc.assert(
      fc.property(fc.array(edit, { minLength: 1, maxLength: 14 }), (edits) => {
        const store = createAppStore(start);
        for (const e of edits) apply(store, e);
        const doc = store.getState().doc;
        const text = sketchFileText(store, documentApi);

        const opened = createAppStore(demoSketch);
        expect(openSketchText(opened, documentApi, text, 'sketch.json')).toBe(true);
        const back = opened.getState().doc;

        const read = documentApi.readDraft(doc);
        if (!read.ok) throw new Error(`the edited document does not read: ${read.errors[0].message}`);
        expect(asJson(back)).toEqual(asJson(read.doc));
        // Geometry and names exactly as drawn (a draft is not repaired on the way).
        if (read.problems.length > 0) {
          expect(back.shapes.map((sh) => sh.points)).toEqual(asJson(doc.shapes.map((sh) => sh.points)));
          expect(back.shapes.map(edgeNames)).toEqual(doc.shapes.map(edgeNames));
        }
        const before = documentApi.restore(doc);
        const after = documentApi.restore(back);
        expect(after.ok).toBe(before.ok);
        if (!before.ok && !after.ok) {
          drafts += 1;
          expect(after.errors.map((p) => p.message)).toEqual(before.errors.map((p) => p.message));
          expect(opened.getState().notices.at(-1)?.text).toContain('as a draft');
        } else valid += 1;
        expect(sketchFileText(opened, documentApi)).toBe(text);
      }),
      { numRuns: 150, seed: 20261204 },
    );
    // Both kinds were exercised.
    expect(drafts).toBeGreaterThan(15);
    expect(valid).toBeGreaterThan(15);
  });
});
