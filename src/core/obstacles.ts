import Flatbush from 'flatbush';
import type { EdgeSet } from './edges';
import { orient } from './orient';
import { RegionTree } from './pair/regionTree';
import { pointInPolygon } from './pointInPolygon';
import { blockingWallEdges, convexHull } from './polygonHull';
import { closestFraction } from './segmentPoint';

/**
 * Where to look for edges that may block a view, built once per sketch.
 * - Bodies (solids) are culled whole by a bounding circle before their edges are looked at.
 * - Edges of the enclosure's convex hull cannot block anything: the whole enclosure lies
 *   on their radiating side, so no sight line inside it can cross them. Only the other
 *   wall edges (those of re-entrant pockets) are indexed, by flatbush.
 * Coordinates are those of the EdgeSet (sketch units, shifted origin).
 */
export interface ObstacleIndex {
  /** Number of bodies and, per body, its edge range and bounding circle. */
  bodyCount: number;
  bodyFirstEdge: Int32Array;
  bodyEdgeEnd: Int32Array;
  bodyCx: Float64Array;
  bodyCy: Float64Array;
  bodyR: Float64Array;
  /** 1 when the body is convex: then, lying wholly in a view region, only its silhouette corners matter. */
  bodyConvex: Uint8Array;
  /**
   * For convex bodies: corners in walk order (edge ids whose start is the corner,
   * following nextEdge) from bodyFirstEdge, with their polar angles about the circle's
   * centre (the corner average, inside a convex body), decreasing along the walk and
   * unwrapped over one turn; and the smallest corner distance from that centre.
   */
  walkEdge: Int32Array;
  walkAngle: Float64Array;
  bodyRMin: Float64Array;
  /**
   * Radius of a disc about the centre that lies inside the body (sketch units): for a
   * convex body the largest; for another body whose centre lies inside it, the
   * distance from the centre to its nearest edge; 0 when the centre lies outside.
   */
  bodyRIn: Float64Array;
  /**
   * The same for the body's convex hull, when no edge of another polygon enters the
   * hull: a segment with both ends outside the hull that passes through its interior
   * then meets the body (entering a notch under a hull side, it can leave only across
   * the body's boundary), so for views between other polygons' edges the body blocks
   * what its hull blocks. Equal to bodyRIn for convex bodies and where another polygon
   * enters the hull.
   */
  bodyRHull: Float64Array;
  /**
   * Corners (flat x, y) of a convex polygon that blocks every view between edges of
   * other polygons that the body blocks: body b's are bodyHullXY[2 bodyHullStart[b] ..
   * 2 bodyHullStart[b + 1]). A convex body's own corners; another body's convex hull
   * when no edge of another polygon enters it (see bodyRHull); none otherwise.
   */
  bodyHullStart: Int32Array;
  bodyHullXY: Float64Array;
  /** Body index of each polygon, -1 for the enclosure. */
  bodyOfPolygon: Int32Array;
  /** Body bounding boxes, searched by view region, when there are many bodies; null means test them all. */
  bodyTree: RegionTree | null;
  /** Wall edges that can block (not on the enclosure's convex hull), and their index. */
  wallEdges: Int32Array;
  wallTree: RegionTree;
}

const MANY_BODIES = 48;

