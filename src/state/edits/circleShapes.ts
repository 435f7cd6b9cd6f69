// Exact circles in the app: arcs, their angles and the nearest arc to a point.
// A circle shape has no points; its arcs split it into equal parts running
// anticlockwise from +x (angle 0), one per surface name.
import type { Point, Shape } from '../sketchFile';
import { edgeNames } from '../geometry/polygon';

export type CircleShape = Shape & { circle: NonNullable<Shape['circle']> };

export function isCircle(shape: Shape | undefined): shape is CircleShape {
  return !!shape?.circle;
}

/** Number of arcs (at least 1). */
export function arcCount(shape: CircleShape): number {
  return Math.max(1, edgeNames(shape).length);
}

/** Start and end angle of arc k, radians anticlockwise from +x (end > start). */
export function arcAngles(shape: CircleShape, k: number): [number, number] {
  const step = (2 * Math.PI) / arcCount(shape);
  return [k * step, (k + 1) * step];
}

/** Point on the rim at angle a (radians from +x), sketch units. */
export function rimPoint(shape: CircleShape, a: number): Point {
  const { center, radius } = shape.circle;
  return [center[0] + radius * Math.cos(a), center[1] + radius * Math.sin(a)];
}

/** Arc k's length, sketch units. */
export function arcLength(shape: CircleShape, k: number): number {
  const [a, b] = arcAngles(shape, k);
  return shape.circle.radius * (b - a);
}

/** Which arc holds the rim point nearest p, and how far p is from the rim (sketch units). */
export function nearestArc(shape: CircleShape, p: Point): { arc: number; distance: number; at: Point } {
  const { center, radius } = shape.circle;
  const dx = p[0] - center[0];
  const dy = p[1] - center[1];
  let a = Math.atan2(dy, dx);
  if (a < 0) a += 2 * Math.PI;
  const n = arcCount(shape);
  const arc = Math.min(n - 1, Math.floor((a / (2 * Math.PI)) * n));
  return { arc, distance: Math.abs(Math.hypot(dx, dy) - radius), at: rimPoint(shape, a) };
}

/** Whether p lies inside the circle (on the rim counts as inside). */
export function insideCircle(shape: CircleShape, p: Point): boolean {
  const { center, radius } = shape.circle;
  return Math.hypot(p[0] - center[0], p[1] - center[1]) <= radius;
}

/** A new circle shape: centre and radius in sketch units. */
export function circleShape(kind: Shape['kind'], center: Point, radius: number, surface: Shape['surface']): Shape {
  return { kind, points: [], circle: { center: [center[0], center[1]], radius }, surface };
}
