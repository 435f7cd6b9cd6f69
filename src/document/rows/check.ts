// The rules of tube rows when a sketch is read. The file holds both a row's
// numbers and its tubes; they must agree. A file whose tubes differ from its
// row's numbers is refused with what differs (it is not rebuilt on reading:
// the command line computes exactly the circles the file gives, and a person
// who edits a row's numbers by hand sees which tubes to move, or opens the
// file in the app, where editing the row rebuilds its tubes).
import { formatNumber, formatPoint, quoteName, shapeLabel } from '../labels';
import { problemAt, type SketchProblem } from '../problems';
import type { Shape, SketchFileV1, TubeRow } from '../schema';
import { rowCentres } from './place';

const rowWords = (name: string) => `row ${quoteName(name)}`;
const advice = "; change the row's numbers in the app (its tubes follow), or split the row into single tubes";

/** Centres agree within 1e-9 of the row's size: hand-typed values and rounding pass, a moved tube does not. */
function rowScale(row: TubeRow, centres: readonly (readonly [number, number])[]): number {
  let scale = row.diameter + row.pitch * (row.count - 1);
  for (const [x, y] of centres) scale = Math.max(scale, Math.abs(x), Math.abs(y));
  return scale;
}

/**
 * Problems with the file's rows: a tag naming no row, a tag on a shape that is
 * not a round tube, a row with no tubes, a row that cannot be placed (tubes
 * overlapping each other or crossing its wall), and tubes that differ from
 * the row's numbers. `shapes` are the normalised shapes (same indices as the file's).
 */
export function rowProblems(shapes: readonly Shape[], file: SketchFileV1): SketchProblem[] {
  const rows = file.rows ?? {};
  const problems: SketchProblem[] = [];
  const label = (k: number) => shapeLabel(k, file.shapes[k]);
  const tagged = new Map<string, number[]>();
  shapes.forEach((s, k) => {
    if (s.row === undefined) return;
    if (!Object.hasOwn(rows, s.row)) {
      problems.push(
        problemAt(
          'row',
          `${label(k)}: belongs to ${rowWords(s.row)}, which the file's "rows" does not list; add the row or remove the shape's "row"`,
          { shapes: [k] },
        ),
      );
      return;
    }
    if (!s.circle || s.kind !== 'solid') {
      problems.push(
        problemAt(
          'row',
          `${label(k)}: belongs to ${rowWords(s.row)} but is not a round tube (a solid circle); only tubes make up a row`,
          { shapes: [k] },
        ),
      );
      return;
    }
    tagged.set(s.row, [...(tagged.get(s.row) ?? []), k]);
  });
  if (problems.length > 0) return problems;

  for (const [name, row] of Object.entries(rows)) {
    const tubes = tagged.get(name) ?? [];
    if (tubes.length === 0) {
      problems.push(
        problemAt(
          'row',
          `${rowWords(name)} has no tubes: no shape has "row": ${JSON.stringify(name.slice(0, 40))}; tag its tubes or remove the row`,
        ),
      );
      continue;
    }
    const place = { shapes: tubes, edges: [], points: [] };
    const placed = rowCentres(shapes, row);
    if (!placed.ok) {
      problems.push(problemAt('row', `${rowWords(name)}: ${placed.problem}`, place));
      continue;
    }
    if (tubes.length !== row.count) {
      problems.push(
        problemAt(
          'row',
          `${rowWords(name)} gives count ${row.count} but ${tubes.length} tube${tubes.length === 1 ? ' is' : 's are'} tagged with it${advice}`,
          place,
        ),
      );
      continue;
    }
    const differs = tubeDifference(shapes, tubes, row, placed.centres);
    if (differs)
      problems.push(
        problemAt('row', `${rowWords(name)}: ${label(differs.shape)}, tube ${differs.text}${advice}`, differs.place),
      );
  }
  return problems;
}

type Circle = NonNullable<Shape['circle']>;

/**
 * The first of the row's tubes (k, in row order) whose diameter differs from the
 * row's by more than 1e-9 of it, or whose centre is more than 1e-9 of the row's
 * size from where the row puts it; null when all agree. Missing circles are skipped.
 */
export function firstMismatch(
  circles: readonly (Circle | undefined)[],
  row: TubeRow,
  centres: readonly [number, number][],
): { k: number; kind: 'diameter' | 'centre' } | null {
  const tol = 1e-9 * rowScale(row, centres);
  for (let k = 0; k < circles.length; k++) {
    const circle = circles[k];
    if (!circle) continue;
    if (Math.abs(2 * circle.radius - row.diameter) > 1e-9 * row.diameter) return { k, kind: 'diameter' };
    const [x, y] = circle.center;
    if (Math.hypot(x - centres[k][0], y - centres[k][1]) > tol) return { k, kind: 'centre' };
  }
  return null;
}

/** The first tube whose size or centre is not the row's, in words, or null. */
function tubeDifference(
  shapes: readonly Shape[],
  tubes: readonly number[],
  row: TubeRow,
  centres: readonly [number, number][],
): { shape: number; text: string; place: SketchProblem['place'] } | null {
  const miss = firstMismatch(
    tubes.map((t) => shapes[t].circle),
    row,
    centres,
  );
  if (!miss) return null;
  const { k } = miss;
  const circle = shapes[tubes[k]].circle!;
  const at = { shapes: [tubes[k]], edges: [], points: [centres[k]] };
  const nth = `${k + 1} of ${tubes.length} in the row`;
  const text =
    miss.kind === 'diameter'
      ? `${nth}, has diameter ${formatNumber(2 * circle.radius)}; the row gives ${formatNumber(row.diameter)}`
      : `${nth}, has its centre at ${formatPoint(circle.center)}; the row's numbers put it at ${formatPoint(centres[k])}`;
  return { shape: tubes[k], text, place: at };
}
