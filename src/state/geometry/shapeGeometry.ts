// What the canvas derives from one shape, computed once per shape object: the
// store keeps the same object for every shape an edit leaves alone, so a drag
// recomputes only the shapes it moves. Sketch units; screen mapping is the caller's.
import type { Shape } from '../sketchFile';
import { isCircle, arcLength } from '../edits/circleShapes';
import { edgeNames, isAnticlockwise } from './polygon';

export interface ShapeGeometry {
  /** Surface name of every edge (or arc of a circle). */
  names: readonly string[];
  /** True when the points run anticlockwise (y up); false for a circle. */
  anticlockwise: boolean;
  /** Radiating unit normal of edge k at [2k, 2k + 1] (into an enclosure, out of a solid); empty for a circle. */
  normals: Float64Array;
  /** Length of each edge or arc, sketch units. */
  lengths: Float64Array;
  /** Per surface name of this shape: the edge (or arc) of its longest piece, first edge on a tie. */
  longest: ReadonlyMap<string, { edge: number; length: number }>;
}

const cache = new WeakMap<Shape, ShapeGeometry>();

/** The derived geometry of `shape`, the same object for as long as the shape object is the same. */
export function shapeGeometry(shape: Shape): ShapeGeometry {
  let g = cache.get(shape);
  if (!g) cache.set(shape, (g = derive(shape)));
  return g;
}

function derive(shape: Shape): ShapeGeometry {
  const names = edgeNames(shape);
  const longest = new Map<string, { edge: number; length: number }>();
  if (isCircle(shape)) {
    const lengths = Float64Array.from(names, (_, k) => arcLength(shape, k));
    names.forEach((name, k) => keepLongest(longest, name, k, lengths[k]));
    return { names, anticlockwise: false, normals: new Float64Array(0), lengths, longest };
  }
  const pts = shape.points;
  const n = pts.length;
  // One area per shape (it was once per edge).
  const anticlockwise = isAnticlockwise(pts);
  // Left of the edge (y up) is the inside of an anticlockwise polygon.
  const sign = (shape.kind === 'enclosure') === anticlockwise ? 1 : -1;
  const normals = new Float64Array(2 * n);
  const lengths = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const [ax, ay] = pts[k];
    const [bx, by] = pts[(k + 1) % n];
    const dx = bx - ax;
    const dy = by - ay;
    const len = Math.hypot(dx, dy);
    const div = len || 1;
    normals[2 * k] = (sign * -dy) / div;
    normals[2 * k + 1] = (sign * dx) / div;
    lengths[k] = len;
    keepLongest(longest, names[k], k, len);
  }
  return { names, anticlockwise, normals, lengths, longest };
}

function keepLongest(
  into: Map<string, { edge: number; length: number }>,
  name: string,
  edge: number,
  length: number,
): void {
  const b = into.get(name);
  if (!b || length > b.length) into.set(name, { edge, length });
}
