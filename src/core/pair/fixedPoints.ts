import type { EdgeSet } from '../edges';
import type { ObstacleIndex } from '../obstacles';
import { silhouetteAtCorner as silhouetteAtCornerIn } from '../pairGeometry';
import { grow as growIn, sortPrefix as sortPrefixIn } from '../scratch';
import type { ObstaclePieces } from './obstaclePieces';

// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call, measured at ~10% of hard scenes.
const silhouetteAtCorner = silhouetteAtCornerIn,
  grow = growIn,
  sortPrefix = sortPrefixIn;

// The points that bound the view from the emitting edge piece i' = a0-a1: the ends of
// the target j' (points 0 and 1: b0 and b1), then the obstruction points chain by
// chain (chain ends and corners that can be a silhouette from i'). Seen from any p on
// i', a chain covers one interval of directions bounded by two of its points. Also the
// breakpoints along i': where p lines up with two fixed points, the set of bounding
// points can change. Sketch units throughout.

/** How an edge faces the two ends of i' (float test; in doubt when either end is near its line). */
type Facing = typeof BACK | typeof FRONT_AT_START | typeof FRONT_AT_END | typeof FRONT | typeof IN_DOUBT;
const BACK = 0;
const FRONT_AT_START = 1;
const FRONT_AT_END = 2;
const FRONT = 3;
const IN_DOUBT = 4;

/**
 * Can the corner between edges with facings `before` and `after` be a tangent (a
 * silhouette) seen from some point of i'? Conservative: says yes in doubt (an extra
 * split costs time, never accuracy).
 */
export function cornerMayBeTangent(before: Facing, after: Facing): boolean {
  if (before === IN_DOUBT || after === IN_DOUBT || before !== after) return true;
  // Same facing at both ends: a tangent between only if both edges change facing along i'.
  return before === FRONT_AT_START || before === FRONT_AT_END;
}

export class FixedPoints {
  x = new Float64Array(64);
  y = new Float64Array(64);
  /** 1 for a chain end, which lies on the boundary of H (see push). */
  onBoundary = new Uint8Array(64);
  count = 0;
  /** Chain g owns points chainStart[g] .. chainStart[g+1]-1. */
  chainStart = new Int32Array(32);
  chainCount = 0;
  private facing = new Uint8Array(64);
  /** The pair's trimmed ends (see build). */
  private ends: Float64Array = new Float64Array(8);

  constructor(
    private readonly e: EdgeSet,
    private readonly ob: ObstacleIndex,
  ) {}

  /**
   * Collect the fixed points for emitting piece a0-a1 and target piece b0-b1 from the
   * obstruction pieces (after pieces.sortByEdge()): join them into chains (runs of one polygon's edges joined by
   * corners inside H) and keep each chain's ends and possible silhouette corners.
   */
  build(pieces: ObstaclePieces, P: Float64Array): void {
    this.ends = P;
    this.count = 0;
    this.pushFrom(P, P, 4, 5, 0);
    this.pushFrom(P, P, 6, 7, 0);
    this.chainCount = 0;
    for (let w = 0; w < pieces.wholeCount; w++) this.addWholeConvexBody(pieces.wholeBody[w]);
    // Open chains start at a piece whose start is not inside H, or whose previous edge was not kept.
    const prevEdge = this.e.prevEdge;
    // Pieces in edge order (pieces.order), so that the points, and the rounding of the
    // integral, do not depend on the order the obstacles were gathered in.
    const order = pieces.order;
    for (let k = 0; k < pieces.count; k++) {
      const s = order[k];
      if (!pieces.startInside[s] || !pieces.has(prevEdge[pieces.edge[s]])) this.walkChain(pieces, s, true);
    }
    // What is left are closed chains: bodies lying wholly inside H.
    for (let k = 0; k < pieces.count; k++) {
      const s = order[k];
      if (!pieces.walked[s]) this.walkChain(pieces, s, false);
    }
    this.setChainStart(this.chainCount, this.count);
  }

