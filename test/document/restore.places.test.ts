import { describe, expect, it } from 'vitest';
import { restore, type SketchProblem } from '../../src/document';

// Every refusal carries the place it concerns as data: shapes and edges counted
// from 0 in the document as written, points in sketch units. Expected places
// here are worked out by hand from the coordinates.

const enclosure = {
  kind: 'enclosure',
  points: [
    [0, 0],
    [4, 0],
    [4, 2],
    [0, 2],
  ],
  surface: ['floor', 'right', 'roof', 'left'],
};
const solid = (points: number[][], surface = 'a') => ({ kind: 'solid', points, surface });
const sketch = (...shapes: unknown[]) => ({ version: 1, units: 'm', shapes });

function problemsOf(input: unknown): SketchProblem[] {
  const r = restore(input);
  if (r.ok) throw new Error('expected a refusal');
  return r.errors;
}

describe('problem places', () => {
  it('two enclosures: both shapes', () => {
    const second = {
      kind: 'enclosure',
      points: [
        [10, 0],
        [11, 0],
        [11, 1],
      ],
      surface: 'other',
    };
    const [p, ...rest] = problemsOf(sketch(enclosure, second));
    expect(rest).toEqual([]);
    expect(p.kind).toBe('several-enclosures');
    expect(p.message).toBe(
      "two enclosures, the enclosure (shape 1) and 'other' (enclosure, shape 2); a sketch has at most one (draw the others as solids)",
    );
    expect(p.place).toEqual({ shapes: [0, 1], edges: [], points: [] });
  });

  it('a solid outside the enclosure: the solid and its first point', () => {
    const [p] = problemsOf(
      sketch(
        enclosure,
        solid(
          [
            [5, 0.5],
            [6, 0.5],
            [6, 1],
          ],
          '(9, 9)',
        ),
      ),
    );
    expect(p.kind).toBe('outside-enclosure');
    // The name looks like a point; only the real place is in the data.
    expect(p.message).toContain("'(9, 9)'");
    expect(p.place).toEqual({ shapes: [1], edges: [], points: [[5, 0.5]] });
  });

  it('a self-crossing outline with a repeated point: file edges and the crossing point', () => {
    // File edges: 0 is zero length (point 1 repeats point 0) and is dropped on reading;
    // 2 runs (3, 0.6) -> (1, 1.8), 4 runs (3.5, 1.5) -> (0.5, 0.5).
    // Edge 2: (3 - 2t, 0.6 + 1.2t); edge 4: (3.5 - 3u, 1.5 - u). Equal at u = 3/7, t = 11/28:
    // the crossing is (31/14, 15/14).
    const bow = solid(
      [
        [0.5, 0.5],
        [0.5, 0.5],
        [3, 0.6],
        [1, 1.8],
        [3.5, 1.5],
      ],
      'bow',
    );
    const [p, ...rest] = problemsOf(sketch(bow));
    expect(rest).toEqual([]);
    expect(p.kind).toBe('edges-cross');
    expect(p.message).toMatch(/edge 3 crosses edge 5/);
    expect(p.place.shapes).toEqual([0]);
    expect(p.place.edges).toEqual([
      { shape: 0, edge: 2 },
      { shape: 0, edge: 4 },
    ]);
    expect(p.place.points).toHaveLength(1);
    // A line intersection in double precision: rounding of a few ulps of coordinates near 1.
    expect(p.place.points[0][0]).toBeCloseTo(31 / 14, 12);
    expect(p.place.points[0][1]).toBeCloseTo(15 / 14, 12);
  });

  it('a solid crossing the wall: both shapes, both edges, each crossing', () => {
    const problems = problemsOf(
      sketch(
        enclosure,
        solid(
          [
            [3.5, 0.5],
            [4.5, 0.5],
            [4.5, 1],
            [3.5, 1],
          ],
          'block',
        ),
      ),
    );
    expect(problems.map((p) => p.place)).toEqual([
      // Solid edge 0 (y = 0.5) and edge 2 (y = 1) cross the wall's edge 1 (x = 4).
      {
        shapes: [0, 1],
        edges: [
          { shape: 0, edge: 1 },
          { shape: 1, edge: 0 },
        ],
        points: [[4, 0.5]],
      },
      {
        shapes: [0, 1],
        edges: [
          { shape: 0, edge: 1 },
          { shape: 1, edge: 2 },
        ],
        points: [[4, 1]],
      },
    ]);
  });

  it('the "…and N more" line covers the places of the problems it counts', () => {
    // Six small squares straddle the floor (y = 0); each crosses it at its two sides.
    const xs = [0.25, 0.85, 1.45, 2.05, 2.65, 3.25];
    const squares = xs.map((x) =>
      solid([
        [x, -0.1],
        [x + 0.2, -0.1],
        [x + 0.2, 0.1],
        [x, 0.1],
      ]),
    );
    const problems = problemsOf(sketch(enclosure, ...squares));
    expect(problems).toHaveLength(5);
    expect(problems[4].kind).toBe('more');
    expect(problems[4].message).toBe('…and 8 more problems');
    const shapes = new Set(problems.flatMap((p) => p.place.shapes));
    expect([...shapes].sort((a, b) => a - b)).toEqual([0, 1, 2, 3, 4, 5, 6]);
    const points = problems
      .flatMap((p) => p.place.points)
      .map(([x, y]) => `${x.toFixed(9)},${y}`)
      .sort();
    const expected = xs
      .flatMap((x) => [x, x + 0.2])
      .map((x) => `${x.toFixed(9)},0`)
      .sort();
    expect(points).toEqual(expected);
  });

  it('file-level trouble has no place', () => {
    for (const input of ['', '{', { ...sketch(enclosure), version: 3 }, { ...sketch(enclosure), units: 'furlong' }]) {
      for (const p of problemsOf(input)) expect(p.place).toEqual({ shapes: [], edges: [], points: [] });
    }
  });

  it('a schema problem inside a shape names the shape; a short edge names its edge', () => {
    expect(
      problemsOf(
        sketch(
          enclosure,
          solid([
            [1, 1],
            [2, NaN],
            [1, 1.5],
          ]),
        ),
      )[0].place,
    ).toEqual({ shapes: [1], edges: [], points: [] });
    const [short] = problemsOf(
      sketch(
        solid([
          [0, 0],
          [1e-200, 0],
          [0, 1e-200],
        ]),
      ),
    );
    expect(short.kind).toBe('edge-too-short');
    expect(short.place.edges).toEqual([{ shape: 0, edge: 0 }]);
  });
});
