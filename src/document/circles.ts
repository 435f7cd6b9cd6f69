// Exact circles in the document: reading the circle form of a shape (version 2),
// and the wording of the geometric rules that involve circles.
import { CONTACT_FRACTION, type CircleFinding } from '../core/arc/circleChecks';
import type { GeometryFinding } from '../core/sketchChecks';
import type { CircleInput, PolygonInput } from '../core/scene';
import { severalEnclosuresMessage } from './geometryMessages';
import { formatNumber, formatPoint, quoteName, shapeLabel } from './labels';
import { MAX_COORDINATE, MIN_EDGE_LENGTH } from './limits';
import { problemAt, type SketchProblem } from './problems';
import type { Shape, ShapeV1 } from './schema';

/** A circle shape as read: one surface name per arc (the arcs run anticlockwise from +x), no points. */
export function normaliseCircle(
  shape: ShapeV1 & { circle: NonNullable<ShapeV1['circle']> },
  s: number,
  units: string,
  errors: SketchProblem[],
): Shape {
  const label = shapeLabel(s, shape);
  const names = typeof shape.surface === 'string' ? [shape.surface] : shape.surface;
  const { center, radius } = shape.circle;
  if (names.length === 0)
    errors.push(
      problemAt('surface-list', `${label}: surface lists no names; give one name, or one per arc`, { shapes: [s] }),
    );
  if (Math.abs(center[0]) > MAX_COORDINATE || Math.abs(center[1]) > MAX_COORDINATE || radius > MAX_COORDINATE) {
    errors.push(
      problemAt(
        'coordinate-range',
        `${label}: circle centre ${formatPoint(center)} or radius ${formatNumber(radius)} is beyond ±${formatNumber(MAX_COORDINATE)}; lengths would overflow`,
        { shapes: [s] },
      ),
    );
  } else if ((2 * Math.PI * radius) / Math.max(1, names.length) < MIN_EDGE_LENGTH) {
    errors.push(
      problemAt(
        'edge-too-short',
        `${label}: arcs of a circle of radius ${formatNumber(radius)} ${units} are shorter than ${formatNumber(MIN_EDGE_LENGTH)}`,
        { shapes: [s] },
      ),
    );
  }
  const read: Shape = {
    kind: shape.kind,
    points: [],
    circle: { center: [center[0], center[1]], radius },
    surface: [...names],
  };
  if (shape.row !== undefined) read.row = shape.row;
  return read;
}

/** The core's input for a circle shape. */
export function circleInput(shape: Shape & { circle: NonNullable<Shape['circle']> }): CircleInput {
  const { center, radius } = shape.circle;
  return { kind: shape.kind, cx: center[0], cy: center[1], radius, arcs: Math.max(1, shape.surface.length) };
}

/** The sketch's shapes split into polygons and circles, each with its shape number in the file (from 0). */
export function splitShapes(shapes: readonly Shape[]): {
  polygons: { shape: number; polygon: PolygonInput }[];
  circles: { shape: number; circle: CircleInput }[];
} {
  const polygons: { shape: number; polygon: PolygonInput }[] = [];
  const circles: { shape: number; circle: CircleInput }[] = [];
  shapes.forEach((s, shape) => {
    if (s.circle) circles.push({ shape, circle: circleInput({ ...s, circle: s.circle }) });
    else polygons.push({ shape, polygon: { kind: s.kind, points: s.points.flat() } });
  });
  return { polygons, circles };
}

/** A polygon finding with its polygon numbers (indices into `shapeOf`) turned into file shape numbers. */
export function renumberFinding(f: GeometryFinding, shapeOf: readonly number[]): GeometryFinding {
  const out = { ...f } as GeometryFinding & {
    shape?: number;
    otherShape?: number;
    enclosure?: number;
    shapes?: number[];
  };
  if ('shape' in f) out.shape = shapeOf[f.shape];
  if ('otherShape' in f) out.otherShape = shapeOf[f.otherShape];
  if ('enclosure' in f) out.enclosure = shapeOf[f.enclosure];
  if ('shapes' in f) out.shapes = f.shapes.map((k) => shapeOf[k]);
  return out;
}

/**
 * A circle finding as a problem. `fileShapes` label shapes as written; `fileIndex`
 * maps a kept polygon edge to its number in the file.
 */
export function circleProblem(
  f: CircleFinding,
  fileShapes: readonly unknown[],
  fileIndex: readonly (readonly number[])[],
  shapes: readonly Shape[],
): SketchProblem {
  const label = (k: number) => shapeLabel(k, fileShapes[k]);
  switch (f.rule) {
    case 'circle-several-enclosures':
      return problemAt(f.rule, severalEnclosuresMessage(f.shapes.map(label)), { shapes: [...f.shapes] });
    case 'circle-outside-enclosure':
      return problemAt(
        f.rule,
        `${label(f.shape)}: lies outside the enclosure (shape ${f.enclosure + 1}) at ${formatPoint(f.at)}; solids must be inside it`,
        { shapes: [f.shape], points: [f.at] },
      );
    case 'circle-contact': {
      const wall = shapes[f.otherShape].kind === 'enclosure';
      const edge = f.edge >= 0 ? fileIndex[f.otherShape][f.edge] : -1;
      const wallName = f.edge >= 0 ? shapes[f.otherShape].surface[f.edge] : undefined;
      const other = wall
        ? `the enclosure wall${wallName ? ` ${quoteName(wallName)}` : ''} (shape ${f.otherShape + 1})`
        : label(f.otherShape);
      const onEdge = edge >= 0 ? ` edge ${edge + 1}` : '';
      return problemAt(
        f.rule,
        `${label(f.shape)}: crosses, touches or overlaps ${other}${onEdge} near ${formatPoint(f.at)}; circles need a gap of at least ${CONTACT_FRACTION} of the radius (tangent contact is not computed; a gap of 1e-6 of the radius is fine)`,
        {
          shapes: [f.shape, f.otherShape],
          edges: edge >= 0 ? [{ shape: f.otherShape, edge }] : [],
          points: [f.at],
        },
      );
    }
  }
}
