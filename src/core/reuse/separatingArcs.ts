// Directions that separate an edge from a disc, so that whether the hull of two
// edges misses a disc is one comparison of angles. A line with unit normal
// u = (cos t, sin t) through the disc's centre c has point p farther than R on
// its positive side when u.(p - c) > R, that is when t lies within acos(R / |p - c|)
// of the direction of p - c. The directions that do this for both ends of an edge
// form one arc of less than a half turn, or none when the edge meets the disc. The
// hull of two edges misses the disc exactly when one direction does it for all
// four corners (convex sets are disjoint exactly when a line separates them): when
// the two edges' arcs overlap.
import type { EdgeSet } from '../edges';

/** Every arc is narrowed by this (radians), far above the rounding of atan2 and acos, so overlap is never claimed in doubt. */
const ANGLE_MARGIN = 1e-9;

/**
 * For each straight edge e, the directions that separate it from the disc (x, y, R)
 * (sketch units): their middle mid[at + e] in (-pi, pi] and half-width half[at + e]
 * (radians); half < 0 when there are none (the edge may meet the disc).
 */
export function separatingArcs(
  E: EdgeSet,
  x: number,
  y: number,
  R: number,
  mid: Float64Array,
  half: Float64Array,
  at: number,
): void {
  for (let e = 0; e < E.count; e++) {
    const ax = E.ax[e] - x,
      ay = E.ay[e] - y,
      bx = E.bx[e] - x,
      by = E.by[e] - y;
    const da = Math.sqrt(ax * ax + ay * ay),
      db = Math.sqrt(bx * bx + by * by);
    half[at + e] = -1;
    mid[at + e] = 0;
    if (!(da > R && db > R)) continue;
    const ta = Math.atan2(ay, ax),
      wa = Math.acos(R / da),
      wb = Math.acos(R / db);
    // b's direction relative to a's, in (-pi, pi].
    let t = Math.atan2(by, bx) - ta;
    if (t > Math.PI) t -= 2 * Math.PI;
    else if (t <= -Math.PI) t += 2 * Math.PI;
    const lo = Math.max(-wa, t - wb),
      hi = Math.min(wa, t + wb);
    const w = (hi - lo) / 2 - ANGLE_MARGIN;
    if (!(w >= 0)) continue;
    let m = ta + (lo + hi) / 2;
    if (m > Math.PI) m -= 2 * Math.PI;
    else if (m <= -Math.PI) m += 2 * Math.PI;
    mid[at + e] = m;
    half[at + e] = w;
  }
}
