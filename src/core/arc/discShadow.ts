import { discUmbraLines } from '../discUmbra';
import type { Curve } from './curve';

// Lengths: Math.sqrt of the sum of squares, not Math.hypot (see tangents.ts).

// Does one solid circle hide a target from all of an emitter? Then the pair exchanges
// nothing, and the exact integration (events between every pair of blockers, then one
// visibility query per piece) can be skipped: in a row of tubes each tube hides the
// ones beyond its neighbour, and those pairs were most of such a sketch's time.
//
// Disc A hides everything of a convex target T from point p when p lies in A's umbra
// of T (core/discUmbra.ts). For a disc target that is the umbra of the disc; for a
// straight target (b0, b1) the umbra of each end, T a point. Each condition is a
// half-plane, so it holds along the emitter when it holds at a segment's ends, or at
// the lowest point of an arc. Float tests with a margin (see hides).

/** Sketch units: a half-plane test passes down to -margin (rounding of lines that graze the emitter). */
export class DiscShadow {
  /** Lines n . x + w >= 0 that the emitter must keep to: nx, ny, w (|n| = 1). */
  private readonly lines = new Float64Array(18);
  private count = 0;

  /**
   * `margin`: how far the emitter may stray across a line, sketch units. A tube row's
   * tubes all touch the same two lines, so the margin must pass a graze; where it lets
   * a point of the emitter lie up to `margin` across, the sight lines it could let
   * past A are within margin / distance radians of a tangent: rounding.
   */
  constructor(private readonly margin: number) {}

  /**
   * True when the solid circle (cx, cy, r) hides every point of target `tg` from every
   * point of emitter `em`: every sight line between them meets the disc. False when
   * not shown: a target on a concave (enclosure) arc, or any test failing.
   */
  hides(em: Curve, tg: Curve, cx: number, cy: number, r: number): boolean {
    if (tg.isArc) return tg.solid && this.hidesDisc(em, tg.cx, tg.cy, tg.r, cx, cy, r);
    this.count = 0;
    if (!this.discUmbra(cx, cy, r, tg.ax, tg.ay, 0) || !this.discUmbra(cx, cy, r, tg.bx, tg.by, 0)) return false;
    return this.emitterKeeps(em);
  }

  /** As hides, for the whole disc (tx, ty, tr) as the target. */
  hidesDisc(em: Curve, tx: number, ty: number, tr: number, cx: number, cy: number, r: number): boolean {
    this.count = 0;
    return this.discUmbra(cx, cy, r, tx, ty, tr) && this.emitterKeeps(em);
  }

  /** Does the whole emitter keep to every line gathered (down to -margin)? */
  private emitterKeeps(em: Curve): boolean {
    const L = this.lines;
    for (let k = 0; k < this.count; k++) {
      if (lowestOn(em, L[3 * k], L[3 * k + 1], L[3 * k + 2]) < -this.margin) return false;
    }
    return true;
  }

  /** Add the three lines of disc A's umbra of disc T (tr = 0: a point); false when T is not wholly apart from A. */
  private discUmbra(ax: number, ay: number, ar: number, tx: number, ty: number, tr: number): boolean {
    if (!discUmbraLines(ax, ay, ar, tx, ty, tr, this.lines, 3 * this.count)) return false;
    this.count += 3;
    return true;
  }
}

/** Least value of n . x + w over the curve (|n| = 1; sketch units). */
function lowestOn(em: Curve, nx: number, ny: number, w: number): number {
  const atA = nx * em.ax + ny * em.ay + w,
    atB = nx * em.bx + ny * em.by + w;
  let low = Math.min(atA, atB);
  if (em.isArc && em.holdsAngle(Math.atan2(-ny, -nx))) {
    low = Math.min(low, nx * em.cx + ny * em.cy + w - em.r);
  }
  return low;
}