  private walkChain(pieces: ObstaclePieces, first: number, open: boolean): void {
    const E = this.e;
    this.setChainStart(this.chainCount++, this.count);
    // An open chain's end lies on H's boundary, unless the edge beyond it was left out
    // (facing away from i'): then it is a corner inside H, a point like any other.
    if (open) this.pushFrom(pieces.px, pieces.py, first, first, pieces.startInside[first] ? 0 : 1);
    let s = first;
    for (;;) {
      pieces.walked[s] = 1;
      const edge = pieces.edge[s];
      const next = E.nextEdge[edge];
      if (!pieces.endInside[s] || !pieces.has(next)) {
        this.pushFrom(pieces.qx, pieces.qy, s, s, pieces.endInside[s] ? 0 : 1);
        return;
      }
      // Corner b of `edge` lies inside H, and the next edge was kept too.
      if (silhouetteAtCorner(this.ends, E, edge, next)) this.pushFrom(E.bx, E.by, edge, edge, 0);
      s = pieces.pieceOf(next);
      if (pieces.walked[s]) return; // closed chain done
    }
  }

  /**
   * A convex body wholly inside H is one closed chain; from any p on i' its extremes are
   * its two tangent corners, where the edges facing p meet those facing away. Only
   * corners that may be a tangent from some p on i' are kept.
   */
  private addWholeConvexBody(b: number): void {
    const P = this.ends;
    const E = this.e;
    const first = this.ob.bodyFirstEdge[b],
      end = this.ob.bodyEdgeEnd[b];
    this.setChainStart(this.chainCount++, this.count);
    if (this.facing.length < end - first) this.facing = new Uint8Array(2 * (end - first));
    const facing = this.facing;
    for (let e = first; e < end; e++) facing[e - first] = facingOf(E, e, P);
    // Corner a of e sits between the edge before it (in the oriented walk) and e.
    for (let e = first; e < end; e++) {
      if (cornerMayBeTangent(facing[E.prevEdge[e] - first] as Facing, facing[e - first] as Facing))
        this.pushFrom(E.ax, E.ay, e, e, 0);
    }
  }

  private setChainStart(g: number, value: number): void {
    if (g >= this.chainStart.length) {
      const grown = new Int32Array(this.chainStart.length * 2);
      grown.set(this.chainStart);
      this.chainStart = grown;
    }
    this.chainStart[g] = value;
  }

  /**
   * Add fixed point (X[xAt], Y[yAt]). `onBoundary` = 1 marks the end of a chain, which lies on the
   * boundary of H: seen from i', a point on a side string is always outside j's range of
   * directions (H is convex, so its boundary is swept in order: a1, side 1, j, side 3,
   * a0), and a point on i's or j's line is at an end of its range. Such a point can
   * bound a chain's directions but never a visible gap of j by itself, so lines through
   * it make no breakpoints.
   */
  private pushFrom(X: Float64Array, Y: Float64Array, xAt: number, yAt: number, onBoundary: number): void {
    // Read here, not passed in: a call that is not inlined boxes the numbers passed to it.
    const x = X[xAt],
      y = Y[yAt];
    const k = this.count;
    if (k === this.x.length) {
      this.x = grow(this.x);
      this.y = grow(this.y);
      const flags = new Uint8Array(this.x.length);
      flags.set(this.onBoundary);
      this.onBoundary = flags;
    }
    this.x[k] = x;
    this.y[k] = y;
    this.onBoundary[k] = onBoundary;
    this.count = k + 1;
  }
}

/** Facing of edge e seen from a0 and from a1 (front: the point lies strictly left of the edge's line). */
function facingOf(E: EdgeSet, e: number, P: Float64Array): Facing {
  const a0x = P[0],
    a0y = P[1],
    a1x = P[2],
    a1y = P[3];
  const x0 = E.ax[e],
    y0 = E.ay[e];
  const dx = E.bx[e] - x0,
    dy = E.by[e] - y0;
  const f0 = dx * (a0y - y0) - dy * (a0x - x0);
  const f1 = dx * (a1y - y0) - dy * (a1x - x0);
  const tol =
    1e-12 *
    (Math.abs(dx) + Math.abs(dy)) *
    (Math.abs(a0x - x0) + Math.abs(a0y - y0) + Math.abs(a1x - x0) + Math.abs(a1y - y0));
  if (Math.abs(f0) <= tol || Math.abs(f1) <= tol) return IN_DOUBT;
  if (f0 > 0) return f1 > 0 ? FRONT : FRONT_AT_START;
  return f1 > 0 ? FRONT_AT_END : BACK;
}

