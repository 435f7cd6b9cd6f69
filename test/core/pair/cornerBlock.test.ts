import { afterEach, describe, expect, it } from 'vitest';
import { buildEdges, sketchExtent, type EdgeSet } from '../../../src/core/edges';
import { buildObstacleIndex } from '../../../src/core/obstacles';
import { BodyClipper } from '../../../src/core/pair/bodyClip';
import { ObstaclePieces } from '../../../src/core/pair/obstaclePieces';
import { ViewRegion } from '../../../src/core/pair/viewRegion';
import { EdgePairs } from '../../../src/core/pairRows';
import { edgeViewFactors } from '../../../src/core/viewFactors';
import { hardScene } from '../../bench/hardScenes';
import { oracleRow, orientedSegments } from '../oracle';

// A body whose stand-in polygon (its own corners, or a star's hull with nothing inside
// it) surely crosses both side strings of a pair's view region ends the pair before any
// clipping (BodyClipper.polygonCutsView). Checked against sight lines cast one by one:
// whenever the test says a body blocks, every sampled line from i' to j' must cross the
// body's boundary. Plain float geometry here, no code shared with the test itself.

// The prototype's method, wrapped by the first test and put back after each.
const descriptor = Object.getOwnPropertyDescriptor(BodyClipper.prototype, 'polygonCutsView')!;
const original = descriptor.value as (this: BodyClipper, b: number) => boolean;
afterEach(() => {
  Object.defineProperty(BodyClipper.prototype, 'polygonCutsView', descriptor);
});

/** Do segments p-q and a-b cross properly (float signs, both strictly)? */
function crosses(px: number, py: number, qx: number, qy: number, ax: number, ay: number, bx: number, by: number) {
  const side = (x0: number, y0: number, x1: number, y1: number, x: number, y: number) =>
    (x1 - x0) * (y - y0) - (y1 - y0) * (x - x0);
  const d1 = side(px, py, qx, qy, ax, ay),
    d2 = side(px, py, qx, qy, bx, by),
    d3 = side(ax, ay, bx, by, px, py),
    d4 = side(ax, ay, bx, by, qx, qy);
  return d1 * d2 < 0 && d3 * d4 < 0;
}

/** Does the segment p-q cross an edge of body polygon `poly` (edges [from, to) of E)? */
function meetsBody(E: EdgeSet, from: number, to: number, px: number, py: number, qx: number, qy: number) {
  for (let e = from; e < to; e++) if (crosses(px, py, qx, qy, E.ax[e], E.ay[e], E.bx[e], E.by[e])) return true;
  return false;
}

