import type { EdgeSet } from '../edges';
import { ORIENT_FILTER_BOUND, orient as orientIn } from '../orient';

// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call, measured at ~10% of hard scenes.
const orient = orientIn,
  FILTER_BOUND = ORIENT_FILTER_BOUND;

// The view region H of an edge pair: every sight line from i' to j' lies in the
// convex quadrilateral a0 a1 b0 b1 (anticlockwise), whose sides are i' (side 0), the
// string a1-b0 (side 1), j' (side 2) and the string b1-a0 (side 3). Sketch units.

/** Where a point lies against one side of H, decided in floats with a margin. */
export type SidePlace = typeof SURELY_OUTSIDE | typeof UNSURE | typeof SURELY_INSIDE;
export const SURELY_OUTSIDE = -1;
export const UNSURE = 0;
export const SURELY_INSIDE = 1;

/**
 * For a corner outside (or on) exactly two sides of H, by the bit mask of those sides:
 * the string (1 or 3) its piece leaves H through when the other side is i' or j'
 * (0 or 2), else -1. In a valid sketch no edge crosses or touches i or j away from
 * their own polygon's shared corners, so such a piece leaves through the closed string,
 * maybe at one of its ends; a chain between the closed strings still cuts H in two
 * (ObstaclePieces.blockingChain). Opposite sides (strings 1 and 3, or 0 and 2): -1.
 */
const STRING_PAST = Int8Array.from({ length: 16 }, (_, mask) =>
  mask === 0b0011 || mask === 0b0110 ? 1 : mask === 0b1001 || mask === 0b1100 ? 3 : -1,
);

/**
 * Pieces shorter than this fraction of their edge, with both ends outside H, are
 * checked exactly (crossesInterior): far above the rounding of t0 and t1 (about 1e-16),
 * far below any piece that matters.
 */
const GRAZE = 1e-9;

/** Sides in the order that rejects most obstacles first: the side strings bound H most tightly. */
export const SIDE_ORDER: readonly number[] = [1, 3, 0, 2];

/** Result of clipping a segment to H (reused, never allocated per call). */
export interface SegmentClip {
  /** Fractions along the segment where the kept piece starts and ends. */
  t0: number;
  t1: number;
  /** Whether the segment's start / end lies strictly inside H. */
  startInside: boolean;
  endInside: boolean;
  /**
   * The side whose open interior the kept piece's start / end lies on, when the
   * segment's start / end lies strictly inside every other side (exact signs); the
   * string it leaves through (closed, see STRING_PAST) when the corner lies past that
   * string and past i's or j's line; else -1.
   */
  startSide: number;
  endSide: number;
}

export class ViewRegion {
  /** Side k runs from (sx, sy) to (ex, ey). */
  readonly sx = new Float64Array(4);
  readonly sy = new Float64Array(4);
  readonly ex = new Float64Array(4);
  readonly ey = new Float64Array(4);
  /** 1 when side k has length: a side of zero length bounds nothing. */
  readonly on = new Uint8Array(4);
  readonly invLen = new Float64Array(4);
  /** Float margin of a cross product against side k (side length x sketch extent x 1e-14). */
  readonly tol = new Float64Array(4);
  private readonly normal = new Float64Array(4);
  private normalReady = false;

  /** `extent`: largest coordinate magnitude of the (shifted) sketch, scales float margins. */
  constructor(readonly extent: number) {}

  /**
   * H for emitting piece a0-a1 and receiving piece b0-b1 (j' faces i', so a0 a1 b0 b1
   * is anticlockwise), given as P = [a0x, a0y, a1x, a1y, b0x, b0y, b1x, b1y].
   */
  set(P: Float64Array): void {
    this.side(0, P, 0, 2);
    this.side(1, P, 2, 4);
    this.side(2, P, 4, 6);
    this.side(3, P, 6, 0);
    this.normalReady = false;
  }

  /**
   * The sides' lengths and margins (invLen, tol), which set() leaves for later: a pair
   * that a remembered body's disc blocks ends on the sides' ends alone. Call before
   * either is read, once per pair (the gatherer does, after the remembered discs).
   */
  measure(): void {
    for (let k = 0; k < 4; k++) {
      const len = Math.sqrt((this.ex[k] - this.sx[k]) ** 2 + (this.ey[k] - this.sy[k]) ** 2);
      this.invLen[k] = len > 0 ? 1 / len : 0;
      this.tol[k] = 1e-14 * len * this.extent;
    }
  }