/** Build the obstacle index of an oriented edge set. */
export function buildObstacleIndex(edges: EdgeSet): ObstacleIndex {
  const P = edges.polygonIsEnclosure.length;
  const start = edges.polygonStart;

  const bodies: number[] = [];
  const walls: number[] = [];
  for (let p = 0; p < P; p++) {
    if (!edges.polygonIsEnclosure[p]) bodies.push(p);
    else for (const e of blockingWallEdges(edges, start[p], start[p + 1])) walls.push(e);
  }

  const B = bodies.length;
  const bodyOfPolygon = new Int32Array(P).fill(-1);
  bodies.forEach((p, b) => {
    bodyOfPolygon[p] = b;
  });
  const bodyFirstEdge = new Int32Array(B),
    bodyEdgeEnd = new Int32Array(B);
  const bodyCx = new Float64Array(B),
    bodyCy = new Float64Array(B),
    bodyR = new Float64Array(B);
  const bodyConvex = new Uint8Array(B);
  const bodyRMin = new Float64Array(B);
  const bodyRIn = new Float64Array(B);
  const bodyRHull = new Float64Array(B);
  const walkEdge = new Int32Array(edges.count);
  const walkAngle = new Float64Array(edges.count);
  const bodyBox = new Float64Array(4 * B);
  const bodyHullStart = new Int32Array(B + 1);
  const hullXY: number[] = [];
  let allEdges: Flatbush | null = null;
  bodies.forEach((p, b) => {
    bodyFirstEdge[b] = start[p];
    bodyEdgeEnd[b] = start[p + 1];
    let x0 = Infinity,
      y0 = Infinity,
      x1 = -Infinity,
      y1 = -Infinity;
    for (let e = start[p]; e < start[p + 1]; e++) {
      x0 = Math.min(x0, edges.ax[e]);
      x1 = Math.max(x1, edges.ax[e]);
      y0 = Math.min(y0, edges.ay[e]);
      y1 = Math.max(y1, edges.ay[e]);
    }
    // Centre: the corner average, which lies inside a convex body (needed for angles).
    let cx = 0,
      cy = 0;
    for (let e = start[p]; e < start[p + 1]; e++) {
      cx += edges.ax[e];
      cy += edges.ay[e];
    }
    cx /= start[p + 1] - start[p];
    cy /= start[p + 1] - start[p];
    let r = 0,
      rMin = Infinity;
    for (let e = start[p]; e < start[p + 1]; e++) {
      const d = Math.hypot(edges.ax[e] - cx, edges.ay[e] - cy);
      r = Math.max(r, d);
      rMin = Math.min(rMin, d);
    }
    bodyCx[b] = cx;
    bodyCy[b] = cy;
    bodyR[b] = r;
    bodyRMin[b] = rMin;
    bodyConvex[b] = isConvex(edges, start[p], start[p + 1]) ? 1 : 0;
    if (bodyConvex[b]) {
      let rIn = Infinity;
      for (let e = start[p]; e < start[p + 1]; e++) {
        const dx = edges.bx[e] - edges.ax[e],
          dy = edges.by[e] - edges.ay[e];
        // The centre is inside, i.e. right of every edge: distance to the edge's line.
        rIn = Math.min(rIn, (dy * (cx - edges.ax[e]) - dx * (cy - edges.ay[e])) / edges.length[e]);
      }
      bodyRIn[b] = Math.max(0, rIn);
    } else {
      bodyRIn[b] = innerRadius(edges, start[p], start[p + 1], cx, cy);
    }
    const hull = convexHull(edges, start[p], start[p + 1]);
    let clean = true;
    if (!bodyConvex[b]) {
      allEdges ??= edgeBoxIndex(edges);
      clean = hullIsClean(edges, allEdges, p, hull);
      bodyRHull[b] = clean ? Math.max(bodyRIn[b], hullInRadius(hull, cx, cy)) : bodyRIn[b];
    } else bodyRHull[b] = bodyRIn[b];
    if (clean) for (const v of hull) hullXY.push(v);
    bodyHullStart[b + 1] = hullXY.length >> 1;
    if (bodyConvex[b]) {
      // Solids are walked clockwise, so the angle falls along the walk.
      let e = start[p];
      let previous = Math.atan2(edges.ay[e] - cy, edges.ax[e] - cx);
      for (let m = start[p]; m < start[p + 1]; m++) {
        let angle = Math.atan2(edges.ay[e] - cy, edges.ax[e] - cx);
        while (angle > previous) angle -= 2 * Math.PI;
        walkEdge[m] = e;
        walkAngle[m] = angle;
        previous = angle;
        e = edges.nextEdge[e];
      }
    }
    bodyBox.set([x0, y0, x1, y1], 4 * b);
  });
  // A few bodies are cheaper to test in turn than to search (measured by `npm run bench`).
  const bodyTree = B > MANY_BODIES ? new RegionTree(bodyBox) : null;

  const wallEdges = Int32Array.from(walls);
  const wallBox = new Float64Array(4 * walls.length);
  walls.forEach((e, w) => {
    wallBox.set(
      [
        Math.min(edges.ax[e], edges.bx[e]),
        Math.min(edges.ay[e], edges.by[e]),
        Math.max(edges.ax[e], edges.bx[e]),
        Math.max(edges.ay[e], edges.by[e]),
      ],
      4 * w,
    );
  });
  const wallTree = new RegionTree(wallBox);
  return {
    bodyCount: B,
    bodyFirstEdge,
    bodyEdgeEnd,
    bodyCx,
    bodyCy,
    bodyR,
    bodyConvex,
    walkEdge,
    walkAngle,
    bodyRMin,
    bodyRIn,
    bodyRHull,
    bodyHullStart,
    bodyHullXY: Float64Array.from(hullXY),
    bodyOfPolygon,
    bodyTree,
    wallEdges,
    wallTree,
  };
}

