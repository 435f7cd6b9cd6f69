// Exchange between two straight edges past solid circles, summed over the lines that
// cross both (integral geometry). With lines measured as dp dθ (θ the angle of the
// line's normal, p its distance from the origin), the lines that cross two facing
// segments measure the crossed strings minus the uncrossed ones, so L_i F_ij is half
// that measure (Hottel's crossed strings; Santaló, Integral Geometry and Geometric
// Probability, 1976, the measure of lines meeting two convex sets; from memory). With
// discs between the edges, L_i F_ij is half the measure of the lines that cross both
// edges and miss every disc: at each θ, the length of the p interval that crosses both
// edges, less the discs' projections. The end points of those intervals are sinusoids
// in θ (x cos θ + y sin θ + s); their order changes only where two of them meet, and
// between such angles the free length is one sinusoid, integrated exactly. The sweep
// keeps the order up to date one swap of neighbours at a time (a kinetic sorted list).
//
// Exact only when every disc lies wholly in front of both edges' lines: then a line
// that crosses both edges and a disc meets the disc between them, so it is blocked
// (the caller checks this, lineSweepPair.ts). Sketch units; angles in radians.

const TWO_PI = 2 * Math.PI;
/**
 * Two end points whose order changes for less than 2 GRAZE (radians) keep their order:
 * the length they would swap is below r GRAZE^2 over that span, under 1e-18 r.
 */
const GRAZE = 1e-6;
/** A swap computed this close before the current angle (radians) happens now: rounding of the angle. */
const NOW = 1e-10;

/** End point kinds. */
const EDGE_END = 0,
  DISC_LOW = 1,
  DISC_HIGH = 2;

export class LineSweep {
  private size = 0;
  /** End point e's projection at θ is x[e] cos θ + y[e] sin θ + s[e] (coordinates about `ox, oy`). */
  private x = new Float64Array(64);
  private y = new Float64Array(64);
  private s = new Float64Array(64);
  private kind = new Int8Array(64);
  /** The other end of the same edge (-1 for a disc). */
  private mate = new Int32Array(64);
  /** Change of the count when p passes the end point upwards. */
  private step = new Int8Array(64);
  /** End points by position, low to high; and each end point's position. */
  private order = new Int32Array(64);
  private at = new Int32Array(64);
  /**
   * Count just above each position: the discs covering p plus the edges not crossed
   * (2 below everything); the lines of a gap whose count is 0 cross both edges freely.
   */
  private count = new Int32Array(64);
  /** When the neighbours at positions k and k + 1 swap, and a min-heap of positions by that angle. */
  private swapAt = new Float64Array(64);
  private heap = new Int32Array(64);
  private inHeap = new Int32Array(64);
  private heapSize = 0;
  /** Free length at the current angle as cx cos θ + cy sin θ + cs. */
  private cx = 0;
  private cy = 0;
  private cs = 0;
  /** Rounding scale of a projection (sketch units) for the order tests. */
  private tol = 0;
  private scale = 0;
  /** Origin of the coordinates (sketch units). */
  private ox = 0;
  private oy = 0;

  /**
   * L_i F_ij (sketch units) between edge i = a0 -> a1 and edge j = b0 -> b1 (each
   * radiating on its left, each wholly in front of the other's line, facing), past the
   * discs (dx, dy, dr)[k], k in `discs`, each wholly in front of both lines. NaN
   * when rounding lost the order of the end points (never seen; the caller then
   * integrates the pair its usual way).
   */
  exchange(
    a0x: number,
    a0y: number,
    a1x: number,
    a1y: number,
    b0x: number,
    b0y: number,
    b1x: number,
    b1y: number,
    dx: ArrayLike<number>,
    dy: ArrayLike<number>,
    dr: ArrayLike<number>,
    discs: ArrayLike<number>,
  ): number {
    // About the middle of the four ends: projections stay small, so does their rounding.
    const ox = 0.25 * (a0x + a1x + b0x + b1x),
      oy = 0.25 * (a0y + a1y + b0y + b1y);
    this.grow(4 + 2 * discs.length);
    this.ox = ox;
    this.oy = oy;
    this.scale = 0;
    this.put(0, a0x, a0y, 0, EDGE_END, 1);
    this.put(1, a1x, a1y, 0, EDGE_END, 0);
    this.put(2, b0x, b0y, 0, EDGE_END, 3);
    this.put(3, b1x, b1y, 0, EDGE_END, 2);
    for (let k = 0; k < discs.length; k++) {
      const c = discs[k];
      this.put(4 + 2 * k, dx[c], dy[c], -dr[c], DISC_LOW, -1);
      this.put(5 + 2 * k, dx[c], dy[c], dr[c], DISC_HIGH, -1);
    }
    this.size = 4 + 2 * discs.length;
    this.tol = 1e-11 * this.scale;
    // Lines that cross both edges run between the two diagonals a0-b0 and a1-b1 (the
    // crossed strings; a0 a1 b0 b1 go round anticlockwise). Their normals: from the
    // first diagonal's, turning anticlockwise to the second's, less than half a turn;
    // widened a little (outside it nothing is free).
    const t0 = Math.atan2(b0y - a0y, b0x - a0x) - Math.PI / 2;
    let t1 = Math.atan2(b1y - a1y, b1x - a1x) - Math.PI / 2;
    t1 -= TWO_PI * Math.floor((t1 - t0) / TWO_PI);
    return this.sweep(t0 - 1e-9, t1 + 1e-9);
  }

