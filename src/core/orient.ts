import { orient2d as orient2dIn } from 'robust-predicates';

// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call, measured at ~10% of hard scenes.
const orient2d = orient2dIn;

/**
 * Exact sign of the turn a -> b -> c with y pointing up: > 0 when c lies left of the
 * directed line a -> b (anticlockwise), < 0 right, 0 exactly collinear.
 * The magnitude approximates twice the triangle area (sketch units squared).
 * robust-predicates' orient2d has the opposite sign (it counts y pointing down).
 */
export function orient(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): number {
  return -orient2d(ax, ay, bx, by, cx, cy);
}
