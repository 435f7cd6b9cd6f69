// The umbra of one disc for another: the region from which disc A hides all of disc T
// (or a point, radius 0). It lies between the two outer common tangents of A and T
// (each with both discs on its positive side) and beyond the chord through their touch
// points on A, away from T: any segment from there to a point of T stays between the
// tangents and crosses the chord's line between them, inside A. Three half-planes
// n . x + w >= 0 (|n| = 1), used by the exact circles (arc/discShadow.ts) and by whole
// groups of polygon edges (pair/groupCull.ts). Sketch units. Lengths are written as
// Math.sqrt of a sum of squares (Math.hypot allocates on every call).

/**
 * Write the umbra of disc A (ax, ay, ar) for disc T (tx, ty, tr; tr = 0: a point) to
 * L[at .. at + 9) as three lines nx, ny, w, each holding the umbra on its positive
 * side: the two outer common tangents, then the chord. False (nothing written that
 * counts) when T is not wholly apart from A.
 */
export function discUmbraLines(
  ax: number,
  ay: number,
  ar: number,
  tx: number,
  ty: number,
  tr: number,
  L: Float64Array,
  at: number,
): boolean {
  const dx = tx - ax,
    dy = ty - ay;
  const d = Math.sqrt(dx * dx + dy * dy);
  if (!(d > ar + tr)) return false;
  const ux = dx / d,
    uy = dy / d;
  // Tangent normals n = cw u +- sw u_perp, cw = cos w = (tr - ar) / d: both centres on
  // the positive side, at distances ar and tr.
  const cw = (tr - ar) / d,
    sw = Math.sqrt(1 - cw * cw);
  const n1x = cw * ux - sw * uy,
    n1y = cw * uy + sw * ux,
    n2x = cw * ux + sw * uy,
    n2y = cw * uy - sw * ux;
  L[at] = n1x;
  L[at + 1] = n1y;
  L[at + 2] = ar - (n1x * ax + n1y * ay);
  L[at + 3] = n2x;
  L[at + 4] = n2y;
  L[at + 5] = ar - (n2x * ax + n2y * ay);
  // The touch points a - ar n lie where u . (x - a) = -ar cw; the umbra is beyond, away from T.
  L[at + 6] = -ux;
  L[at + 7] = -uy;
  L[at + 8] = ux * ax + uy * ay - ar * cw;
  return true;
}
