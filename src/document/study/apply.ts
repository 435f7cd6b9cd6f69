// A parameter's value written into a sketch: the edited sketch is the file a
// person would get by changing that one number (or moving that one shape).
import { buildRow } from '../rows/rebuild';
import type { Sketch, TubeRow } from '../schema';
import { shapesOfSurface, type StudyParameter } from './parameter';

/**
 * The sketch with the parameter set to `value` (units: K, W/m^2, m, or the file's
 * length units for positions and radii). A position moves the whole shape so that
 * the centre of its bounding box (a circle's centre) is at `value`; a radius is a circle's. The input is not changed; the
 * result still has to be checked (restore) like any edited file.
 */
export function withParameterValue(sketch: Sketch, p: StudyParameter, value: number): Sketch {
  if (p.kind === 'setting') return { ...sketch, settings: { ...sketch.settings, [p.setting]: value } };
  if (p.kind === 'row') return withRowValue(sketch, p, value);
  if (p.kind === 'surface') {
    const own = Object.hasOwn(sketch.surfaces, p.surface) ? sketch.surfaces[p.surface] : {};
    return { ...sketch, surfaces: { ...sketch.surfaces, [p.surface]: { ...own, [p.property]: value } } };
  }
  const axis = p.measure === 'y' ? 1 : 0;
  const [index] = shapesOfSurface(sketch, p.surface);
  const shapes = sketch.shapes.map((shape, k) => {
    if (k !== index) return shape;
    const circle = shape.circle;
    if (circle) {
      // A circle: its radius, or its centre.
      if (p.measure === 'radius') return { ...shape, circle: { ...circle, radius: value } };
      const center: [number, number] = axis === 0 ? [value, circle.center[1]] : [circle.center[0], value];
      return { ...shape, circle: { ...circle, center } };
    }
    const shift = value - boundingBoxCentre(shape.points, axis);
    return {
      ...shape,
      points: shape.points.map((pt): [number, number] =>
        axis === 0 ? [pt[0] + shift, pt[1]] : [pt[0], pt[1] + shift],
      ),
    };
  });
  return { ...sketch, shapes };
}

/** The value a parameter has in the sketch, or undefined when the file does not give it (units as above). */
export function parameterValue(sketch: Sketch, p: StudyParameter): number | undefined {
  if (p.kind === 'setting') return sketch.settings[p.setting];
  if (p.kind === 'surface')
    return Object.hasOwn(sketch.surfaces, p.surface) ? sketch.surfaces[p.surface][p.property] : undefined;
  if (p.kind === 'row') {
    const row = sketch.rows && Object.hasOwn(sketch.rows, p.row) ? sketch.rows[p.row] : undefined;
    if (!row) return undefined;
    if (p.measure === 'distance') return 'wall' in row.from ? row.from.distance : undefined;
    return row[p.measure];
  }
  const [index] = shapesOfSurface(sketch, p.surface);
  if (index === undefined) return undefined;
  const { circle, points } = sketch.shapes[index];
  if (circle) return p.measure === 'radius' ? circle.radius : circle.center[p.measure === 'y' ? 1 : 0];
  return p.measure === 'radius' ? undefined : boundingBoxCentre(points, p.measure === 'y' ? 1 : 0);
}

/**
 * A row's number changed and its tubes rebuilt, as the app does when the row is
 * edited (names and properties kept, tubes added or removed only by count). A
 * value the row cannot take (tubes overlapping, crossing the wall) leaves the
 * tubes as they were, so reading the edited sketch refuses it and says why.
 */
function withRowValue(sketch: Sketch, p: Extract<StudyParameter, { kind: 'row' }>, value: number): Sketch {
  const rows = sketch.rows ?? {};
  if (!Object.hasOwn(rows, p.row)) return sketch;
  const old = rows[p.row];
  const row: TubeRow =
    p.measure === 'distance'
      ? { ...old, from: 'wall' in old.from ? { ...old.from, distance: value } : old.from }
      : { ...old, [p.measure]: value };
  const built = buildRow(sketch, p.row, row);
  if (!built.ok) return { ...sketch, rows: { ...rows, [p.row]: row } };
  // Back to one surface name per edge (a new tube is written with one name).
  const shapes = built.doc.shapes.map((s) => ({
    ...s,
    surface: typeof s.surface === 'string' ? [s.surface] : s.surface,
  }));
  return { ...sketch, shapes, surfaces: built.doc.surfaces ?? {}, rows: built.doc.rows };
}

/** Middle of the points' extent along one axis (0 = x, 1 = y), file units. */
function boundingBoxCentre(points: ReadonlyArray<readonly [number, number]>, axis: 0 | 1): number {
  let lo = Infinity;
  let hi = -Infinity;
  for (const pt of points) {
    lo = Math.min(lo, pt[axis]);
    hi = Math.max(hi, pt[axis]);
  }
  return lo + (hi - lo) / 2;
}
