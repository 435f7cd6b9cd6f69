import { distanceChange as distanceChangeIn } from '../pairGeometry';
import type { FixedPoints } from './fixedPoints';
import type { VisibleGaps } from './visibleGaps';

// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call, measured at ~10% of hard scenes.
const distanceChange = distanceChangeIn;

// The closed-form integral over one piece pa-pb of the emitting edge (Hottel's crossed
// strings, generalised; Modest, Radiative Heat Transfer, ch. 4). From p the fraction
// of diffuse emission into a direction range is 1/2 (sin b_hi - sin b_lo), and the
// integral along the piece of sin b towards a fixed point v is -(|v - pb| - |v - pa|).
// So each visible gap contributes half a difference of distance changes.

/**
 * Sum over the visible gaps of 1/2 the integral over [pa, pb] of (sin b_hi - sin b_lo):
 * the piece's share of L_i F_ij, sketch units (length x dimensionless factor).
 * pa = (Q[4], Q[5]), pb = (Q[6], Q[7]), and (dx, dy) = (Q[8], Q[9]) = pb - pa,
 * computed directly so that a short piece loses no digits.
 */
export function pieceIntegral(points: FixedPoints, gaps: VisibleGaps, Q: Float64Array): number {
  const pax = Q[4],
    pay = Q[5],
    pbx = Q[6],
    pby = Q[7],
    dx = Q[8],
    dy = Q[9];
  const X = points.x,
    Y = points.y,
    LO = gaps.lo,
    HI = gaps.hi,
    count = gaps.count;
  let total = 0;
  for (let g = 0; g < count; g++) {
    const lo = LO[g],
      hi = HI[g];
    total +=
      0.5 *
      (distanceChange(X[lo], Y[lo], pax, pay, pbx, pby, dx, dy) -
        distanceChange(X[hi], Y[hi], pax, pay, pbx, pby, dx, dy));
  }
  return total;
}

/**
 * L_i F_ij of an unobstructed pair, sketch units: crossed minus uncrossed strings over
 * 2 (Hottel), written as distance changes along a0-a1 so that a short edge loses no
 * digits. b0-b1 faces a0-a1 (a0 a1 b0 b1 anticlockwise); P = [a0x, a0y, a1x, a1y, b0x, b0y, b1x, b1y].
 */
export function crossedStrings(P: Float64Array): number {
  const a0x = P[0],
    a0y = P[1],
    a1x = P[2],
    a1y = P[3],
    b0x = P[4],
    b0y = P[5],
    b1x = P[6],
    b1y = P[7];
  const dx = a1x - a0x,
    dy = a1y - a0y;
  return (
    0.5 * (distanceChange(b1x, b1y, a0x, a0y, a1x, a1y, dx, dy) - distanceChange(b0x, b0y, a0x, a0y, a1x, a1y, dx, dy))
  );
}
