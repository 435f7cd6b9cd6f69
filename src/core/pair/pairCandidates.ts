import type { EdgeSet } from '../edges';
import type { ObstacleIndex } from '../obstacles';
import { SIDE_STRIDE as SIDE_STRIDE_IN } from './regionTree';

// Module-local copies of hot imports (see integrator.ts).
const SIDE_STRIDE = SIDE_STRIDE_IN;

// The obstacles that may block any pair of one edge e with the edges of one body B,
// found once and reused by every such pair. The view region of a pair lies in the
// hull of both edges, and B's edges lie in its bounding circle (c, r), so every such
// region lies in conv(e, circle) and so in the triangle (e's ends, c) widened by r
// (each point of the hull is a point of the triangle plus at most r). The lists hold
// every body and blocking wall edge that may enter that widened triangle: a superset
// of what the per-pair searches find. A row of the edge matrix (e fixed, other edge
// after it) meets each body's edges one after another, so the lists of one row are
// kept until the row changes. Sketch units.

/** Relative margin of the widened triangle: far above the rounding of its sides. */
const MARGIN = 1e-9;

export class PairCandidates {
  /** Bodies (ids), then wall edges (ids into ob.wallEdges), of the lists made for the current row. */
  private bodyList = new Int32Array(256);
  private wallList = new Int32Array(256);
  private bodyFill = 0;
  private wallFill = 0;
  /** Per body: the row stamp its lists were made for, and where they lie. */
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
  /** The lists of the last `find`: bodies[bodyStart .. bodyEnd), walls[wallStart .. wallEnd). */
  bodies: Int32Array = this.bodyList;
  walls: Int32Array = this.wallList;
  bodyStart = 0;
  bodyEnd = 0;
  wallStart = 0;
  wallEnd = 0;
  /** Largest coordinate magnitude of the sketch (scales the float margin). */
  private readonly extent: number;

  constructor(
    private readonly e: EdgeSet,
    private readonly ob: ObstacleIndex,
  ) {
    const B = ob.bodyCount;
    this.stamp = new Int32Array(B).fill(-1);
    this.bodyFrom = new Int32Array(B);
    this.bodyTo = new Int32Array(B);
    this.wallFrom = new Int32Array(B);
    this.wallTo = new Int32Array(B);
    let extent = 0;
    for (let k = 0; k < e.count; k++) extent = Math.max(extent, Math.abs(e.ax[k]), Math.abs(e.ay[k]));
    this.extent = extent;
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
   * lower index, the body that of the other edge. False when there is none to make
   * (the other edge is a wall, or the triangle is too thin to orient surely): then
   * search per pair.
   */
  find(i: number, j: number): boolean {
    const E = this.e;
    const row = i < j ? i : j,
      other = i < j ? j : i;
    const b = this.ob.bodyOfPolygon[E.polygon[other]];
    if (b < 0) return false;
    if (row !== this.row) {
      this.row = row;
      this.rowStamp++;
      this.bodyFill = 0;
      this.wallFill = 0;
    }
    if (this.stamp[b] !== this.rowStamp) {
      if (!this.loadTriangle(row, b)) return false;
      this.stamp[b] = this.rowStamp;
      this.bodyFrom[b] = this.bodyFill;
      this.collectBodies();
      this.bodyTo[b] = this.bodyFill;
      this.wallFrom[b] = this.wallFill;
      this.ob.wallTree.searchSides(this.sides, 3, this.collectWall);
      this.wallTo[b] = this.wallFill;
    }
    this.bodies = this.bodyList;
    this.walls = this.wallList;
    this.bodyStart = this.bodyFrom[b];
    this.bodyEnd = this.bodyTo[b];
    this.wallStart = this.wallFrom[b];
    this.wallEnd = this.wallTo[b];
    return true;
  }

  /**
   * Sides of the triangle (row edge's ends, body b's centre) widened by b's radius,
   * unit inward normals, margin folded in; false when the triangle is too thin.
   */
  private loadTriangle(row: number, b: number): boolean {
    const E = this.e,
      ob = this.ob,
      S = this.sides;
    const px = E.ax[row],
      py = E.ay[row],
      cx = ob.bodyCx[b],
      cy = ob.bodyCy[b],
      r = ob.bodyR[b];
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
    if (this.bodyFill === this.bodyList.length) {
      const grown = new Int32Array(2 * this.bodyList.length);
      grown.set(this.bodyList);
      this.bodyList = grown;
    }
    this.bodyList[this.bodyFill++] = id;
  }

  private pushWall(id: number): void {
    if (this.wallFill === this.wallList.length) {
      const grown = new Int32Array(2 * this.wallList.length);
      grown.set(this.wallList);
      this.wallList = grown;
    }
    this.wallList[this.wallFill++] = id;
  }
}
