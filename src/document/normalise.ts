// From a schema-valid version-1 file to the form the program works with: one
// surface name per edge, zero-length edges removed (with a warning), numbers
// within the documented limits, one thermal condition per surface.
import { setOwn } from './ownRecord';
import { unusualPropertyWarnings, unusualSettingWarnings } from './unusualValues';
import { normaliseCircle } from './circles';
import { conditionOf, surfaceRuleProblems } from './exchange/conditions';
import { moreThanOneConditionMessage, surfaceRuleMessage } from './exchange/messages';
import { formatNumber, formatPoint, quoteName, shapeLabel } from './labels';
import { MAX_COORDINATE, MIN_EDGE_LENGTH, MIN_RELATIVE_EDGE_LENGTH } from './limits';
import { shortBesideSketch } from './sketchSize';
import { problemAt, type SketchProblem } from './problems';
import {
  CURRENT_VERSION,
  type Point,
  type Shape,
  type Sketch,
  type SketchFileV1,
  type SurfaceProperties,
  type TubeRow,
} from './schema';

export interface Normalised {
  sketch: Sketch;
  /** Per shape: for each kept edge (and its start point), the index it has in the file. */
  fileIndex: number[][];
  /** Points per shape as written. */
  filePointCount: number[];
  errors: SketchProblem[];
  warnings: string[];
}

export function normalise(file: SketchFileV1): Normalised {
  const errors: SketchProblem[] = [];
  const warnings: string[] = [];
  const fileIndex: number[][] = [];
  const filePointCount: number[] = [];
  const shapes: Shape[] = file.shapes.map((shape, s) => {
    if (shape.circle) {
      const circle = normaliseCircle({ ...shape, circle: shape.circle }, s, file.units, errors);
      filePointCount.push(0);
      fileIndex.push(circle.surface.map((_, k) => k));
      return circle;
    }
    const label = shapeLabel(s, shape);
    const n = shape.points.length;
    filePointCount.push(n);
    const names = typeof shape.surface === 'string' ? new Array<string>(n).fill(shape.surface) : shape.surface;
    if (names.length !== n) {
      errors.push(
        problemAt(
          'surface-list',
          `${label}: surface lists ${names.length} name${names.length === 1 ? '' : 's'} for ${n} edge${n === 1 ? '' : 's'}; give one name per edge, or a single name for all`,
          { shapes: [s] },
        ),
      );
    }
    const tooBig = shape.points.findIndex(([x, y]) => Math.abs(x) > MAX_COORDINATE || Math.abs(y) > MAX_COORDINATE);
    if (tooBig >= 0) {
      // No point mark: a coordinate this far out cannot be shown next to the rest.
      errors.push(
        problemAt(
          'coordinate-range',
          `${label}: point ${tooBig + 1} ${formatPoint(shape.points[tooBig])} is beyond ±${formatNumber(MAX_COORDINATE)}; lengths would overflow`,
          { shapes: [s] },
        ),
      );
    }
    const keep = keptEdges(shape.points);
    fileIndex.push(keep);
    if (keep.length < n && n > 1)
      warnings.push(`${label}: removed ${describeRemoved(keep, n)}, which made zero-length edges`);
    if (tooBig < 0 && keep.length >= 3) {
      const short = tooShortEdge(shape.points, keep);
      if (short) {
        errors.push(
          problemAt(
            'edge-too-short',
            `${label}: edge ${short.edge + 1} is ${formatNumber(short.length)} ${file.units} long, ${short.why}`,
            {
              shapes: [s],
              edges: [{ shape: s, edge: short.edge }],
              points: [[shape.points[short.edge][0], shape.points[short.edge][1]]],
            },
          ),
        );
      }
    }
    const kept: Shape = {
      kind: shape.kind,
      points: keep.map((k): Point => [shape.points[k][0], shape.points[k][1]]),
      surface: keep.map((k) => names[k] ?? names[names.length - 1] ?? ''),
    };
    // A polygon never belongs to a row, but its tag is kept so the row check can say so.
    if (shape.row !== undefined) kept.row = shape.row;
    return kept;
  });

  // Shapes refused already (their coordinates or edges) are left to those messages.
  const refused = new Set(errors.flatMap((e) => e.place.shapes));
  errors.push(...shortBesideSketch(file, shapes, fileIndex, refused));

  const surfaces: Record<string, SurfaceProperties> = {};
  const used = new Set(shapes.flatMap((s) => s.surface));
  for (const [name, props] of Object.entries(file.surfaces ?? {})) {
    setOwn(surfaces, name, { ...props });
    const condition = conditionOf(props);
    if (!condition.ok) {
      errors.push(
        problemAt('conditions', moreThanOneConditionMessage(name, condition.kinds), {
          edges: edgesNamed(shapes, fileIndex, name),
        }),
      );
    }
    if (props.opening === true && props.emissivity !== undefined && props.emissivity !== 1) {
      warnings.push(
        `surface ${quoteName(name)}: emissivity ${formatNumber(props.emissivity)} is ignored; an opening acts as a black surface`,
      );
    }
    const onSolid = shapes.findIndex((shape) => shape.kind === 'solid' && shape.surface.includes(name));
    if (props.opening === true && onSolid >= 0) {
      warnings.push(
        `surface ${quoteName(name)} is an opening but lies on a solid, ${shapeLabel(onSolid, file.shapes[onSolid])}; openings are gaps in the enclosure wall`,
      );
    }
    if (!used.has(name)) warnings.push(`surface ${quoteName(name)} has properties but no edge uses that name`);
    warnings.push(...unusualPropertyWarnings(name, props));
  }
  warnings.push(...unusualSettingWarnings(file.settings));
  for (const p of surfaceRuleProblems(surfaces, file.settings, used)) {
    errors.push(problemAt('conditions', surfaceRuleMessage(p), { edges: edgesNamed(shapes, fileIndex, p.surface) }));
  }

  const sketch: Sketch = {
    version: CURRENT_VERSION,
    units: file.units,
    shapes,
    surfaces,
    settings: { ...(file.settings ?? {}) },
  };
  if (file.rows !== undefined)
    sketch.rows = Object.fromEntries(Object.entries(file.rows).map(([n, r]) => [n, copyRow(r)]));
  return { sketch, fileIndex, filePointCount, errors, warnings };
}

