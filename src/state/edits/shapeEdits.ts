// Pure edits of the sketch file: document in, new document out. Shapes that
// an edit does not touch keep their identity, so history snapshots share them.
import type { Point, Shape, SketchFile } from '../sketchFile';
import type { Pick } from '../selection';
import { edgeNames } from '../geometry/polygon';
import { newShapeSurface, nextNumbered, usedSurfaceNames, type ShapeStem } from './surfaceNames';
import { circleShape } from './circleShapes';

/** A new shape as one surface ("body 2", "tube 3"), or an enclosure with its sides named by place. */
export function addShape(doc: SketchFile, kind: Shape['kind'], points: Point[], stem: ShapeStem = 'body'): SketchFile {
  const surface = newShapeSurface(doc, kind, points, stem);
  return { ...doc, shapes: [...doc.shapes, { kind, points, surface }] };
}

/** A new exact circle (centre and radius in sketch units), one surface ("tube 3"; an enclosure is "shell k"). */
export function addCircle(
  doc: SketchFile,
  kind: Shape['kind'],
  center: Point,
  radius: number,
  stem: ShapeStem = 'tube',
): SketchFile {
  const surface = nextNumbered(kind === 'solid' ? stem : 'shell', usedSurfaceNames(doc));
  return { ...doc, shapes: [...doc.shapes, circleShape(kind, center, radius, surface)] };
}

/** Set a circle's centre and radius (sketch units); a non-circle or a radius not above 0 leaves the document. */
export function setCircle(doc: SketchFile, shapeIndex: number, center: Point, radius: number): SketchFile {
  const shape = doc.shapes[shapeIndex];
  if (!shape?.circle || !(radius > 0) || !Number.isFinite(radius)) return doc;
  return replaceShape(doc, shapeIndex, { ...shape, circle: { center: [center[0], center[1]], radius } });
}

export function deleteShapes(doc: SketchFile, shapeIndices: readonly number[]): SketchFile {
  const gone = new Set(shapeIndices);
  return { ...doc, shapes: doc.shapes.filter((_, i) => !gone.has(i)) };
}

/** Which points of which shapes a selection moves (vertex: itself, edge: both ends, shape: all). */
export function movedPoints(doc: SketchFile, picks: readonly Pick[]): Map<number, Set<number>> {
  const moved = new Map<number, Set<number>>();
  const add = (s: number, k: number) => {
    if (!moved.has(s)) moved.set(s, new Set());
    moved.get(s)!.add(k);
  };
  for (const p of picks) {
    const shape = doc.shapes[p.shape];
    if (!shape) continue;
    const n = shape.points.length;
    if (p.type === 'vertex') add(p.shape, p.index);
    else if (p.type === 'edge') {
      add(p.shape, p.index);
      add(p.shape, (p.index + 1) % n);
    } else for (let k = 0; k < n; k++) add(p.shape, k);
  }
  return moved;
}

/** Translate the picked vertices, edges and shapes by (dx, dy) in sketch units. */
export function moveSelection(doc: SketchFile, picks: readonly Pick[], dx: number, dy: number): SketchFile {
  const moved = movedPoints(doc, picks);
  // A circle moves by its centre when it is picked whole (it has no points to pick).
  const circles = new Set(picks.filter((p) => p.type === 'shape' && doc.shapes[p.shape]?.circle).map((p) => p.shape));
  if ((moved.size === 0 && circles.size === 0) || (dx === 0 && dy === 0)) return doc;
  const shapes = doc.shapes.map((shape, s) => {
    if (circles.has(s) && shape.circle) {
      const [x, y] = shape.circle.center;
      return { ...shape, circle: { ...shape.circle, center: [x + dx, y + dy] as Point } };
    }
    const ks = moved.get(s);
    if (!ks) return shape;
    const points = shape.points.map((p, k): Point => (ks.has(k) ? [p[0] + dx, p[1] + dy] : p));
    return { ...shape, points };
  });
  return { ...doc, shapes };
}

export function setVertex(doc: SketchFile, shapeIndex: number, k: number, p: Point): SketchFile {
  const shapes = doc.shapes.map((shape, s) =>
    s !== shapeIndex ? shape : { ...shape, points: shape.points.map((q, i): Point => (i === k ? p : q)) },
  );
  return { ...doc, shapes };
}

/** Split edge k at p; both halves keep the edge's surface name. */
export function insertVertex(doc: SketchFile, shapeIndex: number, k: number, p: Point): SketchFile {
  const shape = doc.shapes[shapeIndex];
  if (!shape) return doc;
  const points = [...shape.points.slice(0, k + 1), p, ...shape.points.slice(k + 1)];
  let surface: Shape['surface'] = shape.surface;
  if (Array.isArray(shape.surface)) {
    const names = edgeNames(shape);
    surface = [...names.slice(0, k + 1), names[k], ...names.slice(k + 1)];
  }
  return replaceShape(doc, shapeIndex, { ...shape, points, surface });
}

/**
 * Remove vertices. A shape that would keep fewer than 3 points is left as it is
 * (the caller says so). The edge that spans the gap keeps the name of the edge
 * that ended at the removed vertex.
 */
export function deleteVertices(doc: SketchFile, picks: readonly { shape: number; index: number }[]): SketchFile {
  const byShape = new Map<number, Set<number>>();
  for (const p of picks) {
    if (!byShape.has(p.shape)) byShape.set(p.shape, new Set());
    byShape.get(p.shape)!.add(p.index);
  }
  const keep: Shape[] = [];
  doc.shapes.forEach((shape, s) => {
    const drop = byShape.get(s);
    if (!drop) {
      keep.push(shape);
      return;
    }
    const n = shape.points.length;
    if (n - drop.size < 3) {
      keep.push(shape);
      return;
    }
    const names = edgeNames(shape);
    const points: Point[] = [];
    const surface: string[] = [];
    for (let k = 0; k < n; k++) {
      if (drop.has(k)) continue;
      points.push(shape.points[k]);
      // The edge leaving a kept vertex keeps its name, also when it now spans a gap.
      surface.push(names[k]);
    }
    keep.push({ ...shape, points, surface: Array.isArray(shape.surface) ? surface : shape.surface });
  });
  return { ...doc, shapes: keep };
}

export function replaceShape(doc: SketchFile, shapeIndex: number, shape: Shape): SketchFile {
  return { ...doc, shapes: doc.shapes.map((s, i) => (i === shapeIndex ? shape : s)) };
}
