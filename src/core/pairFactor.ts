import type { EdgeSet } from './edges';
import type { ObstacleIndex } from './obstacles';
import { orient } from './orient';
import { cornerMayBeTangent, distanceChange, gap, silhouetteFromSegment } from './pairGeometry';
import { cornerWindow, grow, sortOrderByKey, sortPrefix, sortRanges } from './scratch';

/** Convex bodies with more edges than this are clipped through angular windows (measured by `npm run bench`). */
const WINDOW_MIN_EDGES = 8;
const SIDE_ORDER = [1, 3, 0, 2];

/**
 * Exact diffuse view factor between two edges of a long (2D) geometry, with
 * blocking by every other edge of the sketch.
 *
 * Method (Hottel's crossed strings, generalised; see Modest, Radiative Heat Transfer,
 * ch. 4): from a point p on edge i the fraction of diffuse emission that reaches a
 * range of directions is 1/2 (sin b_hi - sin b_lo), b measured from the edge normal.
 * The directions that reach edge j unobstructed are bounded by rays through fixed
 * points (ends of j, or corners of obstructions), and the integral along i of
 * sin b towards a fixed point v is minus the change of the distance |v - p|.
 * Between the points of i where p lines up with two such fixed points, the set of
 * bounding points does not change, so each piece integrates exactly to a sum of
 * distance differences. One call allocates nothing.
 */
export class PairIntegrator {
  private readonly e: EdgeSet;
  private readonly obstacles: ObstacleIndex;
  // Stamp per edge: which call last clipped it, and where its clipped piece is.
  private readonly stamp: Int32Array;
  private readonly localOf: Int32Array;
  private call = 0;
  // Clipped obstruction pieces.
  private segEdge = new Int32Array(64);
  private segPx = new Float64Array(64);
  private segPy = new Float64Array(64);
  private segQx = new Float64Array(64);
  private segQy = new Float64Array(64);
  private segFlags = new Uint8Array(64); // bit 0: a strictly inside the view region, bit 1: b strictly inside, bit 2: grouped
  private segCount = 0;
  // Convex bodies lying wholly inside H: handled by their silhouette corners alone.
  private wholeBody = new Int32Array(16);
  private wholeCount = 0;
  private facingCode = new Uint8Array(64);
  private cornerIn = new Uint8Array(64);
  private readonly sideTol = new Float64Array(4);
  /** Angle of each side's inward (left) normal, radians. */
  private readonly sideNormalAngle = new Float64Array(4);
  /** Signed distance of the current body's centre from each side, positive inside H. */
  private readonly centreDist = new Float64Array(4);
  private sideMask = 0;
  private crossingSides = 0;
  private anglesFor = -1; // the call whose side normal angles are computed
  // Scratch ranges of walk positions for clipConvexBody (ranges per window stay few).
  private readonly rangeLo = new Int32Array(64);
  private readonly rangeHi = new Int32Array(64);
  private readonly nextLo = new Int32Array(64);
  private readonly nextHi = new Int32Array(64);
  private readonly winLo = new Int32Array(4);
  private readonly winHi = new Int32Array(4);
  private readonly edgeLo = new Int32Array(8);
  private readonly edgeHi = new Int32Array(8);
  /** Largest coordinate magnitude of the (shifted) sketch: scales float margins. */
  private readonly extent: number;
  // Fixed points: 0 and 1 are the ends of j (clipped), then the obstruction points, group by group.
  private ptX = new Float64Array(64);
  private ptY = new Float64Array(64);
  private ptBoundary = new Uint8Array(64);
  private ptCount = 0;
  private groupStart = new Int32Array(32); // group g owns points groupStart[g] .. groupStart[g+1]-1
  private groupCount = 0;
  // Per piece of edge i.
  private events = new Float64Array(64);
  private key = new Float64Array(64);
  private loKey = new Float64Array(32);
  private hiKey = new Float64Array(32);
  private loPt = new Int32Array(32);
  private hiPt = new Int32Array(32);
  private order = new Int32Array(32);
  // View region H: convex quadrilateral a0 a1 b0 b1 (anticlockwise); sides as start point + direction.
  private readonly sx = new Float64Array(4);
  private readonly sy = new Float64Array(4);
  private readonly ex = new Float64Array(4);
  private readonly ey = new Float64Array(4);
  private readonly sideOn = new Uint8Array(4);
  private readonly sideLen = new Float64Array(4);
  private readonly sideInvLen = new Float64Array(4);
  private readonly visitEdge: (id: number) => boolean;
  private readonly visitBody: (id: number) => boolean;
  // The pair being integrated, the bodies owning its edges (-1: a wall), and whether one body blocks it all.
  private pairI = 0;
  private pairJ = 0;
  private bodyI = -1;
  private bodyJ = -1;
  private blocked = false;

