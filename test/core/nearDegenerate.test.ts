import { describe, expect, it } from 'vitest';
import { oracleRow, orientedSegments } from './oracle';
import { perEdge, type Poly } from './helpers';

// Near-degenerate geometry: results must stay within rounding of the exact answer
// (checked against the ray-cast reference, converged to ~1e-11), rows must sum to
// one and nothing may be NaN. Tolerance 1e-9 as for every exact result.
const TOL = 1e-9;

function check(polys: Poly[]) {
  const r = perEdge(polys);
  for (const v of r.F) expect(Number.isFinite(v)).toBe(true);
  for (const x of r.rowSumResidual) expect(Math.abs(x)).toBeLessThan(TOL);
  return r;
}

function checkAgainstReference(polys: Poly[]) {
  const r = check(polys);
  const segs = orientedSegments(polys);
  const n = segs.length;
  for (let i = 0; i < n; i++) {
    const ref = oracleRow(segs, i);
    for (let j = 0; j < n; j++) expect(Math.abs(r.F[i * n + j] - ref[j])).toBeLessThan(TOL);
  }
  return r;
}

const bar = (x0: number, y0: number, x1: number, y1: number) => [
  [x0, y0],
  [x1, y0],
  [x1, y1],
  [x0, y1],
];

describe('near-degenerate geometry', () => {
  it('a wall corner bent by 1e-9 (almost collinear edges)', () => {
    checkAgainstReference([
      {
        kind: 'enclosure',
        points: [
          [0, 0],
          [1, 1e-9],
          [2, 0],
          [2, 1],
          [0, 1],
        ],
      },
    ]);
  });

  it('two corners a hair (1e-9) apart: a tiny edge', () => {
    checkAgainstReference([
      {
        kind: 'enclosure',
        points: [
          [0, 0],
          [2, 0],
          [2, 1],
          [1 + 1e-9, 1],
          [1, 1],
          [0, 1],
        ],
      },
      { kind: 'solid', points: bar(0.8, 0.4, 1.2, 0.6) },
    ]);
  });

  it('a bar 1e-9 above the floor', () => {
    checkAgainstReference([
      { kind: 'enclosure', points: bar(0, 0, 3, 1) },
      { kind: 'solid', points: bar(1, 1e-9, 2, 0.3) },
    ]);
  });

  it('a corner of a bar lined up with a wall corner to 1e-12', () => {
    checkAgainstReference([
      {
        kind: 'enclosure',
        points: [
          [0, 0],
          [3, 0],
          [3, 1],
          [2, 1],
          [2, 2],
          [0, 2],
        ],
      },
      { kind: 'solid', points: bar(0.5, 1 + 1e-12, 1, 1.5) },
    ]);
  });

  it('a sketch at 1e6 with millimetre features gives the same factors as at the origin', () => {
    const local: Poly[] = [
      { kind: 'enclosure', points: bar(0, 0, 0.05, 0.02) },
      { kind: 'solid', points: bar(0.02, 0.008, 0.021, 0.009) }, // a 1 mm bar
    ];
    const far: Poly[] = local.map((p) => ({ kind: p.kind, points: p.points.map(([x, y]) => [x + 1e6, y + 1e6]) }));
    const near = checkAgainstReference(local);
    const moved = check(far);
    // The shifted inputs are rounded to the spacing of doubles near 1e6 (1.2e-10 m), a
    // relative change of ~1e-7 on a 1 mm edge; the factors may move by that much and no more.
    for (let k = 0; k < near.F.length; k++) expect(Math.abs(moved.F[k] - near.F[k])).toBeLessThan(1e-6);
  });
});
