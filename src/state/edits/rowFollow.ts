// A tube row kept a row through the app's other edits. Run on every change of
// the document (before → after) that is not itself a row edit:
// - the wall a row is measured from moved or was stretched: its tubes follow;
// - the wall was renamed: the row follows the new name;
// - the row's tubes were moved together (a row placed from a start point): the start moves with them;
// - some tubes were moved, flipped or deleted on their own: the row is split
//   into single tubes (they stay where the user put them); all deleted: the row goes.
// Anything else (a wall moved so the row no longer fits, a row that was out of
// step before the edit) is left for the sketch's problems to say.
import {
  buildRow,
  findWall,
  firstMismatch,
  rowCentres,
  rowTubes,
  splitRow,
  tidy,
  type TubeRow,
} from '../../document/rows';
import type { SketchFile, Shape } from '../sketchFile';
import { edgeNames } from '../geometry/polygon';

type Circle = NonNullable<Shape['circle']>;

const circlesOf = (doc: SketchFile, name: string): (Circle | undefined)[] =>
  rowTubes(doc.shapes, name).map((k) => doc.shapes[k].circle);

const sameCircles = (a: readonly (Circle | undefined)[], b: readonly (Circle | undefined)[]) =>
  a.length === b.length &&
  a.every(
    (c, k) =>
      c !== undefined &&
      c.radius === b[k]?.radius &&
      c.center[0] === b[k]?.center[0] &&
      c.center[1] === b[k]?.center[1],
  );

/** True when the circles are where and as big as the row puts them (the file check's own tolerance). */
function fitsRow(doc: SketchFile, row: TubeRow, circles: readonly (Circle | undefined)[]): boolean {
  const placed = rowCentres(doc.shapes, row);
  if (!placed.ok || circles.length !== row.count || circles.some((c) => c === undefined)) return false;
  return firstMismatch(circles, row, placed.centres) === null;
}

/** The wall's new name when the edges that carried it in `before` carry another name in `after`. */
function renamedWall(before: SketchFile, after: SketchFile, wall: string): string | null {
  if (findWall(after.shapes, wall).ok || !findWall(before.shapes, wall).ok) return null;
  for (let s = 0; s < before.shapes.length; s++) {
    const k = edgeNames(before.shapes[s]).indexOf(wall);
    const now = after.shapes[s];
    if (k >= 0 && now && !now.circle && now.points.length === before.shapes[s].points.length)
      return edgeNames(now)[k] ?? null;
  }
  return null;
}

/** One common offset of every circle from `was` to `now` (same radii), or null. */
function commonShift(
  was: readonly (Circle | undefined)[],
  now: readonly (Circle | undefined)[],
): [number, number] | null {
  if (was.length !== now.length || was.length === 0 || !was[0] || !now[0]) return null;
  const dx = now[0].center[0] - was[0].center[0];
  const dy = now[0].center[1] - was[0].center[1];
  const tol = 1e-9 * Math.max(1, Math.abs(dx), Math.abs(dy), ...was.flatMap((c) => (c ? c.center.map(Math.abs) : [])));
  const same = was.every((c, k) => {
    const n = now[k];
    return (
      c !== undefined &&
      n !== undefined &&
      n.radius === c.radius &&
      Math.abs(n.center[0] - c.center[0] - dx) <= tol &&
      Math.abs(n.center[1] - c.center[1] - dy) <= tol
    );
  });
  return same ? [dx, dy] : null;
}

/** `after` with its rows kept in step with an edit made from `before` (see the top of this file); `after` itself when nothing needs doing. */
export function keepRows(before: SketchFile, after: SketchFile): SketchFile {
  if (!after.rows || after.rows !== before.rows || after.shapes === before.shapes) return after;
  let doc = after;
  for (const [name, row] of Object.entries(after.rows)) {
    const now = circlesOf(doc, name);
    const was = circlesOf(before, name);
    // A row already out of step (a draft as opened) is left for its problem message to explain.
    if (!fitsRow(before, row, was)) continue;
    let current = row;
    if ('wall' in row.from) {
      const renamed = renamedWall(before, doc, row.from.wall);
      if (renamed) {
        current = { ...row, from: { ...row.from, wall: renamed } };
        doc = { ...doc, rows: { ...doc.rows, [name]: current } };
      }
    }
    if (fitsRow(doc, current, now)) continue;
    if (now.length === 0) {
      doc = splitRow(doc, name);
      continue;
    }
    if (sameCircles(now, was)) {
      // The tubes were not touched: what they are measured from changed. Follow it where the row still fits.
      const built = buildRow(doc, name, current);
      if (built.ok) doc = built.doc;
      continue;
    }
    const shift = 'start' in current.from ? commonShift(was, now) : null;
    if (shift && 'start' in current.from) {
      const start: [number, number] = [tidy(current.from.start[0] + shift[0]), tidy(current.from.start[1] + shift[1])];
      const moved: TubeRow = { ...current, from: { ...current.from, start } };
      if (fitsRow(doc, moved, now)) {
        doc = { ...doc, rows: { ...doc.rows, [name]: moved } };
        continue;
      }
    }
    doc = splitRow(doc, name);
  }
  return doc;
}
