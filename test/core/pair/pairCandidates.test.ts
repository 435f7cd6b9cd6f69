import { orient2d } from 'robust-predicates';
import { describe, expect, it } from 'vitest';
import { buildEdges, type EdgeSet } from '../../../src/core/edges';
import { buildObstacleIndex } from '../../../src/core/obstacles';
import { edgeGroups } from '../../../src/core/pair/edgeGroups';
import { PairCandidates } from '../../../src/core/pair/pairCandidates';
import { hardScene } from '../../bench/hardScenes';
import { tubeScene } from '../../bench/scenes';
import type { SceneInput } from '../../../src/core/scene';
import { seeded } from '../seeded';

// The obstacle lists shared by a row's pairs with one body must hold every body and
// blocking wall edge that enters the hull of the pair's two edges (the view region lies
// in it). Checked against an independent exact test (robust-predicates' orient2d, no
// code of src/core): a segment meets a convex polygon when a corner lies inside or it
// crosses a side. Scenes: 20 tubes (bodies tested in turn) and the hard class (bodies
// from the region tree, walls of re-entrant pockets, wall-to-wall pairs).

type Pt = [number, number];

/** Convex hull (anticlockwise, no collinear corners) by the monotone chain, exact turns. */
function hull(points: Pt[]): Pt[] {
  const p = [...points].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  const turn = (o: Pt, a: Pt, b: Pt) => -orient2d(o[0], o[1], a[0], a[1], b[0], b[1]); // > 0: anticlockwise
  const half = (list: Pt[]) => {
    const out: Pt[] = [];
    for (const q of list) {
      while (out.length >= 2 && turn(out[out.length - 2], out[out.length - 1], q) <= 0) out.pop();
      out.push(q);
    }
    out.pop();
    return out;
  };
  return [...half(p), ...half([...p].reverse())];
}

/** Does segment a-b meet the closed convex polygon H (anticlockwise, at least 3 corners)? */
function segmentMeetsPolygon(a: Pt, b: Pt, H: Pt[]): boolean {
  const inside = (q: Pt) =>
    H.every((s, k) => {
      const e = H[(k + 1) % H.length];
      return -orient2d(s[0], s[1], e[0], e[1], q[0], q[1]) >= 0;
    });
  if (inside(a) || inside(b)) return true;
  for (let k = 0; k < H.length; k++) {
    const s = H[k],
      e = H[(k + 1) % H.length];
    const d1 = orient2d(s[0], s[1], e[0], e[1], a[0], a[1]),
      d2 = orient2d(s[0], s[1], e[0], e[1], b[0], b[1]),
      d3 = orient2d(a[0], a[1], b[0], b[1], s[0], s[1]),
      d4 = orient2d(a[0], a[1], b[0], b[1], e[0], e[1]);
    if (d1 === 0 && d2 === 0) {
      // Collinear: they meet only where their extents along the line overlap.
      const lo = (u: Pt, v: Pt, k: 0 | 1) => Math.min(u[k], v[k]),
        hi = (u: Pt, v: Pt, k: 0 | 1) => Math.max(u[k], v[k]);
      const k = s[0] === e[0] ? 1 : 0;
      if (lo(a, b, k) <= hi(s, e, k) && lo(s, e, k) <= hi(a, b, k)) return true;
      continue;
    }
    if (d1 * d2 <= 0 && d3 * d4 <= 0) return true;
  }
  return false;
}

/** Largest coordinate magnitude, as the pair integrator gives its view region. */
const extentOf = (E: EdgeSet) => Math.max(...E.ax.map(Math.abs), ...E.ay.map(Math.abs));

const ends = (E: EdgeSet, e: number): [Pt, Pt] => [
  [E.ax[e], E.ay[e]],
  [E.bx[e], E.by[e]],
];

function checkScene(scene: SceneInput, samples: number, seed: number) {
  const E = buildEdges(scene.polygons, scene.circles);
  const ob = buildObstacleIndex(E);
  const lists = new PairCandidates(E, ob, extentOf(E), edgeGroups(E, ob));
  const rand = seeded(seed);
  let hits = 0;
  // Random pairs taken in the order the rows are filled (row edge, then partner), so
  // lists are reused across the rows of one group as in a full computation.
  const pairs = Array.from({ length: samples }, () => {
    const i = Math.floor(rand() * (E.count - 1));
    return [i, i + 1 + Math.floor(rand() * (E.count - 1 - i))];
  }).sort((p, q) => p[0] - q[0] || p[1] - q[1]);
  for (const [i, j] of pairs) {
    lists.find(j, i); // either order names the same row
    const bodies = new Set(Array.from(lists.bodies.subarray(lists.bodyStart, lists.bodyEnd)));
    const walls = new Set(Array.from(lists.walls.subarray(lists.wallStart, lists.wallEnd)));
    const H = hull([...ends(E, i), ...ends(E, j)]);
    if (H.length < 3) continue;
    for (let b = 0; b < ob.bodyCount; b++) {
      let meets = false;
      for (let e = ob.bodyFirstEdge[b]; e < ob.bodyEdgeEnd[b] && !meets; e++)
        meets = segmentMeetsPolygon(...ends(E, e), H);
      if (meets) hits++;
      if (meets && !bodies.has(b)) throw new Error(`pair ${i}, ${j}: body ${b} enters the hull but is not listed`);
    }
    for (let w = 0; w < ob.wallEdges.length; w++) {
      if (segmentMeetsPolygon(...ends(E, ob.wallEdges[w]), H) && !walls.has(w))
        throw new Error(`pair ${i}, ${j}: wall edge ${ob.wallEdges[w]} enters the hull but is not listed`);
    }
  }
  return { hits, tree: ob.bodyTree !== null, walls: ob.wallEdges.length };
}

describe('obstacle lists shared by a row', () => {
  it('hold every body that enters the pair hull, bodies tested in turn (20 tubes)', () => {
    const r = checkScene(tubeScene(3, 20, 12, 40), 4000, 11);
    expect(r.tree).toBe(false);
    expect(r.hits).toBeGreaterThan(1000); // bodies do enter hulls: the check is not empty
  });

  it('hold every body and wall edge that enters the pair hull, from the region tree (hard scene)', () => {
    const r = checkScene(hardScene(5, 600), 4000, 12);
    expect(r.tree).toBe(true);
    expect(r.walls).toBeGreaterThan(50);
    expect(r.hits).toBeGreaterThan(1000);
  });

  it('list pairs of two wall edges too (runs of enclosure edges), and either order names one row', () => {
    const scene = hardScene(5, 600);
    const E = buildEdges(scene.polygons, scene.circles);
    const ob = buildObstacleIndex(E);
    const lists = new PairCandidates(E, ob, extentOf(E), edgeGroups(E, ob));
    // Edges 0 on are the enclosure's: a wall-to-wall pair.
    lists.find(3, 40);
    const walls = Array.from(lists.walls.subarray(lists.wallStart, lists.wallEnd));
    lists.find(40, 3);
    expect(Array.from(lists.walls.subarray(lists.wallStart, lists.wallEnd))).toEqual(walls);
  });
});
