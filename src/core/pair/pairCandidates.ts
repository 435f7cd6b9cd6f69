import type { EdgeSet } from '../edges';
import type { ObstacleIndex } from '../obstacles';
import { growInt } from '../scratch';
import type { EdgeGroups } from './edgeGroups';
import { SIDE_STRIDE as SIDE_STRIDE_IN } from './regionTree';

// Module-local copies of hot imports (see integrator.ts).
const SIDE_STRIDE = SIDE_STRIDE_IN;

// The obstacles that may block any pair of an edge of one group A with an edge of
// another group B (a group is a body, or a run of consecutive enclosure edges), found
// once and reused by every such pair. The view region of a pair lies in the hull of
// both edges, and each group's edges lie in its bounding circle, so every such region
// lies in the hull of the two circles, and so in the segment between their centres
// widened by the larger radius. The lists hold every body and blocking wall edge that
// may enter that widened segment: a superset of what a per-pair search finds. The rows
// of the edge matrix (row edge e, other edge after it) come in edge order, and a
// group's edges are consecutive, so the lists are kept while the row edges stay in one
// group, and each is made once per pair of groups, not per row. Each row then keeps
// of a pair of groups' lists only what may enter the triangle (row edge's ends, the
// other group's centre) widened by that group's radius, which holds every pair hull
// of the row edge with that group (each point of such a hull is a point of the
// triangle plus at most the radius): on large bodies with short edges it is far
// tighter. Sketch units.

/** Relative margin of the widened regions: far above the rounding of their sides. */
const MARGIN = 1e-9;

export class PairCandidates {
  /**
   * Bodies (ids) and wall edges (ids into ob.wallEdges) of the lists made for the
   * current row; after `find`, the pair's are bodies[bodyStart .. bodyEnd) and
   * walls[wallStart .. wallEnd). Read only outside (they grow here).
   */
  bodies: Int32Array<ArrayBuffer>;
  walls: Int32Array<ArrayBuffer>;
  bodyStart = 0;
  bodyEnd = 0;
  wallStart = 0;
  wallEnd = 0;
  private readonly row: ListSet;
  /** The lists of the current row group with each other group (widened segments). */
  private readonly group: ListSet;
  private rowEdge = -1;
  private rowGroup = -1;
  /** Group of each edge; per group its bounding circle (bodies: the body's own). */
  private readonly groupOf: Int32Array;
  private readonly groupCx: Float64Array;
  private readonly groupCy: Float64Array;
  private readonly groupR: Float64Array;
  /** The widened segment as region-tree sides (see regionTree.ts: box, then a, b, c per side). */
  private readonly sides = new Float64Array(4 + 4 * SIDE_STRIDE);
  /** The widened triangle of a row: a, b, c per side (inside: a x + b y + c >= 0). */
  private readonly triangle = new Float64Array(3 * SIDE_STRIDE);
  private readonly collectBody: (id: number) => boolean;
  private readonly collectWall: (id: number) => boolean;

  /** `extent`: largest coordinate magnitude of the sketch (scales the float margin), as the view region's. */
  constructor(
    private readonly e: EdgeSet,
    private readonly ob: ObstacleIndex,
    private readonly extent: number,
    groups: EdgeGroups,
  ) {
    this.groupOf = groups.groupOf;
    this.groupCx = groups.cx;
    this.groupCy = groups.cy;
    this.groupR = groups.r;
    this.row = new ListSet(groups.r.length);
    this.group = new ListSet(groups.r.length);
    this.bodies = this.row.bodies;
    this.walls = this.row.walls;
    this.collectBody = (id: number) => {
      this.group.bodies = pushTo(this.group.bodies, this.group.bodyFill++, id);
      return false;
    };
    this.collectWall = (id: number) => {
      this.group.walls = pushTo(this.group.walls, this.group.wallFill++, id);
      return false;
    };
  }

