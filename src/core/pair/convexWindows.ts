import type { ObstacleIndex } from '../obstacles';
import { firstAtOrBelow as firstAtOrBelowIn, sortRanges as sortRangesIn } from '../scratch';
import { SIDE_ORDER as SIDE_ORDER_IN, type ViewRegion } from './viewRegion';

// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call, measured at ~10% of hard scenes.
const firstAtOrBelow = firstAtOrBelowIn,
  sortRanges = sortRangesIn,
  SIDE_ORDER = SIDE_ORDER_IN;

// Angular windows of a convex body: which of its edges can meet the view region H,
// found without visiting them all. About the body's centre, a corner at distance rho
// and angle t lies inside side k when d_k + rho cos(t - phi_k) > 0 (d_k: the centre's
// signed distance, phi_k: the side's inward normal); with rMin <= rho <= r that bounds
// t to a window around phi_k. An edge can meet H only if, for every side, one of its
// corners may lie inside it. Windows are found by binary search in the corners' angles
// (falling along the walk) and intersected as ranges of walk positions.

/** A growable list of inclusive ranges [lo, hi] of walk positions. Grows, never drops a range. */
export class WalkRanges {
  lo: Int32Array;
  hi: Int32Array;
  count = 0;

  constructor(capacity: number) {
    this.lo = new Int32Array(capacity);
    this.hi = new Int32Array(capacity);
  }

  push(lo: number, hi: number): void {
    const k = this.count;
    if (k === this.lo.length) {
      const lo2 = new Int32Array(2 * k),
        hi2 = new Int32Array(2 * k);
      lo2.set(this.lo);
      hi2.set(this.hi);
      this.lo = lo2;
      this.hi = hi2;
    }
    this.lo[k] = lo;
    this.hi[k] = hi;
    this.count = k + 1;
  }
}

/** Append to `out` the walk positions in [0, n) whose angle A[first+m] lies in [a, b] (radians). */
export function appendCornerWindow(
  A: Float64Array,
  first: number,
  n: number,
  a: number,
  b: number,
  out: WalkRanges,
): void {
  const from = firstAtOrBelow(A, first, n, b);
  let lo = from,
    hi = n; // first position below a
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (A[first + mid] < a) hi = mid;
    else lo = mid + 1;
  }
  if (from < lo) out.push(from, lo - 1);
}

/**
 * Intersect `ranges` (sorted, disjoint) with the ranges of `other`, merging overlaps so
 * no position is listed twice; the result replaces `ranges`. `scratch` holds the
 * unmerged products (it grows as needed: nothing is ever dropped).
 */
export function intersectRanges(ranges: WalkRanges, other: WalkRanges, scratch: WalkRanges): void {
  scratch.count = 0;
  for (let x = 0; x < ranges.count; x++) {
    for (let y = 0; y < other.count; y++) {
      const a = Math.max(ranges.lo[x], other.lo[y]),
        b = Math.min(ranges.hi[x], other.hi[y]);
      if (a <= b) scratch.push(a, b);
    }
  }
  sortRanges(scratch.lo, scratch.hi, scratch.count);
  ranges.count = 0;
  for (let q = 0; q < scratch.count; q++) {
    const last = ranges.count - 1;
    if (last >= 0 && scratch.lo[q] <= ranges.hi[last] + 1) ranges.hi[last] = Math.max(ranges.hi[last], scratch.hi[q]);
    else ranges.push(scratch.lo[q], scratch.hi[q]);
  }
}

/** Scratch of the window search, allocated once per integrator. */
export class ConvexWindows {
  /** Walk positions (0 .. n-1 from bodyFirstEdge) of the edges that can meet H. */
  readonly ranges = new WalkRanges(8);
  private readonly corners = new WalkRanges(4);
  private readonly edges = new WalkRanges(8);
  private readonly products = new WalkRanges(16);

  /**
   * Fill `ranges` with the edges of convex body b that can meet H. `centreDist[k]` is
   * the body centre's signed distance from side k (sketch units, positive inside).
   * Returns false when the whole body lies outside one side (then nothing meets H).
   */
  find(ob: ObstacleIndex, b: number, region: ViewRegion, centreDist: Float64Array): boolean {
    const first = ob.bodyFirstEdge[b];
    const n = ob.bodyEdgeEnd[b] - first;
    const r = ob.bodyR[b],
      rMin = ob.bodyRMin[b];
    const ranges = this.ranges;
    ranges.count = 0;
    ranges.push(0, n - 1);
    for (let step = 0; step < 4 && ranges.count > 0; step++) {
      const k = SIDE_ORDER[step];
      if (!region.on[k]) continue;
      const d = centreDist[k];
      let c = d >= 0 ? (rMin > 0 ? -d / rMin : -Infinity) : -d / r;
      c -= 1e-9; // margin for rounding: a wider window only costs time
      if (c <= -1) continue;
      if (c >= 1) return false;
      const w = Math.acos(c) + 1e-9;
      this.intersectWindow(ob.walkAngle, first, n, region.normalAngles()[k], w);
    }
    return true;
  }

  /** Keep in `ranges` only edges having a corner whose angle is within w of phi (radians). */
  private intersectWindow(A: Float64Array, first: number, n: number, phi: number, w: number): void {
    const top = A[first]; // angles fall from top to above top - 2 pi along the walk
    const turn = 2 * Math.PI;
    let centre = phi - turn * Math.ceil((phi - top) / turn); // in (top - 2 pi, top]
    if (centre > top) centre -= turn;
    const corners = this.corners;
    corners.count = 0;
    appendCornerWindow(A, first, n, Math.max(centre - w, top - turn), Math.min(centre + w, top), corners);
    if (centre + w > top) appendCornerWindow(A, first, n, top - turn, centre + w - turn, corners);
    if (centre - w < top - turn) appendCornerWindow(A, first, n, centre - w + turn, top, corners);
    // Edge at position m runs from corner m to m+1: a corner window [f, t] admits edges [f-1, t].
    const edges = this.edges;
    edges.count = 0;
    for (let q = 0; q < corners.count; q++) {
      if (corners.lo[q] === 0) {
        edges.push(n - 1, n - 1);
        edges.push(0, corners.hi[q]);
      } else {
        edges.push(corners.lo[q] - 1, corners.hi[q]);
      }
    }
    intersectRanges(this.ranges, edges, this.products);
  }
}
