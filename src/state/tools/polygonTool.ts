// Polygon drawing kernel: clicks in, draft or finished outline out. No effects.
import type { Point } from '../sketchFile';

export interface PolygonDraft {
  points: Point[];
}
export type PolygonStep = { draft: PolygonDraft; finished?: Point[] };

export const emptyDraft: PolygonDraft = { points: [] };

/**
 * A click at p. Clicking within closeTolerance (sketch units) of the first point
 * closes the outline once it has three points; a click on the last point is ignored
 * (the second click of a double-click).
 */
export function clickPoint(draft: PolygonDraft, p: Point, closeTolerance: number): PolygonStep {
  const pts = draft.points;
  if (pts.length >= 3 && dist(p, pts[0]) <= closeTolerance) return finish(draft);
  if (pts.length > 0 && dist(p, pts[pts.length - 1]) <= closeTolerance) return { draft };
  return { draft: { points: [...pts, p] } };
}

/** Enter or double-click: finish if there are at least three distinct points. */
export function finish(draft: PolygonDraft): PolygonStep {
  const points = dedupe(draft.points);
  if (points.length < 3) return { draft };
  return { draft: emptyDraft, finished: points };
}

export function removeLastPoint(draft: PolygonDraft): PolygonDraft {
  return { points: draft.points.slice(0, -1) };
}

function dedupe(points: Point[]): Point[] {
  const out: Point[] = [];
  for (const p of points) if (!out.length || dist(p, out[out.length - 1]) > 0) out.push(p);
  while (out.length > 1 && dist(out[0], out[out.length - 1]) === 0) out.pop();
  return out;
}

function dist(a: Point, b: Point): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1]);
}
