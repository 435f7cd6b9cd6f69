import type { EdgeSet } from './edges';
import { ORIENT_FILTER_BOUND, orient as orientIn } from './orient';

// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call, measured at ~10% of hard scenes.
const orient = orientIn,
  FILTER_BOUND = ORIENT_FILTER_BOUND;

// Small exact-geometry pieces of the pair integral (sketch units throughout): the
// distance change behind every closed-form piece integral, and the silhouette test.

/**
 * |v - pb| - |v - pa| without cancellation, given d = pb - pa computed directly:
 * (|v-pb|^2 - |v-pa|^2) / (|v-pb| + |v-pa|) = -d . ((v-pa) + (v-pb)) / (|v-pa| + |v-pb|).
 * Keeps the factor from a very short edge (or piece) accurate to rounding.
 */
export function distanceChange(
  vx: number,
  vy: number,
  pax: number,
  pay: number,
  pbx: number,
  pby: number,
  dx: number,
  dy: number,
): number {
  const ux = vx - pax,
    uy = vy - pay,
    wx = vx - pbx,
    wy = vy - pby;
  const sum = Math.sqrt(ux * ux + uy * uy) + Math.sqrt(wx * wx + wy * wy);
  return sum === 0 ? 0 : -(dx * (ux + wx) + dy * (uy + wy)) / sum;
}

/**
 * Can corner w = b of `edge` of E (between its neighbours u = a of `edge` and v = b
 * of `next`) be a silhouette seen from some point p of segment a0-a1 = (P[0], P[1]) -
 * (P[2], P[3]), i.e. both neighbours on one side of the line p-w? Conservative: may
 * say yes when the answer is no (costs an extra split, never accuracy). orient's float
 * filter is inline, and a doubtful case calls out by indices only (a call that is not
 * inlined boxes the numbers passed to it; + types its result as a number, else the
 * filter's value would be boxed to meet it).
 */
export function silhouetteAtCorner(P: Float64Array, E: EdgeSet, edge: number, next: number): boolean {
  const wx = E.bx[edge],
    wy = E.by[edge],
    ux = E.ax[edge],
    uy = E.ay[edge],
    vx = E.bx[next],
    vy = E.by[next];
  let ax = P[0],
    ay = P[1];
  // orient(a, w, c) = -(l - r) with l = (ay - cy)(wx - cx), r = (ax - cx)(wy - cy).
  let l = (ay - uy) * (wx - ux),
    r = (ax - ux) * (wy - uy);
  const f0 = Math.abs(l - r) >= FILTER_BOUND * Math.abs(l + r) ? -(l - r) : +cornerOrient(P, 0, E, edge, next, 0);
  l = (ay - vy) * (wx - vx);
  r = (ax - vx) * (wy - vy);
  const g0 = Math.abs(l - r) >= FILTER_BOUND * Math.abs(l + r) ? -(l - r) : +cornerOrient(P, 0, E, edge, next, 1);
  ax = P[2];
  ay = P[3];
  l = (ay - uy) * (wx - ux);
  r = (ax - ux) * (wy - uy);
  const f1 = Math.abs(l - r) >= FILTER_BOUND * Math.abs(l + r) ? -(l - r) : +cornerOrient(P, 2, E, edge, next, 0);
  l = (ay - vy) * (wx - vx);
  r = (ax - vx) * (wy - vy);
  const g1 = Math.abs(l - r) >= FILTER_BOUND * Math.abs(l + r) ? -(l - r) : +cornerOrient(P, 2, E, edge, next, 1);
  // f and g are affine along the segment. The corner is surely no silhouette only when
  // f g < 0 at both ends and neither changes sign; with both changing sign, f g turns
  // positive between the roots. Any zero at an end counts as a possible silhouette.
  return !(f0 * g0 < 0 && f1 * g1 < 0 && f0 * f1 > 0);
}

/** orient(a, w, c) for silhouetteAtCorner: a = (P[at], P[at + 1]), w = b of edge, c = a of edge (which 0) or b of next (1). */
function cornerOrient(P: Float64Array, at: number, E: EdgeSet, edge: number, next: number, which: number): number {
  return which === 0
    ? orient(P[at], P[at + 1], E.bx[edge], E.by[edge], E.ax[edge], E.ay[edge])
    : orient(P[at], P[at + 1], E.bx[edge], E.by[edge], E.bx[next], E.by[next]);
}
