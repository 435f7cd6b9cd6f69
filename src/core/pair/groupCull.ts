import type { EdgeSet } from '../edges';
import { discUmbraLines } from '../discUmbra';
import type { ObstacleIndex } from '../obstacles';
import type { EdgeGroups } from './edgeGroups';

// Edges that one edge surely exchanges nothing with, shown for a row before any pair
// is computed: whole groups lying behind the edge's line, the other edges of the
// edge's own convex body, or a group that one body hides from the whole edge; then
// single edges that do not face it, or that one listed body hides from all of it (its
// shadow from each end of the row edge). Each such pair would come out 0 on its own
// (the front tests, or a blocked view), so leaving them out changes no factor. Float
// tests with margins that only ever say no in doubt. Sketch units.

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
  /** Per body, the row edge its shadows were made for (-1: none), whether they hold, and their six lines. */
  private readonly shadowRow: Int32Array;
  private readonly shadowOk: Uint8Array;
  private readonly shadowLines: Float64Array;

  /** `extent`: largest coordinate magnitude of the sketch (scales the margin). */
  constructor(
    private readonly e: EdgeSet,
    private readonly ob: ObstacleIndex,
    private readonly groups: EdgeGroups,
    extent: number,
  ) {
    this.margin = 1e-12 * extent;
    this.shadowRow = new Int32Array(ob.bodyCount).fill(-1);
    this.shadowOk = new Uint8Array(ob.bodyCount);
    this.shadowLines = new Float64Array(18 * ob.bodyCount);
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

  /**
   * Remove from out[from, to) the edges that body c hides from all of polygon edge i:
   * both corners in c's shadow from each end of i (a disc inside c, shrunk by SLACK;
   * the shadow from a point is convex, and a point hidden from both ends of i is hidden
   * from every point between). Returns the new end. c is not i's body nor the edges'.
   */
  shadowFilter(i: number, c: number, out: Int32Array, from: number, to: number): number {
    const L = this.shadowLines,
      at = 18 * c;
    if (this.shadowRow[c] !== i) {
      this.shadowRow[c] = i;
      const ob = this.ob,
        E = this.e;
      const hr = ob.bodyRHull[c] * (1 - SLACK);
      this.shadowOk[c] =
        hr > 0 &&
        discUmbraLines(ob.bodyCx[c], ob.bodyCy[c], hr, E.ax[i], E.ay[i], 0, L, at) &&
        discUmbraLines(ob.bodyCx[c], ob.bodyCy[c], hr, E.bx[i], E.by[i], 0, L, at + 9)
          ? 1
          : 0;
    }
    if (this.shadowOk[c] === 0) return to;
    // A group whose circle lies wholly outside one of the lines has no edge hidden.
    const G = this.groups,
      b = G.groupOf[out[from]];
    const gx = G.cx[b],
      gy = G.cy[b],
      gr = G.r[b];
    for (let t = at; t < at + 18; t += 3) if (L[t] * gx + L[t + 1] * gy + L[t + 2] + gr < 0) return to;
    const E = this.e,
      m = this.margin;
    let k = from;
    for (let q = from; q < to; q++) {
      const j = out[q];
      const ax = E.ax[j],
        ay = E.ay[j],
        bx = E.bx[j],
        by = E.by[j];
      let hidden = true;
      for (let t = at; t < at + 18; t += 3) {
        if (!(L[t] * ax + L[t + 1] * ay + L[t + 2] >= m && L[t] * bx + L[t + 1] * by + L[t + 2] >= m)) {
          hidden = false;
          break;
        }
      }
      if (!hidden) out[k++] = j;
    }
    return k;
  }
}
