// Point-in-polygon by exact orientation tests (robust-predicates), for the
// geometric checks of polygons and circles.
import { orient as orientation } from './orient';

/**
 * Is (x, y) strictly inside the polygon (flat points)? Crossing-number rule
 * with exact orientation; a point on the boundary may go either way, so
 * callers first make sure it is not on it.
 */
export function pointInPolygon(x: number, y: number, points: ArrayLike<number>): boolean {
  const n = Math.floor(points.length / 2);
  let inside = false;
  for (let k = 0, j = n - 1; k < n; j = k++) {
    const px = points[2 * j],
      py = points[2 * j + 1];
    const qx = points[2 * k],
      qy = points[2 * k + 1];
    if (py > y !== qy > y) {
      // The edge straddles the horizontal line through the point; it crosses
      // to the right of the point when the point is left of the upward edge.
      const side = orientation(px, py, qx, qy, x, y);
      if (qy > py ? side > 0 : side < 0) inside = !inside;
    }
  }
  return inside;
}
