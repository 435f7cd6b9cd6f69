// Random sketches whose corners are snapped to each other's coordinates, give or take
// a few ulps: faces in line or a hair off it, corners level with others, bodies a few
// rounding steps from walls and from each other. What drawing to a grid, or moving by
// typed amounts, makes of real sketches. Every valid one (core/sketchChecks.ts) must
// keep the summation rule (Incropera et al., Fundamentals of Heat and Mass Transfer,
// 6th ed., sec. 13.1) to rounding. Seed 4 holds four sketches (attempts 348, 1428,
// 3471, 3556) whose rows summed to 0.8-1.2 before the trimmed ends were kept in front
// of the other edge and grazing pieces decided exactly (integrator.ts, viewRegion.ts).
import { describe, expect, it } from 'vitest';
import { checkSketchGeometry } from '../../../src/core/sketchChecks';
import { boxCorners, perEdge, worstRowError, type Poly } from '../helpers';
import { seeded } from '../seeded';

/** x moved by k ulps (k may be negative); from 0, k steps of 1.3e-17. */
function ulps(x: number, k: number): number {
  if (k === 0) return x;
  if (x === 0) return k * 1.3e-17;
  const f = new Float64Array([x]);
  const bits = new BigInt64Array(f.buffer);
  bits[0] += BigInt((x > 0 ? 1 : -1) * k);
  return f[0];
}

/** The sketch of one attempt: a box and 2-4 convex bodies, coordinates snapped to earlier ones. */
function attempt(rand: () => number, c: number): Poly[] {
  const W = [8, 1, 0.1][c % 3],
    H = W * (0.5 + rand());
  const polys: Poly[] = [{ kind: 'enclosure', points: boxCorners(W, H) }];
  const xs = [0, W],
    ys = [0, H];
  const nearest = (v: number, list: number[]) =>
    list.reduce((best, u) => (Math.abs(u - v) < Math.abs(best - v) ? u : best), Infinity);
  const bodies = 2 + Math.floor(rand() * 3);
  for (let b = 0; b < bodies; b++) {
    const sides = 3 + Math.floor(rand() * 4);
    const cx = W * (0.1 + 0.8 * rand()),
      cy = H * (0.1 + 0.8 * rand()),
      r = 0.25 * Math.min(W, H) * (0.3 + rand());
    const turn = rand() * 6.283;
    const points = Array.from({ length: sides }, (_, k) => [
      cx + r * Math.cos(turn + (2 * Math.PI * k) / sides),
      cy + r * Math.sin(turn + (2 * Math.PI * k) / sides),
    ]);
    for (const p of points) {
      const nx = nearest(p[0], xs),
        ny = nearest(p[1], ys);
      if (Math.abs(nx - p[0]) < 0.4 * r && rand() < 0.7) p[0] = ulps(nx, Math.floor(rand() * 9) - 4);
      if (Math.abs(ny - p[1]) < 0.4 * r && rand() < 0.7) p[1] = ulps(ny, Math.floor(rand() * 9) - 4);
    }
    for (const p of points) {
      xs.push(p[0]);
      ys.push(p[1]);
    }
    polys.push({ kind: 'solid', points });
  }
  return polys;
}

describe('sketches with corners snapped to each other, give or take a few ulps', () => {
  it('every valid one keeps its rows summing to one', () => {
    const rand = seeded(4);
    let valid = 0;
    for (let c = 0; c < 6000; c++) {
      const polys = attempt(rand, c);
      if (checkSketchGeometry(polys.map((p) => ({ kind: p.kind, points: p.points.flat() }))).length > 0) continue;
      valid++;
      const r = perEdge(polys);
      expect(worstRowError(r.F, r.surfaceCount), `attempt ${c}`).toBeLessThan(1e-12);
    }
    // Most attempts make bodies that cross; the valid ones are what is tested.
    expect(valid).toBeGreaterThan(700);
  });
});
