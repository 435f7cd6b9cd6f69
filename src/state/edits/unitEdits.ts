import type { Point, SketchFile, Units } from '../sketchFile';

/** Metres per unit (exact by definition of the inch and foot). */
const METRES: Record<Units, number> = { m: 1, cm: 0.01, mm: 0.001, in: 0.0254, ft: 0.3048 };

export type UnitChange = 'convert' | 'relabel';

/**
 * Change the sketch's units. 'convert' scales every coordinate so the drawing keeps
 * its physical size; 'relabel' keeps the numbers and only changes the unit name.
 */
export function changeUnits(doc: SketchFile, units: Units, how: UnitChange): SketchFile {
  if (units === doc.units) return doc;
  if (how === 'relabel') return { ...doc, units };
  const factor = METRES[doc.units] / METRES[units];
  // toPrecision trims float noise (0.1 m -> 10 cm, not 10.000000000000002).
  const scale = (v: number) => Number((v * factor).toPrecision(15));
  const shapes = doc.shapes.map((s) => ({ ...s, points: s.points.map(([x, y]): Point => [scale(x), scale(y)]) }));
  return { ...doc, units, shapes };
}

export function unitFactor(from: Units, to: Units): number {
  return METRES[from] / METRES[to];
}
