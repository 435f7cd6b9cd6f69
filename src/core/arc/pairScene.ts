import type { EdgeSet } from '../edges';
import type { ObstacleIndex } from '../obstacles';
import type { Curve } from './curve';

// Lengths: Math.sqrt of the sum of squares, not Math.hypot (see tangents.ts).

// What can block the view between two curves (segments or arcs): every solid
// circle and every polygon edge that may enter a convex outer bound of the region
// the sight lines sweep (the hull of both curves' outer polygons). Taking too much
// costs time only: the visibility test casts rays and takes the nearest hit.
// Sketch units.

export class PairScene {
  /** Blocking segments x0, y0, x1, y1 (flat, 4 per segment). */
  seg: number[] = [];
  /** Solid circles that may block (circle indices). */
  circles: number[] = [];
  /** Circles whose tangents bound views: the blockers, then the target's own circle if it is a solid. */
  tangentCircles: number[] = [];
  /** Fixed points (flat x, y): ends of blocking segments and of the target. */
  pts: number[] = [];
  /** The convex outer bound of the pair's sight lines (flat x, y, anticlockwise): the hull of both curves' outer polygons. */
  readonly hull: number[] = [];
  private kept: number[] = [];
  private outer: number[] = [];
  private readonly stamp: Int32Array;
  private pass = 0;

  constructor(
    private readonly E: EdgeSet,
    private readonly ob: ObstacleIndex,
  ) {
    this.stamp = new Int32Array(E.count).fill(-1);
  }

  /** Collect the blockers of the pair (emitter edge i as `em`, target edge j as `tg`). */
  collect(em: Curve, i: number, tg: Curve, j: number): void {
    const E = this.E,
      ob = this.ob,
      A = E.arcs;
    this.seg.length = 0;
    this.circles.length = 0;
    this.pts.length = 0;
    this.outer.length = 0;
    em.outerPoints(this.outer);
    tg.outerPoints(this.outer);
    convexHull(this.outer, this.hull);
    const margin = 1e-9 * hullSize(this.hull);
    for (let c = 0; c < A.circleCount; c++) {
      if (A.circleIsEnclosure[c] || c === em.circle || c === tg.circle) continue;
      if (this.discMeets(A.cx[c], A.cy[c], A.r[c] + margin)) this.circles.push(c);
    }
    this.tangentCircles.length = 0;
    for (const c of this.circles) this.tangentCircles.push(c);
    if (tg.isArc && tg.solid) this.tangentCircles.push(tg.circle);
    const pass = ++this.pass;
    const kept = this.kept;
    kept.length = 0;
    const bodyI = i < E.count ? ob.bodyOfPolygon[E.polygon[i]] : -1;
    const bodyJ = j < E.count ? ob.bodyOfPolygon[E.polygon[j]] : -1;
    for (let b = 0; b < ob.bodyCount; b++) {
      // A convex body lies behind each of its own edges: it blocks no view from or to one.
      if (ob.bodyConvex[b] && (b === bodyI || b === bodyJ)) continue;
      if (!this.discMeets(ob.bodyCx[b], ob.bodyCy[b], ob.bodyR[b] + margin)) continue;
      for (let e = ob.bodyFirstEdge[b]; e < ob.bodyEdgeEnd[b]; e++) this.consider(e, i, j, margin, pass, kept);
    }
    for (let w = 0; w < ob.wallEdges.length; w++) this.consider(ob.wallEdges[w], i, j, margin, pass, kept);
    // One fixed point per corner: an edge's start, and its end where the next edge is not kept.
    for (const e of kept) {
      this.pts.push(E.ax[e], E.ay[e]);
      if (this.stamp[E.nextEdge[e]] !== pass) this.pts.push(E.bx[e], E.by[e]);
    }
    if (!tg.isArc || tg.span < 2 * Math.PI) this.pts.push(tg.ax, tg.ay, tg.bx, tg.by);
  }

  private consider(e: number, i: number, j: number, margin: number, pass: number, kept: number[]): void {
    if (e === i || e === j) return;
    const E = this.E;
    if (!this.segmentMeets(E.ax[e], E.ay[e], E.bx[e], E.by[e], margin)) return;
    this.stamp[e] = pass;
    kept.push(e);
    this.seg.push(E.ax[e], E.ay[e], E.bx[e], E.by[e]);
  }