  /**
   * Make the lists for the pair of edges i and j (either order): the row edge is the
   * lower index, the group that of the other edge.
   */
  find(i: number, j: number): void {
    const row = i < j ? i : j,
      other = i < j ? j : i;
    const b = this.groupOf[other];
    if (row !== this.rowEdge) {
      this.rowEdge = row;
      this.row.clear();
      const a = this.groupOf[row];
      if (a !== this.rowGroup) {
        this.rowGroup = a;
        this.group.clear();
      }
    }
    const R = this.row;
    if (!R.has(b)) {
      const G = this.group;
      if (!G.has(b)) {
        G.open(b);
        const sideCount = this.loadStadium(this.rowGroup, b);
        this.collectBodies(sideCount);
        this.ob.wallTree.searchSides(this.sides, sideCount, this.collectWall);
        G.close(b);
      }
      R.open(b);
      this.filterRow(row, b);
      R.close(b);
      this.bodies = R.bodies;
      this.walls = R.walls;
    }
    this.bodyStart = R.bodyFrom[b];
    this.bodyEnd = R.bodyTo[b];
    this.wallStart = R.wallFrom[b];
    this.wallEnd = R.wallTo[b];
  }

  /**
   * True when the lists of the pair of edges i and j are made already and hold no wall
   * edge; then `find` would only set the ranges (used to try the listed bodies first).
   */
  madeWithoutWalls(i: number, j: number): boolean {
    const b = this.madeGroup(i, j);
    return b >= 0 && this.row.wallTo[b] === this.row.wallFrom[b];
  }

  /**
   * True when the lists of the pair of edges i and j (either order) are made already
   * and hold nothing that can block it: no wall edge, and no body but the pair's own
   * convex ones (they lie behind their edges). No obstacle then enters any view region
   * of the row edge with the other edge's group. False when not made yet: lists are
   * made only for pairs that a hint does not end (see obstacleGather.ts).
   */
  nothingBetween(i: number, j: number): boolean {
    const b = this.madeGroup(i, j);
    return b >= 0 && this.row.unblocked[b] === 1;
  }

  /** Are the row's lists for the pair of edges i and j (either order) made already? */
  made(i: number, j: number): boolean {
    return this.madeGroup(i, j) >= 0;
  }

  /** The other edge's group when the row's lists for the pair of edges i and j are made; -1 otherwise. */
  private madeGroup(i: number, j: number): number {
    const row = i < j ? i : j,
      other = i < j ? j : i;
    const b = this.groupOf[other];
    return row === this.rowEdge && this.row.has(b) ? b : -1;
  }

  /** Copy into the row's lists what of group b's lists may enter the row's widened triangle (all of them when it is too thin). */
  private filterRow(row: number, b: number): void {
    const G = this.group,
      R = this.row,
      T = this.triangle,
      ob = this.ob,
      E = this.e;
    const thin = !this.loadTriangle(row, b);
    // The pair's own bodies: the row edge's, and group b when it is a body.
    const ownRow = ob.bodyOfPolygon[E.polygon[row]],
      ownOther = b < ob.bodyCount ? b : -1;
    let clear = 1;
    for (let k = G.bodyFrom[b]; k < G.bodyTo[b]; k++) {
      const c = G.bodies[k];
      const x = ob.bodyCx[c],
        y = ob.bodyCy[c],
        r = ob.bodyR[c];
      if (
        thin ||
        (T[0] * x + T[1] * y + T[2] + r >= 0 &&
          T[3] * x + T[4] * y + T[5] + r >= 0 &&
          T[6] * x + T[7] * y + T[8] + r >= 0)
      ) {
        R.bodies = pushTo(R.bodies, R.bodyFill++, c);
        if (!ob.bodyConvex[c] || (c !== ownRow && c !== ownOther)) clear = 0;
      }
    }
    for (let k = G.wallFrom[b]; k < G.wallTo[b]; k++) {
      const w = G.walls[k];
      const e = ob.wallEdges[w];
      if (
        thin ||
        (segmentMeetsSide(T, 0, E.ax[e], E.ay[e], E.bx[e], E.by[e]) &&
          segmentMeetsSide(T, 3, E.ax[e], E.ay[e], E.bx[e], E.by[e]) &&
          segmentMeetsSide(T, 6, E.ax[e], E.ay[e], E.bx[e], E.by[e]))
      ) {
        R.walls = pushTo(R.walls, R.wallFill++, w);
        clear = 0;
      }
    }
    R.unblocked[b] = clear;
  }