/**
 * Doubt margin of the side test in Breakpoints.find, relative: each offset from a0 is
 * off by a few ulps of the sketch extent, so a cross product is off by at most about
 * 1e-15 extent (|q - r| + |b - r|), with |b - r| <= 3 extent; 1e-12 leaves a wide margin.
 */
const SIDE_DOUBT = 1e-12;

/** Breakpoints along i': fractions in (0, 1) from a0, sorted ascending, in at[0 .. count). */
export class Breakpoints {
  at = new Float64Array(64);
  count = 0;
  private offsets = new Float64Array(256);

  /** `extent`: largest coordinate magnitude of the sketch, sketch units (scales the doubt margin). */
  constructor(private readonly extent: number) {}

  /**
   * Find the points of i' = a0-a1 where p lines up with two fixed points (neither a
   * chain end). Between consecutive breakpoints the points bounding the view of j'
   * cannot change.
   */
  find(points: FixedPoints, P: Float64Array): void {
    const a0x = P[0],
      a0y = P[1],
      a1x = P[2],
      a1y = P[3];
    const X = points.x,
      Y = points.y,
      boundary = points.onBoundary,
      extent = this.extent;
    // The points that are no chain end, as offsets from a0 and from a1 (4 numbers each).
    if (this.offsets.length < 4 * points.count) this.offsets = new Float64Array(8 * points.count);
    const U = this.offsets;
    let n = 0;
    for (let k = 0; k < points.count; k++) {
      if (boundary[k]) continue;
      U[4 * n] = X[k] - a0x;
      U[4 * n + 1] = Y[k] - a0y;
      U[4 * n + 2] = X[k] - a1x;
      U[4 * n + 3] = Y[k] - a1y;
      n++;
    }
    // j's ends b0 and b1 (fixed points 0 and 1, never chain ends), from a0.
    const b0x = X[0] - a0x,
      b0y = Y[0] - a0y,
      b1x = X[1] - a0x,
      b1y = Y[1] - a0y;
    let count = 0;
    for (let r = 0; r < n; r++) {
      // orient(p, r, q) is affine along i': g0 at a0 and g1 at a1.
      const r0x = U[4 * r],
        r0y = U[4 * r + 1],
        r1x = U[4 * r + 2],
        r1y = U[4 * r + 3];
      for (let q = r + 1; q < n; q++) {
        const g0 = r0x * U[4 * q + 1] - r0y * U[4 * q];
        const g1 = r1x * U[4 * q + 3] - r1y * U[4 * q + 2];
        if ((g0 < 0 && g1 > 0) || (g0 > 0 && g1 < 0)) {
          // Where the line through r and q misses j', p lines them up in a direction
          // outside j's range (the line leaves H through a side string), where no gap
          // of j is bounded: no split. Kept when in doubt (see SIDE_DOUBT).
          const dx = U[4 * q] - r0x,
            dy = U[4 * q + 1] - r0y;
          const s0 = dx * (b0y - r0y) - dy * (b0x - r0x),
            s1 = dx * (b1y - r0y) - dy * (b1x - r0x);
          if (s0 * s1 > 0) {
            const doubt = SIDE_DOUBT * extent * (Math.abs(dx) + Math.abs(dy) + 4 * extent);
            if (Math.abs(s0) > doubt && Math.abs(s1) > doubt) continue;
          }
          if (count === this.at.length) this.at = grow(this.at);
          this.at[count++] = g0 / (g0 - g1);
        }
      }
    }
    sortPrefix(this.at, count);
    this.count = count;
  }
}
