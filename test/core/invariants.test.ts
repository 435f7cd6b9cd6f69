import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { gridSketchArb, sketchArb } from './arbitraries';
import { oracleRow, orientedSegments } from './oracle';
import { perEdge, withSurfaces, type Poly } from './helpers';

// Invariants every exact result must keep (common practice: the enclosure rule and
// reciprocity, e.g. Incropera et al., sec. 13.1). Exact to rounding, so 1e-9.
const TOL = 1e-9;
const RUNS = 60;

const transform = (polys: Poly[], m: (x: number, y: number) => [number, number]): Poly[] =>
  polys.map((p) => ({ kind: p.kind, points: p.points.map(([x, y]) => m(x, y)) }));

/** Edge lengths computed here from the points (edges numbered polygon by polygon), not read from the result. */
const edgeLengths = (polys: Poly[]): number[] =>
  polys.flatMap((p) =>
    p.points.map(([x, y], k) => {
      const [u, v] = p.points[(k + 1) % p.points.length];
      return Math.hypot(u - x, v - y);
    }),
  );

/** 1 - sum_j F[i][j] for each row of a square row-major matrix, summed here. */
function rowResiduals(F: Float64Array, n: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) s += F[i * n + j];
    out.push(1 - s);
  }
  return out;
}

/** One surface per polygon, so results survive renumbering of edges. */
function perPolygon(polys: Poly[], order?: number[]) {
  const edgeSurface = polys.flatMap((p, k) => p.points.map(() => (order ? order[k] : k)));
  return withSurfaces(polys, edgeSurface, polys.length);
}

describe('view-factor invariants on random sketches', () => {
  it('rows of a closed enclosure sum to one; factors lie in [0, 1]; reciprocity holds pair by pair when both directions are integrated', () => {
    fc.assert(
      fc.property(sketchArb, (polys) => {
        const r = perEdge(polys, true);
        const L = edgeLengths(polys);
        const n = L.length;
        expect(r.F.length).toBe(n * n);
        const residual = rowResiduals(r.F, n);
        for (let i = 0; i < n; i++) {
          expect(Math.abs(residual[i])).toBeLessThan(TOL);
          for (let j = 0; j < n; j++) {
            const fij = r.F[i * n + j];
            expect(fij).toBeGreaterThanOrEqual(-1e-12); // rounding of the distance differences
            expect(fij).toBeLessThanOrEqual(1 + 1e-12);
            // Reciprocity L_I F_IJ = L_J F_JI, with lengths from the points.
            const a = L[i] * fij,
              b = L[j] * r.F[j * n + i];
            expect(Math.abs(a - b)).toBeLessThanOrEqual(TOL * Math.max(Math.abs(a), Math.abs(b), 1e-3));
          }
        }
      }),
      { numRuns: RUNS, seed: 20261201 },
    );
  });

  it('results do not change under translation, rotation, scaling or reversal of point order', () => {
    fc.assert(
      fc.property(
        sketchArb,
        fc.double({ min: -100, max: 100, noNaN: true }),
        fc.double({ min: -100, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 6.28, noNaN: true }),
        fc.double({ min: 0.001, max: 1000, noNaN: true }),
        (polys, dx, dy, turn, scale) => {
          const base = perPolygon(polys);
          const c = Math.cos(turn),
            s = Math.sin(turn);
          const moved = perPolygon(
            transform(polys, (x, y) => [scale * (c * x - s * y) + dx, scale * (s * x + c * y) + dy]),
          );
          const reversed = perPolygon(polys.map((p) => ({ kind: p.kind, points: [...p.points].reverse() })));
          for (let k = 0; k < base.F.length; k++) {
            expect(Math.abs(moved.F[k] - base.F[k])).toBeLessThan(TOL);
            expect(Math.abs(reversed.F[k] - base.F[k])).toBeLessThan(TOL);
          }
        },
      ),
      { numRuns: RUNS, seed: 7 },
    );
  });

  it('renaming (renumbering) surfaces permutes the matrix and nothing else', () => {
    fc.assert(
      fc.property(sketchArb, (polys) => {
        const n = polys.length;
        const order = Array.from({ length: n }, (_, k) => (k * 5 + 3) % n);
        if (new Set(order).size !== n) return; // not a permutation for this n
        const base = perPolygon(polys);
        const renamed = perPolygon(polys, order);
        for (let i = 0; i < n; i++) {
          for (let j = 0; j < n; j++) expect(renamed.F[order[i] * n + order[j]]).toBe(base.F[i * n + j]);
        }
      }),
      { numRuns: RUNS, seed: 11 },
    );
  });

  it('grid sketches full of exact collinear and in-line corners keep row sums of one', () => {
    fc.assert(
      fc.property(gridSketchArb, (polys) => {
        const r = perEdge(polys);
        const n = edgeLengths(polys).length;
        expect(r.F.length).toBe(n * n);
        for (const x of rowResiduals(r.F, n)) expect(Math.abs(x)).toBeLessThan(TOL);
      }),
      { numRuns: 25, seed: 3 },
    );
  });

  it('grid sketches agree with the ray-cast reference row by row', () => {
    const samples = fc.sample(gridSketchArb, { numRuns: 3, seed: 5 });
    for (const polys of samples) {
      const r = perEdge(polys);
      const segs = orientedSegments(polys);
      const n = segs.length;
      for (const i of [0, 7, 19, n - 1]) {
        const ref = oracleRow(segs, i);
        for (let j = 0; j < n; j++) expect(Math.abs(r.F[i * n + j] - ref[j])).toBeLessThan(TOL);
      }
    }
  });
});
