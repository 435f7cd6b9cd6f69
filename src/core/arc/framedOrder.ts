import { AngleHeap } from './angleHeap';
import { endsAt, passOf, swapNeighbours } from './kineticOrder';

// The kinetic order of kineticOrder.ts kept only inside one member's interval, the
// frame: a free gap crosses both members, so it lies inside either one's interval, and
// end points outside the frame need no order among themselves. Those below the frame's
// low end wait for the angle at which they pass it (likewise above), then join the
// order next to it; one that leaves is taken out. Outside end points still count: the
// count under the frame's low end is that of the objects whose interval covers it.
// In a staggered bank most swaps happened outside the narrower member's interval.
// Sketch units; angles in radians.

const BELOW = 0,
  INSIDE = 1,
  ABOVE = 2;

export class FramedOrder {
  /** End points as in KineticOrder (shared arrays): projection x cos θ + y sin θ + s, count step. */
  x!: Float64Array;
  y!: Float64Array;
  s!: Float64Array;
  step!: Int8Array;
  /** End points in all; objects are pairs (2q, 2q + 1); a disc's low end first. */
  size = 0;
  /** The frame's low and high end points, and the other object whose count is "not crossed" (a member), or -1. */
  private lo = 0;
  private hi = 1;
  private other = -1;
  private place = new Int8Array(64);
  /** End points inside the frame by position, low to high (order[0] = lo, order[m - 1] = hi), and their positions. */
  order = new Int32Array(64);
  at = new Int32Array(64);
  private m = 0;
  /** Count just above each position (under position 0: see recount). */
  count = new Int32Array(64);
  /** Next swap of the neighbours at each position, and the next entry of each end point outside. */
  private readonly swaps = new AngleHeap();
  private readonly entries = new AngleHeap();
  /** Free length: cx cos θ + cy sin θ + cs. */
  cx = 0;
  cy = 0;
  cs = 0;
  tol = 0;
  private readonly ends = Float64Array.of(Infinity, 1, 0);

  /** Share the end point arrays (after they last grew) and take n end points. */
  share(x: Float64Array, y: Float64Array, s: Float64Array, step: Int8Array, n: number): void {
    this.x = x;
    this.y = y;
    this.s = s;
    this.step = step;
    this.size = n;
    if (this.place.length < n) {
      const k = 2 * n;
      this.place = new Int8Array(k);
      this.order = new Int32Array(k);
      this.at = new Int32Array(k);
      this.count = new Int32Array(k);
    }
    this.swaps.grow(n);
    this.entries.grow(n);
  }

  /**
   * Start at angle t (steps set): the frame's low and high end points `lo`, `hi` (one
   * object, 2f and 2f + 1), `other` the other member's object (it counts 1 where not
   * crossed); every other object is a disc (it counts its low end's step where it
   * covers). Ends at `end` (radians).
   */
  start(t: number, lo: number, hi: number, other: number, end: number): void {
    endsAt(this.ends, end);
    const c = Math.cos(t),
      s = Math.sin(t);
    const n = this.size;
    this.lo = lo;
    this.hi = hi;
    this.other = other;
    const order = this.order;
    order[0] = lo;
    let m = 1;
    for (let e = 0; e < n; e++) {
      if (e === lo || e === hi) continue;
      if (this.compare(e, lo, c, s) < 0 || this.compare(e, hi, c, s) > 0) {
        this.place[e] = this.compare(e, lo, c, s) < 0 ? BELOW : ABOVE;
        continue;
      }
      this.place[e] = INSIDE;
      let k = m++;
      while (k > 1 && this.compare(order[k - 1], e, c, s) > 0) {
        order[k] = order[k - 1];
        k--;
      }
      order[k] = e;
    }
    order[m++] = hi;
    this.place[lo] = this.place[hi] = INSIDE;
    this.m = m;
    for (let q = 0; q < m; q++) this.at[order[q]] = q;
    const E = this.entries;
    for (let e = 0; e < n; e++) E.key[e] = this.place[e] === INSIDE ? Infinity : this.entryAt(e, t, c, s);
    E.fill(n);
    this.refresh(t, c, s);
  }

  /**
   * Which of end points e and f comes first just after the angle with cosine c, sine s
   * (-1, 0 or 1): by projection, then by its rate of change, then by the next
   * derivative, each to within rounding. An arc's end and the tangent it becomes at a
   * cut of the sweep meet with the same rate of change; the end lies below after.
   */
  private compare(e: number, f: number, c: number, s: number): number {
    const X = this.x,
      Y = this.y,
      S = this.s,
      tol = this.tol;
    const pe = X[e] * c + Y[e] * s,
      pf = X[f] * c + Y[f] * s;
    const dv = pe + S[e] - (pf + S[f]);
    if (dv < -tol) return -1;
    if (dv > tol) return 1;
    const dw = Y[e] * c - X[e] * s - (Y[f] * c - X[f] * s);
    if (dw < -tol) return -1;
    if (dw > tol) return 1;
    // Second derivative -(x cos + y sin): the larger comes out above.
    const dd = pf - pe;
    return dd < -tol ? -1 : dd > tol ? 1 : 0;
  }

  /** The next event's angle (Infinity: none). */
  next(): number {
    const a = this.swaps.size > 0 ? this.swaps.key[this.swaps.top()] : Infinity,
      b = this.entries.key[this.entries.top()];
    return a < b ? a : b;
  }

