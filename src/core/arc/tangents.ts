import { ExactValueSet, sortPrefix as sortPrefixIn } from '../scratch';
import { angleOffset as angleOffsetIn, type Curve } from './curve';

// Lengths are Math.sqrt(x * x + y * y), not Math.hypot: hypot allocates on every call
// in V8 (0.8 GB per run of the 50-tube bench furnace), and sketch coordinates are far
// from overflow.
// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call (as in src/core/pair).
const sortPrefix = sortPrefixIn;
const angleOffset = angleOffsetIn;

// Lines that touch circles, and where such lines cross the emitting curve. Sketch
// units, angles in radians anticlockwise from +x.

/**
 * Up to four common tangent lines of circles (c1, r1) and (c2, r2), written to `out`
 * as (nx, ny, w) triples of the line n . x + w = 0 (|n| = 1); returns how many.
 * Circle 1 touches the line at c1 - r1 n; circle 2 at c2 - s r2 n, s = +1 for the
 * two outer tangents and -1 for the two crossing ones.
 */
export function commonTangents(
  c1x: number,
  c1y: number,
  r1: number,
  c2x: number,
  c2y: number,
  r2: number,
  out: Float64Array,
): number {
  const dx = c2x - c1x,
    dy = c2y - c1y;
  const d = Math.sqrt(dx * dx + dy * dy);
  if (!(d > 0)) return 0;
  const phi = Math.atan2(dy, dx);
  let n = 0;
  for (let s = 1; s >= -1; s -= 2) {
    const c = (s * r2 - r1) / d;
    if (c > 1 || c < -1) continue;
    const w = Math.acos(c);
    for (let side = -1; side <= 1; side += 2) {
      const psi = phi + side * w;
      const nx = Math.cos(psi),
        ny = Math.sin(psi);
      out[3 * n] = nx;
      out[3 * n + 1] = ny;
      out[3 * n + 2] = r1 - (nx * c1x + ny * c1y);
      n++;
    }
  }
  return n;
}

/**
 * Angles (radians) of the two points where lines from (px, py) touch circle (cx, cy, r):
 * alpha +- beta, alpha the angle of p about the centre, beta = atan2(t, r) with t the
 * tangent length. Returns false when p lies inside the circle.
 */
export function touchAngles(px: number, py: number, cx: number, cy: number, r: number, out: Float64Array): boolean {
  const fx = px - cx,
    fy = py - cy;
  const d = Math.sqrt(fx * fx + fy * fy);
  if (!(d >= r)) return false;
  const alpha = Math.atan2(fy, fx);
  const beta = Math.atan2(Math.sqrt((d - r) * (d + r)), r);
  out[0] = alpha + beta;
  out[1] = alpha - beta;
  return true;
}

/**
 * Decides whether an alignment event can matter: p on the emitter (unit normal n
 * there; zero for a horizon event) lines up with objects at (x1, y1) and (x2, y2).
 * `event` holds px, py, nx, ny, x1, y1, x2, y2 (sketch units).
 */
export interface EventFilter {
  keeps(event: Float64Array): boolean;
}

/** Breakpoints along an emitting curve: parameters (segment: fraction from a; arc: angle from its start). */
export class CurveBreaks {
  at = new Float64Array(64);
  count = 0;
  /** Set per pair: events it rejects make no breakpoint. */
  filter: EventFilter | null = null;
  // The event being added: objects at (x1, y1) and (x2, y2) on a line of direction
  // (ux, uy), and where it crosses the curve (u). Kept in fields, not passed on as
  // arguments: doubles passed to a call the engine does not inline are boxed on the heap.
  private x1 = 0.5;
  private y1 = 0.5;
  private x2 = 0.5;
  private y2 = 0.5;
  private ux = 0.5;
  private uy = 0.5;
  private u = 0.5;

  /** The line through (x1, y1) with direction (ux, uy), lining up objects at (x1, y1) and (x2, y2). */
  addEvent(cur: Curve, x1: number, y1: number, ux: number, uy: number, x2: number, y2: number): void {
    this.x1 = x1;
    this.y1 = y1;
    this.x2 = x2;
    this.y2 = y2;
    this.ux = ux;
    this.uy = uy;
    this.addLine(cur);
  }

