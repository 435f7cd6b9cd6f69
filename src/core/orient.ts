import { orient2d as orient2dIn } from 'robust-predicates';

// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call, measured at ~10% of hard scenes.
const orient2d = orient2dIn;

/**
 * robust-predicates' bound for orient2d's float filter (its ccwerrboundA, epsilon =
 * 2^-53): with l = (ay - cy)(bx - cx) and r = (ax - cx)(by - cy), orient is -(l - r)
 * whenever |l - r| >= ORIENT_FILTER_BOUND |l + r|.
 */
const EPSILON = 1.1102230246251565e-16;
export const ORIENT_FILTER_BOUND = (3 + 16 * EPSILON) * EPSILON;
const FILTER_BOUND = ORIENT_FILTER_BOUND;

/**
 * Exact sign of the turn a -> b -> c with y pointing up: > 0 when c lies left of the
 * directed line a -> b (anticlockwise), < 0 right, 0 exactly collinear.
 * The magnitude approximates twice the triangle area (sketch units squared).
 * robust-predicates' orient2d has the opposite sign (it counts y pointing down).
 * Its float filter is repeated here, to the bit, so that callers can inline the common
 * case: a call that is not inlined boxes its six numbers (measured at ~100 bytes a call
 * and a third of the garbage of the pair integral).
 */
export function orient(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): number {
  const detleft = (ay - cy) * (bx - cx);
  const detright = (ax - cx) * (by - cy);
  const det = detleft - detright;
  if (Math.abs(det) >= FILTER_BOUND * Math.abs(detleft + detright)) return -det;
  return -orient2d(ax, ay, bx, by, cx, cy);
}
