import { KineticOrder } from './kineticOrder';

// Exchange between two curves past solid circles, summed over the lines that cross
// both (integral geometry). With lines measured as dp dθ (θ the angle of the line's
// normal, p its distance from the origin), the lines that meet two facing segments, or
// two convex sets, measure the crossed strings minus the uncrossed ones, so L_i F_ij
// is half that measure (Hottel's crossed strings; Santaló, Integral Geometry and
// Geometric Probability, 1976, the measure of lines meeting two convex sets; from
// memory). With discs between, L_i F_ij is half the measure of the lines that cross
// both and meet no disc between them: at each θ, the length of the p interval that
// crosses both, less the projections of the discs between. The interval ends are
// sinusoids in θ; their order changes only where two meet, and between such angles the
// free length is one sinusoid, integrated exactly. The order is kept one swap of
// neighbours at a time (kineticOrder.ts).
//
// A member is a straight edge (radiating on its left) or a whole solid circle. Which
// discs lie between, along a line that crosses both members:
// - past a straight edge, every disc wholly in front of its line (the caller checks
//   that each disc is: a line crosses the edge's line once, at the edge);
// - past a circle, the discs whose centres lie beyond the circle's centre along the
//   line: disjoint discs that one line crosses are met in the order of their centres.
//   That order changes where the line runs square to the line of centres, where the two
//   discs' projections are apart, so no free gap is touched.
// Sketch units; angles in radians.

/** End point kinds of the members: an edge's end (role by order), a circle's low and high side. */
const END = 0,
  LOW = 1,
  HIGH = 2;

export class LineSweep {
  private readonly k = new KineticOrder();
  /** Per member (0, 1): 1 for a circle (centre mx, my), 0 for a straight edge (left normal mx, my). */
  private readonly round = new Int8Array(2);
  private readonly mx = new Float64Array(2);
  private readonly my = new Float64Array(2);
  private readonly kind = new Int8Array(4);
  /** Per blocking disc: centre about the origin, and whether it lies between (per circle member). */
  private cx = new Float64Array(32);
  private cy = new Float64Array(32);
  private between = new Uint8Array(64);
  private discs = 0;
  /** Sign of the line direction (-sin θ, cos θ) from member 0 to member 1 in the current window. */
  private sense = 1;
  /** Angles at which a disc's order with a circle member changes, and which (disc * 2 + member). */
  private flipAt = new Float64Array(64);
  private flipOf = new Int32Array(64);
  private flips = 0;
  /** Scratch of dropNeverBetween: each disc's new index (-1: dropped). */
  private remap = new Int32Array(32);
  /** Open windows (pairs of angles) of the members alone. */
  private readonly windows = new Float64Array(8);
  private ox = 0;
  private oy = 0;
  private readonly memberSteps = (o: KineticOrder) => this.setSteps(o);

  /** Member `m` (0 or 1): the straight edge a -> b, radiating on its left. */
  segment(m: number, ax: number, ay: number, bx: number, by: number): void {
    this.round[m] = 0;
    this.kind[2 * m] = this.kind[2 * m + 1] = END;
    this.mx[m] = ay - by;
    this.my[m] = bx - ax;
    this.put(2 * m, ax, ay, 0, 2 * m + 1);
    this.put(2 * m + 1, bx, by, 0, 2 * m);
  }

  /** Member `m` (0 or 1): a whole solid circle. */
  circle(m: number, cx: number, cy: number, r: number): void {
    this.round[m] = 1;
    this.kind[2 * m] = LOW;
    this.kind[2 * m + 1] = HIGH;
    this.mx[m] = cx - this.ox;
    this.my[m] = cy - this.oy;
    this.put(2 * m, cx, cy, -r, -1);
    this.put(2 * m + 1, cx, cy, r, -1);
  }

  /**
   * L_i F_ij (sketch units) between the two members (set first, about the origin
   * `ox, oy`, then this call) past the discs (dx, dy, dr)[c], c in `discs`, each
   * wholly in front of a straight member's line and apart from a round one. NaN when
   * rounding lost the order of the end points (never seen; the caller then integrates
   * the pair its usual way).
   */
  exchange(dx: ArrayLike<number>, dy: ArrayLike<number>, dr: ArrayLike<number>, discs: ArrayLike<number>): number {
    const K = this.k,
      n = discs.length;
    K.grow(4 + 2 * n);
    if (this.cx.length < n) {
      this.cx = new Float64Array(2 * n);
      this.cy = new Float64Array(2 * n);
      this.between = new Uint8Array(4 * n);
      this.flipAt = new Float64Array(8 * n);
      this.flipOf = new Int32Array(8 * n);
      this.remap = new Int32Array(2 * n);
    }
    for (let q = 0; q < n; q++) {
      const c = discs[q];
      this.cx[q] = dx[c] - this.ox;
      this.cy[q] = dy[c] - this.oy;
      this.put(4 + 2 * q, dx[c], dy[c], -dr[c], -1);
      this.put(5 + 2 * q, dx[c], dy[c], dr[c], -1);
    }
    this.discs = n;
    K.below = 2; // below everything p crosses neither member
    let scale = 0;
    for (let e = 0; e < 4 + 2 * n; e++) scale = Math.max(scale, Math.abs(K.x[e]) + Math.abs(K.y[e]) + Math.abs(K.s[e]));
    K.tol = 1e-11 * scale;
    let total = 0;
    const w = this.openWindows();
    for (let q = 0; q < w; q += 2) total += this.sweep(this.windows[q], this.windows[q + 1], w === 2);
    return 0.5 * total;
  }