  /**
   * Sides of the triangle (row edge's ends, group b's centre) widened by b's radius,
   * unit inward normals, margin folded in; false when the triangle is too thin to
   * orient surely.
   */
  private loadTriangle(row: number, b: number): boolean {
    const E = this.e;
    const px = E.ax[row],
      py = E.ay[row],
      cx = this.groupCx[b],
      cy = this.groupCy[b];
    let qx = E.bx[row],
      qy = E.by[row];
    const cross = (qx - px) * (cy - py) - (qy - py) * (cx - px);
    const size = (Math.abs(qx - px) + Math.abs(qy - py)) * (Math.abs(cx - px) + Math.abs(cy - py));
    if (!(Math.abs(cross) > 1e-9 * size)) return false;
    // Walk the triangle anticlockwise: p, q, c when c lies left of p -> q, else p, c, q.
    let mx = cx,
      my = cy;
    if (cross < 0) {
      mx = qx;
      my = qy;
      qx = cx;
      qy = cy;
    }
    const widen = this.groupR[b] * (1 + MARGIN) + 1e-12 * this.extent;
    const T = this.triangle;
    edgeSide(T, 0, px, py, qx, qy, widen);
    edgeSide(T, 3, qx, qy, mx, my, widen);
    edgeSide(T, 6, mx, my, px, py, widen);
    return true;
  }

  /**
   * The region holding the hull of groups a's and b's circles: the segment between
   * their centres widened by the larger radius (box, then two long sides and two end
   * sides, unit inward normals, margin folded in). Returns the number of sides: 0 when
   * the centres coincide (the box alone then bounds the disc).
   */
  private loadStadium(a: number, b: number): number {
    const S = this.sides;
    const ax = this.groupCx[a],
      ay = this.groupCy[a],
      bx = this.groupCx[b],
      by = this.groupCy[b];
    const widen = Math.max(this.groupR[a], this.groupR[b]) * (1 + MARGIN) + 1e-12 * this.extent;
    S[0] = 0.5 * (ax + bx);
    S[1] = 0.5 * (ay + by);
    S[2] = 0.5 * Math.abs(bx - ax) + widen;
    S[3] = 0.5 * Math.abs(by - ay) + widen;
    const len = Math.sqrt((bx - ax) ** 2 + (by - ay) ** 2);
    if (!(len > 1e-9 * (Math.abs(bx - ax) + Math.abs(by - ay) + widen))) return 0;
    const ux = (bx - ax) / len,
      uy = (by - ay) / len;
    // Left of a -> b, right of it, past a backwards, short of b: each within `widen`.
    normalSide(S, 4, -uy, ux, ax, ay, widen);
    normalSide(S, 4 + SIDE_STRIDE, uy, -ux, ax, ay, widen);
    normalSide(S, 4 + 2 * SIDE_STRIDE, ux, uy, ax, ay, widen);
    normalSide(S, 4 + 3 * SIDE_STRIDE, -ux, -uy, bx, by, widen);
    return 4;
  }

