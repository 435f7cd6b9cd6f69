import { grow, growInt, sortIndexByKey as sortIndexByKeyIn } from '../scratch';

// Module-local copy of a hot import (see pieceView.ts).
const sortIndexByKey = sortIndexByKeyIn;

// The blocking circles of one emitter piece, each with the range of directions it
// covers seen from the piece's middle, so that a ray is tested only against the
// circles whose range holds it. Directions are keys tan b (b from the emitter's normal,
// as in pieceView.ts) and rays come in increasing order, so the circles are swept:
// taken in when their range starts, dropped once it has ended. A circle whose range
// is in doubt (pieces of it at or behind the horizon, or too small to place) gets the
// whole line and is tested by every ray. Ranges are widened by 1e-9 rad, far above
// the rounding of a ray's disc test at the sizes allowed (radius over distance at
// least 1e-6), so no ray's answer changes: only circles it could not meet are skipped.

/** Angle margin of a range, radians. */
const WIDEN = 1e-9;
/** Below this radius over distance a circle's range is not placed (it gets every ray). */
const SMALLEST = 1e-6;

export class DiscSweep {
  /** Circle index, start and end key of every circle added since `reset`. */
  circle = new Int32Array(16);
  private lo = new Float64Array(16);
  private hi = new Float64Array(16);
  private count = 0;
  private order = new Int32Array(16);
  private next = 0;
  /** Positions (into the added circles) whose range may hold the current ray: activeCount of them. */
  active = new Int32Array(16);
  activeCount = 0;

  reset(): void {
    this.count = 0;
  }

  /**
   * Add blocking circle k of radius r at distance d from p, whose two tangent
   * directions from p are u0 and u1 (any lengths): c = u . n and s = u . t for each.
   */
  add(k: number, r: number, d: number, c0: number, s0: number, c1: number, s1: number): void {
    let lo = -Infinity,
      hi = Infinity;
    // Both tangents clearly in front: the range lies between their keys (it spans under a half turn).
    const len = d * d; // |u| for the tangents pieceView builds; only sets the margin of "clearly"
    if (r >= SMALLEST * d && c0 > WIDEN * len && c1 > WIDEN * len) {
      const k0 = s0 / c0,
        k1 = s1 / c1;
      lo = Math.min(k0, k1);
      hi = Math.max(k0, k1);
      // d(tan b) = (1 + tan^2 b) db.
      lo -= WIDEN * (1 + lo * lo);
      hi += WIDEN * (1 + hi * hi);
    }
    this.put(k, lo, hi);
  }

  /** Add blocking circle k for every ray (p inside it, say). */
  addEverywhere(k: number): void {
    this.put(k, -Infinity, Infinity);
  }

  private put(k: number, lo: number, hi: number): void {
    if (this.count === this.circle.length) {
      this.circle = growInt(this.circle);
      this.lo = grow(this.lo);
      this.hi = grow(this.hi);
      this.order = new Int32Array(this.circle.length);
      this.active = new Int32Array(this.circle.length);
    }
    this.circle[this.count] = k;
    this.lo[this.count] = lo;
    this.hi[this.count++] = hi;
  }

  /** Order the circles by the start of their ranges; no ray taken yet. */
  begin(): void {
    sortIndexByKey(this.order, this.lo, this.count);
    this.next = 0;
    this.activeCount = 0;
  }

  /** Move to the ray of key `key` (never less than the last): `active` then holds every circle whose range holds it. */
  advance(key: number): void {
    const lo = this.lo,
      hi = this.hi,
      order = this.order,
      active = this.active;
    let n = 0;
    for (let q = 0; q < this.activeCount; q++) if (!(hi[active[q]] < key)) active[n++] = active[q];
    while (this.next < this.count && lo[order[this.next]] <= key) {
      const at = order[this.next++];
      if (!(hi[at] < key)) active[n++] = at;
    }
    this.activeCount = n;
  }
}
