import { arcEnds, nextArcSwitch } from './arcMember';
import { BetweenDiscs } from './betweenDiscs';
import { FramedOrder } from './framedOrder';
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
// neighbours at a time (a kinetic sorted list).
//
// A member is a straight edge (radiating on its left), a whole solid circle, or an arc
// of one under half a turn (arcMember.ts); which discs lie between them along a line is
// betweenDiscs.ts's. The order is kept only
// inside the narrower member's interval (framedOrder.ts). Sketch units; radians.

/** End point kinds of the members: an edge's end (role by order), a circle's low and high side. */
const END = 0,
  LOW = 1,
  HIGH = 2;

export class LineSweep {
  private readonly k = new KineticOrder();
  private readonly f = new FramedOrder();
  /** Per member (0, 1): 1 for a circle or an arc of one (centre mx, my), 0 for a straight edge (left normal mx, my). */
  private readonly round = new Int8Array(2);
  private readonly mx = new Float64Array(2);
  private readonly my = new Float64Array(2);
  private readonly kind = new Int8Array(4);
  /** Per member: the arc of its circle (start, span < pi), or span 0 for a whole circle or an edge; radius. */
  private readonly arcStart = new Float64Array(2);
  private readonly arcSpan = new Float64Array(2);
  private readonly radius = new Float64Array(2);
  private readonly ends = new Float64Array(6);
  /** The blocking discs: centres, and whether each lies between the members. */
  private readonly d = new BetweenDiscs();
  private discs = 0;
  /** Sign of the line direction (-sin θ, cos θ) from member 0 to member 1 in the current window. */
  private sense = 1;
  /** Open windows (pairs of angles) of the members alone. */
  private readonly windows = new Float64Array(8);
  private ox = 0;
  private oy = 0;
  private readonly memberSteps = (o: KineticOrder) => this.setSteps(o);

  /** Member `m` (0 or 1): the straight edge a -> b, radiating on its left. */
  segment(m: number, ax: number, ay: number, bx: number, by: number): void {
    this.round[m] = 0;
    this.arcSpan[m] = 0;
    this.kind[2 * m] = this.kind[2 * m + 1] = END;
    this.mx[m] = ay - by;
    this.my[m] = bx - ax;
    this.put(2 * m, ax, ay, 0, 2 * m + 1);
    this.put(2 * m + 1, bx, by, 0, 2 * m);
  }

  /** Member `m` (0 or 1): an arc of a solid circle, anticlockwise from `start` over `span` < pi (radians). */
  arc(m: number, cx: number, cy: number, r: number, start: number, span: number): void {
    this.circle(m, cx, cy, r);
    this.arcStart[m] = start;
    this.arcSpan[m] = span;
  }

