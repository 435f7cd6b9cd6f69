// What lies under the pointer: vertex first, then edge, then a shape's inside.
// A circle has no vertices or edges to pick: its rim or inside picks the whole circle.
import type { Point, SketchFile } from '../sketchFile';
import { closestOnSegment, edgeEnds, pointInPolygon } from '../geometry/polygon';
import { insideCircle, isCircle, nearestArc } from '../edits/circleShapes';

export type Hit =
  | { type: 'vertex'; shape: number; index: number }
  | { type: 'edge'; shape: number; index: number; at: Point }
  | { type: 'shape'; shape: number }
  | null;

/** tolerance is in sketch units (the UI converts its pixel radius by the zoom). */
export function hitTest(doc: SketchFile, p: Point, tolerance: number): Hit {
  let best: Hit = null;
  let bestD = tolerance;
  doc.shapes.forEach((shape, s) =>
    shape.points.forEach((q, k) => {
      const d = Math.hypot(q[0] - p[0], q[1] - p[1]);
      if (d <= bestD) {
        bestD = d;
        best = { type: 'vertex', shape: s, index: k };
      }
    }),
  );
  if (best) return best;
  bestD = tolerance;
  doc.shapes.forEach((shape, s) =>
    shape.points.forEach((_, k) => {
      const [a, b] = edgeEnds(shape, k);
      const c = closestOnSegment(p, a, b);
      if (c.distance <= bestD) {
        bestD = c.distance;
        best = { type: 'edge', shape: s, index: k, at: c.point };
      }
    }),
  );
  doc.shapes.forEach((shape, s) => {
    if (!isCircle(shape)) return;
    const d = nearestArc(shape, p).distance;
    if (d <= bestD) {
      bestD = d;
      best = { type: 'shape', shape: s };
    }
  });
  if (best) return best;
  // Solids lie inside the enclosure, so test them first: the innermost shape wins.
  const order = doc.shapes.map((_, i) => i).sort((a, b) => rank(doc, a) - rank(doc, b));
  for (const s of order) {
    const shape = doc.shapes[s];
    if (isCircle(shape) ? insideCircle(shape, p) : pointInPolygon(p, shape.points)) return { type: 'shape', shape: s };
  }
  return null;
}

function rank(doc: SketchFile, i: number): number {
  return doc.shapes[i].kind === 'solid' ? 0 : 1;
}
