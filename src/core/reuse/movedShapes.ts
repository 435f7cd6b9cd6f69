// Pairs an edit leaves alone. A pair's exchange length depends on its two edges,
// on what lies in their convex hull (every sight line between them stays inside
// it), on each blocking body's own numbers (its bounding and inner circles) and on
// two sketch-wide numbers (the origin and the extent that scales float margins).
// So after an edit that moves some solids or circles, say a tube dragged across a
// furnace, a pair needs computing again only when one of its edges belongs to a
// moved shape, or a moved shape may enter its hull before or after the edit. Every
// other pair keeps its number from the previous answer, the same bits a full
// computation gives (the tests compare them over random edits).
import { extentWithCircles, sketchExtent, totalEdgeCount, type EdgeSet } from '../edges';
import type { ObstacleIndex } from '../obstacles';
import type { EdgePairs } from '../pairRows';
import { Curve } from '../arc/curve';
import { convexHull, discMeetsHull } from '../arc/pairScene';
import { beyondHullSide } from './hullSides';
import { separatingArcs } from './separatingArcs';

/**
 * Slack on a moved shape's disc, relative to the sizes involved: far above every
 * float margin of the pair integrators (at most 1e-9 of a size, 1e-12 of the
 * extent), so a shape they might still count as near is counted here too.
 */
const RELATIVE_SLACK = 1e-6;

/** The shapes that moved between two sketches with the same shapes, and the pairs they may change. */
export class MovedShapes {
  /** 1 for every edge (polygon edges, then arcs) of a moved shape. */
  readonly movedEdge: Uint8Array;
  /** Discs that hold a moved shape before or after the edit: x, y, radius (sketch units), slack included. */
  readonly discs: Float64Array;
  readonly discCount: number;
  /** Per disc d and straight edge e (at d x edges + e): the directions separating e from the disc (separatingArcs.ts). */
  private readonly mid: Float64Array;
  private readonly half: Float64Array;
  /**
   * With exact circles, a pair is kept only when each disc is beyond a side of its
   * hull: the circle integrator calls a shape near a pair unless it is.
   */
  private readonly sidesOnly: boolean;
  /** Scratch for beyondHullSide (straight pairs, no allocation): four corners, a disc, the sketch's size. */
  private readonly corners = new Float64Array(12);
  private readonly size: number;
  /** Scratch for pairs with an arc: both curves, their outer points and hull (as the circle integrator takes them). */
  private readonly curveA = new Curve();
  private readonly curveB = new Curve();
  private readonly outer: number[] = [];
  private readonly hull: number[] = [];

  private constructor(
    private readonly E: EdgeSet,
    movedEdge: Uint8Array,
    discs: number[],
  ) {
    this.movedEdge = movedEdge;
    this.sidesOnly = E.arcs.circleCount > 0;
    this.size = sketchExtent(E);
    this.discs = Float64Array.from(discs);
    this.discCount = discs.length / 3;
    this.mid = new Float64Array(this.discCount * E.count);
    this.half = new Float64Array(this.discCount * E.count);
    for (let d = 0; d < this.discCount; d++) {
      const D = this.discs;
      separatingArcs(E, D[3 * d], D[3 * d + 1], D[3 * d + 2], this.mid, this.half, d * E.count);
    }
  }

