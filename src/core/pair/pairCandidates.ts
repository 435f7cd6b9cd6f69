import type { EdgeSet } from '../edges';
import type { ObstacleIndex } from '../obstacles';
import { growInt } from '../scratch';
import { SIDE_STRIDE as SIDE_STRIDE_IN } from './regionTree';

// Module-local copies of hot imports (see integrator.ts).
const SIDE_STRIDE = SIDE_STRIDE_IN;

// The obstacles that may block any pair of one edge e with the edges of one group G
// (a body, or a run of consecutive enclosure edges), found once and reused by every
// such pair. The view region of a pair lies in the hull of both edges, and G's edges
// lie in its bounding circle (c, r), so every such region lies in conv(e, circle) and
// so in the triangle (e's ends, c) widened by r (each point of the hull is a point of
// the triangle plus at most r). The lists hold every body and blocking wall edge that
// may enter that widened triangle: a superset of what the per-pair searches find. A
// row of the edge matrix (e fixed, other edge after it) meets each group's edges one
// after another, so the lists of one row are kept until the row changes. Sketch units.

/** Relative margin of the widened triangle: far above the rounding of its sides. */
const MARGIN = 1e-9;

/** Enclosure edges per group: short runs keep the circle, and so the lists, tight. */
const WALL_RUN = 8;

export class PairCandidates {
  /**
   * Bodies (ids) and wall edges (ids into ob.wallEdges) of the lists made for the
   * current row; after `find`, the pair's are bodies[bodyStart .. bodyEnd) and
   * walls[wallStart .. wallEnd). Read only outside (they grow here).
   */
  bodies = new Int32Array(256);
  walls = new Int32Array(256);
  private bodyFill = 0;
  private wallFill = 0;
  /** Group of each edge; per group its bounding circle (bodies: the body's own). */
  private readonly groupOf: Int32Array;
  private readonly groupCx: Float64Array;
  private readonly groupCy: Float64Array;
  private readonly groupR: Float64Array;
  /** Per group: the row stamp its lists were made for, and where they lie. */
  private readonly stamp: Int32Array;
  private readonly bodyFrom: Int32Array;
  private readonly bodyTo: Int32Array;
  private readonly wallFrom: Int32Array;
  private readonly wallTo: Int32Array;
  private row = -1;
  private rowStamp = 0;
  /** The widened triangle as region-tree sides (see regionTree.ts: box, then a, b, c per side). */
  private readonly sides = new Float64Array(4 + 3 * SIDE_STRIDE);
  private readonly collectBody: (id: number) => boolean;
  private readonly collectWall: (id: number) => boolean;
  bodyStart = 0;
  bodyEnd = 0;
  wallStart = 0;
  wallEnd = 0;
  /** `extent`: largest coordinate magnitude of the sketch (scales the float margin), as the view region's. */
  constructor(
    private readonly e: EdgeSet,
    private readonly ob: ObstacleIndex,
    private readonly extent: number,
  ) {
    const groups = edgeGroups(e, ob);
    this.groupOf = groups.groupOf;
    this.groupCx = groups.cx;
    this.groupCy = groups.cy;
    this.groupR = groups.r;
    const G = groups.r.length;
    this.stamp = new Int32Array(G).fill(-1);
    this.bodyFrom = new Int32Array(G);
    this.bodyTo = new Int32Array(G);
    this.wallFrom = new Int32Array(G);
    this.wallTo = new Int32Array(G);
    this.collectBody = (id: number) => {
      this.pushBody(id);
      return false;
    };
    this.collectWall = (id: number) => {
      this.pushWall(id);
      return false;
    };
  }

  /**
   * Make the lists for the pair of edges i and j (either order): the row edge is the
   * lower index, the group that of the other edge. False when the triangle is too
   * thin to orient surely: then search per pair.
   */
  find(i: number, j: number): boolean {
    const row = i < j ? i : j,
      other = i < j ? j : i;
    const b = this.groupOf[other];
    if (row !== this.row) {
      this.row = row;
      this.rowStamp++;
      this.bodyFill = 0;
      this.wallFill = 0;
    }
    if (this.stamp[b] !== this.rowStamp) {
      this.stamp[b] = this.rowStamp;
      // bodyFrom -1: too thin for this row, every pair searches itself.
      if (!this.loadTriangle(row, b)) this.bodyFrom[b] = -1;
      else {
        this.bodyFrom[b] = this.bodyFill;
        this.collectBodies();
        this.bodyTo[b] = this.bodyFill;
        this.wallFrom[b] = this.wallFill;
        this.ob.wallTree.searchSides(this.sides, 3, this.collectWall);
        this.wallTo[b] = this.wallFill;
      }
    }
    if (this.bodyFrom[b] < 0) return false;
    this.bodyStart = this.bodyFrom[b];
    this.bodyEnd = this.bodyTo[b];
    this.wallStart = this.wallFrom[b];
    this.wallEnd = this.wallTo[b];
    return true;
  }

