import { orient2d } from 'robust-predicates';

/**
 * Exact sign of the turn a -> b -> c with y pointing up: > 0 when c lies left of the
 * directed line a -> b (anticlockwise), < 0 right, 0 exactly collinear.
 * The magnitude approximates twice the triangle area (sketch units squared).
 * robust-predicates' orient2d has the opposite sign (it counts y pointing down).
 */
export function orient(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): number {
  return -orient2d(ax, ay, bx, by, cx, cy);
}
