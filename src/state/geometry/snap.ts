import type { Point } from '../sketchFile';

/** Round a point to the grid (step in sketch units) when snapping is on. */
export function snapPoint(p: Point, step: number, enabled: boolean): Point {
  if (!enabled || !(step > 0)) return p;
  return [roundTo(p[0], step), roundTo(p[1], step)];
}

function roundTo(v: number, step: number): number {
  // Round via the step count, then trim float noise so 0.1 steps print as 0.3, not 0.30000000000000004.
  return Number((Math.round(v / step) * step).toPrecision(12));
}
