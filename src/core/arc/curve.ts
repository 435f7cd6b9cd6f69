import type { EdgeSet } from '../edges';

// Lengths: Math.sqrt of the sum of squares, not Math.hypot (see tangents.ts).

// One edge of a pair as a curve: a straight segment or an arc of an exact circle.
// Sketch units, angles in radians anticlockwise from +x.

// Fields that hold fractions start as NaN (a double) until load: a field first stored
// as a small integer changes its layout when it first holds a fraction, and V8 then
// discards the code compiled for the old layout (DEVELOPERS.md, "Two V8 habits").
export class Curve {
  isArc = false;
  /** Segment a -> b, radiating side on the left. */
  ax = NaN;
  ay = NaN;
  bx = NaN;
  by = NaN;
  /** Arc: circle index, centre, radius, start angle and span (anticlockwise), and whether it radiates outward. */
  circle = -1;
  cx = NaN;
  cy = NaN;
  r = NaN;
  start = NaN;
  span = NaN;
  solid = false;
  length = NaN;
  /** Arc: its index in the sketch's arcs, and their shapes computed once (null: compute here). */
  arc = -1;
  shapes: ArcShapes | null = null;

  /** Load edge `id` of `E` (straight edges first, then arcs), taking an arc's end points from `shapes` when given. */
  load(E: EdgeSet, id: number, shapes: ArcShapes | null = null): void {
    if (id < E.count) {
      this.isArc = false;
      this.circle = -1;
      this.arc = -1;
      this.ax = E.ax[id];
      this.ay = E.ay[id];
      this.bx = E.bx[id];
      this.by = E.by[id];
      this.length = E.length[id];
      return;
    }
    const A = E.arcs,
      a = id - E.count,
      c = A.circle[a];
    this.isArc = true;
    this.circle = c;
    this.cx = A.cx[c];
    this.cy = A.cy[c];
    this.r = A.r[c];
    this.start = A.start[a];
    this.span = A.span[a];
    this.solid = A.circleIsEnclosure[c] === 0;
    this.length = A.length[a];
    this.arc = a;
    this.shapes = shapes;
    if (shapes) {
      const e = shapes.ends;
      this.ax = e[4 * a];
      this.ay = e[4 * a + 1];
      this.bx = e[4 * a + 2];
      this.by = e[4 * a + 3];
      return;
    }
    // Arc end points, used as the arc's fixed points when it is the target.
    this.ax = this.cx + this.r * Math.cos(this.start);
    this.ay = this.cy + this.r * Math.sin(this.start);
    this.bx = this.cx + this.r * Math.cos(this.start + this.span);
    this.by = this.cy + this.r * Math.sin(this.start + this.span);
  }

  /** Is the angle `t` (radians) on the arc? (Closed range, angle taken modulo 2 pi.) */
  holdsAngle(t: number): boolean {
    return angleOffset(t, this.start) <= this.span;
  }

  /**
   * Append to `out` (flat x, y) a convex outer bound of the curve: a segment's ends, or
   * an arc's ends plus the corners where the tangents of each sub-arc of at most a
   * quarter turn meet (the arc lies inside that polygon).
   */
  outerPoints(out: number[]): void {
    if (!this.isArc) {
      out.push(this.ax, this.ay, this.bx, this.by);
      return;
    }
    const S = this.shapes;
    if (S) {
      for (let k = S.outerAt[this.arc]; k < S.outerAt[this.arc + 1]; k++) out.push(S.outer[k]);
      return;
    }
    const m = Math.max(1, Math.ceil(this.span / (Math.PI / 2) - 1e-12));
    const step = this.span / m;
    const far = this.r / Math.cos(step / 2);
    for (let k = 0; k <= m; k++) {
      const t = this.start + k * step;
      out.push(this.cx + this.r * Math.cos(t), this.cy + this.r * Math.sin(t));
      if (k < m) out.push(this.cx + far * Math.cos(t + step / 2), this.cy + far * Math.sin(t + step / 2));
    }
  }
}

/** (t - from) reduced to [0, 2 pi), radians. */
export function angleOffset(t: number, from: number): number {
  const turn = 2 * Math.PI;
  let u = (t - from) % turn;
  if (u < 0) u += turn;
  return u;
}

/**
 * Does every point of curve `b` lie surely behind every point of curve `a` (behind the
 * line of a segment; behind the tangent at every point of a solid circle's arc)? Then
 * no sight line leaves a's front towards b, and the pair exchanges nothing. b is
 * bounded by its outer polygon (outerPoints, which holds the curve), and for an arc
 * the reach in front of its tangents, max over its angles of (y - c) . u, is convex in
 * y, so the polygon's corners decide. Float tests with margins that say no in doubt;
 * an enclosure circle's arcs face inwards and always say no. `scratch` is reused.
 */