  /** Carry out the next event at angle `now` (cosine cn, sine sn). False when the frame's ends would swap (nothing can be free). */
  advance(now: number, cn: number, sn: number): boolean {
    const a = this.swaps.size > 0 ? this.swaps.key[this.swaps.top()] : Infinity,
      b = this.entries.key[this.entries.top()];
    if (b < a) {
      this.enter(this.entries.top(), now, cn, sn);
      return true;
    }
    const k = this.swaps.top(),
      m = this.m;
    if (k === 0 && m === 2) return false;
    if (k === 0) this.leave(1, BELOW, now, cn, sn);
    else if (k + 2 === m) this.leave(m - 2, ABOVE, now, cn, sn);
    else this.swap(k, now, cn, sn);
    return true;
  }

  /** Steps changed (a disc came between the members or left): counts and free length again (the order stands). */
  restep(): void {
    this.recount();
  }

  private swap(k: number, now: number, cn: number, sn: number): void {
    const count = this.count;
    const free =
      (count[k - 1] === 0 ? 1 : 0) + (k + 2 < this.m && count[k + 1] === 0 ? 1 : 0) - (count[k] === 0 ? 1 : 0);
    swapNeighbours(this, k, count[k - 1], free);
    const H = this.swaps;
    H.set(k - 1, this.pass(k - 1, now, cn, sn));
    H.set(k, this.pass(k, now, cn, sn));
    if (k + 2 < this.m) H.set(k + 1, this.pass(k + 1, now, cn, sn));
  }

  /** End point at position k leaves the frame (BELOW past its low end, ABOVE past its high end). */
  private leave(k: number, side: number, now: number, cn: number, sn: number): void {
    const e = this.order[k],
      key = this.swaps.key;
    for (let q = k; q + 1 < this.m; q++) {
      this.order[q] = this.order[q + 1];
      this.at[this.order[q]] = q;
    }
    // The pairs above keep their swap angles, one position lower; the new pair at k - 1 is new.
    for (let q = k; q + 2 < this.m; q++) key[q] = key[q + 1];
    this.m--;
    this.place[e] = side;
    this.entries.set(e, this.entryAt(e, now, cn, sn));
    key[k - 1] = this.pass(k - 1, now, cn, sn);
    this.swaps.fill(this.m - 1);
    this.recount();
  }

  /** End point e, outside, reaches the frame: it joins next to the end it passed. */
  private enter(e: number, now: number, cn: number, sn: number): void {
    const k = this.place[e] === BELOW ? 1 : this.m - 1,
      key = this.swaps.key;
    for (let q = this.m; q > k; q--) {
      this.order[q] = this.order[q - 1];
      this.at[this.order[q]] = q;
    }
    for (let q = this.m - 1; q > k; q--) key[q] = key[q - 1];
    this.order[k] = e;
    this.at[e] = k;
    this.m++;
    this.place[e] = INSIDE;
    this.entries.set(e, Infinity);
    key[k - 1] = this.pass(k - 1, now, cn, sn);
    key[k] = this.pass(k, now, cn, sn);
    this.swaps.fill(this.m - 1);
    this.recount();
  }

  /** When e, outside, passes the frame's end it waits beyond (Infinity: not before the end). */
  private entryAt(e: number, now: number, cn: number, sn: number): number {
    if (e === this.lo || e === this.hi) return Infinity;
    // Below: e passes lo upwards. Above: hi passes e upwards (e comes down past it).
    const below = this.place[e] === BELOW;
    return passOf(this, below ? e : this.hi, below ? this.lo : e, now, cn, sn, this.tol, this.ends);
  }

  private pass(k: number, now: number, cn: number, sn: number): number {
    return passOf(this, this.order[k], this.order[k + 1], now, cn, sn, this.tol, this.ends);
  }

  /** Counts, free length and every swap angle, from scratch. */
  private refresh(now: number, cn: number, sn: number): void {
    this.recount();
    const key = this.swaps.key;
    for (let k = 0; k + 1 < this.m; k++) key[k] = this.pass(k, now, cn, sn);
    this.swaps.fill(Math.max(0, this.m - 1));
  }

  /** Count under the frame, counts and free length, from the steps and places. */
  private recount(): void {
    const P = this.place,
      step = this.step,
      n = this.size;
    // Under the frame's low end: the frame itself is not crossed there (1), the other
    // member unless it covers that point (1), and each disc covering it (its step).
    let base = 1;
    const frame = this.lo >> 1;
    for (let a = 0; a < n; a += 2) {
      const obj = a >> 1;
      if (obj === frame) continue;
      // An interval covers the frame's low end when one of its ends is below and one is not.
      const covers = (P[a] === BELOW) !== (P[a + 1] === BELOW);
      if (obj === this.other) base += covers ? 0 : 1;
      else if (covers) base += step[a];
    }
    const order = this.order,
      count = this.count,
      m = this.m;
    let run = base;
    this.cx = this.cy = this.cs = 0;
    for (let k = 0; k < m; k++) {
      run += step[order[k]];
      count[k] = run;
      if (run === 0 && k + 1 < m) {
        const lo = order[k],
          hi = order[k + 1];
        this.cx += this.x[hi] - this.x[lo];
        this.cy += this.y[hi] - this.y[lo];
        this.cs += this.s[hi] - this.s[lo];
      }
    }
  }
}
