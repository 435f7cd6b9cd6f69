// Random sequences of edits through the store (move, insert, delete, undo, redo)
// never throw, never put a non-finite number in the document, keep the document
// a readable sketch file, and every sketch the reader accepts keeps the
// view-factor invariants: summation rule and reciprocity (Incropera et al.,
// Fundamentals of Heat and Mass Transfer, 6th ed., eqs. 13.3 and 13.4), 0 <= F <= 1.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { createAppStore } from '../../src/state/store';
import { insertVertex, deleteVertices, moveSelection } from '../../src/state/edits/shapeEdits';
import { documentApi } from '../../src/state/documentApi';
import { computeViewFactors } from '../../src/core/viewFactors';
import { serialize } from '../../src/document';
import { box } from './boxSketch';

const edit = fc.oneof(
  fc.record({
    op: fc.constant('move' as const),
    shape: fc.nat(1),
    index: fc.nat(20),
    dx: fc.double({ min: -1, max: 1, noNaN: true }),
    dy: fc.double({ min: -1, max: 1, noNaN: true }),
  }),
  fc.record({
    op: fc.constant('insert' as const),
    shape: fc.nat(1),
    index: fc.nat(20),
    t: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
  }),
  fc.record({ op: fc.constant('delete' as const), shape: fc.nat(1), index: fc.nat(20) }),
  fc.constant({ op: 'undo' as const }),
  fc.constant({ op: 'redo' as const }),
);

/** Summation and reciprocity hold to rounding for exact factors; 1e-9 leaves room for sums over ~100 terms. */
const TOL = 1e-9;

describe('random edit sequences', () => {
  it('keep the document valid JSON and the factors within their invariants', () => {
    let accepted = 0;
    fc.assert(
      fc.property(fc.array(edit, { minLength: 1, maxLength: 12 }), (edits) => {
        const store = createAppStore(box);
        const s = () => store.getState();
        for (const e of edits) {
          const doc = s().doc;
          if (e.op === 'undo') s().undo();
          else if (e.op === 'redo') s().redo();
          else {
            const shape = doc.shapes[e.shape];
            if (!shape) continue;
            const k = e.index % shape.points.length;
            if (e.op === 'move')
              s().edit((d) => moveSelection(d, [{ type: 'vertex', shape: e.shape, index: k }], e.dx, e.dy));
            if (e.op === 'delete') s().edit((d) => deleteVertices(d, [{ shape: e.shape, index: k }]));
            if (e.op === 'insert') {
              const a = shape.points[k];
              const b = shape.points[(k + 1) % shape.points.length];
              s().edit((d) => insertVertex(d, e.shape, k, [a[0] + e.t * (b[0] - a[0]), a[1] + e.t * (b[1] - a[1])]));
            }
          }
          const now = s().doc;
          for (const shape of now.shapes) {
            expect(shape.points.length).toBeGreaterThanOrEqual(3);
            for (const [x, y] of shape.points) expect(Number.isFinite(x) && Number.isFinite(y)).toBe(true);
          }
          expect(JSON.parse(JSON.stringify(now))).toEqual(now);
          const read = documentApi.restore(now);
          if (!read.ok) {
            expect(read.errors.length).toBeGreaterThan(0);
            expect(read.errors.every((e) => e.message.length > 10)).toBe(true);
            continue;
          }
          expect(documentApi.restore(serialize(read.sketch)).ok).toBe(true);
          const { scene, surfaceNames } = documentApi.toScene(read.sketch);
          const r = computeViewFactors(scene);
          const n = r.surfaceCount;
          expect(n).toBe(surfaceNames.length);
          // Surface lengths from the accepted sketch's own points, not from the result.
          const L = new Array<number>(n).fill(0);
          for (const shape of read.sketch.shapes)
            shape.points.forEach((p, k) => {
              const q = shape.points[(k + 1) % shape.points.length];
              L[surfaceNames.indexOf(shape.surface[k])] += Math.hypot(q[0] - p[0], q[1] - p[1]);
            });
          for (let i = 0; i < n; i++) {
            // The box sketch has an enclosure and edits never remove it: every row sums to one.
            let row = 0;
            for (let j = 0; j < n; j++) {
              const f = r.F[i * n + j];
              row += f;
              expect(f).toBeGreaterThanOrEqual(-TOL);
              expect(f).toBeLessThanOrEqual(1 + TOL);
              const [gij, gji] = [L[i] * f, L[j] * r.F[j * n + i]];
              expect(Math.abs(gij - gji)).toBeLessThanOrEqual(TOL * Math.max(L[i], L[j]));
            }
            expect(Math.abs(1 - row)).toBeLessThan(TOL);
          }
          accepted += 1;
        }
      }),
      { numRuns: 60, seed: 20261201 },
    );
    // The invariants were checked on many sketches, not skipped because every edit broke the file.
    expect(accepted).toBeGreaterThan(100);
  });
});