  /** A point of an arc emitter whose horizon lines up with the object at (x, y). */
  addHorizonEvent(cur: Curve, t: number, x: number, y: number): void {
    const u = angleOffset(t, cur.start);
    if (!(u > 0 && u < cur.span)) return;
    const px = cur.cx + cur.r * Math.cos(t),
      py = cur.cy + cur.r * Math.sin(t);
    if (this.filter && !this.filter.keeps(this.fill(px, py, 0, 0, x, y, x, y))) return;
    this.push(u);
  }

  /** Keeps the crossing at parameter this.u when the filter says it can matter. */
  private consider(cur: Curve): void {
    const u = this.u;
    const f = this.filter;
    if (!f) {
      this.push(u);
      return;
    }
    // Many alignments repeat exactly (the outer tangents of tubes in a row are one line).
    if (this.seen.has(u)) return;
    let px: number, py: number, nx: number, ny: number;
    if (cur.isArc) {
      const t = cur.start + u;
      const c = Math.cos(t),
        s = Math.sin(t);
      px = cur.cx + cur.r * c;
      py = cur.cy + cur.r * s;
      const side = cur.solid ? 1 : -1;
      nx = side * c;
      ny = side * s;
    } else {
      px = cur.ax + u * (cur.bx - cur.ax);
      py = cur.ay + u * (cur.by - cur.ay);
      nx = -(cur.by - cur.ay) / cur.length;
      ny = (cur.bx - cur.ax) / cur.length;
    }
    if (f.keeps(this.fill(px, py, nx, ny, this.x1, this.y1, this.x2, this.y2))) {
      this.seen.add(u);
      this.push(u);
    }
  }

  /** Breakpoints already kept for this pair. */
  private readonly seen = new ExactValueSet();
  /** The event handed to the filter. */
  private readonly event = new Float64Array(8);

  private fill(px: number, py: number, nx: number, ny: number, x1: number, y1: number, x2: number, y2: number) {
    const e = this.event;
    e[0] = px;
    e[1] = py;
    e[2] = nx;
    e[3] = ny;
    e[4] = x1;
    e[5] = y1;
    e[6] = x2;
    e[7] = y2;
    return e;
  }

  reset(): void {
    this.count = 0;
    this.seen.clear();
  }

  private push(u: number): void {
    if (this.count === this.at.length) {
      const g = new Float64Array(2 * this.count);
      g.set(this.at);
      this.at = g;
    }
    this.at[this.count++] = u;
  }

  /** Where the event's line, through (x1, y1) with direction (ux, uy), crosses the curve's interior. */
  private addLine(cur: Curve): void {
    const px = this.x1,
      py = this.y1,
      ux = this.ux,
      uy = this.uy;
    if (!cur.isArc) {
      const ex = cur.bx - cur.ax,
        ey = cur.by - cur.ay;
      const den = ex * uy - ey * ux;
      if (den === 0) return;
      const s = ((px - cur.ax) * uy - (py - cur.ay) * ux) / den;
      if (s > 0 && s < 1) {
        this.u = s;
        this.consider(cur);
      }
      return;
    }
    const len = Math.sqrt(ux * ux + uy * uy);
    if (!(len > 0)) return;
    const dx = ux / len,
      dy = uy / len;
    const fx = px - cur.cx,
      fy = py - cur.cy;
    // Foot of the perpendicular from the centre, then +- half the chord.
    const b = fx * dx + fy * dy;
    const mx = fx - b * dx,
      my = fy - b * dy;
    const h2 = (cur.r - Math.sqrt(mx * mx + my * my)) * (cur.r + Math.sqrt(mx * mx + my * my));
    if (!(h2 > 0)) return;
    const h = Math.sqrt(h2);
    for (let side = -1; side <= 1; side += 2) {
      const u = angleOffset(Math.atan2(my + side * h * dy, mx + side * h * dx), cur.start);
      if (u > 0 && u < cur.span) {
        this.u = u;
        this.consider(cur);
      }
    }
  }

  /** A point of the arc given by its angle about the arc's centre. */
  addAngle(cur: Curve, t: number): void {
    const u = angleOffset(t, cur.start);
    if (u > 0 && u < cur.span) this.push(u);
  }

  /** Sort the breakpoints ascending. */
  sort(): void {
    sortPrefix(this.at, this.count);
  }
}
