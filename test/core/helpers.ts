import { computeViewFactors } from '../../src/core/viewFactors';
import type { ViewFactorResult } from '../../src/core/scene';

export type Poly = { kind: 'enclosure' | 'solid'; points: number[][] };

/** View factors with one surface per edge (edges numbered polygon by polygon). */
export function perEdge(polys: Poly[], independentPairs = false): ViewFactorResult {
  const count = polys.reduce((n, p) => n + p.points.length, 0);
  return computeViewFactors(
    {
      polygons: polys.map((p) => ({ kind: p.kind, points: p.points.flat() })),
      edgeSurface: Array.from({ length: count }, (_, k) => k),
      surfaceCount: count,
    },
    { independentPairs },
  );
}

/** View factors with the given surface index per edge. */
export function withSurfaces(
  polys: Poly[],
  edgeSurface: number[],
  surfaceCount: number,
  independentPairs = false,
): ViewFactorResult {
  return computeViewFactors(
    { polygons: polys.map((p) => ({ kind: p.kind, points: p.points.flat() })), edgeSurface, surfaceCount },
    { independentPairs },
  );
}

export const f = (r: ViewFactorResult, i: number, j: number) => r.F[i * r.surfaceCount + j];

/** The corners of a w x h box from the origin, anticlockwise, as [x, y] pairs. */
export const boxCorners = (w: number, h: number): number[][] => [
  [0, 0],
  [w, 0],
  [w, h],
  [0, h],
];

/** Worst |1 - row sum| of an n x n matrix F (row-major): the summation rule's residual of a closed sketch. */
export function worstRowError(F: ArrayLike<number>, n: number): number {
  let worst = 0;
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) s += F[i * n + j];
    worst = Math.max(worst, Math.abs(1 - s));
  }
  return worst;
}