  constructor(edges: EdgeSet, obstacles: ObstacleIndex) {
    this.e = edges;
    this.obstacles = obstacles;
    let extent = 0;
    for (let e = 0; e < edges.count; e++) extent = Math.max(extent, Math.abs(edges.ax[e]), Math.abs(edges.ay[e]));
    this.extent = extent;
    this.stamp = new Int32Array(edges.count).fill(-1);
    this.localOf = new Int32Array(edges.count);
    this.visitEdge = (id: number) => {
      this.clip(this.obstacles.wallEdges[id]);
      return false; // keep no result list in flatbush
    };
    this.visitBody = (id: number) => {
      if (!this.blocked) this.clipBody(id);
      return false;
    };
  }

  /**
   * L_i F_ij for oriented edges i and j: the view factor from i to j times the
   * length of i (sketch units). Equal to L_j F_ji by reciprocity; 0 when i cannot see j.
   */
  exchangeLength(i: number, j: number): number {
    if (i === j) return 0;
    const E = this.e;
    let a0x = E.ax[i], a0y = E.ay[i], a1x = E.bx[i], a1y = E.by[i];
    let b0x = E.ax[j], b0y = E.ay[j], b1x = E.bx[j], b1y = E.by[j];
    // Front tests: a point is in front of an edge when it lies strictly left of a -> b.
    const dB0 = orient(a0x, a0y, a1x, a1y, b0x, b0y);
    const dB1 = orient(a0x, a0y, a1x, a1y, b1x, b1y);
    if (dB0 <= 0 && dB1 <= 0) return 0;
    const dA0 = orient(b0x, b0y, b1x, b1y, a0x, a0y);
    const dA1 = orient(b0x, b0y, b1x, b1y, a1x, a1y);
    if (dA0 <= 0 && dA1 <= 0) return 0;
    // Keep only the part of each edge in front of the other: nothing else can exchange.
    if (dB0 < 0) {
      const t = dB0 / (dB0 - dB1);
      b0x += t * (b1x - b0x);
      b0y += t * (b1y - b0y);
    } else if (dB1 < 0) {
      const t = dB1 / (dB1 - dB0);
      b1x += t * (b0x - b1x);
      b1y += t * (b0y - b1y);
    }
    if (dA0 < 0) {
      const t = dA0 / (dA0 - dA1);
      a0x += t * (a1x - a0x);
      a0y += t * (a1y - a0y);
    } else if (dA1 < 0) {
      const t = dA1 / (dA1 - dA0);
      a1x += t * (a0x - a1x);
      a1y += t * (a0y - a1y);
    }
    const li = Math.sqrt((a1x - a0x) ** 2 + (a1y - a0y) ** 2);
    if (li === 0 || (b0x === b1x && b0y === b1y)) return 0;

    // Every sight line from i to j lies in H = hull(i', j') = a0 a1 b0 b1 (anticlockwise,
    // since j's front faces i). Only obstructions inside H can block.
    this.setSide(0, a0x, a0y, a1x, a1y);
    this.setSide(1, a1x, a1y, b0x, b0y);
    this.setSide(2, b0x, b0y, b1x, b1y);
    this.setSide(3, b1x, b1y, a0x, a0y);
    this.sideMask = (this.sideOn[0] ? 1 : 0) | (this.sideOn[1] ? 2 : 0) | (this.sideOn[2] ? 4 : 0) | (this.sideOn[3] ? 8 : 0);
    this.call++;
    this.segCount = 0;
    this.wholeCount = 0;
    this.pairI = i;
    this.pairJ = j;
    this.bodyI = this.obstacles.bodyOfPolygon[E.polygon[i]];
    this.bodyJ = this.obstacles.bodyOfPolygon[E.polygon[j]];
    const cut = this.gatherObstacles(
      Math.min(a0x, a1x, b0x, b1x), Math.min(a0y, a1y, b0y, b1y),
      Math.max(a0x, a1x, b0x, b1x), Math.max(a0y, a1y, b0y, b1y),
    );
    if (cut) return 0;
    if (this.segCount === 0 && this.wholeCount === 0) {
      // Unobstructed: crossed minus uncrossed strings over 2 (Hottel).
      // Written as distance changes along i so that short edges lose no digits.
      const dx = a1x - a0x, dy = a1y - a0y;
      return 0.5 * (distanceChange(b1x, b1y, a0x, a0y, a1x, a1y, dx, dy) - distanceChange(b0x, b0y, a0x, a0y, a1x, a1y, dx, dy));
    }
    this.buildGroups(a0x, a0y, a1x, a1y, b0x, b0y, b1x, b1y);
    const nEvents = this.findEvents(a0x, a0y, a1x, a1y);
    return this.integrate(a0x, a0y, a1x, a1y, li, nEvents);
  }

