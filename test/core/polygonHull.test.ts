import { orient2d } from 'robust-predicates';
import { describe, expect, it } from 'vitest';
import { buildEdges, type EdgeSet } from '../../src/core/edges';
import { blockingWallEdges } from '../../src/core/polygonHull';
import { hardScene } from '../bench/hardScenes';
import { mulberry32 } from '../bench/scenes';

// Which enclosure edges may block a view: those off the enclosure's convex hull. The
// fast lookup (a hull side found by direction, tried exactly) must give the same set
// as the definition tested by brute force with robust-predicates' exact orientation
// (Shewchuk's adaptive predicates, an independent library): an edge is on the hull
// when every corner of the polygon lies on its radiating (left) side or on its line.

/** Left of a -> b (> 0), right (< 0) or on the line (0), exactly; robust-predicates' sign is the opposite. */
const side = (ax: number, ay: number, bx: number, by: number, px: number, py: number) =>
  -orient2d(ax, ay, bx, by, px, py);

function offHullByDefinition(E: EdgeSet, from: number, to: number): number[] {
  const out: number[] = [];
  for (let e = from; e < to; e++) {
    let on = true;
    for (let c = from; c < to && on; c++)
      if (side(E.ax[e], E.ay[e], E.bx[e], E.by[e], E.ax[c], E.ay[c]) < 0) on = false;
    if (!on) out.push(e);
  }
  return out;
}

function expectSameSet(points: number[], reversed = false): number {
  const pts = reversed
    ? points.flatMap((_, k, a) => (k % 2 === 0 ? [a[a.length - 2 - k], a[a.length - 1 - k]] : []))
    : points;
  const E = buildEdges([{ kind: 'enclosure', points: pts }]);
  const fast = blockingWallEdges(E, 0, E.count);
  expect(fast).toEqual(offHullByDefinition(E, 0, E.count));
  return fast.length;
}

/** A regular n-gon of radius r about (cx, cy), turned by `turn`, flat x, y anticlockwise. */
const ngon = (n: number, r: number, turn: number, cx = 0, cy = 0) =>
  Array.from({ length: n }, (_, k) => [
    cx + r * Math.cos(turn + (2 * Math.PI * k) / n),
    cy + r * Math.sin(turn + (2 * Math.PI * k) / n),
  ]).flat();

describe('enclosure edges off the convex hull', () => {
  it('convex polygons of 3 to 2000 sides, given either way round: no edge blocks', () => {
    const rand = mulberry32(3);
    for (const n of [3, 4, 5, 7, 12, 50, 333, 2000]) {
      const pts = ngon(n, 1 + 100 * rand(), 2 * Math.PI * rand(), 1e3 * rand(), -1e3 * rand());
      expect(expectSameSet(pts)).toBe(0);
      expect(expectSameSet(pts, true)).toBe(0);
    }
  });

  it('boxes with sides split into many collinear edges, with and without fins and pockets', () => {
    const box: number[] = [];
    for (let k = 0; k < 40; k++) box.push((10 * k) / 40, 0);
    for (let k = 0; k < 16; k++) box.push(10, (4 * k) / 16);
    for (let k = 0; k < 40; k++) box.push(10 - (10 * k) / 40, 4);
    for (let k = 0; k < 16; k++) box.push(0, 4 - (4 * k) / 16);
    expect(expectSameSet(box)).toBe(0);
    expect(expectSameSet(box, true)).toBe(0);
    // A pocket in the roof and a fin on the floor: their six edges block, the rest do not.
    const pocket = [0, 0, 3, 0, 3, 1, 3.5, 1, 3.5, 0, 10, 0, 10, 4, 6, 4, 6, 3, 5, 3, 5, 4, 0, 4];
    expect(expectSameSet(pocket)).toBe(6);
    expect(expectSameSet(pocket, true)).toBe(6);
  });

  it('random star-shaped and zigzag enclosures (seeded), and the hard scenes of the bench', () => {
    const rand = mulberry32(11);
    for (let s = 0; s < 60; s++) {
      const n = 3 + Math.floor(120 * rand());
      const pts: number[] = [];
      for (let k = 0; k < n; k++) {
        const r = rand() < 0.5 ? 5 : 2 + 3 * rand(); // some corners on the circle, some inside
        pts.push(r * Math.cos((2 * Math.PI * k) / n), r * Math.sin((2 * Math.PI * k) / n));
      }
      expectSameSet(pts, s % 2 === 1);
    }
    for (const target of [200, 900]) {
      const enclosure = Array.from(hardScene(13, target).polygons[0].points);
      expect(expectSameSet(enclosure)).toBeGreaterThan(10);
    }
  });

  it('an enclosure with no area (all corners on one line): no edge blocks, as the definition says', () => {
    expect(expectSameSet([0, 0, 1, 0, 3, 0, 2, 0])).toBe(0);
  });

  it('grid corners: collinear runs, corners in line with hull sides, repeated corners', () => {
    const rand = mulberry32(5);
    for (let s = 0; s < 40; s++) {
      // A staircase polygon on integer points: runs along the hull sides and notches.
      const w = 3 + Math.floor(8 * rand()),
        h = 3 + Math.floor(6 * rand());
      const pts: number[] = [0, 0];
      for (let x = 1; x <= w; x++) pts.push(x, rand() < 0.3 ? 1 : 0);
      for (let y = 1; y <= h; y++) pts.push(w, y);
      for (let x = w - 1; x >= 0; x--) pts.push(x, rand() < 0.3 ? h - 1 : h);
      for (let y = h - 1; y >= 1; y--) pts.push(0, y);
      expectSameSet(pts, s % 2 === 0);
    }
  });
});
