// An edge that crosses the other's line is trimmed there, and the rounded end can fall
// a few ulps behind that line. The view region a0 a1 b0 b1 was then not convex, and a
// body hugging the emitting edge was cut as if it crossed the view: the pair read as
// blocked. Fixtures named after the fuzz case that caught it (two squares one ulp
// apart, the left face of one seeing the floor below the other), checked against the
// ray-cast reference (test/core/oracle.ts) and the summation rule (Incropera et al.,
// Fundamentals of Heat and Mass Transfer, 6th ed., sec. 13.1), to rounding.
import { describe, expect, it } from 'vitest';
import { perEdge, worstRowError, type Poly } from '../helpers';
import { oracleRow, orientedSegments } from '../oracle';
import { seeded } from '../seeded';

/** x lowered by k ulps (x > 0). */
function ulpsBelow(x: number, k: number): number {
  const f = new Float64Array([x]);
  const bits = new BigInt64Array(f.buffer);
  bits[0] -= BigInt(k);
  return f[0];
}

/** Worst |1 - row sum| of a closed sketch's edge matrix. */
function worstRow(polys: Poly[]): number {
  const r = perEdge(polys);
  return worstRowError(r.F, r.surfaceCount);
}

const square = (x0: number, y0: number, x1: number, y1: number): Poly => ({
  kind: 'solid',
  points: [
    [x0, y0],
    [x1, y0],
    [x1, y1],
    [x0, y1],
  ],
});

describe('trimmed ends stay in front of the other edge', () => {
  // The fuzz case: square A's left face (edge 7) is one ulp right of square B's right face.
  const A = square(0.005567782714682883, 0.004471251519483216, 0.006580106844625224, 0.005528748480516786);
  const B = square(0.00455545858474054, 0.0045000000000000005, 0.005567782714682882, 0.005500000000000001);
  const box: Poly = {
    kind: 'enclosure',
    points: [
      [0, 0],
      [0.10123241299423422, 0],
      [0.0123241299423422, 0.10000000000000002],
      [0, 0.10000000000000002],
    ],
  };

  it('a face one ulp from a body still sees the floor past that body (the reference)', () => {
    const polys = [box, A, B];
    const r = perEdge(polys);
    const n = r.surfaceCount;
    // Below B, the lower end of A's left face sees the floor: the reference gives 0.00507.
    const ref = oracleRow(orientedSegments(polys), 7);
    expect(ref[0]).toBeGreaterThan(0.005);
    expect(Math.abs(r.F[7 * n + 0] - ref[0])).toBeLessThan(1e-9);
    expect(worstRow(polys)).toBeLessThan(1e-12);
  });

  it('squares a few ulps apart near a corner of a long box, side by side or one on another, keep every row sum', () => {
    // A's face hugs B and reaches past B's end, so it sees the wall that its line
    // trims; that wall's trimmed end is computed from its far end, 8 or 7 away, whose
    // rounding is hundreds of ulps of the faces' coordinates.
    const rand = seeded(1311);
    for (let c = 0; c < 40; c++) {
      const s = 0.002 + 0.002 * rand();
      const at = 0.005 + 0.005 * rand();
      const gap = 1 + (c % 5);
      const past = (0.05 + 0.4 * rand()) * s;
      const near = ulpsBelow(at, gap);
      // c even: B left of A's left face (at x = at), A reaching below B, seeing the floor;
      // c odd: B under A's bottom face (at y = at), A reaching left of B, seeing the left wall.
      const [A, B] =
        c % 2 === 0
          ? [square(at, 0.01, at + s, 0.01 + s), square(near - s, 0.01 + past, near, 0.01 + past + s)]
          : [square(0.01, at, 0.01 + s, at + s), square(0.01 + past, near - s, 0.01 + past + s, near)];
      const polys: Poly[] = [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [8, 0],
            [8, 7],
            [0, 7],
          ],
        },
        A,
        B,
      ];
      expect(worstRow(polys), `case ${c}`).toBeLessThan(1e-12);
    }
  });

  it('the shorter edge trimmed: a floor of half-unit edges under unit faces a few ulps apart', () => {
    // The floor edge (0.5) is shorter than A's face (1), so it is the edge integrated
    // along and the one trimmed by the face's line at x = at, from its far end at 0.5.
    const rand = seeded(1312);
    const floor: number[][] = [];
    for (let k = 0; k < 16; k++) floor.push([0.5 * k, 0]);
    for (let c = 0; c < 40; c++) {
      const at = 0.005 + 0.005 * rand();
      const near = ulpsBelow(at, 1 + (c % 5));
      const past = 0.1 + 0.3 * rand();
      const polys: Poly[] = [
        { kind: 'enclosure', points: [...floor, [8, 0], [8, 7], [0, 7]] },
        square(at, 0.5, at + 1, 1.5),
        square(0.001, 0.5 + past, near, 1.5 + past),
      ];
      expect(worstRow(polys), `case ${c}`).toBeLessThan(1e-12);
    }
  });
});