export function surelyBehind(a: Curve, b: Curve, scratch: number[]): boolean {
  // An enclosure circle's arc faces inwards; a whole solid circle faces every way.
  if (a.isArc && (!a.solid || a.span >= 2 * Math.PI)) return false;
  // A whole circle: its centre, reach r further (one test, no outer polygon).
  if (b.isArc && b.span >= 2 * Math.PI) return pointBehind(a, b.cx, b.cy, b.r);
  if (!b.isArc) return pointBehind(a, b.ax, b.ay, 0) && pointBehind(a, b.bx, b.by, 0);
  const S = b.shapes;
  if (S) {
    // The arc's outer polygon as computed once for the sketch (no copy).
    const P = S.outer;
    for (let k = S.outerAt[b.arc]; k < S.outerAt[b.arc + 1]; k += 2)
      if (!pointBehind(a, P[k], P[k + 1], 0)) return false;
    return true;
  }
  scratch.length = 0;
  b.outerPoints(scratch);
  for (let k = 0; k < scratch.length; k += 2) if (!pointBehind(a, scratch[k], scratch[k + 1], 0)) return false;
  return true;
}

/** Is every point within `reach` of (x, y) surely behind curve a (a segment, or a solid arc short of a whole circle)? */
function pointBehind(a: Curve, x: number, y: number, reach: number): boolean {
  if (!a.isArc) {
    const dx = a.bx - a.ax,
      dy = a.by - a.ay;
    const len = Math.sqrt(dx * dx + dy * dy);
    // Signed distance of (x, y) in front of a's line, less a margin far above rounding.
    const f = (dx * (y - a.ay) - dy * (x - a.ax)) / len;
    return f + reach * (1 + 1e-9) < -1e-12 * (Math.abs(x - a.ax) + Math.abs(y - a.ay) + len);
  }
  const fx = x - a.cx,
    fy = y - a.cy;
  const d = Math.sqrt(fx * fx + fy * fy);
  // Angular distance from the point's direction to the arc's range of angles.
  const off = angleOffset(Math.atan2(fy, fx), a.start);
  if (off <= a.span) return false;
  const apart = Math.min(off - a.span, 2 * Math.PI - off);
  const ahead = apart >= Math.PI / 2 ? 0 : d * Math.cos(apart); // max over the arc of (y - c) . u
  return ahead + reach * (1 + 1e-9) < a.r * (1 - 1e-9) - 1e-12 * d;
}

/**
 * Distance from p along the unit direction (ux, uy) to where the line crosses the
 * target (its circle, for an arc) clearly, at an angle and away from its ends, or 0
 * when it may miss it or only graze it. A line nearly along a straight target (p on
 * its line, where the target turns edge-on) or nearly touching a target circle meets
 * it at a place that moves far with a tiny turn of the line, so no neighbourhood of
 * the direction is then known to see the target there. Sketch units.
 */
export function clearCrossing(tg: Curve, px: number, py: number, ux: number, uy: number): number {
  if (!tg.isArc) {
    const ex = tg.bx - tg.ax,
      ey = tg.by - tg.ay;
    const den = ux * ey - uy * ex;
    if (!(Math.abs(den) > 1e-6 * tg.length)) return 0;
    const wx = tg.ax - px,
      wy = tg.ay - py;
    const along = (wx * ey - wy * ex) / den,
      u = (wx * uy - wy * ux) / den;
    return u > 1e-6 && u < 1 - 1e-6 && along > 0 ? along : 0;
  }
  const fx = px - tg.cx,
    fy = py - tg.cy;
  const b = fx * ux + fy * uy;
  const disc = b * b - (fx * fx + fy * fy - tg.r * tg.r);
  if (!(disc > 1e-6 * tg.r * tg.r)) return 0;
  const along = tg.solid ? -b - Math.sqrt(disc) : -b + Math.sqrt(disc);
  return along > 0 ? along : 0;
}

/**
 * Each arc's end points and outer polygon (Curve.load, outerPoints), computed once per
 * sketch: a pair of arcs asked for them by trigonometry every time (a tube bank split
 * for flux profiles has hundreds of thousands of pairs). The same numbers.
 */
export class ArcShapes {
  /** Per arc: a's x, y, b's x, y (sketch units). */
  readonly ends: Float64Array;
  /** Arc a's outer polygon is outer[outerAt[a] .. outerAt[a + 1]) (flat x, y). */
  readonly outerAt: Int32Array;
  readonly outer: Float64Array;

  constructor(E: EdgeSet) {
    const n = E.arcs.count,
      c = new Curve(),
      points: number[] = [];
    this.ends = new Float64Array(4 * n);
    this.outerAt = new Int32Array(n + 1);
    for (let a = 0; a < n; a++) {
      c.load(E, E.count + a);
      this.ends.set([c.ax, c.ay, c.bx, c.by], 4 * a);
      c.outerPoints(points);
      this.outerAt[a + 1] = points.length;
    }
    this.outer = Float64Array.from(points);
  }
}
