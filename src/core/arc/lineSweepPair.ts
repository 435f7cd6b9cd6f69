import type { ArcSet } from './arcs';
import type { Curve } from './curve';
import { LineSweep } from './lineSweep';
import type { PairScene } from './pairScene';

// When two straight edges may take the line sweep (lineSweep.ts) instead of the
// integration along the emitter: each edge cut to its part in front of the other's
// line, every blocking circle wholly in front of both lines (a line that crosses both
// edges and such a disc is blocked by it) or wholly behind one of them (it blocks
// nothing), and no polygon edge entering the quadrilateral the two edges span (every
// sight line lies in it). Float tests with margins; in doubt the pair is left to the
// integration. Sketch units.

/** Fewest blocking circles for the sweep: below, the integration along the emitter costs less. */
export const SWEEP_FROM_CIRCLES = 8;

/** Relative slack on radii: far above the rounding of the distances below. */
const SLACK = 1e-9;

export class LineSweepPair {
  private readonly sweep = new LineSweep();
  private readonly kept: number[] = [];
  /** The two edges cut to their facing parts: a0, a1, b0, b1 (x, y). */
  private readonly q = new Float64Array(8);

  /** `margin`: absolute margin of the side tests (sketch units, from the sketch's extent). */
  constructor(private readonly margin: number) {}

  /**
   * L_i F_ij (sketch units) of straight edges `em` and `tg` past the scene's blockers
   * by the line sweep, or -1 when the pair is not one it takes (then integrate it).
   */
  exchange(em: Curve, tg: Curve, scene: PairScene, A: ArcSet): number {
    const circles = scene.circles;
    if (em.isArc || tg.isArc || circles.length < SWEEP_FROM_CIRCLES) return -1;
    const q = this.q;
    if (!facingPart(em, tg, q, 0) || !facingPart(tg, em, q, 4)) return -1;
    const kept = this.kept,
      m = this.margin;
    kept.length = 0;
    for (let k = 0; k < circles.length; k++) {
      const c = circles[k];
      const r = A.r[c] * (1 + SLACK) + m;
      const di = sideDistance(em.ax, em.ay, em.bx, em.by, A.cx[c], A.cy[c]),
        dj = sideDistance(tg.ax, tg.ay, tg.bx, tg.by, A.cx[c], A.cy[c]);
      if (di > r && dj > r) kept.push(c);
      else if (!(di < -r || dj < -r)) return -1; // across a line: left to the integration
    }
    const seg = scene.seg;
    for (let s = 0; s < seg.length; s += 4) if (this.entersQuad(seg[s], seg[s + 1], seg[s + 2], seg[s + 3])) return -1;
    const g = this.sweep.exchange(q[0], q[1], q[2], q[3], q[4], q[5], q[6], q[7], A.cx, A.cy, A.r, kept);
    return g >= 0 ? g : -1;
  }

  /** May the segment enter the open quadrilateral a0 a1 b0 b1 (anticlockwise)? No when both ends lie on or outside one side. */
  private entersQuad(x0: number, y0: number, x1: number, y1: number): boolean {
    const q = this.q,
      m = this.margin;
    for (let k = 0; k < 4; k++) {
      const n = (k + 1) & 3;
      const sx = q[2 * k],
        sy = q[2 * k + 1],
        ex = q[2 * n],
        ey = q[2 * n + 1];
      if (sx === ex && sy === ey) continue; // two edges meeting at a corner: a triangle
      if (sideDistance(sx, sy, ex, ey, x0, y0) <= m && sideDistance(sx, sy, ex, ey, x1, y1) <= m) return false;
    }
    return true;
  }
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
