import { AngleHeap } from './angleHeap';

// End points of intervals on a line turning about the origin, kept in order as the
// angle turns (a kinetic sorted list). End point e sits at x[e] cos θ + y[e] sin θ +
// s[e] (the projection, along the normal at angle θ, of a point or of a point moved
// s along that normal). Passing e upwards changes a count by step[e]; the gaps whose
// count is 0 are free, and their total length, a sinusoid in θ between swaps, is kept
// as cx cos θ + cy sin θ + cs. Sketch units; angles in radians.

const TWO_PI = 2 * Math.PI;
/**
 * Two end points whose order changes for less than 2 GRAZE (radians) keep their order:
 * the length they would swap is below R GRAZE^2 over that span, under 1e-18 R.
 */
const GRAZE = 1e-6;
/** A swap computed this close before the current angle (radians) happens now: rounding of the angle. */
const NOW = 1e-10;

/** What swapNeighbours reads and keeps: an order of end points with its counts and free length. */
export interface OrderedEnds {
  x: Float64Array;
  y: Float64Array;
  s: Float64Array;
  step: Int8Array;
  order: Int32Array;
  at: Int32Array;
  count: Int32Array;
  cx: number;
  cy: number;
  cs: number;
}

/**
 * Swap the end points at positions k and k + 1 of `o` (count `below` under k, `free`
 * the free gaps at k - 1, k + 1 less the one at k): positions, the count at k, and the
 * free length's coefficients (only the gap between them changes).
 */
export function swapNeighbours(o: OrderedEnds, k: number, below: number, free: number): void {
  const order = o.order,
    u = order[k],
    v = order[k + 1];
  order[k] = v;
  order[k + 1] = u;
  o.at[v] = k;
  o.at[u] = k + 1;
  o.count[k] = below + o.step[v];
  const f = free - (o.count[k] === 0 ? 1 : 0);
  if (f !== 0) {
    o.cx += f * (o.x[v] - o.x[u]);
    o.cy += f * (o.y[v] - o.y[u]);
    o.cs += f * (o.s[v] - o.s[u]);
  }
}

export class KineticOrder {
  size = 0;
  x = new Float64Array(64);
  y = new Float64Array(64);
  s = new Float64Array(64);
  /** Change of the count when p passes the end point upwards. */
  step = new Int8Array(64);
  /** The other end of the same edge, whose step it trades on a swap (-1: none). */
  mate = new Int32Array(64);
  /** End points by position, low to high; and each end point's position. */
  order = new Int32Array(64);
  at = new Int32Array(64);
  /** Count just above each position (`below` under everything). */
  count = new Int32Array(64);
  below = 0;
  readonly swaps = new AngleHeap();
  /** Free length at the current angle: cx cos θ + cy sin θ + cs. */
  cx = 0;
  cy = 0;
  cs = 0;
  /** Rounding scale of a projection (sketch units) for the order tests. */
  tol = 0;
  /** Where the sweep ends (radians), its cosine and sine: swaps after it need no angle. */
  private readonly ends = Float64Array.of(Infinity, 1, 0);

  /** The sweep ends at angle t (radians): later swaps are left unscheduled (Infinity). */
  endAt(t: number): void {
    endsAt(this.ends, t);
  }

  /** Room for n end points; the end points set so far are kept. */
  grow(n: number): void {
    if (this.x.length >= n) return;
    const m = 2 * n;
    const more = <T extends Float64Array | Int32Array | Int8Array>(a: T, b: T): T => {
      b.set(a);
      return b;
    };
    this.x = more(this.x, new Float64Array(m));
    this.y = more(this.y, new Float64Array(m));
    this.s = more(this.s, new Float64Array(m));
    this.step = more(this.step, new Int8Array(m));
    this.mate = more(this.mate, new Int32Array(m));
    this.order = new Int32Array(m);
    this.at = new Int32Array(m);
    this.count = new Int32Array(m);
    this.swaps.grow(m);
  }

  /**
   * Sort the end points at angle t (ties by rate of change), then call `steps` to set
   * each end point's step from the order; set counts, free length and swap angles.
   */
  start(t: number, steps: (order: KineticOrder) => void): void {
    const n = this.size,
      X = this.x,
      Y = this.y,
      S = this.s,
      order = this.order;
    const c = Math.cos(t),
      s = Math.sin(t);
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
    for (let k = 0; k < n; k++) this.at[order[k]] = k;
    steps(this);
    this.recount();
    const key = this.swaps.key;
    for (let k = 0; k + 1 < n; k++) key[k] = this.nextSwap(k, t, c, s);
    this.swaps.fill(Math.max(0, n - 1));
  }