  private put(e: number, px: number, py: number, ps: number, kind: number, mate: number): void {
    const x = px - this.ox,
      y = py - this.oy;
    this.x[e] = x;
    this.y[e] = y;
    this.s[e] = ps;
    this.kind[e] = kind;
    this.mate[e] = mate;
    this.scale = Math.max(this.scale, Math.abs(x) + Math.abs(y) + Math.abs(ps));
  }

  /** Half the free measure of lines with normal angles from `from` to `to` (radians, to - from <= pi + tiny); NaN if the order was lost. */
  private sweep(from: number, to: number): number {
    this.start(from);
    let total = 0,
      now = from,
      sinNow = Math.sin(from),
      cosNow = Math.cos(from);
    // Each pair of end points swaps at most twice in half a turn; more means rounding
    // has lost the order: give up (NaN), and the caller integrates the pair otherwise.
    let budget = 2 * this.size * this.size + 16;
    while (this.heapSize > 0) {
      if (--budget < 0) return NaN;
      const k = this.heap[0];
      const t = this.swapAt[k];
      if (t > to) break;
      if (t > now) {
        const sinT = Math.sin(t),
          cosT = Math.cos(t);
        total += this.cx * (sinT - sinNow) + this.cy * (cosNow - cosT) + this.cs * (t - now);
        now = t;
        sinNow = sinT;
        cosNow = cosT;
      }
      this.swap(k, now, cosNow, sinNow);
    }
    const sinT = Math.sin(to),
      cosT = Math.cos(to);
    total += this.cx * (sinT - sinNow) + this.cy * (cosNow - cosT) + this.cs * (to - now);
    return 0.5 * total;
  }

  /** Sort the end points at angle t, set the counts, the free length and every swap angle. */
  private start(t: number): void {
    const n = this.size,
      X = this.x,
      Y = this.y,
      S = this.s,
      order = this.order;
    const c = Math.cos(t),
      s = Math.sin(t);
    // Insertion sort by projection, then by its rate of change (ties at the start angle).
    for (let e = 0; e < n; e++) {
      const v = X[e] * c + Y[e] * s + S[e],
        w = Y[e] * c - X[e] * s;
      let k = e;
      while (k > 0) {
        const f = order[k - 1];
        const vf = X[f] * c + Y[f] * s + S[f];
        if (vf < v || (vf === v && Y[f] * c - X[f] * s <= w)) break;
        order[k] = f;
        k--;
      }
      order[k] = e;
    }
    const step = this.step,
      kind = this.kind,
      at = this.at;
    for (let k = 0; k < n; k++) at[order[k]] = k;
    let run = 2;
    for (let k = 0; k < n; k++) {
      const e = order[k];
      // Passing an edge's lower end, p starts crossing that edge: one edge fewer not crossed.
      if (kind[e] === EDGE_END) step[e] = at[this.mate[e]] > k ? -1 : 1;
      else step[e] = kind[e] === DISC_LOW ? 1 : -1;
      run += step[e];
      this.count[k] = run;
    }
    this.cx = this.cy = this.cs = 0;
    for (let k = 0; k + 1 < n; k++) {
      if (this.count[k] !== 0) continue;
      const lo = order[k],
        hi = order[k + 1];
      this.cx += X[hi] - X[lo];
      this.cy += Y[hi] - Y[lo];
      this.cs += S[hi] - S[lo];
    }
    this.heapSize = 0;
    for (let k = 0; k + 1 < n; k++) {
      this.swapAt[k] = this.nextSwap(k, t, c, s);
      this.heap[this.heapSize] = k;
      this.inHeap[k] = this.heapSize++;
    }
    for (let h = (this.heapSize >> 1) - 1; h >= 0; h--) this.down(h);
  }