  private setSide(k: number, x0: number, y0: number, x1: number, y1: number): void {
    this.sx[k] = x0;
    this.sy[k] = y0;
    this.ex[k] = x1;
    this.ey[k] = y1;
    this.sideOn[k] = x0 === x1 && y0 === y1 ? 0 : 1; // a side of zero length bounds nothing
    this.sideLen[k] = Math.sqrt((x1 - x0) ** 2 + (y1 - y0) ** 2);
    this.sideInvLen[k] = this.sideLen[k] > 0 ? 1 / this.sideLen[k] : 0;
    this.sideTol[k] = 1e-14 * this.sideLen[k] * this.extent;
  }

  /** Clip to H every edge that may block: walls of pockets near H, and bodies whose circle meets H. */
  /** Returns true when one body blocks every sight line (then nothing else needs looking at). */
  private gatherObstacles(minX: number, minY: number, maxX: number, maxY: number): boolean {
    const ob = this.obstacles;
    this.blocked = false;
    if (ob.bodyTree) ob.bodyTree.search(minX, minY, maxX, maxY, this.visitBody);
    else for (let b = 0; b < ob.bodyCount && !this.blocked; b++) this.clipBody(b);
    if (this.blocked) return true;
    ob.wallTree?.search(minX, minY, maxX, maxY, this.visitEdge);
    return false;
  }

  /**
   * Does convex body b block every sight line? It does when the disc inscribed about its
   * centre meets both side strings (sides 1 and 3): the body then holds a chord from one
   * string to the other, which cuts H between i and j. Float test with a margin that
   * only ever says no in doubt.
   */
  private cutsView(b: number): boolean {
    const ob = this.obstacles;
    const rIn = ob.bodyRIn[b] * (1 - 1e-9);
    if (!(rIn > 0) || !this.sideOn[1] || !this.sideOn[3]) return false;
    return this.discMeetsSide(1, ob.bodyCx[b], ob.bodyCy[b], rIn) && this.discMeetsSide(3, ob.bodyCx[b], ob.bodyCy[b], rIn);
  }

  private discMeetsSide(k: number, cx: number, cy: number, r: number): boolean {
    const x0 = this.sx[k], y0 = this.sy[k];
    const dx = this.ex[k] - x0, dy = this.ey[k] - y0;
    let t = ((cx - x0) * dx + (cy - y0) * dy) / (dx * dx + dy * dy);
    t = t < 0 ? 0 : t > 1 ? 1 : t;
    const ux = cx - (x0 + t * dx), uy = cy - (y0 + t * dy);
    return ux * ux + uy * uy < r * r;
  }

  /**
   * Clip the edges of body b unless its bounding circle lies wholly outside a side of H;
   * when the circle lies wholly inside H, keep every edge whole without testing it.
   */
  private clipBody(b: number): void {
    const ob = this.obstacles;
    // A convex body lies wholly behind each of its own edges, so it cannot block a
    // view from or to one of them.
    if (ob.bodyConvex[b] && (b === this.bodyI || b === this.bodyJ)) return;
    const cx = ob.bodyCx[b], cy = ob.bodyCy[b], r = ob.bodyR[b];
    // A relative margin of 1e-9 keeps these float tests on the safe side: a body kept
    // in vain costs only time, and "wholly inside" must be certain.
    const margin = r * 1e-9 + 1e-12 * (Math.abs(cx) + Math.abs(cy));
    let crossing = 0; // sides that cut the circle; the body is surely inside the others
    for (let step = 0; step < 4; step++) {
      const k = SIDE_ORDER[step]; // the side strings reject most bodies, so they go first
      if (!this.sideOn[k]) continue;
      const dx = this.ex[k] - this.sx[k], dy = this.ey[k] - this.sy[k];
      // Signed distance of the centre from the side, positive inside H.
      const dist = (dx * (cy - this.sy[k]) - dy * (cx - this.sx[k])) * this.sideInvLen[k];
      this.centreDist[k] = dist;
      if (dist < -r - margin) return;
      if (dist < r + margin) crossing |= 1 << k;
    }
    this.crossingSides = crossing;
    const inside = crossing === 0;
    const first = ob.bodyFirstEdge[b], end = ob.bodyEdgeEnd[b];
    if (!inside && ob.bodyConvex[b] && this.cutsView(b)) {
      this.blocked = true;
      return;
    }
    if (!inside) {
      // Angular windows pay off for many-sided bodies; a few corners are cheaper to test all.
      if (ob.bodyConvex[b] && end - first > WINDOW_MIN_EDGES) this.clipConvexBody(b);
      else this.clipBodyEdges(first, end);
      return;
    }
    if (ob.bodyConvex[b]) {
      if (this.wholeCount === this.wholeBody.length) {
        const grown = new Int32Array(2 * this.wholeCount);
        grown.set(this.wholeBody);
        this.wholeBody = grown;
      }
      this.wholeBody[this.wholeCount++] = b;
      return;
    }
    const E = this.e;
    for (let e = first; e < end; e++) {
      this.keepPiece(e, E.ax[e], E.ay[e], E.bx[e], E.by[e], 3);
    }
  }

