// Copies of shapes: paste, repeat (n copies at a pitch along a direction) and
// flip. A copy is its own surface: generated names take the next number
// ("tube 4"), typed names get " (2)"; the copy keeps the original's properties.
import { setOwn } from '../../document/ownRecord';
import type { Point, Shape, SketchFile, SurfaceProps } from '../sketchFile';
import { edgeNames } from '../geometry/polygon';
import { compactSurface, copyName, usedSurfaceNames } from './surfaceNames';
import { isCircle, type CircleShape } from './circleShapes';

/** Shapes as copied, with the properties of their surfaces (own names, never a prototype's). */
export interface Clipboard {
  shapes: Shape[];
  surfaces: Record<string, SurfaceProps>;
}

export function copyShapes(doc: SketchFile, indices: readonly number[]): Clipboard | null {
  const shapes = [...new Set(indices)]
    .sort((a, b) => a - b)
    .map((i) => doc.shapes[i])
    .filter((s): s is Shape => s !== undefined);
  if (!shapes.length) return null;
  const surfaces: Record<string, SurfaceProps> = {};
  const props = doc.surfaces ?? {};
  for (const s of shapes) for (const n of edgeNames(s)) if (Object.hasOwn(props, n)) setOwn(surfaces, n, props[n]);
  return { shapes, surfaces };
}

/** 15 digits trim float noise from sums (0.1 + 0.2 reads 0.3), as the file shows typed values. */
const tidy = (v: number) => Number(v.toPrecision(15));
const shift = (points: readonly Point[], dx: number, dy: number): Point[] =>
  points.map(([x, y]): Point => [tidy(x + dx), tidy(y + dy)]);

/**
 * Add the clipboard's shapes moved by (dx, dy), sketch units, each with new
 * surface names; returns the new document and the new shapes' indices.
 */
export function pasteShapes(
  doc: SketchFile,
  clip: Clipboard,
  dx: number,
  dy: number,
): { doc: SketchFile; added: number[] } {
  const taken = usedSurfaceNames(doc);
  const props: Record<string, SurfaceProps> = { ...(doc.surfaces ?? {}) };
  let copied = false;
  const added: Shape[] = clip.shapes.map((shape) => {
    // Edges sharing a name in the original share the new name in the copy.
    const renamed = new Map<string, string>();
    const names = edgeNames(shape).map((n) => {
      let m = renamed.get(n);
      if (m === undefined) {
        m = copyName(n, taken);
        taken.add(m);
        renamed.set(n, m);
        if (Object.hasOwn(clip.surfaces, n)) {
          setOwn(props, m, { ...clip.surfaces[n] });
          copied = true;
        }
      }
      return m;
    });
    if (shape.circle) {
      // A circle keeps one name per arc, even when two arcs share a name.
      const [x, y] = shape.circle.center;
      const center: Point = [tidy(x + dx), tidy(y + dy)];
      const surface = typeof shape.surface === 'string' ? names[0] : names;
      return { kind: shape.kind, points: [], circle: { center, radius: shape.circle.radius }, surface };
    }
    return { kind: shape.kind, points: shift(shape.points, dx, dy), surface: compactSurface(names) };
  });
  const first = doc.shapes.length;
  const next: SketchFile = { ...doc, shapes: [...doc.shapes, ...added] };
  if (copied) next.surfaces = props;
  return { doc: next, added: added.map((_, i) => first + i) };
}

/** Limit on copies made by one repeat, so a mistyped count cannot freeze the page. */
export const MAX_REPEAT = 500;

/**
 * n copies of the chosen shapes, copy k moved by k × pitch along (ux, uy)
 * (normalised here), sketch units. Null when n is not a whole number in
 * 1..MAX_REPEAT, the pitch is not finite or the direction has no length.
 */
export function repeatShapes(
  doc: SketchFile,
  indices: readonly number[],
  n: number,
  pitch: number,
  direction: Point,
): { doc: SketchFile; added: number[] } | null {
  const len = Math.hypot(direction[0], direction[1]);
  if (!Number.isInteger(n) || n < 1 || n > MAX_REPEAT || !Number.isFinite(pitch) || !(len > 0)) return null;
  const clip = copyShapes(doc, indices);
  if (!clip) return null;
  let next = doc;
  const added: number[] = [];
  for (let k = 1; k <= n; k++) {
    const r = pasteShapes(next, clip, (direction[0] / len) * pitch * k, (direction[1] / len) * pitch * k);
    next = r.doc;
    added.push(...r.added);
  }
  return { doc: next, added };
}

/**
 * Flip the chosen shapes about a line through the middle of their bounds:
 * 'left-right' mirrors x, 'upside-down' mirrors y. The point order is
 * reversed so the outline keeps its winding; names stay with their edges.
 */
export function flipShapes(doc: SketchFile, indices: readonly number[], how: 'left-right' | 'upside-down'): SketchFile {
  const chosen = new Set(indices.filter((i) => doc.shapes[i]));
  if (!chosen.size) return doc;
  const axis = how === 'left-right' ? 0 : 1;
  let lo = Infinity;
  let hi = -Infinity;
  for (const i of chosen) {
    const c = doc.shapes[i].circle;
    if (c) {
      lo = Math.min(lo, c.center[axis] - c.radius);
      hi = Math.max(hi, c.center[axis] + c.radius);
    }
    for (const p of doc.shapes[i].points) {
      lo = Math.min(lo, p[axis]);
      hi = Math.max(hi, p[axis]);
    }
  }
  const mid2 = lo + hi;
  const shapes = doc.shapes.map((shape, i) => {
    if (!chosen.has(i)) return shape;
    if (isCircle(shape)) return flipCircle(shape, axis, mid2);
    const n = shape.points.length;
    const names = edgeNames(shape);
    // Reversed: new point j is old point n-1-j; new edge j (j -> j+1) is old edge n-2-j.
    const points = shape.points
      .map((p): Point => (axis === 0 ? [tidy(mid2 - p[0]), p[1]] : [p[0], tidy(mid2 - p[1])]))
      .reverse();
    const surface = points.map((_, j) => names[(2 * n - 2 - j) % n]);
    return { ...shape, points, surface: compactSurface(surface) };
  });
  return { ...doc, shapes };
}

/**
 * A circle mirrored about x = mid2/2 (axis 0) or y = mid2/2 (axis 1). Arcs run
 * anticlockwise from +x, so mirroring y sends arc k to arc n-1-k, and mirroring
 * x (angle a to pi - a) sends it to arc n/2-1-k: exact when n is even; an odd
 * number of named arcs cannot be mirrored in x, so its names keep their places.
 */
function flipCircle(shape: CircleShape, axis: 0 | 1, mid2: number): Shape {
  const [x, y] = shape.circle.center;
  const center: Point = axis === 0 ? [tidy(mid2 - x), y] : [x, tidy(mid2 - y)];
  let surface = shape.surface;
  if (Array.isArray(shape.surface)) {
    const names = shape.surface;
    const n = names.length;
    if (axis === 1) surface = names.map((_, j) => names[n - 1 - j]);
    else if (n % 2 === 0) surface = names.map((_, j) => names[(((n / 2 - 1 - j) % n) + n) % n]);
  }
  return { ...shape, circle: { ...shape.circle, center }, surface };
}