/**
 * May no edge of another polygon enter the convex hull `hull` of polygon p (see
 * bodyRHull)? Exact separation tests; false in doubt.
 */
function hullIsClean(edges: EdgeSet, index: Flatbush, p: number, hull: number[]): boolean {
  let x0 = Infinity,
    y0 = Infinity,
    x1 = -Infinity,
    y1 = -Infinity;
  for (let k = 0; k < hull.length; k += 2) {
    x0 = Math.min(x0, hull[k]);
    x1 = Math.max(x1, hull[k]);
    y0 = Math.min(y0, hull[k + 1]);
    y1 = Math.max(y1, hull[k + 1]);
  }
  for (const e of index.search(x0, y0, x1, y1)) {
    if (edges.polygon[e] !== p && !segmentMissesHull(hull, edges.ax[e], edges.ay[e], edges.bx[e], edges.by[e]))
      return false;
  }
  return true;
}

/** Distance from (cx, cy), inside the anticlockwise convex hull `hull`, to its nearest side (sketch units). */
function hullInRadius(hull: number[], cx: number, cy: number): number {
  const m = hull.length >> 1;
  let r = Infinity;
  for (let k = 0; k < m; k++) {
    const hx = hull[2 * k],
      hy = hull[2 * k + 1];
    const dx = hull[(2 * k + 2) % (2 * m)] - hx,
      dy = hull[(2 * k + 3) % (2 * m)] - hy;
    // The hull runs anticlockwise and (cx, cy), the corner average, lies inside: left of every side.
    r = Math.min(r, (dx * (cy - hy) - dy * (cx - hx)) / Math.hypot(dx, dy));
  }
  return r;
}

/** A box index of every edge (built once, for hullRadius). */
function edgeBoxIndex(edges: EdgeSet): Flatbush {
  const index = new Flatbush(Math.max(1, edges.count));
  for (let e = 0; e < edges.count; e++) {
    const ax = edges.ax[e],
      ay = edges.ay[e],
      bx = edges.bx[e],
      by = edges.by[e];
    index.add(Math.min(ax, bx), Math.min(ay, by), Math.max(ax, bx), Math.max(ay, by));
  }
  if (edges.count === 0) index.add(0, 0, 0, 0);
  index.finish();
  return index;
}

/**
 * True when segment a-b surely stays out of the open interior of the convex polygon
 * `hull` (flat x, y, anticlockwise): both ends on or outside one side, or every hull
 * corner on one closed side of the segment's line (exact signs).
 */
function segmentMissesHull(hull: number[], ax: number, ay: number, bx: number, by: number): boolean {
  const n = hull.length;
  let left = false,
    right = false;
  for (let k = 0; k < n; k += 2) {
    const hx = hull[k],
      hy = hull[k + 1],
      nx = hull[(k + 2) % n],
      ny = hull[(k + 3) % n];
    if (orient(hx, hy, nx, ny, ax, ay) <= 0 && orient(hx, hy, nx, ny, bx, by) <= 0) return true;
    const s = orient(ax, ay, bx, by, hx, hy);
    if (s > 0) left = true;
    else if (s < 0) right = true;
  }
  return !(left && right);
}

/** Distance (sketch units) from (cx, cy) to the nearest edge of [from, to); 0 when the point is not inside the polygon. */
function innerRadius(edges: EdgeSet, from: number, to: number, cx: number, cy: number): number {
  const flat: number[] = [];
  for (let e = from; e < to; e++) flat.push(edges.ax[e], edges.ay[e]);
  if (!pointInPolygon(cx, cy, flat)) return 0;
  let r = Infinity;
  for (let e = from; e < to; e++) {
    const x0 = edges.ax[e],
      y0 = edges.ay[e];
    const dx = edges.bx[e] - x0,
      dy = edges.by[e] - y0;
    const t = closestFraction(cx, cy, x0, y0, edges.bx[e], edges.by[e]);
    r = Math.min(r, Math.hypot(cx - x0 - t * dx, cy - y0 - t * dy));
  }
  return r;
}

/** A solid's oriented edges (outside on the left, so walked clockwise) never turn left. */
function isConvex(edges: EdgeSet, from: number, to: number): boolean {
  for (let e = from; e < to; e++) {
    const n = edges.nextEdge[e];
    if (orient(edges.ax[e], edges.ay[e], edges.bx[e], edges.by[e], edges.bx[n], edges.by[n]) > 0) return false;
  }
  return true;
}
