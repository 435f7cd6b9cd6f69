// Where a tube row's tubes go: the centres from the row's numbers, and the
// rules a row must keep (tubes apart, clear of the wall it is measured from,
// fitting along that wall). Lengths in file units, angles in degrees
// anticlockwise from +x.
import type { Point, ShapeV1, TubeRow } from '../schema';
import { formatNumber, quoteName } from '../labels';
import { MAX_ROW_TUBES } from './limits';

/** A shape as the file or the app holds it (one surface name or one per edge). */
export type RowShape = Pick<ShapeV1, 'kind' | 'points' | 'circle' | 'surface' | 'row'>;

export type RowCentres = { ok: true; centres: Point[] } | { ok: false; problem: string };

/** 12 significant digits: a centre reads back as typed (0.1 + 0.2 gives 0.3), far below any drawing tolerance. */
export const tidy = (v: number): number => Number(v.toPrecision(12));

/** Unit vector at `angle` degrees; exact at multiples of 90° so a level row stays level. */
export function directionOf(angle: number): Point {
  const quarter = angle / 90;
  if (Number.isInteger(quarter)) {
    const q = ((quarter % 4) + 4) % 4;
    return (
      [
        [1, 0],
        [0, 1],
        [-1, 0],
        [0, -1],
      ] as Point[]
    )[q];
  }
  const r = (angle * Math.PI) / 180;
  return [Math.cos(r), Math.sin(r)];
}

/** The edge names of a polygon shape, one per edge. */
function edgeNamesOf(shape: RowShape): string[] {
  const n = shape.points.length;
  return typeof shape.surface === 'string' ? new Array<string>(n).fill(shape.surface) : shape.surface;
}

/** Twice the signed area: positive when the points run anticlockwise (y up). */
function doubleArea(points: readonly Point[]): number {
  let a = 0;
  for (let i = 0; i < points.length; i++) {
    const [x0, y0] = points[i];
    const [x1, y1] = points[(i + 1) % points.length];
    a += x0 * y1 - x1 * y0;
  }
  return a;
}

/** A straight wall: its first point, unit direction, extent along it and the unit normal into the section. */
export interface Wall {
  origin: Point;
  along: Point;
  length: number;
  into: Point;
}

/**
 * The wall named `name`: the edges of one polygon shape that carry that surface
 * name, all on one straight line. Its normal points to the side the wall
 * radiates to (into an enclosure, out of a solid).
 */
export function findWall(
  shapes: readonly RowShape[],
  name: string,
): { ok: true; wall: Wall } | { ok: false; problem: string } {
  const owners = shapes.flatMap((s, k) => (!s.circle && edgeNamesOf(s).includes(name) ? [k] : []));
  if (owners.length === 0) return { ok: false, problem: `no straight edge is named ${quoteName(name)}` };
  if (owners.length > 1)
    return {
      ok: false,
      problem: `${quoteName(name)} names edges of ${owners.length} shapes; a row is measured from one straight wall`,
    };
  const shape = shapes[owners[0]];
  const n = shape.points.length;
  const edgeLength = (k: number) => {
    const [p, q] = [shape.points[k], shape.points[(k + 1) % n]];
    return Math.hypot(q[0] - p[0], q[1] - p[1]);
  };
  // Zero-length edges (repeated points) say nothing about the wall's line.
  const edges = edgeNamesOf(shape).flatMap((m, k) => (m === name && edgeLength(k) > 0 ? [k] : []));
  if (edges.length === 0) return { ok: false, problem: `the wall ${quoteName(name)} has no length` };
  const a = shape.points[edges[0]];
  const b = shape.points[(edges[0] + 1) % n];
  const len = edgeLength(edges[0]);
  const along: Point = [(b[0] - a[0]) / len, (b[1] - a[1]) / len];
  let lo = 0;
  let hi = len;
  for (const k of edges) {
    for (const p of [shape.points[k], shape.points[(k + 1) % n]]) {
      const dx = p[0] - a[0];
      const dy = p[1] - a[1];
      const t = dx * along[0] + dy * along[1];
      const off = dx * -along[1] + dy * along[0];
      // Off the line by more than rounding (relative to the wall's size): not one straight wall.
      if (Math.abs(off) > 1e-9 * Math.max(len, Math.abs(t)))
        return { ok: false, problem: `the wall ${quoteName(name)} is not straight (its edges do not lie on one line)` };
      lo = Math.min(lo, t);
      hi = Math.max(hi, t);
    }
  }
  // Left of the edge (y up) is inside an anticlockwise polygon; a solid radiates outwards.
  const left: Point = [-along[1], along[0]];
  const towardLeft = (shape.kind === 'enclosure') === doubleArea(shape.points) > 0;
  const into: Point = towardLeft ? left : [-left[0], -left[1]];
  const origin: Point = [a[0] + along[0] * lo, a[1] + along[1] * lo];
  return { ok: true, wall: { origin, along, length: hi - lo, into } };
}

