// The point of a segment nearest a given point, as a fraction along the segment. Used
// by the sketch checks (a circle's clearance from a wall), the obstacle index (a body's
// inner disc) and the pair integral (a disc's reach to a side of the view region).

/**
 * Fraction t in [0, 1] along segment a -> b (sketch units) of the point nearest
 * (px, py): the projection onto the segment's line, clamped to its ends; 0 for a
 * segment of no length.
 */
export function closestFraction(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax,
    dy = by - ay;
  const L2 = dx * dx + dy * dy;
  const t = L2 > 0 ? ((px - ax) * dx + (py - ay) * dy) / L2 : 0;
  return t < 0 ? 0 : t > 1 ? 1 : t;
}