  /** Side k from point (P[s], P[s + 1]) to point (P[e], P[e + 1]). */
  private side(k: number, P: Float64Array, s: number, e: number): void {
    const x0 = P[s],
      y0 = P[s + 1],
      x1 = P[e],
      y1 = P[e + 1];
    this.sx[k] = x0;
    this.sy[k] = y0;
    this.ex[k] = x1;
    this.ey[k] = y1;
    this.on[k] = x0 === x1 && y0 === y1 ? 0 : 1;
  }

  /** Angle of each side's inward (left) normal, radians; computed once per pair, on first use. */
  normalAngles(): Float64Array {
    if (!this.normalReady) {
      for (let k = 0; k < 4; k++) this.normal[k] = Math.atan2(this.ex[k] - this.sx[k], this.sy[k] - this.ey[k]); // (-dy, dx)
      this.normalReady = true;
    }
    return this.normal;
  }

  /** Where (x, y) lies against side k, with the float margin `tol[k]`. */
  place(k: number, x: number, y: number): SidePlace {
    const d = (this.ex[k] - this.sx[k]) * (y - this.sy[k]) - (this.ey[k] - this.sy[k]) * (x - this.sx[k]);
    const tol = this.tol[k];
    return d > tol ? SURELY_INSIDE : d < -tol ? SURELY_OUTSIDE : UNSURE;
  }

  /**
   * Clip edge e of E, p-q, to H with exact orientation tests. Returns true, with the
   * kept piece in `out`, when the edge passes through H's interior; false when it lies
   * outside or along the boundary (it then blocks no sight line).
   */
  clipEdge(E: EdgeSet, e: number, out: SegmentClip): boolean {
    const px = E.ax[e],
      py = E.ay[e],
      qx = E.bx[e],
      qy = E.by[e];
    // Float pass first, the side strings first: reject cheaply, and mark the sides that
    // hold both ends surely inside (they cannot cut the segment); the margin is far
    // above the rounding of the cross products. Exact signs only for the other sides.
    let doubtful = 0;
    for (let step = 0; step < 4; step++) {
      const k = SIDE_ORDER[step];
      if (!this.on[k]) continue;
      const x0 = this.sx[k],
        y0 = this.sy[k];
      const dx = this.ex[k] - x0,
        dy = this.ey[k] - y0;
      const fp = dx * (py - y0) - dy * (px - x0);
      const fq = dx * (qy - y0) - dy * (qx - x0);
      const tol =
        1e-12 *
        (Math.abs(dx) + Math.abs(dy)) *
        (Math.abs(px - x0) + Math.abs(py - y0) + Math.abs(qx - x0) + Math.abs(qy - y0));
      if (fp < -tol && fq < -tol) return false;
      if (!(fp > tol && fq > tol)) doubtful |= 1 << k;
    }
    return this.clipExact(E, e, doubtful, out);
  }

  /**
   * Does the line through p and q have corners of H strictly on both sides (exact)? A
   * segment with both ends outside H whose clipped piece is under GRAZE of it passes
   * near a corner of H, where the rounding of t0 and t1 cannot tell a piece from none;
   * when every corner lies on one side of its line (or on it) it misses H's interior.
   */
  private crossesInterior(px: number, py: number, qx: number, qy: number): boolean {
    let left = false,
      right = false;
    for (let k = 0; k < 4; k++) {
      const d = orient(px, py, qx, qy, this.sx[k], this.sy[k]);
      if (d > 0) left = true;
      else if (d < 0) right = true;
    }
    return left && right;
  }