  /** Member `m` (0 or 1): a whole solid circle. */
  circle(m: number, cx: number, cy: number, r: number): void {
    this.round[m] = 1;
    this.arcSpan[m] = 0;
    this.radius[m] = r;
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
    const D = this.d;
    D.grow(n);
    D.count = n;
    for (let q = 0; q < n; q++) {
      const c = discs[q];
      D.cx[q] = dx[c] - this.ox;
      D.cy[q] = dy[c] - this.oy;
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
    for (let q = 0; q < w; q += 2) {
      // Where lines run along a straight member its ends trade roles; nothing is free there
      // (no line crosses it), so the window is swept in parts between such angles.
      let from = this.windows[q];
      const to = this.windows[q + 1];
      for (;;) {
        const cut = this.nextCut(from, to);
        total += this.sweep(from, cut, q + 2 === w && cut === to);
        if (cut === to) break;
        from = cut;
      }
    }
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
    const K = this.k,
      F = this.f;
    const mid = 0.5 * (from + to);
    this.sense = this.senseAt(mid);
    if (!this.arcsAt(mid)) return 0; // an arc member faces away from every line here
    const D = this.d;
    D.find(from, to, this.sense, this.round, this.mx, this.my);
    if (last) this.dropNeverBetween();
    // Steps from the order in the middle of the window (an edge's ends keep their roles
    // inside it: they swap only where lines run along the edge, and none crosses it).
    const n = 4 + 2 * this.discs;
    this.stepsAt(mid);
    F.share(K.x, K.y, K.s, K.step, n);
    F.tol = K.tol;
    // The frame: the member with the narrower interval in the middle of the window.
    const c = Math.cos(mid),
      s = Math.sin(mid);
    const width = (e: number) => Math.abs((K.x[e] - K.x[e + 1]) * c + (K.y[e] - K.y[e + 1]) * s + K.s[e] - K.s[e + 1]);
    const frame = width(0) <= width(2) ? 0 : 1;
    const lo = K.step[2 * frame] < 0 ? 2 * frame : 2 * frame + 1;
    F.start(from, lo, 4 * frame + 1 - lo, 1 - frame, to);
    let total = 0,
      now = from,
      sinNow = Math.sin(from),
      cosNow = Math.cos(from),
      f = 0;
    // Each pair of end points swaps at most twice in half a turn; more means rounding
    // has lost the order: give up (NaN), and the caller integrates the pair otherwise.
    let budget = 4 * n * n + D.flips + 16;
    for (;;) {
      const ts = F.next(),
        tf = f < D.flips ? D.flipAt[f] : Infinity;
      const t = ts < tf ? ts : tf;
      if (t > to) break;
      if (--budget < 0) return NaN;
      if (t > now) {
        const sinT = Math.sin(t),
          cosT = Math.cos(t);
        total += F.cx * (sinT - sinNow) + F.cy * (cosNow - cosT) + F.cs * (t - now);
        now = t;
        sinNow = sinT;
        cosNow = cosT;
      }
      if (tf <= ts) {
        const q = D.flip(D.flipOf[f++]);
        if (q >= 0) {
          const act = D.active(q);
          K.step[4 + 2 * q] = act;
          K.step[5 + 2 * q] = -act;
          F.restep();
        }
      } else if (!F.advance(now, cosNow, sinNow)) return total;
    }
    const sinT = Math.sin(to),
      cosT = Math.cos(to);
    return total + F.cx * (sinT - sinNow) + F.cy * (cosNow - cosT) + F.cs * (to - now);
  }

  /**
   * Set each arc member's interval ends for the part holding angle t (lines travel
   * from member 0 to member 1 along sense (-sin t, cos t)); false when one faces away.
   */
  private arcsAt(t: number): boolean {
    const K = this.k,
      E = this.ends;
    for (let m = 0; m < 2; m++) {
      if (!(this.arcSpan[m] > 0)) continue;
      // Lines reach member 1 travelling along the sense, member 0 against it.
      const dir = m === 1 ? this.sense : -this.sense;
      const dx = -Math.sin(t) * dir,
        dy = Math.cos(t) * dir;
      if (!arcEnds(this.mx[m], this.my[m], this.radius[m], this.arcStart[m], this.arcSpan[m], t, dx, dy, E))
        return false;
      for (let k = 0; k < 2; k++) {
        K.x[2 * m + k] = E[3 * k];
        K.y[2 * m + k] = E[3 * k + 1];
        K.s[2 * m + k] = E[3 * k + 2];
      }
    }
    return true;
  }

  /** Steps at angle t: an edge's or arc's lower end -1 (crossing starts), upper +1; a circle member's low side -1, high +1; a disc between the members +1 low, -1 high. */
  private stepsAt(t: number): void {
    const K = this.k,
      step = K.step;
    const c = Math.cos(t),
      s = Math.sin(t);
    for (let m = 0; m < 2; m++) {
      const a = 2 * m;
      if (this.round[m] === 1 && !(this.arcSpan[m] > 0)) {
        step[a] = -1;
        step[a + 1] = 1;
        continue;
      }
      const low = (K.x[a] - K.x[a + 1]) * c + (K.y[a] - K.y[a + 1]) * s + K.s[a] - K.s[a + 1] <= 0;
      step[a] = low ? -1 : 1;
      step[a + 1] = low ? 1 : -1;
    }
    for (let q = 0; q < this.discs; q++) {
      const act = this.d.active(q);
      step[4 + 2 * q] = act;
      step[5 + 2 * q] = -act;
    }
  }

  /**
   * The first angle in (from, to) at which lines run along a straight member, or an
   * end of an arc member is a tangent point (arcMember.ts), or `to`.
   */
  private nextCut(from: number, to: number): number {
    const K = this.k;
    let cut = to;
    for (let m = 0; m < 2; m++) {
      if (this.arcSpan[m] > 0) cut = nextArcSwitch(this.arcStart[m], this.arcSpan[m], from, cut);
      if (this.round[m] === 1) continue;
      // The normal (cos t, sin t) is square to the edge: t = atan2(dy, dx) + pi/2, mod pi.
      let t = Math.atan2(K.y[2 * m + 1] - K.y[2 * m], K.x[2 * m + 1] - K.x[2 * m]) + Math.PI / 2;
      t += Math.PI * Math.ceil((from - t) / Math.PI);
      if (t <= from) t += Math.PI;
      if (t < cut) cut = t;
    }
    return cut;
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

  /** The members' steps from the order, for the window sweep (no discs there): an edge's lower end -1 (crossing starts), upper +1; a circle's low side -1, high +1. */
  private setSteps(o: KineticOrder): void {
    const step = o.step,
      at = o.at;
    for (let e = 0; e < 4; e++) {
      const kind = this.kind[e];
      step[e] = kind === END ? (at[o.mate[e]] > at[e] ? -1 : 1) : kind === LOW ? -1 : 1;
    }
  }

  /**
   * Drop the discs that lie between the members nowhere in the window (behind a round
   * member all along): they block no line there, and their end points would only swap
   * with the others.
   */
  private dropNeverBetween(): void {
    const map = this.d.dropNever();
    if (!map) return;
    const K = this.k,
      n = this.discs;
    for (let q = 0; q < n; q++) {
      const to = map[q];
      if (to < 0 || to === q) continue;
      for (let e = 0; e < 2; e++) {
        K.x[4 + 2 * to + e] = K.x[4 + 2 * q + e];
        K.y[4 + 2 * to + e] = K.y[4 + 2 * q + e];
        K.s[4 + 2 * to + e] = K.s[4 + 2 * q + e];
      }
    }
    this.discs = this.d.count;
  }
}
