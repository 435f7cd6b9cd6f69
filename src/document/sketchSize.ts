// Edges too short beside the whole sketch. The core works in the sketch's own
// coordinates (from the corner of its bounding box), so every point it computes (an
// edge trimmed at another's line, a piece clipped to a view) carries a rounding of
// about 1e-16 of the sketch's size S. An edge of length L then has its factors good to
// about 1e-18 S / L to 1e-16 S / L. Measured: a 1e-4 edge beside a sliver 1e4 long
// summed its row to 1 - 1.8e-10, beside one 1e6 long to 1 - 2.4e-8, and a 1 mm square
// in a sketch reaching 1e15 to 1 - 0.13 (from a long fuzz run). Below 2^-26 of S
// (about 1.5e-8) the 1e-9 promised for every factor would no longer hold, so such an
// edge is refused, as one too short for its own coordinates is (normalise.ts).
import type { SketchFileV1, Shape } from './schema';
import { formatNumber, shapeLabel } from './labels';
import { MIN_SIZE_FRACTION } from './limits';
import { problemAt, type SketchProblem } from './problems';

/** A box in file units. */
export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** What a box needs of a shape, in the file's form or the reader's. */
type Outline = Pick<Shape, 'points' | 'circle'>;

/** The box around every point and every circle of the sketch (file units); null when it has neither. */
export function sketchBounds(shapes: readonly Outline[]): Bounds | null {
  let b: Bounds | null = null;
  const take = (x0: number, y0: number, x1: number, y1: number) => {
    if (!b) b = { minX: x0, minY: y0, maxX: x1, maxY: y1 };
    else {
      b.minX = Math.min(b.minX, x0);
      b.minY = Math.min(b.minY, y0);
      b.maxX = Math.max(b.maxX, x1);
      b.maxY = Math.max(b.maxY, y1);
    }
  };
  for (const s of shapes) {
    if (s.circle) {
      const [cx, cy] = s.circle.center,
        r = s.circle.radius;
      take(cx - r, cy - r, cx + r, cy + r);
    }
    for (const [x, y] of s.points) take(x, y, x, y);
  }
  return b;
}

/** The sketch's size: the larger side of the box around every point and circle (file units). */
export function sketchSize(shapes: readonly Shape[]): number {
  const b = sketchBounds(shapes);
  return b ? Math.max(b.maxX - b.minX, b.maxY - b.minY, 0) : 0;
}

/**
 * One problem per shape whose first edge (or arc) is shorter than MIN_SIZE_FRACTION
 * of the sketch's size. `fileIndex[s][k]` is the file's point number of kept edge k;
 * shapes in `skip` (refused already for their own reasons) are not looked at.
 */
export function shortBesideSketch(
  file: SketchFileV1,
  shapes: readonly Shape[],
  fileIndex: readonly number[][],
  skip: ReadonlySet<number>,
): SketchProblem[] {
  const size = sketchSize(shapes);
  if (!(size > 0) || !Number.isFinite(size)) return [];
  const least = MIN_SIZE_FRACTION * size;
  const out: SketchProblem[] = [];
  const why = `under ${MIN_SIZE_FRACTION.toPrecision(2)} of the sketch's size (${formatNumber(size)} ${file.units}), where rounding spoils its view factors; draw the small part in a sketch of its own, or leave out what lies far away`;
  shapes.forEach((shape, s) => {
    if (skip.has(s)) return;
    const label = shapeLabel(s, file.shapes[s]);
    if (shape.circle) {
      const arc = (2 * Math.PI * shape.circle.radius) / Math.max(1, shape.surface.length);
      if (arc < least)
        out.push(
          problemAt('edge-too-short', `${label}: its arcs are ${formatNumber(arc)} ${file.units} long, ${why}`, {
            shapes: [s],
          }),
        );
      return;
    }
    const P = shape.points;
    if (P.length < 3) return; // refused for too few points (sketchChecks)
    for (let k = 0; k < P.length; k++) {
      const a = P[k],
        b = P[(k + 1) % P.length];
      const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
      if (length >= least) continue;
      const edge = fileIndex[s][k];
      out.push(
        problemAt(
          'edge-too-short',
          `${label}: edge ${edge + 1} is ${formatNumber(length)} ${file.units} long, ${why}`,
          {
            shapes: [s],
            edges: [{ shape: s, edge }],
            points: [[a[0], a[1]]],
          },
        ),
      );
      return;
    }
  });
  return out;
}