  /**
   * What moved from `before` to `after` (each sketch's pair integrators), or null
   * when no pair can be kept: other shapes or edge counts, another origin or extent,
   * or a moved enclosure (every view lies inside it). Also null when more than
   * `maxMovedShare` of the edges moved: then computing every pair costs little more.
   */
  static between(before: EdgePairs, after: EdgePairs, maxMovedShare = 0.5): MovedShapes | null {
    const A = before.edges,
      B = after.edges;
    if (!sameShapes(A, B)) return null;
    if (A.originX !== B.originX || A.originY !== B.originY) return null;
    const extent = sketchExtent(B);
    if (sketchExtent(A) !== extent) return null;
    // The exact circles' margins scale with the circles' rims too (arc/discShadow.ts).
    if (extentWithCircles(A) !== extentWithCircles(B)) return null;
    const moved = new Uint8Array(totalEdgeCount(B));
    const discs: number[] = [];
    const slack = RELATIVE_SLACK * extent;
    const P = B.polygonIsEnclosure.length;
    for (let p = 0; p < P; p++) {
      const from = B.polygonStart[p],
        to = B.polygonStart[p + 1];
      const b = after.obstacles.bodyOfPolygon[p];
      if (!edgesMoved(A, B, from, to) && (b < 0 || sameBody(before.obstacles, after.obstacles, b))) continue;
      if (B.polygonIsEnclosure[p]) return null;
      moved.fill(1, from, to);
      // The body's bounding circle (about its corner average) before and after.
      for (const ob of [before.obstacles, after.obstacles]) {
        const r = ob.bodyR[b];
        discs.push(ob.bodyCx[b], ob.bodyCy[b], r + RELATIVE_SLACK * r + slack);
      }
    }
    const a = A.arcs,
      c = B.arcs;
    for (let k = 0; k < c.circleCount; k++) {
      if (a.cx[k] === c.cx[k] && a.cy[k] === c.cy[k] && a.r[k] === c.r[k]) continue;
      if (c.circleIsEnclosure[k]) return null;
      for (let e = 0; e < c.count; e++) if (c.circle[e] === k) moved[B.count + e] = 1;
      discs.push(a.cx[k], a.cy[k], a.r[k] * (1 + RELATIVE_SLACK) + slack);
      discs.push(c.cx[k], c.cy[k], c.r[k] * (1 + RELATIVE_SLACK) + slack);
    }
    let count = 0;
    for (let e = 0; e < moved.length; e++) count += moved[e];
    if (count > maxMovedShare * moved.length) return null;
    return new MovedShapes(B, moved, discs);
  }

  /**
   * Mark the pairs (i, j), j = i .. edges - 1, that may differ from the earlier
   * sketch: flags[j] = 1 (else 0). `flags` has one entry per edge.
   */
  markRow(i: number, flags: Uint8Array): void {
    const N = flags.length,
      moved = this.movedEdge;
    if (moved[i]) {
      flags.fill(1, i, N);
      return;
    }
    for (let j = i; j < N; j++) flags[j] = moved[j];
    const E = this.E,
      n = E.count;
    // Arcs exist only with exact circles: an arc's pairs are judged as the circle integrator judges them.
    if (i >= n) {
      for (let j = i; j < N; j++) if (!flags[j] && !this.clearOfArcPair(i, j)) flags[j] = 1;
      return;
    }
    const mid = this.mid,
      half = this.half;
    for (let d = 0; d < this.discCount; d++) {
      const at = d * n;
      const mi = mid[at + i],
        hi = half[at + i];
      if (hi < 0) {
        flags.fill(1, i, N);
        return;
      }
      // The pair's hull misses the disc when a direction separates both edges from it;
      // with exact circles the disc must also lie beyond one side of the hull.
      for (let j = i; j < n; j++) {
        if (flags[j]) continue;
        const hj = half[at + j];
        let gap = Math.abs(mi - mid[at + j]);
        if (gap > Math.PI) gap = 2 * Math.PI - gap;
        if (hj < 0 || gap > hi + hj) flags[j] = 1;
        else if (this.sidesOnly && !this.beyondSide(d, i, j)) flags[j] = 1;
      }
    }
    for (let j = n; j < N; j++) if (!flags[j] && !this.clearOfArcPair(i, j)) flags[j] = 1;
  }