  /**
   * A convex body wholly inside H is one closed chain; from any p on i its extremes are
   * its two tangent corners, where the edges facing p meet those facing away. A corner
   * can be a tangent from some p on i' only if its two edges differ in facing at an end
   * of i', or both change facing along i'. Float tests with a margin; any doubt keeps
   * the corner (an extra split costs time, never accuracy).
   */
  private addWholeConvexBody(b: number, a0x: number, a0y: number, a1x: number, a1y: number): void {
    const E = this.e;
    const ob = this.obstacles;
    const first = ob.bodyFirstEdge[b], end = ob.bodyEdgeEnd[b];
    const g = this.groupCount++;
    this.setGroupStart(g, this.ptCount);
    if (this.facingCode.length < end - first) this.facingCode = new Uint8Array(2 * (end - first));
    const code = this.facingCode;
    for (let e = first; e < end; e++) code[e - first] = this.facing(e, a0x, a0y, a1x, a1y);
    // Corner a of edge e sits between the edge before it (in the oriented walk) and e.
    for (let e = first; e < end; e++) {
      if (cornerMayBeTangent(code[E.prevEdge[e] - first], code[e - first])) this.pushPoint(E.ax[e], E.ay[e]);
    }
  }

  /** Facing code of edge e seen from a0 and a1: bit 0 front at a0, bit 1 front at a1, bit 2 in doubt. */
  private facing(e: number, a0x: number, a0y: number, a1x: number, a1y: number): number {
    const E = this.e;
    const x0 = E.ax[e], y0 = E.ay[e];
    const dx = E.bx[e] - x0, dy = E.by[e] - y0;
    const f0 = dx * (a0y - y0) - dy * (a0x - x0);
    const f1 = dx * (a1y - y0) - dy * (a1x - x0);
    const tol = 1e-12 * (Math.abs(dx) + Math.abs(dy)) * (Math.abs(a0x - x0) + Math.abs(a0y - y0) + Math.abs(a1x - x0) + Math.abs(a1y - y0));
    let code = (f0 > 0 ? 1 : 0) | (f1 > 0 ? 2 : 0);
    if (Math.abs(f0) <= tol || Math.abs(f1) <= tol) code |= 4;
    return code;
  }

  private keepPiece(edge: number, px: number, py: number, qx: number, qy: number, flags: number): void {
    const s = this.segCount;
    if (s === this.segEdge.length) this.growSegments();
    this.segEdge[s] = edge;
    this.segPx[s] = px;
    this.segPy[s] = py;
    this.segQx[s] = qx;
    this.segQy[s] = qy;
    this.segFlags[s] = flags;
    this.stamp[edge] = this.call;
    this.localOf[edge] = s;
    this.segCount = s + 1;
  }

