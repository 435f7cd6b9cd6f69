import type { EdgeSet } from '../edges';
import { discUmbraLines } from '../discUmbra';
import type { ObstacleIndex } from '../obstacles';
import type { EdgeGroups } from './edgeGroups';

// Whole groups of edges that one edge surely exchanges nothing with, shown once for
// the group instead of once per pair: a group lying wholly behind the edge's line,
// the other edges of the edge's own convex body, or a group that one body hides from
// the whole edge. Each such pair would come out 0 on its own (the front tests, or a
// blocked view), so leaving them out changes no factor. Float tests with margins that
// only ever say no in doubt. Sketch units.

/** Relative slack on radii: far above the rounding of the lines below. */
const SLACK = 1e-9;

export class GroupCull {
  /** Absolute margin: a point must be this far inside each line (sketch units). */
  private readonly margin: number;
  /** Per polygon edge, its front side as nx x + ny y + w > 0 (unit normal; NaN for an edge of no length). */
  private readonly nx: Float64Array;
  private readonly ny: Float64Array;
  private readonly w: Float64Array;
  /** The umbra's three lines (core/discUmbra.ts), scratch. */
  private readonly umbra = new Float64Array(9);

  /** `extent`: largest coordinate magnitude of the sketch (scales the margin). */
  constructor(
    private readonly e: EdgeSet,
    private readonly ob: ObstacleIndex,
    private readonly groups: EdgeGroups,
    extent: number,
  ) {
    this.margin = 1e-12 * extent;
    const n = e.count;
    this.nx = new Float64Array(n);
    this.ny = new Float64Array(n);
    this.w = new Float64Array(n);
    for (let k = 0; k < n; k++) {
      const L = e.length[k];
      const nx = (e.ay[k] - e.by[k]) / L,
        ny = (e.bx[k] - e.ax[k]) / L;
      this.nx[k] = nx;
      this.ny[k] = ny;
      this.w[k] = -(nx * e.ax[k] + ny * e.ay[k]);
    }
  }

  /**
   * Append to `out` (from `count` on) the polygon edges j of [from, end) that may face
   * polygon edge i: a corner of j maybe in front of i's line and a corner of i maybe in
   * front of j's. An edge left out surely fails one of the pair's exact front tests, so
   * its pair is 0. Float tests that leave an edge out only when both its corners lie
   * beyond the margin behind the line. Returns the new count.
   */
  facingIn(i: number, from: number, end: number, out: Int32Array, count: number): number {
    const E = this.e,
      NX = this.nx,
      NY = this.ny,
      W = this.w,
      m = -this.margin;
    const ax = E.ax[i],
      ay = E.ay[i],
      bx = E.bx[i],
      by = E.by[i],
      nx = NX[i],
      ny = NY[i],
      w = W[i];
    let c = count;
    for (let j = from; j < end; j++) {
      if (nx * E.ax[j] + ny * E.ay[j] + w < m && nx * E.bx[j] + ny * E.by[j] + w < m) continue;
      const jx = NX[j],
        jy = NY[j],
        jw = W[j];
      if (jx * ax + jy * ay + jw < m && jx * bx + jy * by + jw < m) continue;
      out[c++] = j;
    }
    return c;
  }

  /**
   * Does polygon edge i surely see nothing of group b by geometry alone: every point
   * of b's circle not in front of i's line, or b the other edges of i's own convex
   * body (they lie behind each other's lines)?
   */
  behind(i: number, b: number): boolean {
    const E = this.e,
      G = this.groups,
      ob = this.ob;
    if (b === G.groupOf[i] && b < ob.bodyCount && ob.bodyConvex[b]) return true;
    const L = E.length[i];
    if (!(L > 0)) return true; // an edge of no length exchanges nothing
    const ax = E.ax[i],
      ay = E.ay[i];
    // Signed distance of b's centre from i's line, positive in front (left of a -> b).
    const dist = ((E.bx[i] - ax) * (G.cy[b] - ay) - (E.by[i] - ay) * (G.cx[b] - ax)) / L;
    return dist + G.r[b] * (1 + SLACK) + this.margin < 0;
  }

  /**
   * Does body c (an obstacle hint: a body, or < 0 for none) hide all of group b's
   * circle from all of polygon edge i? A disc inside c (inside its hull: the pair's
   * edges are not c's own) then meets every sight line between them.
   */
  hides(i: number, b: number, c: number): boolean {
    if (c < 0 || c === b) return false;
    if (c === this.ob.bodyOfPolygon[this.e.polygon[i]]) return false;
    return this.umbraHolds(i, b, c);
  }

  /**
   * Is edge i wholly inside body c's umbra of group b's circle (core/discUmbra.ts)?
   * c's blocking disc is shrunk and b's circle grown, each by SLACK; every half-plane
   * is checked at both ends of i, with the margin (half-planes are convex).
   */
  private umbraHolds(i: number, b: number, c: number): boolean {
    const ob = this.ob,
      G = this.groups,
      E = this.e;
    const hr = ob.bodyRHull[c] * (1 - SLACK);
    if (!(hr > 0)) return false;
    const hx = ob.bodyCx[c],
      hy = ob.bodyCy[c];
    const tr = G.r[b] * (1 + SLACK) + this.margin;
    const L = this.umbra;
    if (!discUmbraLines(hx, hy, hr, G.cx[b], G.cy[b], tr, L, 0)) return false;
    const m = this.margin;
    const ax = E.ax[i],
      ay = E.ay[i],
      bx = E.bx[i],
      by = E.by[i];
    for (let k = 0; k < 9; k += 3) {
      if (!(L[k] * ax + L[k + 1] * ay + L[k + 2] >= m && L[k] * bx + L[k + 1] * by + L[k + 2] >= m)) return false;
    }
    return true;
  }
}
