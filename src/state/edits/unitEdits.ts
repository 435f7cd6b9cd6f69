import type { Point, SketchFile, Units } from '../sketchFile';
import { unitFactor } from '../../document/units';

export { unitFactor };

export type UnitChange = 'convert' | 'relabel';

/**
 * Change the sketch's units. 'convert' scales every coordinate so the drawing keeps
 * its physical size; 'relabel' keeps the numbers and only changes the unit name.
 */
export function changeUnits(doc: SketchFile, units: Units, how: UnitChange): SketchFile {
  if (units === doc.units) return doc;
  if (how === 'relabel') return { ...doc, units };
  const factor = unitFactor(doc.units, units);
  // toPrecision trims float noise (0.1 m -> 10 cm, not 10.000000000000002).
  const scale = (v: number) => Number((v * factor).toPrecision(15));
  const shapes = doc.shapes.map((s) => ({ ...s, points: s.points.map(([x, y]): Point => [scale(x), scale(y)]) }));
  return { ...doc, units, shapes };
}