  /**
   * Clip the edges [first, end) of a body that straddles H's boundary. Each corner is
   * classified once against the four sides in floats, with a margin well above the
   * rounding of a cross product (sides' length x sketch extent x 1e-14): edges with
   * both corners surely outside one side are dropped, edges with both surely inside
   * are kept whole, and only the rest go through the exact clip.
   */
  private clipBodyEdges(first: number, end: number): void {
    const E = this.e;
    const n = end - first;
    if (this.cornerIn.length < n) this.cornerIn = new Uint8Array(2 * n);
    const cin = this.cornerIn;
    const allOn = this.sideMask;
    for (let e = first; e < end; e++) cin[e - first] = this.cornerBits(E.ax[e], E.ay[e]);
    for (let e = first; e < end; e++) {
      const a = cin[e - first], bq = cin[E.nextEdge[e] - first];
      if (((a >> 4) & (bq >> 4)) !== 0) continue;
      if ((a & 15) === allOn && (bq & 15) === allOn) {
        if (e !== this.pairI && e !== this.pairJ) this.keepPiece(e, E.ax[e], E.ay[e], E.bx[e], E.by[e], 3);
      } else {
        this.clip(e);
      }
    }
  }

  /**
   * Clip a convex body that straddles H's boundary, looking only at edges that can meet
   * H. About the body's centre, a corner at distance rho and angle t lies inside side k
   * when d_k + rho cos(t - phi_k) > 0 (d_k: the centre's signed distance, phi_k: the
   * side's inward normal); with rMin <= rho <= r that bounds t to a window around phi_k.
   * An edge can meet H only if, for every side, one of its corners may lie inside it.
   * The windows are found by binary search in the corners' angles and intersected as
   * ranges of walk positions, so a many-sided tube costs a few edges, not all of them.
   */
  private clipConvexBody(b: number): void {
    const ob = this.obstacles;
    const first = ob.bodyFirstEdge[b];
    const n = ob.bodyEdgeEnd[b] - first;
    const r = ob.bodyR[b], rMin = ob.bodyRMin[b];
    const lo = this.rangeLo, hi = this.rangeHi;
    if (this.anglesFor !== this.call) {
      for (let k = 0; k < 4; k++) this.sideNormalAngle[k] = Math.atan2(this.ex[k] - this.sx[k], this.sy[k] - this.ey[k]); // left normal (-dy, dx)
      this.anglesFor = this.call;
    }
    let count = 1;
    lo[0] = 0; hi[0] = n - 1;
    // The side strings (1 and 3) bound H most tightly, so they go first.
    for (let step = 0; step < 4 && count > 0; step++) {
      const k = SIDE_ORDER[step];
      if (!this.sideOn[k]) continue;
      const d = this.centreDist[k]; // set by clipBody for this body
      let c = d >= 0 ? (rMin > 0 ? -d / rMin : -Infinity) : -d / r;
      c -= 1e-9; // margin for rounding: a wider window only costs time
      if (c <= -1) continue;
      if (c >= 1) return; // every corner, so the whole body, is outside this side
      const w = Math.acos(c) + 1e-9;
      count = this.intersectWindow(first, n, this.sideNormalAngle[k], w, count);
    }
    const E = this.e;
    const walk = ob.walkEdge;
    for (let q = 0; q < count; q++) {
      for (let m = lo[q]; m <= hi[q]; m++) this.clipClassified(walk[first + m], E);
    }
  }

  /**
   * Intersect the walk-position ranges rangeLo/Hi[0..count) with the edges having a
   * corner whose angle is within w of phi; returns the new count.
   */
  private intersectWindow(first: number, n: number, phi: number, w: number, count: number): number {
    const A = this.obstacles.walkAngle;
    const top = A[first]; // angles fall from top to above top - 2 pi along the walk
    const turn = 2 * Math.PI;
    let centre = phi - turn * Math.ceil((phi - top) / turn); // in (top - 2 pi, top]
    if (centre > top) centre -= turn;
    const wl = this.winLo, wh = this.winHi;
    // Corner windows as walk positions (angles [a, b] inside (top - 2 pi, top]).
    let nw = cornerWindow(A, first, n, Math.max(centre - w, top - turn), Math.min(centre + w, top), wl, wh, 0);
    if (centre + w > top) nw = cornerWindow(A, first, n, top - turn, centre + w - turn, wl, wh, nw);
    if (centre - w < top - turn) nw = cornerWindow(A, first, n, centre - w + turn, top, wl, wh, nw);
    // Edge at position m runs from corner m to m+1: a corner window [f, t] admits edges [f-1, t].
    let ne = 0;
    const el = this.edgeLo, eh = this.edgeHi;
    for (let q = 0; q < nw; q++) {
      if (wl[q] === 0) {
        el[ne] = n - 1; eh[ne] = n - 1; ne++;
        el[ne] = 0; eh[ne] = wh[q]; ne++;
      } else {
        el[ne] = wl[q] - 1; eh[ne] = wh[q]; ne++;
      }
    }
    const lo = this.rangeLo, hi = this.rangeHi, nlo = this.nextLo, nhi = this.nextHi;
    let out = 0;
    for (let x = 0; x < count; x++) {
      for (let y = 0; y < ne; y++) {
        const a = Math.max(lo[x], el[y]), bb = Math.min(hi[x], eh[y]);
        if (a <= bb && out < nlo.length) { nlo[out] = a; nhi[out] = bb; out++; }
      }
    }
    // Ranges may overlap after intersection; merge so no edge is clipped twice.
    sortRanges(nlo, nhi, out);
    let merged = 0;
    for (let q = 0; q < out; q++) {
      if (merged > 0 && nlo[q] <= hi[merged - 1] + 1) hi[merged - 1] = Math.max(hi[merged - 1], nhi[q]);
      else { lo[merged] = nlo[q]; hi[merged] = nhi[q]; merged++; }
    }
    return merged;
  }