  /**
   * Every disc lies beyond a side of the hull of the outer points of edges i and j,
   * one of them an arc: the circle integrator's own hull (Curve.outerPoints, then
   * convexHull) and side test (discMeetsHull), with the discs' wider radius. Pairs
   * of straight edges take beyondHullSide, the same test without building a hull
   * (building one allocates, which made a drag step several times slower).
   */
  private clearOfArcPair(i: number, j: number): boolean {
    if (this.discCount === 0) return true;
    const out = this.outer,
      H = this.hull,
      D = this.discs;
    out.length = 0;
    this.curveA.load(this.E, i);
    this.curveA.outerPoints(out);
    this.curveB.load(this.E, j);
    this.curveB.outerPoints(out);
    convexHull(out, H);
    for (let d = 0; d < D.length; d += 3) if (discMeetsHull(H, D[d], D[d + 1], D[d + 2])) return false;
    return true;
  }

  /** Disc d beyond a side of the hull of straight edges i and j (hullSides.ts). */
  private beyondSide(d: number, i: number, j: number): boolean {
    const E = this.E,
      D = this.discs,
      s = this.corners;
    s[0] = E.ax[i];
    s[1] = E.ay[i];
    s[2] = E.bx[i];
    s[3] = E.by[i];
    s[4] = E.ax[j];
    s[5] = E.ay[j];
    s[6] = E.bx[j];
    s[7] = E.by[j];
    s[8] = D[3 * d];
    s[9] = D[3 * d + 1];
    s[10] = D[3 * d + 2];
    s[11] = this.size;
    return beyondHullSide(s);
  }
}

/** Same polygons (kind and edge ranges) and same circles (kind and arc count) in the same order. */
function sameShapes(A: EdgeSet, B: EdgeSet): boolean {
  if (A.count !== B.count || A.arcs.count !== B.arcs.count || A.arcs.circleCount !== B.arcs.circleCount) return false;
  const P = B.polygonIsEnclosure.length;
  if (A.polygonIsEnclosure.length !== P) return false;
  for (let p = 0; p < P; p++) {
    if (A.polygonIsEnclosure[p] !== B.polygonIsEnclosure[p] || A.polygonStart[p + 1] !== B.polygonStart[p + 1])
      return false;
  }
  for (let k = 0; k < B.arcs.circleCount; k++)
    if (A.arcs.circleIsEnclosure[k] !== B.arcs.circleIsEnclosure[k]) return false;
  for (let e = 0; e < B.arcs.count; e++) if (A.arcs.circle[e] !== B.arcs.circle[e]) return false;
  return true;
}

/** True when any of the edges from..to-1 changed its ends or its walk (a polygon's winding flipped). */
function edgesMoved(A: EdgeSet, B: EdgeSet, from: number, to: number): boolean {
  for (let e = from; e < to; e++) {
    if (A.ax[e] !== B.ax[e] || A.ay[e] !== B.ay[e] || A.bx[e] !== B.bx[e] || A.by[e] !== B.by[e]) return true;
    if (A.nextEdge[e] !== B.nextEdge[e]) return true;
  }
  return false;
}

/**
 * Body b's own numbers are unchanged. Its hull circle, and whether its hull stands in
 * for it (bodyHullXY: kept or not), also depend on whether another polygon enters its
 * convex hull, so an unmoved body can change too.
 */
function sameBody(a: ObstacleIndex, c: ObstacleIndex, b: number): boolean {
  return (
    a.bodyCx[b] === c.bodyCx[b] &&
    a.bodyCy[b] === c.bodyCy[b] &&
    a.bodyR[b] === c.bodyR[b] &&
    a.bodyRMin[b] === c.bodyRMin[b] &&
    a.bodyRIn[b] === c.bodyRIn[b] &&
    a.bodyRHull[b] === c.bodyRHull[b] &&
    a.bodyConvex[b] === c.bodyConvex[b] &&
    a.bodyHullStart[b + 1] - a.bodyHullStart[b] === c.bodyHullStart[b + 1] - c.bodyHullStart[b]
  );
}
