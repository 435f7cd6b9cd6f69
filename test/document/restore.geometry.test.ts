// Every bad input of the file reader gets a specific message naming what and
// where (shapes, points and edges counted from 1) and the rule broken.
import { describe, expect, it } from 'vitest';
import { restore, MAX_EDGES, MAX_SURFACES } from '../../src/document';
import { enclosure, block, minimal, errorsOf, only, withShapes, solid } from './restoreHelpers';

describe('restore refuses impossible geometry', () => {
  it('fewer than 3 points', () => {
    expect(
      only(
        withShapes(
          enclosure,
          solid(
            [
              [1, 1],
              [2, 1],
            ],
            'block',
          ),
        ),
      ),
    ).toBe("'block' (body, shape 2): has 2 points; a shape needs at least 3");
    expect(only(withShapes(solid([])))).toBe("'a' (body, shape 1): has 0 points; a shape needs at least 3");
    expect(
      only(
        withShapes(
          solid([
            [1, 1],
            [1, 1],
            [1, 1],
          ]),
        ),
      ),
    ).toBe("'a' (body, shape 1): has 1 distinct (of 3 written) point; a shape needs at least 3");
  });
  it('all points on one line (zero area)', () => {
    expect(
      only(
        withShapes(
          enclosure,
          solid(
            [
              [1, 1],
              [2, 1],
              [3, 1],
              [1.5, 1],
            ],
            'block',
          ),
        ),
      ),
    ).toBe("'block' (body, shape 2): all its points lie on one straight line (zero area)");
    // Exactly collinear in decimal, not in a naive floating-point determinant.
    expect(
      only(
        withShapes(
          solid([
            [0.1, 0.1],
            [0.3, 0.3],
            [0.7, 0.7],
          ]),
        ),
      ),
    ).toMatch(/zero area/);
  });
  it('a self-crossing polygon, with where it crosses', () => {
    expect(
      only(
        withShapes(
          enclosure,
          solid(
            [
              [1, 0.5],
              [2, 0.5],
              [1, 1.5],
              [2, 1.5],
            ],
            'bow',
          ),
        ),
      ),
    ).toBe("'bow' (body, shape 2): edge 2 crosses edge 4 at (1.5, 1); the outline must not cross or touch itself");
    expect(
      only(
        withShapes(
          solid([
            [0, 0],
            [4, 0],
            [4, 2],
            [4, 1],
            [0, 2],
          ]),
        ),
      ),
    ).toMatch(/edges 2 and 3 fold back onto each other from \(4, 2\) to \(4, 1\)/);
  });
  it('a solid crossing the enclosure wall, or outside it', () => {
    expect(
      errorsOf(
        withShapes(
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
      ),
    ).toEqual([
      "'block' (body, shape 2): edge 1 crosses the enclosure wall 'right' (shape 1, edge 2) at (4, 0.5); solids must lie inside the enclosure without touching it",
      "'block' (body, shape 2): edge 3 crosses the enclosure wall 'right' (shape 1, edge 2) at (4, 1); solids must lie inside the enclosure without touching it",
    ]);
    expect(
      only(
        withShapes(
          enclosure,
          solid(
            [
              [3, 0.5],
              [4, 0.5],
              [4, 1],
              [3, 1],
            ],
            'block',
          ),
        ),
      ),
    ).toBe(
      "'block' (body, shape 2): edge 2 runs along the enclosure wall 'right' (shape 1, edge 2) from (4, 0.5) to (4, 1); solids must lie inside the enclosure without touching it",
    );
    expect(
      only(
        withShapes(
          enclosure,
          solid(
            [
              [5, 0.5],
              [6, 0.5],
              [6, 1],
            ],
            'block',
          ),
        ),
      ),
    ).toBe("'block' (body, shape 2): lies outside the enclosure (point 1 at (5, 0.5)); solids must be inside it");
    expect(
      only(
        withShapes(
          solid(
            [
              [-1, -1],
              [5, -1],
              [5, 3],
              [-1, 3],
            ],
            'box',
          ),
          enclosure,
        ),
      ),
    ).toMatch(/^'box' \(body, shape 1\): lies outside the enclosure/);
  });
  it('solids that overlap, touch along an edge, or lie one inside the other', () => {
    const a = solid(
      [
        [1, 0.5],
        [2, 0.5],
        [2, 1.5],
        [1, 1.5],
      ],
      'a',
    );
    expect(
      errorsOf(
        withShapes(
          enclosure,
          a,
          solid(
            [
              [1.5, 1],
              [2.5, 1],
              [2.5, 1.8],
              [1.5, 1.8],
            ],
            'b',
          ),
        ),
      )[0],
    ).toBe(
      "'b' (body, shape 3): edge 1 crosses 'a' (body, shape 2) edge 2 at (2, 1); solids must not overlap or touch",
    );
    expect(
      only(
        withShapes(
          enclosure,
          a,
          solid(
            [
              [2, 0.5],
              [3, 0.5],
              [3, 1.5],
              [2, 1.5],
            ],
            'b',
          ),
        ),
      ),
    ).toBe(
      "'b' (body, shape 3): edge 4 runs along 'a' (body, shape 2) edge 2 from (2, 0.5) to (2, 1.5); solids must not overlap or touch",
    );
    expect(
      only(
        withShapes(
          enclosure,
          a,
          solid(
            [
              [2, 1.5],
              [3, 1.5],
              [3, 1.8],
            ],
            'b',
          ),
        ),
      ),
    ).toMatch(/^'b' \(body, shape 3\): edge \d touches 'a' \(body, shape 2\) edge \d at \(2, 1.5\)/);
    expect(
      only(
        withShapes(
          enclosure,
          a,
          solid(
            [
              [1.2, 0.7],
              [1.8, 0.7],
              [1.8, 1.3],
            ],
            'b',
          ),
        ),
      ),
    ).toBe("'b' (body, shape 3): lies inside 'a' (body, shape 2) (point 1 at (1.2, 0.7)); solids must not overlap");
  });
  it('more than one enclosure', () => {
    const second = {
      ...enclosure,
      points: [
        [10, 0],
        [11, 0],
        [11, 1],
      ],
      surface: 'other',
    };
    expect(only(withShapes(enclosure, second))).toBe(
      "two enclosures, the enclosure (shape 1) and 'other' (enclosure, shape 2); a sketch has at most one (draw the others as solids)",
    );
  });
  it('edge and point numbers follow the file even after repeated points were removed', () => {
    // Point 2 repeats point 1, so the file's edge 4 is the crossing edge.
    const bow = solid(
      [
        [1, 0.5],
        [1, 0.5],
        [2, 0.5],
        [1, 1.5],
        [2, 1.5],
      ],
      'bow',
    );
    expect(only(withShapes(enclosure, bow))).toMatch(/edge 3 crosses edge 5 at \(1.5, 1\)/);
  });
});

describe('restore refuses very large sketches before computing', () => {
  it(`more than ${MAX_EDGES} edges`, () => {
    // The documented limit (README, "What the reader checks"), so the message below is not only the constant echoed.
    expect(MAX_EDGES).toBe(20000);
    const ring = (n: number) =>
      Array.from({ length: n }, (_, k) => [Math.cos((2 * Math.PI * k) / n), Math.sin((2 * Math.PI * k) / n)]);
    expect(only(withShapes({ kind: 'enclosure', points: ring(MAX_EDGES + 1), surface: 'wall' }))).toBe(
      `the sketch has ${MAX_EDGES + 1} edges; the limit is ${MAX_EDGES} (the work grows with the square of the edge count)`,
    );
    expect(restore(withShapes({ kind: 'enclosure', points: ring(MAX_EDGES), surface: 'wall' })).ok).toBe(true);
    expect(only({ ...minimal, shapes: new Array(MAX_EDGES).fill(block) })).toMatch(
      /the sketch has 20000 shapes; the limit is 20000 edges/,
    );
  });

  it(`more than ${MAX_SURFACES} surfaces`, () => {
    // The documented limit (README, "Limits"): the exchange holds surfaces^2 numbers.
    expect(MAX_SURFACES).toBe(5000);
    const ring = (n: number) =>
      Array.from({ length: n }, (_, k) => [Math.cos((2 * Math.PI * k) / n), Math.sin((2 * Math.PI * k) / n)]);
    const named = (n: number) => Array.from({ length: n }, (_, k) => `wall ${k + 1}`);
    expect(
      only(withShapes({ kind: 'enclosure', points: ring(MAX_SURFACES + 1), surface: named(MAX_SURFACES + 1) })),
    ).toBe(
      `the sketch has ${MAX_SURFACES + 1} surfaces; the limit is ${MAX_SURFACES} (the surface factors and the heat exchange grow with the square of the surface count)`,
    );
    expect(
      restore(withShapes({ kind: 'enclosure', points: ring(MAX_SURFACES), surface: named(MAX_SURFACES) })).ok,
    ).toBe(true);
  });
});

describe('restore never throws', () => {
  it('answers odd values with a message', () => {
    for (const v of [undefined, () => 1, Symbol('s'), 10n, new Date(0), new Map()]) {
      const r = restore(v);
      expect(r.ok).toBe(false);
    }
    const hostile = {
      version: 1,
      units: 'm',
      get shapes(): unknown {
        throw new Error('boom');
      },
    };
    expect(only(hostile)).toMatch(/could not read the sketch \(internal error: boom\)/);
  });
});