  /** Float-classify both corners of edge e; drop, keep whole, or clip exactly. */
  private clipClassified(e: number, E: EdgeSet): void {
    const inA = this.cornerBits(E.ax[e], E.ay[e]);
    const inB = this.cornerBits(E.bx[e], E.by[e]);
    // Low 4 bits: surely inside side k; high 4 bits: surely outside side k.
    if (((inA >> 4) & (inB >> 4)) !== 0) return;
    const all = this.sideMask;
    if ((inA & 15) === all && (inB & 15) === all) {
      if (e !== this.pairI && e !== this.pairJ) this.keepPiece(e, E.ax[e], E.ay[e], E.bx[e], E.by[e], 3);
      return;
    }
    this.clip(e);
  }

  /**
   * Low 4 bits: surely inside side k; high 4 bits: surely outside side k. Only the sides
   * that cut the current body's circle are tested; the body is surely inside the rest.
   */
  private cornerBits(x: number, y: number): number {
    const crossing = this.crossingSides;
    let bits = this.sideMask & ~crossing;
    for (let k = 0; k < 4; k++) {
      if (!(crossing & (1 << k))) continue;
      const d = (this.ex[k] - this.sx[k]) * (y - this.sy[k]) - (this.ey[k] - this.sy[k]) * (x - this.sx[k]);
      const tol = this.sideTol[k];
      if (d > tol) bits |= 1 << k;
      else if (d < -tol) bits |= 16 << k;
    }
    return bits;
  }

  /** Clip edge `edge` to H; keep the piece if it passes through H's interior. */
  private clip(edge: number): void {
    if (edge === this.pairI || edge === this.pairJ) return;
    const E = this.e;
    const px = E.ax[edge], py = E.ay[edge], qx = E.bx[edge], qy = E.by[edge];
    let t0 = 0, t1 = 1;
    let pIn = 1, qIn = 1;
    for (let k = 0; k < 4; k++) {
      if (!this.sideOn[k]) continue;
      const x0 = this.sx[k], y0 = this.sy[k], x1 = this.ex[k], y1 = this.ey[k];
      // Cheap float rejection first; robust signs only for what survives.
      const dx = x1 - x0, dy = y1 - y0;
      const fp = dx * (py - y0) - dy * (px - x0);
      const fq = dx * (qy - y0) - dy * (qx - x0);
      const tol = 1e-12 * (Math.abs(dx) + Math.abs(dy)) * (Math.abs(px - x0) + Math.abs(py - y0) + Math.abs(qx - x0) + Math.abs(qy - y0));
      if (fp < -tol && fq < -tol) return;
      const dP = orient(x0, y0, x1, y1, px, py);
      const dQ = orient(x0, y0, x1, y1, qx, qy);
      if (dP <= 0 && dQ <= 0) return; // outside, or along the boundary: blocks no sight line
      if (dP <= 0) pIn = 0;
      if (dQ <= 0) qIn = 0;
      if (dP < 0) t0 = Math.max(t0, dP / (dP - dQ));
      else if (dQ < 0) t1 = Math.min(t1, dP / (dP - dQ));
    }
    // A corner strictly inside H keeps its piece even when rounding makes the clipped
    // piece vanish (a corner a hair inside a side): chains must stay connected.
    if (pIn) t0 = 0;
    if (qIn) t1 = 1;
    if (t1 <= t0 && !pIn && !qIn) return;
    this.keepPiece(edge, px + t0 * (qx - px), py + t0 * (qy - py), px + t1 * (qx - px), py + t1 * (qy - py), pIn | (qIn << 1));
  }