/**
 * The rules on a row's own numbers, whatever the drawing: a whole count within
 * the limit, positive finite lengths, tubes apart. (A file's schema checks the
 * ranges too; the app checks typed numbers here.)
 */
export function rowNumbersProblem(row: TubeRow): string | null {
  const { count, diameter, pitch, from } = row;
  if (!Number.isInteger(count) || count < 1 || count > MAX_ROW_TUBES)
    return `the number of tubes must be a whole number from 1 to ${MAX_ROW_TUBES}`;
  if (!(diameter > 0) || !Number.isFinite(diameter)) return 'the diameter must be a finite number greater than 0';
  if (!(pitch > 0) || !Number.isFinite(pitch)) return 'the pitch must be a finite number greater than 0';
  const place = 'wall' in from ? [from.distance] : [...from.start, from.angle];
  if (!place.every(Number.isFinite)) return "the row's place must be given by finite numbers";
  if (count > 1 && !(pitch > diameter))
    return `the pitch (${formatNumber(pitch)}) must be greater than the diameter (${formatNumber(diameter)}), or the tubes overlap`;
  return null;
}

/**
 * The centres of the row's tubes, first to last: from a wall, the centre line
 * `distance` from it, the row centred along the wall and running in the
 * wall's direction (its edge's first point to its second); from a start
 * point, every pitch along the angle.
 */
export function rowCentres(shapes: readonly RowShape[], row: TubeRow): RowCentres {
  const own = rowNumbersProblem(row);
  if (own) return { ok: false, problem: own };
  const { count, diameter, pitch, from } = row;
  let start: Point;
  let u: Point;
  if ('wall' in from) {
    const found = findWall(shapes, from.wall);
    if (!found.ok) return found;
    const { origin, along, length, into } = found.wall;
    if (!(from.distance > diameter / 2))
      return {
        ok: false,
        problem: `the distance from the wall ${quoteName(from.wall)} (${formatNumber(from.distance)}) must be more than the radius of the tubes (${formatNumber(diameter / 2)}), or the tubes cross the wall`,
      };
    const span = (count - 1) * pitch + diameter;
    if (!(span < length))
      return {
        ok: false,
        problem: `the row (${formatNumber(span)} wide) does not fit along the wall ${quoteName(from.wall)} (${formatNumber(length)} long)`,
      };
    u = along;
    const t0 = (length - (count - 1) * pitch) / 2;
    start = [origin[0] + u[0] * t0 + into[0] * from.distance, origin[1] + u[1] * t0 + into[1] * from.distance];
  } else {
    start = from.start;
    u = directionOf(from.angle);
  }
  const centres = Array.from({ length: count }, (_, k): Point => [
    tidy(start[0] + u[0] * pitch * k),
    tidy(start[1] + u[1] * pitch * k),
  ]);
  return { ok: true, centres };
}