describe('a body that crosses both side strings blocks the pair (polygonCutsView)', () => {
  it('every sampled sight line of a pair it ends meets the body (seeded hard scenes: squashed bodies and stars)', () => {
    let checked = 0;
    for (const seed of [3, 5, 8]) {
      const scene = hardScene(seed, 320, { bodies: 14 });
      const E = buildEdges(scene.polygons);
      const pairs = new EdgePairs(E);
      const ob = pairs.obstacles;
      BodyClipper.prototype.polygonCutsView = function (this: BodyClipper, b: number): boolean {
        const blocked = original.call(this, b);
        if (!blocked) return false;
        // The pair's trimmed ends are the view region's sides 0 (i') and 2 (j').
        const R = (
          this as unknown as { region: { sx: Float64Array; sy: Float64Array; ex: Float64Array; ey: Float64Array } }
        ).region;
        const n = 9;
        for (let a = 0; a < n; a++) {
          const s = (a + 0.5) / n;
          const px = R.sx[0] + s * (R.ex[0] - R.sx[0]),
            py = R.sy[0] + s * (R.ey[0] - R.sy[0]);
          for (let c = 0; c < n; c++) {
            const t = (c + 0.5) / n;
            const qx = R.sx[2] + t * (R.ex[2] - R.sx[2]),
              qy = R.sy[2] + t * (R.ey[2] - R.sy[2]);
            expect(meetsBody(E, ob.bodyFirstEdge[b], ob.bodyEdgeEnd[b], px, py, qx, qy)).toBe(true);
          }
        }
        checked++;
        return true;
      };
      for (let i = 0; i < pairs.count; i++) for (let j = i + 1; j < pairs.count; j++) pairs.pairExchange(i, j);
    }
    // Not vacuous: the test ends many pairs in these scenes.
    expect(checked).toBeGreaterThan(200);
  });

  it('stands in a star by its hull only while nothing else enters the hull', () => {
    const star = (cx: number, cy: number) =>
      Array.from({ length: 10 }, (_, k) => {
        const a = (Math.PI * k) / 5,
          r = k % 2 === 0 ? 1.5 : 0.5;
        return [cx + r * Math.cos(a), cy + r * Math.sin(a)];
      }).flat();
    const box = [0, 0, 10, 0, 10, 6, 0, 6];
    const clear = buildEdges([
      { kind: 'enclosure', points: box },
      { kind: 'solid', points: star(5, 3) },
    ]);
    // A small square in a notch of the star (between the tips at 0 and 72 degrees).
    const notch = [6.0, 3.5, 6.2, 3.5, 6.2, 3.7, 6.0, 3.7];
    const crowded = buildEdges([
      { kind: 'enclosure', points: box },
      { kind: 'solid', points: star(5, 3) },
      { kind: 'solid', points: notch },
    ]);
    const a = new EdgePairs(clear).obstacles,
      b = new EdgePairs(crowded).obstacles;
    expect(a.bodyHullStart[1] - a.bodyHullStart[0]).toBe(5); // the five tips
    expect(b.bodyHullStart[1] - b.bodyHullStart[0]).toBe(0);
  });

  it('a bar across one string whose line it meets only beyond j is no block: the factor stays as the ray-cast reference has it', () => {
    // Floor edge i = (0,0)-(4,0) looks up at the bottom of a small square, j from
    // (2.2,3) to (2,3); their view region's strings run a1 (4,0) -> b0 (2.2,3) and
    // b1 (2,3) -> a0 (0,0). A thin bar from (0.8,1) to (2,5) crosses the second string
    // and meets the first one's line only past b0 (at y = 3.9), outside the region:
    // it hides the left of the view, not all of it.
    const bar = (x0: number, y0: number, x1: number, y1: number, w: number) => {
      const dx = x1 - x0,
        dy = y1 - y0,
        l = Math.hypot(dx, dy);
      const nx = (-dy / l) * w,
        ny = (dx / l) * w;
      return [x0 - nx, y0 - ny, x1 - nx, y1 - ny, x1 + nx, y1 + ny, x0 + nx, y0 + ny];
    };
    const polygons = [
      { kind: 'enclosure' as const, points: [0, 0, 4, 0, 10, 0, 10, 8, 0, 8] },
      { kind: 'solid' as const, points: [2, 3, 2.2, 3, 2.2, 3.2, 2, 3.2] },
      { kind: 'solid' as const, points: bar(0.8, 1, 2, 5, 0.05) },
    ];
    const E = buildEdges(polygons);
    const ob = buildObstacleIndex(E);
    const region = new ViewRegion(sketchExtent(E));
    const clip = new BodyClipper(E, ob, region, new ObstaclePieces(E.count));
    // The square's bottom edge, b0 = (2.2, 3) and b1 = (2, 3) as the region wants them.
    const j = [...Array(E.count).keys()].find((e) => E.ay[e] === 3 && E.by[e] === 3 && E.ax[e] === 2.2)!;
    expect(E.bx[j]).toBe(2);
    clip.begin(0, j);
    region.set(Float64Array.from([0, 0, 4, 0, 2.2, 3, 2, 3]));
    expect(clip.polygonCutsView(ob.bodyOfPolygon[2])).toBe(false);
    // The same bar turned to cross both strings inside the region does block.
    const across = buildEdges([polygons[0], polygons[1], { kind: 'solid', points: bar(0.3, 1.2, 3.5, 1.4, 0.05) }]);
    const ob2 = buildObstacleIndex(across);
    const region2 = new ViewRegion(sketchExtent(across));
    const clip2 = new BodyClipper(across, ob2, region2, new ObstaclePieces(across.count));
    clip2.begin(0, j);
    region2.set(Float64Array.from([0, 0, 4, 0, 2.2, 3, 2, 3]));
    expect(clip2.polygonCutsView(ob2.bodyOfPolygon[2])).toBe(true);
    // And the whole computation agrees with the reference on the floor edge's row.
    const F = edgeViewFactors(E);
    const segs = orientedSegments([
      {
        kind: 'enclosure',
        points: [
          [0, 0],
          [4, 0],
          [10, 0],
          [10, 8],
          [0, 8],
        ],
      },
      {
        kind: 'solid',
        points: [
          [2, 3],
          [2.2, 3],
          [2.2, 3.2],
          [2, 3.2],
        ],
      },
      { kind: 'solid', points: [0, 2, 4, 6].map((k) => bar(0.8, 1, 2, 5, 0.05).slice(k, k + 2)) },
    ]);
    const ref = oracleRow(segs, 0);
    expect(F[j]).toBeGreaterThan(1e-3);
    for (let k = 0; k < E.count; k++) expect(Math.abs(F[k] - ref[k])).toBeLessThan(1e-9);
  });
});
