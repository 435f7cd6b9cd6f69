import type { ArcSet } from './arcs';
import type { Curve } from './curve';
import type { DiscShadow } from './discShadow';
import { HiddenCircles } from './hiddenCircles';
import { LineSweep } from './lineSweep';
import type { PairScene } from './pairScene';

// When a pair may take the line sweep (lineSweep.ts) instead of the integration along
// the emitter: each curve a straight edge, a whole solid circle or an arc of one under
// half a turn (arcMember.ts; a circle below means the arc's circle); a straight edge cut
// to its part in front of the other's line, and a circle wholly in front of a straight
// partner's line; every blocking circle wholly in front of each straight member's line
// (then a line that crosses the member and the circle meets the circle past the
// member) or wholly behind one (it blocks nothing), and apart from a round member; and
// no polygon edge entering the pair's outer hull (every sight line lies in it). Float
// tests with margins; in doubt the pair is left to the integration. Sketch units.

/** Relative slack on radii: far above the rounding of the distances below. */
const SLACK = 1e-9;
/**
 * Smallest member for the sweep, relative to the pair's hull: its error is about 1e-16
 * of the hull per swap-free stretch, so a member 1e-4 of it keeps about 1e-12 of its
 * own factor.
 */
const TINY = 1e-4;

export class LineSweepPair {
  private readonly sweep = new LineSweep();
  private readonly kept: number[] = [];
  /** Straight members cut to their facing parts: a0, a1 of the emitter, then of the target (x, y). */
  private readonly q = new Float64Array(8);

  private readonly hidden = new HiddenCircles();

  /**
   * `margin`: absolute margin of the side tests (sketch units, from the sketch's
   * extent); `shadow`: the umbra test that finds circles hidden from a whole curve.
   */
  constructor(
    private readonly margin: number,
    private readonly shadow: DiscShadow,
  ) {}

  /**
   * L_i F_ij (sketch units) of `em` and `tg` past the scene's blockers by the line
   * sweep, or -1 when the pair is not one it takes (then integrate it).
   */
  exchange(em: Curve, tg: Curve, scene: PairScene, A: ArcSet): number {
    const circles = scene.circles;
    if (!whole(em) || !whole(tg)) return -1;
    const q = this.q,
      m = this.margin;
    if (!em.isArc && !tg.isArc) {
      if (!facingPart(em, tg, q, 0) || !facingPart(tg, em, q, 4)) return -1;
    } else {
      // A circle wholly in front of a straight partner sees all of it.
      if (!em.isArc && !inFront(em, tg.cx, tg.cy, tg.r * (1 + SLACK) + m)) return -1;
      if (!tg.isArc && !inFront(tg, em.cx, em.cy, em.r * (1 + SLACK) + m)) return -1;
      if (!em.isArc) ends(em, q, 0);
      if (!tg.isArc) ends(tg, q, 4);
    }
    // The sweep's rounding is relative to the pair's size, the integration's to the
    // emitter's length: a member far smaller than the pair is left to the integration.
    if (Math.min(memberLength(em), memberLength(tg)) < TINY * hullWidth(scene.hull)) return -1;
    const kept = this.kept;
    kept.length = 0;
    for (let k = 0; k < circles.length; k++) {
      const c = circles[k];
      const r = A.r[c] * (1 + SLACK) + m;
      const x = A.cx[c],
        y = A.cy[c];
      if ((em.isArc && !apart(em, x, y, r)) || (tg.isArc && !apart(tg, x, y, r))) return -1;
      const di = em.isArc ? Infinity : sideDistance(em.ax, em.ay, em.bx, em.by, x, y),
        dj = tg.isArc ? Infinity : sideDistance(tg.ax, tg.ay, tg.bx, tg.by, x, y);
      if (di > r && dj > r) kept.push(c);
      else if (!(di < -r || dj < -r)) return -1; // across a line: left to the integration
    }
    // The circles nearest the target may hide others from all of it too: along a line
    // that meets such a circle between the members, they are met first (hiddenCircles.ts,
    // done from the emitter's side already).
    kept.length = this.hidden.keepSeen(kept, A, tg, this.shadow);
    const seg = scene.seg;
    for (let s = 0; s < seg.length; s += 4)
      if (this.entersHull(scene.hull, seg[s], seg[s + 1], seg[s + 2], seg[s + 3])) return -1;
    const L = this.sweep;
    const ax = em.isArc ? em.cx : 0.5 * (q[0] + q[2]),
      ay = em.isArc ? em.cy : 0.5 * (q[1] + q[3]),
      bx = tg.isArc ? tg.cx : 0.5 * (q[4] + q[6]),
      by = tg.isArc ? tg.cy : 0.5 * (q[5] + q[7]);
    L.origin(0.5 * (ax + bx), 0.5 * (ay + by));
    this.member(0, em, q);
    this.member(1, tg, q);
    const g = L.exchange(A.cx, A.cy, A.r, kept);
    return g >= 0 ? g : -1;
  }