  /**
   * Join clipped pieces into chains (runs of one polygon's edges joined by corners
   * inside H). Each chain covers one interval of directions seen from any p on i;
   * its ends are its end points or corners that can be a silhouette from i.
   */
  private buildGroups(a0x: number, a0y: number, a1x: number, a1y: number,
    b0x: number, b0y: number, b1x: number, b1y: number): void {
    this.ptCount = 0;
    this.pushPoint(b0x, b0y);
    this.pushPoint(b1x, b1y);
    this.groupCount = 0;
    for (let w = 0; w < this.wholeCount; w++) this.addWholeConvexBody(this.wholeBody[w], a0x, a0y, a1x, a1y);
    const flags = this.segFlags;
    // Open chains start at a piece whose start is not inside H.
    for (let s = 0; s < this.segCount; s++) {
      if ((flags[s] & 1) === 0 || this.stamp[this.e.prevEdge[this.segEdge[s]]] !== this.call) {
        flags[s] &= ~1; // its start is the end of the chain
        this.walkChain(s, a0x, a0y, a1x, a1y);
      }
    }
    // What is left are closed chains: bodies lying wholly inside H.
    for (let s = 0; s < this.segCount; s++) {
      if ((flags[s] & 4) === 0) this.walkChain(s, a0x, a0y, a1x, a1y);
    }
    this.setGroupStart(this.groupCount, this.ptCount);
  }

  private walkChain(first: number, a0x: number, a0y: number, a1x: number, a1y: number): void {
    const E = this.e;
    const flags = this.segFlags;
    const g = this.groupCount++;
    this.setGroupStart(g, this.ptCount);
    if ((flags[first] & 1) === 0) this.pushPoint(this.segPx[first], this.segPy[first], 1);
    let s = first;
    for (;;) {
      flags[s] |= 4;
      if ((flags[s] & 2) === 0) {
        this.pushPoint(this.segQx[s], this.segQy[s], 1);
        return;
      }
      const edge = this.segEdge[s];
      const next = E.nextEdge[edge];
      // The corner b of `edge` lies inside H, so the next edge was clipped too.
      if (this.stamp[next] !== this.call) {
        this.pushPoint(this.segQx[s], this.segQy[s], 1);
        return;
      }
      const wx = E.bx[edge], wy = E.by[edge];
      if (silhouetteFromSegment(a0x, a0y, a1x, a1y, wx, wy, E.ax[edge], E.ay[edge], E.bx[next], E.by[next])) {
        this.pushPoint(wx, wy);
      }
      s = this.localOf[next];
      if ((flags[s] & 4) !== 0) return; // closed chain done
    }
  }

  private setGroupStart(g: number, value: number): void {
    if (g >= this.groupStart.length) {
      const grown = new Int32Array(this.groupStart.length * 2);
      grown.set(this.groupStart);
      this.groupStart = grown;
    }
    this.groupStart[g] = value;
  }

  /**
   * Add a fixed point. `onBoundary` marks the end of a chain, which lies on the boundary
   * of H: seen from i, a point on a side string is always outside j's range of
   * directions (H is convex, so its boundary is swept in order: a1, side 1, j, side 3,
   * a0), and a point on i's or j's line is at an end of its range. Such a point can
   * bound a chain's directions but never a visible gap of j by itself, so lines through
   * it make no events.
   */
  private pushPoint(x: number, y: number, onBoundary = 0): void {
    const k = this.ptCount;
    if (k === this.ptX.length) {
      this.ptX = grow(this.ptX);
      this.ptY = grow(this.ptY);
      const flags = new Uint8Array(this.ptX.length);
      flags.set(this.ptBoundary);
      this.ptBoundary = flags;
    }
    this.ptX[k] = x;
    this.ptY[k] = y;
    this.ptBoundary[k] = onBoundary;
    this.ptCount = k + 1;
  }

  /** Points of i (as fractions 0..1 from a0) where p lines up with two fixed points, sorted. */
  private findEvents(a0x: number, a0y: number, a1x: number, a1y: number): number {
    const X = this.ptX, Y = this.ptY;
    const n = this.ptCount;
    let count = 0;
    const boundary = this.ptBoundary;
    for (let r = 0; r < n; r++) {
      if (boundary[r]) continue;
      const rx = X[r], ry = Y[r];
      // orient(p, r, q) is affine along i: g(0) at a0 and g(1) at a1.
      const r0x = rx - a0x, r0y = ry - a0y, r1x = rx - a1x, r1y = ry - a1y;
      for (let q = r + 1; q < n; q++) {
        if (boundary[q]) continue;
        const qx = X[q], qy = Y[q];
        const g0 = r0x * (qy - a0y) - r0y * (qx - a0x);
        const g1 = r1x * (qy - a1y) - r1y * (qx - a1x);
        if ((g0 < 0 && g1 > 0) || (g0 > 0 && g1 < 0)) {
          if (count === this.events.length) this.events = grow(this.events);
          this.events[count++] = g0 / (g0 - g1);
        }
      }
    }
    sortPrefix(this.events, count);
    return count;
  }