  /** Centre the coordinates of the next members and discs at (ox, oy): small projections, small rounding. */
  origin(ox: number, oy: number): void {
    this.ox = ox;
    this.oy = oy;
  }

  private put(e: number, px: number, py: number, ps: number, mate: number): void {
    const K = this.k;
    K.x[e] = px - this.ox;
    K.y[e] = py - this.oy;
    K.s[e] = ps;
    K.mate[e] = mate;
  }

  /**
   * The angles over half a turn at which lines cross both members (windows[0..w),
   * from-to pairs, widened by 1e-9; one window but at a wrap), by a sweep of the
   * members' four end points alone. Returns w.
   */
  private openWindows(): number {
    const K = this.k,
      discs = this.discs;
    K.size = 4;
    this.discs = 0;
    K.endAt(Math.PI);
    K.start(0, this.memberSteps);
    let w = 0,
      open = K.anyFree(),
      now = 0;
    if (open) this.windows[w++] = 0;
    for (let guard = 0; K.swaps.size > 0 && guard < 64; guard++) {
      const t = K.swaps.key[K.swaps.top()];
      if (t > Math.PI) break;
      now = t;
      K.swap(K.swaps.top(), now, Math.cos(now), Math.sin(now));
      const free = K.anyFree();
      if (free !== open && w < 8) this.windows[w++] = now;
      open = free;
    }
    if (open) this.windows[w++] = Math.PI;
    this.discs = discs;
    // Open at both ends of the half turn: one window across it.
    if (w >= 4 && this.windows[0] === 0 && this.windows[w - 1] === Math.PI) {
      this.windows[0] = this.windows[w - 2];
      this.windows[1] += Math.PI;
      w -= 2;
    }
    for (let q = 0; q < w; q += 2) {
      if (this.windows[q + 1] - this.windows[q] >= Math.PI) continue;
      this.windows[q] -= 1e-9;
      this.windows[q + 1] += 1e-9;
    }
    return w;
  }

  /**
   * Twice L_i F_ij from the lines with normal angles `from` to `to` (radians); NaN if
   * the order was lost. `last`: no window follows, so discs never between the members
   * in this one may be dropped.
   */
  private sweep(from: number, to: number, last: boolean): number {
    const K = this.k;
    K.size = 4 + 2 * this.discs;
    this.sense = this.senseAt(0.5 * (from + to));
    this.findFlips(from, to);
    if (last) this.dropNeverBetween();
    K.endAt(to);
    K.start(from, this.memberSteps);
    let total = 0,
      now = from,
      sinNow = Math.sin(from),
      cosNow = Math.cos(from),
      f = 0;
    // Each pair of end points swaps at most twice in half a turn; more means rounding
    // has lost the order: give up (NaN), and the caller integrates the pair otherwise.
    let budget = 2 * K.size * K.size + this.flips + 16;
    for (;;) {
      const top = K.swaps.size > 0 ? K.swaps.top() : -1;
      const ts = top >= 0 ? K.swaps.key[top] : Infinity,
        tf = f < this.flips ? this.flipAt[f] : Infinity;
      const t = ts < tf ? ts : tf;
      if (t > to) break;
      if (--budget < 0) return NaN;
      if (t > now) {
        const sinT = Math.sin(t),
          cosT = Math.cos(t);
        total += K.cx * (sinT - sinNow) + K.cy * (cosNow - cosT) + K.cs * (t - now);
        now = t;
        sinNow = sinT;
        cosNow = cosT;
      }
      if (tf <= ts) this.flip(this.flipOf[f++]);
      else K.swap(top, now, cosNow, sinNow);
    }
    const sinT = Math.sin(to),
      cosT = Math.cos(to);
    return total + K.cx * (sinT - sinNow) + K.cy * (cosNow - cosT) + K.cs * (to - now);
  }