  /** False only when the disc lies surely outside one side of the hull. */
  private discMeets(cx: number, cy: number, r: number): boolean {
    return discMeetsHull(this.hull, cx, cy, r);
  }

  /** False only when both ends lie surely outside one side of the hull. */
  private segmentMeets(x0: number, y0: number, x1: number, y1: number, margin: number): boolean {
    const H = this.hull,
      n = H.length >> 1;
    if (n < 3) return true;
    for (let k = 0; k < n; k++) {
      const m = k + 1 === n ? 0 : k + 1;
      const ex = H[2 * m] - H[2 * k],
        ey = H[2 * m + 1] - H[2 * k + 1];
      const inv = 1 / Math.sqrt(ex * ex + ey * ey);
      const d0 = (ex * (y0 - H[2 * k + 1]) - ey * (x0 - H[2 * k])) * inv;
      const d1 = (ex * (y1 - H[2 * k + 1]) - ey * (x1 - H[2 * k])) * inv;
      if (d0 < -margin && d1 < -margin) return false;
    }
    return true;
  }
}

/**
 * False only when the disc (cx, cy, r) lies surely outside one side of the convex
 * hull H (x, y pairs, as convexHull gives it; sketch units); true for a hull of
 * fewer than 3 points. The one test of "near a pair" for the exact-circle integrator.
 */
export function discMeetsHull(H: readonly number[], cx: number, cy: number, r: number): boolean {
  const n = H.length >> 1;
  if (n < 3) return true;
  for (let k = 0; k < n; k++) {
    const m = k + 1 === n ? 0 : k + 1;
    const ex = H[2 * m] - H[2 * k],
      ey = H[2 * m + 1] - H[2 * k + 1];
    const dist = (ex * (cy - H[2 * k + 1]) - ey * (cx - H[2 * k])) / Math.sqrt(ex * ex + ey * ey);
    if (dist < -r) return false;
  }
  return true;
}

// Scratch of convexHull, grown when too small: it runs once per pair of curves, and
// the arrays, comparator and closure it made each time were 7% of a tube bank's time
// in garbage collection.
let hullOrder = new Int32Array(32);
let hullChain = new Int32Array(66);

/** Convex hull (anticlockwise, flat x, y) of flat points `pts` into `out` (monotone chain, floats). */
export function convexHull(pts: number[], out: number[]): void {
  const n = pts.length >> 1;
  if (hullOrder.length < n) {
    hullOrder = new Int32Array(2 * n);
    hullChain = new Int32Array(4 * n + 2);
  }
  const order = hullOrder,
    chain = hullChain;
  // By x, then y; a stable insertion sort (the points are few): equal points keep their order.
  for (let k = 0; k < n; k++) {
    let m = k - 1;
    while (m >= 0 && after(pts, order[m], k)) {
      order[m + 1] = order[m];
      m--;
    }
    order[m + 1] = k;
  }
  let top = 0;
  for (let pass = 0; pass < 2; pass++) {
    const startLen = top;
    for (let q = 0; q < n; q++) {
      const k = pass === 0 ? order[q] : order[n - 1 - q];
      while (top - startLen >= 2 && cross(pts, chain[top - 2], chain[top - 1], k) <= 0) top--;
      chain[top++] = k;
    }
    top--;
  }
  out.length = 0;
  for (let c = 0; c < top; c++) out.push(pts[2 * chain[c]], pts[2 * chain[c] + 1]);
}

/** Does point a come after point b by x, then y? */
function after(pts: number[], a: number, b: number): boolean {
  const dx = pts[2 * a] - pts[2 * b];
  return dx > 0 || (dx === 0 && pts[2 * a + 1] - pts[2 * b + 1] > 0);
}

/** (a - o) x (b - o) for points o, a, b of flat `pts`. */
function cross(pts: number[], o: number, a: number, b: number): number {
  return (
    (pts[2 * a] - pts[2 * o]) * (pts[2 * b + 1] - pts[2 * o + 1]) -
    (pts[2 * a + 1] - pts[2 * o + 1]) * (pts[2 * b] - pts[2 * o])
  );
}

function hullSize(H: number[]): number {
  let s = 0;
  for (const v of H) s = Math.max(s, Math.abs(v));
  return s;
}