function copyRow(row: TubeRow): TubeRow {
  const from =
    'wall' in row.from
      ? { ...row.from }
      : { start: [row.from.start[0], row.from.start[1]] as Point, angle: row.from.angle };
  return { ...row, from };
}

/** The file's edges (shape, edge from 0) that carry surface `name`. */
function edgesNamed(
  shapes: readonly Shape[],
  fileIndex: readonly number[][],
  name: string,
): { shape: number; edge: number }[] {
  return shapes.flatMap((shape, s) =>
    shape.surface.flatMap((n, k) => (n === name ? [{ shape: s, edge: fileIndex[s][k] }] : [])),
  );
}

/**
 * Indices of the edges with non-zero length (exactly repeated consecutive
 * points removed). A kept edge k keeps its start point k; when every point is
 * the same, point 0 alone is kept so the shape is reported as one point.
 */
function keptEdges(points: readonly Point[]): number[] {
  const n = points.length;
  const keep: number[] = [];
  for (let k = 0; k < n; k++) {
    const a = points[k],
      b = points[(k + 1) % n];
    if (a[0] !== b[0] || a[1] !== b[1]) keep.push(k);
  }
  return keep.length === 0 && n > 0 ? [0] : keep;
}

function describeRemoved(keep: number[], n: number): string {
  const kept = new Set(keep);
  const clauses: string[] = [];
  for (let k = 0; k < n; k++) {
    if (!kept.has(k)) clauses.push(`point ${k + 1} (same as point ${((k + 1) % n) + 1})`);
  }
  if (clauses.length > 3) return `${clauses.slice(0, 3).join(', ')} and ${clauses.length - 3} more`;
  return clauses.length === 1 ? clauses[0] : `${clauses.slice(0, -1).join(', ')} and ${clauses[clauses.length - 1]}`;
}

/** The first kept edge too short to compute with, absolutely or relative to its coordinates. */
function tooShortEdge(points: readonly Point[], keep: number[]): { edge: number; length: number; why: string } | null {
  for (let i = 0; i < keep.length; i++) {
    const a = points[keep[i]],
      b = points[keep[(i + 1) % keep.length]];
    const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
    const scale = Math.max(Math.abs(a[0]), Math.abs(a[1]), Math.abs(b[0]), Math.abs(b[1]));
    if (length < MIN_EDGE_LENGTH) {
      return {
        edge: keep[i],
        length,
        why: `shorter than ${formatNumber(MIN_EDGE_LENGTH)}: the sketch is too small to compute (below rounding)`,
      };
    }
    if (length < MIN_RELATIVE_EDGE_LENGTH * scale) {
      return {
        edge: keep[i],
        length,
        why: `too short for coordinates near ${formatNumber(scale)} (below rounding; move the sketch near the origin or enlarge the edge)`,
      };
    }
  }
  return null;
}
