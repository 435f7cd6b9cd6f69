// Messages for broken geometric rules, naming shapes as the canvas does (by
// their surface names) with their numbers, edges and points as numbered in the
// file (from 1), also after repeated points were removed.
import type { GeometryFinding } from '../core/sketchChecks';
import { formatPoint, quoteName, shapeLabel } from './labels';
import type { ProblemPlace, SketchProblem } from './problems';
import type { Shape } from './schema';

export interface GeometryContext {
  /** Shapes after normalising (the ones checked). */
  shapes: readonly Shape[];
  /** Shapes as written, to label them by kind and surface names. */
  fileShapes: readonly unknown[];
  /** Per shape: for each kept edge (= its start point), its index in the file. */
  fileIndex: readonly (readonly number[])[];
  /** Points per shape as written in the file (before repairs). */
  filePointCount: readonly number[];
}

/** The finding as a problem: its message and the shapes, edges and points it concerns, numbered as in the file. */
export function geometryProblem(f: GeometryFinding, ctx: GeometryContext): SketchProblem {
  return { kind: f.rule, message: formatGeometryFinding(f, ctx), place: geometryPlace(f, ctx) };
}

/**
 * Indices follow the file, as the app holds and draws it: a kept edge k is the
 * file's edge fileIndex[k] (the edges dropped after it have zero length, so
 * that one file edge spans the same two points), and likewise its start point.
 */
function geometryPlace(f: GeometryFinding, ctx: GeometryContext): ProblemPlace {
  const fileEdge = (shape: number, k: number) => ({ shape, edge: ctx.fileIndex[shape][k] });
  switch (f.rule) {
    case 'too-few-points':
    case 'zero-area':
      return { shapes: [f.shape], edges: [], points: [] };
    case 'several-enclosures':
      return { shapes: [...f.shapes], edges: [], points: [] };
    case 'repeated-point':
    case 'outside-enclosure':
    case 'inside-solid':
      return { shapes: [f.shape], edges: [], points: [f.at] };
    case 'edges-cross':
    case 'edges-touch':
    case 'edges-overlap': {
      const shapes = f.shape === f.otherShape ? [f.shape] : [f.shape, f.otherShape];
      const points: [number, number][] = f.rule === 'edges-overlap' ? [f.at, f.to] : [f.at];
      return { shapes, edges: [fileEdge(f.shape, f.edge), fileEdge(f.otherShape, f.otherEdge)], points };
    }
  }
}

export function formatGeometryFinding(f: GeometryFinding, ctx: GeometryContext): string {
  const label = (shape: number) => shapeLabel(shape, ctx.fileShapes[shape]);
  const edge = (shape: number, k: number) => ctx.fileIndex[shape][k] + 1;
  const point = edge; // a kept edge starts at the kept point of the same index
  switch (f.rule) {
    case 'too-few-points': {
      const written = ctx.filePointCount[f.shape];
      const repaired = written !== f.pointCount ? ` distinct (of ${written} written)` : '';
      return `${label(f.shape)}: has ${f.pointCount}${repaired} point${f.pointCount === 1 ? '' : 's'}; a shape needs at least 3`;
    }
    case 'zero-area':
      return `${label(f.shape)}: all its points lie on one straight line (zero area)`;
    case 'repeated-point':
      return `${label(f.shape)}: point ${point(f.shape, f.point)} repeats the point before it (a zero-length edge)`;
    case 'several-enclosures':
      return severalEnclosuresMessage(f.shapes.map(label));
    case 'outside-enclosure':
      return `${label(f.shape)}: lies outside the enclosure (point ${point(f.shape, f.point)} at ${formatPoint(f.at)}); solids must be inside it`;
    case 'inside-solid':
      return `${label(f.shape)}: lies inside ${label(f.otherShape)} (point ${point(f.shape, f.point)} at ${formatPoint(f.at)}); solids must not overlap`;
    case 'edges-cross':
    case 'edges-touch':
    case 'edges-overlap':
      return formatContact(f, ctx, label, edge);
  }
}

type Contact = Extract<GeometryFinding, { rule: 'edges-cross' | 'edges-touch' | 'edges-overlap' }>;

function formatContact(
  f: Contact,
  ctx: GeometryContext,
  label: (s: number) => string,
  edge: (s: number, k: number) => number,
): string {
  const where =
    f.rule === 'edges-overlap' ? `from ${formatPoint(f.at)} to ${formatPoint(f.to)}` : `at ${formatPoint(f.at)}`;
  const verb = f.rule === 'edges-cross' ? 'crosses' : f.rule === 'edges-touch' ? 'touches' : 'runs along';

  if (f.shape === f.otherShape) {
    const [a, b] = [edge(f.shape, f.edge), edge(f.shape, f.otherEdge)].sort((x, y) => x - y);
    if (f.rule === 'edges-overlap' && isNeighbour(a, b, ctx.filePointCount[f.shape])) {
      return `${label(f.shape)}: edges ${a} and ${b} fold back onto each other ${where}; the outline must not cross or touch itself`;
    }
    return `${label(f.shape)}: edge ${a} ${verb} edge ${b} ${where}; the outline must not cross or touch itself`;
  }

  // Name the solid first: against the wall, the solid is what to move; between
  // two solids, the later one (usually the one just drawn).
  const kinds = [ctx.shapes[f.shape].kind, ctx.shapes[f.otherShape].kind];
  if (kinds[0] === 'enclosure' && kinds[1] === 'enclosure') {
    return `${label(f.otherShape)}: edge ${edge(f.otherShape, f.otherEdge)} ${verb} ${label(f.shape)} edge ${edge(f.shape, f.edge)} ${where}; shapes must not overlap or touch`;
  }
  const swap = kinds[0] === 'enclosure' || (kinds[1] !== 'enclosure' && f.otherShape > f.shape);
  const [s, e, os, oe] = swap
    ? [f.otherShape, f.otherEdge, f.shape, f.edge]
    : [f.shape, f.edge, f.otherShape, f.otherEdge];
  if (ctx.shapes[os].kind === 'enclosure') {
    const wall = ctx.shapes[os].surface[oe];
    const named = wall ? ` ${quoteName(wall)}` : '';
    return `${label(s)}: edge ${edge(s, e)} ${verb} the enclosure wall${named} (shape ${os + 1}, edge ${edge(os, oe)}) ${where}; solids must lie inside the enclosure without touching it`;
  }
  return `${label(s)}: edge ${edge(s, e)} ${verb} ${label(os)} edge ${edge(os, oe)} ${where}; solids must not overlap or touch`;
}

function isNeighbour(a: number, b: number, count: number): boolean {
  return b - a === 1 || (a === 1 && b === count);
}

/** Two or more enclosures, each named as the canvas names it (polygons and circles alike). */
export function severalEnclosuresMessage(labels: readonly string[]): string {
  const named =
    labels.length === 2
      ? `${labels[0]} and ${labels[1]}`
      : `${labels.slice(0, -1).join(', ')} and ${labels[labels.length - 1]}`;
  const count = ['two', 'three', 'four'][labels.length - 2] ?? String(labels.length);
  return `${count} enclosures, ${named}; a sketch has at most one (draw the others as solids)`;
}
