// Where validation problems are drawn: shapes outlined, edges traced and
// places ringed, read from each problem's place (data made by the document
// layer), never from its wording.
import type { SketchProblem } from '../../state/documentApi';
import type { Point, Shape } from '../../state/sketchFile';
import { edgeEnds } from '../../state/geometry/polygon';

export interface ProblemMarks {
  /** Indices into the document's shapes. */
  shapes: Set<number>;
  /** Edge ends in sketch units. */
  edges: [Point, Point][];
  /** Places in sketch units. */
  points: Point[];
}

/** More marks than this only clutter the drawing; the status line counts every problem. */
const MAX_MARKS = 20;

export const NO_MARKS: ProblemMarks = { shapes: new Set(), edges: [], points: [] };

/**
 * Marks for the problems of the document whose shapes are `shapes`. Places
 * that do not fit those shapes (a document changed since it was checked) are
 * left out rather than drawn in the wrong place.
 */
export function problemMarks(problems: readonly SketchProblem[], shapes: readonly Shape[]): ProblemMarks {
  const marks: ProblemMarks = { shapes: new Set(), edges: [], points: [] };
  const seenEdges = new Set<string>();
  const seenPoints = new Set<string>();
  for (const { place } of problems) {
    for (const s of place.shapes) if (s >= 0 && s < shapes.length) marks.shapes.add(s);
    for (const { shape, edge } of place.edges) {
      const key = `${shape}:${edge}`;
      if (shape < 0 || shape >= shapes.length || edge < 0 || edge >= shapes[shape].points.length || seenEdges.has(key))
        continue;
      seenEdges.add(key);
      marks.edges.push(edgeEnds(shapes[shape], edge));
    }
    for (const p of place.points) {
      const key = `${p[0]},${p[1]}`;
      if (!Number.isFinite(p[0]) || !Number.isFinite(p[1]) || seenPoints.has(key)) continue;
      seenPoints.add(key);
      marks.points.push([p[0], p[1]]);
    }
  }
  return { shapes: marks.shapes, edges: marks.edges.slice(0, MAX_MARKS), points: marks.points.slice(0, MAX_MARKS) };
}

/**
 * The problems the canvas marks for the results state: those of an invalid document,
 * else null. The same array while it stays invalid, so a job posted or answered does
 * not redraw the canvas.
 */
export function canvasProblems(results: {
  status: string;
  problems: readonly SketchProblem[];
}): readonly SketchProblem[] | null {
  return results.status === 'invalid' ? results.problems : null;
}

/** The marks for `canvasProblems`'s answer: none while the document is not invalid. */
export function canvasProblemMarks(problems: readonly SketchProblem[] | null, shapes: readonly Shape[]): ProblemMarks {
  return problems ? problemMarks(problems, shapes) : NO_MARKS;
}