  /**
   * Sides of the triangle (row edge's ends, group b's centre) widened by b's radius,
   * unit inward normals, margin folded in; false when the triangle is too thin.
   */
  private loadTriangle(row: number, b: number): boolean {
    const E = this.e,
      S = this.sides;
    const px = E.ax[row],
      py = E.ay[row],
      cx = this.groupCx[b],
      cy = this.groupCy[b],
      r = this.groupR[b];
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
    const widen = r * (1 + MARGIN) + 1e-12 * this.extent;
    S[0] = (Math.min(px, qx, mx) + Math.max(px, qx, mx)) / 2;
    S[1] = (Math.min(py, qy, my) + Math.max(py, qy, my)) / 2;
    S[2] = (Math.max(px, qx, mx) - Math.min(px, qx, mx)) / 2 + widen;
    S[3] = (Math.max(py, qy, my) - Math.min(py, qy, my)) / 2 + widen;
    this.side(0, px, py, qx, qy, widen);
    this.side(1, qx, qy, mx, my, widen);
    this.side(2, mx, my, px, py, widen);
    return true;
  }

  /** Side k from (x0, y0) to (x1, y1): unit inward (left) normal and offset, widened. */
  private side(k: number, x0: number, y0: number, x1: number, y1: number, widen: number): void {
    const S = this.sides;
    const len = Math.sqrt((x1 - x0) ** 2 + (y1 - y0) ** 2);
    const a = (y0 - y1) / len,
      b = (x1 - x0) / len;
    const at = 4 + SIDE_STRIDE * k;
    S[at] = a;
    S[at + 1] = b;
    S[at + 2] = widen - (a * x0 + b * y0);
  }

  /** Every body whose bounding circle may meet the widened triangle, by the tree when there is one. */
  private collectBodies(): void {
    const ob = this.ob;
    if (ob.bodyTree) {
      ob.bodyTree.searchSides(this.sides, 3, this.collectBody);
      return;
    }
    const S = this.sides;
    for (let c = 0; c < ob.bodyCount; c++) {
      const x = ob.bodyCx[c],
        y = ob.bodyCy[c],
        r = ob.bodyR[c];
      if (Math.abs(x - S[0]) > r + S[2] || Math.abs(y - S[1]) > r + S[3]) continue;
      let outside = false;
      for (let s = 4; s < 4 + 3 * SIDE_STRIDE; s += SIDE_STRIDE) {
        if (S[s] * x + S[s + 1] * y + S[s + 2] + r < 0) {
          outside = true;
          break;
        }
      }
      if (!outside) this.pushBody(c);
    }
  }

  private pushBody(id: number): void {
    if (this.bodyFill === this.bodies.length) this.bodies = growInt(this.bodies);
    this.bodies[this.bodyFill++] = id;
  }

  private pushWall(id: number): void {
    if (this.wallFill === this.walls.length) this.walls = growInt(this.walls);
    this.walls[this.wallFill++] = id;
  }
}

/**
 * Groups of edges with their bounding circles: body b is group b (its circle from the
 * obstacle index); each enclosure polygon's edges follow in runs of WALL_RUN, each
 * run's circle about its corners' average (radius: the farthest corner, so it holds
 * every edge of the run, a chord of the circle).
 */
function edgeGroups(E: EdgeSet, ob: ObstacleIndex) {
  const groupOf = new Int32Array(E.count);
  const cx = Array.from(ob.bodyCx),
    cy = Array.from(ob.bodyCy),
    r = Array.from(ob.bodyR);
  for (let p = 0; p + 1 < E.polygonStart.length; p++) {
    const body = ob.bodyOfPolygon[p];
    const from = E.polygonStart[p],
      to = E.polygonStart[p + 1];
    if (body >= 0) {
      groupOf.fill(body, from, to);
      continue;
    }
    for (let s = from; s < to; s += WALL_RUN) {
      const end = Math.min(to, s + WALL_RUN);
      let x = 0,
        y = 0;
      for (let k = s; k < end; k++) {
        x += E.ax[k] + E.bx[k];
        y += E.ay[k] + E.by[k];
      }
      x /= 2 * (end - s);
      y /= 2 * (end - s);
      let far = 0;
      for (let k = s; k < end; k++)
        far = Math.max(
          far,
          Math.sqrt((E.ax[k] - x) ** 2 + (E.ay[k] - y) ** 2),
          Math.sqrt((E.bx[k] - x) ** 2 + (E.by[k] - y) ** 2),
        );
      groupOf.fill(cx.length, s, end);
      cx.push(x);
      cy.push(y);
      r.push(far);
    }
  }
  return { groupOf, cx: Float64Array.from(cx), cy: Float64Array.from(cy), r: Float64Array.from(r) };
}
