// Rectangle and regular-polygon ("tube") kernels: two points in, outline out.
import type { Point } from '../sketchFile';

/** Axis-aligned rectangle from two opposite corners, anticlockwise; null if it has no area. */
export function rectangleFromCorners(a: Point, b: Point): Point[] | null {
  const x0 = Math.min(a[0], b[0]);
  const x1 = Math.max(a[0], b[0]);
  const y0 = Math.min(a[1], b[1]);
  const y1 = Math.max(a[1], b[1]);
  if (!(x1 > x0) || !(y1 > y0)) return null;
  return [
    [x0, y0],
    [x1, y0],
    [x1, y1],
    [x0, y1],
  ];
}

/**
 * Regular polygon with `sides` vertices on the circle through `rim` around `centre`,
 * anticlockwise, first vertex towards `rim`. Null if the radius is zero.
 */
export function regularPolygon(centre: Point, rim: Point, sides: number): Point[] | null {
  const n = Math.max(3, Math.min(256, Math.round(sides)));
  const r = Math.hypot(rim[0] - centre[0], rim[1] - centre[1]);
  if (!(r > 0)) return null;
  const start = Math.atan2(rim[1] - centre[1], rim[0] - centre[0]);
  const pts: Point[] = [];
  for (let k = 0; k < n; k++) {
    const a = start + (2 * Math.PI * k) / n;
    pts.push([tidy(centre[0] + r * Math.cos(a)), tidy(centre[1] + r * Math.sin(a))]);
  }
  return pts;
}

/** Trim float noise from trigonometry so coordinates read cleanly in the file. */
function tidy(v: number): number {
  return Number(v.toPrecision(12));
}
