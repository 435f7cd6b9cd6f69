import { describe, expect, it } from 'vitest';
import { documentApi, type SketchProblem } from '../../src/state/documentApi';
import type { SketchFile } from '../../src/state/sketchFile';
import { canvasProblemMarks as marksFor, canvasProblems, problemMarks } from '../../src/ui/canvas/problems';

/** What the canvas draws for a results state (as SketchCanvas does). */
const canvasProblemMarks = (status: string, problems: SketchProblem[], shapes: SketchFile['shapes']) =>
  marksFor(canvasProblems({ status, problems }), shapes);
// The canvas marks problems from their places (data from the document layer),
// never from their wording: a surface name that looks like a point or a shape
// number must not move a mark.

const enclosure = {
  kind: 'enclosure' as const,
  points: [
    [0, 0],
    [4, 0],
    [4, 2],
    [0, 2],
  ] as [number, number][],
  surface: 'wall',
};
const doc = (...shapes: SketchFile['shapes']): SketchFile => ({ version: 1, units: 'm', shapes });

function problemsOf(d: SketchFile): SketchProblem[] {
  const r = documentApi.restore(d);
  if (r.ok) throw new Error('expected a refusal');
  return r.errors;
}

describe('problem marks on the canvas', () => {
  it('a surface named "(9, 9)" in an invalid sketch: the real place is marked, not (9, 9)', () => {
    // Solid 'shape 3' named like a point lies outside the enclosure; its first point is (5, 0.5).
    const d = doc(enclosure, {
      kind: 'solid',
      points: [
        [5, 0.5],
        [6, 0.5],
        [6, 1],
      ],
      surface: ['(9, 9)', 'shape 3', '(9, 9)'],
    });
    const problems = problemsOf(d);
    expect(problems.map((p) => p.message).join(' ')).toContain('(9, 9)');
    const marks = canvasProblemMarks('invalid', problems, d.shapes);
    expect([...marks.shapes]).toEqual([1]);
    expect(marks.points).toEqual([[5, 0.5]]);
    expect(marks.edges).toEqual([]);
  });

  it('a valid sketch with a surface named "(9, 9)" gets no mark at all', () => {
    const d = doc(enclosure, {
      kind: 'solid',
      points: [
        [1, 0.5],
        [2, 0.5],
        [2, 1.5],
      ],
      surface: '(9, 9)',
    });
    const read = documentApi.restore(d);
    expect(read.ok).toBe(true);
    const marks = canvasProblemMarks('ready', read.ok ? [] : read.errors, d.shapes);
    expect(marks.shapes.size + marks.edges.length + marks.points.length).toBe(0);
  });

  it('two enclosures: both shapes are outlined', () => {
    const d = doc(enclosure, {
      kind: 'enclosure',
      points: [
        [10, 0],
        [11, 0],
        [11, 1],
      ],
      surface: 'other',
    });
    const marks = canvasProblemMarks('invalid', problemsOf(d), d.shapes);
    expect([...marks.shapes].sort()).toEqual([0, 1]);
  });

  it('crossing edges: both edges traced as drawn, and the crossing ringed', () => {
    // Point 1 repeats point 0; the crossing edges are the file's edges 2 and 4.
    // Edge 2: (3 - 2t, 0.6 + 1.2t); edge 4: (3.5 - 3u, 1.5 - u); equal at u = 3/7: (31/14, 15/14).
    const d = doc({
      kind: 'solid',
      points: [
        [0.5, 0.5],
        [0.5, 0.5],
        [3, 0.6],
        [1, 1.8],
        [3.5, 1.5],
      ],
      surface: 'bow',
    });
    const marks = canvasProblemMarks('invalid', problemsOf(d), d.shapes);
    expect([...marks.shapes]).toEqual([0]);
    expect(marks.edges).toEqual([
      [
        [3, 0.6],
        [1, 1.8],
      ],
      [
        [3.5, 1.5],
        [0.5, 0.5],
      ],
    ]);
    expect(marks.points).toHaveLength(1);
    expect(marks.points[0][0]).toBeCloseTo(31 / 14, 12);
    expect(marks.points[0][1]).toBeCloseTo(15 / 14, 12);
  });

  it('nothing is marked unless the document is invalid, and places that no longer fit are dropped', () => {
    const d = doc(enclosure, {
      kind: 'enclosure',
      points: [
        [10, 0],
        [11, 0],
        [11, 1],
      ],
      surface: 'other',
    });
    const problems = problemsOf(d);
    expect(canvasProblemMarks('computing', problems, d.shapes).shapes.size).toBe(0);
    // The same problems against a document that has since lost its second shape.
    const stale: SketchProblem = {
      kind: 'edges-cross',
      message: 'x',
      place: {
        shapes: [1],
        edges: [
          { shape: 1, edge: 0 },
          { shape: 0, edge: 7 },
        ],
        points: [],
      },
    };
    const marks = problemMarks([...problems, stale], [enclosure]);
    expect([...marks.shapes]).toEqual([0]);
    expect(marks.edges).toEqual([]);
  });
});
