import { Curve } from '../../../src/core/arc/curve';

// Curves built by hand for tests that call the circle integrator's parts directly.

/** The straight edge a -> b (radiating on its left). */
export function segment(ax: number, ay: number, bx: number, by: number): Curve {
  const c = new Curve();
  c.isArc = false;
  c.ax = ax;
  c.ay = ay;
  c.bx = bx;
  c.by = by;
  c.length = Math.sqrt((bx - ax) ** 2 + (by - ay) ** 2);
  return c;
}

/** An arc of circle 0, anticlockwise from `start` over `span` (radians); a tube's when solid. */
export function arc(cx: number, cy: number, r: number, start: number, span: number, solid = true): Curve {
  const c = new Curve();
  c.isArc = true;
  c.circle = 0;
  c.cx = cx;
  c.cy = cy;
  c.r = r;
  c.start = start;
  c.span = span;
  c.solid = solid;
  c.length = r * span;
  c.ax = cx + r * Math.cos(start);
  c.ay = cy + r * Math.sin(start);
  c.bx = cx + r * Math.cos(start + span);
  c.by = cy + r * Math.sin(start + span);
  return c;
}