  private integrate(a0x: number, a0y: number, a1x: number, a1y: number, li: number, nEvents: number): number {
    const X = this.ptX, Y = this.ptY;
    const dxI = a1x - a0x, dyI = a1y - a0y;
    const tx = dxI / li, ty = dyI / li;
    const nPts = this.ptCount;
    if (this.key.length < nPts) this.key = new Float64Array(Math.max(nPts, 2 * this.key.length));
    const key = this.key;
    const nGroups = this.groupCount;
    if (this.loKey.length < nGroups) this.growGroups(nGroups);
    let total = 0;
    let sa = 0;
    for (let ev = 0; ev <= nEvents; ev++) {
      const sb = ev < nEvents ? this.events[ev] : 1;
      if (sb <= sa) continue;
      const sm = 0.5 * (sa + sb);
      const pmx = a0x + sm * dxI, pmy = a0y + sm * dyI;
      // key = sin b: the direction's component along i, increasing towards a1.
      for (let k = 0; k < nPts; k++) {
        const vx = X[k] - pmx, vy = Y[k] - pmy;
        key[k] = (vx * tx + vy * ty) / Math.sqrt(vx * vx + vy * vy);
      }
      const jHi = key[0], jLo = key[1]; // b0 is the high end of j's range, b1 the low end
      if (jHi > jLo) {
        let nIv = 0;
        for (let g = 0; g < nGroups; g++) {
          const from = this.groupStart[g], to = this.groupStart[g + 1];
          let lo = Infinity, hi = -Infinity, loP = -1, hiP = -1;
          for (let k = from; k < to; k++) {
            const kk = key[k];
            if (kk < lo) { lo = kk; loP = k; }
            if (kk > hi) { hi = kk; hiP = k; }
          }
          if (hi <= jLo || lo >= jHi) continue;
          if (lo < jLo) { lo = jLo; loP = 1; }
          if (hi > jHi) { hi = jHi; hiP = 0; }
          this.loKey[nIv] = lo; this.hiKey[nIv] = hi; this.loPt[nIv] = loP; this.hiPt[nIv] = hiP;
          this.order[nIv] = nIv;
          nIv++;
        }
        sortOrderByKey(this.order, this.loKey, nIv);
        const pax = a0x + sa * dxI, pay = a0y + sa * dyI;
        const pbx = a0x + sb * dxI, pby = a0y + sb * dyI;
        const ddx = (sb - sa) * dxI, ddy = (sb - sa) * dyI;
        // Sweep the blocked intervals from j's low end; the gaps are what p sees of j.
        let cur = jLo, curP = 1;
        for (let n = 0; n < nIv; n++) {
          const o = this.order[n];
          if (this.loKey[o] > cur) total += gap(X, Y, curP, this.loPt[o], pax, pay, pbx, pby, ddx, ddy);
          if (this.hiKey[o] > cur) { cur = this.hiKey[o]; curP = this.hiPt[o]; }
        }
        if (cur < jHi) total += gap(X, Y, curP, 0, pax, pay, pbx, pby, ddx, ddy);
      }
      sa = sb;
    }
    return total;
  }

  private growSegments(): void {
    const n = this.segEdge.length * 2;
    const segEdge = new Int32Array(n); segEdge.set(this.segEdge); this.segEdge = segEdge;
    this.segPx = grow(this.segPx); this.segPy = grow(this.segPy);
    this.segQx = grow(this.segQx); this.segQy = grow(this.segQy);
    const flags = new Uint8Array(n); flags.set(this.segFlags); this.segFlags = flags;
  }

  private growGroups(n: number): void {
    const size = Math.max(n, 2 * this.loKey.length);
    this.loKey = new Float64Array(size);
    this.hiKey = new Float64Array(size);
    this.loPt = new Int32Array(size);
    this.hiPt = new Int32Array(size);
    this.order = new Int32Array(size);
  }
}
