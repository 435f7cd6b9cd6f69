// Whether a disc lies beyond one side of the convex hull of two edges. This is the
// test the exact-circle integrator uses to decide what may block a pair and whether
// a pair of straight edges needs it at all (src/core/arc: `needed`, PairScene), and
// it says "meets" for a disc near a corner of the hull that a separating line would
// clear. So in a sketch with circles, a pair is kept only when every moved shape's
// disc, widened beyond those tests' margins, is beyond one side of its hull.

/** A side counts only where the hull is surely not flat there (relative to side length x sketch size). */
const FLAT = 1e-9;

/**
 * `s` holds the corners x0, y0, x1, y1 (one edge), x2, y2, x3, y3 (the other),
 * then the disc's centre x, y and radius R, and the sketch's size (sketch units).
 * True only when the disc lies farther than R beyond the line of a side of the
 * hull of the four corners, on the side away from the hull.
 */
export function beyondHullSide(s: Float64Array): boolean {
  const x = s[8],
    y = s[9],
    R = s[10],
    size = s[11];
  for (let a = 0; a < 4; a++)
    for (let b = a + 1; b < 4; b++) {
      const ax = s[2 * a],
        ay = s[2 * a + 1];
      const ex = s[2 * b] - ax,
        ey = s[2 * b + 1] - ay;
      const L = Math.sqrt(ex * ex + ey * ey);
      if (!(L > 0)) continue;
      // The two other corners, on one side of the line through a and b, one of them surely off it.
      const c = a === 0 ? (b === 1 ? 2 : 1) : 0;
      const d = 6 - a - b - c;
      const sc = ex * (s[2 * c + 1] - ay) - ey * (s[2 * c] - ax);
      const sd = ex * (s[2 * d + 1] - ay) - ey * (s[2 * d] - ax);
      const tol = FLAT * L * size;
      const centre = ex * (y - ay) - ey * (x - ax);
      if (sc >= 0 && sd >= 0 && (sc > tol || sd > tol) && centre < -R * L) return true;
      if (sc <= 0 && sd <= 0 && (sc < -tol || sd < -tol) && centre > R * L) return true;
    }
  return false;
}
