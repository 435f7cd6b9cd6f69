import { describe, expect, it } from 'vitest';
import { oracleRow, orientedSegments } from './oracle';
import { f, perEdge, withSurfaces, type Poly } from './helpers';

// Blocked and concave views, checked against the ray-cast quadrature reference in
// ./oracle.ts, which shares no code with src/core. The reference is converged to
// about 1e-11 per entry; 1e-9 leaves room for its error, not ours.
const TOL = 1e-9;

function expectMatchesReference(polys: Poly[], rows?: number[]) {
  const r = perEdge(polys);
  const segs = orientedSegments(polys);
  const n = segs.length;
  for (const i of rows ?? segs.map((_, k) => k)) {
    const ref = oracleRow(segs, i);
    for (let j = 0; j < n; j++) {
      const got = f(r, i, j);
      if (Math.abs(got - ref[j]) > TOL) throw new Error(`F[${i}][${j}] = ${got}, reference ${ref[j]}`);
    }
  }
  return r;
}

const rect = (x0: number, y0: number, x1: number, y1: number) => [
  [x0, y0],
  [x1, y0],
  [x1, y1],
  [x0, y1],
];

describe('blocked views against the ray-cast reference', () => {
  it('a block splits the view of a duct into two channels: floor to roof is about 0.45, not the 0.63 of the plain shortest-string rule', () => {
    const polys: Poly[] = [
      { kind: 'enclosure', points: rect(0, 0, 4, 2) },
      { kind: 'solid', points: rect(1.75, 0.75, 2.25, 1.25) },
    ];
    const r = expectMatchesReference(polys);
    expect(f(r, 0, 2)).toBeGreaterThan(0.44);
    expect(f(r, 0, 2)).toBeLessThan(0.46);
    // The plain rule (Hottel's crossed strings, Modest, Radiative Heat Transfer, 3rd ed., ch. 4, crossed-strings method, from memory), evaluated by hand: each crossed string wraps one corner of the block,
    // (0,0)-(2.25,0.75)-(4,2), of length sqrt(2.25^2+0.75^2) + sqrt(1.75^2+1.25^2); the
    // uncrossed strings are the side walls (2 each). F = (2 crossed - 2 uncrossed) / (2 * 4).
    const crossed = Math.hypot(2.25, 0.75) + Math.hypot(1.75, 1.25);
    const plainRule = (2 * crossed - 2 * 2) / (2 * 4); // 0.6306
    expect(plainRule - f(r, 0, 2)).toBeGreaterThan(0.15); // the block splits the view in two channels
  });

  it('a row of tubes between a floor and a roof (several channels at once)', () => {
    const tube = (cx: number, cy: number, rad: number, sides: number) =>
      Array.from({ length: sides }, (_, k) => [
        cx + rad * Math.cos((2 * Math.PI * k) / sides + 0.2),
        cy + rad * Math.sin((2 * Math.PI * k) / sides + 0.2),
      ]);
    const polys: Poly[] = [
      { kind: 'enclosure', points: rect(0, 0, 6, 2.5) },
      { kind: 'solid', points: tube(1.2, 1.1, 0.35, 8) },
      { kind: 'solid', points: tube(3.0, 1.3, 0.4, 7) },
      { kind: 'solid', points: tube(4.7, 1.0, 0.3, 6) },
    ];
    expectMatchesReference(polys, [0, 2, 4, 7, 12]);
  });

  it('a non-convex body (a U-shaped channel) blocks and sees into itself', () => {
    const polys: Poly[] = [
      { kind: 'enclosure', points: rect(0, 0, 5, 3) },
      {
        kind: 'solid',
        points: [
          [1.5, 0.8],
          [3.5, 0.8],
          [3.5, 2.2],
          [3.0, 2.2],
          [3.0, 1.2],
          [2.0, 1.2],
          [2.0, 2.2],
          [1.5, 2.2],
        ],
      },
    ];
    const r = expectMatchesReference(polys);
    // Inner walls of the U face each other: edge 3 (x = 3, inner side) sees edge 5 (x = 2).
    expect(f(r, 4 + 3, 4 + 5)).toBeGreaterThan(0.1);
  });

  it('a concave (L-shaped) enclosure blocks itself, and a concave surface sees itself', () => {
    const L: Poly = {
      kind: 'enclosure',
      points: [
        [0, 0],
        [4, 0],
        [4, 1.5],
        [1.5, 1.5],
        [1.5, 4],
        [0, 4],
      ],
    };
    expectMatchesReference([L]);
    // Floor and the far wall of the other leg cannot see each other past the corner at (1.5, 1.5)... partly.
    const all = Array.from({ length: 6 }, (_, k) => k);
    const oneSurface = withSurfaces(
      [L],
      all.map(() => 0),
      1,
    );
    expect(Math.abs(f(oneSurface, 0, 0) - 1)).toBeLessThan(1e-12); // a whole closed enclosure sees only itself (summation rule, Incropera et al., 6th ed., sec. 13.1; equation number from memory)
    const walls = withSurfaces([L], [0, 0, 1, 1, 1, 1], 2);
    expect(f(walls, 0, 0)).toBeGreaterThan(0); // floor + right wall form a concave corner
  });

  it('touching and collinear cases: a wall split into collinear edges, a body with an edge on the line of a wall', () => {
    const polys: Poly[] = [
      {
        kind: 'enclosure',
        points: [
          [0, 0],
          [1, 0],
          [2, 0],
          [3, 0],
          [3, 2],
          [1.5, 2],
          [0, 2],
        ],
      },
      {
        kind: 'solid',
        points: [
          [1, 0.5],
          [2, 0.5],
          [2, 1],
          [1, 1],
        ],
      }, // its bottom edge lies on the line through the corners (1,0.5)
    ];
    const r = expectMatchesReference(polys);
    expect(f(r, 0, 1)).toBe(0); // collinear edges of one wall see nothing of each other
  });

  it('a side wall looking along a row of 12-sided tubes on one line (many alignments, most of them outside the target)', () => {
    // Five equal tubes on y = 1.2 at a pitch of 0.6 in a 4 x 1.5 box: from a tube edge
    // the far side wall is seen past the others through narrow channels, and the lines
    // through two tube corners mostly miss the small target edges.
    const tube = (cx: number) =>
      Array.from({ length: 12 }, (_, k) => [
        cx + 0.2 * Math.cos((2 * Math.PI * k) / 12),
        1.2 + 0.2 * Math.sin((2 * Math.PI * k) / 12),
      ]);
    const polys: Poly[] = [
      { kind: 'enclosure', points: rect(0, 0, 4, 1.5) },
      ...[0.6, 1.2, 1.8, 2.4, 3.0].map((cx) => ({ kind: 'solid' as const, points: tube(cx) })),
    ];
    expectMatchesReference(polys, [1, 3, 4, 10, 40, 61]);
  });
});
