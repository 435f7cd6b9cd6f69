import { orient as orientIn } from './orient';

// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call, measured at ~10% of hard scenes.
const orient = orientIn;

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
 * Can corner w (between neighbours u and v) be a silhouette seen from some point p
 * of segment a0-a1, i.e. both neighbours on one side of the line p-w? Conservative:
 * may say yes when the answer is no (costs an extra split, never accuracy).
 */
export function silhouetteFromSegment(
  a0x: number,
  a0y: number,
  a1x: number,
  a1y: number,
  wx: number,
  wy: number,
  ux: number,
  uy: number,
  vx: number,
  vy: number,
): boolean {
  const f0 = orient(a0x, a0y, wx, wy, ux, uy);
  const g0 = orient(a0x, a0y, wx, wy, vx, vy);
  const f1 = orient(a1x, a1y, wx, wy, ux, uy);
  const g1 = orient(a1x, a1y, wx, wy, vx, vy);
  // f and g are affine along the segment. The corner is surely no silhouette only when
  // f g < 0 at both ends and neither changes sign; with both changing sign, f g turns
  // positive between the roots. Any zero at an end counts as a possible silhouette.
  return !(f0 * g0 < 0 && f1 * g1 < 0 && f0 * f1 > 0);
}