  /**
   * Does edge e of E surely face away from all of i' = a0-a1 (side 0): both ends beyond
   * a float margin behind e's line? A blocked sight line from p on i' first meets an
   * edge whose front faces p, and an edge faces a point of i' only if it faces a0 or a1
   * (its front half-plane meets the segment in a part holding an end). So such an edge
   * blocks nothing the others do not, and is left out. In doubt it stays (time only).
   */
  facesAwayFromEmitter(E: EdgeSet, e: number): boolean {
    const x0 = E.ax[e],
      y0 = E.ay[e],
      dx = E.bx[e] - x0,
      dy = E.by[e] - y0;
    const a0x = this.sx[0],
      a0y = this.sy[0],
      a1x = this.ex[0],
      a1y = this.ey[0];
    const f0 = dx * (a0y - y0) - dy * (a0x - x0),
      f1 = dx * (a1y - y0) - dy * (a1x - x0);
    const tol =
      1e-12 *
      (Math.abs(dx) + Math.abs(dy)) *
      (Math.abs(a0x - x0) + Math.abs(a0y - y0) + Math.abs(a1x - x0) + Math.abs(a1y - y0));
    return f0 < -tol && f1 < -tol;
  }

  /** orient(start of side k, its end, corner `end` (0: a, 1: b) of edge e of E). */
  private exactOrient(k: number, E: EdgeSet, e: number, end: number): number {
    const x = end === 0 ? E.ax[e] : E.bx[e],
      y = end === 0 ? E.ay[e] : E.by[e];
    return orient(this.sx[k], this.sy[k], this.ex[k], this.ey[k], x, y);
  }

  /**
   * clipEdge with the float pass done by the caller: `doubtful` has bit k set for
   * each side k (of length) that may not hold both ends strictly inside; the other
   * sides must hold them so (a side tested in vain changes nothing).
   */
  clipExact(E: EdgeSet, e: number, doubtful: number, out: SegmentClip): boolean {
    const px = E.ax[e],
      py = E.ay[e],
      qx = E.bx[e],
      qy = E.by[e];
    let t0 = 0,
      t1 = 1;
    let pIn = true,
      qIn = true;
    // Sides that p (q) is not strictly inside, and the last such side.
    let pOut = 0,
      qOut = 0,
      pSide = -1,
      qSide = -1,
      pMask = 0,
      qMask = 0;
    for (let k = 0; k < 4; k++) {
      if (!(doubtful & (1 << k))) continue;
      const x0 = this.sx[k],
        y0 = this.sy[k],
        x1 = this.ex[k],
        y1 = this.ey[k];
      // orient(side start, side end, corner), its float filter inline (see orient.ts):
      // only a doubtful case calls out, with no number to box (the + types the call's
      // result as a number, else the filter's value is boxed to meet it).
      let l = (y0 - py) * (x1 - px),
        r = (x0 - px) * (y1 - py);
      const dP = Math.abs(l - r) >= FILTER_BOUND * Math.abs(l + r) ? -(l - r) : +this.exactOrient(k, E, e, 0);
      l = (y0 - qy) * (x1 - qx);
      r = (x0 - qx) * (y1 - qy);
      const dQ = Math.abs(l - r) >= FILTER_BOUND * Math.abs(l + r) ? -(l - r) : +this.exactOrient(k, E, e, 1);
      if (dP <= 0 && dQ <= 0) return false;
      if (dP <= 0) {
        pIn = false;
        pOut++;
        pSide = k;
        pMask |= 1 << k;
      }
      if (dQ <= 0) {
        qIn = false;
        qOut++;
        qSide = k;
        qMask |= 1 << k;
      }
      if (dP < 0) t0 = Math.max(t0, dP / (dP - dQ));
      else if (dQ < 0) t1 = Math.min(t1, dP / (dP - dQ));
    }
    // A corner strictly inside H keeps its piece even when rounding makes the clipped
    // piece vanish (a corner a hair inside a side): chains must stay connected.
    if (pIn) t0 = 0;
    if (qIn) t1 = 1;
    if (!pIn && !qIn && (t1 <= t0 || (t1 - t0 < GRAZE && !this.crossesInterior(px, py, qx, qy)))) return false;
    out.t0 = t0;
    out.t1 = t1;
    out.startInside = pIn;
    out.endInside = qIn;
    // Outside (or on) one side only: the piece meets that side strictly between its
    // corners, since the other sides hold p (q) strictly and the segment strictly.
    // Outside a string and i's or j's line: see STRING_PAST.
    out.startSide = pOut === 1 ? pSide : pOut === 2 ? STRING_PAST[pMask] : -1;
    out.endSide = qOut === 1 ? qSide : qOut === 2 ? STRING_PAST[qMask] : -1;
    return true;
  }
}
