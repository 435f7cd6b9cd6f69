// A parameter's value written into a sketch: the edited sketch is the file a
// person would get by changing that one number (or moving that one shape).
import type { Sketch } from '../schema';
import { shapesOfSurface, type StudyParameter } from './parameter';

/**
 * The sketch with the parameter set to `value` (units: K, W/m^2, m, or the file's
 * length units for positions and radii). A position moves the whole shape so that
 * the centre of its bounding box (a circle's centre) is at `value`; a radius is a circle's. The input is not changed; the
 * result still has to be checked (restore) like any edited file.
 */
export function withParameterValue(sketch: Sketch, p: StudyParameter, value: number): Sketch {
  if (p.kind === 'setting') return { ...sketch, settings: { ...sketch.settings, [p.setting]: value } };
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
  const [index] = shapesOfSurface(sketch, p.surface);
  if (index === undefined) return undefined;
  const { circle, points } = sketch.shapes[index];
  if (circle) return p.measure === 'radius' ? circle.radius : circle.center[p.measure === 'y' ? 1 : 0];
  return p.measure === 'radius' ? undefined : boundingBoxCentre(points, p.measure === 'y' ? 1 : 0);
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
