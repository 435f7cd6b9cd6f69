import type { CircleInput } from '../scene';

/**
 * The exact circles of a sketch and their arcs. Arc a lies on circle circle[a] and
 * spans the angles [start[a], start[a] + span[a]] (radians, anticlockwise from +x).
 * A solid circle radiates outward, an enclosure circle inward. Coordinates are in
 * sketch units relative to the EdgeSet's origin; arc lengths are r x span.
 */
export interface ArcSet {
  count: number;
  circle: Int32Array;
  start: Float64Array;
  span: Float64Array;
  length: Float64Array;
  circleCount: number;
  cx: Float64Array;
  cy: Float64Array;
  r: Float64Array;
  /** 1 for an enclosure circle, 0 for a solid one. */
  circleIsEnclosure: Uint8Array;
}

/** Build the arcs of `circles`, centres shifted by (-originX, -originY). Throws on a bad radius or arc count. */
export function buildArcs(circles: readonly CircleInput[], originX: number, originY: number): ArcSet {
  let count = 0;
  for (const c of circles) {
    if (!(c.radius > 0 && Number.isFinite(c.radius))) throw new Error('a circle needs a positive finite radius');
    if (!(Number.isInteger(c.arcs) && c.arcs >= 1)) throw new Error('a circle needs a whole number of arcs >= 1');
    count += c.arcs;
  }
  const C = circles.length;
  const set: ArcSet = {
    count,
    circle: new Int32Array(count),
    start: new Float64Array(count),
    span: new Float64Array(count),
    length: new Float64Array(count),
    circleCount: C,
    cx: new Float64Array(C),
    cy: new Float64Array(C),
    r: new Float64Array(C),
    circleIsEnclosure: new Uint8Array(C),
  };
  let a = 0;
  circles.forEach((c, k) => {
    set.cx[k] = c.cx - originX;
    set.cy[k] = c.cy - originY;
    set.r[k] = c.radius;
    set.circleIsEnclosure[k] = c.kind === 'enclosure' ? 1 : 0;
    const span = (2 * Math.PI) / c.arcs;
    for (let m = 0; m < c.arcs; m++, a++) {
      set.circle[a] = k;
      set.start[a] = m * span;
      set.span[a] = span;
      set.length[a] = c.radius * span;
    }
  });
  return set;
}

/** Lower-left corner of the circles' bounding box, folded into (x0, y0); sketch units. */
export function circlesLowerLeft(circles: readonly CircleInput[], x0: number, y0: number): [number, number] {
  for (const c of circles) {
    x0 = Math.min(x0, c.cx - c.radius);
    y0 = Math.min(y0, c.cy - c.radius);
  }
  return [x0, y0];
}