  /** Every body whose bounding circle may meet the widened segment, by the tree when there is one. */
  private collectBodies(sideCount: number): void {
    const ob = this.ob;
    if (ob.bodyTree) {
      ob.bodyTree.searchSides(this.sides, sideCount, this.collectBody);
      return;
    }
    const S = this.sides;
    for (let c = 0; c < ob.bodyCount; c++) {
      const x = ob.bodyCx[c],
        y = ob.bodyCy[c],
        r = ob.bodyR[c];
      if (Math.abs(x - S[0]) > r + S[2] || Math.abs(y - S[1]) > r + S[3]) continue;
      let outside = false;
      for (let s = 4; s < 4 + sideCount * SIDE_STRIDE; s += SIDE_STRIDE) {
        if (S[s] * x + S[s + 1] * y + S[s + 2] + r < 0) {
          outside = true;
          break;
        }
      }
      if (!outside) this.collectBody(c);
    }
  }
}

/**
 * Lists of bodies and wall edges per group, made for one key (a row, or a row group)
 * and dropped together when it changes: a stamp per group says whether its lists are
 * current, and where in the shared arrays they lie.
 */
class ListSet {
  bodies: Int32Array<ArrayBuffer> = new Int32Array(256);
  walls: Int32Array<ArrayBuffer> = new Int32Array(256);
  bodyFill = 0;
  wallFill = 0;
  readonly bodyFrom: Int32Array;
  readonly bodyTo: Int32Array;
  readonly wallFrom: Int32Array;
  readonly wallTo: Int32Array;
  /** Per group: 1 when its lists hold nothing that can block (set by the row's filter). */
  readonly unblocked: Uint8Array;
  private readonly stamp: Int32Array;
  private current = 0;

  constructor(groups: number) {
    this.stamp = new Int32Array(groups).fill(-1);
    this.bodyFrom = new Int32Array(groups);
    this.bodyTo = new Int32Array(groups);
    this.wallFrom = new Int32Array(groups);
    this.wallTo = new Int32Array(groups);
    this.unblocked = new Uint8Array(groups);
  }

  /** Drop every group's lists (O(1): the stamps are compared with a counter). */
  clear(): void {
    this.current++;
    this.bodyFill = 0;
    this.wallFill = 0;
  }

  /** Are the group's lists made for the current key? */
  has(group: number): boolean {
    return this.stamp[group] === this.current;
  }

  /** Start the group's lists at the end of the shared arrays; `close` ends them. */
  open(group: number): void {
    this.stamp[group] = this.current;
    this.bodyFrom[group] = this.bodyFill;
    this.wallFrom[group] = this.wallFill;
  }

  close(group: number): void {
    this.bodyTo[group] = this.bodyFill;
    this.wallTo[group] = this.wallFill;
  }
}

/** `list` with `id` stored at `at`, grown first when full; returns the (possibly new) list. */
function pushTo(list: Int32Array<ArrayBuffer>, at: number, id: number): Int32Array<ArrayBuffer> {
  const out = at === list.length ? growInt(list) : list;
  out[at] = id;
  return out;
}

/** Side at S[at..at+3) from (x0, y0) to (x1, y1): unit inward (left) normal and offset, widened. */
function edgeSide(S: Float64Array, at: number, x0: number, y0: number, x1: number, y1: number, widen: number): void {
  const len = Math.sqrt((x1 - x0) ** 2 + (y1 - y0) ** 2);
  normalSide(S, at, (y0 - y1) / len, (x1 - x0) / len, x0, y0, widen);
}

/** Side at S[at..at+3): unit inward normal (a, b) through (x0, y0), moved out by `widen`. */
function normalSide(S: Float64Array, at: number, a: number, b: number, x0: number, y0: number, widen: number): void {
  S[at] = a;
  S[at + 1] = b;
  S[at + 2] = widen - (a * x0 + b * y0);
}

/** False when segment (x0, y0)-(x1, y1) lies wholly outside side S[at..at+3). */
function segmentMeetsSide(S: Float64Array, at: number, x0: number, y0: number, x1: number, y1: number): boolean {
  return S[at] * x0 + S[at + 1] * y0 + S[at + 2] >= 0 || S[at] * x1 + S[at + 1] * y1 + S[at + 2] >= 0;
}
