import type { Point, Shape } from '../sketchFile';
import { signedArea2 } from '../../core/edges';

/** Signed area (sketch units^2); positive when the points run anticlockwise with y up. The core's sum, relative to the first point. */
export function signedArea(points: readonly Point[]): number {
  return signedArea2(points.flat()) / 2;
}

// Per points array: the store keeps the array of every shape an edit leaves alone.
const orientation = new WeakMap<readonly Point[], boolean>();

/** Whether the points run anticlockwise (y up); one area per points array, not one per edge. */
export function isAnticlockwise(points: readonly Point[]): boolean {
  let ccw = orientation.get(points);
  if (ccw === undefined) orientation.set(points, (ccw = signedArea(points) > 0));
  return ccw;
}

/** Surface name of every edge, whether the shape stores one name or one per edge. */
export function edgeNames(shape: Shape): string[] {
  // A circle has no points: one name per arc (anticlockwise from +x).
  if (shape.circle) return typeof shape.surface === 'string' ? [shape.surface] : [...shape.surface];
  const n = shape.points.length;
  if (typeof shape.surface === 'string') return new Array<string>(n).fill(shape.surface);
  return shape.points.map((_, k) => shape.surface[k] ?? `edge ${k + 1}`);
}

export function edgeEnds(shape: Shape, k: number): [Point, Point] {
  const n = shape.points.length;
  return [shape.points[k], shape.points[(k + 1) % n]];
}

export function edgeLength(shape: Shape, k: number): number {
  const [a, b] = edgeEnds(shape, k);
  return Math.hypot(b[0] - a[0], b[1] - a[1]);
}

/** Unit normal of edge k pointing to the side that radiates (into an enclosure, out of a solid). */
export function radiatingNormal(shape: Shape, k: number): Point {
  const [a, b] = edgeEnds(shape, k);
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy) || 1;
  // Left of the edge (y up) is the inside of an anticlockwise polygon.
  const left: Point = [-dy / len, dx / len];
  const ccw = isAnticlockwise(shape.points);
  const towardLeft = (shape.kind === 'enclosure') === ccw;
  return towardLeft ? left : [-left[0], -left[1]];
}

export function pointInPolygon(p: Point, points: readonly Point[]): boolean {
  let inside = false;
  for (let i = 0, j = points.length - 1; i < points.length; j = i++) {
    const [xi, yi] = points[i];
    const [xj, yj] = points[j];
    if (yi > p[1] !== yj > p[1] && p[0] < ((xj - xi) * (p[1] - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/** Closest point on segment ab to p, and the parameter t in [0, 1] along it. */
export function closestOnSegment(p: Point, a: Point, b: Point): { point: Point; t: number; distance: number } {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  let t = len2 > 0 ? ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2 : 0;
  t = Math.max(0, Math.min(1, t));
  const point: Point = [a[0] + t * dx, a[1] + t * dy];
  return { point, t, distance: Math.hypot(p[0] - point[0], p[1] - point[1]) };
}

// The box of the sketch (points and circles) for fitting the view: the reader's own (document/sketchSize.ts).
export { sketchBounds, type Bounds } from '../../document/sketchSize';