  /** Give the sweep curve c as member m (a straight one cut to q[4m..4m+3]). */
  private member(m: number, c: Curve, q: Float64Array): void {
    const L = this.sweep;
    if (!c.isArc) L.segment(m, q[4 * m], q[4 * m + 1], q[4 * m + 2], q[4 * m + 3]);
    else if (c.span >= 2 * Math.PI) L.circle(m, c.cx, c.cy, c.r);
    else L.arc(m, c.cx, c.cy, c.r, c.start, c.span);
  }

  /** May the segment enter the open convex hull H (flat x, y, anticlockwise)? No when both ends lie on or outside one side. */
  private entersHull(H: readonly number[], x0: number, y0: number, x1: number, y1: number): boolean {
    const n = H.length >> 1,
      m = this.margin;
    if (n < 3) return true;
    for (let k = 0; k < n; k++) {
      const e = k + 1 === n ? 0 : k + 1;
      const sx = H[2 * k],
        sy = H[2 * k + 1],
        ex = H[2 * e],
        ey = H[2 * e + 1];
      if (sx === ex && sy === ey) continue;
      if (sideDistance(sx, sy, ex, ey, x0, y0) <= m && sideDistance(sx, sy, ex, ey, x1, y1) <= m) return false;
    }
    return true;
  }
}

/** A curve's length (sketch units): a segment's, an arc's r span. */
function memberLength(c: Curve): number {
  return c.isArc ? c.r * Math.min(c.span, 2 * Math.PI) : Math.sqrt((c.bx - c.ax) ** 2 + (c.by - c.ay) ** 2);
}

/** Largest width of a hull's bounding box (flat x, y; sketch units). */
function hullWidth(H: readonly number[]): number {
  let x0 = Infinity,
    x1 = -Infinity,
    y0 = Infinity,
    y1 = -Infinity;
  for (let k = 0; k < H.length; k += 2) {
    x0 = Math.min(x0, H[k]);
    x1 = Math.max(x1, H[k]);
    y0 = Math.min(y0, H[k + 1]);
    y1 = Math.max(y1, H[k + 1]);
  }
  return Math.max(x1 - x0, y1 - y0, 0);
}

/** A straight edge's ends into out[at..at+3]. */
function ends(c: Curve, out: Float64Array, at: number): void {
  out[at] = c.ax;
  out[at + 1] = c.ay;
  out[at + 2] = c.bx;
  out[at + 3] = c.by;
}

/** A straight edge, a whole solid circle, or an arc of one under half a turn (arcMember.ts). */
function whole(c: Curve): boolean {
  return !c.isArc || (c.solid && (c.span >= 2 * Math.PI || c.span < Math.PI - 1e-6));
}

/** Is the disc (x, y, r) surely apart from circle member c (its own circle excluded by the caller)? */
function apart(c: Curve, x: number, y: number, r: number): boolean {
  return Math.sqrt((x - c.cx) ** 2 + (y - c.cy) ** 2) > c.r + r;
}

/** Is the disc (x, y, r) wholly in front of straight edge c's line? */
function inFront(c: Curve, x: number, y: number, r: number): boolean {
  return sideDistance(c.ax, c.ay, c.bx, c.by, x, y) > r;
}

/** Signed distance of (x, y) from the line a -> b, positive on its left (sketch units). */
function sideDistance(ax: number, ay: number, bx: number, by: number, x: number, y: number): number {
  const dx = bx - ax,
    dy = by - ay;
  return (dx * (y - ay) - dy * (x - ax)) / Math.sqrt(dx * dx + dy * dy);
}

/**
 * Write to out[at..at+3] the part of `a` on or in front of `b`'s line (ends a0, a1 in
 * `a`'s direction); false when none of it is, or only a point.
 */
function facingPart(a: Curve, b: Curve, out: Float64Array, at: number): boolean {
  const dx = b.bx - b.ax,
    dy = b.by - b.ay;
  const d0 = dx * (a.ay - b.ay) - dy * (a.ax - b.ax),
    d1 = dx * (a.by - b.ay) - dy * (a.bx - b.ax);
  if (!(d0 > 0 || d1 > 0)) return false;
  let x0 = a.ax,
    y0 = a.ay,
    x1 = a.bx,
    y1 = a.by;
  if (d0 < 0) {
    const t = d0 / (d0 - d1);
    x0 += t * (x1 - x0);
    y0 += t * (y1 - y0);
  } else if (d1 < 0) {
    const t = d1 / (d1 - d0);
    x1 += t * (x0 - x1);
    y1 += t * (y0 - y1);
  }
  out[at] = x0;
  out[at + 1] = y0;
  out[at + 2] = x1;
  out[at + 3] = y1;
  return x0 !== x1 || y0 !== y1;
}