  /** +1 or -1: the sign of the direction (-sin t, cos t) from member 0 to member 1 along lines crossing both. */
  private senseAt(t: number): number {
    const dx = -Math.sin(t),
      dy = Math.cos(t);
    const M = this.round;
    // Lines leave a straight member into its front, and arrive at one from its front.
    let v: number;
    if (M[0] === 0) v = dx * this.mx[0] + dy * this.my[0];
    else if (M[1] === 0) v = -(dx * this.mx[1] + dy * this.my[1]);
    else v = dx * (this.mx[1] - this.mx[0]) + dy * (this.my[1] - this.my[0]);
    return v < 0 ? -1 : 1;
  }

  /**
   * Which discs lie between the members just after `from`, and the angles in (from,
   * to] at which that changes (the line square to the centres of a disc and a circle
   * member), sorted.
   */
  private findFlips(from: number, to: number): void {
    const at = from + 1e-9;
    const dx = -Math.sin(at) * this.sense,
      dy = Math.cos(at) * this.sense;
    let flips = 0;
    for (let q = 0; q < this.discs; q++) {
      for (let m = 0; m < 2; m++) {
        if (this.round[m] === 0) {
          this.between[2 * q + m] = 1;
          continue;
        }
        const wx = this.cx[q] - this.mx[m],
          wy = this.cy[q] - this.my[m];
        const along = wx * dx + wy * dy;
        this.between[2 * q + m] = (m === 0 ? along > 0 : along < 0) ? 1 : 0;
        // w . (-sin t, cos t) = 0 at t = atan2(wy, wx) + j pi.
        let t = Math.atan2(wy, wx);
        t += Math.PI * Math.ceil((at - t) / Math.PI);
        for (; t <= to; t += Math.PI) {
          if (t <= at) continue;
          let k = flips++;
          while (k > 0 && this.flipAt[k - 1] > t) {
            this.flipAt[k] = this.flipAt[k - 1];
            this.flipOf[k] = this.flipOf[k - 1];
            k--;
          }
          this.flipAt[k] = t;
          this.flipOf[k] = 2 * q + m;
        }
      }
    }
    this.flips = flips;
  }

  /** Disc q = b >> 1 passes member b & 1's centre: it is between the members or no longer. */
  private flip(b: number): void {
    this.between[b] ^= 1;
    const q = b >> 1,
      K = this.k;
    const act = this.between[2 * q] & this.between[2 * q + 1];
    const lo = 4 + 2 * q;
    if (K.step[lo] === act) return;
    K.step[lo] = act;
    K.step[lo + 1] = -act;
    K.recount(Math.min(K.at[lo], K.at[lo + 1]), K.size);
  }

  /** Steps from the order: an edge's lower end -1 (crossing starts), upper +1; a circle member's low side -1, high +1; a disc between its members +1 low, -1 high. */
  private setSteps(o: KineticOrder): void {
    const step = o.step,
      at = o.at;
    for (let e = 0; e < 4; e++) {
      const kind = this.kind[e];
      step[e] = kind === END ? (at[o.mate[e]] > at[e] ? -1 : 1) : kind === LOW ? -1 : 1;
    }
    for (let q = 0; q < this.discs; q++) {
      const act = this.between[2 * q] & this.between[2 * q + 1];
      step[4 + 2 * q] = act;
      step[5 + 2 * q] = -act;
    }
  }

  /**
   * Drop the discs that lie between the members nowhere in the window (behind a round
   * member all along): they block no line there, and their end points would only swap
   * with the others. Keeps the flips' order.
   */
  private dropNeverBetween(): void {
    const K = this.k,
      n = this.discs,
      flips = this.flips;
    const seen = this.between; // bit 2 of between[2q]: q has a flip
    for (let f = 0; f < flips; f++) seen[this.flipOf[f] & ~1] |= 2;
    let kept = 0;
    const newIndex = this.remap;
    for (let q = 0; q < n; q++) {
      const b0 = seen[2 * q],
        b1 = seen[2 * q + 1];
      seen[2 * q] = b0 & 1;
      if ((b0 & 2) === 0 && (b0 & b1 & 1) === 0) {
        newIndex[q] = -1;
        continue;
      }
      newIndex[q] = kept;
      if (kept !== q) {
        this.cx[kept] = this.cx[q];
        this.cy[kept] = this.cy[q];
        seen[2 * kept] = seen[2 * q];
        seen[2 * kept + 1] = b1;
        for (let e = 0; e < 2; e++) {
          K.x[4 + 2 * kept + e] = K.x[4 + 2 * q + e];
          K.y[4 + 2 * kept + e] = K.y[4 + 2 * q + e];
          K.s[4 + 2 * kept + e] = K.s[4 + 2 * q + e];
          K.mate[4 + 2 * kept + e] = -1;
        }
      }
      kept++;
    }
    if (kept === n) return;
    for (let f = 0; f < flips; f++) {
      const b = this.flipOf[f];
      this.flipOf[f] = 2 * newIndex[b >> 1] + (b & 1);
    }
    this.discs = kept;
    K.size = 4 + 2 * kept;
  }
}
