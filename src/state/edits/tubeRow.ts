// The tube row in the app: n tubes of outer diameter D, pitch s centre to
// centre, on a centre line at a distance from a wall (measured from the wall
// to the centre line, as furnace drawings state it) or from a start point.
// The row is kept in the file (`rows`, its tubes tagged) so it stays a row:
// editing its numbers rebuilds its tubes (document/rows), until it is split
// into single tubes. Each tube is an exact circle of its own surface.
import {
  MAX_ROW_TUBES,
  buildRow,
  newRowName,
  rowCentres as placeRow,
  rowTubes,
  splitRow,
  type TubeRow,
} from '../../document/rows';
import type { Point, SketchFile } from '../sketchFile';
import type { Pick } from '../selection';
import { edgeNames } from '../geometry/polygon';

export interface RowSpec {
  count: number;
  /** Outer diameter, sketch units. */
  diameter: number;
  /** Centre to centre, sketch units. */
  pitch: number;
}

export type RowPlace =
  /** The first tube's centre, and the row's direction in degrees anticlockwise from +x. */
  | { from: 'point'; start: Point; angle: number }
  /** Centres on a line `distance` inside the wall (the surface of edge `edge` of shape `shape`), the row centred along it. */
  | { from: 'wall'; shape: number; edge: number; distance: number };

export type RowResult =
  { ok: true; doc: SketchFile; name: string; added: number[]; centres: Point[] } | { ok: false; problem: string };

/** Most tubes one row may hold. */
export const MAX_ROW = MAX_ROW_TUBES;

export { splitRow };
export type { TubeRow };

/** The row as the file holds it, or why the place cannot be used. */
export function rowOf(doc: SketchFile, spec: RowSpec, place: RowPlace): { row: TubeRow } | { problem: string } {
  if (place.from === 'point')
    return { row: { ...spec, from: { start: [place.start[0], place.start[1]], angle: place.angle } } };
  const shape = doc.shapes[place.shape];
  if (!shape || shape.circle || place.edge < 0 || place.edge >= shape.points.length)
    return { problem: 'choose a wall edge first' };
  return { row: { ...spec, from: { wall: edgeNames(shape)[place.edge], distance: place.distance } } };
}

/** The row's tube centres (first, then every pitch along the row), or why the row cannot be placed. */
export function rowCentres(
  doc: SketchFile,
  spec: RowSpec,
  place: RowPlace,
): { centres: Point[] } | { problem: string } {
  const r = rowOf(doc, spec, place);
  if ('problem' in r) return r;
  const placed = placeRow(doc.shapes, r.row);
  return placed.ok ? { centres: placed.centres } : { problem: placed.problem };
}

/** Add a new row ("row 1", "row 2"...): one exact circle per tube, each its own surface ("tube 4", "tube 5"...). */
export function addTubeRow(doc: SketchFile, spec: RowSpec, place: RowPlace): RowResult {
  const r = rowOf(doc, spec, place);
  if ('problem' in r) return { ok: false, problem: r.problem };
  return editTubeRow(doc, newRowName(doc), r.row);
}

/** Set row `name` to `row` and rebuild its tubes; tubes that stay keep their names and properties. */
export function editTubeRow(doc: SketchFile, name: string, row: TubeRow): RowResult {
  const built = buildRow(doc, name, row);
  if (!built.ok) return built;
  const centres = built.tubes.map((k): Point => built.doc.shapes[k].circle?.center ?? [0, 0]);
  return { ok: true, doc: built.doc, name, added: built.tubes, centres };
}

/** The row the selection belongs to: every selected shape (or edge of one) is a tube of one row; else null. */
export function selectedRow(doc: SketchFile, selection: readonly Pick[]): string | null {
  let row: string | null = null;
  for (const p of selection) {
    const name = doc.shapes[p.shape]?.row;
    if (name === undefined || (row !== null && name !== row)) return null;
    row = name;
  }
  return row !== null && doc.rows && Object.hasOwn(doc.rows, row) ? row : null;
}

/** The tubes of row `name` (shape indices, file order). */
export function tubesOfRow(doc: SketchFile, name: string): number[] {
  return rowTubes(doc.shapes, name);
}