  /** Counts and the free length from the steps and the order. */
  private recount(): void {
    const order = this.order,
      count = this.count,
      step = this.step;
    let run = this.below;
    for (let k = 0; k < this.size; k++) {
      run += step[order[k]];
      count[k] = run;
    }
    this.cx = this.cy = this.cs = 0;
    const X = this.x,
      Y = this.y,
      S = this.s;
    for (let k = 0; k + 1 < this.size; k++) {
      if (count[k] !== 0) continue;
      const lo = order[k],
        hi = order[k + 1];
      this.cx += X[hi] - X[lo];
      this.cy += Y[hi] - Y[lo];
      this.cs += S[hi] - S[lo];
    }
  }

  /** Is some gap free now? */
  anyFree(): boolean {
    for (let k = 0; k + 1 < this.size; k++) if (this.count[k] === 0) return true;
    return false;
  }

  /** Swap the end points at positions k and k + 1 at angle `now` (cosine cn, sine sn); keep counts, free length and swap angles. */
  swap(k: number, now: number, cn: number, sn: number): void {
    const order = this.order,
      count = this.count,
      n = this.size;
    const u = order[k],
      v = order[k + 1];
    const below = k > 0 ? count[k - 1] : this.below;
    const freeBelow = k > 0 && count[k - 1] === 0 ? 1 : 0,
      freeAbove = k + 2 < n && count[k + 1] === 0 ? 1 : 0,
      freeOld = count[k] === 0 ? 1 : 0;
    // The two ends of one edge trade roles: the lower one is where crossing starts.
    if (this.mate[u] === v) {
      const t = this.step[u];
      this.step[u] = this.step[v];
      this.step[v] = t;
    }
    swapNeighbours(this, k, below, freeBelow + freeAbove - freeOld);
    const H = this.swaps;
    if (k > 0) H.set(k - 1, this.nextSwap(k - 1, now, cn, sn));
    H.set(k, this.nextSwap(k, now, cn, sn));
    if (k + 2 < n) H.set(k + 1, this.nextSwap(k + 1, now, cn, sn));
  }

  private nextSwap(k: number, now: number, cn: number, sn: number): number {
    return passOf(this, this.order[k], this.order[k + 1], now, cn, sn, this.tol, this.ends);
  }
}

/** nextPass for end point u of `o`, below v (see nextPass). */
export function passOf(
  o: OrderedEnds,
  u: number,
  v: number,
  now: number,
  cn: number,
  sn: number,
  tol: number,
  ends: Float64Array,
): number {
  return nextPass(o.x[u] - o.x[v], o.y[u] - o.y[v], o.s[u] - o.s[v], now, cn, sn, tol, ends);
}

/** Write the sweep's end angle t (radians), its cosine and sine into `ends`. */
export function endsAt(ends: Float64Array, t: number): void {
  ends[0] = t;
  ends[1] = Math.cos(t);
  ends[2] = Math.sin(t);
}

/**
 * The next angle from `now` (cosine cn, sine sn; radians) at which an end point u
 * below another v passes it, from their difference u - v = dx cos θ + dy sin θ + ds =
 * R cos(θ - φ) + ds: it turns positive at θ = φ - α, cos α = -ds / R, sin α = h / R.
 * A pair found out of order by more than `tol` passes now; one that does not pass
 * before `ends[0]` (the sweep's end; its cosine and sine follow) gets Infinity.
 */
export function nextPass(
  dx: number,
  dy: number,
  ds: number,
  now: number,
  cn: number,
  sn: number,
  tol: number,
  ends: Float64Array,
): number {
  const late = dx * cn + dy * sn + ds > tol;
  const R2 = dx * dx + dy * dy;
  const end = ends[0],
    ce = ends[1],
    se = ends[2];
  if (!late && end - now < Math.PI - 1e-6 && dx * ce + dy * se + ds <= 0) {
    // Not above at either end of what is left (under half a turn): u passes v in
    // between only if the difference peaks there, at the angle of (dx, dy), and the
    // peak R + ds is above 0. Most neighbours never swap again; no angle is needed.
    const peakInside = cn * dy - sn * dx >= 0 && dx * se - dy * ce >= 0;
    if (!peakInside || (ds <= 0 && R2 <= ds * ds)) return Infinity;
  }
  if (R2 <= ds * ds) return late ? now : Infinity;
  const h = Math.sqrt(R2 - ds * ds);
  if (h * h < GRAZE * GRAZE * R2) return ds < 0 ? Infinity : now; // above or below but for a moment
  if (late) return now;
  // θ = φ - α: cos θ = (-dx ds + dy h) / R^2, sin θ = (-dy ds - dx h) / R^2.
  let t = Math.atan2(-dy * ds - dx * h, dy * h - dx * ds);
  t += TWO_PI * Math.ceil((now - NOW - t) / TWO_PI);
  return t > now ? t : now;
}