  /** Swap the end points at positions k and k + 1 at angle `now` (cosine `cn`, sine `sn`); keep counts, free length and swap angles. */
  private swap(k: number, now: number, cn: number, sn: number): void {
    const order = this.order,
      count = this.count,
      n = this.size;
    const u = order[k],
      v = order[k + 1];
    const below = k > 0 ? count[k - 1] : 2;
    const freeBelow = k > 0 && count[k - 1] === 0 ? 1 : 0,
      freeAbove = k + 2 < n && count[k + 1] === 0 ? 1 : 0,
      freeOld = count[k] === 0 ? 1 : 0;
    // The two ends of one edge swap roles: the lower one is where crossing starts.
    if (this.mate[u] === v) {
      const t = this.step[u];
      this.step[u] = this.step[v];
      this.step[v] = t;
    }
    order[k] = v;
    order[k + 1] = u;
    this.at[v] = k;
    this.at[u] = k + 1;
    count[k] = below + this.step[v];
    const freeNew = count[k] === 0 ? 1 : 0;
    const f = freeBelow + freeAbove - freeOld - freeNew;
    if (f !== 0) {
      this.cx += f * (this.x[v] - this.x[u]);
      this.cy += f * (this.y[v] - this.y[u]);
      this.cs += f * (this.s[v] - this.s[u]);
    }
    if (k > 0) this.reschedule(k - 1, now, cn, sn);
    this.reschedule(k, now, cn, sn);
    if (k + 2 < n) this.reschedule(k + 1, now, cn, sn);
  }

  /**
   * The next angle from `now` (cosine and sine `cn`, `sn`) at which the end point at
   * position k passes the one at k + 1. Their difference is R cos(θ - φ) + ds; it
   * turns positive at θ = φ - α, cos α = -ds / R, sin α = h / R. A pair found out of
   * order by more than rounding swaps now.
   */
  private nextSwap(k: number, now: number, cn: number, sn: number): number {
    const u = this.order[k],
      v = this.order[k + 1];
    const dx = this.x[u] - this.x[v],
      dy = this.y[u] - this.y[v],
      ds = this.s[u] - this.s[v];
    const late = dx * cn + dy * sn + ds > this.tol;
    const R2 = dx * dx + dy * dy;
    if (R2 <= ds * ds) return late ? now : Infinity;
    const h = Math.sqrt(R2 - ds * ds || 0);
    if (h * h < GRAZE * GRAZE * R2) {
      if (ds < 0) return Infinity; // u is above v only for a moment
      return now; // u is above v but for a moment
    }
    if (late) return now;
    // θ = φ - α: cos θ = (-dx ds + dy h) / R^2, sin θ = (-dy ds - dx h) / R^2.
    let t = Math.atan2(-dy * ds - dx * h, dy * h - dx * ds);
    t += TWO_PI * Math.ceil((now - NOW - t) / TWO_PI);
    return t > now ? t : now;
  }

  private reschedule(k: number, now: number, cn: number, sn: number): void {
    const old = this.swapAt[k];
    const t = this.nextSwap(k, now, cn, sn);
    this.swapAt[k] = t;
    const h = this.inHeap[k];
    if (t < old) this.up(h);
    else if (t > old) this.down(h);
  }

  private up(h: number): void {
    const heap = this.heap,
      key = this.swapAt,
      where = this.inHeap;
    const k = heap[h],
      t = key[k];
    while (h > 0) {
      const p = (h - 1) >> 1;
      if (key[heap[p]] <= t) break;
      heap[h] = heap[p];
      where[heap[h]] = h;
      h = p;
    }
    heap[h] = k;
    where[k] = h;
  }

  private down(h: number): void {
    const heap = this.heap,
      key = this.swapAt,
      where = this.inHeap,
      size = this.heapSize;
    const k = heap[h],
      t = key[k];
    for (;;) {
      let c = 2 * h + 1;
      if (c >= size) break;
      if (c + 1 < size && key[heap[c + 1]] < key[heap[c]]) c++;
      if (key[heap[c]] >= t) break;
      heap[h] = heap[c];
      where[heap[h]] = h;
      h = c;
    }
    heap[h] = k;
    where[k] = h;
  }

  private grow(n: number): void {
    if (this.x.length >= n) return;
    const m = 2 * n;
    this.x = new Float64Array(m);
    this.y = new Float64Array(m);
    this.s = new Float64Array(m);
    this.kind = new Int8Array(m);
    this.mate = new Int32Array(m);
    this.step = new Int8Array(m);
    this.order = new Int32Array(m);
    this.at = new Int32Array(m);
    this.count = new Int32Array(m);
    this.swapAt = new Float64Array(m);
    this.heap = new Int32Array(m);
    this.inHeap = new Int32Array(m);
  }
}
