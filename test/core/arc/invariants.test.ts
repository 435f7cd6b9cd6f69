import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeViewFactors } from '../../../src/core/viewFactors';
import { edgeCountOf, mixedSceneArb, type MixedScene } from './arbitraries';

// Invariants of exact factors in random sketches mixing circles and polygons (common
// practice: the enclosure rule and reciprocity, e.g. Incropera et al., Fundamentals of
// Heat and Mass Transfer, 6th ed., sec. 13.1). Row sums are added up here.
const ROW_TOL = 1e-12;
const RECIPROCITY_TOL = 1e-9;

/** Edge lengths computed here from the input (polygon edges, then arcs r * 2 pi / arcs). */
function lengthsOf(s: MixedScene): number[] {
  const out: number[] = [];
  for (const p of s.polygons) {
    const n = p.points.length / 2;
    for (let k = 0; k < n; k++) {
      const m = (k + 1) % n;
      out.push(Math.hypot(p.points[2 * m] - p.points[2 * k], p.points[2 * m + 1] - p.points[2 * k + 1]));
    }
  }
  for (const c of s.circles) for (let k = 0; k < c.arcs; k++) out.push((c.radius * 2 * Math.PI) / c.arcs);
  return out;
}

function perEdge(s: MixedScene, independentPairs: boolean) {
  const n = edgeCountOf(s);
  return computeViewFactors(
    { ...s, edgeSurface: Array.from({ length: n }, (_, k) => k), surfaceCount: n },
    { independentPairs },
  );
}

describe('view-factor invariants with exact circles', () => {
  it('rows sum to one, factors lie in [0, 1], reciprocity holds pair by pair when both directions are integrated', () => {
    fc.assert(
      fc.property(mixedSceneArb, (s) => {
        const r = perEdge(s, true);
        const L = lengthsOf(s);
        const n = L.length;
        expect(r.F.length).toBe(n * n);
        for (let i = 0; i < n; i++) {
          let sum = 0;
          for (let j = 0; j < n; j++) {
            const fij = r.F[i * n + j];
            sum += fij;
            expect(fij).toBeGreaterThanOrEqual(-1e-12);
            expect(fij).toBeLessThanOrEqual(1 + 1e-12);
            const a = L[i] * fij,
              b = L[j] * r.F[j * n + i];
            expect(Math.abs(a - b)).toBeLessThanOrEqual(RECIPROCITY_TOL * Math.max(Math.abs(a), Math.abs(b), 1e-3));
          }
          expect(Math.abs(1 - sum)).toBeLessThanOrEqual(ROW_TOL);
        }
      }),
      { numRuns: 60, seed: 20261204 },
    );
  });

  it('results do not change under a move, a turn or a change of scale', () => {
    fc.assert(
      fc.property(
        mixedSceneArb,
        fc.double({ min: -50, max: 50, noNaN: true }),
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        (s, dx, scale) => {
          const base = perEdge(s, false);
          // A move and a change of scale keep every arc where it was on its circle.
          const moved: MixedScene = {
            polygons: s.polygons.map((p) => ({
              kind: p.kind,
              points: Array.from(p.points, (v, k) => scale * v + (k % 2 === 0 ? dx : -dx)),
            })),
            circles: s.circles.map((c) => ({
              ...c,
              cx: scale * c.cx + dx,
              cy: scale * c.cy - dx,
              radius: scale * c.radius,
            })),
          };
          const r = perEdge(moved, false);
          for (let k = 0; k < base.F.length; k++) expect(Math.abs(r.F[k] - base.F[k])).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 30, seed: 5 },
    );
  });
});
