// The tube row: n tubes of outer diameter D, pitch s centre to centre, on a
// centre line at a distance from a wall (measured from the wall to the centre
// line, as furnace drawings state it) or from a start point. Each tube is an
// exact circle of its own surface.
import type { Point, SketchFile } from '../sketchFile';
import { edgeEnds, radiatingNormal } from '../geometry/polygon';
import { addCircle } from './shapeEdits';

export interface RowSpec {
  count: number;
  /** Outer diameter, sketch units. */
  diameter: number;
  /** Centre to centre, sketch units. */
  pitch: number;
}

export type RowPlace =
  | { from: 'point'; start: Point; direction: Point }
  /** Centres on a line `distance` inside the wall (edge `edge` of shape `shape`), the row centred along the wall. */
  | { from: 'wall'; shape: number; edge: number; distance: number };

export type RowResult =
  { ok: true; doc: SketchFile; added: number[]; centres: Point[] } | { ok: false; problem: string };

/** Most tubes one row may hold. */
export const MAX_ROW = 500;

const tidy = (v: number) => Number(v.toPrecision(12));

/** The row's tube centres (first, then every pitch along the direction), or why the row cannot be placed. */
export function rowCentres(
  doc: SketchFile,
  spec: RowSpec,
  place: RowPlace,
): { centres: Point[] } | { problem: string } {
  const { count, diameter, pitch } = spec;
  if (!Number.isInteger(count) || count < 1 || count > MAX_ROW)
    return { problem: `the number of tubes must be a whole number from 1 to ${MAX_ROW}` };
  if (!(diameter > 0) || !Number.isFinite(diameter)) return { problem: 'the diameter must be greater than 0' };
  if (count > 1 && !(pitch > diameter))
    return { problem: `the pitch (${pitch}) must be greater than the diameter (${diameter}), or the tubes overlap` };
  let start: Point;
  let u: Point;
  if (place.from === 'point') {
    const len = Math.hypot(place.direction[0], place.direction[1]);
    if (!(len > 0)) return { problem: 'the row needs a direction' };
    start = place.start;
    u = [place.direction[0] / len, place.direction[1] / len];
  } else {
    const shape = doc.shapes[place.shape];
    if (!shape || place.edge < 0 || place.edge >= shape.points.length) return { problem: 'choose a wall edge first' };
    if (!(place.distance > diameter / 2))
      return { problem: `the distance from the wall must be more than the radius (${diameter / 2})` };
    const [a, b] = edgeEnds(shape, place.edge);
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    const span = (count - 1) * pitch + diameter;
    if (!(span < len)) return { problem: `the row (${span} wide) does not fit along the wall (${len} long)` };
    u = [(b[0] - a[0]) / len, (b[1] - a[1]) / len];
    const n = radiatingNormal(shape, place.edge);
    const t0 = (len - (count - 1) * pitch) / 2;
    start = [a[0] + u[0] * t0 + n[0] * place.distance, a[1] + u[1] * t0 + n[1] * place.distance];
  }
  const centres = Array.from({ length: count }, (_, k): Point => [
    tidy(start[0] + u[0] * pitch * k),
    tidy(start[1] + u[1] * pitch * k),
  ]);
  return { centres };
}

/** Add the row: one exact circle per tube, each its own surface ("tube 4", "tube 5"...). */
export function addTubeRow(doc: SketchFile, spec: RowSpec, place: RowPlace): RowResult {
  const r = rowCentres(doc, spec, place);
  if ('problem' in r) return { ok: false, problem: r.problem };
  let next = doc;
  const added: number[] = [];
  for (const c of r.centres) {
    added.push(next.shapes.length);
    next = addCircle(next, 'solid', c, spec.diameter / 2, 'tube');
  }
  return { ok: true, doc: next, added, centres: r.centres };
}
