import { describe, expect, it } from 'vitest';
import { mulberry32 } from '../../bench/scenes';
import { boxCorners, f, perEdge, type Poly } from '../helpers';
import { oracleRow, orientedSegments } from '../oracle';

// Seeded random sketches of what the fast paths cut short: convex bodies of 9 to 16
// sides (clipped through angular windows), five-pointed stars (not convex), squashed
// shapes, and bodies 1e-6 of a radius apart (a view squeezed through a slit). Each is
// checked row by row against the ray-cast quadrature reference in ../oracle.ts (the 2D
// point kernel of Siegel and Howell, Thermal Radiation Heat Transfer; no code shared
// with src/core), cut at every event along the emitting edge (these sketches stay
// under its 80-edge limit), and by the summation rule of a closed enclosure
// (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., sec. 13.1).
// The reference converges to about 1e-11 per entry; 1e-9 leaves room for its error.
const TOL = 1e-9;
const SKETCHES = 12;

/** A box holding up to 4 bodies (seeded), at most `maxEdges` edges in all; `slits`: bodies placed 1e-6 of a radius from another. */
function randomSketch(seed: number, maxEdges: number): { polys: Poly[]; slits: number } {
  const rand = mulberry32(seed);
  const W = 3 + 3 * rand(),
    H = 2 + 2 * rand();
  const polys: Poly[] = [
    {
      kind: 'enclosure',
      points: boxCorners(W, H),
    },
  ];
  const placed: [number, number, number][] = [];
  let edges = 4,
    slits = 0;
  const wanted = 2 + Math.floor(3 * rand());
  for (let attempt = 0; attempt < 40 && placed.length < wanted; attempt++) {
    const r = 0.15 + 0.4 * rand();
    let cx = r + 0.05 + rand() * (W - 2 * r - 0.1),
      cy = r + 0.05 + rand() * (H - 2 * r - 0.1);
    const slit = placed.length > 0 && rand() < 0.5;
    if (slit) {
      // Beside an earlier body, its circle 1e-6 of the smaller radius away.
      const [x, y, q] = placed[Math.floor(rand() * placed.length)];
      const a = 2 * Math.PI * rand(),
        d = q + r + 1e-6 * Math.min(q, r);
      cx = x + d * Math.cos(a);
      cy = y + d * Math.sin(a);
    }
    if (cx - r < 0.01 || cy - r < 0.01 || cx + r > W - 0.01 || cy + r > H - 0.01) continue;
    if (placed.some(([x, y, q]) => Math.hypot(x - cx, y - cy) < r + q + 1e-7 * Math.min(r, q))) continue;
    const star = rand() < 0.3;
    const n = star ? 10 : 9 + Math.floor(8 * rand());
    if (edges + n > maxEdges) break;
    const squash = 0.6 + 0.4 * rand(),
      turn = 2 * Math.PI * rand();
    placed.push([cx, cy, r]);
    edges += n;
    if (slit) slits++;
    polys.push({
      kind: 'solid',
      points: Array.from({ length: n }, (_, k) => {
        const rad = star && k % 2 === 1 ? 0.45 * r : r;
        const a = turn + (2 * Math.PI * k) / n;
        return [cx + rad * Math.cos(a), cy + squash * rad * Math.sin(a)];
      }),
    });
  }
  return { polys, slits };
}

describe('seeded random bodies: many-sided, stars, squashed, nearly touching', () => {
  it('the sketches hold two bodies or more, and slits of 1e-6 of a radius in several', () => {
    let withSlit = 0;
    for (let seed = 1; seed <= SKETCHES; seed++) {
      const { polys, slits } = randomSketch(seed, 80);
      expect(polys.length).toBeGreaterThanOrEqual(3);
      expect(polys.reduce((n, p) => n + p.points.length, 0)).toBeLessThanOrEqual(80);
      if (slits > 0) withSlit++;
    }
    expect(withSlit).toBeGreaterThanOrEqual(4);
  });

  it('rows match the ray-cast reference and sum to one', { timeout: 600_000 }, () => {
    for (let seed = 1; seed <= SKETCHES; seed++) {
      const { polys } = randomSketch(seed, 80);
      const r = perEdge(polys);
      const segs = orientedSegments(polys);
      const n = segs.length;
      const pick = mulberry32(1000 + seed);
      for (let q = 0; q < 3; q++) {
        const i = Math.floor(pick() * n);
        const ref = oracleRow(segs, i);
        let sum = 0;
        for (let j = 0; j < n; j++) {
          sum += f(r, i, j);
          if (Math.abs(f(r, i, j) - ref[j]) > TOL)
            throw new Error(`seed ${seed}: F[${i}][${j}] = ${f(r, i, j)}, reference ${ref[j]}`);
        }
        expect(Math.abs(sum - 1)).toBeLessThan(1e-12);
      }
    }
  });
});
